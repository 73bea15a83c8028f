// The Node versions Heed states (package.json engines, README) against what the locked packages ask.
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { join } from 'node:path';

// semver 7 (npm's own range rules, installed with the toolchain; it ships no types)
type Semver = { satisfies: (version: string, range: string) => boolean };
const semver: Semver = createRequire(import.meta.url)('semver');

const root = join(import.meta.dirname, '..', '..', '..');
const pkg = JSON.parse(readFileSync(join(root, 'package.json'), 'utf8')) as { engines?: { node?: string } };
const lock = JSON.parse(readFileSync(join(root, 'package-lock.json'), 'utf8')) as { packages: Record<string, { engines?: { node?: string } | string[] }> };
const readme = readFileSync(join(root, 'README.md'), 'utf8');

/** Locked packages whose `engines.node` the given Node version does not satisfy. */
const unhappy = (version: string): string[] => Object.entries(lock.packages).flatMap(([path, meta]) => {
  const range = Array.isArray(meta.engines) ? undefined : meta.engines?.node;
  return path !== '' && range !== undefined && !semver.satisfies(version, range) ? [path.slice(path.lastIndexOf('node_modules/') + 'node_modules/'.length)] : [];
});

describe('supported Node versions', () => {
  it('are stated in package.json and in the README', () => {
    expect(pkg.engines?.node).toBe('^20.19.0 || >=22.13.0');
    expect(readme).toContain('Node.js 22.13 or later');
    expect(readme).toContain('`^20.19.0 || >=22.13.0`');
  });

  it('the recommended minimum (22.13.0) satisfies every locked package: npm ci gives no engine warning', () => {
    expect(unhappy('22.13.0')).toEqual([]);
  });

  it('on Node 20.19, only the packages the README explains as harmless warn', () => {
    expect(unhappy('20.19.0').sort()).toEqual(['@axe-core/playwright', '@electron/get', '@electron/rebuild', '@electron-internal/extract-zip', 'electron', 'node-abi'].sort());
    for (const name of ['@axe-core/playwright', '@electron/rebuild', 'node-abi', 'electron']) expect(readme).toContain(name);
  });
});

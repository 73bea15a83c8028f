import { mkdirSync, mkdtempSync, rmSync, utimesSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { needsRebuild, newestMtime, targetIsStale } from '../../../scripts/lib/freshness.mjs';

let dir: string;
const at = (file: string, seconds: number) => {
  mkdirSync(path.dirname(file), { recursive: true });
  writeFileSync(file, 'x');
  utimesSync(file, seconds, seconds);
};

beforeEach(() => { dir = mkdtempSync(path.join(tmpdir(), 'heed-fresh-')); });
afterEach(() => rmSync(dir, { recursive: true, force: true }));

describe('needsRebuild', () => {
  it('rebuilds when output is missing or older than an input', () => {
    expect(needsRebuild({ inputs: 10, output: null })).toBe(true);
    expect(needsRebuild({ inputs: null, output: null })).toBe(true);
    expect(needsRebuild({ inputs: 11, output: 10 })).toBe(true);
    expect(needsRebuild({ inputs: 10, output: 10 })).toBe(false);
    expect(needsRebuild({ inputs: 9, output: 10 })).toBe(false);
    expect(needsRebuild({ inputs: null, output: 10 })).toBe(false);
  });
});

describe('newestMtime', () => {
  it('takes the newest file anywhere below, ignoring node_modules, and null for nothing', () => {
    at(path.join(dir, 'src', 'a.ts'), 1000);
    at(path.join(dir, 'src', 'deep', 'b.ts'), 3000);
    at(path.join(dir, 'src', 'node_modules', 'c.js'), 9000);
    at(path.join(dir, 'index.html'), 2000);
    expect(newestMtime([path.join(dir, 'src'), path.join(dir, 'index.html')])).toBe(3000 * 1000);
    expect(newestMtime([path.join(dir, 'missing')])).toBeNull();
  });
});

describe('targetIsStale', () => {
  const target = { inputs: ['src', 'index.html'], output: ['dist'] };

  it('follows the newest mtimes of inputs and output', () => {
    at(path.join(dir, 'src', 'a.ts'), 1000);
    expect(targetIsStale(dir, target)).toBe(true);
    at(path.join(dir, 'dist', 'index.html'), 2000);
    expect(targetIsStale(dir, target)).toBe(false);
    at(path.join(dir, 'src', 'ui', 'screen.tsx'), 3000);
    expect(targetIsStale(dir, target)).toBe(true);
  });
});

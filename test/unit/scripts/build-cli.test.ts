import { spawnSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, readFileSync, rmSync, utimesSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { cliBundleIsFresh, cliPaths, ensureCliBundle } from '../../../scripts/build-cli.mjs';

// A tiny project with its own src/cli/main.ts, so the real bundle in the checkout is untouched.
let root: string;
const put = (rel: string, text: string) => {
  mkdirSync(path.dirname(path.join(root, rel)), { recursive: true });
  writeFileSync(path.join(root, rel), text);
};
const runBundle = (file: string) => spawnSync(process.execPath, [file], { encoding: 'utf8' }).stdout.trim();

beforeEach(() => {
  root = mkdtempSync(path.join(tmpdir(), 'heed-cli-build-'));
  put('src/cli/main.ts', "import { word } from './word';\nconsole.log(word satisfies string);\n");
  put('src/cli/word.ts', "export const word: string = 'first';\n");
  put('src/ui/unrelated.ts', 'export const x = 1;\n');
  // written a minute ago: the build's start is taken in whole milliseconds, so a source written
  // within the same millisecond as the build could count as newer than the bundle
  const earlier = Date.now() / 1000 - 60;
  for (const rel of ['src/cli/main.ts', 'src/cli/word.ts', 'src/ui/unrelated.ts']) utimesSync(path.join(root, rel), earlier, earlier);
});
afterEach(() => rmSync(root, { recursive: true, force: true }));

describe('the pre-built CLI bundle', () => {
  it('is built when missing, then reused while its inputs are unchanged', async () => {
    expect(cliBundleIsFresh(root)).toBe(false);
    const bundle = await ensureCliBundle(root);
    expect(bundle).toBe(cliPaths(root).bundle);
    expect(runBundle(bundle as string)).toBe('first');
    expect(cliBundleIsFresh(root)).toBe(true);
    const inputs: string[] = JSON.parse(readFileSync(cliPaths(root).inputs, 'utf8'));
    expect(inputs).toEqual(expect.arrayContaining(['src/cli/main.ts', 'src/cli/word.ts']));
    expect(inputs).not.toContain('src/ui/unrelated.ts');
  });
  it('is rebuilt when a file that went into it changes or disappears', async () => {
    await ensureCliBundle(root);
    const later = Date.now() / 1000 + 60;
    put('src/ui/unrelated.ts', 'export const x = 2;\n');
    utimesSync(path.join(root, 'src/ui/unrelated.ts'), later, later);
    expect(cliBundleIsFresh(root)).toBe(true);
    put('src/cli/word.ts', "export const word: string = 'second';\n");
    utimesSync(path.join(root, 'src/cli/word.ts'), later, later);
    expect(cliBundleIsFresh(root)).toBe(false);
    expect(runBundle((await ensureCliBundle(root)) as string)).toBe('second');
    rmSync(path.join(root, 'dist-cli', 'heed.inputs.json'));
    expect(cliBundleIsFresh(root)).toBe(false);
  });
  it('puts a lazily imported module in a chunk that counts as an input: the bundle is stale without it', async () => {
    put('src/cli/main.ts', "const { word } = await import('./word');\nconsole.log(word satisfies string);\n");
    const earlier = Date.now() / 1000 - 60; // as in beforeEach
    utimesSync(path.join(root, 'src/cli/main.ts'), earlier, earlier);
    const bundle = await ensureCliBundle(root);
    expect(runBundle(bundle as string)).toBe('first');
    const inputs: string[] = JSON.parse(readFileSync(cliPaths(root).inputs, 'utf8'));
    const chunks = inputs.filter((f) => f.startsWith('dist-cli/chunks/'));
    expect(chunks.length).toBeGreaterThan(0);
    expect(cliBundleIsFresh(root)).toBe(true);
    rmSync(path.join(root, chunks[0] as string));
    expect(cliBundleIsFresh(root)).toBe(false);
    expect(runBundle((await ensureCliBundle(root)) as string)).toBe('first');
  });
  it('gives null (so bin/heed.js falls back to the TypeScript loader) when it cannot build', async () => {
    put('src/cli/main.ts', 'this is not ( TypeScript');
    expect(await ensureCliBundle(root)).toBeNull();
  });
});

describe('bin/heed.js', () => {
  it('prints the same analysis through the bundle as through the TypeScript loader', () => {
    const args = ['bin/heed.js', 'analyze', 'test/reference/fixtures/log-sequential.csv', '--json', '--boot', '50'];
    const viaBundle = spawnSync(process.execPath, args, { encoding: 'utf8' });
    const viaTsx = spawnSync(process.execPath, args, { encoding: 'utf8', env: { ...process.env, HEED_CLI_LOADER: 'tsx' } });
    expect(viaBundle.status).toBe(0);
    // the run above built or reused the real bundle, so it went the way users' runs go
    expect(cliBundleIsFresh()).toBe(true);
    expect(viaTsx.status).toBe(0);
    expect(viaBundle.stdout.length).toBeGreaterThan(1000);
    expect(viaBundle.stdout).toBe(viaTsx.stdout);
  });
});

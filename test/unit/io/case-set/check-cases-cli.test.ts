// `heed check-cases` end to end: spawns node bin/heed.js on folders and zips written to a temp dir.
import { spawnSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { zipSync } from 'fflate';
import { goodCsv, goodFiles, png, withRow } from './fixtures';

let root: string;
beforeAll(() => {
  root = mkdtempSync(join(tmpdir(), 'heed-check-'));
});
afterAll(() => {
  rmSync(root, { recursive: true, force: true });
});

const heed = (...args: string[]) => {
  const run = spawnSync(process.execPath, ['bin/heed.js', ...args], { encoding: 'utf8', timeout: 60_000 });
  return { code: run.status, out: run.stdout, err: run.stderr };
};

const writeSet = (name: string, csv: string, files: Record<string, Uint8Array | string> = goodFiles()): string => {
  const dir = join(root, name);
  for (const [path, bytes] of Object.entries({ 'cases.csv': csv, ...files })) {
    mkdirSync(dirname(join(dir, path)), { recursive: true });
    writeFileSync(join(dir, path), bytes);
  }
  return dir;
};

describe('heed check-cases', () => {
  it('exits 0 with a summary for a good folder', () => {
    const run = heed('check-cases', writeSet('good', goodCsv()));
    expect(run.code).toBe(0);
    expect(run.out).toMatch(/2 cases and 1 practice case, 3 images/);
    expect(run.out).toMatch(/finding target: present in 1 of 2 \(50.0%\)/);
    expect(run.out).toMatch(/not a medical device/);
  });

  it('exits 2 listing every problem, one line FILE:ROW: column COL: message each, then a count', () => {
    const csv = withRow(1, 'C1,target,yes,img/c1.png,0.9,1,0,North').replace('0.7', '7');
    const dir = writeSet('bad', csv);
    const run = heed('check-cases', dir);
    expect(run.code).toBe(2);
    const lines = run.err.trim().split('\n');
    expect(lines[0]).toBe(`${dir}/cases.csv:2: column truth: truth must be 0 or 1, found "yes"`);
    expect(lines[1]).toMatch(new RegExp(`^${dir}/cases\\.csv:\\d+: column model_score: `));
    expect(lines[2]).toBe('2 problems; the case set is not valid and nothing was imported.');
    expect(lines).toHaveLength(3);
    expect(run.err).not.toMatch(/at .*\.ts:\d+/);
  });

  it('accepts a good zip with a top folder', () => {
    const files: Record<string, Uint8Array> = { 'mine/cases.csv': new TextEncoder().encode(goodCsv()) };
    for (const [path, bytes] of Object.entries(goodFiles())) files[`mine/${path}`] = typeof bytes === 'string' ? new TextEncoder().encode(bytes) : bytes;
    const zip = join(root, 'good.zip');
    writeFileSync(zip, zipSync(files));
    const run = heed('check-cases', zip);
    expect(run.code).toBe(0);
    expect(run.out).toMatch(/case set "mine"/);
  });

  it('refuses a zip with a ../ entry, naming it', () => {
    const zip = join(root, 'evil.zip');
    writeFileSync(zip, zipSync({ 'cases.csv': new TextEncoder().encode(goodCsv()), '../evil.png': png() }));
    const run = heed('check-cases', zip);
    expect(run.code).toBe(2);
    expect(run.err.split('\n')[0]).toBe(`${zip}/../evil.png: zip entry climbs out of the zip's folder with '..'; refusing the whole zip`);
  });

  it('exits 2 with a plain message for a path that does not exist or is not a set', () => {
    const missing = heed('check-cases', join(root, 'nope'));
    expect(missing.code).toBe(2);
    expect(missing.err.trim()).toBe(`heed: ${join(root, 'nope')} does not exist`);
    const file = join(root, 'notes.txt');
    writeFileSync(file, 'hi');
    expect(heed('check-cases', file).err).toMatch(/neither a folder nor a .zip file/);
    expect(heed('check-cases').code).toBe(2);
  });
});

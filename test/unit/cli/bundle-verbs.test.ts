import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { unzipSync, zipSync } from 'fflate';

// The real commands, as a user runs them: node bin/heed.js simulate | merge | verify | analyze | report.
const dir = mkdtempSync(join(tmpdir(), 'heed-bundle-cli-'));
const heed = (...args: string[]) => {
  const r = spawnSync(process.execPath, ['bin/heed.js', ...args], { encoding: 'utf8', cwd: process.cwd() });
  return { code: r.status, out: r.stdout, err: r.stderr };
};
const text = (zip: string, path: string) => new TextDecoder().decode(unzipSync(readFileSync(zip))[path]);

describe('heed simulate, merge, verify and analyze on bundles', () => {
  const cases = join(dir, 'cases');
  const whole = join(dir, 'whole.zip');
  beforeAll(() => {
    expect(heed('demo', '--cases', '10', '--out', cases).code).toBe(0);
    expect(heed('simulate', '--readers', '4', '--seed', '11', '--cases', cases, '--out', whole).code).toBe(0);
  }, 120_000);

  it('verifies an intact bundle (exit 0) and names the first fault of a tampered one (exit 2, one line)', () => {
    const ok = heed('verify', whole);
    expect(ok.code).toBe(0);
    expect(ok.out).toMatch(/intact.*4 readers|intact/);
    const files = unzipSync(readFileSync(whole));
    const lines = new TextDecoder().decode(files['events.jsonl']).split('\n');
    [lines[5], lines[6]] = [lines[6] as string, lines[5] as string];
    const bad = join(dir, 'swapped.zip');
    writeFileSync(bad, zipSync({ ...files, 'events.jsonl': new TextEncoder().encode(lines.join('\n')) }));
    const r = heed('verify', bad);
    expect(r.code).toBe(2);
    expect(r.err.trim().split('\n')).toHaveLength(1);
    expect(r.err).toContain(`${bad}: events.jsonl line 6:`);
  });

  it('splits into workstation bundles whose merge holds the reads of the unsplit run', () => {
    const split = join(dir, 'split');
    expect(heed('simulate', '--readers', '4', '--seed', '11', '--cases', cases, '--split', '3', '--out', split).code).toBe(0);
    const merged = join(dir, 'merged.zip');
    const m = heed('merge', join(split, 'workstation-1.zip'), join(split, 'workstation-2.zip'), join(split, 'workstation-3.zip'), '--out', merged);
    expect(m.code, m.err).toBe(0);
    expect(text(merged, 'reads.csv')).toBe(text(whole, 'reads.csv'));
    expect(text(merged, 'events.jsonl')).toBe(text(whole, 'events.jsonl'));
    expect(heed('verify', merged).code).toBe(0);
  });

  it('analyzes a bundle exactly as its reads.csv', () => {
    const csv = join(dir, 'reads.csv');
    writeFileSync(csv, text(whole, 'reads.csv'));
    const fromBundle = heed('analyze', whole, '--json', '--boot', '50');
    const fromCsv = heed('analyze', csv, '--json', '--boot', '50');
    expect(fromBundle.code, fromBundle.err).toBe(0);
    expect(fromBundle.out).toBe(fromCsv.out);
  });

  it('makes a reader\'s report from a bundle exactly as from its reads.csv', () => {
    const csv = join(dir, 'reads-for-report.csv');
    writeFileSync(csv, text(whole, 'reads.csv'));
    const reader = text(whole, 'reads.csv').split('\n')[1]?.split(',')[1] ?? '';
    const fromBundle = heed('report', whole, '--reader', reader);
    const fromCsv = heed('report', csv, '--reader', reader);
    expect(fromBundle.code, fromBundle.err).toBe(0);
    expect(fromBundle.out).toContain(reader);
    // the pages differ only in the moment they were made
    const undated = (html: string) => html.replace(/\d{4}-\d\d-\d\dT[\d:.]+Z/g, 'T').replace(/\d{4}-\d\d-\d\d \d\d:\d\d( UTC)?/g, 'T');
    expect(undated(fromBundle.out)).toBe(undated(fromCsv.out));
  });
});

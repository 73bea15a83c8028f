// `heed report` as a user runs it (node bin/heed.js report ...): the HTML it writes holds the
// same figures as `heed analyze --json` for that reader, names no other reader and holds no
// address; the PDF (through Debian's Chromium, when present) has a page that is not blank.
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { parseHTML } from 'linkedom';
import { describe, expect, it } from 'vitest';
import { simulateReadLog } from '../../../bench/simulate-log';
import { compareFigures, type ShownFigure } from '../../support/report-figures';
import { SAMPLE_CSV, withCell } from '../io/read-log-sample';

const dir = mkdtempSync(join(tmpdir(), 'heed-report-'));
const write = (name: string, text: string): string => {
  const path = join(dir, name);
  writeFileSync(path, text);
  return path;
};
const heed = (...args: string[]) => {
  const r = spawnSync(process.execPath, ['bin/heed.js', ...args], { encoding: 'utf8', cwd: process.cwd(), timeout: 120_000 });
  return { code: r.status, out: r.stdout, err: r.stderr };
};

/** The figures of a report page: every data-figure cell with its data attributes. */
export const shownFigures = (html: string): ShownFigure[] =>
  Array.from(parseHTML(html).document.querySelectorAll('[data-figure]')).map((el) => {
    const d = (k: string) => el.getAttribute(`data-${k}`) ?? undefined;
    return { key: el.getAttribute('data-figure') ?? '', value: d('value'), lower: d('lower'), upper: d('upper'), k: d('k'), n: d('n') };
  });

// Six simulated readers (R1..R6), 60 cases read unaided and sequentially aided, three scanners.
const log = write('reads.csv', simulateReadLog({ seed: 3, readers: 6, cases: 60 }));

describe('heed report', () => {
  const out = join(dir, 'r2.html');
  const made = heed('report', log, '--reader', 'R2', '--out', out);
  const html = existsSync(out) ? readFileSync(out, 'utf8') : '';
  it('writes the HTML report', () => {
    expect(made.code, made.err).toBe(0);
    expect(html).toMatch(/^<!doctype html>/);
    expect(html).toContain('Reader R2');
    expect(html).toContain('not a medical device');
    expect(html).toMatch(/not an appraisal/);
  });
  it('shows the same numbers as heed analyze --json for that reader', () => {
    const json = JSON.parse(heed('analyze', log, '--json', '--boot', '0').out) as { readers: Record<string, unknown>[] };
    const entry = json.readers.find((r) => r.reader_id === 'R2') as Record<string, unknown>;
    const others = json.readers.filter((r) => r.reader_id !== 'R2');
    const { mismatches, compared } = compareFigures(shownFigures(html), entry, others);
    expect(mismatches).toEqual([]);
    expect(compared).toBeGreaterThan(20);
  });
  it('names no other reader and holds no address', () => {
    for (const other of ['R1', 'R3', 'R4', 'R5', 'R6']) expect(html).not.toMatch(new RegExp(`\\b${other}\\b`));
    expect(html).not.toMatch(/https?:/i);
    expect(html).not.toContain('//');
    expect(html).not.toMatch(/<script|<link|src="(?!data:)/i);
  });
  it('includes the case review when the log shows all of the reader’s periods complete, and leaves it out when not', () => {
    expect(html).toMatch(/data-case-review="\d+"/);
    // cut R2's last read: period 2 now has fewer reads than the other readers'
    const lines = readFileSync(log, 'utf8').trimEnd().split('\n');
    const lastOfR2 = lines.findLastIndex((l) => l.split(',')[1] === 'R2');
    const cut = write('cut.csv', `${lines.filter((_, i) => i !== lastOfR2).join('\n')}\n`);
    const partial = heed('report', cut, '--reader', 'R2');
    expect(partial.code, partial.err).toBe(0);
    expect(partial.out).not.toMatch(/data-case-review=/);
    expect(partial.out).toContain('The case review appears once all of your periods are complete');
  });
  it('shows no peer range with fewer than 3 other readers, and says why', () => {
    const two = readFileSync(log, 'utf8').split('\n').filter((l) => !/^SIM-1,R[4-6],/.test(l)).join('\n');
    const r = heed('report', write('three.csv', two), '--reader', 'R1');
    expect(r.code, r.err).toBe(0);
    expect(r.out).not.toContain('data-figure="peers.median"');
    expect(r.out).toContain('only 2 other readers have this figure');
  });
  it.each([
    [['report', log], /--reader ID is required/],
    [['report', log, '--reader', 'R99'], /no reader "R99"/],
    [['report', join(dir, 'missing.csv'), '--reader', 'R1'], /missing\.csv: cannot read the file \(no such file\)/],
    [['report', write('bad.csv', withCell(1, 'truth', '2')), '--reader', 'R1'], /bad\.csv:3: column truth: must be 0 or 1/],
    [['report', log, '--reader', 'R1', '--colour'], /unknown option --colour/],
  ])('exits 2 with one line for bad input: %j', (args, message) => {
    const r = heed(...args);
    expect(r.code).toBe(2);
    expect(r.err.trim().split('\n')).toHaveLength(1);
    expect(r.err).toMatch(message);
  });
  it('gives a clear error and exit 2, no stack trace, when --out cannot be written', () => {
    for (const target of [join(dir, 'no-such-folder', 'r.html'), dir]) {
      const r = heed('report', write('s.csv', SAMPLE_CSV), '--reader', 'R1', '--out', target);
      expect(r.code).toBe(2);
      expect(r.err).toMatch(new RegExp(`^heed: cannot write ${target.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}: (ENOENT|EISDIR)`));
      expect(r.err).not.toMatch(/\n\s+at /);
    }
  });
  it('gives a clear error and exit 2 for --pdf when no Chromium is found', () => {
    const r = spawnSync(process.execPath, ['bin/heed.js', 'report', write('s.csv', SAMPLE_CSV), '--reader', 'R1', '--pdf', join(dir, 'x.pdf')], {
      encoding: 'utf8', env: { ...process.env, HEED_CHROMIUM: join(dir, 'no-chromium') },
    });
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/--pdf needs a local Chromium, none found at .*no-chromium/);
  });
  // CI installs chromium and poppler-utils (.ci/run), so this runs everywhere the suite runs.
  it('writes a PDF with at least one page that is not blank', () => {
    const pdf = join(dir, 'r2.pdf');
    const r = heed('report', log, '--reader', 'R2', '--pdf', pdf);
    expect(r.code, r.err).toBe(0);
    const info = spawnSync('pdfinfo', [pdf], { encoding: 'utf8' }).stdout;
    expect(Number(/Pages:\s+(\d+)/.exec(info)?.[1])).toBeGreaterThanOrEqual(1);
    // first page rasterised to greyscale PGM at 30 dpi (poppler pdftoppm): count dark pixels
    spawnSync('pdftoppm', ['-gray', '-r', '30', '-f', '1', '-singlefile', pdf, join(dir, 'page')]);
    const pgm = readFileSync(join(dir, 'page.pgm'));
    const header = /^P5\s+(\d+)\s+(\d+)\s+255\s/.exec(pgm.subarray(0, 40).toString('latin1'));
    expect(header).not.toBeNull();
    const pixels = pgm.subarray(pgm.length - Number(header?.[1]) * Number(header?.[2]));
    let dark = 0;
    for (const p of pixels) if (p < 128) dark++;
    expect(dark / pixels.length).toBeGreaterThan(0.005);
  }, 120_000);
});

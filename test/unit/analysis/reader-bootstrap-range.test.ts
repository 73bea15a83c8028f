// The bootstrap's range entry (bootstrapResamples of [from, to)): any split of the resamples,
// joined in order, is the whole bit for bit, and the deferred engine completed from the pieces
// gives analyzeColumns' report. What the CLI's two threads rely on.
import { simulateReadRows } from '../../../bench/simulate-log';
import { analyzeColumns, analyzeColumnsDeferred } from '../../../src/analysis/engine';
import { readerAveraged, AVERAGED_FIGURES, bootstrapPlanOf, bootstrapResamples, readerAveragedOfDraws } from '../../../src/analysis/reader-bootstrap';
import { allRows, logColumns, readColumns } from '../../../src/analysis/read-columns';
import { partitionReads, sectionReads } from '../../../src/analysis/read-set';

const F = AVERAGED_FIGURES.length;
const rows = simulateReadRows({ seed: 5, readers: 6, cases: 60 }).filter((r) => r.practice === 0);
const planOf = (seed: number, boot: number, byCase = true, from = rows) => {
  const cols = readColumns(from);
  const all = allRows(cols);
  const parts = partitionReads(sectionReads(cols, all), cols.reader, cols.readerIds.length).filter((p) => p !== null);
  return bootstrapPlanOf(cols, all, parts, { seed, boot, byCase });
};
const join = (pieces: Float64Array[]): Float64Array => {
  const out = new Float64Array(pieces.reduce((n, p) => n + p.length, 0));
  let at = 0;
  for (const p of pieces) {
    out.set(p, at);
    at += p.length;
  }
  return out;
};
// equal bit for bit, NaN included (toEqual would also take -0 for +0)
const bits = (a: Float64Array) => Array.from(new Uint32Array(a.buffer, a.byteOffset, a.length * 2));

describe('bootstrapResamples', () => {
  const plan = planOf(7, 101);
  const whole = bootstrapResamples(plan, 0, 101);
  it('holds F figures per resample and differs resample to resample', () => {
    expect(whole.length).toBe(101 * F);
    expect(Array.from(whole.subarray(0, F))).not.toEqual(Array.from(whole.subarray(F, 2 * F)));
  });
  it.each([
    [[0, 50, 101]],
    [[0, 51, 101]],
    [[0, 1, 2, 3, 101]],
    [[0, 0, 33, 33, 100, 101]],
    [[0, 101]],
  ])('pieces at %j joined in order equal the whole', (cuts) => {
    const pieces = cuts.slice(1).map((to, i) => bootstrapResamples(plan, cuts[i] as number, to));
    expect(bits(join(pieces))).toEqual(bits(whole));
  });
  it('gives readerAveraged from the joined pieces', () => {
    const ra = readerAveragedOfDraws(plan, join([bootstrapResamples(plan, 0, 40), bootstrapResamples(plan, 40, 101)]));
    expect(ra).toEqual(readerAveraged(rows, { seed: 7, boot: 101 }));
    expect(ra.auc_difference.lower).not.toBeNull();
  });
  it('refuses a range outside 0..boot and draws of the wrong length', () => {
    expect(() => bootstrapResamples(plan, 0, 102)).toThrow(RangeError);
    expect(() => bootstrapResamples(plan, 5, 4)).toThrow(RangeError);
    expect(() => bootstrapResamples(plan, -1, 4)).toThrow(RangeError);
    expect(() => bootstrapResamples(plan, 0.5, 4)).toThrow(RangeError);
    expect(() => readerAveragedOfDraws(plan, new Float64Array(100 * F))).toThrow(RangeError);
  });
});

describe('the sums over drawn cases (readers who read at least half the cases, each once)', () => {
  // R1 reads a fifth of the cases, R2 two thirds, R3 half of them aided only: read by read for R1,
  // over drawn cases for the others (and for R3's unaided reads)
  const partial = rows.filter((r) => {
    const c = Number(r.case_id.replace(/\D/g, ''));
    if (r.reader_id === 'R1') return c % 5 === 0;
    if (r.reader_id === 'R2') return c % 3 !== 0;
    if (r.reader_id === 'R3') return r.assistance === 'none' || c % 2 === 0;
    return true;
  });
  it.each([['fully crossed', rows], ['partly read', partial]])('give the read-by-read figures bit for bit (%s)', (_name, log) => {
    expect(log.length).toBeGreaterThan(300);
    const fast = planOf(9, 150, true, log);
    const slow = planOf(9, 150, false, log);
    expect(fast.estimate).toEqual(slow.estimate);
    expect(bits(bootstrapResamples(fast, 0, 150))).toEqual(bits(bootstrapResamples(slow, 0, 150)));
    expect(bits(bootstrapResamples(fast, 70, 150))).toEqual(bits(bootstrapResamples(slow, 70, 150)));
  });
});

describe('analyzeColumnsDeferred', () => {
  it('completed from two pieces per finding equals analyzeColumns, to the last bit', () => {
    const log = simulateReadRows({ seed: 3, readers: 5, cases: 50 });
    const options = { seed: 4, boot: 57 };
    const whole = JSON.stringify(analyzeColumns(logColumns(log), options));
    const d = analyzeColumnsDeferred(logColumns(log), options);
    expect(d.plans.length).toBeGreaterThan(0);
    const draws = d.plans.map((p) => join([bootstrapResamples(p, 0, 29), bootstrapResamples(p, 29, p.boot)]));
    expect(JSON.stringify(d.complete(draws))).toBe(whole);
  });
  it('refuses draws for the wrong number of findings', () => {
    const d = analyzeColumnsDeferred(logColumns(simulateReadRows({ seed: 3, readers: 3, cases: 30 })), { boot: 10 });
    expect(() => d.complete([])).toThrow(RangeError);
  });
});

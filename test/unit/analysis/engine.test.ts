import { analyzeReads } from '../../../src/analysis/engine';
import { simulateReadRows } from '../../../bench/simulate-log';
import { aided, makeRead } from './make-read';

describe('analyzeReads', () => {
  const rows = simulateReadRows({ seed: 5, readers: 4, cases: 40, practiceCases: 3 });
  const report = analyzeReads(rows, { seed: 2, boot: 100 });
  it('has one entry per reader and finding with the documented keys (docs/formats.md)', () => {
    expect(report.readers.map((r) => r.reader_id)).toEqual(['R1', 'R2', 'R3', 'R4']);
    const r = report.readers[0];
    expect(Object.keys(r?.unaided ?? {})).toEqual(expect.arrayContaining(['n', 'accuracy', 'sensitivity', 'specificity', 'auc', 'brier', 'median_ms']));
    expect(Object.keys(r?.aided ?? {})).toEqual(expect.arrayContaining(['agreement', 'overreliance', 'underreliance', 'kappa']));
    expect(Object.keys(r?.sequential ?? {})).toEqual(expect.arrayContaining(['n', 'changed', 'toward_ai', 'beneficial', 'detrimental', 'rair', 'rsr', 'woa']));
    expect(Object.keys(r?.crossover ?? {})).toEqual(expect.arrayContaining(['n', 'accuracy_difference', 'mcnemar']));
  });
  it('leaves practice reads out of every statistic', () => {
    expect(report.group.practice_excluded).toBe(4 * 3 * 2);
    expect(report.group.reads).toBe(4 * 40 * 2);
    expect(report.readers[0]?.unaided?.n).toBe(40);
    expect(report.group.findings[0]?.cases).toBe(40);
  });
  it('runs the MRMC analysis on a fully crossed design', () => {
    const g = report.group.findings[0];
    expect(g?.mrmc_note).toBeNull();
    expect(g?.mrmc?.random.difference).toBeCloseTo((g?.reader_averaged.auc_difference.estimate as number), 12);
  });
  it('lists subgroups per case attribute with suggestion accuracy beside over-reliance', () => {
    const g = report.group.findings[0];
    expect(g?.subgroups.map((s) => s.value)).toEqual(['Halden', 'Tamsin', 'Veyra']);
    expect(g?.subgroups.reduce((s, x) => s + x.ai_accuracy.n, 0)).toBe(40);
    expect(report.readers[0]?.subgroups).toHaveLength(3);
  });
  it('never gives NaN and repeats exactly with the same seed', () => {
    const json = JSON.stringify(report);
    expect(json).not.toMatch(/NaN|Infinity/);
    expect(JSON.stringify(analyzeReads(rows, { seed: 2, boot: 100 }))).toBe(json);
  });
  it('gives null sections where they do not apply', () => {
    const only = analyzeReads([makeRead(), makeRead({ case_id: 'C2', truth: 0, final_call: 0 })], { boot: 0 });
    const r = only.readers[0];
    expect(r?.aided).toBeNull();
    expect(r?.sequential).toBeNull();
    expect(r?.crossover).toBeNull();
    expect(r?.unaided?.auc.se).toBeNull();
    expect(only.group.findings[0]?.mrmc).toBeNull();
    expect(only.group.findings[0]?.mrmc_note).toMatch(/not fully crossed/);
    expect(JSON.stringify(only)).not.toMatch(/NaN/);
  });
  it('handles an empty log and keeps findings apart', () => {
    expect(analyzeReads([], { boot: 10 })).toMatchObject({ readers: [], group: { reads: 0, findings: [] } });
    const two = analyzeReads([aided(1, 1, 1), aided(1, 1, 1, { finding: 'other' })], { boot: 0 });
    expect(two.readers.map((r) => r.finding)).toEqual(['target', 'other']);
  });
  it('refuses a bad seed or boot', () => {
    expect(() => analyzeReads(rows, { boot: 1.5 })).toThrow(/boot/);
    expect(() => analyzeReads(rows, { seed: Number.NaN })).toThrow(/seed/);
    // @ts-expect-error: a value from outside the type, as the worker could receive
    expect(() => analyzeReads(rows, { covariance: 'exact' })).toThrow(/covariance must be jackknife or delong, got "exact"/);
    expect(analyzeReads(rows, { boot: 0 }).group.covariance).toBe('jackknife');
  });
});

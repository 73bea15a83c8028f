import { readerAveraged } from '../../../src/analysis/reader-bootstrap';
import { sections } from '../../../src/analysis/sections';
import { simulateReadRows } from '../../../bench/simulate-log';

describe('readerAveraged', () => {
  const rows = simulateReadRows({ seed: 11, readers: 5, cases: 80 }).filter((r) => r.practice === 0);
  it('averages each reader\'s own estimates', () => {
    const ra = readerAveraged(rows, { seed: 1, boot: 0 });
    const per = ['R1', 'R2', 'R3', 'R4', 'R5'].map((id) => sections(rows.filter((r) => r.reader_id === id)));
    const mean = (xs: (number | null | undefined)[]) => xs.reduce<number>((s, v) => s + (v as number), 0) / xs.length;
    expect(ra.unaided_accuracy.estimate).toBeCloseTo(mean(per.map((p) => p.unaided?.accuracy.estimate)), 12);
    expect(ra.aided_auc.estimate).toBeCloseTo(mean(per.map((p) => p.aided?.auc.estimate)), 12);
    expect(ra.overreliance.estimate).toBeCloseTo(mean(per.map((p) => p.aided?.overreliance.estimate)), 12);
    expect(ra.auc_difference.estimate).toBeCloseTo(mean(per.map((p) => (p.aided?.auc.estimate as number) - (p.unaided?.auc.estimate as number))), 12);
    expect(ra.unaided_accuracy.lower).toBeNull();
    expect(ra.unaided_accuracy.readers).toBe(5);
  });
  it('gives seeded percentile intervals that contain the estimate and repeat with the seed', () => {
    const a = readerAveraged(rows, { seed: 3, boot: 300 });
    const b = readerAveraged(rows, { seed: 3, boot: 300 });
    const c = readerAveraged(rows, { seed: 4, boot: 300 });
    expect(a).toEqual(b);
    expect(a.aided_accuracy.lower).not.toBe(c.aided_accuracy.lower);
    for (const k of ['unaided_accuracy', 'aided_auc', 'accuracy_difference', 'overreliance'] as const) {
      expect(a[k].lower as number).toBeLessThanOrEqual(a[k].estimate as number);
      expect(a[k].upper as number).toBeGreaterThanOrEqual(a[k].estimate as number);
    }
  });
  it('refuses a bad boot count', () => {
    expect(() => readerAveraged(rows, { seed: 1, boot: -1 })).toThrow(/boot must be/);
  });
});

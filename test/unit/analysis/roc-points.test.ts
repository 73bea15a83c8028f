import { averageRocVertical, rocArea, rocPoints } from '../../../src/analysis/roc-points';
import { rocCurves } from '../../../src/analysis/roc-curves';
import { analyzeReads } from '../../../src/analysis/engine';
import { parseReadLog } from '../../../src/io/read-log-parse';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';

describe('rocPoints', () => {
  it('walks thresholds from the top, ties move diagonally (worked by hand)', () => {
    // scores 0.9 (pos), 0.4 (pos), 0.4 (neg), 0.1 (neg): at 0.9 one of two positives; at 0.4 both positives and one negative
    expect(rocPoints([0.9, 0.4, 0.4, 0.1], [1, 1, 0, 0]).map((p) => [p.fpr, p.tpr])).toEqual([[0, 0], [0, 0.5], [0.5, 1], [1, 1]]);
    // Mann-Whitney by hand: pairs (0.9>0.4, 0.9>0.1, 0.4=0.4 → ½, 0.4>0.1) = 3.5 / 4
    expect(rocArea(rocPoints([0.9, 0.4, 0.4, 0.1], [1, 1, 0, 0]))).toBeCloseTo(0.875, 15);
  });

  it('refuses what has no curve', () => {
    expect(() => rocPoints([1, 2], [1, 1])).toThrow(/both classes/);
    expect(() => rocPoints([1, 2], [1])).toThrow(/differ in length/);
    expect(() => rocPoints([1, Number.NaN], [1, 0])).toThrow(/score 1/);
    expect(() => rocPoints([1, 2], [1, 2])).toThrow(/truth 1/);
  });
});

describe('averageRocVertical', () => {
  it('averages the bottom and the top of a vertical step apart (by hand)', () => {
    const a = rocPoints([2, 1], [1, 0]); // (0,0) (0,1) (1,1)
    const b = rocPoints([1, 2], [1, 0]); // (0,0) (1,0) (1,1)
    expect(averageRocVertical([a, b]).map((p) => [p.fpr, p.tpr])).toEqual([[0, 0], [0, 0.5], [1, 0.5], [1, 1]]);
    expect(() => averageRocVertical([])).toThrow(RangeError);
  });
});

describe('rocCurves', () => {
  it('gives each reader of the engine a curve whose area is the engine AUC, and an average whose area is the reader-averaged AUC', () => {
    const rows = parseReadLog(readFileSync(join(import.meta.dirname, '..', '..', 'reference', 'fixtures', 'log-sequential.csv'), 'utf8'));
    const report = analyzeReads(rows, { boot: 0 });
    const roc = rocCurves(rows);
    expect(roc.map((f) => f.finding)).toEqual(report.group.findings.map((g) => g.finding));
    for (const f of roc) {
      const entries = report.readers.filter((r) => r.finding === f.finding);
      expect(f.readers.map((r) => r.reader_id)).toEqual(entries.map((r) => r.reader_id));
      f.readers.forEach((r, i) => {
        expect(rocArea(r.unaided ?? [])).toBeCloseTo(entries[i]?.unaided?.auc.estimate ?? 0, 12);
        expect(rocArea(r.aided ?? [])).toBeCloseTo(entries[i]?.aided?.auc.estimate ?? 0, 12);
      });
      const g = report.group.findings.find((x) => x.finding === f.finding);
      expect(rocArea(f.averaged.unaided ?? [])).toBeCloseTo(g?.reader_averaged.unaided_auc.estimate ?? 0, 12);
      expect(rocArea(f.averaged.aided ?? [])).toBeCloseTo(g?.reader_averaged.aided_auc.estimate ?? 0, 12);
    }
  });
});

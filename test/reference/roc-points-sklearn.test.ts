/**
 * ROC points of the results page's ROC plots against scikit-learn 1.2.1:
 * sklearn.metrics.roc_curve(truth, score, drop_intermediate=False) and sklearn.metrics.auc(fpr, tpr),
 * per log, finding, reader and condition of the committed logs (fixture written by
 * test/reference/scripts/roc_fixture.py; versions and calls recorded inside it). The reader-averaged
 * curve is checked against an independent numpy re-implementation of vertical averaging (Fawcett
 * 2006, section 8.1) in the same script, and its area against the mean of sklearn's AUCs.
 */
import { averageRocVertical, rocArea, rocPoints, type RocPoint } from '../../src/analysis/roc-points';
import { readFixture } from './support/fixtures';

type CurveCase = { log: string; finding: string; condition: string; reader_id: string; scores: number[]; truth: number[]; fpr: number[]; tpr: number[]; thresholds: number[]; auc: number };
type AverageCase = { log: string; finding: string; condition: string; reader_id: string; average: [number, number][]; area: number; mean_auc: number };
type Fixture = { versions: Record<string, string>; cases: (CurveCase | AverageCase)[] };

const fixture = JSON.parse(readFixture('roc-points.json')) as Fixture;
const curves = fixture.cases.filter((c): c is CurveCase => 'fpr' in c);
const averages = fixture.cases.filter((c): c is AverageCase => 'average' in c);

describe(`ROC points against scikit-learn ${fixture.versions['scikit-learn']} roc_curve(drop_intermediate=False)`, () => {
  it('has curves and averages to check', () => {
    expect(curves.length).toBeGreaterThan(20);
    expect(averages.length).toBeGreaterThan(4);
  });

  it.each(curves.map((c) => [`${c.log} ${c.finding} ${c.condition} ${c.reader_id}`, c] as const))('%s: same points, thresholds and area', (_, c) => {
    const points = rocPoints(c.scores, c.truth);
    expect(points.map((p) => p.fpr)).toHaveLength(c.fpr.length);
    points.forEach((p, i) => {
      expect(p.fpr).toBeCloseTo(c.fpr[i] as number, 12);
      expect(p.tpr).toBeCloseTo(c.tpr[i] as number, 12);
      // sklearn 1.2 puts max(score) + 1 first where Heed puts +Infinity; the rest are the scores
      if (i > 0) expect(p.threshold).toBe(c.thresholds[i]);
    });
    expect(points[0]?.threshold).toBe(Number.POSITIVE_INFINITY);
    expect(rocArea(points)).toBeCloseTo(c.auc, 12);
  });

  it.each(averages.map((a) => [`${a.log} ${a.finding} ${a.condition}`, a] as const))('%s: vertical average equals the numpy re-implementation; its area is the mean AUC', (_, a) => {
    const members = curves.filter((c) => c.log === a.log && c.finding === a.finding && c.condition === a.condition);
    const avg = averageRocVertical(members.map((c): RocPoint[] => rocPoints(c.scores, c.truth)));
    expect(avg).toHaveLength(a.average.length);
    avg.forEach((p, i) => {
      expect(p.fpr).toBeCloseTo(a.average[i]?.[0] as number, 12);
      expect(p.tpr).toBeCloseTo(a.average[i]?.[1] as number, 12);
    });
    expect(rocArea(avg)).toBeCloseTo(a.area, 12);
    expect(rocArea(avg)).toBeCloseTo(a.mean_auc, 12);
  });
});

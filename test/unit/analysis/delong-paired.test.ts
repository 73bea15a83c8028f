import normalCdf from '@stdlib/stats-base-dists-normal-cdf';
import { delongCovariance, delongPairedTest } from '../../../src/analysis/delong-paired';

// Paired DeLong (1988): the covariance by definition from brute-force placements.
const psi = (x: number, y: number) => (x > y ? 1 : x === y ? 0.5 : 0);
const place = (pos: number[], neg: number[]) => ({
  v10: pos.map((x) => neg.reduce((s, y) => s + psi(x, y), 0) / neg.length),
  v01: neg.map((y) => pos.reduce((s, x) => s + psi(x, y), 0) / pos.length),
});
const cov = (a: number[], b: number[]) => {
  const ma = a.reduce((s, v) => s + v, 0) / a.length;
  const mb = b.reduce((s, v) => s + v, 0) / b.length;
  return a.reduce((s, v, i) => s + (v - ma) * ((b[i] as number) - mb), 0) / (a.length - 1);
};

describe('delongPairedTest', () => {
  const p1 = [90, 80, 75, 60, 55, 50, 40, 90];
  const n1 = [10, 20, 50, 60, 30, 45, 80];
  const p2 = [95, 70, 75, 65, 40, 60, 45, 85];
  const n2 = [15, 25, 40, 50, 35, 55, 70];
  it('matches the covariance computed by definition', () => {
    const a = place(p1, n1);
    const b = place(p2, n2);
    const s12 = cov(a.v10, b.v10) / p1.length + cov(a.v01, b.v01) / n1.length;
    const s11 = cov(a.v10, a.v10) / p1.length + cov(a.v01, a.v01) / n1.length;
    const s22 = cov(b.v10, b.v10) / p1.length + cov(b.v01, b.v01) / n1.length;
    const c = delongCovariance([{ positives: p1, negatives: n1 }, { positives: p2, negatives: n2 }]);
    expect(c.covariance[0]?.[1]).toBeCloseTo(s12, 12);
    const t = delongPairedTest({ positives: p1, negatives: n1 }, { positives: p2, negatives: n2 });
    const se = Math.sqrt(s11 + s22 - 2 * s12);
    expect(t.se).toBeCloseTo(se, 12);
    expect(t.difference).toBeCloseTo(t.auc2 - t.auc1, 14);
    expect(t.p).toBeCloseTo(2 * normalCdf(-Math.abs(t.difference / se), 0, 1), 12);
  });
  it('gives null z and p for identical conditions, and refuses mismatched case counts', () => {
    const same = delongPairedTest({ positives: p1, negatives: n1 }, { positives: p1, negatives: n1 });
    expect(same.difference).toBe(0);
    expect(same.p).toBeNull();
    expect(() => delongPairedTest({ positives: p1, negatives: n1 }, { positives: p2.slice(1), negatives: n2 })).toThrow(/condition 1 has 7\/7/);
  });
});

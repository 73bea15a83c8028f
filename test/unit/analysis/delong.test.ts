import { aucSummary, delongAuc, placements } from '../../../src/analysis/delong';

// Brute-force DeLong (1988): placement values by pair counting, S10/m + S01/n by definition.
const brute = (pos: number[], neg: number[]) => {
  const psi = (x: number, y: number) => (x > y ? 1 : x === y ? 0.5 : 0);
  const v10 = pos.map((x) => neg.reduce((s, y) => s + psi(x, y), 0) / neg.length);
  const v01 = neg.map((y) => pos.reduce((s, x) => s + psi(x, y), 0) / pos.length);
  const mean = (a: number[]) => a.reduce((s, v) => s + v, 0) / a.length;
  const svar = (a: number[]) => a.reduce((s, v) => s + (v - mean(a)) ** 2, 0) / (a.length - 1);
  return { auc: mean(v10), v10, v01, variance: svar(v10) / pos.length + svar(v01) / neg.length };
};

describe('placements / delongAuc', () => {
  it('gives the doc-comment example', () => {
    const p = placements([0.9, 0.4], [0.1, 0.4]);
    expect(Array.from(p.v10)).toEqual([1, 0.75]);
    expect(Array.from(p.v01)).toEqual([1, 0.75]);
    expect(p.auc).toBe(0.875);
    expect(delongAuc([0.9, 0.8, 0.4], [0.1, 0.4, 0.5]).auc).toBeCloseTo(7.5 / 9, 12);
  });
  it('matches brute-force pair counting on tied scores', () => {
    const pos = Array.from({ length: 37 }, (_, i) => ((i * 13) % 11) + 3);
    const neg = Array.from({ length: 53 }, (_, i) => (i * 7) % 10);
    const b = brute(pos, neg);
    const d = delongAuc(pos, neg);
    expect(d.auc).toBeCloseTo(b.auc, 12);
    expect(d.variance).toBeCloseTo(b.variance, 12);
    expect(Array.from(d.v10)).toEqual(b.v10.map((v) => expect.closeTo(v, 12)));
    expect(Array.from(d.v01)).toEqual(b.v01.map((v) => expect.closeTo(v, 12)));
  });
  it('gives null variance with one case in a class, and refuses an empty class', () => {
    expect(delongAuc([1], [0, 2]).variance).toBeNull();
    expect(() => delongAuc([], [1])).toThrow(/both classes: 0 positives/);
  });
  it('summarises with a clipped interval and nulls for an empty class', () => {
    const s = aucSummary([9, 8, 7, 6, 5.5], [1, 2, 3, 5.8]);
    expect(s.estimate).toBeCloseTo(19 / 20, 12);
    expect((s.estimate as number) + 1.959963984540054 * (s.se as number)).toBeGreaterThan(1);
    expect(s.upper).toBe(1);
    expect(s.lower).toBeCloseTo((s.estimate as number) - 1.959963984540054 * (s.se as number), 12);
    expect(aucSummary([], [1])).toEqual({ estimate: null, se: null, lower: null, upper: null });
  });
});

describe('placements on large samples (radix midrank path)', () => {
  it('matches placements counted on the distinct-value histogram', () => {
    // 11,000 scores pass the small-sample threshold, so midranks come from the radix argsort
    const pos = Array.from({ length: 6000 }, (_, i) => ((i * 7919) % 1000) / 10 + 5);
    const neg = Array.from({ length: 5000 }, (_, i) => -(((i * 104729) % 997) / 10) + 90);
    const negAt = new Map<number, number>();
    const posAt = new Map<number, number>();
    for (const v of neg) negAt.set(v, (negAt.get(v) ?? 0) + 1);
    for (const v of pos) posAt.set(v, (posAt.get(v) ?? 0) + 1);
    const share = (at: Map<number, number>, total: number, v: number, above: boolean) => {
      let s = 0;
      for (const [w, c] of at) s += (above ? w > v : w < v) ? c : w === v ? c / 2 : 0;
      return s / total;
    };
    const p = placements(pos, neg);
    for (const i of [0, 1, 17, 2500, 5999]) expect(p.v10[i]).toBeCloseTo(share(negAt, neg.length, pos[i] as number, false), 12);
    for (const j of [0, 3, 999, 4999]) expect(p.v01[j]).toBeCloseTo(share(posAt, pos.length, neg[j] as number, true), 12);
    expect(p.auc).toBeCloseTo(p.v01.reduce((a, b) => a + b, 0) / neg.length, 12);
  });
});

describe('placements of whole-number scores (counted per value, no sort)', () => {
  // Placement values depend only on the order and ties of the scores, so the same scores moved
  // by ½ (half numbers: counted too), by ¼ (the sorted path) or spread past SLOT_SPAN (sorted)
  // must give the very same bits, and pair counting the same values.
  const pos = Array.from({ length: 310 }, (_, i) => ((i * 7919) % 101) - 3);
  const neg = Array.from({ length: 690 }, (_, i) => ((i * 104729) % 89) - 0);
  it('equal bits to the binary-search path and to pair counting', () => {
    const p = placements(pos, neg);
    const half = placements(pos.map((v) => v + 0.5), neg.map((v) => v + 0.5));
    const quarter = placements(pos.map((v) => v + 0.25), neg.map((v) => v + 0.25));
    const spread = placements(pos.map((v) => v * 1000), neg.map((v) => v * 1000));
    for (const q of [half, quarter, spread]) {
      expect(Array.from(q.v10)).toEqual(Array.from(p.v10));
      expect(Array.from(q.v01)).toEqual(Array.from(p.v01));
      expect(q.auc).toBe(p.auc);
    }
    const b = brute(pos, neg);
    expect(Array.from(p.v10)).toEqual(b.v10.map((v) => expect.closeTo(v, 12)));
    expect(Array.from(p.v01)).toEqual(b.v01.map((v) => expect.closeTo(v, 12)));
  });
  it('treats −0 and +0 as one value', () => {
    const p = placements([-0, 0, 2], [0, -0, 1.5]);
    expect(Array.from(p.v10)).toEqual([1 / 3, 1 / 3, 1]);
    expect(Array.from(p.v01)).toEqual([2 / 3, 2 / 3, 1 / 3]);
  });
});

import binomialPmf from '@stdlib/stats-base-dists-binomial-pmf';
import { DEFAULT_ASSUMPTIONS } from '../../../src/analysis/planner/assumptions';
import { runPlan } from '../../../src/analysis/planner/run-plan';
import { wilson, wilsonHalfWidth, Z95 } from '../../../src/analysis/wilson';

// The planner's analytic half-width (overreliance.expected_halfwidth) is the Wilson score interval
// without continuity correction: Wilson (1927); Newcombe RG (1998) Stat Med 17:857-872, method 3,
//   limits = (2np + z^2 -/+ z sqrt(z^2 + 4np(1-p))) / (2(n + z^2)),
// written out here from Newcombe's expression, independently of src/analysis/wilson.ts.
const newcombeHalfWidth = (p: number, n: number, z = Z95): number => {
  const lo = (2 * n * p + z * z - z * Math.sqrt(z * z + 4 * n * p * (1 - p))) / (2 * (n + z * z));
  const hi = (2 * n * p + z * z + z * Math.sqrt(z * z + 4 * n * p * (1 - p))) / (2 * (n + z * z));
  return (hi - lo) / 2;
};

describe('planner: analytic half-width is the Wilson interval (Newcombe 1998)', () => {
  it('equals Newcombe\'s expression to 1e-9 and his Table I limits for 81/263 to the printed 4 decimals', () => {
    // Table I, 81/263, method 3: 0.2553 to 0.3662 (quoted from memory, as in newcombe-1998.test.ts)
    const h = wilsonHalfWidth(81 / 263, 263) as number;
    expect(Math.abs(h - newcombeHalfWidth(81 / 263, 263))).toBeLessThan(1e-9);
    expect(Math.abs(h - (0.3662 - 0.2553) / 2)).toBeLessThan(1e-4);
    for (const [p, n] of [[0.3, 12], [0.25, 30], [0.1, 8], [0.5, 100]] as const) {
      expect(Math.abs((wilsonHalfWidth(p, n) as number) - newcombeHalfWidth(p, n))).toBeLessThan(1e-9);
    }
  });

  it('the plan reports that half-width at the assumed rate and the wrong reads per reader', () => {
    const r = runPlan({ assumptions: { ...DEFAULT_ASSUMPTIONS, readers: 3, cases: 40, wrong: { mode: 'count', value: 8 }, sims: 10 }, base: null, curves: false });
    const n = r.overreliance.wrong_reads_per_reader;
    expect(n).toBe(12); // 8 planted + 10% of 20 present + 10% of 20 absent as the model's own errors
    expect(Math.abs((r.overreliance.expected_halfwidth as number) - newcombeHalfWidth(0.3, n))).toBeLessThan(1e-9);
  });
});

// Exact coverage of the 95% Wilson interval at n = 30, p = 0.3: the sum of Binomial(30, 0.3)
// probabilities (@stdlib/stats-base-dists-binomial-pmf) over the k whose interval contains 0.3.
// That is an exact figure, not a simulation; the plan's simulated coverage must agree with it.
describe('planner: coverage of reader intervals, n = 30, p = 0.3', () => {
  const exact = (() => {
    let c = 0;
    for (let k = 0; k <= 30; k++) {
      const w = wilson(k, 30);
      if ((w.lower as number) <= 0.3 && 0.3 <= (w.upper as number)) c += binomialPmf(k, 30, 0.3);
    }
    return c;
  })();

  it('exact coverage is within [0.92, 0.97]', () => {
    expect(exact).toBeGreaterThanOrEqual(0.92);
    expect(exact).toBeLessThanOrEqual(0.97);
  });

  it('simulated coverage is within [0.92, 0.97] and within 3 Monte Carlo SE of the exact figure', () => {
    // No reader spread and an own look so sharp (AUC 0.99999, own call right 99.9% of the time) that, so each
    // reader follows each of 30 wrong suggestions (10 planted + the model's 20 own errors of 200) with p = 0.3.
    const r = runPlan({
      assumptions: { ...DEFAULT_ASSUMPTIONS, readers: 10, cases: 200, wrong: { mode: 'count', value: 10 }, overreliance: 0.3, overrelianceSpread: 0, aucUnaided: 0.99999, aucDifference: 0, sims: 60 },
      base: null, curves: false,
    });
    expect(r.overreliance.wrong_reads_per_reader).toBe(30);
    expect(Math.abs((r.overreliance.mean_true_rate as number) - 0.3)).toBeLessThan(0.002);
    const c = r.overreliance.coverage;
    expect(c.studies).toBe(600);
    expect(c.rate).toBeGreaterThanOrEqual(0.92);
    expect(c.rate).toBeLessThanOrEqual(0.97);
    expect(Math.abs(c.rate - exact)).toBeLessThan(3 * Math.sqrt((exact * (1 - exact)) / c.studies));
  }, 120_000);
});

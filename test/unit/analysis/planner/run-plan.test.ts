import { DEFAULT_ASSUMPTIONS, type PlanAssumptions } from '../../../../src/analysis/planner/assumptions';
import { aucRejections, planSteps, runPlan } from '../../../../src/analysis/planner/run-plan';
import { pairedDiffers, showsAbove } from '../../../../src/analysis/planner/power-tests';
import { defaultDesign } from '../../../../src/core/design';

const small: PlanAssumptions = { ...DEFAULT_ASSUMPTIONS, readers: 4, cases: 40, wrong: { mode: 'count', value: 6 }, sims: 12 };

describe('planner power tests', () => {
  it('the one-sided t-test rejects only above the reference; the paired test only away from 0', () => {
    expect(showsAbove([0.3, 0.35, 0.28, 0.4], 0.1)).toBe(true);
    expect(showsAbove([0.1, 0.12, 0.08, 0.1], 0.1)).toBe(false);
    expect(showsAbove([0.05, 0.02, 0.04, 0.03], 0.1)).toBe(false);
    // mean 0.25, sd 0.0577 over 4 readers; t(0.95; 3) = 2.353 (any t table): t = 2.03 does not reject, t = 2.77 does
    expect(showsAbove([0.2, 0.3, 0.2, 0.3], 0.1915)).toBe(false);
    expect(showsAbove([0.2, 0.3, 0.2, 0.3], 0.17)).toBe(true);
    expect(pairedDiffers([0.1, 0.12, 0.09, 0.11])).toBe(true);
    expect(pairedDiffers([0.1, -0.1, 0.05, -0.05])).toBe(false);
  });
});

describe('runPlan', () => {
  it('the same seed gives the same report; another seed another', () => {
    const a = runPlan({ assumptions: small, base: null, curves: false });
    const b = runPlan({ assumptions: small, base: null, curves: false });
    const c = runPlan({ assumptions: { ...small, seed: 7 }, base: null, curves: false });
    expect(JSON.stringify(b)).toBe(JSON.stringify(a));
    expect(c.overreliance.median_halfwidth === a.overreliance.median_halfwidth && c.auc.median_halfwidth === a.auc.median_halfwidth).toBe(false);
  }, 60_000);

  it('reports progress after every simulated study and a Monte Carlo SE for every rate', () => {
    const steps = planSteps({ assumptions: small, base: null, curves: false });
    const seen: number[] = [];
    let step = steps.next();
    while (step.done !== true) { seen.push(step.value.done); step = steps.next(); }
    expect(seen).toEqual(Array.from({ length: 36 }, (_, i) => i + 1));
    const r = step.value;
    for (const rate of [r.overreliance.power, r.overreliance.coverage, r.auc.power, r.auc.type_i_error]) {
      expect(rate).not.toBeNull();
      if (rate) expect(rate.mcse).toBeCloseTo(Math.sqrt((rate.rate * (1 - rate.rate)) / rate.studies), 12);
    }
  }, 60_000);

  it('AUC power grows with the effect size and with readers', () => {
    const a = { ...small, readers: 4, cases: 60, aucUnaided: 0.75 };
    const weak = aucRejections(a, 40, 0.03).rejections?.rate as number;
    const strong = aucRejections(a, 40, 0.15).rejections?.rate as number;
    expect(strong).toBeGreaterThan(weak + 0.2);
    const two = aucRejections({ ...a, readers: 2 }, 40, 0.08).rejections?.rate as number;
    const ten = aucRejections({ ...a, readers: 10 }, 40, 0.08).rejections?.rate as number;
    expect(ten).toBeGreaterThan(two + 0.2);
  }, 120_000);

  it('over-reliance power grows with readers and with the distance from the reference', () => {
    const a = { ...small, sims: 30, readers: 3, overreliance: 0.2, overrelianceSpread: 0.12, reference: 0.15, aucUnaided: 0.95, aucDifference: 0 };
    const few = runPlan({ assumptions: a, base: null, curves: false }).overreliance.power.rate;
    const many = runPlan({ assumptions: { ...a, readers: 12 }, base: null, curves: false }).overreliance.power.rate;
    const far = runPlan({ assumptions: { ...a, reference: 0.05 }, base: null, curves: false }).overreliance.power.rate;
    expect(many).toBeGreaterThan(few);
    expect(far).toBeGreaterThan(few);
  }, 120_000);

  it('measures the notice effect when the design splits notices, and says why not otherwise', () => {
    const split = { ...defaultDesign(['finding']), caution: { mode: 'random-half' as const, text: 'Check the image.' } };
    const r = runPlan({ assumptions: { ...small, readers: 6, noticeEffect: 0.8, overreliance: 0.6, wrong: { mode: 'count', value: 16 } }, base: split, curves: false });
    expect(r.notice.power?.rate).toBeGreaterThan(0.3);
    const none = runPlan({ assumptions: small, base: null, curves: false });
    expect(none.notice.power).toBeNull();
    expect(none.notice.reason).toMatch(/to nobody/);
  }, 120_000);

  it('refuses a case set too small for the planted errors, naming them', () => {
    expect(() => runPlan({ assumptions: { ...small, wrong: { mode: 'count', value: 60 } }, base: null, curves: false })).toThrow(/planted false-positive/);
    expect(() => runPlan({ assumptions: { ...small, readers: 1 }, base: null })).toThrow(/readers must be/);
  });
});

import { DEFAULT_ASSUMPTIONS, PRESETS } from '../../../../src/analysis/planner/assumptions';
import { aucRejections } from '../../../../src/analysis/planner/run-plan';

// The full check (2,000 studies, band [0.035, 0.065]) takes minutes on a shared machine, so it is
// scripts/validate-plan.ts (npm run validate:plan). This seeded smaller run keeps the test honest
// in CI: 300 studies, band 0.05 +/- 0.037 (about 3 binomial SE at 300 studies; common practice).
describe('planner: type I error of the random-reader AUC test under a null Roe & Metz preset', () => {
  it('rejects about 5% of null studies', () => {
    const a = { ...DEFAULT_ASSUMPTIONS, preset: 'roe-metz-low' as const, aucUnaided: PRESETS['roe-metz-low'].auc, readers: 4, cases: 40, wrong: { mode: 'count' as const, value: 0 }, seed: 31 };
    const run = aucRejections(a, 300, 0);
    const rate = run.rejections?.rate as number;
    expect(rate).toBeGreaterThanOrEqual(0.013);
    expect(rate).toBeLessThanOrEqual(0.087);
    expect(Math.abs(run.meanDifference as number)).toBeLessThan(0.01);
  }, 300_000);
});

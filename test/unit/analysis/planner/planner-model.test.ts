import { DEFAULT_ASSUMPTIONS, type PlanAssumptions } from '../../../../src/analysis/planner/assumptions';
import { aucForMu, muForAuc, ownLookParameters, relianceParameters } from '../../../../src/analysis/planner/model-mapping';
import { planDesign } from '../../../../src/analysis/planner/plan-design';
import { readerOutcomes, simulatedReaders, simulatedRows } from '../../../../src/analysis/planner/simulated-study';
import { mrmc } from '../../../../src/analysis/mrmc-adapter';

const base: PlanAssumptions = { ...DEFAULT_ASSUMPTIONS, readers: 8, cases: 200, wrong: { mode: 'count', value: 20 } };

describe('planner model mapping', () => {
  it('mu and AUC are inverse maps', () => {
    const v = relianceParameters(base).variance;
    for (const auc of [0.6, 0.75, 0.855, 0.95]) expect(aucForMu(muForAuc(auc, v), v)).toBeCloseTo(auc, 12);
  });

  it('the mean follow rate of simulated readers reproduces --overreliance within Monte Carlo error', () => {
    // own look so sharp that own calls are right: followed wrong suggestions then estimate followWrong
    const a = { ...base, readers: 40, aucUnaided: 0.99999, aucDifference: 0, overreliance: 0.25, overrelianceSpread: 0.1 };
    const plan = planDesign(a, null);
    const readers = simulatedReaders(plan, a.readers);
    const p = relianceParameters(a);
    let k = 0;
    let n = 0;
    for (const seed of [11, 12, 13]) {
      for (const o of readerOutcomes(simulatedRows(plan, readers, p, seed, 0), readers, p, seed, 0)) { k += o.overreliance.k; n += o.overreliance.n; }
    }
    // readers' rates vary (sd 0.1) on top of binomial error: se of the pooled mean over 120 reader draws
    const se = Math.sqrt(0.1 ** 2 / 120 + (0.25 * 0.75) / n);
    expect(Math.abs(k / n - 0.25)).toBeLessThan(3 * se);
  });

  it('each reader\'s true rate (reader-truth.ts) matches the model\'s own answers over many reads', () => {
    // many wrong suggestions per reader (the model is right on only 60% of cases): the follow share
    // of each reader is within 4 binomial SE of the true rate the planner computes for it
    const a = { ...base, readers: 6, cases: 2000, modelAccuracy: 0.6, wrong: { mode: 'count' as const, value: 0 }, aucUnaided: 0.75, overrelianceSpread: 0.15 };
    const plan = planDesign(a, null);
    const readers = simulatedReaders(plan, a.readers);
    const p = relianceParameters(a);
    const outcomes = readerOutcomes(simulatedRows(plan, readers, p, 5, 0), readers, p, 5, 0);
    const truths = new Set<number>();
    for (const o of outcomes) {
      const t = o.trueRate as number;
      truths.add(Math.round(t * 100));
      expect(o.overreliance.n).toBe(800);
      expect(Math.abs((o.overreliance.estimate as number) - t)).toBeLessThan(4 * Math.sqrt((t * (1 - t)) / 800));
    }
    expect(truths.size).toBeGreaterThan(2); // readers do differ, so the check is per reader
  });

  it('the AUC of simulated own-look ratings reproduces the assumed unaided and aided AUC within Monte Carlo error', () => {
    const a = { ...base, readers: 10, cases: 300, aucUnaided: 0.75, aucDifference: 0.1 };
    const plan = planDesign(a, null);
    const readers = simulatedReaders(plan, a.readers);
    const p = ownLookParameters(a);
    const sums = [0, 0];
    const studies = 6;
    const perStudy: number[][] = [[], []];
    for (let s = 0; s < studies; s++) {
      const result = mrmc(simulatedRows(plan, readers, p, 100 + s, 0)).result;
      if (result === null) throw new Error('not crossed');
      for (const m of [0, 1]) {
        const meanAuc = (result.auc[m] as number[]).reduce((x, y) => x + y, 0) / readers.length;
        sums[m] = (sums[m] as number) + meanAuc;
        perStudy[m]?.push(meanAuc);
      }
    }
    for (const [m, target] of [[0, 0.75], [1, 0.85]] as const) {
      const xs = perStudy[m] as number[];
      const mean = (sums[m] as number) / studies;
      const sd = Math.sqrt(xs.reduce((s, x) => s + (x - mean) ** 2, 0) / (studies - 1));
      // the reader-averaged AUC varies between studies by the case and reader terms; 4 SE of the mean of 6 studies, and at least 0.01
      expect(Math.abs(mean - target)).toBeLessThan(Math.max(0.01, (4 * sd) / Math.sqrt(studies)));
    }
  }, 60_000);
});

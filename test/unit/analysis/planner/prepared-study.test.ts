// The planner's reuse of one prepared study across simulated studies must give what a fresh
// study gives: the same rows, the same per-reader outcomes, and the same random-reader AUC test
// as the engine's own mrmc adapter (src/analysis/mrmc-adapter.ts) on those rows.
import { DEFAULT_ASSUMPTIONS, type PlanAssumptions } from '../../../../src/analysis/planner/assumptions';
import { ownLookParameters, relianceParameters } from '../../../../src/analysis/planner/model-mapping';
import { planDesign } from '../../../../src/analysis/planner/plan-design';
import {
  aucOutcome, fillRows, preparedAucOutcome, preparedOutcomes, prepareStudy, readerOutcomes, simulatedReaders, simulatedRows,
} from '../../../../src/analysis/planner/simulated-study';
import { defaultDesign } from '../../../../src/core/design';

const a: PlanAssumptions = { ...DEFAULT_ASSUMPTIONS, readers: 5, cases: 60, wrong: { mode: 'count', value: 8 } };

describe('prepared planner study', () => {
  it('refilled rows, outcomes and AUC test equal those of a fresh study for every seed', () => {
    const split = { ...defaultDesign(['finding']), caution: { mode: 'random-half' as const, text: 'Check the image.' } };
    const plan = planDesign(a, split);
    const readers = simulatedReaders(plan, a.readers);
    const study = prepareStudy(plan, readers);
    const p = relianceParameters(a);
    const own = ownLookParameters(a);
    for (const seed of [1, 2, 3]) {
      const rows = fillRows(study, p, seed, 0.5);
      const fresh = simulatedRows(plan, readers, p, seed, 0.5);
      expect(rows).toEqual(fresh);
      expect(preparedOutcomes(study, p, seed, 0.5)).toEqual(readerOutcomes(fresh, readers, p, seed, 0.5));
      fillRows(study, own, seed, 0);
      const auc = preparedAucOutcome(study);
      expect(auc.outcome).not.toBeNull();
      expect(auc).toEqual(aucOutcome(simulatedRows(plan, readers, own, seed, 0)));
    }
  });

  it('gives the adapter\'s note when the design is not fully crossed', () => {
    const plan = planDesign(a, null);
    const readers = simulatedReaders(plan, 1);
    const study = prepareStudy(plan, readers);
    fillRows(study, ownLookParameters(a), 4, 0);
    const expected = aucOutcome(simulatedRows(plan, readers, ownLookParameters(a), 4, 0));
    expect(expected.note).toMatch(/at least 2 readers/);
    expect(preparedAucOutcome(study)).toEqual(expected);
  });
});

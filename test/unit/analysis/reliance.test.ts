import { reliance } from '../../../src/analysis/reliance';
import { aided } from './make-read';

// docs/methods.md definitions, counted by hand on a small table of aided reads.
describe('reliance', () => {
  // (truth, ai, final): wrong suggestions at rows 3-5, right at 0-2 and 6
  const reads = [
    aided(1, 1, 1), aided(0, 0, 0), aided(1, 1, 0),
    aided(1, 0, 0, { caution_shown: 1 }), aided(0, 1, 0, { caution_shown: 1 }), aided(0, 1, 1),
    aided(0, 0, 0),
  ];
  const r = reliance(reads);
  it('counts agreement, over- and under-reliance', () => {
    expect(r.agreement).toMatchObject({ k: 5, n: 7 });
    expect(r.overreliance).toMatchObject({ k: 2, n: 3 });
    expect(r.underreliance).toMatchObject({ k: 1, n: 4 });
    expect(r.accuracy_ai_right).toMatchObject({ k: 3, n: 4 });
    expect(r.accuracy_ai_wrong).toMatchObject({ k: 1, n: 3 });
    expect(r.ai_accuracy).toMatchObject({ k: 4, n: 7 });
  });
  it('splits over-reliance by the caution notice', () => {
    expect(r.caution.shown).toMatchObject({ k: 1, n: 2 });
    expect(r.caution.not_shown).toMatchObject({ k: 1, n: 1 });
  });
  it('gives kappa of final call against the suggestion', () => {
    // table d×a: (1,1) = 2, (0,0) = 3, (0,1) = 2, (1,0) = 0, so po = 5/7; d marginals 2/7 ones, a marginals 4/7 ones; pe = (2/7)(4/7) + (5/7)(3/7) = 23/49
    const po = 5 / 7;
    const pe = 23 / 49;
    expect(r.kappa.estimate).toBeCloseTo((po - pe) / (1 - pe), 12);
  });
  it('gives nulls for no reads', () => {
    const e = reliance([]);
    expect(e.overreliance.estimate).toBeNull();
    expect(e.kappa.estimate).toBeNull();
  });
});

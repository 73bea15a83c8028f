import { initialFormValues } from '../../../src/ui/screens/design-form-state';
import { designFormProblems } from '../../../src/ui/screens/design-form-problems';
import { tinyManifest } from '../support/tiny-study';

const base = () => ({ ...initialFormValues('set', ['target']), name: 'Pilot' });

describe('design form problems', () => {
  it('gives every problem at once, each tied to its field, in the form’s words (no internal names)', () => {
    const problems = designFormProblems({ ...base(), name: '', plantedFalseNegative: '1.5', breakEvery: '0', washoutDays: 'x', threshold: '2' }, tinyManifest(6));
    expect(problems.map((p) => p.field).sort()).toEqual(['breakEvery', 'name', 'plantedFalseNegative', 'threshold', 'washoutDays']);
    for (const p of problems) expect(p.message).not.toMatch(/planted\.|breakEvery|falseNegative|washoutDays/);
    expect(problems.find((p) => p.field === 'breakEvery')?.message).toBe('The number of cases between breaks must be at least 1.');
  });

  it('ties case-set problems to their field, and is empty once each field is fixed', () => {
    const tooMany = { ...base(), plantedFalsePositive: '50' };
    expect(designFormProblems(tooMany, tinyManifest(6)).map((p) => p.field)).toEqual(['plantedFalsePositive']);
    expect(designFormProblems({ ...tooMany, plantedFalsePositive: '0' }, tinyManifest(6))).toEqual([]);
    // not in rounds: a missing name and a case-set problem are both said at once
    expect(designFormProblems({ ...tooMany, name: '' }, tinyManifest(6)).map((p) => p.field)).toEqual(['name', 'plantedFalsePositive']);
  });
});

import { parseDesign } from '../../../src/core/design-schema';
import { designFromForm, formValuesFromDesign, initialFormValues } from '../../../src/ui/screens/design-form-state';

describe('the new-study form', () => {
  it('turns its default values (with a name) into a valid two-sequence crossover design', () => {
    const result = designFromForm({ ...initialFormValues('set', ['nodule']), name: 'S', aidedMode: 'concurrent', plantedFalseNegative: '3' });
    if (!('design' in result)) throw new Error(result.problems.join('; '));
    expect(result.design.sequences).toEqual([{ label: 'UA', periods: ['none', 'concurrent'] }, { label: 'AU', periods: ['concurrent', 'none'] }]);
    expect(result.design.planted.falseNegative).toEqual({ mode: 'count', value: 3 });
    expect(parseDesign(result.design).ok).toBe(true);
  });
  it('names each field that is not a number, and an empty name', () => {
    const result = designFromForm({ ...initialFormValues('set', ['nodule']), washoutDays: 'four', seed: '' });
    expect('problems' in result && result.problems).toEqual([
      'Study name: give the study a name.', 'Washout days: "four" is not a number.', 'Seed: "" is not a number.',
    ]);
  });

  it('takes custom sequences of three periods, and names the line of a bad one', () => {
    const ok = designFromForm({ ...initialFormValues('set', ['nodule']), name: 'S', customSequences: 'USC: none, sequential, concurrent\n\nCUS: concurrent, unaided, sequential' });
    if (!('design' in ok)) throw new Error(ok.problems.join('; '));
    expect(ok.design.sequences).toEqual([
      { label: 'USC', periods: ['none', 'sequential', 'concurrent'] }, { label: 'CUS', periods: ['concurrent', 'none', 'sequential'] },
    ]);
    expect(parseDesign(ok.design).ok).toBe(true);
    const bad = designFromForm({ ...initialFormValues('set', ['nodule']), name: 'S', customSequences: 'A: none, aided\nB none' });
    expect('problems' in bad && bad.problems).toEqual([
      'Sequences, line 1: "aided" is not none, concurrent or sequential.', 'Sequences, line 2: write it as "LABEL: none, sequential" (got "B none").',
    ]);
  });
});

describe('editing a stored design', () => {
  it('gives back form values that make the same design (standard and custom sequences)', () => {
    for (const custom of ['', 'USC: none, sequential, concurrent\nCUS: concurrent, none, sequential']) {
      for (const scale of [{}, { scaleKind: 'five-point' as const, presentFrom: '3', training: true }]) {
      const made = designFromForm({ ...initialFormValues('set', ['nodule']), ...scale, name: 'S', customSequences: custom, plantedFalsePositive: '2', breakEvery: '10', washoutDays: '7' });
      if (!('design' in made)) throw new Error(made.problems.join('; '));
      const again = designFromForm(formValuesFromDesign('S', 'set', made.design));
      expect(again).toEqual(made);
    }
    }
  });
});

describe('the answer scale and training fields', () => {
  it('makes a five-point training design with edited labels and the default threshold', () => {
    const labels = ['No', 'Unlikely', 'Unsure', 'Likely', 'Yes'];
    const result = designFromForm({ ...initialFormValues('set', ['nodule']), name: 'S', scaleKind: 'five-point', scaleLabels: labels, training: true });
    if (!('design' in result)) throw new Error(result.problems.join('; '));
    expect(result.design.answerScale).toEqual({ kind: 'five-point', labels, presentFrom: 4 });
    expect(result.design.training).toBe(true);
    expect(parseDesign(result.design).ok).toBe(true);
  });
  it('takes a stated percent threshold and names a bad one', () => {
    const ok = designFromForm({ ...initialFormValues('set', ['nodule']), name: 'S', scaleKind: 'percent', presentFrom: '30' });
    expect('design' in ok && ok.design.answerScale.presentFrom).toBe(30);
    const bad = designFromForm({ ...initialFormValues('set', ['nodule']), name: 'S', scaleKind: 'percent', presentFrom: 'half' });
    expect('problems' in bad && bad.problems).toEqual(['Rating counted as present from: "half" is not a number.']);
  });
});

import { crossoverPairs, crossoverSection } from '../../../src/analysis/crossover';
import { aided, makeRead } from './make-read';

const pair = (caseId: string, truth: 0 | 1, unaidedCall: 0 | 1, ai: 0 | 1, aidedCall: 0 | 1, conf = 80) => [
  makeRead({ case_id: caseId, truth, final_call: unaidedCall, period: 1, final_confidence: conf }),
  aided(truth, ai, aidedCall, { case_id: caseId, period: 2, final_confidence: conf }),
];

describe('crossover', () => {
  it('pairs the same case read unaided and aided in different periods', () => {
    const reads = [...pair('A', 1, 1, 1, 1), makeRead({ case_id: 'B' }), aided(1, 1, 1, { case_id: 'C', period: 1 }),
      makeRead({ case_id: 'C', period: 1 })];
    expect(crossoverPairs(reads).map((p) => p.unaided.case_id)).toEqual(['A']);
  });
  it('gives paired accuracy, McNemar b and c, and the wrong-suggestion subset', () => {
    const reads = [
      ...pair('A', 1, 1, 0, 0), // right unaided, wrong aided (b), wrong suggestion
      ...pair('B', 1, 1, 0, 0), // b, wrong suggestion
      ...pair('C', 0, 1, 0, 0), // wrong unaided, right aided (c)
      ...pair('D', 0, 0, 0, 0), // both right
    ];
    const x = crossoverSection(reads);
    expect(x?.n).toBe(4);
    expect(x?.unaided_accuracy.k).toBe(3);
    expect(x?.aided_accuracy.k).toBe(2);
    expect(x?.accuracy_difference).toBeCloseTo(-0.25, 12);
    expect(x?.mcnemar).toMatchObject({ b: 2, c: 1, p: 1 });
    expect(x?.wrong_suggestion).toMatchObject({ n: 2, accuracy_difference: -1 });
    expect(x?.wrong_suggestion.mcnemar).toMatchObject({ b: 2, c: 0, p: 0.5 });
    expect(x?.auc_difference).not.toBeNull();
  });
  it('is null without pairs', () => {
    expect(crossoverSection([makeRead()])).toBeNull();
  });
});

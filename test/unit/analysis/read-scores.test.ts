import { finalScore, initialScore } from '../../../src/analysis/read-scores';
import { makeRead } from './make-read';

describe('read scores', () => {
  it('derives s from call and confidence, taking an empty confidence as 100', () => {
    expect(finalScore(makeRead({ final_call: 1, final_confidence: 80 }))).toBe(90);
    expect(finalScore(makeRead({ final_call: 0, final_confidence: null }))).toBe(0);
    expect(initialScore(makeRead({ initial_call: 1, initial_confidence: null }))).toBe(100);
    expect(initialScore(makeRead())).toBeNull();
  });
});

import { derivedScore } from '../../../src/core/derived-score';

// docs/formats.md ("The derived score") defines the derived score; these are its two branches and both ends.
describe('derivedScore', () => {
  it('maps a present call to 50..100 and an absent call to 0..50', () => {
    expect(derivedScore(1, 80)).toBe(90);
    expect(derivedScore(0, 80)).toBe(10);
    expect(derivedScore(1, 0)).toBe(50);
    expect(derivedScore(0, 100)).toBe(0);
  });
  it('refuses a confidence outside 0..100', () => {
    expect(() => derivedScore(1, 101)).toThrow(RangeError);
    expect(() => derivedScore(0, Number.NaN)).toThrow(RangeError);
  });
});

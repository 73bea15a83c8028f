import { quantile } from '../../../src/analysis/quantile';
import { quantileBySelection } from '../../../src/analysis/quantile-select';

// The oracle is quantile itself (a full sort, then Hyndman & Fan definition 7): the same bits.
describe('quantileBySelection', () => {
  it('gives the doc-comment example (a short array: quantile itself)', () => {
    expect(quantileBySelection([0.2, 1, 0, 0.5], 0.5)).toBe(0.35);
  });
  it('equals quantile on many arrays: ties, sorted, reversed, all equal, clipped weights', () => {
    let seed = 12345;
    const next = () => {
      seed = (seed * 1103515245 + 12345) % 2147483648;
      return seed / 2147483648;
    };
    const arrays: number[][] = [];
    for (let t = 0; t < 300; t++) {
      const n = 64 + Math.floor(next() * 900);
      const ties = next() < 0.5;
      arrays.push(Array.from({ length: n }, () => (ties ? Math.round(next() * 8) / 8 : Math.min(1, Math.max(0, next() * 1.4 - 0.2)))));
    }
    // short arrays, so that a high quantile's next order statistic is often the very last value
    for (let t = 0; t < 200; t++) arrays.push(Array.from({ length: 64 + (t % 17) }, () => next()));
    arrays.push(Array.from({ length: 500 }, (_, i) => i / 7));
    arrays.push(Array.from({ length: 500 }, (_, i) => -i / 7));
    arrays.push(new Array<number>(300).fill(0.25));
    arrays.push(Array.from({ length: 1001 }, (_, i) => (i % 2 === 0 ? i : 1000 - i)));
    for (const a of arrays) {
      for (const q of [0, 0.01, 0.1, 0.25, 0.5, 0.75, 0.9, 0.98, 0.99, 1]) expect(quantileBySelection(a, q)).toBe(quantile(a, q));
    }
  });
  it('refuses what quantile refuses, with its words, and gives null for no values', () => {
    const a = Array.from({ length: 100 }, (_, i) => i);
    a[70] = Number.NaN;
    expect(() => quantileBySelection(a, 0.5)).toThrow('value 70 is not a finite number: NaN');
    expect(() => quantileBySelection([1, 2], 1.5)).toThrow(/quantile level must be in \[0,1\]/);
    expect(quantileBySelection([], 0.5)).toBeNull();
  });
});

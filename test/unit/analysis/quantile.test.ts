import { quantile } from '../../../src/analysis/quantile';
import { readingTime, timeRatio } from '../../../src/analysis/reading-time';

// Hyndman & Fan (1996) definition 7, worked by hand (numpy.quantile's default, from memory).
describe('quantile and readingTime', () => {
  it('interpolates between order statistics', () => {
    expect(quantile([4, 1, 3, 2], 0.25)).toBe(1.75);
    expect(quantile([4, 1, 3, 2], 0.5)).toBe(2.5);
    expect(quantile([7], 0.9)).toBe(7);
    expect(quantile([], 0.5)).toBeNull();
    expect(() => quantile([1], 1.5)).toThrow(/\[0,1\]/);
  });
  it('summarises reading time and the aided/unaided ratio', () => {
    expect(readingTime([4000, 1000, 3000, 2000])).toEqual({ n: 4, median_ms: 2500, q1_ms: 1750, q3_ms: 3250, iqr_ms: 1500 });
    expect(readingTime([]).median_ms).toBeNull();
    expect(timeRatio(3000, 2000)).toBe(1.5);
    expect(timeRatio(3000, null)).toBeNull();
  });
});

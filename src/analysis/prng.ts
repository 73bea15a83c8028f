import { uniformInt } from 'pure-rand/distribution/uniformInt';
import { xoroshiro128plus } from 'pure-rand/generator/xoroshiro128plus';

export type SeededInts = {
  /** a uniform whole number in 0..size−1 */
  below: (size: number) => number;
};

/**
 * A seeded source of uniform whole numbers (xoroshiro128+ from pure-rand, unbiased ranges), so
 * a bootstrap with the same seed gives the same intervals on every machine.
 * Throws RangeError when the seed is not a whole number, or below() gets a size < 1.
 * Example: seededInts(1).below(10) → the same digit on every run.
 */
export const seededInts = (seed: number): SeededInts => {
  if (!Number.isInteger(seed)) throw new RangeError(`seed must be a whole number, got ${seed}`);
  const rng = xoroshiro128plus(seed | 0);
  return {
    below: (size) => {
      if (!Number.isInteger(size) || size < 1) throw new RangeError(`below() needs a whole size >= 1, got ${size}`);
      return uniformInt(rng, 0, size - 1);
    },
  };
};

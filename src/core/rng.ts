/**
 * The one seeded random generator of a study. Every random choice in a design (planted errors,
 * sequence blocks, case order, caution notices, case blocks) draws from its own named stream,
 * so adding a new purpose never changes the draws of another, and a saved seed reproduces all.
 *
 * Streams: `deriveSeed(seed, stream)` hashes the decimal seed and the stream name together
 * (FNV-1a over UTF-16 code units, then the 32-bit MurmurHash3 finaliser for avalanche) into the
 * 32-bit seed of a xoroshiro128+ generator (pure-rand). Not cryptographic; reproducible.
 *
 * Throws RangeError when the seed is not a finite integer.
 * Example: createRng(20261201, 'order/R1/p1').shuffle(['a', 'b', 'c']) is the same every run.
 */
import { uniformFloat64 } from 'pure-rand/distribution/uniformFloat64';
import { uniformInt } from 'pure-rand/distribution/uniformInt';
import { xoroshiro128plus } from 'pure-rand/generator/xoroshiro128plus';

export type Rng = {
  /** the derived 32-bit seed of this stream, worth logging */
  readonly seed: number;
  /** a whole number from `from` to `to`, both included */
  int: (from: number, to: number) => number;
  /** a number in [0, 1) */
  float: () => number;
  /** a shuffled copy (Fisher-Yates); the input is left alone */
  shuffle: <T>(items: readonly T[]) => T[];
};

const fmix32 = (input: number): number => {
  let h = input;
  h ^= h >>> 16;
  h = Math.imul(h, 0x85ebca6b);
  h ^= h >>> 13;
  h = Math.imul(h, 0xc2b2ae35);
  h ^= h >>> 16;
  return h >>> 0;
};

/** The 32-bit seed of one named stream of a study seed. */
export const deriveSeed = (seed: number, stream: string): number => {
  if (!Number.isInteger(seed)) throw new RangeError(`a seed must be a whole number, got ${seed}`);
  // The NUL separator keeps (1, '2x') and (12, 'x') apart.
  const text = `${seed}\u0000${stream}`;
  let h = 0x811c9dc5;
  for (let i = 0; i < text.length; i += 1) {
    h ^= text.charCodeAt(i);
    h = Math.imul(h, 0x01000193);
  }
  return fmix32(h);
};

/** A generator from an already derived 32-bit seed (e.g. one read back from a log). */
export const rngFromSeed = (derived: number): Rng => {
  const gen = xoroshiro128plus(derived | 0);
  const int = (from: number, to: number): number => uniformInt(gen, from, to);
  return {
    seed: derived >>> 0,
    int,
    float: () => uniformFloat64(gen),
    shuffle: <T>(items: readonly T[]): T[] => {
      const out = [...items];
      for (let i = out.length - 1; i > 0; i -= 1) {
        const j = int(0, i);
        // Both indices are in range; the casts only drop the undefined of indexed access.
        const tmp = out[i] as T;
        out[i] = out[j] as T;
        out[j] = tmp;
      }
      return out;
    },
  };
};

/** A generator for one purpose of a study: `stream` names the purpose, e.g. 'planting/fp/nodule'. */
export const createRng = (seed: number, stream: string): Rng => rngFromSeed(deriveSeed(seed, stream));

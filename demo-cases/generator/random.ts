// Seeded random numbers for the demo generator: one stream per seed, so a seed reproduces the set.
import { xoroshiro128plus } from 'pure-rand/generator/xoroshiro128plus';

export type Random = {
  /** uniform in (0, 1), 32 bits: plenty for image noise, and half the draws of a 53-bit float */
  uniform: () => number;
  /** standard normal (Box-Muller, one of each pair kept for the next call) */
  normal: () => number;
  /** uniform in [lo, hi) */
  between: (lo: number, hi: number) => number;
  /** a copy of `items` in a seeded random order (Fisher-Yates) */
  shuffle: <T>(items: readonly T[]) => T[];
  /** fills `out` with uniform bytes, four from each 32-bit draw (the bulk source of image grain) */
  fillBytes: (out: Uint8Array) => void;
};

export const makeRandom = (seed: number): Random => {
  const rng = xoroshiro128plus(seed | 0);
  const uniform = (): number => ((rng.next() >>> 0) + 0.5) / 4294967296;
  let spare: number | null = null;
  const normal = (): number => {
    if (spare !== null) {
      const value = spare;
      spare = null;
      return value;
    }
    const radius = Math.sqrt(-2 * Math.log(uniform()));
    const angle = 2 * Math.PI * uniform();
    spare = radius * Math.sin(angle);
    return radius * Math.cos(angle);
  };
  const between = (lo: number, hi: number): number => lo + (hi - lo) * uniform();
  const shuffle = <T>(items: readonly T[]): T[] => {
    const out = [...items];
    for (let i = out.length - 1; i > 0; i -= 1) {
      const j = Math.floor(uniform() * (i + 1));
      const a = out[i] as T;
      out[i] = out[j] as T;
      out[j] = a;
    }
    return out;
  };
  // Bytes taken from each draw low to high by shifts, so the stream is the same on any platform.
  const fillBytes = (out: Uint8Array): void => {
    const whole = out.length - (out.length % 4);
    let i = 0;
    for (; i < whole; i += 4) {
      const word = rng.next();
      out[i] = word;
      out[i + 1] = word >>> 8;
      out[i + 2] = word >>> 16;
      out[i + 3] = word >>> 24;
    }
    if (i < out.length) {
      const word = rng.next();
      for (let k = 0; i < out.length; i += 1, k += 8) out[i] = word >>> k;
    }
  };
  return { uniform, normal, between, shuffle, fillBytes };
};

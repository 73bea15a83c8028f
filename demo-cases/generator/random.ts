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
  return { uniform, normal, between, shuffle };
};

// Numbers in plain words for the reader's report: whole percentages and 95% intervals.
import type { Proportion } from '../wilson';
import { MIN_READS, tooFew } from './small-count';

/** 0.9687 → "97%"; null → "–". */
export const pct = (x: number | null | undefined): string => (x === null || x === undefined ? '–' : `${Math.round(x * 100)}%`);

/** A proportion as "31 of 32: 97% (95% CI 84–99%)". */
export const shareText = (p: Proportion): string =>
  p.estimate === null ? 'none' : `${p.k} of ${p.n}: ${pct(p.estimate)} (95% CI ${Math.round((p.lower ?? 0) * 100)}–${pct(p.upper)})`;

/** How sure a share is, in one clause: too few, or the interval in words. */
export const sureText = (p: Proportion): string => {
  if (p.n === 0) return 'There were no such reads, so there is nothing to judge.';
  if (tooFew(p.n)) return `Only ${p.n} ${p.n === 1 ? 'read' : 'reads'}: too few to judge (fewer than ${MIN_READS}).`;
  return `Your true rate is likely between ${pct(p.lower)} and ${pct(p.upper)}.`;
};

/** "1 read", "3 reads". */
export const reads = (n: number): string => `${n} ${n === 1 ? 'read' : 'reads'}`;

/** Milliseconds as seconds with one decimal: 3450 → "3.5 s". */
export const seconds = (ms: number | null): string => (ms === null ? '–' : `${(ms / 1000).toFixed(1)} s`);

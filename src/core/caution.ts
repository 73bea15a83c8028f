/**
 * Which reads show the caution notice (the optional on-screen note about the model's limits).
 * - 'off': none.
 * - 'all': every aided item (assistance other than none), practice included, so the reader
 *   meets the notice in practice too.
 * - 'random-half': a seeded random half of the reader's aided main items in each period
 *   (floor or ceil of half when the count is odd, the coin drawn from the same stream); never
 *   on practice items, so every statistic of the notice's effect rests on main reads only.
 * Never on unaided items: there is no suggestion to be cautious about.
 *
 * Stream: 'caution/<readerId>/p<period>' (period 1-based); its derived seed is returned for the log.
 * Example: 9 aided main items under 'random-half' -> exactly 4 or 5 flagged.
 */
import type { Assistance, CautionMode, StudyDesign } from './design';
import { createRng } from './rng';

export type CautionInput = { practice: boolean; assistance: Assistance };

export type CautionFlags = { flags: boolean[]; seed: number };

export const cautionFlags = (
  mode: CautionMode,
  design: Pick<StudyDesign, 'seed'>,
  readerId: string,
  period: number,
  items: readonly CautionInput[],
): CautionFlags => {
  const rng = createRng(design.seed, `caution/${readerId}/p${period}`);
  if (mode === 'off') return { flags: items.map(() => false), seed: rng.seed };
  if (mode === 'all') return { flags: items.map((it) => it.assistance !== 'none'), seed: rng.seed };
  const aidedMain = items.flatMap((it, i) => (it.assistance !== 'none' && !it.practice ? [i] : []));
  const half = aidedMain.length / 2;
  const take = Number.isInteger(half) ? half : rng.int(0, 1) === 0 ? Math.floor(half) : Math.ceil(half);
  const chosen = new Set(rng.shuffle(aidedMain).slice(0, take));
  return { flags: items.map((_, i) => chosen.has(i)), seed: rng.seed };
};

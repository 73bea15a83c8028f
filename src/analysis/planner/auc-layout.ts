/**
 * The random-reader AUC test of many simulated studies of one design, without re-checking the
 * crossing each time: whether a design is fully crossed, and where each read's score sits in the
 * [modality][reader][case] table, depend on the design only. `aucLayout` asks the engine's
 * `fullyCrossed` once (on the prepared rows); `layoutOutcome` then writes each study's final
 * scores (read-scores.ts `finalScore`, as fullyCrossed does) into the same table and runs the
 * engine's Obuchowski-Rockette analysis, which is exactly what `mrmc(rows)` (mrmc-adapter.ts)
 * does for those rows, jackknife covariances included.
 */
import type { ReadRow } from '../../core/read-log';
import { fullyCrossed } from '../fully-crossed';
import { obuchowskiRockette } from '../obuchowski-rockette';
import { finalScore } from '../read-scores';

export type AucOutcome = { p: number; difference: number; halfWidth: number } | null;

export type AucLayout =
  | { crossed: false; note: string }
  | { crossed: true; scores: number[][][]; truth: (0 | 1)[]; cell: Int32Array };

/** The crossing of `rows` (their fixed columns: reader, case, assistance, truth). */
export const aucLayout = (rows: readonly ReadRow[]): AucLayout => {
  const crossing = fullyCrossed(rows);
  if (crossing.input === null) return { crossed: false, note: `not fully crossed: ${crossing.reason}` };
  const { scores, truth, readers, cases } = crossing.input;
  const readerIdx = new Map(readers.map((r, i) => [r, i]));
  const caseIdx = new Map(cases.map((c, i) => [c, i]));
  const R = readers.length;
  const C = cases.length;
  // flat position m*R*C + i*C + c of each row's score
  const cell = Int32Array.from(rows, (r) => (r.assistance !== 'none' ? R * C : 0) + (readerIdx.get(r.reader_id) ?? 0) * C + (caseIdx.get(r.case_id) ?? 0));
  return { crossed: true, scores, truth, cell };
};

/** The test on the rows' current scores (rows in the order the layout was made from). */
export const layoutOutcome = (layout: AucLayout, rows: readonly ReadRow[]): { outcome: AucOutcome; note: string | null } => {
  if (!layout.crossed) return { outcome: null, note: layout.note };
  const { scores, truth, cell } = layout;
  const R = (scores[0] as number[][]).length;
  const C = truth.length;
  for (let s = 0; s < rows.length; s++) {
    const at = cell[s] as number;
    const m = at >= R * C ? 1 : 0;
    const rest = at - m * R * C;
    ((scores[m] as number[][])[Math.floor(rest / C)] as number[])[rest % C] = finalScore(rows[s] as ReadRow);
  }
  try {
    const t = obuchowskiRockette({ scores, truth, covariance: 'jackknife' }).random;
    return { outcome: { p: t.p, difference: t.difference, halfWidth: (t.upper - t.lower) / 2 }, note: null };
  } catch (error) {
    if (error instanceof RangeError) return { outcome: null, note: error.message };
    throw error;
  }
};

import type { ReadRow } from '../core/read-log';
import { finalScore, isAided } from './read-scores';
import { averageRocVertical, rocPoints, type AveragePoint, type RocPoint } from './roc-points';

export type ReaderRoc = { reader_id: string; unaided: RocPoint[] | null; aided: RocPoint[] | null };

export type FindingRoc = {
  finding: string;
  /** per reader, ordered as the engine orders readers (by id, numeric-aware) */
  readers: ReaderRoc[];
  /** vertical average over the readers that have a curve in that condition (null when none has) */
  averaged: { unaided: AveragePoint[] | null; aided: AveragePoint[] | null };
};

const byReaderId = (a: string, b: string) => a.localeCompare(b, 'en', { numeric: true });

// One condition's curve of one reader: null without both classes.
const curveOf = (reads: readonly ReadRow[]): RocPoint[] | null => {
  const scores = new Float64Array(reads.length);
  const truth = new Uint8Array(reads.length);
  let positives = 0;
  reads.forEach((r, i) => { scores[i] = finalScore(r); truth[i] = r.truth; positives += r.truth; });
  return positives === 0 || positives === reads.length ? null : rocPoints(scores, truth);
};

/**
 * ROC curves of the derived final score (the score behind every AUC of the analysis) per finding,
 * reader and condition (unaided: no suggestion shown; aided: a suggestion shown), and the
 * reader-averaged curve per condition by vertical averaging (see averageRocVertical for why).
 * Practice, training and withdrawn readers' reads are left out, as analyzeReads does by default. Findings in order of first appearance.
 * Throws RangeError when a confidence is outside 0..100.
 * Example: rocCurves(rows)[0].averaged.aided.
 */
export const rocCurves = (rows: readonly ReadRow[]): FindingRoc[] => {
  const byFinding = new Map<string, Map<string, { unaided: ReadRow[]; aided: ReadRow[] }>>();
  for (const r of rows) {
    if (r.practice !== 0 || r.training === 1 || r.withdrawn === 1) continue;
    let f = byFinding.get(r.finding);
    if (f === undefined) { f = new Map(); byFinding.set(r.finding, f); }
    let g = f.get(r.reader_id);
    if (g === undefined) { g = { unaided: [], aided: [] }; f.set(r.reader_id, g); }
    (isAided(r) ? g.aided : g.unaided).push(r);
  }
  const out: FindingRoc[] = [];
  for (const [finding, perReader] of byFinding) {
    const readers = [...perReader.keys()].sort(byReaderId).map((id): ReaderRoc => {
      const g = perReader.get(id) ?? { unaided: [], aided: [] };
      return { reader_id: id, unaided: curveOf(g.unaided), aided: curveOf(g.aided) };
    });
    const average = (pick: (r: ReaderRoc) => RocPoint[] | null): AveragePoint[] | null => {
      const curves = readers.map(pick).filter((c): c is RocPoint[] => c !== null);
      return curves.length === 0 ? null : averageRocVertical(curves);
    };
    out.push({ finding, readers, averaged: { unaided: average((r) => r.unaided), aided: average((r) => r.aided) } });
  }
  return out;
};

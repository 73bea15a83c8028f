import type { ReadRow } from '../core/read-log';
import { aidedSection, conditionSection, type AidedSection, type ConditionSection } from './condition-section';
import { crossoverFromPairs, crossoverPairs, type CrossoverSection } from './crossover';
import { isAided } from './read-scores';
import { timeRatio } from './reading-time';
import { sequentialSection, type SequentialSection } from './sequential';

export type Sections = {
  unaided: ConditionSection | null;
  aided: AidedSection | null;
  sequential: SequentialSection | null;
  crossover: CrossoverSection | null;
  /** aided over unaided median reading time */
  time_ratio: number | null;
};

/**
 * All per-condition sections of a set of reads of one finding (docs/formats.md, "The output of heed analyze"): unaided reads
 * have assistance none, aided reads a suggestion shown. Crossover pairs are formed within each
 * reader; with several readers they are pooled and the paired AUC test is left out (null).
 * options.pairedAuc false also leaves it out (subgroups, where it costs much and says little).
 * A section that does not apply is null. Throws RangeError when a confidence is outside 0..100.
 * Example: sections(readsOfR1Target).aided?.overreliance.
 */
export const sections = (reads: readonly ReadRow[], options: { pairedAuc?: boolean } = {}): Sections => {
  const unaidedReads: ReadRow[] = [];
  const aidedReads: ReadRow[] = [];
  for (const r of reads) (isAided(r) ? aidedReads : unaidedReads).push(r);
  const perReader = byReader(reads);
  const pairs = perReader.length === 1 ? crossoverPairs(perReader[0] as readonly ReadRow[]) : perReader.flatMap((rs) => crossoverPairs(rs));
  const unaided = conditionSection(unaidedReads);
  const aided = aidedSection(aidedReads);
  return {
    unaided,
    aided,
    sequential: sequentialSection(aidedReads),
    crossover: crossoverFromPairs(pairs, perReader.length <= 1 && (options.pairedAuc ?? true)),
    time_ratio: timeRatio(aided?.median_ms ?? null, unaided?.median_ms ?? null),
  };
};

// Reads grouped by reader, readers in order of first appearance. Most calls get one reader's
// reads (per reader, per subgroup), which need no grouping at all.
const byReader = (reads: readonly ReadRow[]): (readonly ReadRow[])[] => {
  const first = reads[0]?.reader_id;
  if (reads.every((r) => r.reader_id === first)) return reads.length === 0 ? [] : [reads];
  const groups = new Map<string, ReadRow[]>();
  for (const r of reads) {
    const list = groups.get(r.reader_id);
    if (list === undefined) groups.set(r.reader_id, [r]);
    else list.push(r);
  }
  return [...groups.values()];
};

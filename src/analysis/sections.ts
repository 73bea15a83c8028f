import type { ReadRow } from '../core/read-log';
import { aidedSectionOf, conditionSectionOf, type AidedSection, type ConditionSection } from './condition-section';
import { crossoverOf, crossoverPairsOf, type CrossoverSection } from './crossover';
import { allRows, readColumns, type ReadColumns } from './read-columns';
import { sectionReads, type SectionReads } from './read-set';
import { timeRatio } from './reading-time';
import { sequentialOf, type SequentialSection } from './sequential';

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
  const cols = readColumns(reads);
  return sectionsOf(cols, sectionReads(cols, allRows(cols)), options);
};

/** sections of reads held as columns, split and sorted once by the caller (the engine's path; same numbers). */
export const sectionsOf = (cols: ReadColumns, reads: SectionReads, options: { pairedAuc?: boolean } = {}): Sections => {
  const pairs = crossoverPairsOf(cols, reads.all);
  const unaided = conditionSectionOf(cols, reads.unaided);
  const aided = aidedSectionOf(cols, reads.aided);
  return {
    unaided,
    aided,
    sequential: sequentialOf(cols, reads.aided.rows),
    crossover: crossoverOf(cols, pairs, pairs.readers <= 1 && (options.pairedAuc ?? true)),
    time_ratio: timeRatio(aided?.median_ms ?? null, unaided?.median_ms ?? null),
  };
};

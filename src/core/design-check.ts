/**
 * Design check: will the study measure over-reliance (following a wrong suggestion,
 * docs/methods.md) precisely enough? Per sequence (every reader on it reads the same) and finding:
 * the number of aided main reads whose shown suggestion is wrong (the model's own errors plus
 * planted ones), and the half-width of the 95% Wilson interval that an over-reliance rate of
 * 0.3 would have on that many reads:
 *   half = z·sqrt(p(1−p)/n + z²/(4n²)) / (1 + z²/n),  z = 1.959963984540054, p = 0.3
 * (Wilson 1927, the score interval's half-width written with p = k/n). A warning when it is
 * wider than ±0.15 (a planning rule of thumb of ours, common practice, no source) or n = 0.
 *
 * Each main case is read once per period; with blocks, every block still meets every entry of
 * the sequence once, so a case is read aided as many times as the sequence has aided periods.
 * Throws nothing for a valid design; a table from another design gives meaningless counts.
 * Example: 10 wrong suggestions, sequence [none, sequential] -> n = 10, half ≈ 0.248, warning.
 */
import type { StudyDesign } from './design';
import type { SuggestionTable } from './suggestions';

export const REFERENCE_RATE = 0.3;
export const HALF_WIDTH_LIMIT = 0.15;
const Z = 1.959963984540054;

export const DESIGN_CHECK_FORMULA =
  'half-width = z·√(p(1−p)/n + z²/(4n²)) / (1 + z²/n), with z = 1.96 (95%), p = 0.3 and n = aided reads with a wrong suggestion (Wilson score interval)';

export type DesignCheckRow = {
  sequence: string;
  finding: string;
  aidedReads: number;
  naturalErrorReads: number;
  plantedReads: number;
  wrongSuggestionReads: number;
  /** Wilson 95% half-width at p = 0.3; null when there is no wrong suggestion to follow */
  halfWidth: number | null;
  warning: string | null;
};

export type DesignCheck = { rows: DesignCheckRow[]; formula: string; referenceRate: number; limit: number };

/** Wilson 95% half-width of a rate p over n reads, by the formula above; null for n = 0. */
export const plannedHalfWidth = (p: number, n: number): number | null =>
  n <= 0 ? null : (Z * Math.sqrt((p * (1 - p)) / n + (Z * Z) / (4 * n * n))) / (1 + (Z * Z) / n);

const warningFor = (sequence: string, finding: string, n: number, half: number | null): string | null => {
  if (half === null) {
    return `Sequence ${sequence}, finding "${finding}": no aided read has a wrong suggestion, so over-reliance cannot be measured. Plant some errors.`;
  }
  if (half <= HALF_WIDTH_LIMIT) return null;
  return (
    `Sequence ${sequence}, finding "${finding}": only ${n} aided reads per reader have a wrong suggestion; an over-reliance ` +
    `rate of 0.30 would be known only to ±${half.toFixed(2)}. Consider more planted errors or more cases.`
  );
};

export const designCheck = (design: StudyDesign, table: SuggestionTable): DesignCheck => {
  const rows = design.sequences.flatMap((s) => {
    const aidedPeriods = s.periods.filter((a) => a !== 'none').length;
    return design.findings.map((finding): DesignCheckRow => {
      const main = table.filter((r) => r.finding === finding && !r.practice);
      const natural = main.filter((r) => !r.planted && r.call !== r.truth).length * aidedPeriods;
      const planted = main.filter((r) => r.planted && r.call !== r.truth).length * aidedPeriods;
      const n = natural + planted;
      const half = plannedHalfWidth(REFERENCE_RATE, n);
      return {
        sequence: s.label,
        finding,
        aidedReads: main.length * aidedPeriods,
        naturalErrorReads: natural,
        plantedReads: planted,
        wrongSuggestionReads: n,
        halfWidth: half,
        warning: warningFor(s.label, finding, n, half),
      };
    });
  });
  return { rows, formula: DESIGN_CHECK_FORMULA, referenceRate: REFERENCE_RATE, limit: HALF_WIDTH_LIMIT };
};

/** The check rows of each reader, from their sequence label. */
export const designCheckForReader = (check: DesignCheck, sequenceLabel: string): DesignCheckRow[] =>
  check.rows.filter((r) => r.sequence === sequenceLabel);

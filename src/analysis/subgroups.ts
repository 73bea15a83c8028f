import type { ReadRow } from '../core/read-log';
import { attributeCodes, type AttributeCodes } from './attribute-codes';
import { allRows, readColumns, type ReadColumns } from './read-columns';
import { partitionReads, sectionReads, type SectionReads } from './read-set';
import { sectionsOf, type Sections } from './sections';
import { wilson, type Proportion } from './wilson';

export type SubgroupEntry = Sections & {
  attribute: string;
  value: string;
  /** reads in the subgroup */
  n: number;
  /** the suggestion's own accuracy on the subgroup's case-findings (each case once) */
  ai_accuracy: Proportion;
  /** readers' over-reliance there (pooled over aided reads), beside ai_accuracy */
  overreliance: Proportion;
};

/**
 * Every metric per value of each case attribute (case_<name> columns), over reads of one
 * finding (the paired AUC test of crossover is left out here: null). Attribute values are listed in sorted order; an empty value is its own subgroup.
 * Throws RangeError when a confidence is outside 0..100.
 * Example: subgroups(reads, ['scanner']).map((g) => [g.value, g.ai_accuracy.estimate, g.overreliance.estimate]).
 */
export const subgroups = (reads: readonly ReadRow[], attributes: readonly string[]): SubgroupEntry[] => {
  const cols = readColumns(reads);
  return subgroupsOf(cols, sectionReads(cols, allRows(cols)), attributeCodes(cols, attributes));
};

/** subgroups of reads held as columns, split by each attribute's codes (no regrouping, no sorting; same numbers). */
export const subgroupsOf = (cols: ReadColumns, reads: SectionReads, attributes: readonly AttributeCodes[]): SubgroupEntry[] => {
  const out: SubgroupEntry[] = [];
  for (const { attribute, values, code } of attributes) {
    const parts = partitionReads(reads, code, values.length);
    parts.forEach((part, v) => {
      if (part === null) return;
      const s = sectionsOf(cols, part, { pairedAuc: false });
      out.push({
        attribute,
        value: values[v] as string,
        n: part.all.length,
        ai_accuracy: suggestionAccuracyOf(cols, part.all),
        overreliance: s.aided?.overreliance ?? wilson(0, 0),
        ...s,
      });
    });
  }
  return out;
};

/** Accuracy of the suggestion itself over distinct case-findings: the first suggestion shown per case counts. */
export const suggestionAccuracy = (reads: readonly ReadRow[]): Proportion => {
  const cols = readColumns(reads);
  return suggestionAccuracyOf(cols, allRows(cols));
};

const suggestionAccuracyOf = (cols: ReadColumns, rows: Int32Array): Proportion => {
  // the cases counted, marked in the columns' scratch and unmarked after
  const seen = cols.caseScratch[0];
  const counted: number[] = [];
  let k = 0;
  for (let i = 0; i < rows.length; i++) {
    const r = rows[i] as number;
    const a = cols.aiCall[r] as number;
    const c = cols.case[r] as number;
    if (a === -1 || seen[c] !== -1) continue;
    seen[c] = 1;
    counted.push(c);
    if (a === cols.truth[r]) k++;
  }
  for (const c of counted) seen[c] = -1;
  return wilson(k, counted.length);
};

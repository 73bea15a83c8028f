import type { ReadRow } from '../core/read-log';
import { sections, type Sections } from './sections';
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
  const out: SubgroupEntry[] = [];
  for (const attribute of attributes) {
    const byValue = new Map<string, ReadRow[]>();
    for (const r of reads) {
      const v = r.case_attributes[attribute] ?? '';
      const list = byValue.get(v);
      if (list === undefined) byValue.set(v, [r]);
      else list.push(r);
    }
    for (const value of [...byValue.keys()].sort()) {
      const rs = byValue.get(value) ?? [];
      const s = sections(rs, { pairedAuc: false });
      out.push({
        attribute,
        value,
        n: rs.length,
        ai_accuracy: suggestionAccuracy(rs),
        overreliance: s.aided?.overreliance ?? wilson(0, 0),
        ...s,
      });
    }
  }
  return out;
};

/** Accuracy of the suggestion itself over distinct case-findings: the first suggestion shown per case counts. */
export const suggestionAccuracy = (reads: readonly ReadRow[]): Proportion => {
  const seen = new Set<string>();
  let k = 0;
  for (const r of reads) {
    if (r.ai_call === null || seen.has(r.case_id)) continue;
    seen.add(r.case_id);
    if (r.ai_call === r.truth) k++;
  }
  return wilson(k, seen.size);
};

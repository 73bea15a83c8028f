import type { ReadRow } from '../core/read-log';

/** One case attribute as a column: code[i] is the place of read i's value in `values` (sorted; an absent value is ''). */
export type AttributeCodes = { attribute: string; values: string[]; code: Int32Array };

/**
 * Each attribute's value per read as a small integer, values numbered in sorted order (the
 * order subgroups are listed in), so grouping reads by value needs no strings.
 * Example: attributeCodes(rows, ['scanner'])[0].values → ['A', 'B'].
 */
export const attributeCodes = (rows: readonly ReadRow[], attributes: readonly string[]): AttributeCodes[] =>
  attributes.map((attribute) => {
    const seen = new Map<string, number>();
    const raw = new Int32Array(rows.length);
    for (let i = 0; i < rows.length; i++) {
      const v = (rows[i] as ReadRow).case_attributes[attribute] ?? '';
      let c = seen.get(v);
      if (c === undefined) {
        c = seen.size;
        seen.set(v, c);
      }
      raw[i] = c;
    }
    const values = [...seen.keys()].sort();
    const rank = Int32Array.from(seen.keys(), (v) => values.indexOf(v));
    const code = raw.map((c) => rank[c] as number);
    return { attribute, values, code };
  });

import type { ReadColumns } from './read-columns';

/** One case attribute as a column: code[i] is the place of read i's value in `values` (sorted; an absent value is ''). */
export type AttributeCodes = { attribute: string; values: string[]; code: Int32Array };

/**
 * Each named attribute's value per read as a small integer, values numbered in sorted order (the
 * order subgroups are listed in), so grouping reads by value needs no strings.
 * Example: attributeCodes(cols, ['scanner'])[0].values → ['', 'A', 'B'] when some read has none.
 */
export const attributeCodes = (cols: ReadColumns, attributes: readonly string[]): AttributeCodes[] =>
  attributes.map((attribute) => {
    const column = cols.attributes.get(attribute);
    if (column === undefined) return { attribute, values: [''], code: new Int32Array(cols.n) };
    const raw = column.values;
    const absent = raw.length;
    const values = [...new Set([...raw, ''])].sort();
    const rank = Int32Array.from([...raw, ''], (v) => values.indexOf(v));
    const code = column.code.map((c) => rank[c === -1 ? absent : c] as number);
    return { attribute, values, code };
  });

/**
 * The attribute names of the reads `rows`, in order of first appearance (a read's own names in
 * their order), each distinct list of names looked at once.
 */
export const attributeNames = (cols: ReadColumns, rows: Int32Array): string[] => {
  const names: string[] = [];
  const seen = new Uint8Array(cols.shapes.length);
  for (let k = 0; k < rows.length; k++) {
    const s = cols.shape[rows[k] as number] as number;
    if (seen[s] === 1) continue;
    seen[s] = 1;
    for (const a of cols.shapes[s] as string[]) if (!names.includes(a)) names.push(a);
  }
  return names;
};

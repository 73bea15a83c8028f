// The header of cases.csv: which column is which (SPEC Contract 4).
import { formulaProblem } from '../../core/formula-text';
import type { Problems } from './problems';

export const REQUIRED = ['case_id', 'finding', 'truth', 'image'] as const;
export const OPTIONAL = ['model_score', 'model_call', 'practice'] as const;
const KNOWN: readonly string[] = [...REQUIRED, ...OPTIONAL];
export const ATTRIBUTE_PREFIX = 'case_';
/** More columns than any real case set needs; a wider header is refused before it is read. */
export const MAX_COLUMNS = 1000;

export type Columns = {
  /** index of each known column present */
  index: Record<string, number>;
  /** attribute name (without prefix) and its column index, in column order */
  attributes: { name: string; index: number }[];
  /** columns Heed does not use, left out of the manifest */
  ignored: string[];
  width: number;
};

/** Reads the header; returns null (with problems added) when the file cannot be used at all. */
export const readColumns = (file: string, cells: string[], problems: Problems): Columns | null => {
  const index: Record<string, number> = {};
  const attributes: Columns['attributes'] = [];
  const ignored: string[] = [];
  if (cells.length > MAX_COLUMNS) {
    problems.add(file, 1, null, `the header has ${cells.length.toLocaleString('en')} columns; the limit is ${MAX_COLUMNS.toLocaleString('en')}`);
    return null;
  }
  // first column of each name: one pass, so a wide header costs linear time
  const firstOf = new Map<string, number>();
  let usable = true;
  cells.forEach((cell, i) => {
    const name = cell.trim();
    if (name === '') {
      problems.add(file, 1, null, `column ${i + 1} of the header has no name`);
      usable = false;
      return;
    }
    const first = firstOf.get(name);
    if (first === undefined) firstOf.set(name, i);
    else {
      problems.add(file, 1, name, `column ${name} appears twice (columns ${first + 1} and ${i + 1})`);
      usable = false;
      return;
    }
    if (KNOWN.includes(name)) index[name] = i;
    else if (name.startsWith(ATTRIBUTE_PREFIX) && name !== 'case_id') {
      const attribute = name.slice(ATTRIBUTE_PREFIX.length);
      const formula = formulaProblem(attribute);
      if (attribute === '') {
        problems.add(file, 1, name, `column ${name} needs a name after "${ATTRIBUTE_PREFIX}", e.g. case_site`);
        usable = false;
      } else if (formula) {
        problems.add(file, 1, name, `the name of column ${name} after "${ATTRIBUTE_PREFIX}" ${formula}`);
        usable = false;
      } else {
        attributes.push({ name: attribute, index: i });
      }
    } else ignored.push(name);
  });
  for (const name of REQUIRED) {
    if (index[name] !== undefined) continue;
    const near = cells.find((c) => c.trim().toLowerCase() === name);
    const hint = near ? ` (found "${near.trim()}": column names are lower case)` : '';
    problems.add(file, 1, name, `required column ${name} is missing${hint}; cases.csv needs ${REQUIRED.join(', ')}`);
    usable = false;
  }
  return usable ? { index, attributes, ignored, width: cells.length } : null;
};

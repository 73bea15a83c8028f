// The header of cases.csv: which column is which (docs/formats.md, "The case set").
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

const OTHER_SEPARATORS = [[';', 'semicolons'], ['\t', 'tabs'], ['|', 'vertical bars']] as const;

/**
 * A header read as one cell that splits on another separator into names that include the required
 * ones: a file saved with semicolons (a common spreadsheet export where the decimal mark is a comma)
 * or tabs. Said in one message rather than one "missing" line per required column.
 */
const otherSeparator = (cells: string[]): string | null => {
  if (cells.length !== 1) return null;
  const header = cells[0] ?? '';
  for (const [separator, words] of OTHER_SEPARATORS) {
    const names = header.split(separator).map((c) => c.trim().toLowerCase());
    if (names.length > 1 && REQUIRED.some((name) => names.includes(name))) {
      return `the columns are separated by ${words}, not commas; save cases.csv with commas between columns (CSV, comma-delimited), with a full stop as the decimal mark`;
    }
  }
  return null;
};

/** Reads the header; returns null (with problems added) when the file cannot be used at all. */
export const readColumns = (file: string, cells: string[], problems: Problems): Columns | null => {
  const separator = otherSeparator(cells);
  if (separator !== null) {
    problems.add(file, 1, null, separator);
    return null;
  }
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

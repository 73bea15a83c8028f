/**
 * Writes the read log (docs/formats.md, "The read log"): UTF-8, comma-separated, header row, "\n" line ends,
 * RFC 4180 quoting (io/csv-line.ts, the same bytes as papaparse's unparse), booleans 0/1, empty where a value does not apply, then the
 * optional columns (scale, ratings, training, withdrawn), then one `case_<name>` column per case attribute.
 * A text cell that a spreadsheet could run as a formula (starting with =, +, -, @, tab or CR, and
 * not a plain number) is written with a leading single quote; parseReadLog takes it off again.
 * Each line is built as one string, with no array per row: a large study has hundreds of thousands of rows.
 */
import { neutraliseCell } from '../core/formula-text';
import { READ_LOG_COLUMNS, READ_LOG_OPTIONAL_COLUMNS, type ReadRow } from '../core/read-log';
import { csvCell, csvLine } from './csv-line';

// Text that a spreadsheet could run as a formula gets a leading ' (core/formula-text). A number's
// text ("-3.5", "1e-7", "NaN") is never formula-looking and holds nothing CSV quotes, so it is written as it is.
const cell = (value: string | number | null): string => (value === null ? '' : typeof value === 'number' ? String(value) : csvCell(neutraliseCell(value)));

/** Columns a caller adds after all others (the bundle's read id and chain hash): names, and the cells of row i. */
export type ExtraColumns = { names: readonly string[]; cells: (index: number) => readonly string[] };

const COLUMNS = [...READ_LOG_COLUMNS, ...READ_LOG_OPTIONAL_COLUMNS];

export const readLogCsv = (rows: readonly ReadRow[], attributeNames: readonly string[], extra?: ExtraColumns): string => {
  const lines: string[] = [csvLine([...COLUMNS, ...attributeNames.map((name) => `case_${name}`), ...(extra?.names ?? [])])];
  for (let i = 0; i < rows.length; i++) {
    const row = rows[i] as ReadRow;
    let line = cell(row[COLUMNS[0] as (typeof COLUMNS)[number]]);
    for (let c = 1; c < COLUMNS.length; c++) line += `,${cell(row[COLUMNS[c] as (typeof COLUMNS)[number]])}`;
    for (const name of attributeNames) line += `,${csvCell(neutraliseCell(row.case_attributes[name] ?? ''))}`;
    if (extra) for (const value of extra.cells(i)) line += `,${csvCell(value)}`;
    lines.push(line);
  }
  return `${lines.join('\n')}\n`;
};

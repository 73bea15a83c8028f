/**
 * Writes the read log (docs/formats.md, "The read log"): UTF-8, comma-separated, header row, "\n" line ends,
 * RFC 4180 quoting (by papaparse), booleans 0/1, empty where a value does not apply, then the
 * optional columns (scale, ratings, training, withdrawn), then one `case_<name>` column per case attribute.
 * A text cell that a spreadsheet could run as a formula (starting with =, +, -, @, tab or CR, and
 * not a plain number) is written with a leading single quote; parseReadLog takes it off again.
 */
import Papa from 'papaparse';
import { neutraliseCell } from '../core/formula-text';
import { READ_LOG_COLUMNS, READ_LOG_OPTIONAL_COLUMNS, type ReadRow } from '../core/read-log';

// Text that a spreadsheet could run as a formula gets a leading ' (core/formula-text); numbers never do.
const cell = (value: string | number | null): string => (value === null ? '' : neutraliseCell(String(value)));

/** Columns a caller adds after all others (the bundle's read id and chain hash): names, and the cells of row i. */
export type ExtraColumns = { names: readonly string[]; cells: (index: number) => readonly string[] };

export const readLogCsv = (rows: readonly ReadRow[], attributeNames: readonly string[], extra?: ExtraColumns): string => {
  const header = [...READ_LOG_COLUMNS, ...READ_LOG_OPTIONAL_COLUMNS, ...attributeNames.map((name) => `case_${name}`), ...(extra?.names ?? [])];
  const data = rows.map((row, i) => [
    ...READ_LOG_COLUMNS.map((column) => cell(row[column])),
    ...READ_LOG_OPTIONAL_COLUMNS.map((column) => cell(row[column])),
    ...attributeNames.map((name) => neutraliseCell(row.case_attributes[name] ?? '')),
    ...(extra ? extra.cells(i) : []),
  ]);
  return `${Papa.unparse({ fields: header, data }, { newline: '\n', quotes: false, quoteChar: '"', escapeChar: '"' })}\n`;
};

/**
 * Writes the read log of SPEC Contract 1: UTF-8, comma-separated, header row, "\n" line ends,
 * RFC 4180 quoting (by papaparse), booleans 0/1, empty where a value does not apply, then one
 * `case_<name>` column per case attribute.
 */
import Papa from 'papaparse';
import { READ_LOG_COLUMNS, type ReadRow } from '../core/read-log';

const cell = (value: string | number | null): string => (value === null ? '' : String(value));

/** Columns a caller adds after all others (the bundle's read id and chain hash): names, and the cells of row i. */
export type ExtraColumns = { names: readonly string[]; cells: (index: number) => readonly string[] };

export const readLogCsv = (rows: readonly ReadRow[], attributeNames: readonly string[], extra?: ExtraColumns): string => {
  const header = [...READ_LOG_COLUMNS, ...attributeNames.map((name) => `case_${name}`), ...(extra?.names ?? [])];
  const data = rows.map((row, i) => [
    ...READ_LOG_COLUMNS.map((column) => cell(row[column])),
    ...attributeNames.map((name) => row.case_attributes[name] ?? ''),
    ...(extra ? extra.cells(i) : []),
  ]);
  return `${Papa.unparse({ fields: header, data }, { newline: '\n', quotes: false, quoteChar: '"', escapeChar: '"' })}\n`;
};

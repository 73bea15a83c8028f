// A small valid reads.csv for parser and CLI tests, and a helper to break one cell of it.
import { READ_LOG_COLUMNS } from '../../../src/core/read-log';

const HEADER = [...READ_LOG_COLUMNS, 'case_scanner'];

const ROWS = [
  ['S1', 'R1', 'radiologist', '5', 'UA', '1', 'none', 'C1', 'target', '0', '1', '1', '', '', '0', '0', '', '', '', '1', '80', '3000', '2026-01-12T08:00:00Z', 'Halden'],
  ['S1', 'R1', 'radiologist', '5', 'UA', '1', 'none', 'C2', 'target', '0', '2', '0', '', '', '0', '0', '', '', '', '0', '70', '2500', '2026-01-12T08:00:04Z', 'Veyra'],
  ['S1', 'R1', 'radiologist', '5', 'UA', '2', 'sequential', 'C1', 'target', '0', '1', '1', '1', '0.91', '0', '1', '0', '40', '1800', '1', '90', '4100', '2026-02-09T08:00:00Z', 'Halden'],
  ['S1', 'R1', 'radiologist', '5', 'UA', '2', 'sequential', 'C2', 'target', '0', '2', '0', '1', '0.72', '1', '0', '0', '60', '2000', '1', '55', '3900', '2026-02-09T08:00:05Z', 'Veyra'],
];

export const sampleRows = (): string[][] => ROWS.map((r) => [...r]);

export const toCsv = (rows: string[][], header: string[] = HEADER): string =>
  `${[header, ...rows].map((r) => r.map((c) => (/[",\n]/.test(c) ? `"${c.replace(/"/g, '""')}"` : c)).join(',')).join('\n')}\n`;

export const SAMPLE_CSV = toCsv(sampleRows());

/** The sample with one cell replaced: data row index (0-based; line = index + 2) and column name. */
export const withCell = (row: number, column: string, value: string): string => {
  const rows = sampleRows();
  const r = rows[row];
  if (r === undefined) throw new Error(`no sample row ${row}`);
  r[HEADER.indexOf(column)] = value;
  return toCsv(rows);
};

export const SAMPLE_HEADER = HEADER;

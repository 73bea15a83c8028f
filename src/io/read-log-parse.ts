import Papa from 'papaparse';
import { READ_LOG_COLUMNS, type ReadRow } from '../core/read-log';
import { ReadLogError } from './read-log/read-log-error';
import { parseRow, readKey, rowLayout } from './read-log/row';

export { ReadLogError } from './read-log/read-log-error';

/**
 * Parses a reads.csv (SPEC Contract 1) into typed reads, checking every cell first: the whole
 * file is refused at its first problem with a ReadLogError carrying the 1-based line (header is
 * line 1) and the column. Required columns may come in any order; `case_<name>` columns become
 * case_attributes; other extra columns are ignored. Fully blank lines are skipped.
 * Throws ReadLogError for an empty file, a missing or repeated column, a ragged row, a bad value,
 * a read repeated (same reader, case, finding, period), or an unreadable CSV.
 * Example: parseReadLog(text)[0].reader_id → 'R1'.
 */
export const parseReadLog = (input: string): ReadRow[] => {
  const textIn = input.charCodeAt(0) === 0xfeff ? input.slice(1) : input;
  if (textIn.trim() === '') throw new ReadLogError(1, null, 'the file is empty');
  const records = splitRecords(textIn);
  const header = records.cells[0];
  if (header === undefined) throw new ReadLogError(1, null, 'the file is empty');
  checkHeader(header, records.lines[0] ?? 1);
  const layout = rowLayout(header);
  const width = header.length;
  const seen = new Map<string, number>();
  const rows: ReadRow[] = [];
  for (let k = 1; k < records.cells.length; k++) {
    const cells = records.cells[k] as string[];
    const line = records.lines[k] as number;
    if (cells.length === 1 && cells[0] === '') continue;
    if (cells.length !== width) {
      const col = header[Math.min(cells.length, width - 1)] ?? null;
      throw new ReadLogError(line, cells.length < width ? col : null, `row has ${cells.length} fields, the header has ${width}`);
    }
    const row = parseRow(cells, line, layout);
    const key = readKey(row);
    const earlier = seen.get(key);
    if (earlier !== undefined) throw new ReadLogError(line, 'case_id', `repeats the read of line ${earlier} (same reader, case, finding and period)`);
    seen.set(key, line);
    rows.push(row);
  }
  return rows;
};

// The records' cells and their 1-based line numbers, side by side.
type RawRecords = { cells: string[][]; lines: number[] };

// Papaparse reports each row's end offset; a row starts where the previous ended, and its line
// is 1 + the newlines before that start (quoted cells may span lines).
const splitRecords = (text: string): RawRecords => {
  const newlines: number[] = [];
  for (let i = text.indexOf('\n'); i !== -1; i = text.indexOf('\n', i + 1)) newlines.push(i);
  const lineAt = (offset: number) => {
    let lo = 0;
    let hi = newlines.length;
    while (lo < hi) {
      const mid = (lo + hi) >>> 1;
      if ((newlines[mid] as number) < offset) lo = mid + 1;
      else hi = mid;
    }
    return lo + 1;
  };
  const out: RawRecords = { cells: [], lines: [] };
  let start = 0;
  let problem: ReadLogError | null = null;
  Papa.parse<string[]>(text, {
    delimiter: ',',
    header: false,
    skipEmptyLines: false,
    step: (r, parser) => {
      const line = lineAt(start);
      const err = r.errors[0];
      if (err !== undefined && problem === null) {
        problem = new ReadLogError(line, null, `unreadable CSV (${err.message})`);
        parser.abort();
        return;
      }
      out.cells.push(r.data);
      out.lines.push(line);
      start = r.meta.cursor;
    },
  });
  if (problem !== null) throw problem;
  return out;
};

const checkHeader = (cells: string[], line: number): void => {
  const pos = new Set<string>();
  for (const name of cells) {
    if (pos.has(name)) throw new ReadLogError(line, name, 'appears twice in the header');
    pos.add(name);
  }
  for (const col of READ_LOG_COLUMNS) if (!pos.has(col)) throw new ReadLogError(line, col, 'required column is missing from the header');
};

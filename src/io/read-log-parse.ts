import Papa from 'papaparse';
import { READ_LOG_COLUMNS, type ReadLogColumn, type ReadRow } from '../core/read-log';
import * as f from './read-log/fields';
import { ReadLogError } from './read-log/read-log-error';

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
  const [header, ...body] = records;
  if (header === undefined) throw new ReadLogError(1, null, 'the file is empty');
  const index = headerIndex(header.cells, header.line);
  const attrs = header.cells.flatMap((name, i) => (name.startsWith('case_') && name !== 'case_id' ? [{ name: name.slice(5), i }] : []));
  const seen = new Map<string, number>();
  const rows: ReadRow[] = [];
  for (const rec of body) {
    if (rec.cells.length === 1 && rec.cells[0] === '') continue;
    if (rec.cells.length !== header.cells.length) {
      const col = header.cells[Math.min(rec.cells.length, header.cells.length - 1)] ?? null;
      throw new ReadLogError(rec.line, rec.cells.length < header.cells.length ? col : null,
        `row has ${rec.cells.length} fields, the header has ${header.cells.length}`);
    }
    const row = parseRow(rec, index, attrs);
    const key = JSON.stringify([row.reader_id, row.case_id, row.finding, row.period]);
    const earlier = seen.get(key);
    if (earlier !== undefined) throw new ReadLogError(rec.line, 'case_id', `repeats the read of line ${earlier} (same reader, case, finding and period)`);
    seen.set(key, rec.line);
    rows.push(row);
  }
  return rows;
};

type RawRecord = { line: number; cells: string[] };

// Papaparse reports each row's end offset; a row starts where the previous ended, and its line
// is 1 + the newlines before that start (quoted cells may span lines).
const splitRecords = (text: string): RawRecord[] => {
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
  const out: RawRecord[] = [];
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
      out.push({ line, cells: r.data });
      start = r.meta.cursor;
    },
  });
  if (problem !== null) throw problem;
  return out;
};

type ColumnIndex = (column: ReadLogColumn) => number;

const headerIndex = (cells: string[], line: number): ColumnIndex => {
  const pos = new Map<string, number>();
  for (const [i, name] of cells.entries()) {
    if (pos.has(name)) throw new ReadLogError(line, name, 'appears twice in the header');
    pos.set(name, i);
  }
  for (const col of READ_LOG_COLUMNS) if (!pos.has(col)) throw new ReadLogError(line, col, 'required column is missing from the header');
  return (column) => pos.get(column) ?? -1;
};

const parseRow = (rec: RawRecord, index: ColumnIndex, attrs: { name: string; i: number }[]): ReadRow => {
  const c = (column: ReadLogColumn): f.Cell => ({ line: rec.line, column, raw: rec.cells[index(column)] ?? '' });
  const assistance = f.assistance(c('assistance'));
  const aiCall = f.optionalBit(c('ai_call'));
  if (assistance === 'none' && aiCall !== null) throw new ReadLogError(rec.line, 'ai_call', 'must be empty when assistance is none');
  if (assistance !== 'none' && aiCall === null) throw new ReadLogError(rec.line, 'ai_call', `must be 0 or 1 when assistance is ${assistance}`);
  const initialCall = f.optionalBit(c('initial_call'));
  if (assistance === 'sequential' && initialCall === null) throw new ReadLogError(rec.line, 'initial_call', 'must be 0 or 1 when assistance is sequential');
  const case_attributes: Record<string, string> = {};
  for (const a of attrs) case_attributes[a.name] = rec.cells[a.i] ?? '';
  return {
    study_id: f.text(c('study_id')),
    reader_id: f.text(c('reader_id')),
    reader_role: c('reader_role').raw,
    reader_years: f.optionalNumber(c('reader_years'), 0, 100, 'a number of years in 0..100'),
    sequence: f.optionalText(c('sequence')),
    period: f.positiveInteger(c('period')),
    assistance,
    case_id: f.text(c('case_id')),
    finding: f.text(c('finding')),
    practice: f.bit(c('practice')),
    order: f.positiveInteger(c('order')),
    truth: f.bit(c('truth')),
    ai_call: aiCall,
    ai_score: f.optionalNumber(c('ai_score'), 0, 1, 'a score in [0,1]'),
    ai_planted: f.bit(c('ai_planted')),
    caution_shown: f.bit(c('caution_shown')),
    initial_call: initialCall,
    initial_confidence: f.optionalNumber(c('initial_confidence'), 0, 100, 'a confidence in 0..100'),
    initial_ms: f.optionalNumber(c('initial_ms'), 0, Infinity, 'a time in ms >= 0'),
    final_call: f.bit(c('final_call')),
    final_confidence: f.optionalNumber(c('final_confidence'), 0, 100, 'a confidence in 0..100'),
    total_ms: f.number(c('total_ms'), 0, Infinity, 'a time in ms >= 0'),
    shown_at: f.isoUtc(c('shown_at')),
    case_attributes,
  };
};

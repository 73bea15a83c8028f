// One data row of a reads.csv into a typed read. Cells are checked in a fixed order, so a row
// with several problems always reports the same (first) one.
import { READ_LOG_COLUMNS, READ_LOG_OPTIONAL_COLUMNS, type ReadLogColumn, type ReadLogOptionalColumn, type ReadRow } from '../../core/read-log';
import { restoreCell } from '../../core/formula-text';
import * as f from './fields';
import { ReadLogError } from './read-log-error';

/**
 * Where each column sits in the header (-1 when an optional one is missing), the case_<name>
 * columns, `same`, which hands back one shared copy of each distinct id text (a log repeats a few
 * reader, case and finding ids many thousand times: one copy each keeps the heap small and makes
 * the engine's lookups by id cheap), and `sameAttributes`, one shared frozen case_attributes
 * object per distinct combination of values (a million reads of a thousand cases need a thousand).
 */
export type RowLayout = {
  at: Readonly<Record<ReadLogColumn | ReadLogOptionalColumn, number>>;
  attrs: { name: string; i: number }[];
  same: (text: string) => string;
  sameAttributes: (values: readonly string[]) => Readonly<Record<string, string>>;
};

/** The layout of a header whose required columns are known to be present. */
export const rowLayout = (header: readonly string[]): RowLayout => {
  const at = Object.fromEntries([...READ_LOG_COLUMNS, ...READ_LOG_OPTIONAL_COLUMNS].map((col) => [col, header.indexOf(col)])) as Record<ReadLogColumn | ReadLogOptionalColumn, number>;
  const attrs = header.flatMap((name, i) => (name.startsWith('case_') && name !== 'case_id' ? [{ name: name.slice(5), i }] : []));
  const shared = new Map<string, string>();
  const same = (text: string): string => {
    const known = shared.get(text);
    if (known !== undefined) return known;
    shared.set(text, text);
    return text;
  };
  const attributeSets = new Map<string, Readonly<Record<string, string>>>();
  const sameAttributes = (values: readonly string[]): Readonly<Record<string, string>> => {
    // JSON of the values is an unambiguous key whatever characters they hold
    const key = values.length === 1 ? (values[0] as string) : JSON.stringify(values);
    const known = attributeSets.get(key);
    if (known !== undefined) return known;
    // null prototype: a case___proto__ or case_constructor column is an ordinary key, not the prototype
    const made: Record<string, string> = Object.create(null);
    attrs.forEach((a, k) => {
      made[a.name] = same(values[k] as string);
    });
    Object.freeze(made);
    attributeSets.set(key, made);
    return made;
  };
  return { at, attrs, same, sameAttributes };
};

// The cell at index i ('' for a column missing from the header, i = -1); restoreCell takes off
// the quote that Heed's export puts before formula-looking text (only a cell starting with ').
const cellAt = (cells: readonly string[], i: number): string => {
  const raw = cells[i] ?? '';
  return raw.charCodeAt(0) === 39 ? restoreCell(raw) : raw;
};

/**
 * The typed read of one row whose cell count matches the header.
 * Throws ReadLogError naming the line and the first bad column.
 */
export const parseRow = (cells: readonly string[], line: number, layout: RowLayout): ReadRow => {
  const { at, same } = layout;
  const assistance = f.assistance(cellAt(cells, at.assistance), line, 'assistance');
  const aiCall = f.optionalBit(cellAt(cells, at.ai_call), line, 'ai_call');
  if (assistance === 'none' && aiCall !== null) throw new ReadLogError(line, 'ai_call', 'must be empty when assistance is none');
  if (assistance !== 'none' && aiCall === null) throw new ReadLogError(line, 'ai_call', `must be 0 or 1 when assistance is ${assistance}`);
  const initialCall = f.optionalBit(cellAt(cells, at.initial_call), line, 'initial_call');
  if (assistance === 'sequential' && initialCall === null) throw new ReadLogError(line, 'initial_call', 'must be 0 or 1 when assistance is sequential');
  const scale = f.scale(cellAt(cells, at.scale), line, 'scale');
  const values: string[] = [];
  for (const a of layout.attrs) values.push(cellAt(cells, a.i));
  // shared and frozen: every read of a case with the same attribute values holds the same object
  const case_attributes = layout.sameAttributes(values) as Record<string, string>;
  // the property order below is the order cells are checked in (and the ReadRow field order)
  const read: ReadRow = {
    study_id: same(f.text(cellAt(cells, at.study_id), line, 'study_id')),
    reader_id: same(f.text(cellAt(cells, at.reader_id), line, 'reader_id')),
    reader_role: same(cellAt(cells, at.reader_role)),
    reader_years: f.optionalNumber(cellAt(cells, at.reader_years), line, 'reader_years', 0, 100, 'a number of years in 0..100'),
    sequence: f.optionalText(same(cellAt(cells, at.sequence))),
    period: f.positiveInteger(cellAt(cells, at.period), line, 'period'),
    assistance,
    case_id: same(f.text(cellAt(cells, at.case_id), line, 'case_id')),
    finding: same(f.text(cellAt(cells, at.finding), line, 'finding')),
    practice: f.bit(cellAt(cells, at.practice), line, 'practice'),
    order: f.positiveInteger(cellAt(cells, at.order), line, 'order'),
    truth: f.bit(cellAt(cells, at.truth), line, 'truth'),
    ai_call: aiCall,
    ai_score: f.optionalNumber(cellAt(cells, at.ai_score), line, 'ai_score', 0, 1, 'a score in [0,1]'),
    ai_planted: f.bit(cellAt(cells, at.ai_planted), line, 'ai_planted'),
    caution_shown: f.bit(cellAt(cells, at.caution_shown), line, 'caution_shown'),
    initial_call: initialCall,
    initial_confidence: f.optionalNumber(cellAt(cells, at.initial_confidence), line, 'initial_confidence', 0, 100, 'a confidence in 0..100'),
    initial_ms: f.optionalNumber(cellAt(cells, at.initial_ms), line, 'initial_ms', 0, Infinity, 'a time in ms >= 0'),
    final_call: f.bit(cellAt(cells, at.final_call), line, 'final_call'),
    final_confidence: f.optionalNumber(cellAt(cells, at.final_confidence), line, 'final_confidence', 0, 100, 'a confidence in 0..100'),
    total_ms: f.number(cellAt(cells, at.total_ms), line, 'total_ms', 0, Infinity, 'a time in ms >= 0'),
    shown_at: f.isoUtc(cellAt(cells, at.shown_at), line, 'shown_at'),
    scale,
    initial_rating: f.rating(cellAt(cells, at.initial_rating), line, 'initial_rating', scale, assistance === 'sequential'),
    final_rating: f.rating(cellAt(cells, at.final_rating), line, 'final_rating', scale, true),
    training: f.optionalBit(cellAt(cells, at.training), line, 'training') ?? 0,
    withdrawn: f.optionalBit(cellAt(cells, at.withdrawn), line, 'withdrawn') ?? 0,
    case_attributes,
  };
  if (read.initial_ms !== null && read.initial_ms > read.total_ms) throw initialAfterTotal(line, read.initial_ms, read.total_ms);
  return read;
};

/** The refusal of a read whose initial_ms exceeds its total_ms. */
export const initialAfterTotal = (line: number, initialMs: number, totalMs: number): ReadLogError =>
  new ReadLogError(line, 'initial_ms', `must be at most total_ms (${totalMs}), got ${initialMs}`);

/** The refusal of a read repeating the one on line `earlier` (same reader, case, finding, period). */
export const repeatedRead = (line: number, earlier: number): ReadLogError =>
  new ReadLogError(line, 'case_id', `repeats the read of line ${earlier} (same reader, case, finding and period)`);

/**
 * Remembers each read's line and answers, for a new read, the line of an earlier read with the
 * same reader, case, finding and period (undefined when none). Keys are two-level, reader and
 * finding then period and case: the length prefix and the ':' after the (digits-only) period
 * keep distinct reads apart whatever their ids hold.
 */
export const repeatedReads = (): ((r: ReadRow, line: number) => number | undefined) => {
  const byReader = new Map<string, Map<string, number>>();
  return (r, line) => {
    const outer = `${r.reader_id.length}:${r.reader_id}${r.finding}`;
    let inner = byReader.get(outer);
    if (inner === undefined) {
      inner = new Map();
      byReader.set(outer, inner);
    }
    const key = `${r.period}:${r.case_id}`;
    const earlier = inner.get(key);
    if (earlier === undefined) inner.set(key, line);
    return earlier;
  };
};

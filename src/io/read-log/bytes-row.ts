// One data row of a reads.csv typed straight from the file's bytes into the log's columns, with
// no string per cell: bits and the usual numbers and times are read from the bytes, ids are
// numbered by their bytes (id-table.ts). A cell in any other form is made into text and given to
// the cell parser parseRow uses (fields.ts), which types it or throws; the cells are checked in
// parseRow's order, so a row is refused with the same message at the same column.
import { ANSWER_SCALES, ratingProblem } from '../../core/answer-scale';
import { ASSISTANCE } from '../../core/design';
import * as f from './fields';
import type { IdTable } from './id-table';
import { textOf } from './id-table';
import { repeatedReadsByNumber, restoreText, type LogColumnsBuilder } from './log-columns';
import { ReadLogError } from './read-log-error';
import { initialAfterTotal, repeatedRead, type RowLayout } from './row';

const bytesOf = (words: readonly string[]): Uint8Array[] => words.map((w) => Uint8Array.from(w, (ch) => ch.charCodeAt(0)));
const ASSISTANCE_BYTES = bytesOf(ASSISTANCE);
const SCALE_BYTES = bytesOf(ANSWER_SCALES);
const CALL_CONFIDENCE = ANSWER_SCALES.indexOf('call-confidence');
const SEQUENTIAL = ASSISTANCE.indexOf('sequential');
const NONE = ASSISTANCE.indexOf('none');

/**
 * A function typing the row whose cells are bytes[starts[k], ends[k]) for header column k
 * (entry `width`, the header's length, is an empty cell: where a missing optional column points)
 * into read number `builder.n`, then counting it. Throws ReadLogError as parseRow, then the
 * repeated-read check of parseReadLog, would on the row's text.
 */
export const bytesRowTyper = (
  layout: RowLayout, width: number, builder: LogColumnsBuilder,
): ((bytes: Uint8Array, starts: Int32Array, ends: Int32Array, line: number) => void) => {
  const at = (k: number): number => (k < 0 ? width : k);
  const col = {
    studyId: at(layout.at.study_id), readerId: at(layout.at.reader_id), role: at(layout.at.reader_role), years: at(layout.at.reader_years),
    period: at(layout.at.period), assistance: at(layout.at.assistance), caseId: at(layout.at.case_id), finding: at(layout.at.finding),
    practice: at(layout.at.practice), order: at(layout.at.order), truth: at(layout.at.truth), aiCall: at(layout.at.ai_call),
    aiScore: at(layout.at.ai_score), aiPlanted: at(layout.at.ai_planted), caution: at(layout.at.caution_shown),
    initialCall: at(layout.at.initial_call), initialConfidence: at(layout.at.initial_confidence), initialMs: at(layout.at.initial_ms),
    finalCall: at(layout.at.final_call), finalConfidence: at(layout.at.final_confidence), totalMs: at(layout.at.total_ms),
    shownAt: at(layout.at.shown_at), scale: at(layout.at.scale), initialRating: at(layout.at.initial_rating),
    finalRating: at(layout.at.final_rating), training: at(layout.at.training), withdrawn: at(layout.at.withdrawn),
  };
  const attrs = builder.withAttributes(layout.attrs.map((a) => a.name)).map((a, k) => ({ a, k: (layout.attrs[k] as { i: number }).i }));
  const c = builder.c;
  const ids = builder.ids;
  const earlierRead = repeatedReadsByNumber();
  let b: Uint8Array = new Uint8Array(0);
  let s: Int32Array = new Int32Array(0);
  let e: Int32Array = new Int32Array(0);
  let line = 0;

  // the text the cell stands for, as parseRow's cellAt gives it
  const text = (k: number): string => restoreText(textOf(b, s[k] as number, e[k] as number));
  const bit = (k: number, column: string): 0 | 1 => {
    const from = s[k] as number;
    if ((e[k] as number) - from === 1) {
      const ch = b[from];
      if (ch === 48) return 0;
      if (ch === 49) return 1;
    }
    return f.bit(text(k), line, column);
  };
  const optionalBit = (k: number, column: string): -1 | 0 | 1 => (s[k] === e[k] ? -1 : bit(k, column));
  const number = (k: number, column: string, min: number, max: number, range: string): number => {
    const v = f.numberAt(b, s[k] as number, e[k] as number);
    return v >= min && v <= max ? v : f.number(text(k), line, column, min, max, range);
  };
  const optionalNumber = (k: number, column: string, min: number, max: number, range: string): number => {
    if (s[k] === e[k]) return Number.NaN;
    const v = f.numberAt(b, s[k] as number, e[k] as number);
    return v >= min && v <= max ? v : f.optionalNumber(text(k), line, column, min, max, range) ?? Number.NaN;
  };
  const positiveInteger = (k: number, column: string): number => {
    const v = f.numberAt(b, s[k] as number, e[k] as number);
    return v >= 1 && v <= Number.MAX_SAFE_INTEGER && Number.isInteger(v) ? v : f.positiveInteger(text(k), line, column);
  };
  // a required id: a first byte that is printable ASCII and not a quote makes it non-blank and its own text
  const solidFirst = (k: number): boolean => {
    if (s[k] === e[k]) return false;
    const ch = b[s[k] as number] as number;
    return ch > 32 && ch < 127 && ch !== 39;
  };
  const requiredId = (k: number, column: string, table: IdTable): number => {
    if (solidFirst(k)) return table.ofBytes(b, s[k] as number, e[k] as number);
    return table.ofText(f.text(text(k), line, column));
  };
  const oneOf = (k: number, words: readonly Uint8Array[]): number => {
    const from = s[k] as number;
    const len = (e[k] as number) - from;
    for (let w = 0; w < words.length; w++) {
      const word = words[w] as Uint8Array;
      if (word.length !== len) continue;
      let j = 0;
      while (j < len && word[j] === b[from + j]) j++;
      if (j === len) return w;
    }
    return -1;
  };
  const rating = (k: number, column: string, kind: number, needed: boolean): number => {
    const scale = ANSWER_SCALES[kind] as (typeof ANSWER_SCALES)[number];
    if (kind !== CALL_CONFIDENCE && needed && s[k] !== e[k]) {
      const v = f.numberAt(b, s[k] as number, e[k] as number);
      if (v === v && ratingProblem(scale, v) === null) return v;
    } else if (s[k] === e[k] && (kind === CALL_CONFIDENCE || !needed)) return Number.NaN;
    return f.rating(text(k), line, column, scale, needed) ?? Number.NaN;
  };

  return (bytes, starts, ends, lineNumber) => {
    b = bytes;
    s = starts;
    e = ends;
    line = lineNumber;
    const i = builder.n;
    // parseRow's order: assistance and the calls it governs, the scale, then the cells in column order
    let assistance = oneOf(col.assistance, ASSISTANCE_BYTES);
    if (assistance === -1) assistance = ASSISTANCE.indexOf(f.assistance(text(col.assistance), line, 'assistance'));
    const aiCall = optionalBit(col.aiCall, 'ai_call');
    if (assistance === NONE && aiCall !== -1) throw new ReadLogError(line, 'ai_call', 'must be empty when assistance is none');
    if (assistance !== NONE && aiCall === -1) throw new ReadLogError(line, 'ai_call', `must be 0 or 1 when assistance is ${ASSISTANCE[assistance]}`);
    const initialCall = optionalBit(col.initialCall, 'initial_call');
    if (assistance === SEQUENTIAL && initialCall === -1) throw new ReadLogError(line, 'initial_call', 'must be 0 or 1 when assistance is sequential');
    let scale = s[col.scale] === e[col.scale] ? CALL_CONFIDENCE : oneOf(col.scale, SCALE_BYTES);
    if (scale === -1) scale = ANSWER_SCALES.indexOf(f.scale(text(col.scale), line, 'scale'));
    for (const { a, k } of attrs) a.code[i] = a.table.ofBytes(b, s[k] as number, e[k] as number);
    if (!solidFirst(col.studyId)) f.text(text(col.studyId), line, 'study_id');
    const reader = requiredId(col.readerId, 'reader_id', ids.reader);
    c.role[i] = ids.role.ofBytes(b, s[col.role] as number, e[col.role] as number);
    optionalNumber(col.years, 'reader_years', 0, 100, 'a number of years in 0..100');
    const period = positiveInteger(col.period, 'period');
    const kase = requiredId(col.caseId, 'case_id', ids.case);
    const finding = requiredId(col.finding, 'finding', ids.finding);
    c.practice[i] = bit(col.practice, 'practice');
    positiveInteger(col.order, 'order');
    c.truth[i] = bit(col.truth, 'truth');
    c.aiScore[i] = optionalNumber(col.aiScore, 'ai_score', 0, 1, 'a score in [0,1]');
    bit(col.aiPlanted, 'ai_planted');
    c.caution[i] = bit(col.caution, 'caution_shown');
    c.initialConfidence[i] = optionalNumber(col.initialConfidence, 'initial_confidence', 0, 100, 'a confidence in 0..100');
    const initialMs = optionalNumber(col.initialMs, 'initial_ms', 0, Infinity, 'a time in ms >= 0');
    c.finalCall[i] = bit(col.finalCall, 'final_call');
    c.finalConfidence[i] = optionalNumber(col.finalConfidence, 'final_confidence', 0, 100, 'a confidence in 0..100');
    const totalMs = number(col.totalMs, 'total_ms', 0, Infinity, 'a time in ms >= 0');
    if (!f.realTimeAt(b, s[col.shownAt] as number, e[col.shownAt] as number)) f.isoUtc(text(col.shownAt), line, 'shown_at');
    c.initialRating[i] = rating(col.initialRating, 'initial_rating', scale, assistance === SEQUENTIAL);
    c.finalRating[i] = rating(col.finalRating, 'final_rating', scale, true);
    const training = optionalBit(col.training, 'training');
    const withdrawn = optionalBit(col.withdrawn, 'withdrawn');
    if (initialMs > totalMs) throw initialAfterTotal(line, initialMs, totalMs);
    const earlier = earlierRead(reader, finding, period, kase, line);
    if (earlier !== undefined) throw repeatedRead(line, earlier);
    c.reader[i] = reader;
    c.case[i] = kase;
    c.finding[i] = finding;
    c.assistance[i] = assistance;
    c.scale[i] = scale;
    c.aiCall[i] = aiCall;
    c.initialCall[i] = initialCall;
    c.period[i] = period;
    c.totalMs[i] = totalMs;
    c.training[i] = training === -1 ? 0 : training;
    c.withdrawn[i] = withdrawn === -1 ? 0 : withdrawn;
    builder.n = i + 1;
  };
};

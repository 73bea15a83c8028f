// Cell parsers for the read log: each takes the raw cell, its line and column, and returns the
// typed value or throws a ReadLogError naming the cell. They run on every cell of logs of
// 100,000 rows, so the common cases are checked character by character before any regex.
import { ANSWER_SCALES, ratingProblem, ratingRange, type AnswerScaleKind } from '../../core/answer-scale';
import { ASSISTANCE, type Assistance } from '../../core/design';
import type { Bit } from '../../core/read-log';
import { ReadLogError } from './read-log-error';

const fail = (raw: string, line: number, column: string, what: string): never => {
  throw new ReadLogError(line, column, `${what}, got ${JSON.stringify(raw)}`);
};

const NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

// Printable ASCII other than space: never trimmed away by String.prototype.trim.
const solid = (code: number): boolean => code > 32 && code < 127;

/** True when trim() would leave the cell empty (fast answer for the usual non-blank cell). */
const blank = (raw: string): boolean => raw.length === 0 || (!solid(raw.charCodeAt(0)) && raw.trim() === '');

export const text = (raw: string, line: number, column: string): string => {
  if (blank(raw)) fail(raw, line, column, 'must not be empty');
  return raw;
};

export const optionalText = (raw: string): string | null => (raw === '' ? null : raw);

export const bit = (raw: string, line: number, column: string): Bit => {
  if (raw === '0') return 0;
  if (raw === '1') return 1;
  return fail(raw, line, column, 'must be 0 or 1');
};

export const optionalBit = (raw: string, line: number, column: string): Bit | null => (raw === '' ? null : bit(raw, line, column));

// The value of a cell of plain digits with an optional fraction (what logs hold), else NaN so
// the caller takes the general path. Up to 15 digits a whole number sums exactly, equal to
// Number(raw); a fraction is left to Number once its characters are known to be valid.
const plainNumber = (raw: string): number => {
  const n = raw.length;
  if (n === 0 || n > 15) return Number.NaN;
  let v = 0;
  let i = 0;
  for (; i < n; i++) {
    const d = raw.charCodeAt(i) - 48;
    if (d < 0 || d > 9) break;
    v = v * 10 + d;
  }
  if (i === n) return v;
  if (i === 0 || raw.charCodeAt(i) !== 46) return Number.NaN;
  for (let j = i + 1; j < n; j++) {
    const d = raw.charCodeAt(j) - 48;
    if (d < 0 || d > 9) return Number.NaN;
  }
  return Number(raw);
};

// Powers of ten that doubles hold exactly (10^0 .. 10^22).
const TEN_TO: number[] = Array.from({ length: 23 }, (_, k) => 10 ** k);

/**
 * The value of bytes[from, to) when it is [+-]digits[.digits] with 1 to 15 digits in all, else
 * NaN (the caller then takes the cell's text through `number`). Equal to Number() of the text:
 * the digits make a whole number below 2^53 and the divisor a power of ten below 10^23, both
 * exact doubles, so the one division is correctly rounded, as Number() is (Clinger's fast path).
 * Example: numberAt(ascii('-0.25'), 0, 5) → -0.25; numberAt(ascii('1e3'), 0, 3) → NaN.
 */
export const numberAt = (b: Uint8Array, from: number, to: number): number => {
  let i = from;
  const first = b[i];
  const negative = first === 45;
  if (negative || first === 43) i++;
  let whole = 0;
  let digits = 0;
  let fraction = -1;
  for (; i < to; i++) {
    const d = (b[i] as number) - 48;
    if (d >= 0 && d <= 9) {
      whole = whole * 10 + d;
      digits++;
      if (fraction >= 0) fraction++;
    } else if (d === -2 && fraction < 0) fraction = 0;
    else return Number.NaN;
  }
  if (digits === 0 || digits > 15) return Number.NaN;
  const v = fraction > 0 ? whole / (TEN_TO[fraction] as number) : whole;
  return negative ? -v : v;
};

export const number = (raw: string, line: number, column: string, min: number, max: number, range: string): number => {
  let v = plainNumber(raw);
  if (v !== v) {
    const t = raw.trim();
    if (!NUMBER.test(t)) fail(raw, line, column, 'must be a number');
    v = Number(t);
    // 1e999 matches the pattern but is Infinity; a log only ever holds finite numbers
    if (!Number.isFinite(v)) fail(raw, line, column, 'must be a finite number');
  }
  if (!(v >= min && v <= max)) fail(raw, line, column, `must be ${range}`);
  return v;
};

export const optionalNumber = (raw: string, line: number, column: string, min: number, max: number, range: string): number | null =>
  blank(raw) ? null : number(raw, line, column, min, max, range);

export const positiveInteger = (raw: string, line: number, column: string): number => {
  const v = number(raw, line, column, 1, Number.MAX_SAFE_INTEGER, 'a whole number >= 1');
  if (!Number.isInteger(v)) fail(raw, line, column, 'must be a whole number >= 1');
  return v;
};

export const assistance = (raw: string, line: number, column: string): Assistance => {
  const found = ASSISTANCE.find((a) => a === raw);
  if (found === undefined) return fail(raw, line, column, `must be one of ${ASSISTANCE.join(', ')}`);
  return found;
};

// The shape ISO 8601 UTC times take in a log: YYYY-MM-DDTHH:MM, optionally :SS and a fraction,
// then Z (the pattern /^(\d{4})-(\d{2})-(\d{2})T(\d{2}):(\d{2})(?::(\d{2})(\.\d+)?)?Z$/),
// checked by character codes on the cell's bytes: a log has one such cell per read.
const isDigit = (b: Uint8Array, i: number): boolean => {
  const d = (b[i] as number) - 48;
  return d >= 0 && d <= 9;
};
const digitsIn = (b: Uint8Array, from: number, to: number): boolean => {
  for (let i = from; i < to; i++) if (!isDigit(b, i)) return false;
  return true;
};
const twoDigits = (b: Uint8Array, i: number): number => ((b[i] as number) - 48) * 10 + (b[i + 1] as number) - 48;

// Whether year-month-date is a real calendar day: Date.UTC rolls 2026-02-30 over to March 2
// instead of refusing it, so the day is checked against the date it makes (and years 0-99, which
// Date.UTC takes as 1900-1999, are refused). A log has few distinct days, so the answers are kept
// (a bounded cache).
const realDays = new Map<number, boolean>();
const realDay = (year: number, month: number, date: number): boolean => {
  const key = (year * 100 + month) * 100 + date;
  const known = realDays.get(key);
  if (known !== undefined) return known;
  const made = new Date(Date.UTC(year, month - 1, date));
  const real = made.getUTCFullYear() === year && made.getUTCMonth() === month - 1 && made.getUTCDate() === date;
  if (realDays.size >= 4096) realDays.clear();
  realDays.set(key, real);
  return real;
};

/**
 * Whether bytes[from, to) is a real calendar time in the shape above: hours 0-23, minutes and
 * seconds 0-59, a real day. Example: realTimeAt(ascii('2026-01-31T09:15:00Z'), 0, 20) → true.
 */
export const realTimeAt = (b: Uint8Array, from: number, to: number): boolean => {
  const n = to - from;
  if (n < 17 || b[to - 1] !== 90 /* Z */) return false;
  const o = from;
  if (!digitsIn(b, o, o + 4) || b[o + 4] !== 45 || !digitsIn(b, o + 5, o + 7) || b[o + 7] !== 45 || !digitsIn(b, o + 8, o + 10)) return false;
  if (b[o + 10] !== 84 /* T */ || !digitsIn(b, o + 11, o + 13) || b[o + 13] !== 58 || !digitsIn(b, o + 14, o + 16)) return false;
  let seconds = 0;
  if (n !== 17) {
    if (n < 20 || b[o + 16] !== 58 || !digitsIn(b, o + 17, o + 19)) return false;
    seconds = twoDigits(b, o + 17);
    if (n !== 20 && (n < 22 || b[o + 19] !== 46 || !digitsIn(b, o + 20, to - 1))) return false;
  }
  if (twoDigits(b, o + 11) > 23 || twoDigits(b, o + 14) > 59 || seconds > 59) return false;
  return realDay(twoDigits(b, o) * 100 + twoDigits(b, o + 2), twoDigits(b, o + 5), twoDigits(b, o + 8));
};

// realTimeAt on a cell's text: only plain ASCII can match, so its codes are the bytes
let timeScratch = new Uint8Array(32);
const realTime = (raw: string): boolean => {
  const n = raw.length;
  if (n > timeScratch.length) timeScratch = new Uint8Array(n);
  for (let i = 0; i < n; i++) {
    const c = raw.charCodeAt(i);
    if (c > 127) return false;
    timeScratch[i] = c;
  }
  return realTimeAt(timeScratch, 0, n);
};

export const isoUtc = (raw: string, line: number, column: string): string => {
  if (!realTime(raw)) fail(raw, line, column, 'must be a real ISO 8601 UTC time such as 2026-01-31T09:15:00Z');
  return raw;
};

/** The answer scale of a read; an empty cell (or no column) is call-confidence. */
export const scale = (raw: string, line: number, column: string): AnswerScaleKind => {
  if (raw === '') return 'call-confidence';
  const found = ANSWER_SCALES.find((s) => s === raw);
  if (found === undefined) return fail(raw, line, column, `must be one of ${ANSWER_SCALES.join(', ')} (or empty for call-confidence)`);
  return found;
};

/**
 * A rating cell of a read on `kind`: empty on call-confidence; on a rating scale required when
 * `needed` (final always, initial on sequential reads), else empty; five-point whole 1..5, percent 0..100.
 */
export const rating = (raw: string, line: number, column: string, kind: AnswerScaleKind, needed: boolean): number | null => {
  if (kind === 'call-confidence' || !needed) {
    if (!blank(raw)) fail(raw, line, column, kind === 'call-confidence' ? 'must be empty when the scale is call-confidence' : 'must be empty when the read is not sequential');
    return null;
  }
  if (blank(raw)) return fail(raw, line, column, `must hold the rating when the scale is ${kind}`);
  const value = number(raw, line, column, -Infinity, Infinity, 'a number');
  if (ratingProblem(kind, value) === null) return value;
  const range = ratingRange(kind);
  return fail(raw, line, column, `must be ${range?.integer ? 'a whole number' : 'a number'} ${range?.min} to ${range?.max} on the ${kind} scale`);
};

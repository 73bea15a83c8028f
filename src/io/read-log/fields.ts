// Cell parsers for the read log: each returns the typed value or throws a ReadLogError naming the cell.
import { ASSISTANCE, type Assistance } from '../../core/design';
import type { Bit } from '../../core/read-log';
import { ReadLogError } from './read-log-error';

export type Cell = { line: number; column: string; raw: string };

const fail = (c: Cell, what: string): never => {
  throw new ReadLogError(c.line, c.column, `${what}, got ${JSON.stringify(c.raw)}`);
};

const NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

export const text = (c: Cell): string => {
  if (c.raw.trim() === '') fail(c, 'must not be empty');
  return c.raw;
};

export const optionalText = (c: Cell): string | null => (c.raw === '' ? null : c.raw);

export const bit = (c: Cell): Bit => {
  if (c.raw === '0') return 0;
  if (c.raw === '1') return 1;
  return fail(c, 'must be 0 or 1');
};

export const optionalBit = (c: Cell): Bit | null => (c.raw === '' ? null : bit(c));

export const number = (c: Cell, min = -Infinity, max = Infinity, range = ''): number => {
  const t = c.raw.trim();
  if (!NUMBER.test(t)) fail(c, 'must be a number');
  const v = Number(t);
  if (!(v >= min && v <= max)) fail(c, `must be ${range || `between ${min} and ${max}`}`);
  return v;
};

export const optionalNumber = (c: Cell, min = -Infinity, max = Infinity, range = ''): number | null =>
  c.raw.trim() === '' ? null : number(c, min, max, range);

export const positiveInteger = (c: Cell): number => {
  const v = number(c, 1, Number.MAX_SAFE_INTEGER, 'a whole number >= 1');
  if (!Number.isInteger(v)) fail(c, 'must be a whole number >= 1');
  return v;
};

export const assistance = (c: Cell): Assistance => {
  const found = ASSISTANCE.find((a) => a === c.raw);
  if (found === undefined) return fail(c, `must be one of ${ASSISTANCE.join(', ')}`);
  return found;
};

const ISO_UTC = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}(:\d{2}(\.\d+)?)?Z$/;

export const isoUtc = (c: Cell): string => {
  if (!ISO_UTC.test(c.raw) || Number.isNaN(Date.parse(c.raw))) fail(c, 'must be an ISO 8601 UTC time such as 2026-01-31T09:15:00Z');
  return c.raw;
};

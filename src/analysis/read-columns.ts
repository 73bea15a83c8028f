import type { ReadRow } from '../core/read-log';
import { finalLikelihood, finalScore, initialLikelihood, isAided } from './read-scores';

/**
 * A set of reads as typed columns (issue 10): one entry per read, in the order given, so the
 * statistics walk numbers instead of one object per read. Ids are interned as small integers
 * (first-appearance order); null calls are −1 and null numbers NaN.
 */
export type ReadColumns = {
  n: number;
  /** the rows themselves, for the few statistics that still read other fields (crossover pairs) */
  rows: readonly ReadRow[];
  reader: Int32Array;
  readerIds: string[];
  case: Int32Array;
  caseIds: string[];
  caseCount: number;
  /** 1 when a suggestion was shown (isAided) */
  aided: Uint8Array;
  /** 1 for a sequential read with an initial call and a suggestion call (sequentialSection's reads) */
  sequential: Uint8Array;
  truth: Uint8Array;
  finalCall: Uint8Array;
  /** −1 when no suggestion call */
  aiCall: Int8Array;
  /** −1 when no initial call */
  initialCall: Int8Array;
  caution: Uint8Array;
  period: Float64Array;
  /** finalScore of each read */
  score: Float64Array;
  /** finalLikelihood, NaN on the five-point scale */
  likelihood: Float64Array;
  totalMs: Float64Array;
  /** sequential reads only (else NaN): initialLikelihood and the suggestion's score, for weight of advice */
  initialLikelihood: Float64Array;
  aiScore: Float64Array;
  /** working space of one row number per read (aucOfSet), so no set allocates its own */
  runScratch: Int32Array;
};

/**
 * The columns of rows. Throws RangeError as finalScore does (a confidence outside 0..100) and
 * on a score or time that is not a finite number (as the AUC and reading time would).
 * Example: readColumns(rows).score[0] === finalScore(rows[0]).
 */
export const readColumns = (rows: readonly ReadRow[]): ReadColumns => {
  const n = rows.length;
  const readerIdx = new Map<string, number>();
  const caseIdx = new Map<string, number>();
  const c: ReadColumns = {
    n, rows, readerIds: [], caseIds: [], caseCount: 0,
    reader: new Int32Array(n), case: new Int32Array(n), aided: new Uint8Array(n), sequential: new Uint8Array(n),
    truth: new Uint8Array(n), finalCall: new Uint8Array(n), aiCall: new Int8Array(n), initialCall: new Int8Array(n), caution: new Uint8Array(n),
    period: new Float64Array(n), score: new Float64Array(n), likelihood: new Float64Array(n), totalMs: new Float64Array(n),
    initialLikelihood: new Float64Array(n).fill(Number.NaN), aiScore: new Float64Array(n).fill(Number.NaN), runScratch: new Int32Array(n),
  };
  for (let i = 0; i < n; i++) {
    const r = rows[i] as ReadRow;
    c.reader[i] = intern(readerIdx, r.reader_id);
    c.case[i] = intern(caseIdx, r.case_id);
    c.aided[i] = isAided(r) ? 1 : 0;
    if (r.assistance === 'sequential' && r.initial_call !== null && r.ai_call !== null) {
      c.sequential[i] = 1;
      c.initialLikelihood[i] = initialLikelihood(r) ?? Number.NaN;
      c.aiScore[i] = r.ai_score ?? Number.NaN;
    }
    c.truth[i] = r.truth;
    c.finalCall[i] = r.final_call;
    c.aiCall[i] = r.ai_call ?? -1;
    c.initialCall[i] = r.initial_call ?? -1;
    c.caution[i] = r.caution_shown;
    c.period[i] = r.period;
    const s = finalScore(r);
    if (s - s !== 0) throw new RangeError(`read ${i}: score is not a finite number (${s})`);
    c.score[i] = s;
    c.likelihood[i] = finalLikelihood(r) ?? Number.NaN;
    const t = r.total_ms;
    if (t - t !== 0) throw new RangeError(`read ${i}: total_ms is not a finite number (${t})`);
    c.totalMs[i] = t;
  }
  c.readerIds = [...readerIdx.keys()];
  c.caseIds = [...caseIdx.keys()];
  c.caseCount = caseIdx.size;
  return c;
};

const intern = (ids: Map<string, number>, id: string): number => {
  let k = ids.get(id);
  if (k === undefined) {
    k = ids.size;
    ids.set(id, k);
  }
  return k;
};

/** Every row number of the columns, in order. */
export const allRows = (cols: ReadColumns): Int32Array => Int32Array.from({ length: cols.n }, (_, i) => i);

/**
 * The ids (reader or case codes) of `rows` renumbered in order of first appearance there:
 * number[k] is row k's, count how many distinct. Example: codes 7, 3, 7 → numbers 0, 1, 0.
 */
export const firstAppearance = (code: Int32Array, rows: Int32Array, codes: number): { number: Int32Array; first: Int32Array; count: number } => {
  const renumber = new Int32Array(codes).fill(-1);
  const number = new Int32Array(rows.length);
  const first: number[] = [];
  for (let k = 0; k < rows.length; k++) {
    const c = code[rows[k] as number] as number;
    let i = renumber[c] as number;
    if (i === -1) {
      i = first.length;
      renumber[c] = i;
      first.push(c);
    }
    number[k] = i;
  }
  return { number, first: Int32Array.from(first), count: first.length };
};

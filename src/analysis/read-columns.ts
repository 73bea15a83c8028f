import { ANSWER_SCALES, isProbabilityScale, type AnswerScaleKind } from '../core/answer-scale';
import { ASSISTANCE } from '../core/design';
import type { LogColumns } from '../core/log-columns';
import type { Bit, ReadRow } from '../core/read-log';
import { finalLikelihood, finalScore, initialLikelihood, isAided, scoreOf } from './read-scores';

/**
 * A read log as typed columns (issue 10): one entry per read, in the order given, so the
 * statistics walk numbers instead of one object per read (about 100 bytes a read instead of
 * about 300). Ids are interned as small integers in first-appearance order; null calls are −1,
 * null numbers NaN. Built from row objects (logColumns, columnsBuilder) or from the columns the
 * CLI's parse types straight from the bytes (columnsOfLog), so the CLI never holds one object per read.
 */
export type ReadColumns = {
  n: number;
  reader: Int32Array;
  readerIds: string[];
  case: Int32Array;
  caseIds: string[];
  caseCount: number;
  finding: Int32Array;
  findingIds: string[];
  role: Int32Array;
  roleIds: string[];
  practice: Uint8Array;
  training: Uint8Array;
  withdrawn: Uint8Array;
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
  /** 1 when the read has a final rating (an external rating log's mark) */
  rated: Uint8Array;
  period: Float64Array;
  /** finalScore of each read (NaN where it throws: see scoreErrors) */
  score: Float64Array;
  /** finalLikelihood, NaN on the five-point scale */
  likelihood: Float64Array;
  totalMs: Float64Array;
  /** sequential reads only (else NaN): initialLikelihood and the suggestion's score, for weight of advice */
  initialLikelihood: Float64Array;
  aiScore: Float64Array;
  /** the read's case attribute names, as a number into `shapes` (each distinct list of names once) */
  shape: Int32Array;
  shapes: string[][];
  /** per attribute name: each read's value as a number into `values` (−1 when the read has no such attribute) */
  attributes: Map<string, { code: Int32Array; values: string[] }>;
  /** the RangeError of each read whose score or time is unusable; thrown only if the read is analysed */
  scoreErrors: Map<number, RangeError>;
  /** working space of one number per read (aucOfSet, the bootstrap's levels), so no set allocates its own */
  runScratch: Int32Array;
  /** working space of one number per case, all −1 between uses (crossover pairs, suggestion accuracy) */
  caseScratch: [Int32Array, Int32Array];
};

/**
 * The columns of rows, every read to be analysed. Throws RangeError as finalScore does (a
 * confidence outside 0..100) and on a score or time that is not a finite number.
 * Example: readColumns(rows).score[0] === finalScore(rows[0]).
 */
export const readColumns = (rows: readonly ReadRow[]): ReadColumns => {
  const cols = logColumns(rows);
  for (const e of cols.scoreErrors.values()) throw e;
  return cols;
};

/** The columns of a whole log, whose left-out reads (practice, training) may hold unusable scores: see checkScores. */
export const logColumns = (rows: readonly ReadRow[]): ReadColumns => {
  const b = columnsBuilder(rows.length);
  for (const r of rows) b.push(r);
  return b.done();
};

/**
 * Columns filled one read at a time (the parse hands each read over and drops it), for at most
 * `capacity` reads. Example: const b = columnsBuilder(2); b.push(r1); b.push(r2); b.done().n → 2.
 */
export const columnsBuilder = (capacity: number): { push: (r: ReadRow) => void; done: () => ReadColumns } => {
  const cap = capacity;
  const readerIdx = new Map<string, number>();
  const caseIdx = new Map<string, number>();
  const findingIdx = new Map<string, number>();
  const roleIdx = new Map<string, number>();
  const shapeIdx = new Map<string, number>();
  const shapeOfObject = new Map<Readonly<Record<string, string>>, number>();
  const shapes: string[][] = [];
  const attrs = new Map<string, { code: Int32Array; ids: Map<string, number> }>();
  const scoreErrors = new Map<number, RangeError>();
  const c = {
    reader: new Int32Array(cap), case: new Int32Array(cap), finding: new Int32Array(cap), role: new Int32Array(cap),
    practice: new Uint8Array(cap), training: new Uint8Array(cap), withdrawn: new Uint8Array(cap),
    aided: new Uint8Array(cap), sequential: new Uint8Array(cap), truth: new Uint8Array(cap), finalCall: new Uint8Array(cap),
    aiCall: new Int8Array(cap), initialCall: new Int8Array(cap), caution: new Uint8Array(cap), rated: new Uint8Array(cap),
    period: new Float64Array(cap), score: new Float64Array(cap), likelihood: new Float64Array(cap), totalMs: new Float64Array(cap),
    initialLikelihood: new Float64Array(cap).fill(Number.NaN), aiScore: new Float64Array(cap).fill(Number.NaN), shape: new Int32Array(cap),
  };
  let i = 0;
  const push = (r: ReadRow): void => {
    if (i >= cap) throw new RangeError(`more than the ${cap} reads the columns were made for`);
    c.reader[i] = intern(readerIdx, r.reader_id);
    c.case[i] = intern(caseIdx, r.case_id);
    c.finding[i] = intern(findingIdx, r.finding);
    c.role[i] = intern(roleIdx, r.reader_role);
    c.practice[i] = r.practice;
    c.training[i] = r.training;
    c.withdrawn[i] = r.withdrawn;
    c.truth[i] = r.truth;
    c.finalCall[i] = r.final_call;
    c.aiCall[i] = r.ai_call ?? -1;
    c.initialCall[i] = r.initial_call ?? -1;
    c.caution[i] = r.caution_shown;
    c.period[i] = r.period;
    c.totalMs[i] = r.total_ms;
    derive(c, scoreErrors, i, r);
    c.shape[i] = shapeOf(r.case_attributes);
    for (const { code, value } of valuesOf(r.case_attributes)) code[i] = value;
    i++;
  };
  // each attribute's column and the value's number, once per shared case_attributes object
  const valuesOfObject = new Map<Readonly<Record<string, string>>, { code: Int32Array; value: number }[]>();
  const valuesOf = (attributes: Readonly<Record<string, string>>): { code: Int32Array; value: number }[] => {
    const known = valuesOfObject.get(attributes);
    if (known !== undefined) return known;
    const out = Object.entries(attributes).map(([name, value]) => {
      let a = attrs.get(name);
      if (a === undefined) {
        a = { code: new Int32Array(cap).fill(-1), ids: new Map() };
        attrs.set(name, a);
      }
      return { code: a.code, value: intern(a.ids, value) };
    });
    if (valuesOfObject.size < 4096) valuesOfObject.set(attributes, out);
    return out;
  };
  // a parsed log shares one case_attributes object between reads of equal values, so most reads
  // are looked up by object; rows each with their own object (from the store) by their names
  const shapeOf = (attributes: Readonly<Record<string, string>>): number => {
    const known = shapeOfObject.get(attributes);
    if (known !== undefined) return known;
    const names = Object.keys(attributes);
    const id = intern(shapeIdx, JSON.stringify(names));
    if (id === shapes.length) shapes.push(names);
    if (shapeOfObject.size < 4096) shapeOfObject.set(attributes, id);
    return id;
  };
  const done = (): ReadColumns => {
    const n = i;
    // a view of the first n (the parse sizes the columns by its line count, a few more than its reads)
    const cut = <T extends Int32Array | Uint8Array | Int8Array | Float64Array>(a: T): T => (n === cap ? a : (a.subarray(0, n) as T));
    return {
      n,
      readerIds: [...readerIdx.keys()], caseIds: [...caseIdx.keys()], caseCount: caseIdx.size,
      findingIds: [...findingIdx.keys()], roleIds: [...roleIdx.keys()],
      reader: cut(c.reader), case: cut(c.case), finding: cut(c.finding), role: cut(c.role),
      practice: cut(c.practice), training: cut(c.training), withdrawn: cut(c.withdrawn),
      aided: cut(c.aided), sequential: cut(c.sequential), truth: cut(c.truth), finalCall: cut(c.finalCall),
      aiCall: cut(c.aiCall), initialCall: cut(c.initialCall), caution: cut(c.caution), rated: cut(c.rated),
      period: cut(c.period), score: cut(c.score), likelihood: cut(c.likelihood), totalMs: cut(c.totalMs),
      initialLikelihood: cut(c.initialLikelihood), aiScore: cut(c.aiScore), shape: cut(c.shape), shapes,
      attributes: new Map([...attrs].map(([name, a]) => [name, { code: cut(a.code), values: [...a.ids.keys()] }])),
      scoreErrors,
      runScratch: new Int32Array(n),
      caseScratch: [new Int32Array(caseIdx.size).fill(-1), new Int32Array(caseIdx.size).fill(-1)],
    };
  };
  return { push, done };
};

type Derived = Pick<ReadColumns, 'aided' | 'rated' | 'score' | 'likelihood' | 'sequential' | 'initialLikelihood' | 'aiScore'>;

// The columns worked out from read i's cells (its scores by the functions of read-scores.ts),
// shared by both ways of building columns; a read whose score or time is unusable gets a NaN
// score and its RangeError in scoreErrors.
const derive = (c: Derived, scoreErrors: Map<number, RangeError>, i: number, r: ReadRow): void => {
  c.aided[i] = isAided(r) ? 1 : 0;
  c.rated[i] = r.final_rating === null ? 0 : 1;
  try {
    const s = finalScore(r);
    if (s - s !== 0) throw new RangeError(`read ${i}: score is not a finite number (${s})`);
    c.score[i] = s;
    c.likelihood[i] = finalLikelihood(r) ?? Number.NaN;
    if (r.assistance === 'sequential' && r.initial_call !== null && r.ai_call !== null) {
      c.sequential[i] = 1;
      c.initialLikelihood[i] = initialLikelihood(r) ?? Number.NaN;
      c.aiScore[i] = r.ai_score ?? Number.NaN;
    }
    const t = r.total_ms;
    if (t - t !== 0) throw new RangeError(`read ${i}: total_ms is not a finite number (${t})`);
  } catch (error) {
    if (!(error instanceof RangeError)) throw error;
    c.score[i] = Number.NaN;
    scoreErrors.set(i, error);
  }
};

/**
 * The columns of a parsed log (src/io's parseReadLogColumns), equal to what columnsBuilder makes
 * from the same reads as rows: ids, calls, flags, periods and times are the log's own arrays;
 * scores are worked out read by read by the same rules (read-scores.ts). Takes the log over: four
 * of its arrays are overwritten with columns, so the log is not to be used after. Example: columnsOfLog(log).n === log.n.
 */
export const columnsOfLog = (log: LogColumns): ReadColumns => {
  const n = log.n;
  // the log's arrays of final confidence and rating, initial confidence and suggestion score
  // become the score, likelihood, initial likelihood and suggestion score columns (each read's
  // cells are read before its columns are written): a million reads need 32 MB less
  const d: Derived = {
    aided: new Uint8Array(n), rated: new Uint8Array(n), score: log.finalConfidence, likelihood: log.finalRating,
    sequential: new Uint8Array(n), initialLikelihood: log.initialConfidence, aiScore: log.aiScore,
  };
  const scoreErrors = new Map<number, RangeError>();
  for (let i = 0; i < n; i++) deriveOfLog(log, d, scoreErrors, i);
  // every parsed read has every case_<name> column: one shape, none when there are no reads
  const names = log.attributes.map((a) => a.name);
  return {
    n,
    reader: log.reader, readerIds: log.readerIds, case: log.case, caseIds: log.caseIds, caseCount: log.caseIds.length,
    finding: log.finding, findingIds: log.findingIds, role: log.role, roleIds: log.roleIds,
    practice: log.practice, training: log.training, withdrawn: log.withdrawn, truth: log.truth, finalCall: log.finalCall,
    aiCall: log.aiCall, initialCall: log.initialCall, caution: log.caution, period: log.period, totalMs: log.totalMs,
    ...d,
    shape: new Int32Array(n),
    shapes: n === 0 ? [] : [names],
    attributes: new Map(n === 0 ? [] : log.attributes.map((a) => [a.name, { code: a.code, values: a.values }])),
    scoreErrors,
    runScratch: new Int32Array(n),
    caseScratch: [new Int32Array(log.caseIds.length).fill(-1), new Int32Array(log.caseIds.length).fill(-1)],
  };
};

// derive's columns for read i of a parsed log, by the same rules on its cells (scoreOf is
// finalScore's and initialScore's rule, isProbabilityScale finalLikelihood's): no row object per read.
const SEQUENTIAL = ASSISTANCE.indexOf('sequential');
const NONE = ASSISTANCE.indexOf('none');
const deriveOfLog = (log: LogColumns, c: Derived, scoreErrors: Map<number, RangeError>, i: number): void => {
  const assistance = log.assistance[i] as number;
  const rating = log.finalRating[i] as number;
  const confidence = log.finalConfidence[i] as number;
  const initialConfidence = log.initialConfidence[i] as number;
  const aiScore = log.aiScore[i] as number;
  // the builder's starting values (its arrays are new: 0, 0, NaN, NaN), as c may be the log's arrays
  c.score[i] = 0;
  c.likelihood[i] = 0;
  c.initialLikelihood[i] = Number.NaN;
  c.aiScore[i] = Number.NaN;
  c.aided[i] = assistance !== NONE ? 1 : 0;
  c.rated[i] = rating === rating ? 1 : 0;
  try {
    const s = scoreOf(nanNull(rating), log.finalCall[i] as Bit, nanNull(confidence));
    if (s - s !== 0) throw new RangeError(`read ${i}: score is not a finite number (${s})`);
    c.score[i] = s;
    const probability = isProbabilityScale(ANSWER_SCALES[log.scale[i] as number] as AnswerScaleKind);
    c.likelihood[i] = probability ? s : Number.NaN;
    const initialCall = log.initialCall[i] as number;
    if (assistance === SEQUENTIAL && initialCall !== -1 && log.aiCall[i] !== -1) {
      c.sequential[i] = 1;
      c.initialLikelihood[i] = probability ? scoreOf(nanNull(log.initialRating[i] as number), initialCall as Bit, nanNull(initialConfidence)) : Number.NaN;
      c.aiScore[i] = aiScore;
    }
    const t = log.totalMs[i] as number;
    if (t - t !== 0) throw new RangeError(`read ${i}: total_ms is not a finite number (${t})`);
  } catch (error) {
    if (!(error instanceof RangeError)) throw error;
    c.score[i] = Number.NaN;
    scoreErrors.set(i, error);
  }
};

const nanNull = (v: number): number | null => (v === v ? v : null);

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

/** Throws the RangeError of the first of `rows` whose score or time is unusable (as finalScore or the reading time would have). */
export const checkScores = (cols: ReadColumns, rows: Int32Array): void => {
  if (cols.scoreErrors.size === 0) return;
  for (let k = 0; k < rows.length; k++) {
    const e = cols.scoreErrors.get(rows[k] as number);
    if (e !== undefined) throw e;
  }
};

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

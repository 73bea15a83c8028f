// The columns of a read log (src/core/log-columns.ts) filled one read at a time: from a typed
// ReadRow (the general parse) or cell by cell from the file's bytes (the direct parse in
// read-log-parse.ts), which writes the arrays itself.
import { ANSWER_SCALES } from '../../core/answer-scale';
import { ASSISTANCE } from '../../core/design';
import { restoreCell } from '../../core/formula-text';
import type { LogColumns } from '../../core/log-columns';
import type { ReadRow } from '../../core/read-log';
import { idTable, type IdTable } from './id-table';

/** The text a cell stands for: Heed's export puts a quote before formula-looking text (restoreCell). */
export const restoreText = (raw: string): string => (raw.charCodeAt(0) === 39 ? restoreCell(raw) : raw);

/**
 * The keys of a parsed read's case_attributes object, in the order the object lists them (it is
 * made with one property per case_<name> column in header order, and objects list integer-like
 * keys first): the order the engine walks attributes in.
 */
export const attributeKeyOrder = (names: readonly string[]): string[] => {
  const made: Record<string, string> = Object.create(null);
  for (const name of names) made[name] = '';
  return Object.keys(made);
};

type Attribute = { name: string; table: IdTable; code: Int32Array };

export type LogColumnsBuilder = {
  /** the arrays, for at most `capacity` reads; read i is written at index i */
  c: Omit<LogColumns, 'n' | 'readerIds' | 'caseIds' | 'findingIds' | 'roleIds' | 'attributes'>;
  ids: { reader: IdTable; case: IdTable; finding: IdTable; role: IdTable };
  /** the case attributes in header order (set by `withAttributes` or by the first pushRow) */
  attributes: () => Attribute[];
  withAttributes: (names: readonly string[]) => Attribute[];
  /** reads written so far */
  n: number;
  /** how many reads the arrays hold now */
  capacity: () => number;
  /** more room: every array made about half as long again, its reads kept (the bytes parse calls it when full) */
  grow: () => void;
  pushRow: (r: ReadRow) => void;
  done: () => LogColumns;
};

/**
 * An empty builder with room for `capacity` reads (pushRow refuses more; the bytes parse grows it).
 * Example: b = logColumnsBuilder(2); b.pushRow(r); b.done().n → 1.
 */
export const logColumnsBuilder = (capacity: number): LogColumnsBuilder => {
  let cap = capacity;
  const nan = (): Float64Array => new Float64Array(cap).fill(Number.NaN);
  const c = {
    reader: new Int32Array(cap), case: new Int32Array(cap), finding: new Int32Array(cap), role: new Int32Array(cap),
    assistance: new Uint8Array(cap), scale: new Uint8Array(cap), practice: new Uint8Array(cap), truth: new Uint8Array(cap),
    caution: new Uint8Array(cap), finalCall: new Uint8Array(cap), training: new Uint8Array(cap), withdrawn: new Uint8Array(cap),
    aiCall: new Int8Array(cap), initialCall: new Int8Array(cap), period: new Float64Array(cap), totalMs: new Float64Array(cap),
    aiScore: nan(), initialConfidence: nan(), finalConfidence: nan(), initialRating: nan(), finalRating: nan(),
  };
  const ids = { reader: idTable(restoreText), case: idTable(restoreText), finding: idTable(restoreText), role: idTable(restoreText) };
  let attrs: Attribute[] | null = null;
  const withAttributes = (names: readonly string[]): Attribute[] => {
    attrs = names.map((name) => ({ name, table: idTable(restoreText), code: new Int32Array(cap) }));
    return attrs;
  };
  const grow = (): void => {
    const n = b.n;
    cap = Math.ceil(cap * 1.5) + 1024;
    // every cell of a read is written when it is typed, so the new room needs no filling
    const longer = <T extends Int32Array | Uint8Array | Int8Array | Float64Array>(a: T): T => {
      const made = new (a.constructor as new (length: number) => T)(cap);
      made.set(a.subarray(0, n));
      return made;
    };
    const cols = c as unknown as Record<string, Int32Array | Uint8Array | Int8Array | Float64Array>;
    for (const key of Object.keys(cols)) cols[key] = longer(cols[key] as Int32Array);
    for (const a of attrs ?? []) a.code = longer(a.code);
  };
  const b: LogColumnsBuilder = {
    c,
    ids,
    attributes: () => attrs ?? [],
    withAttributes,
    n: 0,
    capacity: () => cap,
    grow,
    pushRow: (r) => {
      const i = b.n;
      if (i >= cap) throw new RangeError(`more than the ${cap} reads the columns were made for`);
      c.reader[i] = ids.reader.ofText(r.reader_id);
      c.case[i] = ids.case.ofText(r.case_id);
      c.finding[i] = ids.finding.ofText(r.finding);
      c.role[i] = ids.role.ofText(r.reader_role);
      c.assistance[i] = ASSISTANCE.indexOf(r.assistance);
      c.scale[i] = ANSWER_SCALES.indexOf(r.scale);
      c.practice[i] = r.practice;
      c.truth[i] = r.truth;
      c.caution[i] = r.caution_shown;
      c.finalCall[i] = r.final_call;
      c.training[i] = r.training;
      c.withdrawn[i] = r.withdrawn;
      c.aiCall[i] = r.ai_call ?? -1;
      c.initialCall[i] = r.initial_call ?? -1;
      c.period[i] = r.period;
      c.totalMs[i] = r.total_ms;
      c.aiScore[i] = r.ai_score ?? Number.NaN;
      c.initialConfidence[i] = r.initial_confidence ?? Number.NaN;
      c.finalConfidence[i] = r.final_confidence ?? Number.NaN;
      c.initialRating[i] = r.initial_rating ?? Number.NaN;
      c.finalRating[i] = r.final_rating ?? Number.NaN;
      const list = attrs ?? withAttributes(Object.keys(r.case_attributes));
      for (const a of list) a.code[i] = a.table.ofText(r.case_attributes[a.name] as string);
      b.n = i + 1;
    },
    done: () => {
      const n = b.n;
      // views of the first n (the columns are sized by the file's line count, or an estimate of it,
      // a few more than its reads); copies when grown arrays would hold much room never used
      const roomy = cap - n > (n >> 3) + 1024;
      const cut = <T extends Int32Array | Uint8Array | Int8Array | Float64Array>(a: T): T => (n === cap ? a : roomy ? (a.slice(0, n) as T) : (a.subarray(0, n) as T));
      // no reads, no attributes: as a log of rows, which has no read to name them
      const byName = new Map((n === 0 ? [] : attrs ?? []).map((a) => [a.name, a]));
      return {
        n,
        reader: cut(c.reader), readerIds: ids.reader.ids, case: cut(c.case), caseIds: ids.case.ids,
        finding: cut(c.finding), findingIds: ids.finding.ids, role: cut(c.role), roleIds: ids.role.ids,
        assistance: cut(c.assistance), scale: cut(c.scale), practice: cut(c.practice), truth: cut(c.truth),
        caution: cut(c.caution), finalCall: cut(c.finalCall), training: cut(c.training), withdrawn: cut(c.withdrawn),
        aiCall: cut(c.aiCall), initialCall: cut(c.initialCall), period: cut(c.period), totalMs: cut(c.totalMs),
        aiScore: cut(c.aiScore), initialConfidence: cut(c.initialConfidence), finalConfidence: cut(c.finalConfidence),
        initialRating: cut(c.initialRating), finalRating: cut(c.finalRating),
        attributes: attributeKeyOrder([...byName.keys()]).map((name) => {
          const a = byName.get(name) as Attribute;
          return { name, code: cut(a.code), values: a.table.ids };
        }),
      };
    },
  };
  return b;
};

/**
 * Remembers each read's line by its numbered reader, finding, period and case, and answers, for
 * a new read, the line of an earlier one with the same four (undefined when none). Reads come
 * mostly in runs of one reader, finding and period, so the last run's map is kept at hand.
 */
export const repeatedReadsByNumber = (): ((reader: number, finding: number, period: number, kase: number, line: number) => number | undefined) => {
  const byReader = new Map<number, Map<number, Map<number, Map<number, number>>>>();
  let lastReader = -1;
  let lastFinding = -1;
  let lastPeriod = Number.NaN;
  let cases = new Map<number, number>();
  return (reader, finding, period, kase, line) => {
    if (reader !== lastReader || finding !== lastFinding || period !== lastPeriod) {
      let byFinding = byReader.get(reader);
      if (byFinding === undefined) byReader.set(reader, (byFinding = new Map()));
      let byPeriod = byFinding.get(finding);
      if (byPeriod === undefined) byFinding.set(finding, (byPeriod = new Map()));
      let found = byPeriod.get(period);
      if (found === undefined) byPeriod.set(period, (found = new Map()));
      cases = found;
      lastReader = reader;
      lastFinding = finding;
      lastPeriod = period;
    }
    const earlier = cases.get(kase);
    if (earlier === undefined) cases.set(kase, line);
    return earlier;
  };
};

import Papa from 'papaparse';
import { READ_LOG_COLUMNS, type ReadRow } from '../core/read-log';
import { decodeUtf8 } from './case-set/text';
import { ReadLogError } from './read-log/read-log-error';
import type { LogColumns } from '../core/log-columns';
import { bytesRowTyper } from './read-log/bytes-row';
import { textOf } from './read-log/id-table';
import { logColumnsBuilder, type LogColumnsBuilder } from './read-log/log-columns';
import { parseRow, repeatedRead, repeatedReads, rowLayout, type RowLayout } from './read-log/row';

export { ReadLogError } from './read-log/read-log-error';

/**
 * Parses a reads.csv (docs/formats.md, "The read log") into typed reads, checking every cell first: the whole
 * file is refused at its first problem with a ReadLogError carrying the 1-based line (header is
 * line 1) and the column. Required columns may come in any order; `case_<name>` columns become
 * case_attributes; other extra columns are ignored. Fully blank lines are skipped.
 * Throws ReadLogError for an empty file, a missing or repeated column, a ragged row, a bad value,
 * a read repeated (same reader, case, finding, period), or an unreadable CSV.
 * Example: parseReadLog(text)[0].reader_id → 'R1'.
 */
export const parseReadLog = (input: string): ReadRow[] => {
  const rows: ReadRow[] = [];
  parseReadLogInto(input, (r) => rows.push(r));
  return rows;
};

/**
 * parseReadLog handing each read to `keep` as soon as it is checked, instead of returning them
 * all (so a caller that keeps reads as columns never holds one object per read). Throws as
 * parseReadLog; reads already handed over before a problem are the caller's to drop.
 */
export const parseReadLogInto = (input: string, keep: (read: ReadRow) => void): void => {
  const textIn = input.charCodeAt(0) === 0xfeff ? input.slice(1) : input;
  if (textIn.trim() === '') throw new ReadLogError(1, null, 'the file is empty');
  const rows = rowReader(keep);
  // Without a quote or a carriage return a record is exactly one line and a cell exactly the
  // text between commas (what papaparse itself does then), so the lines are split directly.
  if (textIn.indexOf('"') === -1 && textIn.indexOf('\r') === -1) {
    let line = 1;
    for (let start = 0; start <= textIn.length; line++) {
      const end = lineEnd(textIn, start);
      rows.take(textIn.slice(start, end).split(','), line);
      start = end + 1;
    }
    rows.done();
    return;
  }
  // Rows are typed as the CSV parser hands them over, so their cells die young. A CSV-level
  // problem anywhere in the file still wins over a problem in a row, as when the whole file was
  // split first, so the first row problem is only kept until the parse ends.
  let rowProblem: ReadLogError | null = null;
  splitRecords(textIn, (cells, line) => {
    if (rowProblem !== null) return;
    try {
      rows.take(cells, line);
    } catch (error) {
      if (!(error instanceof ReadLogError)) throw error;
      rowProblem = error;
    }
  });
  if (rowProblem !== null) throw rowProblem;
  rows.done();
};

const lineEnd = (text: string, start: number): number => {
  const end = text.indexOf('\n', start);
  return end === -1 ? text.length : end;
};

// Takes the records of a read log in order (the header first), checking and typing each row;
// each read goes to `keep`; done() checks the file had a header. Throws ReadLogError at the first problem.
const rowReader = (keep: (read: ReadRow) => void): { take: (cells: string[], line: number) => void; shownAtColumn: () => number; done: () => void } => {
  let header: string[] | null = null;
  let layout: RowLayout | null = null;
  const earlierRead = repeatedReads();
  const take = (cells: string[], line: number): void => {
    if (header === null) {
      header = cells;
      checkHeader(cells, line);
      layout = rowLayout(cells);
      return;
    }
    if (cells.length === 1 && cells[0] === '') return;
    const width = header.length;
    if (cells.length !== width) {
      const col = header[Math.min(cells.length, width - 1)] ?? null;
      throw new ReadLogError(line, cells.length < width ? col : null, `row has ${cells.length} fields, the header has ${width}`);
    }
    const row = parseRow(cells, line, layout as RowLayout);
    const earlier = earlierRead(row, line);
    if (earlier !== undefined) throw repeatedRead(line, earlier);
    keep(row);
  };
  const done = (): void => {
    if (header === null) throw new ReadLogError(1, null, 'the file is empty');
  };
  return { take, shownAtColumn: () => (layout === null ? -1 : layout.at.shown_at), done };
};

const CR_ONLY = 'its lines end with a carriage return alone (an old Mac export): save it as CSV with LF or CRLF line endings';

// Papaparse reports each row's end offset; a row starts where the previous ended, and its line
// is 1 + the newlines before that start (quoted cells may span lines). Hands each record to
// `take` in order; throws a ReadLogError for unreadable CSV.
const splitRecords = (text: string, take: (cells: string[], line: number) => void): void => {
  // Papaparse would take a lone carriage return as the line break, but lines and the columns'
  // size are counted by line feeds: such a file is refused with what to do instead
  if (!text.includes('\n') && text.includes('\r')) throw new ReadLogError(1, null, CR_ONLY);
  const newlines: number[] = [];
  for (let i = text.indexOf('\n'); i !== -1; i = text.indexOf('\n', i + 1)) newlines.push(i);
  // rows arrive in order, so the count of newlines before a row's start only moves forward
  let before = 0;
  const lineAt = (offset: number) => {
    while (before < newlines.length && (newlines[before] as number) < offset) before++;
    return before + 1;
  };
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
      take(r.data, line);
      start = r.meta.cursor;
    },
  });
  if (problem !== null) throw problem;
};

/** A read log needs about 25 columns plus case_<name> ones; a wider header is refused at once. */
export const MAX_READ_LOG_COLUMNS = 1000;

const NOT_UTF8 = 'the file is not UTF-8 text (first bad byte on this line); save it as UTF-8 CSV';

/**
 * parseReadLog on a file's bytes, decoded as strict UTF-8: a file in another encoding (e.g.
 * Latin-1) is refused, naming the line of the first bad byte, instead of its letters silently
 * becoming U+FFFD. A leading byte-order mark is dropped. options.blockBytes (tests only) sets how
 * many bytes of whole lines are decoded at a time.
 */
export const parseReadLogBytes = (bytes: Uint8Array, options: { blockBytes?: number } = {}): ReadRow[] => {
  const rows: ReadRow[] = [];
  parseReadLogBytesInto(bytes, (r) => rows.push(r), options);
  return rows;
};

/** parseReadLogBytes handing each read to `keep` (see parseReadLogInto). */
export const parseReadLogBytesInto = (bytes: Uint8Array, keep: (read: ReadRow) => void, options: { blockBytes?: number } = {}): void => {
  const begin = plainLinesFrom(bytes);
  if (begin === -1) {
    const decoded = decodeUtf8(bytes);
    if (!decoded.ok) throw new ReadLogError(decoded.line, null, NOT_UTF8);
    parseReadLogInto(decoded.text, keep);
    return;
  }
  // A block of whole lines at a time (about 64 kB), so the text of the whole file never exists
  // beside the reads (a million reads are 140 MB of text). A bad byte anywhere wins over a
  // problem in a row, as when the whole file was decoded first; a multi-byte character never
  // holds a newline byte, so a block boundary never splits one.
  const decoder = new TextDecoder('utf-8', { fatal: true, ignoreBOM: true });
  const rows = rowReader(keep);
  let rowProblem: ReadLogError | null = null;
  let line = 1;
  for (let start = begin; start <= bytes.length; ) {
    const end = blockEnd(bytes, start, options.blockBytes ?? BLOCK_BYTES);
    const block = bytes.subarray(start, end);
    let text: string;
    try {
      text = decoder.decode(block);
    } catch {
      const bad = decodeUtf8(block);
      throw new ReadLogError(line + (bad.ok ? 0 : bad.line - 1), null, NOT_UTF8);
    }
    const lines = text.split('\n');
    if (rowProblem === null) {
      // in an all-ASCII block a character's index is its byte's index
      const ascii = text.length === block.length;
      let at = 0;
      for (let i = 0; i < lines.length; i++) {
        const lineText = lines[i] as string;
        try {
          const cells = lineText.split(',');
          // V8 keeps a cut of 13 or more characters as a view of the text it was cut from, so a
          // kept shown_at would keep its whole block alive: it is decoded on its own
          const k = rows.shownAtColumn();
          if (ascii && k >= 0 && k < cells.length && (cells[k] as string).length >= 13) {
            let from = start + at;
            for (let j = 0; j < k; j++) from += (cells[j] as string).length + 1;
            cells[k] = decoder.decode(bytes.subarray(from, from + (cells[k] as string).length));
          }
          rows.take(cells, line + i);
        } catch (error) {
          if (!(error instanceof ReadLogError)) throw error;
          rowProblem = error;
          break;
        }
        at += lineText.length + 1;
      }
    }
    line += lines.length;
    start = end + 1;
  }
  if (rowProblem !== null) throw rowProblem;
  rows.done();
};

/**
 * A read log's bytes, checked exactly as parseReadLogBytes checks them (same refusals, same
 * ReadLogError), into typed columns (src/core/log-columns.ts) for the analysis engine, with no
 * object or string per read. A file without quotes or carriage returns is typed from its bytes
 * cell by cell (src/io/read-log/bytes-row.ts); any other file goes through parseReadLogBytes'
 * general path (papaparse), read by read into the same columns.
 * Example: parseReadLogColumns(bytes).readerIds → ['R1', 'R2'].
 */
export const parseReadLogColumns = (bytes: Uint8Array): LogColumns => {
  const begin = plainLinesFrom(bytes);
  if (begin === -1) {
    const builder = logColumnsBuilder(lineCount(bytes));
    parseReadLogBytesInto(bytes, builder.pushRow);
    return builder.done();
  }
  // the direct parse grows its columns when the estimate falls short
  const builder = logColumnsBuilder(estimatedLines(bytes, begin));
  typeLinesFrom(bytes, begin, builder);
  return builder.done();
};

const SAMPLE_BYTES = 1 << 18;

/**
 * About how many lines the bytes from `begin` hold, a little more rather than less: the exact
 * count when they are short, else their length over the mean line length of the first
 * SAMPLE_BYTES, plus 5% (counting the newlines of a whole large log takes longer than the guess).
 */
export const estimatedLines = (bytes: Uint8Array, begin: number): number => {
  const to = Math.min(bytes.length, begin + SAMPLE_BYTES);
  let lines = 1;
  for (let i = bytes.indexOf(0x0a, begin); i !== -1 && i < to; i = bytes.indexOf(0x0a, i + 1)) lines++;
  if (to === bytes.length) return lines;
  // never more reads than the bytes can hold (a row has a comma between each required column),
  // so a log opening with blank or short lines cannot ask for columns the size of the file
  const most = Math.ceil((bytes.length - begin) / (READ_LOG_COLUMNS.length - 1)) + 64;
  return Math.min(most, Math.ceil(((bytes.length - begin) / (to - begin)) * lines * 1.05) + 64);
};

// The direct parse of a file that plainLinesFrom passes: lines split at newline bytes, cells at
// comma bytes. A line with a byte above 0x7f is checked as UTF-8 before its cells are read; at a
// refused row the rest of the file is checked too, so a bad byte anywhere wins, as in parseReadLogBytes.
const typeLinesFrom = (bytes: Uint8Array, begin: number, builder: LogColumnsBuilder): void => {
  const size = bytes.length;
  const endOf = (start: number): number => {
    const end = bytes.indexOf(0x0a, start);
    return end === -1 ? size : end;
  };
  const checked = new TextDecoder('utf-8', { fatal: true, ignoreBOM: true });
  const checkUtf8 = (from: number, to: number, line: number): void => {
    try {
      checked.decode(bytes.subarray(from, to));
    } catch {
      throw new ReadLogError(line, null, NOT_UTF8);
    }
  };
  // the header: split and checked as parseReadLog does
  let end = endOf(begin);
  checkUtf8(begin, end, 1);
  const header = textOf(bytes, begin, end).split(',');
  checkHeader(header, 1);
  const width = header.length;
  const type = bytesRowTyper(rowLayout(header), width, builder);
  const starts = new Int32Array(width + 1);
  // entry width + 1: where splitLine found the line's end
  const ends = new Int32Array(width + 2);
  for (let line = 2, start = end + 1; start <= size; line++, start = end + 1) {
    const split = splitLine(bytes, start, starts, ends, width);
    end = ends[width + 1] as number;
    if (end === start) continue;
    const cells = split & CELLS;
    if (split !== cells) checkUtf8(start, end, line);
    try {
      if (cells !== width) {
        const col = header[Math.min(cells, width - 1)] ?? null;
        throw new ReadLogError(line, cells < width ? col : null, `row has ${cells} fields, the header has ${width}`);
      }
      if (builder.n === builder.capacity()) builder.grow();
      type(bytes, starts, ends, line);
    } catch (error) {
      if (!(error instanceof ReadLogError)) throw error;
      const rest = end + 1 < size ? decodeUtf8(bytes.subarray(end + 1)) : null;
      if (rest !== null && !rest.ok) throw new ReadLogError(line + rest.line, null, NOT_UTF8);
      throw error;
    }
  }
};

const CELLS = 0x3fffffff;
const HIGH = 0x40000000;

// The cells of the line starting at `start`: where the first `width` start and end, how many
// there are, plus HIGH when a byte is above 0x7f; the line's end (its newline, or the end of the
// bytes) goes in ends[width + 1]. A small function of its own, so V8 optimises it after a few
// lines instead of running one long loop unoptimised.
const splitLine = (bytes: Uint8Array, start: number, starts: Int32Array, ends: Int32Array, width: number): number => {
  const size = bytes.length;
  let cells = 0;
  let high = 0;
  let i = start;
  starts[0] = start;
  for (; i < size; i++) {
    const ch = bytes[i] as number;
    if (ch === 0x0a) break;
    high |= ch;
    if (ch === 0x2c) {
      if (cells < width) ends[cells] = i;
      cells++;
      if (cells < width) starts[cells] = i + 1;
    }
  }
  if (cells < width) ends[cells] = i;
  ends[width + 1] = i;
  cells++;
  return high >= 0x80 ? cells | HIGH : cells;
};

/** An upper bound of the reads in a log's bytes: its lines. */
export const lineCount = (bytes: Uint8Array): number => {
  let n = 1;
  for (let i = bytes.indexOf(0x0a); i !== -1; i = bytes.indexOf(0x0a, i + 1)) n++;
  return n;
};

const BLOCK_BYTES = 1 << 16;

// The end of the block of whole lines starting at `start`: the last newline within `size` bytes
// (the block excludes it), the next newline when one line is longer, else the end of the file.
const blockEnd = (bytes: Uint8Array, start: number, size: number): number => {
  if (bytes.length - start <= size) return bytes.length;
  const last = bytes.lastIndexOf(0x0a, start + size - 1);
  if (last >= start) return last;
  const next = bytes.indexOf(0x0a, start + size);
  return next === -1 ? bytes.length : next;
};

// Where the lines of a file that parseReadLog would split directly start (after up to two
// byte-order marks: the decoder drops one and parseReadLog another), or -1 for every other file:
// one with a quote or a carriage return, and one whose first non-blank byte is not plain ASCII
// (blank or not is then the decoded text's question).
const plainLinesFrom = (bytes: Uint8Array): number => {
  if (bytes.indexOf(0x22) !== -1 || bytes.indexOf(0x0d) !== -1) return -1;
  let begin = 0;
  for (let k = 0; k < 2 && bytes[begin] === 0xef && bytes[begin + 1] === 0xbb && bytes[begin + 2] === 0xbf; k++) begin += 3;
  for (let i = begin; i < bytes.length; i++) {
    const b = bytes[i] as number;
    if (b === 0x20 || (b >= 0x09 && b <= 0x0d)) continue;
    return b < 0x80 ? begin : -1;
  }
  return -1;
};

const checkHeader = (cells: string[], line: number): void => {
  if (cells.length > MAX_READ_LOG_COLUMNS) {
    throw new ReadLogError(line, null, `the header has ${cells.length.toLocaleString('en')} columns; the limit is ${MAX_READ_LOG_COLUMNS.toLocaleString('en')}`);
  }
  const pos = new Set<string>();
  for (const name of cells) {
    if (pos.has(name)) throw new ReadLogError(line, name, 'appears twice in the header');
    pos.add(name);
  }
  for (const col of READ_LOG_COLUMNS) if (!pos.has(col)) throw new ReadLogError(line, col, 'required column is missing from the header');
};

/**
 * Writes the read log (docs/formats.md, "The read log"): UTF-8, comma-separated, header row, "\n" line ends,
 * RFC 4180 quoting (io/csv-line.ts, the same bytes as papaparse's unparse), booleans 0/1, empty where a value does not apply, then the
 * optional columns (scale, ratings, training, withdrawn), then one `case_<name>` column per case attribute.
 * A text cell that a spreadsheet could run as a formula (starting with =, +, -, @, tab or CR, and
 * not a plain number) is written with a leading single quote; parseReadLog takes it off again.
 *
 * A large study has hundreds of thousands of rows, so the text is written as UTF-8 bytes into one
 * growing buffer and decoded once at the end: built from strings, each line was a tree of some
 * fifty joined pieces kept alive until the final join, and the garbage collector took most of the
 * time. Text repeated from row to row is turned into CSV bytes once: the cells before `case_id`
 * (the same for a reader's whole period), each value of case_id, finding and scale, and the case
 * attribute cells of each case's attribute object. Whole numbers below 2^31 are written digit by
 * digit, other numbers as String gives them. The text is that of writing every cell on its own
 * (test/unit/io/read-log-export.test.ts compares them), except that a lone UTF-16 surrogate in a
 * text cell comes back as U+FFFD, as it would in the saved UTF-8 file anyway.
 */
import { neutraliseCell } from '../core/formula-text';
import { READ_LOG_COLUMNS, READ_LOG_OPTIONAL_COLUMNS, type ReadRow } from '../core/read-log';
import { csvCell, csvLine } from './csv-line';

// Text that a spreadsheet could run as a formula gets a leading ' (core/formula-text). A number's
// text ("-3.5", "1e-7", "NaN") is never formula-looking and holds nothing CSV quotes, so it is written as it is.
const text = (value: string): string => csvCell(neutraliseCell(value));

/** Columns a caller adds after all others (the bundle's read id and chain hash): names, and the cells of row i. */
export type ExtraColumns = { names: readonly string[]; cells: (index: number) => readonly string[] };

const COLUMNS = [...READ_LOG_COLUMNS, ...READ_LOG_OPTIONAL_COLUMNS];
const COMMA = 44;
const encoder = new TextEncoder();

/** UTF-8 bytes appended to one buffer that doubles when full. */
class ByteWriter {
  buf: Uint8Array;
  pos = 0;
  constructor(size: number) { this.buf = new Uint8Array(Math.max(size, 1024)); }
  room(n: number): void {
    if (this.pos + n <= this.buf.length) return;
    const next = new Uint8Array(Math.max(this.buf.length * 2, this.pos + n));
    next.set(this.buf.subarray(0, this.pos));
    this.buf = next;
  }
  byte(b: number): void {
    this.room(1);
    this.buf[this.pos++] = b;
  }
  bytes(b: Uint8Array): void {
    this.room(b.length);
    if (b.length < 32) for (let i = 0; i < b.length; i++) this.buf[this.pos++] = b[i] as number;
    else { this.buf.set(b, this.pos); this.pos += b.length; }
  }
  string(s: string): void {
    this.room(s.length);
    const start = this.pos;
    for (let i = 0; i < s.length; i++) {
      const c = s.charCodeAt(i);
      if (c >= 128) { // not ASCII: let the encoder write the whole string
        this.pos = start;
        this.room(3 * s.length);
        this.pos += encoder.encodeInto(s, this.buf.subarray(this.pos)).written;
        return;
      }
      this.buf[this.pos++] = c;
    }
  }
  /** A number's cell: empty for null. */
  num(value: number | null): void {
    if (value === null) return;
    if (value >= 0 && value < 2147483648 && (value | 0) === value) {
      if (value < 10) { this.byte(48 + value); return; }
      this.room(10);
      let digits = 0;
      for (let v = value; v > 0; v = (v / 10) | 0) digits++;
      let end = this.pos + digits;
      this.pos = end;
      for (let v = value; v > 0; v = (v / 10) | 0) this.buf[--end] = 48 + (v % 10);
      return;
    }
    this.string(String(value));
  }
  text(): string { return new TextDecoder('utf-8', { ignoreBOM: true }).decode(this.buf.subarray(0, this.pos)); }
}

/** The CSV bytes of each distinct value, computed once. */
const bytesCache = (): ((value: string) => Uint8Array) => {
  const seen = new Map<string, Uint8Array>();
  return (value) => {
    let cell = seen.get(value);
    if (cell === undefined) {
      cell = encoder.encode(text(value));
      seen.set(value, cell);
    }
    return cell;
  };
};

export const readLogCsv = (rows: readonly ReadRow[], attributeNames: readonly string[], extra?: ExtraColumns): string => {
  const out = new ByteWriter(rows.length * 160 + 1024);
  out.string(csvLine([...COLUMNS, ...attributeNames.map((name) => `case_${name}`), ...(extra?.names ?? [])]));
  out.byte(10);
  const caseCell = bytesCache();
  const findingCell = bytesCache();
  const scaleCell = bytesCache();
  // the attribute cells (each with its leading comma) of each attributes object; rows of one case share it when joined from the store
  const attributeCells = new Map<Record<string, string>, Uint8Array>();
  let head: ReadRow | null = null;
  let headBytes = new Uint8Array(0);
  for (let i = 0; i < rows.length; i++) {
    const row = rows[i] as ReadRow;
    if (
      head === null || row.study_id !== head.study_id || row.reader_id !== head.reader_id || row.reader_role !== head.reader_role ||
      row.reader_years !== head.reader_years || row.sequence !== head.sequence || row.period !== head.period || row.assistance !== head.assistance
    ) {
      head = row;
      const n = (value: number | null): string => (value === null ? '' : String(value));
      headBytes = encoder.encode(`${text(row.study_id)},${text(row.reader_id)},${text(row.reader_role)},${n(row.reader_years)},${row.sequence === null ? '' : text(row.sequence)},${n(row.period)},${text(row.assistance)},`);
    }
    out.bytes(headBytes);
    out.bytes(caseCell(row.case_id)); out.byte(COMMA);
    out.bytes(findingCell(row.finding)); out.byte(COMMA);
    out.num(row.practice); out.byte(COMMA);
    out.num(row.order); out.byte(COMMA);
    out.num(row.truth); out.byte(COMMA);
    out.num(row.ai_call); out.byte(COMMA);
    out.num(row.ai_score); out.byte(COMMA);
    out.num(row.ai_planted); out.byte(COMMA);
    out.num(row.caution_shown); out.byte(COMMA);
    out.num(row.initial_call); out.byte(COMMA);
    out.num(row.initial_confidence); out.byte(COMMA);
    out.num(row.initial_ms); out.byte(COMMA);
    out.num(row.final_call); out.byte(COMMA);
    out.num(row.final_confidence); out.byte(COMMA);
    out.num(row.total_ms); out.byte(COMMA);
    out.string(text(row.shown_at)); out.byte(COMMA);
    out.bytes(scaleCell(row.scale)); out.byte(COMMA);
    out.num(row.initial_rating); out.byte(COMMA);
    out.num(row.final_rating); out.byte(COMMA);
    out.num(row.training); out.byte(COMMA);
    out.num(row.withdrawn);
    if (attributeNames.length > 0) {
      const attributes = row.case_attributes;
      let cells = attributeCells.get(attributes);
      if (cells === undefined) {
        let line = '';
        for (const name of attributeNames) line += `,${text(attributes[name] ?? '')}`;
        cells = encoder.encode(line);
        attributeCells.set(attributes, cells);
      }
      out.bytes(cells);
    }
    if (extra) for (const value of extra.cells(i)) { out.byte(COMMA); out.string(csvCell(value)); }
    out.byte(10);
  }
  return out.text();
};

import { parseReadLog, parseReadLogColumns, ReadLogError } from '../../../src/io/read-log-parse';
import { readLogCsv } from '../../../src/io/read-log-export';
import { SAMPLE_CSV, SAMPLE_HEADER, sampleRows, toCsv, withCell } from './read-log-sample';

const problem = (text: string): { line: number; column: string | null; problem: string } => {
  try {
    parseReadLog(text);
  } catch (error) {
    if (error instanceof ReadLogError) return { line: error.line, column: error.column, problem: error.problem };
    throw error;
  }
  throw new Error('expected a ReadLogError');
};

describe('parseReadLog', () => {
  it('types every column and gathers case_ columns as attributes', () => {
    const rows = parseReadLog(SAMPLE_CSV);
    expect(rows).toHaveLength(4);
    expect(rows[0]).toMatchObject({ reader_years: 5, period: 1, assistance: 'none', ai_call: null, ai_score: null, initial_call: null, final_confidence: 80, case_attributes: { scanner: 'Halden' } });
    expect(rows[3]).toMatchObject({ assistance: 'sequential', ai_call: 1, ai_score: 0.72, ai_planted: 1, initial_call: 0, initial_confidence: 60, initial_ms: 2000, total_ms: 3900 });
  });
  it('round-trips the read-log export', () => {
    const rows = parseReadLog(SAMPLE_CSV);
    expect(parseReadLog(readLogCsv(rows, ['scanner']))).toEqual(rows);
  });
  it('accepts a BOM, CRLF line ends, quoted cells and a blank trailing line', () => {
    const rows = sampleRows();
    (rows[0] as string[])[2] = 'radiologist, "senior"';
    const text = `\uFEFF${toCsv(rows).replace(/\n/g, '\r\n')}\r\n`;
    expect(parseReadLog(text)[0]?.reader_role).toBe('radiologist, "senior"');
  });
  it('refuses lines ended by a carriage return alone (an old Mac export), saying what to do, also from bytes into columns', () => {
    const text = SAMPLE_CSV.replace(/\n/g, '\r');
    expect(problem(text)).toEqual({ line: 1, column: null, problem: expect.stringMatching(/carriage return alone .* save it as CSV with LF or CRLF line endings/) });
    expect(() => parseReadLogColumns(new TextEncoder().encode(text))).toThrow(/carriage return alone/);
  });
  it('names the line across a quoted cell that spans lines', () => {
    const rows = sampleRows();
    (rows[0] as string[])[2] = 'two\nlines';
    (rows[1] as string[])[11] = 'x';
    expect(problem(toCsv(rows))).toMatchObject({ line: 4, column: 'truth' });
  });
  it.each([
    ['an empty file', '', 1, null, /empty/],
    ['a missing required column', toCsv(sampleRows().map((r) => r.slice(1)), SAMPLE_HEADER.slice(1)), 1, 'study_id', /missing/],
    ['a bad 0/1 value', withCell(1, 'truth', 'yes'), 3, 'truth', /0 or 1/],
    ['a non-number', withCell(0, 'total_ms', '3s'), 2, 'total_ms', /number/],
    ['a score outside [0,1]', withCell(2, 'ai_score', '1.2'), 4, 'ai_score', /\[0,1\]/],
    ['a confidence outside 0..100', withCell(0, 'final_confidence', '101'), 2, 'final_confidence', /0\.\.100/],
    ['an unknown assistance', withCell(1, 'assistance', 'shown'), 3, 'assistance', /none, concurrent, sequential/],
    ['a suggestion call on an unaided read', withCell(0, 'ai_call', '1'), 2, 'ai_call', /empty when assistance is none/],
    ['a sequential read without an initial call', withCell(3, 'initial_call', ''), 5, 'initial_call', /sequential/],
    ['a period that is not a whole number', withCell(0, 'period', '1.5'), 2, 'period', /whole number/],
    ['a bad time stamp', withCell(0, 'shown_at', 'yesterday'), 2, 'shown_at', /ISO 8601/],
    ['an empty reader id', withCell(2, 'reader_id', ''), 4, 'reader_id', /empty/],
    ['a repeated read', withCell(1, 'case_id', 'C1'), 3, 'case_id', /repeats the read of line 2/],
  ])('refuses %s with line and column', (_name, text, line, column, message) => {
    const p = problem(text);
    expect(p.line).toBe(line);
    expect(p.column).toBe(column);
    expect(p.problem).toMatch(message);
  });
  it('refuses a ragged row, naming the first missing column', () => {
    const text = SAMPLE_CSV.replace(/,Veyra\n/, '\n');
    expect(problem(text)).toMatchObject({ line: 3, column: 'case_scanner' });
    expect(problem(text).problem).toMatch(/row has 23 fields, the header has 24/);
    const extra = SAMPLE_CSV.replace(/,Veyra\n/, ',Veyra,x\n');
    expect(problem(extra)).toMatchObject({ line: 3, column: null });
  });
  it('refuses a column named twice', () => {
    expect(problem(toCsv(sampleRows().map((r) => [...r, 'x']), [...SAMPLE_HEADER, 'truth']))).toMatchObject({ line: 1, column: 'truth' });
  });
});

// The optional read-log columns (scale, ratings, training, withdrawn): defaults when absent,
// validation with line and column named, and the export/parse round trip.
import { parseReadLog, ReadLogError } from '../../../src/io/read-log-parse';
import { readLogCsv } from '../../../src/io/read-log-export';
import { SAMPLE_CSV, SAMPLE_HEADER, sampleRows, toCsv } from './read-log-sample';

const OPTIONAL = ['scale', 'initial_rating', 'final_rating', 'training', 'withdrawn'];
const BASE_WIDTH = SAMPLE_HEADER.length - 1; // without case_scanner
const HEADER = [...SAMPLE_HEADER.slice(0, BASE_WIDTH), ...OPTIONAL, 'case_scanner'];

/** The sample rows with optional cells inserted before case_scanner: [scale, initial, final, training, withdrawn] per row. */
const withOptional = (cells: string[][]): string =>
  toCsv(sampleRows().map((r, i) => [...r.slice(0, BASE_WIDTH), ...(cells[i] ?? ['', '', '', '', '']), ...r.slice(BASE_WIDTH)]), HEADER);

// rows 0,1 unaided; rows 2,3 sequential (so they carry an initial rating too)
const FIVE_POINT = withOptional([
  ['five-point', '', '5', '1', '0'],
  ['five-point', '', '2', '1', '0'],
  ['five-point', '3', '4', '1', '0'],
  ['five-point', '4', '5', '1', '1'],
]);

const problem = (text: string) => {
  try {
    parseReadLog(text);
  } catch (error) {
    if (error instanceof ReadLogError) return { line: error.line, column: error.column, problem: error.problem };
    throw error;
  }
  throw new Error('expected a ReadLogError');
};

describe('read log optional columns', () => {
  it('reads a log without them as call-confidence, no ratings, not training, not withdrawn', () => {
    for (const r of parseReadLog(SAMPLE_CSV)) {
      expect(r).toMatchObject({ scale: 'call-confidence', initial_rating: null, final_rating: null, training: 0, withdrawn: 0 });
    }
  });
  it('types the ratings, training and withdrawn flags', () => {
    const rows = parseReadLog(FIVE_POINT);
    expect(rows.map((r) => r.final_rating)).toEqual([5, 2, 4, 5]);
    expect(rows.map((r) => r.initial_rating)).toEqual([null, null, 3, 4]);
    expect(rows.map((r) => r.training)).toEqual([1, 1, 1, 1]);
    expect(rows.map((r) => r.withdrawn)).toEqual([0, 0, 0, 1]);
    expect(rows[0]?.case_attributes).toEqual({ scanner: 'Halden' });
  });
  it('round-trips through the export, which writes them after shown_at in order', () => {
    const rows = parseReadLog(FIVE_POINT);
    const csv = readLogCsv(rows, ['scanner']);
    expect(csv.split('\n')[0]).toContain('shown_at,scale,initial_rating,final_rating,training,withdrawn,case_scanner');
    expect(parseReadLog(csv)).toEqual(rows);
    const plain = parseReadLog(SAMPLE_CSV);
    expect(parseReadLog(readLogCsv(plain, ['scanner']))).toEqual(plain);
  });
  it('accepts percent ratings 0..100 with fractions', () => {
    const rows = parseReadLog(withOptional([['percent', '', '0', '', ''], ['percent', '', '100', '', ''], ['percent', '12.5', '80', '', ''], ['percent', '50', '50', '', '']]));
    expect(rows.map((r) => r.final_rating)).toEqual([0, 100, 80, 50]);
    expect(rows[2]?.initial_rating).toBe(12.5);
  });
  it.each([
    ['a five-point rating of 6', [['five-point', '', '6', '', '']], 2, 'final_rating', /whole number 1 to 5 on the five-point scale/],
    ['a five-point rating of 2.5', [['five-point', '', '2.5', '', '']], 2, 'final_rating', /whole number 1 to 5/],
    ['a five-point rating of 0', [['five-point', '', '0', '', '']], 2, 'final_rating', /1 to 5/],
    ['a percent rating above 100', [['percent', '', '101', '', '']], 2, 'final_rating', /number 0 to 100 on the percent scale/],
    ['a percent rating that is not a number', [['percent', '', 'high', '', '']], 2, 'final_rating', /number/],
    ['a rating on call-confidence', [['', '', '4', '', '']], 2, 'final_rating', /empty when the scale is call-confidence/],
    ['a rating scale without a final rating', [['percent', '', '', '', '']], 2, 'final_rating', /must hold the rating/],
    ['an initial rating on an unaided read', [['five-point', '3', '4', '', '']], 2, 'initial_rating', /not sequential/],
    ['a sequential read without an initial rating', [[], [], ['five-point', '', '4', '', '']], 4, 'initial_rating', /must hold the rating/],
    ['an unknown scale', [['seven-point', '', '4', '', '']], 2, 'scale', /call-confidence, five-point, percent/],
    ['a training flag that is not 0/1', [[], ['', '', '', 'yes', '']], 3, 'training', /0 or 1/],
    ['a withdrawn flag that is not 0/1', [[], [], ['', '', '', '', '2']], 4, 'withdrawn', /0 or 1/],
  ])('refuses %s, naming line and column', (_name, cells, line, column, message) => {
    const p = problem(withOptional(cells.map((c) => (c.length === 0 ? ['', '', '', '', ''] : c))));
    expect(p).toMatchObject({ line, column });
    expect(p.problem).toMatch(message);
  });
});

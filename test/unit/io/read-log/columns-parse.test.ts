// The read log typed straight from its bytes into columns (parseReadLogColumns, issue 10) must
// give exactly what today's parser gives: the reads of parseReadLogBytes put into the same
// columns read by read (the oracle), or the same refusal at the same line and column with the
// same words. Inputs: the sample and hand-made variants (quotes, CRLF, byte-order marks, empty
// cells, bad and odd numbers, semicolons, bad bytes), then many cells broken at random.
import { READ_LOG_COLUMNS } from '../../../../src/core/read-log';
import { estimatedLines, parseReadLogBytes, parseReadLogColumns } from '../../../../src/io/read-log-parse';
import { logColumnsBuilder } from '../../../../src/io/read-log/log-columns';
import { numberAt } from '../../../../src/io/read-log/fields';
import { ReadLogError } from '../../../../src/io/read-log/read-log-error';
import { SAMPLE_CSV, SAMPLE_HEADER, sampleRows, toCsv, withCell } from '../read-log-sample';

const utf8 = (text: string): Uint8Array => new TextEncoder().encode(text);

const outcome = (parse: () => unknown): unknown => {
  try {
    return { log: parse() };
  } catch (error) {
    if (error instanceof ReadLogError) return { line: error.line, column: error.column, problem: error.problem };
    throw error;
  }
};

// today's parser, its reads put into columns one by one
const oracle = (bytes: Uint8Array): unknown =>
  outcome(() => {
    const rows = parseReadLogBytes(bytes);
    const b = logColumnsBuilder(rows.length);
    for (const r of rows) b.pushRow(r);
    return b.done();
  });

const direct = (bytes: Uint8Array): unknown => outcome(() => parseReadLogColumns(bytes));

const expectSame = (bytes: Uint8Array): unknown => {
  const expected = oracle(bytes);
  expect(direct(bytes)).toEqual(expected);
  return expected;
};

const rowsCsv = (edit: (rows: string[][]) => void, header: string[] = SAMPLE_HEADER): string => {
  const rows = sampleRows();
  edit(rows);
  return toCsv(rows, header);
};
const col = (name: string): number => SAMPLE_HEADER.indexOf(name);

// five-point and percent reads: scale, initial_rating, final_rating appended to the sample's header
const SCALED_HEADER = [...SAMPLE_HEADER, 'scale', 'initial_rating', 'final_rating', 'training', 'withdrawn'];
const scaled = (scale: string, initial: string, final: string): string =>
  toCsv(sampleRows().map((r) => [...r, scale, r[col('assistance')] === 'sequential' ? initial : '', final, '0', '']), SCALED_HEADER);

const cases: [string, string][] = [
  ['the sample', SAMPLE_CSV],
  ['CRLF line ends', SAMPLE_CSV.replace(/\n/g, '\r\n')],
  ['a byte-order mark', `\uFEFF${SAMPLE_CSV}`],
  ['two byte-order marks', `\uFEFF\uFEFF${SAMPLE_CSV}`],
  ['blank lines and no final newline', `${SAMPLE_CSV.replace('\n', '\n\n')}\n\n`.trimEnd()],
  ['a quoted cell with a comma', withCell(1, 'case_scanner', 'Halden, east')],
  ['a quoted id', withCell(0, 'reader_id', 'R"1')],
  ['a semicolon file', SAMPLE_CSV.replace(/,/g, ';')],
  ['an empty file', ''],
  ['only blank space', ' \n\n  '],
  ['a header only', SAMPLE_CSV.slice(0, SAMPLE_CSV.indexOf('\n') + 1)],
  ['a first line blank', `\n${SAMPLE_CSV}`],
  ['a ragged row, short', `${SAMPLE_CSV}S1,R1\n`],
  ['a ragged row, long', SAMPLE_CSV.replace('Veyra\n', 'Veyra,x\n')],
  ['a line of spaces', SAMPLE_CSV.replace('Veyra\n', 'Veyra\n   \n')],
  ['non-ASCII ids and attributes', withCell(0, 'case_scanner', 'Größe ß').replace(/R1,/g, 'Rä1,')],
  ['formula-quoted ids that read back as one id', rowsCsv((rows) => { (rows[0] as string[])[col('reader_id')] = "'=R1"; for (const r of rows.slice(1)) r[col('reader_id')] = '=R1'; })],
  ['a formula-quoted attribute', withCell(0, 'case_scanner', "'=Halden")],
  ['a quote-led number', withCell(0, 'total_ms', "'3000")],
  ['an empty required id', withCell(2, 'case_id', '')],
  ['a blank-looking required id', withCell(2, 'finding', '  ')],
  ['an empty role', withCell(0, 'reader_role', '')],
  ['a repeated read', rowsCsv((rows) => { (rows[1] as string[])[col('case_id')] = 'C1'; })],
  ['initial_ms above total_ms', withCell(2, 'initial_ms', '5000')],
  ['a time with a fraction', withCell(0, 'shown_at', '2026-01-12T08:00:00.123456Z')],
  ['a time without seconds', withCell(0, 'shown_at', '2026-01-12T08:00Z')],
  ['a day that does not exist', withCell(1, 'shown_at', '2026-02-30T08:00:00Z')],
  ['a year below 100', withCell(1, 'shown_at', '0099-01-01T08:00:00Z')],
  ['hour 24', withCell(1, 'shown_at', '2026-01-12T24:00:00Z')],
  ['a time with a space', withCell(1, 'shown_at', '2026-01-12T08:00:00Z ')],
  ['five-point ratings', scaled('five-point', '2', '4')],
  ['percent ratings with fractions', scaled('percent', '12.5', '99.25')],
  ['a five-point rating of 3.5', scaled('five-point', '2', '3.5')],
  ['a rating on call-confidence', scaled('', '', '40')],
  ['a missing rating', scaled('percent', '', '')],
  ['an unknown scale', scaled('ten-point', '2', '4')],
  ['a rating of spaces where none is asked', scaled('', '', '  ')],
];

for (const [name, value] of [
  ['-0', '-0'], ['+0', '+0'], ['-0.0', '-0.0'], ['an exponent', '2.5e3'], ['a capital exponent', '25E2'], ['a leading dot', '.5'],
  ['a trailing dot', '5.'], ['a plus sign', '+3000'], ['15 digits', '123456789012345'], ['16 digits', '1234567890123456'],
  ['a huge number', '1e308'], ['an overflowing number', '1e999'], ['20 digits with a fraction', '1234567890.1234567890'],
  ['a leading space', ' 3000'], ['a comma decimal', '3000;5'], ['a hex number', '0x10'], ['Infinity', 'Infinity'], ['NaN', 'NaN'],
  ['two dots', '1.2.3'], ['a lone dot', '.'], ['a lone minus', '-'], ['a negative', '-5'], ['leading zeros', '0003000'],
] as const) {
  cases.push([`total_ms ${name}`, withCell(0, 'total_ms', value)]);
  cases.push([`ai_score ${name}`, withCell(2, 'ai_score', value)]);
  cases.push([`period ${name}`, withCell(1, 'period', value)]);
  cases.push([`final_confidence ${name}`, withCell(3, 'final_confidence', value)]);
}
for (const value of ['', ' ', '2', '-1', '01', 'yes', '1 ']) {
  cases.push([`truth ${JSON.stringify(value)}`, withCell(1, 'truth', value)]);
  cases.push([`ai_call ${JSON.stringify(value)}`, withCell(2, 'ai_call', value)]);
  cases.push([`ai_call on an unaided read ${JSON.stringify(value)}`, withCell(0, 'ai_call', value)]);
  cases.push([`initial_call ${JSON.stringify(value)}`, withCell(3, 'initial_call', value)]);
}
for (const value of ['', 'None', 'concurrent', ' none', "'none"]) cases.push([`assistance ${JSON.stringify(value)}`, withCell(0, 'assistance', value)]);

describe('parseReadLogColumns against today\'s parser', () => {
  it.each(cases)('%s', (_what, text) => {
    expectSame(utf8(text));
  });

  it('reads the sample as the oracle does (not a refusal), with -0 kept', () => {
    expect(expectSame(utf8(SAMPLE_CSV))).toHaveProperty('log.n', 4);
    const log = parseReadLogColumns(utf8(withCell(0, 'total_ms', '-0')));
    expect(Object.is(log.totalMs[0], -0)).toBe(true);
  });

  it('names the line of a bad byte after a refused row, and of one before it', () => {
    const text = `${withCell(0, 'truth', '7')}S1,R1,radiologist,5,UA,1,none,C9,target,0,3,1,,,0,0,,,,1,80,3000,2026-01-12T08:00:00Z,HALDEN\n`;
    const late = utf8(text);
    late[late.lastIndexOf(0x48)] = 0xe9; // a Latin-1 letter on line 6, after the bad truth on line 2
    expect(expectSame(late)).toEqual({ line: 6, column: null, problem: expect.stringMatching(/not UTF-8/) });
    const early = utf8(withCell(2, 'truth', '7'));
    early[early.indexOf(0x48)] = 0xe9; // line 2, before the bad truth on line 4
    expect(expectSame(early)).toEqual({ line: 2, column: null, problem: expect.stringMatching(/not UTF-8/) });
  });

  // The direct parse sizes its columns by the mean line length of the file's first 256 KB and
  // grows them when that falls short: long lines first, then many short ones, grow them several times.
  it('grows its columns when the first lines are much longer than the rest', () => {
    const rows: string[][] = [];
    const [unaided, , sequential] = sampleRows() as [string[], string[], string[]];
    for (let k = 0; k < 20_400; k++) {
      // each case read once in each period
      const r = [...(k % 2 === 0 ? unaided : sequential)];
      r[col('case_id')] = `C${k >> 1}`;
      if (k < 400) r[col('case_scanner')] = `Halden ${'x'.repeat(800)} ${k % 3}`;
      rows.push(r);
    }
    const bytes = utf8(toCsv(rows));
    expect(estimatedLines(bytes, 0)).toBeLessThan(10_000);
    const got = expectSame(bytes) as { log: { n: number; attributes: { values: string[] }[] } };
    expect(got.log.n).toBe(20_400);
    expect(got.log.attributes[0]?.values.length).toBe(4);
    // a short log is counted, not estimated
    expect(estimatedLines(utf8(SAMPLE_CSV), 0)).toBe(6);
  });

  it('never estimates more reads than the bytes can hold, whatever the first 256 KB look like', () => {
    // 300,000 blank lines, then one long line: the sample's mean line length is one byte, so an
    // estimate from it alone would size every column like the file (over a million reads)
    const bytes = utf8(`${'\n'.repeat(300_000)}${'x'.repeat(1_000_000)}`);
    const most = Math.ceil(bytes.length / (READ_LOG_COLUMNS.length - 1)) + 64;
    expect(estimatedLines(bytes, 0)).toBe(most);
    expect(most).toBeLessThan(bytes.length / 10);
  });

  // Random logs: each cell of a few rows replaced by a value from a list of troublesome ones; the
  // seeded generator keeps the run repeatable.
  it('gives what today\'s parser gives on 3,000 logs with cells broken at random', () => {
    const values = ['', ' ', '0', '1', '2', '-0', '0.5', '1e2', '.5', '5.', '+1', '100', '101', '12345678901234567', '1.0', 'x', "'1", "'=x",
      '=x', 'R1', 'C1', 'C2', 'target', 'none', 'sequential', 'concurrent', 'five-point', 'percent', 'call-confidence', '3', '2026-01-12T08:00:00Z',
      '2026-02-29T08:00:00Z', '2028-02-29T23:59:59.5Z', 'é', '\t', '0.91', '99.999', '4000'];
    let x = 7;
    const next = (n: number): number => {
      x = (Math.imul(x, 1103515245) + 12345) >>> 0;
      return (x >>> 8) % n;
    };
    let refused = 0;
    for (let run = 0; run < 3000; run++) {
      const rows = sampleRows();
      const breaks = 1 + next(3);
      for (let k = 0; k < breaks; k++) (rows[next(rows.length)] as string[])[next(SAMPLE_HEADER.length)] = values[next(values.length)] as string;
      const got = expectSame(utf8(toCsv(rows))) as { log?: unknown };
      if (got.log === undefined) refused++;
    }
    // both kinds of outcome were compared many times
    expect(refused).toBeGreaterThan(500);
    expect(refused).toBeLessThan(2900);
  });
});

describe('numberAt', () => {
  it('equals Number() of every cell it reads, and declines the rest', () => {
    const ascii = (s: string): Uint8Array => Uint8Array.from(s, (ch) => ch.charCodeAt(0));
    let x = 3;
    const next = (n: number): number => {
      x = (Math.imul(x, 1103515245) + 12345) >>> 0;
      return (x >>> 8) % n;
    };
    const chars = '0123456789.-+e ';
    let read = 0;
    for (let k = 0; k < 200_000; k++) {
      const len = 1 + next(18);
      let s = '';
      for (let j = 0; j < len; j++) s += chars[next(j === 0 ? chars.length : 11)];
      const v = numberAt(ascii(s), 0, s.length);
      if (v === v) {
        read++;
        expect(Object.is(v, Number(s)), s).toBe(true);
      } else if (/^[+-]?(\d+\.?\d*|\.\d+)$/.test(s) && s.replace(/\D/g, '').length <= 15) throw new Error(`declined ${s}`);
    }
    expect(read).toBeGreaterThan(50_000);
  });
});

// The read log's direct paths (issue 10): a log without quotes or carriage returns is split line
// by line, and its bytes are decoded one line at a time. They must give exactly what the general
// path (papaparse over the whole decoded text) gives: the same reads, and the same refusal at
// the same line and column. The general path is the oracle here.
import { SAMPLE_CSV, withCell } from '../read-log-sample';
import { parseReadLog, parseReadLogBytes } from '../../../../src/io/read-log-parse';
import { ReadLogError } from '../../../../src/io/read-log/read-log-error';
import { decodeUtf8 } from '../../../../src/io/case-set/text';

// The general path forced: a quoted header cell makes papaparse split the whole text.
const general = (text: string): string => text.replace(/^(\uFEFF?)study_id,/, '$1"study_id",');

const outcome = (parse: () => unknown): unknown => {
  try {
    return { reads: parse() };
  } catch (error) {
    if (error instanceof ReadLogError) return { line: error.line, column: error.column, problem: error.problem };
    throw error;
  }
};

const utf8 = (text: string): Uint8Array => new TextEncoder().encode(text);

const cases: [string, string][] = [
  ['the sample', SAMPLE_CSV],
  ['no final newline', SAMPLE_CSV.trimEnd()],
  ['blank lines between and after rows', SAMPLE_CSV.replace('\n', '\n\n') + '\n\n'],
  ['a byte-order mark', `\uFEFF${SAMPLE_CSV}`],
  ['a bad shown_at on line 3', withCell(1, 'shown_at', '2026-01-12T08:00Z ')],
  ['a ragged row', `${SAMPLE_CSV}S1,R1\n`],
  ['a formula-quoted attribute', withCell(0, 'case_scanner', "'=Halden")],
  ['a header only', SAMPLE_CSV.slice(0, SAMPLE_CSV.indexOf('\n') + 1)],
];

describe('direct line splitting', () => {
  it.each(cases)('%s: parseReadLog and parseReadLogBytes give what the general path gives', (_what, text) => {
    const expected = outcome(() => parseReadLog(general(text)));
    expect(outcome(() => parseReadLog(text))).toEqual(expected);
    expect(outcome(() => parseReadLogBytes(utf8(text)))).toEqual(expected);
    // blocks smaller than a line, and of a few lines, so lines meet block boundaries everywhere
    for (const blockBytes of [1, 7, 150, 400]) expect(outcome(() => parseReadLogBytes(utf8(text), { blockBytes }))).toEqual(expected);
  });

  it('reports a bad byte after a bad row at the bad byte, as the whole-file decoding does', () => {
    const text = `${withCell(0, 'truth', '7')}S1,R1,radiologist,5,UA,1,none,C9,target,0,3,1,,,0,0,,,,1,80,3000,2026-01-12T08:00:00Z,HALDEN\n`;
    const bytes = utf8(text);
    bytes[bytes.lastIndexOf(0x48)] = 0xe9; // a Latin-1 letter on line 6
    const decoded = decodeUtf8(bytes);
    expect(decoded.ok).toBe(false);
    for (const blockBytes of [undefined, 1, 100, 300]) {
      expect(outcome(() => parseReadLogBytes(bytes, { blockBytes }))).toEqual({ line: decoded.ok ? 0 : decoded.line, column: null, problem: expect.stringMatching(/not UTF-8/) });
    }
    expect(decoded.ok ? 0 : decoded.line).toBe(6);
  });

  it('shares one frozen case_attributes object between reads of the same attribute values', () => {
    const reads = parseReadLog(SAMPLE_CSV);
    expect(reads[0]?.case_attributes).toBe(reads[2]?.case_attributes);
    expect(reads[0]?.case_attributes).not.toBe(reads[1]?.case_attributes);
    expect(Object.isFrozen(reads[0]?.case_attributes)).toBe(true);
  });
});

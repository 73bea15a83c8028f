// Strict read-log typing: each lenient case once accepted is refused, naming line and column.
import { parseReadLog, parseReadLogBytes } from '../../../../src/io/read-log-parse';
import { ReadLogError } from '../../../../src/io/read-log/read-log-error';
import { SAMPLE_CSV, withCell } from '../read-log-sample';

const refusal = (parse: () => unknown): ReadLogError => {
  try {
    parse();
  } catch (error) {
    if (error instanceof ReadLogError) return error;
    throw error;
  }
  throw new Error('expected the log to be refused');
};

describe('strict read-log typing', () => {
  it.each([
    ['1e999 as total_ms', withCell(0, 'total_ms', '1e999'), 2, 'total_ms', /must be a finite number/],
    ['1e999 as initial_ms', withCell(2, 'initial_ms', '1e999'), 4, 'initial_ms', /must be a finite number/],
    ['-1e999 as reader_years', withCell(1, 'reader_years', '-1e999'), 3, 'reader_years', /must be a finite number/],
    ['initial_ms over total_ms', withCell(2, 'initial_ms', '5000'), 4, 'initial_ms', /must be at most total_ms \(4100\), got 5000/],
    ['February 30th', withCell(0, 'shown_at', '2026-02-30T08:00:00Z'), 2, 'shown_at', /real ISO 8601 UTC time/],
    ['April 31st', withCell(1, 'shown_at', '2026-04-31T08:00:00Z'), 3, 'shown_at', /real ISO 8601/],
    ['hour 24', withCell(1, 'shown_at', '2026-01-12T24:00:00Z'), 3, 'shown_at', /real ISO 8601/],
    ['second 60', withCell(1, 'shown_at', '2026-01-12T08:00:60Z'), 3, 'shown_at', /real ISO 8601/],
  ])('refuses %s', (_what, csv, line, column, message) => {
    const error = refusal(() => parseReadLog(csv));
    expect([error.line, error.column]).toEqual([line, column]);
    expect(error.problem).toMatch(message);
  });

  it('accepts February 29th of a leap year and initial_ms equal to total_ms', () => {
    expect(parseReadLog(withCell(0, 'shown_at', '2028-02-29T23:59:59.5Z'))[0]?.shown_at).toBe('2028-02-29T23:59:59.5Z');
    expect(parseReadLog(withCell(2, 'initial_ms', '4100'))[2]?.initial_ms).toBe(4100);
  });

  it('refuses a Latin-1 byte, naming its line, instead of turning it into U+FFFD', () => {
    const text = withCell(2, 'case_scanner', 'Halden-X');
    const bytes = new TextEncoder().encode(text);
    const at = text.indexOf('Halden-X');
    bytes[at + 6] = 0xe9; // 'é' in Latin-1, not valid UTF-8 here
    const error = refusal(() => parseReadLogBytes(bytes));
    expect(error.line).toBe(4);
    expect(error.message).toBe('line 4: the file is not UTF-8 text (first bad byte on this line); save it as UTF-8 CSV');
  });

  it('reads UTF-8 bytes with a byte-order mark', () => {
    const bytes = new TextEncoder().encode(`\ufeff${SAMPLE_CSV}`);
    expect(parseReadLogBytes(bytes)).toHaveLength(4);
  });
});

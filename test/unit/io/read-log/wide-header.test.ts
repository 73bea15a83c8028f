// A very wide reads.csv header is refused at once, naming line 1 and the column count.
import { MAX_READ_LOG_COLUMNS, parseReadLog } from '../../../../src/io/read-log-parse';
import { ReadLogError } from '../../../../src/io/read-log/read-log-error';
import { SAMPLE_HEADER } from '../read-log-sample';

describe('wide read-log headers', () => {
  it('refuses a header of 200,000 columns', () => {
    const header = [...SAMPLE_HEADER];
    for (let i = 0; i < 200_000; i += 1) header.push(`extra_${i}`);
    let caught: unknown = null;
    try {
      parseReadLog(`${header.join(',')}\n`);
    } catch (error) {
      caught = error;
    }
    if (!(caught instanceof ReadLogError)) throw new Error(`expected a ReadLogError, got ${String(caught)}`);
    expect(caught.line).toBe(1);
    expect(caught.message).toBe(`line 1: the header has ${(header.length).toLocaleString('en')} columns; the limit is ${MAX_READ_LOG_COLUMNS.toLocaleString('en')}`);
  });
});

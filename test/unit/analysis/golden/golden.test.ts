// "Same numbers to the last bit": the engine's whole report on seeded simulated logs against
// goldens written by the engine before the column-wise rewrite (issue 10). This is a regression
// guard, not a correctness check: correctness is checked against outside sources in
// test/reference/. Both entries are checked: analyzeReads on typed rows, and the CLI's path from
// the CSV text (parse, then analyse), by each parse.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { analyzeColumns, analyzeReads, DEFAULT_BOOT, readerAveragedOfColumns, withReaderAveraged } from '../../../../src/analysis/engine';
import { columnsBuilder, columnsOfLog, logColumns } from '../../../../src/analysis/read-columns';
import { readLogCsv } from '../../../../src/io/read-log-export';
import { lineCount, parseReadLog, parseReadLogBytesInto, parseReadLogColumns } from '../../../../src/io/read-log-parse';
import { goldenLogs } from './golden-logs';

const golden = (name: string): string => readFileSync(join(import.meta.dirname, `${name}.json`), 'utf8').trimEnd();

describe('analysis engine against its goldens', () => {
  for (const log of goldenLogs()) {
    it(`${log.name}: analyzeReads on rows gives the golden report, byte for byte`, () => {
      expect(JSON.stringify(analyzeReads(log.rows, log.options))).toBe(golden(log.name));
    });
    it(`${log.name}: the CSV text, parsed and analysed, gives the golden report`, () => {
      const csv = readLogCsv(log.rows, log.attributes);
      expect(JSON.stringify(analyzeReads(parseReadLog(csv), log.options))).toBe(golden(log.name));
    });
    it(`${log.name}: the CLI's path, CSV bytes parsed straight into columns, gives the golden report`, () => {
      const bytes = new TextEncoder().encode(readLogCsv(log.rows, log.attributes));
      const columns = columnsBuilder(lineCount(bytes));
      parseReadLogBytesInto(bytes, columns.push);
      expect(JSON.stringify(analyzeColumns(columns.done(), log.options))).toBe(golden(log.name));
    });
    it(`${log.name}: the CLI's path, CSV bytes typed cell by cell into columns, gives the golden report and the same columns`, () => {
      const bytes = new TextEncoder().encode(readLogCsv(log.rows, log.attributes));
      const cols = columnsOfLog(parseReadLogColumns(bytes));
      const columns = columnsBuilder(lineCount(bytes));
      parseReadLogBytesInto(bytes, columns.push);
      expect(cols).toEqual(columns.done());
      expect(JSON.stringify(analyzeColumns(cols, log.options))).toBe(golden(log.name));
    });
    it(`${log.name}: the results page's two steps (boot = 0 first, then the bootstrap filled in) give the golden report`, () => {
      const cols = logColumns(log.rows);
      const boot = log.options.boot ?? DEFAULT_BOOT;
      const first = analyzeColumns(cols, { ...log.options, boot: 0 });
      const averaged = readerAveragedOfColumns(cols, log.options);
      expect(JSON.stringify(withReaderAveraged(first, averaged, boot))).toBe(golden(log.name));
    });
  }
});

// "Same numbers to the last bit": the engine's whole report on seeded simulated logs against
// goldens written by the engine before the column-wise rewrite (issue 10). This is a regression
// guard, not a correctness check: correctness is checked against outside sources in
// test/reference/. Both entries are checked: analyzeReads on typed rows, and the CLI's path from
// the CSV text (parse, then analyse).
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { analyzeReads } from '../../../../src/analysis/engine';
import { readLogCsv } from '../../../../src/io/read-log-export';
import { parseReadLog } from '../../../../src/io/read-log-parse';
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
  }
});

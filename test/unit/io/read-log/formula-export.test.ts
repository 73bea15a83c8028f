// reads.csv never hands a spreadsheet a formula: text cells starting with =, +, -, @, tab or CR
// get a leading single quote (OWASP CSV Injection guidance), numbers are never quoted, and
// parseReadLog reads the exact values back, so the analysis is unchanged.
import Papa from 'papaparse';
import { readLogCsv } from '../../../../src/io/read-log-export';
import { parseReadLog } from '../../../../src/io/read-log-parse';
import { makeRead } from '../../analysis/make-read';

const hostile = [
  makeRead({ reader_id: '-R1', case_id: '@C1', finding: '=HYPERLINK("http://x","y")', reader_role: '+role', case_attributes: { site: '\t=1+1', scanner: "'=quoted" } }),
  makeRead({ reader_id: '-R1', case_id: 'C2', order: 2, finding: '=HYPERLINK("http://x","y")', case_attributes: { site: '\r@x', scanner: '-3.5' } }),
];

describe('reads.csv export and formula-looking text', () => {
  it('starts no cell with =, +, -, @, tab or CR, except plain numbers', () => {
    const text = readLogCsv(hostile, ['site', 'scanner']);
    const parsed = Papa.parse<string[]>(text.trim(), { delimiter: ',' });
    const cells = parsed.data.flat();
    expect(cells.filter((c) => /^[=+\-@\t\r]/.test(c) && c !== '-3.5')).toEqual([]);
    expect(cells).toContain("'=HYPERLINK(\"http://x\",\"y\")");
    expect(cells).toContain('-3.5');
  });

  it('reads back exactly the values that were written', () => {
    const back = parseReadLog(readLogCsv(hostile, ['site', 'scanner']));
    expect(back.map((r) => [r.reader_id, r.reader_role, r.case_id, r.finding, { ...r.case_attributes }])).toEqual(
      hostile.map((r) => [r.reader_id, r.reader_role, r.case_id, r.finding, r.case_attributes]),
    );
  });
});

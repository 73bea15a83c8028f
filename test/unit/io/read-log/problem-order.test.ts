import { parseReadLog, ReadLogError } from '../../../../src/io/read-log-parse';
import { SAMPLE_CSV, sampleRows, toCsv, withCell } from '../read-log-sample';

// Rows are typed while the CSV is still being read; these pin down which problem is reported
// when a file has several, which must not depend on that.
const problem = (text: string): string => {
  try {
    parseReadLog(text);
  } catch (error) {
    if (error instanceof ReadLogError) return error.message;
    throw error;
  }
  return 'no problem';
};

describe('which problem a reads.csv is refused for', () => {
  it('a CSV problem late in the file wins over a bad value earlier', () => {
    const text = `${withCell(0, 'truth', '7')}S1,"R9\n`;
    expect(problem(text)).toMatch(/^line 6: unreadable CSV/);
  });
  it('a CSV problem wins over a bad header', () => {
    expect(problem(`${SAMPLE_CSV.replace('truth,', 'verdict,')}"x\n`)).toMatch(/unreadable CSV/);
  });
  it('otherwise the first bad row, in file order, even when a later row repeats a read', () => {
    const rows = sampleRows();
    rows.push([...(rows[0] as string[])]);
    (rows[1] as string[])[11] = 'x';
    expect(problem(toCsv(rows))).toBe('line 3: column truth: must be 0 or 1, got "x"');
  });
  it('within a row, assistance and its dependent calls come before the other cells', () => {
    const rows = sampleRows();
    const r = rows[0] as string[];
    r[0] = '';
    r[12] = '1';
    expect(problem(toCsv(rows))).toBe('line 2: column ai_call: must be empty when assistance is none');
  });
  it('a repeated read names the line of the first', () => {
    const rows = sampleRows();
    rows.push([...(rows[2] as string[])]);
    expect(problem(toCsv(rows))).toBe('line 6: column case_id: repeats the read of line 4 (same reader, case, finding and period)');
  });
  it('reads whose ids only look alike are not taken for repeats', () => {
    const rows = sampleRows().slice(0, 2);
    const a = rows[0] as string[];
    const b = rows[1] as string[];
    // reader "R1" + case "1C" against reader "R11" + case "C": the same letters run together
    [a[1], a[7], b[1], b[7]] = ['R1', '1C', 'R11', 'C'];
    expect(parseReadLog(toCsv(rows))).toHaveLength(2);
  });
});

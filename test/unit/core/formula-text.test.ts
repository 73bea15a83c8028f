// Formula-looking text (CSV injection). The characters are those OWASP's CSV Injection page
// lists as starting a formula: =, +, -, @, tab (0x09) and carriage return (0x0D)
// (https://owasp.org/www-community/attacks/CSV_Injection).
import { formulaProblem, looksLikeFormula, neutraliseCell, restoreCell } from '../../../src/core/formula-text';

describe('formula-looking text', () => {
  it('flags each starting character OWASP lists, and nothing else', () => {
    for (const text of ['=1+1', '+1+1', '-1+cmd', '@SUM(A1)', '\t=1', '\r=1', '=HYPERLINK("http://x","y")']) {
      expect(looksLikeFormula(text)).toBe(true);
    }
    for (const text of ['Halden', 'a=b', ' text', "'=1", '', 'R-01']) expect(looksLikeFormula(text)).toBe(false);
  });

  it('lets plain numbers through, signed or not', () => {
    for (const text of ['-3.5', '+2', '-0.001', '-1e5', '-.5']) expect(looksLikeFormula(text)).toBe(false);
    expect(looksLikeFormula('-3.5+1')).toBe(true);
  });

  it('explains a refusal by the first character', () => {
    expect(formulaProblem('@SUM(A1)')).toMatch(/^starts with "@", which a spreadsheet could run as a formula/);
    expect(formulaProblem('\t=1')).toMatch(/^starts with a tab/);
    expect(formulaProblem('-3.5')).toBeNull();
  });

  it('quotes formula-looking cells for export and reads them back exactly', () => {
    expect(neutraliseCell('=1+1')).toBe("'=1+1");
    expect(neutraliseCell('-3.5')).toBe('-3.5');
    expect(neutraliseCell('North')).toBe('North');
    for (const text of ['=1+1', "'=1+1", "''@x", "'", "'plain", 'plain', '-3.5', '\r=1', '']) {
      expect(restoreCell(neutraliseCell(text))).toBe(text);
      expect(looksLikeFormula(neutraliseCell(text))).toBe(false);
    }
  });
});

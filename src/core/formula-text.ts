/**
 * Text that a spreadsheet would run as a formula (CSV injection): a cell starting with `=`, `+`,
 * `-`, `@`, a tab or a carriage return, as OWASP's CSV Injection page lists
 * (https://owasp.org/www-community/attacks/CSV_Injection). Heed refuses such text where it enters
 * (imported cases.csv fields, reader codes, study names), and, as a second line of defence, its
 * CSV exports put a single quote before any such cell, which spreadsheets show as text. Plain
 * numbers (e.g. `-3.5`) are neither refused nor quoted, so numbers stay numbers.
 * Example: formulaProblem('=HYPERLINK("x")') -> 'starts with "=", which a spreadsheet ...';
 * neutraliseCell('@SUM(A1)') -> "'@SUM(A1)"; restoreCell("'@SUM(A1)") -> '@SUM(A1)'.
 */

const FORMULA_START = /^[=+\-@\t\r]/;
const PLAIN_NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

const describe = (ch: string): string => (ch === '\t' ? 'a tab' : ch === '\r' ? 'a carriage return' : `"${ch}"`);

/** True when a spreadsheet could take the text as a formula (plain numbers are not). */
export const looksLikeFormula = (value: string): boolean => FORMULA_START.test(value) && !PLAIN_NUMBER.test(value);

/** Why `value` is refused, or null: the text of a message to put after the field's name and place. */
export const formulaProblem = (value: string): string | null => {
  if (!looksLikeFormula(value)) return null;
  return `starts with ${describe(value.charAt(0))}, which a spreadsheet could run as a formula; remove or change the first character`;
};

/**
 * True when the cell needs a leading quote in a CSV export: it looks like a formula, or it is
 * quotes followed by such text (so a value that itself starts with a quote still reads back
 * exactly).
 */
const needsQuote = (value: string): boolean => {
  const first = value.charCodeAt(0);
  // most cells start with none of ' = + - @ tab CR: answered without a regular expression (export of large logs)
  if (first !== 39 && first !== 61 && first !== 43 && first !== 45 && first !== 64 && first !== 9 && first !== 13) return false;
  let i = 0;
  while (value.charCodeAt(i) === 39) i += 1;
  return looksLikeFormula(value.slice(i));
};

/** The cell as a spreadsheet-safe CSV value: formula-looking text gets a leading single quote. */
export const neutraliseCell = (value: string): string => (needsQuote(value) ? `'${value}` : value);

/** Undoes neutraliseCell, so text read back from Heed's own CSV is exactly what was written. */
export const restoreCell = (value: string): string =>
  value.charCodeAt(0) === 39 && needsQuote(value.slice(1)) ? value.slice(1) : value;

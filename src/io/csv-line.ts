/**
 * CSV cells and lines written the way Papa Parse 5.7's `unparse` writes them with Heed's options
 * (delimiter ",", quote and escape character '"', `quotes: false`): a cell is quoted only when it
 * holds a comma, a quote, CR, LF or a byte order mark, or starts or ends with a space; a quote
 * inside is doubled. Written by hand for the read log (hundreds of thousands of rows), where
 * building an array per row for `unparse` cost more than the text itself. The same bytes as
 * `unparse`: test/unit/io/csv-line.test.ts compares them on awkward cells.
 * Example: csvCell('a,b') -> '"a,b"'; csvCell('say "hi"') -> '"say ""hi"""'; csvCell(' x') -> '" x"'.
 */

// , " \n \r and the byte order mark: a cell holding any of them is quoted
const NEEDS_QUOTES = /[,"\n\r\ufeff]/;

export const csvCell = (value: string): string => {
  if (value === '') return value;
  const quoted = NEEDS_QUOTES.test(value) || value.charCodeAt(0) === 32 || value.charCodeAt(value.length - 1) === 32;
  return quoted ? `"${value.replaceAll('"', '""')}"` : value;
};

/** One line (no line end) of the given cells. */
export const csvLine = (cells: readonly string[]): string => {
  let line = '';
  for (let i = 0; i < cells.length; i++) line += i === 0 ? csvCell(cells[i] ?? '') : `,${csvCell(cells[i] ?? '')}`;
  return line;
};

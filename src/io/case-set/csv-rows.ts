// CSV text to rows with the line each row starts on (header = line 1), by papaparse.
import Papa from 'papaparse';

export type CsvRow = { line: number; cells: string[] };
export type CsvParse = { header: CsvRow | null; rows: CsvRow[]; errors: { line: number; message: string }[] };

export const parseCsvRows = (text: string, maxRows: number): CsvParse => {
  // Line starts, so a row's character offset maps to its line (quoted fields may span lines).
  const lineStarts = [0];
  for (let i = 0; i < text.length; i += 1) if (text.charCodeAt(i) === 10) lineStarts.push(i + 1);
  const lineAt = (offset: number): number => {
    let lo = 0;
    let hi = lineStarts.length - 1;
    while (lo < hi) {
      const mid = Math.ceil((lo + hi) / 2);
      if ((lineStarts[mid] as number) <= offset) lo = mid;
      else hi = mid - 1;
    }
    return lo + 1;
  };
  const all: CsvRow[] = [];
  const errors: CsvParse['errors'] = [];
  let cursor = 0;
  Papa.parse<string[]>(text, {
    delimiter: ',',
    skipEmptyLines: true,
    step: (result, parser) => {
      // Skip the line break (and blank lines) that papaparse leaves before a row's first cell.
      let start = cursor;
      while (start < text.length && (text[start] === '\n' || text[start] === '\r')) start += 1;
      const line = lineAt(start);
      cursor = result.meta.cursor;
      for (const error of result.errors) errors.push({ line, message: error.message });
      all.push({ line, cells: result.data });
      // One more than allowed is enough to say "too many rows".
      if (all.length > maxRows + 1) {
        parser.abort();
      }
    },
  });
  const [header = null, ...rows] = all;
  return { header, rows, errors };
};

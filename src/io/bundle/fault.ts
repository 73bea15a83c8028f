/** The first fault found in a bundle, named by file and (where it has one) line. */
import Papa from 'papaparse';

export type BundleFault = { file: string; line: number | null; message: string };

/** "events.jsonl line 12: ..." */
export const faultText = (f: BundleFault): string => `${f.file}${f.line === null ? '' : ` line ${f.line}`}: ${f.message}`;

export class BundleFaultError extends Error {
  readonly fault: BundleFault;
  constructor(fault: BundleFault) {
    super(faultText(fault));
    this.name = 'BundleFaultError';
    this.fault = fault;
  }
}

/** 1-based line of the first line containing `needle`, or null. */
export const lineOf = (text: string, needle: string): number | null => {
  const at = text.indexOf(needle);
  if (at < 0) return null;
  let line = 1;
  for (let i = 0; i < at; i++) if (text.charCodeAt(i) === 10) line++;
  return line;
};

const cellsOf = (line: string): string[] => Papa.parse<string[]>(line, { header: false }).data[0] ?? [];

/**
 * The first line where `actual` differs from `expected` (the text the chain and study.json say the
 * file must hold), described: a line removed, inserted, two lines swapped, or which column changed.
 */
export const firstDifference = (file: string, actual: string, expected: string, csv: boolean): BundleFault | null => {
  if (actual === expected) return null;
  const a = actual.split('\n');
  const e = expected.split('\n');
  let i = 0;
  while (i < a.length && i < e.length && a[i] === e[i]) i++;
  const line = i + 1;
  const here = a[i];
  if (here === undefined || (here === '' && i === a.length - 1)) return { file, line, message: 'the file ends early: lines were removed at its end' };
  if (i >= e.length - 1 && e[i] === '') return { file, line, message: 'a line was added after the last one' };
  if (a[i + 1] === e[i] && a[i] === e[i + 1]) return { file, line, message: `this line and line ${line + 1} were swapped` };
  if (here === e[i + 1]) return { file, line, message: 'a line was removed here' };
  if (a[i + 1] === e[i]) return { file, line, message: 'this line was inserted' };
  if (csv && i > 0) {
    const header = cellsOf(a[0] ?? '');
    const got = cellsOf(here);
    const want = cellsOf(e[i] ?? '');
    const column = want.findIndex((v, k) => got[k] !== v);
    if (got.length === want.length && column >= 0) {
      return { file, line, message: `column ${header[column] ?? column + 1} holds ${JSON.stringify(got[column])} but the chain says ${JSON.stringify(want[column])}: the line was edited` };
    }
  }
  return { file, line, message: 'the line was edited (it differs from what the chain and study.json say)' };
};

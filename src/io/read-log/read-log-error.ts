/**
 * A problem in a reads.csv: the 1-based line (the header is line 1) and the column it is in
 * (null when it concerns the whole file or row). Printed by the CLI as `FILE:LINE: column COL: problem`.
 */
export class ReadLogError extends Error {
  readonly line: number;
  readonly column: string | null;
  readonly problem: string;

  constructor(line: number, column: string | null, problem: string) {
    super(column === null ? `line ${line}: ${problem}` : `line ${line}: column ${column}: ${problem}`);
    this.name = 'ReadLogError';
    this.line = line;
    this.column = column;
    this.problem = problem;
  }
}

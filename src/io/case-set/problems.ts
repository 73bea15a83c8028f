// Collects problems up to a cap, counting the rest, so a broken 20,000-row file stays readable.
import type { CaseSetProblem } from './types';

export type Problems = {
  add: (file: string, row: number | null, column: string | null, message: string) => void;
  readonly count: number;
  /** kept problems, file-level ones first, then by row (stable) */
  list: () => CaseSetProblem[];
};

export const collectProblems = (cap: number): Problems => {
  const kept: CaseSetProblem[] = [];
  let count = 0;
  return {
    add: (file, row, column, message) => {
      count += 1;
      if (kept.length < cap) kept.push({ file, row, column, message });
    },
    get count() {
      return count;
    },
    list: () => [...kept].sort((a, b) => (a.row ?? 0) - (b.row ?? 0)),
  };
};

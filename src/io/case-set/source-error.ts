import type { CaseSetProblem } from './types';

/** Thrown by a SetSource that refuses its container (e.g. a zip with an unsafe entry). */
export class SetSourceError extends Error {
  readonly problems: CaseSetProblem[];
  constructor(problems: CaseSetProblem[]) {
    super(problems[0]?.message ?? 'the case set cannot be read');
    this.name = 'SetSourceError';
    this.problems = problems;
  }
}

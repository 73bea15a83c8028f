// Loading the reference fixtures written by test/reference/scripts/*.py / *.R, and the one
// comparison helper the reference tests share.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';

export const FIXTURES = join(import.meta.dirname, '..', 'fixtures');

export const readFixture = (name: string): string => readFileSync(join(FIXTURES, name), 'utf8');

export type RefProportion = {
  k: number; n: number; estimate: number | null; lower: number | null; upper: number | null;
  cp_lower: number | null; cp_upper: number | null;
};

export type RefCondition = {
  n: number;
  accuracy: RefProportion; sensitivity: RefProportion; specificity: RefProportion;
  brier: number; median_ms: number;
  auc: { estimate: number; se: number; lower: number; upper: number } | null;
  agreement?: RefProportion; overreliance?: RefProportion; underreliance?: RefProportion;
  kappa?: { estimate: number | null; se: number | null; se_numpy: number | null };
};

export type RefPaired = { b: number; c: number; p: number };

export type RefReader = {
  reader_id: string;
  finding: string;
  unaided: RefCondition | null;
  aided: RefCondition | null;
  sequential: {
    n: number; changed: number; toward_ai: number; beneficial: number; detrimental: number;
    rair: RefProportion; rsr: RefProportion; woa: { n: number; mean: number | null; median: number | null };
  } | null;
  crossover: {
    n: number; accuracy_difference: number;
    mcnemar: RefPaired & { p_scipy_binomtest: number };
    wrong_suggestion: RefPaired & { n: number };
    paired_delong?: { auc_unaided: number; auc_aided: number; z_proc: number; p: number };
  } | null;
};

export type RefOrTest = { difference: number; se: number; lower: number; upper: number; f: number; df1: number; ddf: number | null; p: number };

export type RefOr = {
  random: RefOrTest; fixedReaders: RefOrTest; fixedCases: RefOrTest;
  auc: number[][]; covariances: { varE: number; cov1: number; cov2: number; cov3: number }; msT: number; msTR: number;
};

export type ReferenceFixture = {
  log: string;
  versions: Record<string, string>;
  calls: Record<string, string>;
  readers: RefReader[];
  or: Record<string, RefOr>;
};

export const loadReference = (name: string): ReferenceFixture => {
  const parsed: ReferenceFixture = JSON.parse(readFixture(name));
  return parsed;
};

/** |actual − expected| ≤ tol, both null allowed; the label says which figure and where. */
export const near = (actual: number | null | undefined, expected: number | null | undefined, tol: number, label: string): void => {
  if (expected === null || expected === undefined) {
    expect(actual ?? null, label).toBeNull();
    return;
  }
  expect(actual, label).toBeTypeOf('number');
  expect(Math.abs((actual as number) - expected), `${label}: got ${String(actual)}, expected ${expected}`).toBeLessThanOrEqual(tol);
};

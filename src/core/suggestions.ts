/**
 * The model's own ("natural") suggestion for each case-finding of a study, before any planted
 * error: the call is the case set's model_call, or score >= threshold when the set has none
 * (docs/formats.md, "The case set"); the score is the set's model_score, or null when it has none.
 *
 * Throws Error naming the case and finding when the design asks a finding the case lacks, or
 * when a case-finding has neither a call nor a score (nothing could be shown).
 * Example: a row { truth: 1, modelScore: 0.7, modelCall: null } at threshold 0.5 gives call 1, score 0.7.
 */
import type { CaseFinding, CaseRecord, CaseSetManifest } from './case-set';
import type { StudyDesign } from './design';
import type { Bit } from './read-log';

/** What the reader is shown for one case-finding, and what the model itself said. */
export type SuggestionRow = {
  caseId: string;
  finding: string;
  practice: boolean;
  truth: Bit;
  /** shown call */
  call: Bit;
  /** shown score, null when the set has no score and nothing was planted */
  score: number | null;
  planted: boolean;
  naturalCall: Bit;
  naturalScore: number | null;
};

export type SuggestionTable = SuggestionRow[];

const key = (caseId: string, finding: string): string => `${caseId}\u0000${finding}`;

/** The model call of one case-finding, or null when the set gives neither call nor score. */
export const naturalCallOf = (cf: CaseFinding, threshold: number): Bit | null => {
  if (cf.modelCall !== null) return cf.modelCall;
  if (cf.modelScore !== null) return cf.modelScore >= threshold ? 1 : 0;
  return null;
};

/** Problems that stop a suggestion being made, in plain language (empty when none). */
export const suggestionProblems = (manifest: CaseSetManifest, design: StudyDesign): string[] => {
  const problems: string[] = [];
  for (const c of manifest.cases) {
    for (const finding of design.findings) {
      const cf = c.findings.find((f) => f.finding === finding);
      if (cf === undefined) problems.push(`case "${c.caseId}" has no row for finding "${finding}"`);
      else if (naturalCallOf(cf, design.threshold) === null) {
        problems.push(`case "${c.caseId}", finding "${finding}": no model_call and no model_score, so no suggestion can be shown`);
      }
    }
  }
  return problems;
};

const naturalRow = (c: CaseRecord, finding: string, threshold: number): SuggestionRow => {
  const cf = c.findings.find((f) => f.finding === finding);
  if (cf === undefined) throw new Error(`case "${c.caseId}" has no row for finding "${finding}"`);
  const call = naturalCallOf(cf, threshold);
  if (call === null) throw new Error(`case "${c.caseId}", finding "${finding}": no model_call and no model_score`);
  return {
    caseId: c.caseId,
    finding,
    practice: c.practice,
    truth: cf.truth,
    call,
    score: cf.modelScore,
    planted: false,
    naturalCall: call,
    naturalScore: cf.modelScore,
  };
};

/** Natural suggestions for every case (practice included) and every finding the design asks. */
export const naturalSuggestions = (manifest: CaseSetManifest, design: StudyDesign): SuggestionTable =>
  manifest.cases.flatMap((c) => design.findings.map((f) => naturalRow(c, f, design.threshold)));

/** The row for one case-finding; throws Error when the table has none. */
export const suggestionFor = (table: SuggestionTable, caseId: string, finding: string): SuggestionRow => {
  const row = table.find((r) => r.caseId === caseId && r.finding === finding);
  if (row === undefined) throw new Error(`no suggestion for case "${caseId}", finding "${finding}"`);
  return row;
};

/** A lookup by case and finding, for callers that ask many times. */
export const indexSuggestions = (table: SuggestionTable): Map<string, SuggestionRow> =>
  new Map(table.map((r) => [key(r.caseId, r.finding), r]));

export const suggestionKey = key;

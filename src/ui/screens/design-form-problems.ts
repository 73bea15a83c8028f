/**
 * Every problem of the design form at once, each tied to the field it belongs to and worded as
 * the form words it: numbers that are not numbers, then the schema's checks, then the checks that
 * need the case set. Recomputed on every change, so a problem clears as soon as its field is fixed.
 */
import type { CaseSetManifest } from '../../core/case-set';
import { designIssues } from '../../core/design-schema';
import { validateDesign } from '../../core/design-validate';
import { designFromForm, type DesignFormValues } from './design-form-state';

export type FormField = keyof DesignFormValues | 'form';
export type FieldProblem = { field: FormField; message: string };

/** The form field that holds each part of a design (by the first keys of a schema path). */
const FIELD_OF_PATH: Record<string, FormField> = {
  findings: 'findings', sequences: 'customSequences', washoutDays: 'washoutDays', threshold: 'threshold',
  'caution.text': 'cautionText', 'caution.mode': 'cautionMode', 'planted.falsePositive': 'plantedFalsePositive',
  'planted.falseNegative': 'plantedFalseNegative', 'planted.stratifyBy': 'stratifyBy', blocks: 'blocks', breakEvery: 'breakEvery', seed: 'seed',
  showScore: 'showScore', askConfidence: 'askConfidence',
};

const fieldOfPath = (path: readonly PropertyKey[]): FormField => {
  const two = path.slice(0, 2).map(String).join('.');
  return FIELD_OF_PATH[two] ?? FIELD_OF_PATH[String(path[0])] ?? 'form';
};

/** Case-set problems carry no path: tie them to a field by what they speak of. */
const fieldOfCaseSetProblem = (message: string): FormField => {
  if (/planted false-positive|falsePositive/i.test(message)) return 'plantedFalsePositive';
  if (/planted false-negative|falseNegative/i.test(message)) return 'plantedFalseNegative';
  if (/stratified by/.test(message)) return 'stratifyBy';
  if (/blocks need/.test(message)) return 'blocks';
  if (/^the finding "/.test(message)) return 'findings';
  return 'form';
};

const sentence = (message: string): string => `${message.charAt(0).toUpperCase()}${message.slice(1)}${/[.)]$/.test(message) ? '' : '.'}`;

export const designFormProblems = (values: DesignFormValues, manifest: CaseSetManifest | null): FieldProblem[] => {
  const built = designFromForm(values);
  const problems: FieldProblem[] = 'problems' in built ? built.fieldProblems : [];
  const design = 'design' in built ? built.design : built.partial;
  const taken = new Set(problems.map((p) => p.field));
  const issues = designIssues(design);
  for (const issue of issues) {
    const field = fieldOfPath(issue.path);
    if (taken.has(field)) continue; // already said in the form's own words (e.g. not a number)
    problems.push({ field, message: sentence(issue.message) });
  }
  // the case-set checks need a design that reads whole; a missing study name does not stop them
  const readable = issues.length === 0 && problems.every((p) => p.field === 'name');
  if (readable && manifest !== null) {
    for (const message of validateDesign(design, manifest)) problems.push({ field: fieldOfCaseSetProblem(message), message: sentence(message) });
  }
  return problems;
};

export const problemsOf = (problems: readonly FieldProblem[], field: FormField): string[] =>
  problems.filter((p) => p.field === field).map((p) => p.message);

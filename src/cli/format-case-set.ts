// Plain-text lines for the case-set verbs: a summary, or the first problem as FILE:ROW: column COL.
import type { CaseSetProblem, CaseSetSummary, Share } from '../io/case-set/types';

const count = (n: number, noun: string): string => `${n} ${noun}${n === 1 ? '' : 's'}`;

const percent = (share: Share): string =>
  share.estimate === null ? 'no suggestions' : `${share.k} of ${share.n} (${(100 * share.estimate).toFixed(1)}%)`;

export const summaryLines = (summary: CaseSetSummary): string[] => {
  const lines = [
    `case set "${summary.name}": ${count(summary.cases, 'case')} and ${count(summary.practiceCases, 'practice case')}, ${count(summary.images, 'image')}`,
  ];
  for (const f of summary.findings) {
    const prevalence = f.prevalence === null ? '' : ` (${(100 * f.prevalence).toFixed(1)}%)`;
    lines.push(`  finding ${f.finding}: present in ${f.positives} of ${f.cases}${prevalence}; model suggestion right in ${percent(f.suggestionAccuracy)}`);
  }
  for (const g of summary.subgroups) {
    lines.push(`  case_${g.attribute}:`);
    for (const v of g.values) lines.push(`    ${v.value || '(empty)'}: ${v.cases} cases; suggestion right in ${percent(v.suggestionAccuracy)}`);
  }
  if (summary.ignoredColumns.length > 0) lines.push(`  columns not used: ${summary.ignoredColumns.join(', ')}`);
  return lines;
};

/** `FILE:ROW: column COL: message`, FILE joined to the set's label; parts that do not apply are left out. */
export const problemLine = (label: string, problem: CaseSetProblem): string => {
  const file = problem.file === '' ? label : `${label.replace(/[\\/]+$/, '')}/${problem.file}`;
  const row = problem.row === null ? '' : `:${problem.row}`;
  const column = problem.column === null ? '' : ` column ${problem.column}:`;
  return `${file}${row}:${column} ${problem.message}`;
};

/** Every problem of a refused set, one line each, then how many there were (as the app lists them). */
export const refusalLines = (label: string, problems: readonly CaseSetProblem[], total: number): string[] => {
  const lines = problems.map((p) => problemLine(label, p));
  if (lines.length === 0) lines.push(`${label}: the case set was refused`);
  const unlisted = total - problems.length;
  if (unlisted > 0) lines.push(`... and ${unlisted} more problem${unlisted === 1 ? '' : 's'} of the same kinds (the first ${problems.length} are listed)`);
  lines.push(`${total} problem${total === 1 ? '' : 's'}; the case set is not valid and nothing was imported.`);
  return lines;
};

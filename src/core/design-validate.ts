/**
 * Every problem of a design against the case set it will run on, in plain language, for the
 * design screen: the schema's own checks first (design-schema.ts), then what needs the case set
 * (findings exist, each case answers each finding, a suggestion can be shown, the stratifying
 * attribute exists, there are main cases for every block, the planted counts are possible).
 * An empty list means the design can run. Throws nothing.
 * Example: validateDesign({ ...design, findings: ['mass'] }, demo) ->
 *   ['the finding "mass" is not in the case set "..." (it has: nodule)', ...].
 */
import type { CaseSetManifest } from './case-set';
import { parseDesign } from './design-schema';
import type { StudyDesign } from './design';
import { eligibleForPlanting, plantTarget } from './planting';
import { naturalSuggestions, suggestionProblems } from './suggestions';

const MAX_LISTED = 5;

/** At most a few of a long list of similar problems, then a count of the rest. */
const capped = (problems: string[]): string[] =>
  problems.length <= MAX_LISTED ? problems : [...problems.slice(0, MAX_LISTED), `... and ${problems.length - MAX_LISTED} more like these`];

const caseSetProblems = (design: StudyDesign, manifest: CaseSetManifest): string[] => {
  const problems: string[] = [];
  const missing = design.findings.filter((f) => !manifest.findings.includes(f));
  for (const f of missing) {
    problems.push(`the finding "${f}" is not in the case set "${manifest.name}" (it has: ${manifest.findings.join(', ') || 'no findings'})`);
  }
  if (missing.length > 0) return problems;
  const by = design.planted.stratifyBy;
  if (by !== null && !manifest.attributeNames.includes(by)) {
    problems.push(`planted errors are stratified by "${by}", but the case set has no case_${by} column`);
  }
  const main = manifest.cases.filter((c) => !c.practice).length;
  if (main === 0) problems.push('the case set has no main (non-practice) cases to read');
  else if (design.blocks > main) problems.push(`${design.blocks} blocks need at least ${design.blocks} main cases; the case set has ${main}`);
  const suggestion = suggestionProblems(manifest, design);
  for (const p of capped(suggestion)) problems.push(p);
  if (suggestion.length > 0) return problems;
  const table = naturalSuggestions(manifest, design);
  for (const finding of design.findings) {
    for (const kind of ['falsePositive', 'falseNegative'] as const) {
      try {
        plantTarget(design.planted[kind], eligibleForPlanting(table, finding, kind).length, finding, kind);
      } catch (error) {
        problems.push(error instanceof Error ? error.message : String(error));
      }
    }
  }
  return problems;
};

export const validateDesign = (design: unknown, manifest: CaseSetManifest): string[] => {
  const parsed = parseDesign(design);
  if (!parsed.ok) return parsed.problems;
  return caseSetProblems(parsed.design, manifest);
};

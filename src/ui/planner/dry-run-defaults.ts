/**
 * The dry run's starting assumptions for a draft study: its case set's size, prevalence and model
 * accuracy on the first finding, its planted errors, and the planner's defaults for the rest; and
 * the `heed plan` command that reproduces the same figures from the exported study.json.
 */
import { DEFAULT_ASSUMPTIONS, type PlanAssumptions } from '../../analysis/planner/assumptions';
import { plantedCount } from '../../analysis/planner/from-study';
import type { CaseSetManifest } from '../../core/case-set';
import type { StudyDesign } from '../../core/design';
import type { SuggestionRow } from '../../core/suggestions';

const round4 = (x: number): number => Math.round(x * 10000) / 10000;

export const dryRunDefaults = (design: StudyDesign, manifest: CaseSetManifest, suggestions: readonly SuggestionRow[]): PlanAssumptions => {
  const finding = design.findings[0];
  const main = suggestions.filter((s) => s.finding === finding && !s.practice);
  const cases = manifest.cases.filter((c) => !c.practice).length;
  const positives = main.filter((s) => s.truth === 1).length;
  const right = main.filter((s) => s.naturalCall === s.truth).length;
  return {
    ...DEFAULT_ASSUMPTIONS,
    readers: 8,
    cases: Math.max(8, cases),
    prevalence: main.length > 0 ? Math.min(0.98, Math.max(0.02, round4(positives / main.length))) : DEFAULT_ASSUMPTIONS.prevalence,
    modelAccuracy: main.length > 0 ? Math.max(0.5, round4(right / main.length)) : DEFAULT_ASSUMPTIONS.modelAccuracy,
    wrong: plantedCount(design, suggestions.filter((s) => s.planted)),
  };
};

/** The command line that gives the same figures from the study's exported study.json. */
export const planCommand = (a: PlanAssumptions, studyFile: string): string => [
  'heed plan', `--design ${studyFile}`, `--readers ${a.readers}`, `--cases ${a.cases}`, `--prevalence ${a.prevalence}`, `--model-accuracy ${a.modelAccuracy}`,
  a.wrong.mode === 'count' ? `--wrong ${a.wrong.value}` : `--wrong-rate ${a.wrong.value}`,
  `--overreliance ${a.overreliance}`, `--overreliance-spread ${a.overrelianceSpread}`, `--reference ${a.reference}`, `--preset ${a.preset}`,
  `--auc-unaided ${a.aucUnaided}`, `--auc-difference ${a.aucDifference}`, `--notice-effect ${a.noticeEffect}`, `--sims ${a.sims}`, `--seed ${a.seed}`,
].join(' ');

/** The file-name stem the export panel gives a study's files (e.g. "Vesper-pilot" for "Vesper pilot"). */
export const studyFileBase = (name: string): string => name.replace(/[^A-Za-z0-9._-]+/g, '-').replace(/^-|-$/g, '') || 'study';

/**
 * The design a plan simulates: an in-memory case set (truth by prevalence, the model's own call
 * right at the assumed accuracy, exact counts so every simulated study has the same case mix) and
 * a crossover design, either Heed's default (unaided then sequential, and the reverse) or a study's
 * own design (sequences, assistance, blocks, caution notices, seed) with its planted counts.
 * Only the design's first finding is planned (each finding is analysed on its own).
 * Throws RangeError when the case set cannot carry the planted errors asked for.
 */
import type { CaseSetManifest } from '../../core/case-set';
import { defaultDesign, type StudyDesign } from '../../core/design';
import { buildSuggestions } from '../../core/planting';
import { createRng } from '../../core/rng';
import type { SuggestionRow } from '../../core/suggestions';
import type { PlanAssumptions, WrongSpec } from './assumptions';

export type PlanDesign = { design: StudyDesign; manifest: CaseSetManifest; suggestions: SuggestionRow[]; finding: string };

/** Positives and negatives of a case set of `cases` at `prevalence`, at least 2 of each (the AUC needs them). */
export const caseMix = (cases: number, prevalence: number): { positives: number; negatives: number } => {
  const positives = Math.min(cases - 2, Math.max(2, Math.round(prevalence * cases)));
  return { positives, negatives: cases - positives };
};

export const plannedCaseSet = (a: Pick<PlanAssumptions, 'cases' | 'prevalence' | 'modelAccuracy'>, finding: string, seed: number): CaseSetManifest => {
  const { positives, negatives } = caseMix(a.cases, a.prevalence);
  const rng = createRng(seed, 'plan/case-set');
  // the model is wrong on round((1 - accuracy) * n) cases of each truth, chosen at random
  const wrongOf = (n: number): Set<number> => new Set(rng.shuffle(Array.from({ length: n }, (_, i) => i)).slice(0, Math.round((1 - a.modelAccuracy) * n)));
  const wrongPositive = wrongOf(positives);
  const wrongNegative = wrongOf(negatives);
  const width = String(a.cases).length;
  const cases = Array.from({ length: a.cases }, (_, k) => {
    const truth: 0 | 1 = k < positives ? 1 : 0;
    const modelRight = truth === 1 ? !wrongPositive.has(k) : !wrongNegative.has(k - positives);
    return {
      caseId: `P${String(k + 1).padStart(width, '0')}`,
      images: [],
      practice: false,
      attributes: {},
      findings: [{ finding, truth, modelScore: null, modelCall: (modelRight ? truth : 1 - truth) as 0 | 1 }],
    };
  });
  return { name: 'planned case set (in memory)', cases, findings: [finding], attributeNames: [] };
};

/** Planted specs of one wrong spec: a count is split between false positives (the larger half) and false negatives. */
const plantedOf = (wrong: WrongSpec): StudyDesign['planted'] =>
  wrong.mode === 'count'
    ? { falsePositive: { mode: 'count', value: Math.ceil(wrong.value / 2) }, falseNegative: { mode: 'count', value: Math.floor(wrong.value / 2) }, stratifyBy: null }
    : { falsePositive: { mode: 'rate', value: wrong.value }, falseNegative: { mode: 'rate', value: wrong.value }, stratifyBy: null };

/** The design to simulate: `base` (a study's own) or the default crossover, with the plan's planted errors. */
export const planDesign = (a: PlanAssumptions, base: StudyDesign | null): PlanDesign => {
  const finding = base?.findings[0] ?? 'finding';
  const start = base ?? { ...defaultDesign([finding]), seed: a.seed };
  const design: StudyDesign = { ...start, findings: [finding], planted: plantedOf(a.wrong) };
  const manifest = plannedCaseSet(a, finding, design.seed);
  return { design, manifest, suggestions: buildSuggestions(manifest, design), finding };
};

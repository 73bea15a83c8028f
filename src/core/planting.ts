/**
 * Planted errors: suggestions deliberately set against ground truth, to measure automation bias.
 *
 * Per finding and separately for each kind:
 * - false positive: chosen among main (non-practice) case-findings with truth 0 whose natural
 *   call is correct (0); shown as call 1;
 * - false negative: chosen among main case-findings with truth 1 whose natural call is correct
 *   (1); shown as call 0.
 * How many: a count spec gives exactly `value` per finding; a rate gives round(rate * eligible)
 * (halves round up). With `stratifyBy`, the number is shared among the values of that case
 * attribute in proportion to their eligible counts (largest remainder), then drawn at random
 * within each value. Practice cases are never planted.
 *
 * A planted suggestion gets a score on the wrong side of the threshold t, drawn uniformly from
 * [t + 0.05, t + 0.35] (false positive) or [t - 0.35, t - 0.05] (false negative), clipped to
 * [0, 1] and kept to 3 decimals, so it looks like a model output. (With t at 0 or 1 exactly
 * there is no room on the wrong side; the clipped score then sits at the edge.)
 *
 * Seeded: streams 'planting/<kind>/<finding>' choose the case-findings and
 * 'planting-score/<kind>/<finding>' draw the scores, so a design reproduces the same plants.
 * Throws RangeError naming the finding when a count asks more than are eligible; throws Error
 * from naturalSuggestions when a case-finding has no suggestion.
 * Example: 40 truth-0 cases of which 34 the model calls right, falsePositive { count, 5 }:
 * exactly 5 of those 34 are shown as call 1 with scores in [t+0.05, t+0.35].
 */
import type { CaseSetManifest } from './case-set';
import type { PlantSpec, StudyDesign } from './design';
import { allocateLargestRemainder } from './largest-remainder';
import { createRng, type Rng } from './rng';
import { naturalSuggestions, suggestionKey, type SuggestionRow, type SuggestionTable } from './suggestions';

export type PlantKind = 'falsePositive' | 'falseNegative';

const KIND_WORDS: Record<PlantKind, string> = { falsePositive: 'false-positive', falseNegative: 'false-negative' };
const KIND_STREAM: Record<PlantKind, string> = { falsePositive: 'fp', falseNegative: 'fn' };

/** Stratum label for a case without the stratifying attribute. */
export const NO_VALUE = '(no value)';

/** Main case-findings of one finding on which a planted error of this kind may go. */
export const eligibleForPlanting = (table: SuggestionTable, finding: string, kind: PlantKind): SuggestionRow[] => {
  const truth = kind === 'falsePositive' ? 0 : 1;
  return table.filter((r) => r.finding === finding && !r.practice && r.truth === truth && r.naturalCall === truth);
};

/** How many planted errors a spec asks for, given the eligible count. */
export const plantTarget = (spec: PlantSpec, eligible: number, finding: string, kind: PlantKind): number => {
  if (spec.mode === 'rate') return Math.round(spec.value * eligible);
  if (spec.value > eligible) {
    throw new RangeError(
      `${spec.value} planted ${KIND_WORDS[kind]} suggestions asked for finding "${finding}", but only ${eligible} ` +
        `case-findings are eligible (${kind === 'falsePositive' ? 'truth 0' : 'truth 1'}, model call correct, not practice)`,
    );
  }
  return spec.value;
};

const plantedScore = (rng: Rng, threshold: number, kind: PlantKind): number => {
  const offset = 0.05 + 0.3 * rng.float();
  const raw = kind === 'falsePositive' ? threshold + offset : threshold - offset;
  // 3 decimals: the offset is at least 0.05, so rounding never carries it back across t.
  return Math.round(Math.min(1, Math.max(0, raw)) * 1000) / 1000;
};

const chooseKind = (
  manifest: CaseSetManifest,
  design: StudyDesign,
  table: SuggestionTable,
  finding: string,
  kind: PlantKind,
): SuggestionRow[] => {
  const eligible = eligibleForPlanting(table, finding, kind);
  const target = plantTarget(design.planted[kind], eligible.length, finding, kind);
  if (target === 0) return [];
  const rng = createRng(design.seed, `planting/${KIND_STREAM[kind]}/${finding}`);
  const by = design.planted.stratifyBy;
  if (by === null) return rng.shuffle(eligible).slice(0, target);
  const attrs = new Map(manifest.cases.map((c) => [c.caseId, c.attributes]));
  const strata = new Map<string, SuggestionRow[]>();
  for (const row of eligible) {
    const value = attrs.get(row.caseId)?.[by] ?? NO_VALUE;
    strata.set(value, [...(strata.get(value) ?? []), row]);
  }
  // Sorted by value (code-unit order, not locale) so the allocation never depends on row order.
  const names = [...strata.keys()].sort((a, b) => (a < b ? -1 : a > b ? 1 : 0));
  const shares = allocateLargestRemainder(target, names.map((n) => strata.get(n)?.length ?? 0));
  return names.flatMap((n, i) => rng.shuffle(strata.get(n) ?? []).slice(0, shares[i] ?? 0));
};

/**
 * The full suggestion table of a study: natural suggestions for every case-finding (practice
 * included), with the planted errors of the design applied.
 */
export const buildSuggestions = (manifest: CaseSetManifest, design: StudyDesign): SuggestionTable => {
  const table = naturalSuggestions(manifest, design);
  const planted = new Map<string, PlantKind>();
  for (const finding of design.findings) {
    for (const kind of ['falsePositive', 'falseNegative'] as const) {
      for (const row of chooseKind(manifest, design, table, finding, kind)) planted.set(suggestionKey(row.caseId, row.finding), kind);
    }
  }
  const scoreRngs = new Map<string, Rng>();
  const scoreRng = (kind: PlantKind, finding: string): Rng => {
    const stream = `planting-score/${KIND_STREAM[kind]}/${finding}`;
    const existing = scoreRngs.get(stream);
    if (existing !== undefined) return existing;
    const made = createRng(design.seed, stream);
    scoreRngs.set(stream, made);
    return made;
  };
  // Scores are drawn in table (manifest) order, so they depend only on which rows were chosen.
  return table.map((row) => {
    const kind = planted.get(suggestionKey(row.caseId, row.finding));
    if (kind === undefined) return row;
    // A set without scores shows no score anywhere: a planted row must not be the only one with a score.
    const drawn = plantedScore(scoreRng(kind, row.finding), design.threshold, kind);
    return { ...row, call: kind === 'falsePositive' ? 1 : 0, score: row.naturalScore === null ? null : drawn, planted: true };
  });
};

/** The planted rows only, e.g. for study.json and the coordinator's summary. */
export const plantedList = (table: SuggestionTable): SuggestionRow[] => table.filter((r) => r.planted);

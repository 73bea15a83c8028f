/**
 * A plan of a study's own design (its exported study.json): the design as it stands, and the
 * number of planted errors it carries on its first finding, unless the coordinator asks another.
 * Shared by `heed plan --design` and the study page's dry run so both simulate the same thing.
 */
import type { StudyDesign } from '../../core/design';
import type { SuggestionRow } from '../../core/suggestions';
import type { WrongSpec } from './assumptions';

/** Planted errors of the design's first finding, as a count. */
export const plantedCount = (design: StudyDesign, planted: readonly SuggestionRow[]): WrongSpec => {
  const finding = design.findings[0];
  return { mode: 'count', value: planted.filter((p) => p.finding === finding).length };
};

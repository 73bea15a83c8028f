// Builds ReadRow values for tests: a valid unaided read, overridden field by field.
import type { ReadRow } from '../../../src/core/read-log';

export const makeRead = (over: Partial<ReadRow> = {}): ReadRow => ({
  study_id: 'S1', reader_id: 'R1', reader_role: 'radiologist', reader_years: 5, sequence: 'UA', period: 1,
  assistance: 'none', case_id: 'C1', finding: 'target', practice: 0, order: 1, truth: 1,
  ai_call: null, ai_score: null, ai_planted: 0, caution_shown: 0,
  initial_call: null, initial_confidence: null, initial_ms: null,
  final_call: 1, final_confidence: 80, total_ms: 3000, shown_at: '2026-01-12T08:00:00Z',
  scale: 'call-confidence', initial_rating: null, final_rating: null, training: 0, withdrawn: 0, case_attributes: {},
  ...over,
});

/** An aided (concurrent) read with a suggestion call a. */
export const aided = (truth: 0 | 1, ai: 0 | 1, final: 0 | 1, over: Partial<ReadRow> = {}): ReadRow =>
  makeRead({ assistance: 'concurrent', period: 2, truth, ai_call: ai, ai_score: ai === 1 ? 0.8 : 0.2, final_call: final, ...over });

/** A sequential read: initial call d0, suggestion a, final call d. */
export const sequentialRead = (truth: 0 | 1, d0: 0 | 1, ai: 0 | 1, final: 0 | 1, over: Partial<ReadRow> = {}): ReadRow =>
  aided(truth, ai, final, { assistance: 'sequential', initial_call: d0, initial_confidence: 60, ...over });

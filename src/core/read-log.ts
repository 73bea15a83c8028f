/**
 * The read log (docs/formats.md, "The read log"): one row per read. This is the one shape that the store
 * exports, the CLI parses and the analysis engine consumes.
 */
import type { AnswerScaleKind } from './answer-scale';
import type { Assistance } from './design';

/** Required columns, in this order. Case attributes follow as `case_<name>`. */
export const READ_LOG_COLUMNS = [
  'study_id', 'reader_id', 'reader_role', 'reader_years', 'sequence', 'period', 'assistance',
  'case_id', 'finding', 'practice', 'order', 'truth', 'ai_call', 'ai_score', 'ai_planted',
  'caution_shown', 'initial_call', 'initial_confidence', 'initial_ms', 'final_call',
  'final_confidence', 'total_ms', 'shown_at',
] as const;

export type ReadLogColumn = (typeof READ_LOG_COLUMNS)[number];

/**
 * Optional columns, written after `shown_at` in this order; a log without them stays valid
 * (empty or missing: scale call-confidence, no ratings, training 0, withdrawn 0).
 */
export const READ_LOG_OPTIONAL_COLUMNS = ['scale', 'initial_rating', 'final_rating', 'training', 'withdrawn'] as const;

export type ReadLogOptionalColumn = (typeof READ_LOG_OPTIONAL_COLUMNS)[number];

export type Bit = 0 | 1;

/** One read, typed. `null` is a value that does not apply (an empty cell in the CSV). */
export type ReadRow = {
  study_id: string;
  reader_id: string;
  reader_role: string;
  reader_years: number | null;
  sequence: string | null;
  period: number;
  assistance: Assistance;
  case_id: string;
  finding: string;
  practice: Bit;
  order: number;
  truth: Bit;
  ai_call: Bit | null;
  ai_score: number | null;
  ai_planted: Bit;
  caution_shown: Bit;
  initial_call: Bit | null;
  initial_confidence: number | null;
  initial_ms: number | null;
  final_call: Bit;
  final_confidence: number | null;
  total_ms: number;
  shown_at: string;
  /** the answer scale of the read (src/core/answer-scale.ts) */
  scale: AnswerScaleKind;
  /** sequential only: the rating before the suggestion (1..5 five-point, 0..100 percent); null on call-confidence */
  initial_rating: number | null;
  /** the final rating; null on call-confidence */
  final_rating: number | null;
  /** 1 when read in a training study that showed the truth after each case */
  training: Bit;
  /** 1 when the reader was withdrawn from the study (left out of statistics by default) */
  withdrawn: Bit;
  /** case attributes, keyed without the `case_` prefix (e.g. { scanner: 'B' }) */
  case_attributes: Record<string, string>;
};

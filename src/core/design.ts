/**
 * A study's design: what each reader reads, under which assistance, in which order.
 * Everything random in a study is derived from `seed`, so a saved design reproduces the study.
 */

import { defaultAnswerScale, type AnswerScale } from './answer-scale';

export const ASSISTANCE = ['none', 'concurrent', 'sequential'] as const;
export type Assistance = (typeof ASSISTANCE)[number];

/** One crossover sequence: the assistance of each period, e.g. ['none', 'sequential']. */
export type Sequence = { label: string; periods: Assistance[] };

/** How many planted errors of one kind: an exact count, or a rate of the eligible case-findings. */
export type PlantSpec = { mode: 'count' | 'rate'; value: number };

export type CautionMode = 'off' | 'all' | 'random-half';

export type StudyDesign = {
  /** finding keys asked, in the order the reading view asks them */
  findings: string[];
  /** two or more sequences with the same number of periods */
  sequences: Sequence[];
  washoutDays: number;
  /** model score at or above which the model calls "present" when the case set has no model_call */
  threshold: number;
  /** the suggestion shows its score as well as its call */
  showScore: boolean;
  /** readers give a 0..100 confidence with each call */
  askConfidence: boolean;
  caution: { mode: CautionMode; text: string };
  /** planted errors: false-positive suggestions are set on truth-0 case-findings, false-negative on truth-1 */
  planted: { falsePositive: PlantSpec; falseNegative: PlantSpec; stratifyBy: string | null };
  /** 1: every case in every period; k >= 2: cases split into k blocks, block b read in period p
   * under the assistance of period ((p + b) mod periods), so each block meets each condition once */
  blocks: number;
  /** a rest screen every N cases; null for none */
  breakEvery: number | null;
  seed: number;
  /** how readers answer: call + confidence, a five-point rating or a 0..100 likelihood (src/core/answer-scale.ts) */
  answerScale: AnswerScale;
  /** a training study: the truth is shown after each case (measurement studies stay blind) */
  training: boolean;
};

export const defaultDesign = (findings: string[]): StudyDesign => ({
  findings,
  sequences: [
    { label: 'UA', periods: ['none', 'sequential'] },
    { label: 'AU', periods: ['sequential', 'none'] },
  ],
  washoutDays: 28,
  threshold: 0.5,
  showScore: true,
  askConfidence: true,
  caution: { mode: 'off', text: 'The model is less reliable on some scanners. Check its suggestion against the image.' },
  planted: { falsePositive: { mode: 'count', value: 0 }, falseNegative: { mode: 'count', value: 0 }, stratifyBy: null },
  blocks: 1,
  breakEvery: null,
  seed: 20261201,
  answerScale: defaultAnswerScale(),
  training: false,
});

/**
 * A design stored before answer scales and training existed reads as call-confidence and not
 * training (the same defaults as the schema). Returns the design itself when nothing is missing.
 */
export const withDesignDefaults = (design: StudyDesign): StudyDesign => {
  const partial: Partial<Pick<StudyDesign, 'answerScale' | 'training'>> = design;
  if (partial.answerScale !== undefined && partial.training !== undefined) return design;
  return { ...design, answerScale: partial.answerScale ?? defaultAnswerScale(), training: partial.training ?? false };
};

/**
 * The reading session of one reader in one period, as a pure state machine.
 *
 * The position is never stored: it is derived from the answers already committed, so a session
 * resumes exactly at the first unanswered step after a crash, and there is no way back to a
 * committed answer (a step once answered is never the current step again).
 */
import { ratingProblem, type AnswerScaleKind } from './answer-scale';
import type { Assistance } from './design';
import type { Bit } from './read-log';

/** One case in the reader's period, in reading order (made by the study schedule). */
export type SessionItem = {
  caseId: string;
  practice: boolean;
  assistance: Assistance;
  /** 1-based position within the period */
  order: number;
  caution: boolean;
  breakBefore: boolean;
};

export type Phase = 'initial' | 'final';

/** A step is one question: one finding of one case, and for sequential reads its phase. */
export type Step = { itemIndex: number; finding: string; phase: Phase };

/**
 * One committed call: the call, its confidence (null when none is asked), ms since the case was
 * shown, and on a rating scale the rating the call came from (absent on reads stored before scales).
 */
export type AnswerPart = { call: Bit; confidence: number | null; ms: number; rating?: number | null };

/** What has been committed for one finding of one case. */
export type CommittedAnswer = {
  caseId: string;
  finding: string;
  initial: AnswerPart | null;
  final: AnswerPart | null;
};

/**
 * The plan of a session. `skipped` lists cases the reader was let past because they could not be
 * shown (e.g. an image the browser cannot decode): every step of a skipped case counts as done and
 * has no answer, so the position moves on and the read log simply has no row for it.
 */
export type SessionPlan = { items: SessionItem[]; findings: string[]; skipped?: readonly string[] | undefined };

const answerKey = (caseId: string, finding: string): string => `${caseId}\u0000${finding}`;

/**
 * Every step of the plan in order: per case, one final call per finding; in sequential mode first
 * the initial call of every finding, then the final calls, so no suggestion of the case is seen
 * before all of its initial calls are locked.
 */
export const planSteps = (plan: SessionPlan): Step[] =>
  plan.items.flatMap((item, itemIndex) => {
    const phases: Phase[] = item.assistance === 'sequential' ? ['initial', 'final'] : ['final'];
    return phases.flatMap((phase) => plan.findings.map((finding): Step => ({ itemIndex, finding, phase })));
  });

export type SessionPosition =
  | { done: false; step: Step; stepIndex: number; totalSteps: number; item: SessionItem; caseNumber: number; caseCount: number }
  | { done: true; totalSteps: number; caseCount: number };

/**
 * The current step: the first one whose answer is not committed. Throws when the committed
 * answers are not a prefix of the plan (an answer beyond a gap), which would mean a corrupt log.
 */
export const currentPosition = (plan: SessionPlan, answers: readonly CommittedAnswer[]): SessionPosition => {
  const byKey = new Map(answers.map((a) => [answerKey(a.caseId, a.finding), a]));
  const skipped = new Set(plan.skipped ?? []);
  const steps = planSteps(plan);
  const isAnswered = (step: Step): boolean => {
    const item = plan.items[step.itemIndex];
    if (item && skipped.has(item.caseId)) return true;
    const answer = item ? byKey.get(answerKey(item.caseId, step.finding)) : undefined;
    return step.phase === 'initial' ? answer?.initial != null : answer?.final != null;
  };
  const firstOpen = steps.findIndex((step) => !isAnswered(step));
  const caseCount = plan.items.length;
  if (firstOpen === -1) return { done: true, totalSteps: steps.length, caseCount };
  const later = steps.slice(firstOpen + 1).find(isAnswered);
  if (later) throw new Error(`session log has an answer after an unanswered step (case ${plan.items[later.itemIndex]?.caseId})`);
  const step = steps[firstOpen] as Step;
  const item = plan.items[step.itemIndex] as SessionItem;
  return { done: false, step, stepIndex: firstOpen, totalSteps: steps.length, item, caseNumber: step.itemIndex + 1, caseCount };
};

/** The phases of one item's steps: sequential reads ask an initial then a final call per finding. */
const phasesOf = (item: SessionItem): readonly Phase[] => (item.assistance === 'sequential' ? ['initial', 'final'] : ['final']);

/** How many steps the plan has, counted without building them. */
export const stepCount = (plan: SessionPlan): number => {
  let total = 0;
  for (const item of plan.items) total += phasesOf(item).length * plan.findings.length;
  return total;
};

/** The index of a step in the plan (as `planSteps` orders them), or -1 when it is not one of its steps. */
export const stepIndexOf = (plan: SessionPlan, step: Step): number => {
  const item = plan.items[step.itemIndex];
  const findingIndex = plan.findings.indexOf(step.finding);
  if (!item || findingIndex < 0 || !phasesOf(item).includes(step.phase)) return -1;
  let index = 0;
  for (let i = 0; i < step.itemIndex; i++) index += phasesOf(plan.items[i] as SessionItem).length * plan.findings.length;
  return index + (step.phase === 'final' && item.assistance === 'sequential' ? plan.findings.length : 0) + findingIndex;
};

/**
 * The position at step `index` of the plan (done at the end), for a caller that knows the steps
 * before it are the ones committed: the same position `currentPosition` gives for those answers,
 * without walking them. The step before it is `positionAt(plan, index - 1)`.
 */
export const positionAt = (plan: SessionPlan, index: number): SessionPosition => {
  const totalSteps = stepCount(plan);
  const caseCount = plan.items.length;
  if (index >= totalSteps) return { done: true, totalSteps, caseCount };
  if (index < 0 || !Number.isInteger(index)) throw new RangeError(`no step ${index} in a plan of ${totalSteps}`);
  let start = 0;
  for (let itemIndex = 0; itemIndex < plan.items.length; itemIndex++) {
    const item = plan.items[itemIndex] as SessionItem;
    const phases = phasesOf(item);
    const size = phases.length * plan.findings.length;
    if (index < start + size) {
      const within = index - start;
      const phase = phases[Math.floor(within / plan.findings.length)] as Phase;
      const finding = plan.findings[within % plan.findings.length] as string;
      return { done: false, step: { itemIndex, finding, phase }, stepIndex: index, totalSteps, item, caseNumber: itemIndex + 1, caseCount };
    }
    start += size;
  }
  return { done: true, totalSteps, caseCount };
};

/** Whether the suggestion is on screen at this step: concurrent always, sequential only after the initial call. */
export const suggestionVisible = (assistance: Assistance, phase: Phase): boolean =>
  assistance === 'concurrent' || (assistance === 'sequential' && phase === 'final');

export type AnswerInput = { call: Bit | null; confidence: number | null; rating?: number | null };

/**
 * Plain-language reason why an answer cannot be committed yet, or null when it can. On a rating
 * scale the rating is what is asked (the call follows from it); an unset rating is refused.
 */
export const answerProblem = (input: AnswerInput, askConfidence: boolean, scale: AnswerScaleKind = 'call-confidence'): string | null => {
  if (scale !== 'call-confidence') {
    const rating = input.rating ?? null;
    if (rating === null) return scale === 'five-point' ? 'Choose a rating first (keys 1-5).' : 'Set the likelihood first.';
    const problem = ratingProblem(scale, rating);
    return problem === null ? null : `${problem.charAt(0).toUpperCase()}${problem.slice(1)}.`;
  }
  if (input.call === null) return 'Choose present or absent first.';
  if (askConfidence) {
    if (input.confidence === null) return 'Set your confidence first.';
    if (!(input.confidence >= 0 && input.confidence <= 100)) return 'Confidence must be between 0 and 100.';
  }
  return null;
};

/**
 * The committed answer after one more commit at `position`. Throws when the step is not the
 * current one, which is how "no going back" is enforced below the UI too.
 */
export const applyCommit = (
  position: SessionPosition,
  expected: Step,
  previous: CommittedAnswer | null,
  answer: AnswerPart,
): CommittedAnswer => {
  if (position.done) throw new Error('the session is complete; nothing more can be committed');
  const { step, item } = position;
  if (step.itemIndex !== expected.itemIndex || step.finding !== expected.finding || step.phase !== expected.phase) {
    throw new Error(`answer is for a step that is not the current one (case ${item.caseId}, ${step.finding}, ${step.phase})`);
  }
  const base: CommittedAnswer = previous ?? { caseId: item.caseId, finding: step.finding, initial: null, final: null };
  return step.phase === 'initial' ? { ...base, initial: answer } : { ...base, final: answer };
};

/**
 * The skipped list after skipping the current case. Only the case on screen can be skipped, so a
 * skip can never jump ahead or reach back to a committed case. Throws otherwise.
 */
export const applySkip = (position: SessionPosition, caseId: string, skipped: readonly string[] = []): string[] => {
  if (position.done) throw new Error('the session is complete; nothing can be skipped');
  if (position.item.caseId !== caseId) throw new Error(`case ${caseId} is not the current case (${position.item.caseId}); only the case on screen can be skipped`);
  return skipped.includes(caseId) ? [...skipped] : [...skipped, caseId];
};

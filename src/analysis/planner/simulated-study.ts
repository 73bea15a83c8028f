/**
 * One simulated study of a plan: the shared simulated-reader model answers the design, the
 * answers become read-log rows (SPEC Contract 1 shape, only the columns the analysis reads
 * filled with meaning), and Heed's own analysis pieces measure them: `reliance` per reader (the
 * engine's over-reliance with its Wilson interval, split by caution notice) and `mrmc` (the
 * engine's Obuchowski-Rockette adapter). The same numbers analyzeReads would give, without the
 * sections a plan does not use.
 *
 * The caution notice's effect is the planner's own addition (the shared model has none): on a
 * read where the notice is shown and the final call follows a wrong suggestion, the call is turned
 * back to the truth with probability `noticeEffect` (stream 'plan/notice/<code>'), so following a
 * wrong suggestion is that much less likely, relatively, under the notice.
 */
import type { Bit, ReadRow } from '../../core/read-log';
import { createRng } from '../../core/rng';
import { buildSchedule } from '../../core/schedule';
import { sequenceIndexForSlot } from '../../core/sequence-assignment';
import { simulateAnswers, type SimulatedReader, type SimulationParameters } from '../../core/simulated-readers';
import { indexSuggestions, suggestionKey } from '../../core/suggestions';
import { mrmc } from '../mrmc-adapter';
import { reliance } from '../reliance';
import type { Proportion } from '../wilson';
import type { PlanDesign } from './plan-design';
import { followProbability, readerTruth } from './reader-truth';

export const simulatedReaders = (plan: PlanDesign, count: number): SimulatedReader[] => {
  const width = Math.max(2, String(count).length);
  return Array.from({ length: count }, (_, slot) => ({ code: `R${String(slot + 1).padStart(width, '0')}`, slot, sequenceIndex: sequenceIndexForSlot(plan.design, slot) }));
};

export const simulatedRows = (plan: PlanDesign, readers: readonly SimulatedReader[], p: SimulationParameters, seed: number, noticeEffect: number): ReadRow[] => {
  const table = indexSuggestions(plan.suggestions);
  const answers = simulateAnswers(plan.design, plan.manifest, plan.suggestions, readers, p, seed);
  const noticeRng = new Map(readers.map((r) => [r.code, createRng(seed, `plan/notice/${r.code}`)]));
  const sequenceOf = new Map(readers.map((r) => [r.code, plan.design.sequences[r.sequenceIndex]?.label ?? null]));
  // The schedule's caution flags, in reading order per reader and period
  const cautionOf = cautionFlagsOf(plan, readers);
  return answers.map((a) => {
    const row = table.get(suggestionKey(a.caseId, a.finding));
    if (row === undefined) throw new Error(`no suggestion row for case ${a.caseId}, finding ${a.finding}`);
    const shown = a.assistance === 'none' ? undefined : row;
    const truth: Bit = row.truth;
    const caution = cautionOf.get(`${a.readerCode}/${a.period}`)?.[a.itemIndex] === true;
    let finalCall = a.final.call;
    if (caution && shown && shown.call !== truth && finalCall === shown.call && noticeEffect > 0) {
      if ((noticeRng.get(a.readerCode)?.float() ?? 1) < noticeEffect) finalCall = truth;
    }
    return {
      study_id: 'plan', reader_id: a.readerCode, reader_role: 'simulated reader', reader_years: null, sequence: sequenceOf.get(a.readerCode) ?? null,
      period: a.period, assistance: a.assistance, case_id: a.caseId, finding: a.finding, practice: 0, order: a.itemIndex + 1, truth,
      ai_call: shown ? shown.call : null, ai_score: shown ? shown.score : null, ai_planted: shown?.planted === true ? 1 : 0, caution_shown: caution ? 1 : 0,
      initial_call: a.initial?.call ?? null, initial_confidence: a.initial?.confidence ?? null, initial_ms: a.initial?.ms ?? null,
      final_call: finalCall, final_confidence: a.final.confidence, total_ms: a.final.ms, shown_at: '',
      scale: 'call-confidence', initial_rating: null, final_rating: null, training: 0, withdrawn: 0, case_attributes: {},
    };
  });
};

const cautionFlagsOf = (plan: PlanDesign, readers: readonly SimulatedReader[]): Map<string, boolean[]> => {
  const out = new Map<string, boolean[]>();
  if (plan.design.caution.mode === 'off') return out;
  for (const r of readers) {
    const sequence = plan.design.sequences[r.sequenceIndex];
    if (!sequence) continue;
    const schedule = buildSchedule(plan.design, plan.manifest, { id: r.code, index: r.slot, sequence });
    for (const period of schedule.periods) out.set(`${r.code}/${period.period}`, period.items.map((i) => i.caution));
  }
  return out;
};

export type ReaderOutcome = { code: string; overreliance: Proportion; noticeShown: Proportion; noticeNotShown: Proportion; trueRate: number | null };

/** Per reader: Heed's over-reliance (with and without the notice) and the reader's true rate on these reads. */
export const readerOutcomes = (rows: readonly ReadRow[], readers: readonly SimulatedReader[], p: SimulationParameters, seed: number, noticeEffect: number): ReaderOutcome[] => {
  const byReader = new Map<string, ReadRow[]>();
  for (const r of rows) {
    const list = byReader.get(r.reader_id);
    if (list) list.push(r);
    else byReader.set(r.reader_id, [r]);
  }
  return readers.map((reader) => {
    const reads = (byReader.get(reader.code) ?? []).filter((r) => r.assistance !== 'none');
    const rel = reliance(reads);
    const truth = readerTruth(reader.code, p, seed);
    let sum = 0;
    let n = 0;
    for (const r of reads) {
      if (r.ai_call === null || r.ai_call === r.truth) continue;
      sum += followProbability(truth, r.truth, p, r.caution_shown === 1, noticeEffect);
      n++;
    }
    return { code: reader.code, overreliance: rel.overreliance, noticeShown: rel.caution.shown, noticeNotShown: rel.caution.not_shown, trueRate: n > 0 ? sum / n : null };
  });
};

export type AucOutcome = { p: number; difference: number; halfWidth: number } | null;

/** The random-reader Obuchowski-Rockette test of one simulated study (null when the design is not fully crossed). */
export const aucOutcome = (rows: readonly ReadRow[]): { outcome: AucOutcome; note: string | null } => {
  const m = mrmc(rows);
  if (m.result === null) return { outcome: null, note: m.note };
  const t = m.result.random;
  return { outcome: { p: t.p, difference: t.difference, halfWidth: (t.upper - t.lower) / 2 }, note: null };
};

/**
 * One simulated study of a plan: the shared simulated-reader model answers the design, the
 * answers become read-log rows (the shape of docs/formats.md, "The read log"; only the columns the analysis reads
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
import { createRng, type Rng } from '../../core/rng';
import { sequenceIndexForSlot } from '../../core/sequence-assignment';
import { prepareDesign, type PreparedDesign, type PreparedStep } from '../../core/simulated-design';
import { emptyDraws, simulateDraws, type SimulatedDraws, type SimulatedReader, type SimulationParameters } from '../../core/simulated-readers';
import { indexSuggestions, suggestionKey } from '../../core/suggestions';
import { mrmc } from '../mrmc-adapter';
import { reliance } from '../reliance';
import type { Proportion } from '../wilson';
import { aucLayout, layoutOutcome, type AucLayout, type AucOutcome } from './auc-layout';

export type { AucOutcome } from './auc-layout';
import type { PlanDesign } from './plan-design';
import { followProbability, readerTruth } from './reader-truth';

export const simulatedReaders = (plan: PlanDesign, count: number): SimulatedReader[] => {
  const width = Math.max(2, String(count).length);
  return Array.from({ length: count }, (_, slot) => ({ code: `R${String(slot + 1).padStart(width, '0')}`, slot, sequenceIndex: sequenceIndexForSlot(plan.design, slot) }));
};

/**
 * A plan's design prepared once for many simulated studies: the model's prepared design and
 * reusable draw buffers, and one read-log row per step whose fixed columns are filled once;
 * each study refills only the answer columns (`fillRows`), so the rows belong to the latest study.
 */
export type PreparedStudy = {
  plan: PlanDesign;
  readers: readonly SimulatedReader[];
  prepared: PreparedDesign;
  draws: SimulatedDraws;
  rows: ReadRow[];
  /** per reader (same order as `readers`), its aided rows in reading order */
  aidedRows: ReadRow[][];
  /** where each row's score goes in the AUC test, or why there is no test */
  auc: AucLayout;
};

export const prepareStudy = (plan: PlanDesign, readers: readonly SimulatedReader[]): PreparedStudy => {
  const prepared = prepareDesign(plan.design, plan.manifest, plan.suggestions, readers);
  const table = indexSuggestions(plan.suggestions);
  const aidedRows: ReadRow[][] = readers.map(() => []);
  const rows = prepared.steps.map((step): ReadRow => {
    const row = table.get(suggestionKey(step.caseId, step.finding));
    if (row === undefined) throw new Error(`no suggestion row for case ${step.caseId}, finding ${step.finding}`);
    const reader = readers[step.reader] as SimulatedReader;
    const shown = step.assistance === 'none' ? undefined : row;
    const out: ReadRow = {
      study_id: 'plan', reader_id: reader.code, reader_role: 'simulated reader', reader_years: null, sequence: plan.design.sequences[reader.sequenceIndex]?.label ?? null,
      period: step.period, assistance: step.assistance, case_id: step.caseId, finding: step.finding, practice: 0, order: step.itemIndex + 1, truth: row.truth,
      ai_call: shown ? shown.call : null, ai_score: shown ? shown.score : null, ai_planted: shown?.planted === true ? 1 : 0, caution_shown: step.caution ? 1 : 0,
      initial_call: null, initial_confidence: null, initial_ms: null,
      final_call: 0, final_confidence: null, total_ms: 0, shown_at: '',
      scale: 'call-confidence', initial_rating: null, final_rating: null, training: 0, withdrawn: 0, case_attributes: {},
    };
    if (step.assistance !== 'none') aidedRows[step.reader]?.push(out);
    return out;
  });
  return { plan, readers, prepared, draws: emptyDraws(rows.length), rows, aidedRows, auc: aucLayout(rows) };
};

/** One simulated study: refills the study's rows in place and returns them. */
export const fillRows = (study: PreparedStudy, p: SimulationParameters, seed: number, noticeEffect: number): ReadRow[] => {
  const { prepared, rows } = study;
  const d = simulateDraws(prepared, p, seed, study.draws);
  const ask = prepared.design.askConfidence;
  // the notice streams, opened on first use (the same draws as opening them all up front)
  const noticeRng: (Rng | undefined)[] = [];
  const steps = prepared.steps;
  for (let s = 0; s < rows.length; s++) {
    const row = rows[s] as ReadRow;
    const step = steps[s] as PreparedStep;
    const truth = row.truth;
    let finalCall = d.finalCall[s] as Bit;
    if (step.caution && row.ai_call !== null && row.ai_call !== truth && finalCall === row.ai_call && noticeEffect > 0) {
      let rng = noticeRng[step.reader];
      if (rng === undefined) {
        rng = createRng(seed, `plan/notice/${row.reader_id}`);
        noticeRng[step.reader] = rng;
      }
      if (rng.float() < noticeEffect) finalCall = truth;
    }
    const sequential = step.assistance === 'sequential';
    row.initial_call = sequential ? (d.ownCall[s] as Bit) : null;
    row.initial_confidence = sequential && ask ? (d.ownConfidence[s] as number) : null;
    row.initial_ms = sequential ? (d.initialMs[s] as number) : null;
    row.final_call = finalCall;
    row.final_confidence = ask ? (d.finalConfidence[s] as number) : null;
    row.total_ms = d.finalMs[s] as number;
  }
  return rows;
};

/** One simulated study's rows, freshly made (tests and one-off use; loops use prepareStudy and fillRows). */
export const simulatedRows = (plan: PlanDesign, readers: readonly SimulatedReader[], p: SimulationParameters, seed: number, noticeEffect: number): ReadRow[] =>
  fillRows(prepareStudy(plan, readers), p, seed, noticeEffect);

export type ReaderOutcome = { code: string; overreliance: Proportion; noticeShown: Proportion; noticeNotShown: Proportion; trueRate: number | null };

const outcomeOf = (reader: SimulatedReader, reads: readonly ReadRow[], p: SimulationParameters, seed: number, noticeEffect: number): ReaderOutcome => {
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
};

/** Per reader: Heed's over-reliance (with and without the notice) and the reader's true rate on these reads. */
export const readerOutcomes = (rows: readonly ReadRow[], readers: readonly SimulatedReader[], p: SimulationParameters, seed: number, noticeEffect: number): ReaderOutcome[] => {
  const byReader = new Map<string, ReadRow[]>();
  for (const r of rows) {
    const list = byReader.get(r.reader_id);
    if (list) list.push(r);
    else byReader.set(r.reader_id, [r]);
  }
  return readers.map((reader) => outcomeOf(reader, (byReader.get(reader.code) ?? []).filter((r) => r.assistance !== 'none'), p, seed, noticeEffect));
};

/** readerOutcomes of the study last filled by fillRows, from its per-reader aided rows. */
export const preparedOutcomes = (study: PreparedStudy, p: SimulationParameters, seed: number, noticeEffect: number): ReaderOutcome[] =>
  study.readers.map((reader, i) => outcomeOf(reader, study.aidedRows[i] ?? [], p, seed, noticeEffect));

/** The random-reader Obuchowski-Rockette test of one simulated study (null when the design is not fully crossed). */
export const aucOutcome = (rows: readonly ReadRow[]): { outcome: AucOutcome; note: string | null } => {
  const m = mrmc(rows);
  if (m.result === null) return { outcome: null, note: m.note };
  const t = m.result.random;
  return { outcome: { p: t.p, difference: t.difference, halfWidth: (t.upper - t.lower) / 2 }, note: null };
};

/** aucOutcome of the study last filled by fillRows, from its prepared layout. */
export const preparedAucOutcome = (study: PreparedStudy): { outcome: AucOutcome; note: string | null } => layoutOutcome(study.auc, study.rows);

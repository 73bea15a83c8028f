/**
 * The join behind the read log (docs/formats.md, "The read log"): a study's reads with its readers, sessions and
 * case set, as rows. Pure, so the store's export, the bundle writer and the bundle verifier all
 * build reads.csv the same way. Reads without a final call are not reads yet and are left out.
 * Rows come sorted by reader code, period, order, then the design's finding order.
 * Throws Error when a read refers to a reader, session or case that is not given.
 */
import type { CaseSetManifest } from './case-set';
import type { StudyDesign } from './design';
import type { Bit, ReadRow } from './read-log';
import type { AnswerPart, SessionItem } from './session';

export type RowStudy = { id: string; design: StudyDesign };
/** `withdrawn`: set when the coordinator withdrew the reader (their reads stay, marked withdrawn = 1) */
export type RowReader = { id: string; code: string; role: string; years: number | null; sequenceIndex: number; withdrawn?: { at: string } | null };
/** a session's plan as the join needs it: for each case its assistance, practice flag and order */
export type RowItem = Pick<SessionItem, 'caseId' | 'practice' | 'assistance' | 'order'>;
export type RowSession = { id: string; items: readonly RowItem[] };
export type RowRead = {
  id: string; sessionId: string; readerId: string; period: number; caseId: string; finding: string;
  initial: AnswerPart | null; final: AnswerPart | null; shownAt: string;
  aiCall: Bit | null; aiScore: number | null; aiPlanted: boolean; cautionShown: boolean;
};

/** A row and the read it came from (for the bundle's read id and hash columns). */
export type JoinedRow<R extends RowRead> = { row: ReadRow; read: R };

export const joinReadRows = <R extends RowRead>(
  study: RowStudy, manifest: CaseSetManifest, readers: readonly RowReader[], sessions: readonly RowSession[], reads: readonly R[],
): JoinedRow<R>[] => {
  const readerById = new Map(readers.map((r) => [r.id, r]));
  const itemsBySession = new Map(sessions.map((s) => [s.id, new Map(s.items.map((i) => [i.caseId, i]))]));
  const cases = new Map(manifest.cases.map((c) => [c.caseId, c]));
  const out: JoinedRow<R>[] = [];
  for (const read of reads) {
    if (!read.final) continue; // an initial call without its final call is not a read yet
    const reader = readerById.get(read.readerId);
    const item = itemsBySession.get(read.sessionId)?.get(read.caseId);
    const caseRecord = cases.get(read.caseId);
    const truth = caseRecord?.findings.find((f) => f.finding === read.finding)?.truth;
    if (!reader || !item || !caseRecord || truth === undefined) {
      throw new Error(`read ${read.id} refers to a reader, session or case that is not stored`);
    }
    const aided = item.assistance !== 'none';
    const sequential = item.assistance === 'sequential';
    out.push({ read, row: {
      study_id: study.id,
      reader_id: reader.code,
      reader_role: reader.role,
      reader_years: reader.years,
      sequence: study.design.sequences[reader.sequenceIndex]?.label ?? null,
      period: read.period,
      assistance: item.assistance,
      case_id: read.caseId,
      finding: read.finding,
      practice: item.practice ? 1 : 0,
      order: item.order,
      truth,
      ai_call: aided ? read.aiCall : null,
      ai_score: aided ? read.aiScore : null,
      ai_planted: (aided && read.aiPlanted ? 1 : 0) satisfies Bit,
      caution_shown: (aided && read.cautionShown ? 1 : 0) satisfies Bit,
      initial_call: sequential ? read.initial?.call ?? null : null,
      initial_confidence: sequential ? read.initial?.confidence ?? null : null,
      initial_ms: sequential ? read.initial?.ms ?? null : null,
      final_call: read.final.call,
      final_confidence: read.final.confidence,
      total_ms: read.final.ms,
      shown_at: read.shownAt,
      scale: study.design.answerScale.kind,
      initial_rating: sequential ? read.initial?.rating ?? null : null,
      final_rating: read.final.rating ?? null,
      training: (study.design.training ? 1 : 0) satisfies Bit,
      withdrawn: (reader.withdrawn ? 1 : 0) satisfies Bit,
      case_attributes: caseRecord.attributes,
    } });
  }
  const findingOrder = new Map(study.design.findings.map((f, i) => [f, i]));
  return out.sort(({ row: a }, { row: b }) =>
    (a.reader_id < b.reader_id ? -1 : a.reader_id > b.reader_id ? 1 : 0) || a.period - b.period || a.order - b.order
    || (findingOrder.get(a.finding) ?? 0) - (findingOrder.get(b.finding) ?? 0));
};

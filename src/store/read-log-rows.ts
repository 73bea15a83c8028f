/** Joins a study's stored reads with its readers, sessions and case set into read-log rows (docs/formats.md). */
import type { Bit, ReadRow } from '../core/read-log';
import { getCaseSet } from './case-sets';
import type { HeedDb } from './db';
import { listReaders } from './readers';
import { getStudy } from './studies';

export const studyReadRows = async (db: HeedDb, studyId: string): Promise<ReadRow[]> => {
  const study = await getStudy(db, studyId);
  const caseSet = await getCaseSet(db, study.caseSetId);
  const readers = new Map((await listReaders(db, studyId)).map((r) => [r.id, r]));
  const sessions = new Map((await db.sessions.where('studyId').equals(studyId).toArray()).map((s) => [s.id, s]));
  const cases = new Map(caseSet.manifest.cases.map((c) => [c.caseId, c]));
  const reads = await db.reads.where('studyId').equals(studyId).toArray();
  const rows: ReadRow[] = [];
  for (const read of reads) {
    if (!read.final) continue; // an initial call without its final call is not a read yet
    const reader = readers.get(read.readerId);
    const session = sessions.get(read.sessionId);
    const caseRecord = cases.get(read.caseId);
    const item = session?.items.find((i) => i.caseId === read.caseId);
    const truth = caseRecord?.findings.find((f) => f.finding === read.finding)?.truth;
    if (!reader || !session || !caseRecord || !item || truth === undefined) {
      throw new Error(`read ${read.id} refers to a reader, session or case that is not stored`);
    }
    const aided = item.assistance !== 'none';
    const sequential = item.assistance === 'sequential';
    rows.push({
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
    });
  }
  const findingOrder = new Map(study.design.findings.map((f, i) => [f, i]));
  return rows.sort((a, b) =>
    a.reader_id.localeCompare(b.reader_id) || a.period - b.period || a.order - b.order
    || (findingOrder.get(a.finding) ?? 0) - (findingOrder.get(b.finding) ?? 0));
};

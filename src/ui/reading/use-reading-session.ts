/**
 * Loads a reading session and commits its answers. The position always comes back from the
 * store after a commit, so what the screen shows next is what the database holds.
 */
import { useCallback, useEffect, useRef, useState } from 'react';
import type { CaseRecord } from '../../core/case-set';
import type { Bit } from '../../core/read-log';
import type { SessionPosition } from '../../core/session';
import { indexSuggestions, suggestionKey } from '../../core/suggestions';
import type { SuggestionRow } from '../../core/suggestions';
import { getCaseSet } from '../../store/case-sets';
import type { HeedDb } from '../../store/db';
import type { StoredRead, StoredSession, StoredStudy } from '../../store/records';
import { commitAnswerAndRead, getSession, logSessionMoment, readsOfSession, sessionPosition } from '../../store/sessions';
import { skipCase } from '../../store/skip-case';
import { getStudy } from '../../store/studies';

export type LoadedSession = {
  study: StoredStudy;
  session: StoredSession;
  setId: string;
  cases: Map<string, CaseRecord>;
  suggestions: Map<string, SuggestionRow>;
  readerCode: string;
};

/**
 * A committed answer. `show` puts the next position and the reads into React state: the caller
 * runs it in the same synchronous render as its own updates (flushSync), so the next case is
 * rendered and drawn in the task the commit resolved in, once.
 */
export type CommitResult = { next: SessionPosition; reads: StoredRead[]; show: () => void };

export const useReadingSession = (db: HeedDb, studyId: string, sessionId: string) => {
  const [loaded, setLoaded] = useState<LoadedSession | null>(null);
  const [position, setPosition] = useState<SessionPosition | null>(null);
  const [reads, setReadsState] = useState<StoredRead[]>([]);
  // the latest reads, also outside renders: the truth after a case is built from them right after a commit
  const readsNow = useRef<StoredRead[]>([]);
  const [error, setError] = useState<string | null>(null);

  useEffect(() => {
    let live = true;
    (async () => {
      const study = await getStudy(db, studyId);
      const session = await getSession(db, sessionId);
      if (!session) throw new Error(`no session ${sessionId}`);
      const caseSet = await getCaseSet(db, study.caseSetId);
      const reader = await db.readers.get(session.readerId);
      const next = await sessionPosition(db, session, study.design.findings);
      const committed = await readsOfSession(db, session.id);
      if (!live) return;
      setLoaded({
        study, session, setId: caseSet.id, readerCode: reader?.code ?? '?',
        cases: new Map(caseSet.manifest.cases.map((c) => [c.caseId, c])),
        suggestions: indexSuggestions(study.suggestions),
      });
      readsNow.current = committed;
      setReadsState(committed);
      setPosition(next);
      if (committed.length > 0 && !next.done) {
        void logSessionMoment(db, session, 'session-reopened', { atCase: next.item.caseId, phase: next.step.phase });
      }
    })().catch((e: unknown) => { if (live) setError(e instanceof Error ? e.message : String(e)); });
    return () => { live = false; };
  }, [db, studyId, sessionId]);

  const commit = useCallback(async (answer: { call: Bit; confidence: number | null; rating: number | null; ms: number; shownAt: string }): Promise<CommitResult | null> => {
    if (!loaded || !position || position.done) return null;
    const { step, item } = position;
    const shown = loaded.suggestions.get(suggestionKey(item.caseId, step.finding));
    const aided = item.assistance !== 'none';
    const { position: next, read } = await commitAnswerAndRead(db, {
      session: loaded.session, findings: loaded.study.design.findings, step,
      call: answer.call, confidence: answer.confidence, rating: answer.rating, ms: answer.ms, shownAt: answer.shownAt,
      suggestion: aided && shown ? { call: shown.call, score: loaded.study.design.showScore ? shown.score : null, planted: shown.planted } : null,
      cautionShown: aided && item.caution,
    });
    // the stored read comes back from the transaction: no second query before the next case
    const updated = [...readsNow.current.filter((r) => r.id !== read.id), read];
    readsNow.current = updated;
    // the period's last answer is committed: back the study up (never awaited, never blocking),
    // after the screen has shown it. Loaded on use, so the reading view's bundle carries no zip or
    // bundle code; backUpStudy logs its own failures as backup-failed events.
    if (next.done) setTimeout(() => { void import('../services/backup').then(({ backUpStudy }) => backUpStudy(db, loaded.study.id, 'period-complete')); }, 0);
    return { next, reads: updated, show: () => { setReadsState(updated); setPosition(next); } };
  }, [db, loaded, position]);

  /** Lets the reader past the case on screen when it cannot be shown (logged with the reason). */
  const skip = useCallback(async (detail: string): Promise<SessionPosition | null> => {
    if (!loaded || !position || position.done) return null;
    const next = await skipCase(db, loaded.session.id, loaded.study.design.findings, position.item.caseId, 'image-undecodable', detail);
    setPosition(next);
    return next;
  }, [db, loaded, position]);

  return { loaded, position, reads, error, commit, skip };
};

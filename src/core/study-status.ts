/**
 * Where a study is in its life: a draft (design still editable), reading under way, or finished
 * when every period of every reader who is not withdrawn is complete. Withdrawn readers do not
 * hold a study open; a study whose every reader withdrew is not finished (no reading was done).
 * Throws nothing. Example: two readers, all periods complete -> 'finished'.
 */
export type StudyStatus = 'draft' | 'reading' | 'finished';

export type StatusReader = { id: string; withdrawn: boolean };
export type StatusSession = { readerId: string; period: number; completedAt: string | null };

export const studyStatus = (
  lockedAt: string | null, periodCount: number, readers: readonly StatusReader[], sessions: readonly StatusSession[],
): StudyStatus => {
  if (lockedAt === null) return 'draft';
  const active = readers.filter((r) => !r.withdrawn);
  if (active.length === 0 || periodCount === 0) return 'reading';
  const done = new Set(sessions.filter((s) => s.completedAt !== null).map((s) => `${s.readerId}/${s.period}`));
  for (const reader of active) {
    for (let period = 1; period <= periodCount; period++) if (!done.has(`${reader.id}/${period}`)) return 'reading';
  }
  return 'finished';
};

export const STATUS_WORDS: Record<StudyStatus, string> = {
  draft: 'draft: the design can still be edited; it locks when the first reader starts',
  reading: 'reading under way (design locked)',
  finished: 'finished: every period of every reader is complete',
};

/**
 * Automatic backups: the study bundle (no images) written to the host's backup folder when a
 * period completes, and on demand. A backup never stands in the way of reading: the answer is
 * committed before a backup starts, and a failed backup is logged as a `backup-failed` event of
 * the study, never thrown at the reading screen.
 */
import { writeBundleAsync } from '../../io/bundle/write';
import { gatherStudySnapshot } from '../../store/bundle';
import type { HeedDb } from '../../store/db';
import { appendEvent } from '../../store/events';
import { getStudy } from '../../store/studies';
import { backupFileName } from '../../host/backup-name';
import { getHost } from '../../host';
import type { BackupEntry, Host } from '../../host/types';
import { signal } from '../signals';

export type BackupReason = 'period-complete' | 'on-demand';
export type BackupOutcome =
  | { ok: true; entry: BackupEntry; folder: string }
  | { ok: false; skipped: boolean; message: string };

const messageOf = (error: unknown): string => (error instanceof Error ? error.message : String(error));

/**
 * Writes one backup of the study. With no backup folder in this window (the start screen says
 * why), an automatic backup is skipped quietly; any other failure is logged on the study's chain.
 */
export const backUpStudy = async (db: HeedDb, studyId: string, reason: BackupReason, host: Host = getHost()): Promise<BackupOutcome> => {
  let outcome: BackupOutcome;
  try {
    const listing = await host.listBackups();
    if (!listing.available) {
      outcome = { ok: false, skipped: true, message: `No backup was written: ${listing.reason}` };
    } else {
      const study = await getStudy(db, studyId);
      const bytes = await writeBundleAsync(await gatherStudySnapshot(db, studyId, false));
      const entry = await host.saveBackup(studyId, backupFileName(study.name, new Date()), bytes);
      outcome = { ok: true, entry, folder: listing.folder };
    }
  } catch (error) {
    outcome = { ok: false, skipped: false, message: `The backup failed: ${messageOf(error)}` };
    await db.transaction('rw', db.events, () => appendEvent(db, studyId, 'backup-failed', { reason, error: messageOf(error) }))
      .catch(() => undefined);
  }
  signal('backup', { studyId, reason, ok: outcome.ok, ...(outcome.ok ? { id: outcome.entry.id } : { skipped: outcome.skipped }) });
  return outcome;
};

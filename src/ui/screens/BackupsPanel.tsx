/** The start screen's backups: where they are written, the latest of each study, and restoring one. */
import { useCallback, useState } from 'react';
import type { StoredStudy } from '../../store/records';
import type { BackupEntry } from '../../host/types';
import { getHost } from '../../host';
import { useDb } from '../db-context';
import { signal } from '../signals';
import { actions } from '../state/app-state';
import { useAsync } from '../use-async';

/** Backups shown per study; the folder keeps more (the listing says how many). */
const SHOWN_PER_STUDY = 3;

type Props = { studies: StoredStudy[] };

/** Backups grouped by study, newest first, at most SHOWN_PER_STUDY each. */
const byStudy = (backups: BackupEntry[]): Map<string, BackupEntry[]> => {
  const groups = new Map<string, BackupEntry[]>();
  for (const b of backups) {
    const group = groups.get(b.studyId) ?? [];
    group.push(b);
    groups.set(b.studyId, group);
  }
  for (const [id, group] of groups) groups.set(id, group.sort((a, b) => (a.fileName < b.fileName ? 1 : -1)).slice(0, SHOWN_PER_STUDY));
  return groups;
};

/** The study name a backup's file carries after its time stamp ("…Z-Reader-study.zip" gives "Reader-study"). */
const nameInFile = (fileName: string): string => /Z-(.+)\.zip$/.exec(fileName)?.[1] ?? 'A study';

/** A stored time as a person reads it, e.g. "2 Dec 2026, 11:29" (also the lost-database notice's). */
export const when = (iso: string): string => new Date(iso).toLocaleString('en-GB', { dateStyle: 'medium', timeStyle: 'short' });

export const BackupsPanel = ({ studies }: Props) => {
  const db = useDb();
  const listing = useAsync(useCallback(() => getHost().listBackups(), []));
  const [problem, setProblem] = useState('');
  const [busy, setBusy] = useState(false);
  const names = new Map(studies.map((s) => [s.id, s.name]));

  const restore = async (entry: BackupEntry) => {
    setBusy(true);
    setProblem('');
    try {
      // loaded on use, as in OpenBundle: the start screen's bundle carries no bundle reader
      const { openStudyBundle } = await import('../../store/bundle');
      const outcome = await openStudyBundle(db, entry.fileName, await getHost().readBackup(entry.id));
      if (!outcome.ok) {
        setProblem(outcome.message);
        signal('saved', { restored: entry.id, ok: false });
        return;
      }
      const { study } = outcome.restored;
      actions.openStudy(study.id, { kind: 'info', text: `Restored “${study.name}” from the backup ${entry.fileName}: its hashes and chain check out.` });
    } catch (e) {
      setProblem(`${entry.fileName} was not restored: ${e instanceof Error ? e.message : String(e)}`);
    } finally {
      setBusy(false);
    }
  };

  const l = listing.value;
  return (
    <section className="panel" aria-labelledby="backups-head">
      <h2 id="backups-head">Backups</h2>
      {listing.error && <p role="alert">The backups could not be listed: {listing.error.message}</p>}
      {!l && !listing.error && <p aria-busy="true">Looking for backups…</p>}
      {l && !l.available && <p aria-label="Backup folder">No automatic backups in this window: {l.reason}</p>}
      {l?.available && (
        <>
          <p aria-label="Backup folder">
            When a period is complete, and when you press “Back up now” on a study page, Heed writes the study bundle (without images) to <code>{l.folder}</code>, one folder per study, keeping the last {l.keep} of each.
          </p>
          {l.backups.length === 0 ? <p className="muted">No backup yet.</p> : (
            <ul className="plain">
              {[...byStudy(l.backups)].map(([studyId, group]) => (
                <li key={studyId}>
                  <strong>{names.get(studyId) ?? `${nameInFile(group[0]?.fileName ?? '')} (not on this workstation)`}</strong>
                  <ul className="plain">
                    {group.map((b) => (
                      <li key={b.id}>
                        {when(b.savedAt)} <span className="muted">({b.fileName}, {b.bytes.toLocaleString('en')} bytes)</span>{' '}
                        <button type="button" disabled={busy} aria-label={`Restore ${b.fileName}`} onClick={() => void restore(b)}>Restore</button>
                      </li>
                    ))}
                  </ul>
                </li>
              ))}
            </ul>
          )}
          <p className="muted">Restoring checks the bundle first and is refused when the study is already on this workstation (merge a copy into it from its study page instead).</p>
        </>
      )}
      {problem && <p role="alert">{problem}</p>}
    </section>
  );
};

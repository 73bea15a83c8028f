// backUpStudy: the bundle it hands the host verifies; no backup folder means a quiet skip; a
// failing host leaves a backup-failed event on the study's chain and never throws.
import { freshDb, readTinyStudy } from '../support/bundle-study';
import { readBundle } from '../../../src/io/bundle/read';
import { writeBundle } from '../../../src/io/bundle/write';
import { gatherStudySnapshot } from '../../../src/store/bundle';
import { eventsOfStudy } from '../../../src/store/events';
import type { BackupHost, Host } from '../../../src/host/types';
import { backUpStudy } from '../../../src/ui/services/backup';

const signals: unknown[] = [];
beforeAll(() => {
  // signal() marks document.body and dispatches on window; these tests run in Node
  vi.stubGlobal('document', { body: { getAttribute: () => null, setAttribute: () => undefined } });
  vi.stubGlobal('window', { dispatchEvent: (e: CustomEvent) => { signals.push(e.detail); return true; } });
});
afterAll(() => vi.unstubAllGlobals());

const hostWith = (backups: Partial<BackupHost>): Host => ({
  kind: 'browser',
  saveFile: async () => ({ saved: false }),
  printToPdf: async () => ({ saved: false }),
  pickCaseSet: async () => null,
  saveBackup: async () => { throw new Error('not expected'); },
  listBackups: async () => ({ available: true, folder: '/backups', keep: 10, backups: [] }),
  readBackup: async () => new Uint8Array(0),
  ...backups,
});

describe('backUpStudy', () => {
  it('hands the host a bundle that verifies, named by the time and the study', async () => {
    const db = freshDb();
    const { study } = await readTinyStudy(db);
    const saveBackup = vi.fn<BackupHost['saveBackup']>(async (studyId, fileName, bytes) => ({ id: `${studyId}/${fileName}`, studyId, fileName, bytes: bytes.length, savedAt: '' }));
    const outcome = await backUpStudy(db, study.id, 'on-demand', hostWith({ saveBackup }));
    expect(outcome).toMatchObject({ ok: true, folder: '/backups' });
    const [studyId, fileName, bytes] = saveBackup.mock.calls[0] ?? [];
    expect(studyId).toBe(study.id);
    expect(fileName).toMatch(/^\d{4}-\d\d-\d\dT\d\d-\d\d-\d\d-\d{3}Z-Bundle-study\.zip$/);
    const read = readBundle(bytes ?? new Uint8Array(0));
    if (!read.ok) throw new Error('the backup does not verify');
    expect(read.manifest.images_included).toBe(false);
    expect(bytes).toEqual(writeBundle(await gatherStudySnapshot(db, study.id)));
    expect(signals.at(-1)).toMatchObject({ studyId: study.id, reason: 'on-demand', ok: true });
  });

  it('skips quietly when this window has no backup folder', async () => {
    const db = freshDb();
    const { study } = await readTinyStudy(db);
    const saveBackup = vi.fn<BackupHost['saveBackup']>();
    const before = (await eventsOfStudy(db, study.id)).length;
    const outcome = await backUpStudy(db, study.id, 'period-complete', hostWith({ saveBackup, listBackups: async () => ({ available: false, reason: 'no launcher' }) }));
    expect(outcome).toEqual({ ok: false, skipped: true, message: 'No backup was written: no launcher' });
    expect(saveBackup).not.toHaveBeenCalled();
    expect(await eventsOfStudy(db, study.id)).toHaveLength(before);
  });

  it('logs a failed backup as a backup-failed event and resolves, the chain still whole', async () => {
    const db = freshDb();
    const { study } = await readTinyStudy(db);
    const outcome = await backUpStudy(db, study.id, 'period-complete', hostWith({ saveBackup: async () => { throw new Error('disk full'); } }));
    expect(outcome).toEqual({ ok: false, skipped: false, message: 'The backup failed: disk full' });
    const last = (await eventsOfStudy(db, study.id)).at(-1);
    expect(last).toMatchObject({ type: 'backup-failed', detail: { reason: 'period-complete', error: 'disk full' } });
    expect(readBundle(writeBundle(await gatherStudySnapshot(db, study.id))).ok).toBe(true);
  });
});

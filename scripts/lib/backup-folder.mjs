// Automatic backups on disk: one folder per study under a backup root, each backup a study
// bundle named by the moment it was made, the last N of each study kept. Used by the launcher's
// server (backup-endpoint.mjs) and by the Electron main process (electron/ipc-main.ts).
import { createHmac, randomBytes } from 'node:crypto';
import { mkdir, readdir, readFile, rename, stat, unlink, writeFile } from 'node:fs/promises';
import path from 'node:path';

/** Backups kept per study unless told otherwise. */
export const DEFAULT_KEEP = 10;
/** A study id as Heed makes them (a UUID), or any short id of letters, digits, '-' and '_'. */
const STUDY_ID = /^[A-Za-z0-9][A-Za-z0-9_-]{0,99}$/;
/** `2026-12-02T04-15-00-123Z-name.zip`: the UTC moment first, so name order is time order. */
const BACKUP_NAME = /^\d{4}-\d\d-\d\dT\d\d-\d\d-\d\d-\d{3}Z(-[A-Za-z0-9_-][A-Za-z0-9._-]{0,100})?\.zip$/;

/**
 * `$XDG_DATA_HOME/heed/backups` when XDG_DATA_HOME is an absolute path (the XDG spec ignores
 * relative values), else `~/.local/share/heed/backups`.
 */
export const defaultBackupRoot = (env, home) => {
  const xdg = env.XDG_DATA_HOME;
  const data = xdg && path.isAbsolute(xdg) ? xdg : path.join(home, '.local', 'share');
  return path.resolve(data, 'heed', 'backups');
};

/** The secret a page must show to use the backup endpoint, derived from the profile's launch token. */
export const backupSecretFor = (token) => createHmac('sha256', token).update('heed-backups').digest('hex');

/** Why `studyId` / `fileName` cannot name a backup, or null when they can. */
export const backupProblem = (studyId, fileName) => {
  if (typeof studyId !== 'string' || !STUDY_ID.test(studyId)) return 'the study id is not 1-100 letters, digits, "-" or "_"';
  if (typeof fileName !== 'string' || !BACKUP_NAME.test(fileName)) return 'the backup file name is not "<UTC time>-<name>.zip" (letters, digits, ".", "-", "_")';
  return null;
};

/**
 * The pruning rule: of one study's file names, those to delete so that the `keep` newest backups
 * stay (newest by name, which starts with the UTC time). Files that are not backups are never
 * named. Example: backupsToRemove(['a.txt', T1, T2, T3], 2) === [T1].
 */
export const backupsToRemove = (names, keep) => {
  const backups = names.filter((n) => BACKUP_NAME.test(n)).sort();
  return backups.slice(0, Math.max(0, backups.length - Math.max(1, keep)));
};

/** `studyId/fileName` as one id, or null when it is not one. */
export const parseBackupId = (id) => {
  if (typeof id !== 'string') return null;
  const [studyId, fileName, extra] = id.split('/');
  return extra === undefined && backupProblem(studyId, fileName) === null ? { studyId, fileName } : null;
};

const isMissing = (error) => error?.code === 'ENOENT';

/**
 * A backup root: save (then prune that study), list every backup (newest first), read one.
 * Files are written to a temporary name and renamed, so a crash never leaves half a backup.
 * @param {{ root: string; keep?: number }} options
 */
export const createBackupFolder = ({ root, keep = DEFAULT_KEEP }) => {
  const studyDir = (studyId) => path.join(root, studyId);
  const check = (studyId, fileName) => {
    const problem = backupProblem(studyId, fileName);
    if (problem !== null) throw new Error(problem);
  };
  const entry = async (studyId, fileName) => {
    const info = await stat(path.join(studyDir(studyId), fileName));
    return { id: `${studyId}/${fileName}`, studyId, fileName, bytes: info.size, savedAt: info.mtime.toISOString() };
  };
  return {
    root,
    keep,
    /** Writes one backup and prunes that study's folder to the newest `keep`. */
    save: async (studyId, fileName, bytes) => {
      check(studyId, fileName);
      const dir = studyDir(studyId);
      await mkdir(dir, { recursive: true, mode: 0o700 });
      const temporary = path.join(dir, `.partial-${randomBytes(8).toString('hex')}`);
      await writeFile(temporary, bytes, { mode: 0o600 });
      await rename(temporary, path.join(dir, fileName));
      for (const old of backupsToRemove(await readdir(dir), keep)) await unlink(path.join(dir, old)).catch(() => undefined);
      return entry(studyId, fileName);
    },
    /** Every backup of every study, newest first within a study. */
    list: async () => {
      let studies;
      try {
        studies = await readdir(root, { withFileTypes: true });
      } catch (error) {
        if (isMissing(error)) return [];
        throw error;
      }
      const entries = [];
      for (const study of studies) {
        if (!study.isDirectory() || !STUDY_ID.test(study.name)) continue;
        const names = (await readdir(studyDir(study.name))).filter((n) => BACKUP_NAME.test(n)).sort().reverse();
        for (const name of names) entries.push(await entry(study.name, name));
      }
      return entries;
    },
    /** The bytes of one backup by id (`studyId/fileName`). */
    read: async (id) => {
      const parsed = parseBackupId(id);
      if (parsed === null) throw new Error('not a backup id');
      return new Uint8Array(await readFile(path.join(studyDir(parsed.studyId), parsed.fileName)));
    },
  };
};

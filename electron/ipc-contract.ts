// The IPC contract between the renderer (through the preload) and the main process: one channel
// name (in ./channels) and one runtime schema per payload. The main process parses every incoming value as
// unknown against these schemas; the payload types themselves live in src/host/bridge.ts.
import { z } from 'zod';
import type {
  ListBackupsRequest, OpenFolderRequest, PickCaseSetRequest, PrintToPdfRequest, ReadBackupRequest, ReadCaseFileRequest, SaveBackupRequest,
  SaveFileRequest,
} from '../src/host/bridge';
import { fileNameProblem } from '../src/host/file-name';
import { backupProblem, parseBackupId } from '../scripts/lib/backup-folder.mjs';
import type { ChannelKey } from './channels';

export { CHANNELS, CHANNEL_KEYS } from './channels';
export type { ChannelKey } from './channels';

/** Largest file the renderer may ask the main process to write (exports, bundles, PDFs). */
export const MAX_SAVE_BYTES = 512 * 1024 * 1024;
/** Bytes per answer when the renderer reads a picked case-set file. */
export const READ_CHUNK_BYTES = 8 * 1024 * 1024;

const fileName = z.string().superRefine((name, ctx) => {
  const problem = fileNameProblem(name);
  if (problem !== null) ctx.addIssue({ code: 'custom', message: problem });
});

export const saveFileRequest = z.strictObject({
  suggestedName: fileName,
  data: z.union([
    z.string().max(MAX_SAVE_BYTES, `text is longer than ${MAX_SAVE_BYTES} characters`),
    z.instanceof(Uint8Array).refine((b) => b.byteLength <= MAX_SAVE_BYTES, `data is larger than ${MAX_SAVE_BYTES} bytes`),
  ]),
  mime: z.string().regex(/^[\w.+-]+\/[\w.+-]+(;\s*charset=[\w-]+)?$/, 'mime is not a media type such as text/csv'),
}) satisfies z.ZodType<SaveFileRequest>;

export const printToPdfRequest = z.strictObject({ suggestedName: fileName }) satisfies z.ZodType<PrintToPdfRequest>;

export const pickCaseSetRequest = z.strictObject({ kind: z.enum(['folder', 'zip']) }) satisfies z.ZodType<PickCaseSetRequest>;

export const readCaseFileRequest = z.strictObject({
  token: z.uuid(),
  path: z.string().min(1).max(4096),
  offset: z.int().min(0),
}) satisfies z.ZodType<ReadCaseFileRequest>;

export const openFolderRequest = z.strictObject({ where: z.string().min(1).max(4096) }) satisfies z.ZodType<OpenFolderRequest>;

/** Largest backup the renderer may ask the main process to write (bundles without images are small). */
export const MAX_BACKUP_BYTES = 128 * 1024 * 1024;

export const saveBackupRequest = z.strictObject({
  studyId: z.string(),
  fileName: z.string(),
  bytes: z.instanceof(Uint8Array).refine((b) => b.byteLength <= MAX_BACKUP_BYTES, `the backup is larger than ${MAX_BACKUP_BYTES} bytes`),
}).superRefine((request, ctx) => {
  const problem = backupProblem(request.studyId, request.fileName);
  if (problem !== null) ctx.addIssue({ code: 'custom', message: problem, path: ['fileName'] });
}) satisfies z.ZodType<SaveBackupRequest>;

export const listBackupsRequest = z.null() satisfies z.ZodType<ListBackupsRequest>;

export const readBackupRequest = z.strictObject({
  id: z.string().refine((id) => parseBackupId(id) !== null, 'not a backup id (study id/file name)'),
}) satisfies z.ZodType<ReadBackupRequest>;

export const REQUESTS = {
  saveFile: saveFileRequest,
  printToPdf: printToPdfRequest,
  pickCaseSet: pickCaseSetRequest,
  readCaseFile: readCaseFileRequest,
  openFolder: openFolderRequest,
  saveBackup: saveBackupRequest,
  listBackups: listBackupsRequest,
  readBackup: readBackupRequest,
} as const satisfies Record<ChannelKey, z.ZodType>;

/** A zod error as one line naming the field: `suggestedName: the suggested file name is empty`. */
export const describeIssues = (error: z.ZodError): string =>
  error.issues.map((i) => `${i.path.length > 0 ? i.path.join('.') : 'request'}: ${i.message}`).join('; ');

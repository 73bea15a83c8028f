// IPC channel names, apart from their schemas so the sandboxed preload stays small (no zod).

export const CHANNELS = {
  saveFile: 'heed:save-file',
  printToPdf: 'heed:print-to-pdf',
  pickCaseSet: 'heed:pick-case-set',
  readCaseFile: 'heed:read-case-file',
  openFolder: 'heed:open-folder',
  saveBackup: 'heed:save-backup',
  listBackups: 'heed:list-backups',
  readBackup: 'heed:read-backup',
} as const;

export type ChannelKey = keyof typeof CHANNELS;

/** Every channel key, in a typed list (Object.keys would give string[]). */
export const CHANNEL_KEYS: readonly ChannelKey[] = [
  'saveFile', 'printToPdf', 'pickCaseSet', 'readCaseFile', 'openFolder', 'saveBackup', 'listBackups', 'readBackup',
];

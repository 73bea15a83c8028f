// The name of an automatic backup: the UTC moment first (so name order is time order, which is
// what the backup folder's pruning rule relies on), then the study's name made file-safe.

/** `2026-12-02T04-15-00-123Z-Reader-study.zip` for a backup of "Reader study" made at that moment. */
export const backupFileName = (studyName: string, at: Date): string => {
  const stamp = at.toISOString().replace(/[:.]/g, '-');
  const name = studyName.replace(/[^A-Za-z0-9._-]+/g, '-').replace(/^[-.]+|-+$/g, '').slice(0, 80);
  return `${stamp}${name === '' ? '' : `-${name}`}.zip`;
};

// One rule for the names Heed suggests when saving, checked by both hosts and by the Electron
// main process: a plain file name, never a path.

const MAX_LENGTH = 200;
// Control characters (U+0000-U+001F, U+007F) have no place in a file name.
const hasControl = (text: string): boolean => [...text].some((ch) => ch.charCodeAt(0) < 0x20 || ch.charCodeAt(0) === 0x7f);

/**
 * Returns `name` when it is a usable plain file name; otherwise throws an Error saying what is
 * wrong (empty, longer than 200 characters, holds a '/' or '\', a control character, or is
 * "." / ".."). Example: checkFileName('reads.csv') === 'reads.csv'.
 */
export const checkFileName = (name: string): string => {
  const problem = fileNameProblem(name);
  if (problem !== null) throw new Error(problem);
  return name;
};

/** The reason `name` is not a usable plain file name, or null when it is. */
export const fileNameProblem = (name: string): string | null => {
  if (name.trim() === '') return 'the suggested file name is empty';
  if (name.length > MAX_LENGTH) return `the suggested file name is longer than ${MAX_LENGTH} characters`;
  if (name.includes('/') || name.includes('\\')) return `the suggested file name "${name}" holds a folder separator`;
  if (hasControl(name)) return 'the suggested file name holds a control character';
  if (name === '.' || name === '..') return `the suggested file name "${name}" is not a file name`;
  return null;
};

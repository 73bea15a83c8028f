// A SetSource for the CLI: a folder on disk, or a .zip file (read whole, then zipSource).
import { lstat, readFile, readdir, stat } from 'node:fs/promises';
import { join, relative, sep } from 'node:path';
import type { SetSource } from '../io/case-set/types';
import { zipSource } from '../io/case-set/zip-source';

/**
 * Regular files under `root`, paths with '/'. Symbolic links are not followed (a linked image is
 * reported as not in the set), so a set cannot reach files outside its folder.
 */
export const folderSource = (root: string): SetSource => {
  const within = (path: string): string => {
    const full = join(root, path);
    if (relative(root, full).startsWith('..')) throw new Error(`${path} is outside the set`);
    return full;
  };
  return {
    label: root,
    list: async () => {
      const entries = await readdir(root, { recursive: true, withFileTypes: true });
      return entries
        .filter((e) => e.isFile())
        .map((e) => relative(root, join(e.parentPath, e.name)).split(sep).join('/'));
    },
    read: async (path) => {
      const full = within(path);
      if ((await lstat(full)).isSymbolicLink()) throw new Error('symbolic links are not followed');
      return readFile(full);
    },
    size: async (path) => (await lstat(within(path))).size,
  };
};

/** A folder, or a file ending in .zip; throws with a plain message when PATH is neither. */
export const nodeSetSource = async (path: string): Promise<SetSource> => {
  const info = await stat(path).catch(() => null);
  if (!info) throw new Error(`${path} does not exist`);
  if (info.isDirectory()) return folderSource(path);
  if (info.isFile() && path.toLowerCase().endsWith('.zip')) {
    const bytes = await readFile(path);
    return zipSource(new Uint8Array(bytes.buffer, bytes.byteOffset, bytes.byteLength), path);
  }
  throw new Error(`${path} is neither a folder nor a .zip file`);
};

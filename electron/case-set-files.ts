// The main process's side of picking a case set: list a folder (or take one .zip) and hand the
// renderer a token; later reads may name only files of that listing, a bounded chunk at a time.
import { randomUUID } from 'node:crypto';
import { lstat, open, readdir } from 'node:fs/promises';
import path from 'node:path';
import type { CaseSetListing, FileChunk } from '../src/host/bridge';
import { READ_CHUNK_BYTES } from './ipc-contract';

/** A case set holds at most 20,000 images plus cases.csv; a folder with far more is the wrong folder. */
export const MAX_LISTED_FILES = 25_000;
const MAX_DEPTH = 16;
// Sets picked earlier stay readable for a while; older ones are forgotten to bound memory.
const KEEP_SETS = 4;

type Listed = { label: string; files: Map<string, { abs: string; size: number }> };

/**
 * Lists plain files under `root` with '/'-separated relative paths. Symbolic links are not
 * followed (they could lead outside the set) and hidden entries (names starting with '.') are
 * skipped. Throws an Error naming the folder when it holds more than MAX_LISTED_FILES files.
 */
export const listFolder = async (root: string): Promise<Listed['files']> => {
  const files: Listed['files'] = new Map();
  const walk = async (dir: string, rel: string, depth: number): Promise<void> => {
    if (depth > MAX_DEPTH) throw new Error(`${dir}: folders are nested more than ${MAX_DEPTH} deep`);
    const entries = await readdir(dir, { withFileTypes: true });
    entries.sort((a, b) => (a.name < b.name ? -1 : a.name > b.name ? 1 : 0));
    for (const entry of entries) {
      if (entry.name.startsWith('.')) continue;
      const abs = path.join(dir, entry.name);
      const relPath = rel === '' ? entry.name : `${rel}/${entry.name}`;
      if (entry.isDirectory()) await walk(abs, relPath, depth + 1);
      else if (entry.isFile()) {
        if (files.size >= MAX_LISTED_FILES) {
          throw new Error(`${root}: the folder holds more than ${MAX_LISTED_FILES} files; pick the folder that holds cases.csv`);
        }
        files.set(relPath, { abs, size: (await lstat(abs)).size });
      }
    }
  };
  await walk(root, '', 0);
  return files;
};

export const createCaseSetFiles = () => {
  const sets = new Map<string, Listed>();

  const remember = (listed: Listed): CaseSetListing => {
    const token = randomUUID();
    sets.set(token, listed);
    while (sets.size > KEEP_SETS) {
      const oldest = sets.keys().next().value;
      if (oldest === undefined) break;
      sets.delete(oldest);
    }
    return { token, label: listed.label, files: [...listed.files].map(([p, f]) => ({ path: p, size: f.size })) };
  };

  return {
    /** Lists a picked folder. */
    addFolder: async (root: string): Promise<CaseSetListing> =>
      remember({ label: path.basename(root), files: await listFolder(root) }),

    /** Takes a picked .zip as a single entry named after the file; the renderer unpacks it. */
    addZip: async (file: string): Promise<CaseSetListing> => {
      const info = await lstat(file);
      if (!info.isFile()) throw new Error(`${file} is not a plain file`);
      const name = path.basename(file);
      if (!/\.zip$/i.test(name)) throw new Error(`${file} is not a .zip file`);
      return remember({ label: name.replace(/\.zip$/i, ''), files: new Map([[name, { abs: file, size: info.size }]]) });
    },

    /** Up to READ_CHUNK_BYTES of a listed file from `offset`; an unlisted path is refused. */
    read: async (token: string, relPath: string, offset: number): Promise<FileChunk> => {
      const listed = sets.get(token);
      if (listed === undefined) throw new Error('that case set is no longer open; pick it again');
      const entry = listed.files.get(relPath);
      if (entry === undefined) throw new Error(`${relPath} is not a file of the picked case set`);
      const handle = await open(entry.abs, 'r');
      try {
        const size = (await handle.stat()).size;
        if (offset > size) throw new Error(`${relPath}: offset ${offset} is past the end (${size} bytes)`);
        const bytes = new Uint8Array(Math.min(READ_CHUNK_BYTES, size - offset));
        let filled = 0;
        while (filled < bytes.length) {
          const { bytesRead } = await handle.read(bytes, filled, bytes.length - filled, offset + filled);
          if (bytesRead === 0) break;
          filled += bytesRead;
        }
        return { bytes: filled === bytes.length ? bytes : bytes.subarray(0, filled), size };
      } finally {
        await handle.close();
      }
    },
  };
};

export type CaseSetFiles = ReturnType<typeof createCaseSetFiles>;

/**
 * A SetSource over the bytes of a zip (docs/formats.md, "The case set": a folder, or a zip of one). Refuses, with the
 * entry named: entries whose path is absolute or climbs out of the root with `..`, backslash
 * paths, symbolic links (unix mode in the external attributes), encrypted entries, methods other
 * than stored and deflate, repeated names, ZIP64, and zip bombs (declared sizes are bounded by
 * the limits, and inflating past an entry's declared size stops at once; CRC-32 is checked).
 * If cases.csv is not at the top but the zip holds one top folder that has it, that folder is the
 * root. `__MACOSX/` and `.DS_Store` entries are ignored. Entries are inflated only when read.
 * Refusals surface as a SetSourceError from list() and read(), which readCaseSet turns into
 * problems. Example: zipSource(zipSync({ 'set/cases.csv': csv, 'set/a.png': png }), 'set.zip')
 * lists ['cases.csv', 'a.png'].
 */
import { Inflate } from 'fflate';
import { crc32 } from './crc32';
import { SetSourceError } from './source-error';
import { DEFAULT_LIMITS } from './types';
import type { CaseSetLimits, CaseSetProblem, SetSource } from './types';
import { readZipDirectory } from './zip-directory';
import type { ZipEntry } from './zip-directory';

const LOCAL = 0x04034b50;
const SLICE = 32 * 1024;
const CASES = 'cases.csv';

const ignored = (name: string): boolean => name.startsWith('__MACOSX/') || name.split('/').pop() === '.DS_Store';

/** Why an entry name is unsafe, or null. */
const unsafeName = (name: string): string | null => {
  if (name.includes('\\')) return 'uses a backslash in its path';
  if (name.startsWith('/') || /^[A-Za-z]:/.test(name)) return 'has an absolute path';
  let depth = 0;
  for (const part of name.split('/')) {
    if (part === '..') depth -= 1;
    else if (part !== '' && part !== '.') depth += 1;
    if (depth < 0) return "climbs out of the zip's folder with '..'";
  }
  return null;
};

const inflateBounded = (data: Uint8Array, size: number): Uint8Array | null => {
  const out = new Uint8Array(size);
  let written = 0;
  let over = false;
  const inflater = new Inflate((chunk) => {
    if (written + chunk.length > size) over = true;
    else out.set(chunk, written);
    written += chunk.length;
  });
  // Small slices bound the output of one push, so a bomb is caught after little work.
  for (let at = 0; at < data.length; at += SLICE) {
    inflater.push(data.subarray(at, at + SLICE), at + SLICE >= data.length);
    if (over) return null;
  }
  return written === size ? out : null;
};

export const zipSource = (bytes: Uint8Array, label: string, limits: Partial<CaseSetLimits> = {}): SetSource => {
  const bounds = { ...DEFAULT_LIMITS, ...limits };
  const problems: CaseSetProblem[] = [];
  const refuse = (entry: string, message: string): void => {
    problems.push({ file: entry, row: null, column: null, message });
  };
  const files = new Map<string, ZipEntry>();
  let prefix = '';
  const directory = readZipDirectory(bytes);
  if (!directory.ok) refuse('', directory.message);
  else {
    let declared = 0;
    const perEntry = Math.max(bounds.imageBytes, bounds.csvBytes);
    for (const entry of directory.entries) {
      if (ignored(entry.name)) continue;
      const unsafe = unsafeName(entry.name);
      if (unsafe) refuse(entry.name, `zip entry ${unsafe}; refusing the whole zip`);
      else if (entry.symlink) refuse(entry.name, 'zip entry is a symbolic link; refusing the whole zip');
      else if (entry.name.endsWith('/')) continue;
      else if (entry.flags & 1) refuse(entry.name, 'zip entry is encrypted; make the zip without a password');
      else if (entry.method !== 0 && entry.method !== 8) refuse(entry.name, `zip entry uses compression method ${entry.method}; only stored and deflate are read`);
      else if (files.has(entry.name)) refuse(entry.name, 'zip holds two entries with this name');
      else if (entry.size > perEntry) refuse(entry.name, `zip entry would unpack to ${Math.round(entry.size / 1048576)} MB, over the ${Math.round(perEntry / 1048576)} MB limit for one file`);
      else files.set(entry.name, entry);
      declared += entry.size;
    }
    if (declared > bounds.totalBytes + bounds.csvBytes) {
      refuse('', `zip would unpack to more than ${Math.round(bounds.totalBytes / 1048576)} MB, the limit for a set`);
    }
    if (!files.has(CASES)) {
      const tops = new Set([...files.keys()].map((name) => name.split('/')[0]));
      const [top] = tops;
      if (tops.size === 1 && top !== undefined && files.has(`${top}/${CASES}`)) prefix = `${top}/`;
    }
  }
  const error = problems.length > 0 ? new SetSourceError(problems) : null;
  const entryOf = (path: string): ZipEntry => {
    const entry = files.get(prefix + path);
    if (!entry) throw new Error(`${path} is not in the zip`);
    return entry;
  };
  return {
    label: prefix ? `${label}/${prefix.slice(0, -1)}` : label,
    list: async () => {
      if (error) throw error;
      return [...files.keys()].filter((name) => name.startsWith(prefix)).map((name) => name.slice(prefix.length));
    },
    size: async (path) => entryOf(path).size,
    read: async (path) => {
      if (error) throw error;
      const entry = entryOf(path);
      const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
      if (entry.localOffset + 30 > bytes.length || view.getUint32(entry.localOffset, true) !== LOCAL) {
        throw new Error('the zip is damaged (bad local header)');
      }
      const start = entry.localOffset + 30 + view.getUint16(entry.localOffset + 26, true) + view.getUint16(entry.localOffset + 28, true);
      const data = bytes.subarray(start, start + entry.compressedSize);
      // slice(): a copy, so storing one image never keeps the whole zip's buffer alive.
      const out = entry.method === 0 ? data.slice() : inflateBounded(data, entry.size);
      if (!out || out.length !== entry.size || crc32(out) !== entry.crc) {
        throw new Error('the zip entry is damaged or does not match its declared size');
      }
      return out;
    },
  };
};

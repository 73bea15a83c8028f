/**
 * A SetSource over the bytes of a zip (docs/formats.md, "The case set": a folder, or a zip of one). Refuses, with the
 * entry named: entries whose path is absolute or climbs out of the root with `..`, backslash
 * paths, symbolic links (unix mode in the external attributes), encrypted entries, methods other
 * than stored and deflate, repeated names, ZIP64, and zip bombs (entries that overlap or share
 * compressed bytes; declared sizes over the limits; real unpacked bytes are counted as they come
 * and inflating stops at once past an entry's declared size, the set's total, or 100:1; CRC-32
 * is checked).
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

// Deflate unpacks at most about 1032:1, so one 1 KB slice yields at most about 1 MB: the first
// 64 KB go in 1 KB slices, so a bomb is caught after little work; then 16 KB slices, as each
// push costs about a 32 KB window copy in fflate (1 KB slices throughout: 20 MB in 5.6 s, 16 KB: 1.2 s).
const SMALL_SLICE = 1024;
const SLICE = 16 * 1024;
const SMALL_UNTIL = 64 * 1024;
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

// Apache POI's ZipSecureFile refuses entries inflating beyond 100:1 (MIN_INFLATE_RATIO 0.01,
// https://poi.apache.org/apidocs/6.0/org/apache/poi/openxml4j/util/ZipSecureFile.html). PNG and
// JPEG are already compressed and barely shrink again; a CSV shrinks perhaps 5-20 times. Small
// outputs are let through whatever their ratio, as POI does (its grace is 100 KB; ours 1 MB).
const MAX_RATIO = 100;
const RATIO_GRACE = 1024 * 1024;

type Inflated = { ok: true; bytes: Uint8Array } | { ok: false; message: string; bomb: boolean };

/**
 * Inflates one entry, counting the bytes that really come out (declared sizes may lie): stops as
 * soon as the output passes the entry's declared size, the bytes left in the set's budget, or 100
 * times the input consumed so far. Output never exceeds the declared size plus one slice's worth.
 */
const inflateCounted = (data: Uint8Array, size: number, budget: number): Inflated => {
  const out = new Uint8Array(size);
  let written = 0;
  let consumed = 0;
  let stop: string | null = null;
  let bomb = true;
  const inflater = new Inflate((chunk) => {
    if (stop) return;
    if (written + chunk.length > budget) stop = `unpacks to more than the limit for a set (${Math.round(budget / 1048576)} MB in all)`;
    else if (written + chunk.length > size) {
      bomb = false;
      stop = 'is damaged or does not match its declared size (it unpacks to more bytes)';
    } else if (written + chunk.length > RATIO_GRACE && written + chunk.length > MAX_RATIO * Math.max(consumed, 1)) {
      stop = `unpacks more than ${MAX_RATIO} times its compressed size, the mark of a zip bomb`;
    } else out.set(chunk, written);
    written += chunk.length;
  });
  for (let at = 0; at < data.length; ) {
    const next = Math.min(at + (at < SMALL_UNTIL ? SMALL_SLICE : SLICE), data.length);
    consumed = next;
    inflater.push(data.subarray(at, next), next === data.length);
    if (stop) return { ok: false, message: stop, bomb };
    at = next;
  }
  return written === size ? { ok: true, bytes: out } : { ok: false, message: 'is damaged or does not match its declared size (it unpacks to fewer bytes)', bomb: false };
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
  // Bytes really unpacked so far, across entries: the declared total is checked above, and this
  // holds even when declared sizes lie.
  const budget = bounds.totalBytes + bounds.csvBytes;
  let unpacked = 0;
  // After one bomb-like entry the whole zip is refused, so the rest are not inflated at all.
  let bombFound: string | null = null;
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
      if (bombFound !== null) throw new Error(`the zip is refused: ${bombFound}`);
      const entry = entryOf(path);
      const data = bytes.subarray(entry.dataOffset, entry.dataOffset + entry.compressedSize);
      // slice(): a copy, so storing one image never keeps the whole zip's buffer alive.
      let out: Uint8Array;
      if (entry.method === 0) out = data.slice();
      else {
        const inflated = inflateCounted(data, entry.size, budget - unpacked);
        if (!inflated.ok) {
          if (inflated.bomb) bombFound = `entry ${path} ${inflated.message}`;
          throw new Error(`the zip entry ${inflated.message}`);
        }
        out = inflated.bytes;
      }
      unpacked += out.length;
      if (out.length !== entry.size || crc32(out) !== entry.crc) {
        throw new Error('the zip entry is damaged or does not match its declared size');
      }
      return out;
    },
  };
};

// A zip's central directory (PKWARE APPNOTE 4.3.12-4.3.16), read by hand because the safety
// checks need fields fflate does not expose: the host system and unix mode of each entry.

export type ZipEntry = {
  name: string;
  method: number;
  flags: number;
  crc: number;
  compressedSize: number;
  size: number;
  localOffset: number;
  /** where the entry's compressed bytes start (after its local header) */
  dataOffset: number;
  /** unix host and the mode says symbolic link */
  symlink: boolean;
};

export type ZipDirectory = { ok: true; entries: ZipEntry[] } | { ok: false; message: string };

const EOCD = 0x06054b50;
const CENTRAL = 0x02014b50;
const LOCAL = 0x04034b50;
const UNIX = 3;
const S_IFMT = 0o170000;
const S_IFLNK = 0o120000;

export const readZipDirectory = (bytes: Uint8Array): ZipDirectory => {
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  // The end record is 22 bytes plus a comment of up to 65,535 bytes, at the very end.
  let end = -1;
  for (let i = bytes.length - 22; i >= Math.max(0, bytes.length - 22 - 65535); i -= 1) {
    if (view.getUint32(i, true) === EOCD) {
      end = i;
      break;
    }
  }
  if (end < 0) return { ok: false, message: 'not a zip file (no end-of-archive record)' };
  const count = view.getUint16(end + 10, true);
  const dirSize = view.getUint32(end + 12, true);
  const dirOffset = view.getUint32(end + 16, true);
  if (count === 0xffff || dirOffset === 0xffffffff || dirSize === 0xffffffff) {
    return { ok: false, message: 'this zip uses the ZIP64 format, which Heed does not read; make a zip under 4 GB with fewer than 65,535 files' };
  }
  if (dirOffset + dirSize > end) return { ok: false, message: 'the zip is damaged (its directory lies outside the file)' };
  const decoder = new TextDecoder('utf-8');
  const entries: ZipEntry[] = [];
  let at = dirOffset;
  for (let n = 0; n < count; n += 1) {
    if (at + 46 > end || view.getUint32(at, true) !== CENTRAL) return { ok: false, message: 'the zip is damaged (bad directory entry)' };
    const madeBy = view.getUint16(at + 4, true);
    const nameLength = view.getUint16(at + 28, true);
    const extraLength = view.getUint16(at + 30, true);
    const commentLength = view.getUint16(at + 32, true);
    const external = view.getUint32(at + 38, true);
    const size = view.getUint32(at + 24, true);
    const compressedSize = view.getUint32(at + 20, true);
    const localOffset = view.getUint32(at + 42, true);
    if (size === 0xffffffff || compressedSize === 0xffffffff || localOffset === 0xffffffff) {
      return { ok: false, message: 'this zip uses the ZIP64 format, which Heed does not read; make a zip under 4 GB' };
    }
    const name = decoder.decode(bytes.subarray(at + 46, at + 46 + nameLength));
    if (localOffset + 30 > dirOffset || view.getUint32(localOffset, true) !== LOCAL) {
      return { ok: false, message: `the zip is damaged (entry ${name} has no local header where its directory says)` };
    }
    const dataOffset = localOffset + 30 + view.getUint16(localOffset + 26, true) + view.getUint16(localOffset + 28, true);
    if (dataOffset + compressedSize > dirOffset) return { ok: false, message: `the zip is damaged (entry ${name} runs into the directory)` };
    entries.push({
      name,
      flags: view.getUint16(at + 8, true),
      method: view.getUint16(at + 10, true),
      crc: view.getUint32(at + 16, true),
      compressedSize,
      size,
      localOffset,
      dataOffset,
      symlink: madeBy >> 8 === UNIX && ((external >>> 16) & S_IFMT) === S_IFLNK,
    });
    at += 46 + nameLength + extraLength + commentLength;
  }
  const shared = sharedEntries(entries);
  if (shared) {
    return { ok: false, message: `zip entries ${shared[0]} and ${shared[1]} overlap (share compressed bytes), the mark of a zip bomb; refusing the whole zip` };
  }
  return { ok: true, entries };
};

/**
 * Two entries whose stored ranges (local header through compressed data) overlap or share a
 * local header, or null. A real zip stores each entry once; a bomb points many directory entries
 * at one highly compressed entry, so its declared sizes each look small. Sorting keeps it
 * O(n log n) for 65,535 entries.
 */
const sharedEntries = (entries: readonly ZipEntry[]): [string, string] | null => {
  const byStart = entries.slice().sort((a, b) => a.localOffset - b.localOffset);
  for (let i = 1; i < byStart.length; i += 1) {
    const before = byStart[i - 1] as ZipEntry;
    const entry = byStart[i] as ZipEntry;
    if (entry.localOffset < before.dataOffset + before.compressedSize) return [before.name, entry.name];
  }
  return null;
};

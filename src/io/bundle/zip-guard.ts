/**
 * Unpacks a study bundle's zip so that a hostile or damaged file cannot exhaust memory or show
 * two readers two different files. fflate's unzipSync gives every deflated entry a buffer of its
 * declared size (and never writes past it) and copies a stored one, so the declared sizes are what
 * unpacking costs. Refused: a zip whose directory cannot be read; entries that share compressed
 * bytes (the case sets' directory reader); an entry declaring more than 100 times its compressed
 * size beyond 1 MB; declared sizes adding up to more than 100 times the zip (plus 1 MB) or to more
 * than 2 GB; a text file over 500 MB (it is read as one string); two entries of one name (unzip
 * programs keep the first, fflate the last). The limits are kept again as fflate itself walks the
 * directory (its filter sees each entry before its buffer is made), since two readers of one zip
 * can be led to see different directories (an end record whose two entry counts differ, a ZIP64
 * locator).
 */
import { unzipSync } from 'fflate';
import { readZipDirectory } from '../case-set/zip-directory';
import type { BundleFault } from './fault';
import { IMAGE_FOLDER } from './write';

// The same ratio as the case-set reader (src/io/case-set/zip-source.ts: Apache POI's
// ZipSecureFile default of 100:1). A bundle's texts shrink perhaps 3-10 times (hashes and ids do
// not compress well) and its images hardly at all, so an honest bundle stays far below it.
const MAX_RATIO = 100;
const GRACE = 1024 * 1024;
/** What one bundle may unpack to: about what a browser tab can hold at once beside the app. */
export const MAX_UNPACKED_BYTES = 2 * 1024 * 1024 * 1024;
/** One text file of a bundle (anything outside images/) is read as one string: V8's limit is about 512 MB. */
export const MAX_TEXT_BYTES = 500 * 1024 * 1024;

const mb = (bytes: number): string => (bytes < 1048576 ? `${Math.ceil(bytes / 1024)} kB` : `${Math.round(bytes / 1048576)} MB`);

/**
 * What is wrong with one entry, or null: a name seen before (unzip programs keep the first copy,
 * fflate the last), a text file too large for one string, or `unpacked` bytes from `packed` over
 * 100:1 beyond 1 MB. Adds the name to `names`.
 */
const entryFault = (names: Set<string>, name: string, unpacked: number, packed: number): BundleFault | null => {
  if (names.has(name)) return { file: name, line: null, message: 'the zip holds two entries with this name (an unzip program would show one, Heed would check the other): refusing the whole bundle' };
  names.add(name);
  if (!name.startsWith(IMAGE_FOLDER) && unpacked > MAX_TEXT_BYTES) {
    return { file: name, line: null, message: `would unpack to ${mb(unpacked)}, more than the ${mb(MAX_TEXT_BYTES)} one text file of a bundle may hold; nothing was unpacked` };
  }
  if (unpacked > GRACE && unpacked > MAX_RATIO * packed) {
    return { file: name, line: null, message: `would unpack to ${mb(unpacked)} from ${packed} bytes, more than ${MAX_RATIO} times its packed size: the mark of a zip bomb; nothing was unpacked` };
  }
  return null;
};

/** The first reason not to unpack this zip, or null. */
export const zipBombFault = (zip: Uint8Array): BundleFault | null => {
  const directory = readZipDirectory(zip);
  if (!directory.ok) return { file: '(bundle)', line: null, message: `not a readable zip (${directory.message})` };
  let declared = 0;
  const names = new Set<string>();
  for (const entry of directory.entries) {
    const fault = entryFault(names, entry.name, entry.size, entry.compressedSize);
    if (fault) return fault;
    declared += entry.size;
  }
  if (declared > MAX_UNPACKED_BYTES) {
    return { file: '(bundle)', line: null, message: `would unpack to ${mb(declared)}, more than the ${mb(MAX_UNPACKED_BYTES)} Heed opens at once; save the bundle again without its images (the study's case set is then imported on its own)` };
  }
  if (declared > MAX_RATIO * zip.length + GRACE) {
    return { file: '(bundle)', line: null, message: `its files would unpack to ${mb(declared)} from a ${mb(zip.length)} zip, more than ${MAX_RATIO} times its size: the mark of a zip bomb; nothing was unpacked` };
  }
  return null;
};

class Refused extends Error {}

export type Unzipped = { ok: true; entries: Record<string, Uint8Array> } | { ok: false; fault: BundleFault };

/** The bundle's entries, or the first reason not to unpack them (nothing larger than the limits is ever made). */
export const unzipBundle = (zip: Uint8Array): Unzipped => {
  const early = zipBombFault(zip);
  if (early) return { ok: false, fault: early };
  let fault: BundleFault | null = null;
  let total = 0;
  const names = new Set<string>();
  const limit = Math.min(MAX_UNPACKED_BYTES, MAX_RATIO * zip.length + GRACE);
  try {
    const entries = unzipSync(zip, {
      filter: (f) => {
        // what unpacking makes: a copy of a stored entry, a buffer of the declared size for a deflated one
        const cost = f.compression === 0 ? f.size : f.originalSize;
        fault = entryFault(names, f.name, cost, f.size);
        total += cost;
        if (!fault && total > limit) {
          fault = { file: '(bundle)', line: null, message: `its entries as the unzipper reads them would unpack to more than ${mb(limit)}: the mark of a zip bomb or a damaged directory; refused` };
        }
        if (fault) throw new Refused();
        return true;
      },
    });
    return { ok: true, entries };
  } catch (error) {
    if (fault) return { ok: false, fault };
    return { ok: false, fault: { file: '(bundle)', line: null, message: `not a readable zip (${error instanceof Error ? error.message : String(error)})` } };
  }
};

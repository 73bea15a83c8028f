// Hostile zips given as study bundles: refused before anything is unpacked, with the entry named,
// and nothing stored by the app's "open a study bundle". The zips are made by the hostile-zip
// generators of the case-set tests (a tiny zip writer whose directory may lie).
import { unzipSync, zipSync } from 'fflate';
import { readBundle } from '../../../../src/io/bundle/read';
import { writeBundle } from '../../../../src/io/bundle/write';
import { MAX_UNPACKED_BYTES, unzipBundle, zipBombFault } from '../../../../src/io/bundle/zip-guard';
import { gatherStudySnapshot, openStudyBundle } from '../../../../src/store/bundle';
import { deflatedEntry, rawZip, type RawEntry } from '../case-set/hostile-zips';
import { freshDb, readTinyStudy } from '../../support/bundle-study';

const honestBundle = async (): Promise<Uint8Array> => {
  const db = freshDb();
  const { study } = await readTinyStudy(db);
  return writeBundle(await gatherStudySnapshot(db, study.id));
};

describe('a study bundle that would unpack to too much', () => {
  it('lets an honest bundle through', async () => {
    const zip = await honestBundle();
    expect(zipBombFault(zip)).toBeNull();
    expect(readBundle(zip).ok).toBe(true);
  });

  it('refuses an entry that unpacks over 100 times its packed size, naming it, and stores nothing', async () => {
    const files = unzipSync(await honestBundle());
    files['extra/zeros.bin'] = new Uint8Array(5 * 1024 * 1024); // zeros: about 1000:1 under deflate
    const zip = zipSync(files);
    const read = readBundle(zip);
    expect(read.ok).toBe(false);
    if (read.ok) return;
    expect(read.fault.file).toBe('extra/zeros.bin');
    expect(read.fault.message).toMatch(/more than 100 times its packed size: the mark of a zip bomb/);
    const db = freshDb();
    const opened = await openStudyBundle(db, 'hostile.zip', zip);
    expect(opened).toEqual({ ok: false, message: expect.stringContaining('hostile.zip was not opened: extra/zeros.bin: would unpack to 5 MB') });
    expect(await db.studies.count()).toBe(0);
    expect(await db.caseSets.count()).toBe(0);
  });

  it('refuses entries that share compressed bytes (one entry listed many times)', () => {
    const zip = rawZip([deflatedEntry('a.txt', new Uint8Array(1000))], [{ name: 'b.txt', of: 0 }, { name: 'c.txt', of: 0 }]);
    expect(zipBombFault(zip)?.message).toMatch(/overlap \(share compressed bytes\), the mark of a zip bomb/);
  });

  it('refuses many small entries that together unpack to over 100 times the zip', () => {
    const entries = Array.from({ length: 40 }, (_, i) => deflatedEntry(`part-${i}.txt`, new Uint8Array(1024 * 1024)));
    const fault = zipBombFault(rawZip(entries));
    expect(fault?.file).toBe('(bundle)');
    expect(fault?.message).toMatch(/would unpack to 40 MB from a \d+ kB zip, more than 100 times its size: the mark of a zip bomb; nothing was unpacked/);
  });

  it('refuses declared sizes over 2 GB in all, even at a plausible ratio', () => {
    // 25 deflated entries of 1 MB of noise (they do not shrink) whose directory claims 90 MB each:
    // the unzipper would make a 90 MB buffer for each
    let x = 1;
    const noise = new Uint8Array(1024 * 1024).map(() => { x ^= x << 13; x ^= x >>> 17; x ^= x << 5; return x & 0xff; });
    const one = deflatedEntry('image-0.png', noise, 90 * 1024 * 1024);
    const entries: RawEntry[] = Array.from({ length: 25 }, (_, i) => ({ ...one, name: `image-${i}.png` }));
    const zip = rawZip(entries);
    expect(one.stored.length).toBeGreaterThan(1000 * 1024); // about 1:1, so 90 MB is under 100 times it
    expect(25 * 90 * 1024 * 1024).toBeGreaterThan(MAX_UNPACKED_BYTES);
    const read = readBundle(zip);
    expect(read.ok).toBe(false);
    if (!read.ok) expect(read.fault.message).toMatch(/would unpack to 2250 MB, more than the 2048 MB Heed opens at once; save the bundle again without its images/);
  });

  it('keeps the limits as the unzipper itself walks the directory, when the end record shows the guard fewer entries', () => {
    // one deflated MB of zeros listed 61 times; the end record's total count (what the directory
    // reader takes) says 1, its count on this disk (what fflate takes) says 61
    const zip = rawZip([deflatedEntry('a.txt', new Uint8Array(1024 * 1024))], Array.from({ length: 60 }, (_, i) => ({ name: `alias-${i}.txt`, of: 0 })));
    const end = zip.length - 22;
    new DataView(zip.buffer).setUint16(end + 10, 1, true);
    expect(zipBombFault(zip)).toBeNull(); // the directory reader alone is fooled
    const unzipped = unzipBundle(zip);
    expect(unzipped.ok).toBe(false);
    if (!unzipped.ok) expect(unzipped.fault.message).toMatch(/as the unzipper reads them would unpack to more than \d+ (kB|MB): the mark of a zip bomb or a damaged directory/);
  });

  it('names an unreadable zip as such', () => {
    expect(readBundle(new Uint8Array([1, 2, 3])).ok).toBe(false);
    expect(zipBombFault(new TextEncoder().encode('not a zip at all, just text'))?.message).toMatch(/^not a readable zip \(not a zip file/);
  });
});

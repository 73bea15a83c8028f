// Hostile texts inside a study bundle, each refused with its file and line and never a crash:
// JSON nested thousands of levels deep (recursive code would overflow the stack), bytes that are
// not UTF-8 in the chain (the chain hashes text), two entries of one name (unzip programs show
// the first, fflate the last), a text file too large for one string.
import { unzipSync, zipSync } from 'fflate';
import { sha256Hex } from '../../../../src/core/chain';
import { firstNonUtf8Line, nestedDeeperThan, readBundle } from '../../../../src/io/bundle/read';
import { writeBundle } from '../../../../src/io/bundle/write';
import { MAX_TEXT_BYTES, zipBombFault } from '../../../../src/io/bundle/zip-guard';
import { gatherStudySnapshot } from '../../../../src/store/bundle';
import { rawZip, type RawEntry } from '../case-set/hostile-zips';
import { freshDb, readTinyStudy } from '../../support/bundle-study';

const enc = new TextEncoder();
const dec = new TextDecoder();

const bundleFiles = async (): Promise<Record<string, Uint8Array>> => {
  const db = freshDb();
  const { study } = await readTinyStudy(db);
  return unzipSync(writeBundle(await gatherStudySnapshot(db, study.id)));
};

const faultOf = (files: Record<string, Uint8Array>) => {
  const read = readBundle(zipSync(files));
  if (read.ok) throw new Error('expected a fault');
  return read.fault;
};

describe('hostile texts in a study bundle', () => {
  it('refuses an event line nested 10,000 levels deep at its line, not with a stack overflow', async () => {
    const files = await bundleFiles();
    const lines = dec.decode(files['events.jsonl']).split('\n');
    const deep = `{"at":"2026-12-01T10:00:00.000Z","detail":{"x":${'['.repeat(10_000)}${']'.repeat(10_000)}},"hash":"${'0'.repeat(64)}","prev":"${'0'.repeat(64)}","type":"note"}`;
    lines.splice(2, 0, deep);
    files['events.jsonl'] = enc.encode(lines.join('\n'));
    expect(faultOf(files)).toEqual({ file: 'events.jsonl', line: 3, message: expect.stringMatching(/nested too deeply to read/) });
  });

  it('refuses a study.json nested 20,000 levels deep, even with its manifest entry made to match', async () => {
    const files = await bundleFiles();
    const study = dec.decode(files['study.json']).replace('"design": {', `"design": {"extra":${'['.repeat(20_000)}${']'.repeat(20_000)},`);
    files['study.json'] = enc.encode(study);
    const manifest = JSON.parse(dec.decode(files['manifest.json'])) as { files: { path: string; bytes: number; sha256: string }[] };
    const entry = manifest.files.find((f) => f.path === 'study.json')!;
    entry.bytes = files['study.json'].length;
    entry.sha256 = sha256Hex(files['study.json']);
    files['manifest.json'] = enc.encode(JSON.stringify(manifest, null, 2));
    expect(faultOf(files)).toEqual({ file: 'study.json', line: null, message: expect.stringMatching(/nested deeper than 64 levels/) });
  });

  it('refuses bytes that are not UTF-8 in events.jsonl, naming their line', async () => {
    const files = await bundleFiles();
    const body = files['events.jsonl'] as Uint8Array;
    const second = body.indexOf(0x0a) + 1;
    const third = body.indexOf(0x0a, second) + 1;
    const bad = new Uint8Array(body);
    bad[third + 10] = 0xff;
    files['events.jsonl'] = bad;
    expect(faultOf(files)).toEqual({ file: 'events.jsonl', line: 3, message: 'holds bytes that are not UTF-8: the line was edited' });
    expect(firstNonUtf8Line(enc.encode('a\nb\n'))).toBeNull();
    expect(firstNonUtf8Line(new Uint8Array([0x61, 0x0a, 0x62, 0x0a, 0xc3]))).toBe(3);
  });

  it('refuses two entries of one name, whichever copy would be checked', async () => {
    const files = await bundleFiles();
    const entries: RawEntry[] = Object.entries(files).map(([name, bytes]) => ({ name, stored: bytes, method: 0, crc: 0, size: bytes.length }));
    const forged = { ...(entries.find((e) => e.name === 'reads.csv') as RawEntry), stored: enc.encode('forged\n') };
    forged.size = forged.stored.length;
    const read = readBundle(rawZip([forged, ...entries]));
    expect(read.ok).toBe(false);
    if (!read.ok) expect(read.fault).toEqual({ file: 'reads.csv', line: null, message: expect.stringMatching(/two entries with this name/) });
  });

  it('refuses a text file over 500 MB before unpacking it (it would not fit one string)', () => {
    const noise = new Uint8Array(6 * 1024 * 1024).map((_, i) => (i * 2654435761) >>> 24);
    const zip = rawZip([{ name: 'events.jsonl', stored: noise, method: 0, crc: 0, size: MAX_TEXT_BYTES + 1 }]);
    expect(zipBombFault(zip)).toEqual({ file: 'events.jsonl', line: null, message: expect.stringMatching(/more than the 500 MB one text file of a bundle may hold/) });
  });

  it('measures nesting outside strings only', () => {
    expect(nestedDeeperThan('{"a":"[[[[[[[[[["}', 2)).toBe(false);
    expect(nestedDeeperThan('{"a":"\\"[[[","b":[[1]]}', 2)).toBe(true);
    expect(nestedDeeperThan('[[1],[2]]', 2)).toBe(false);
  });
});

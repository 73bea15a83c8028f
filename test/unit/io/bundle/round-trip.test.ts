import { unzipSync } from 'fflate';
import { chainLinks, genesisHash } from '../../../../src/core/chain';
import { readBundle } from '../../../../src/io/bundle/read';
import { ANSWER_EVENTS } from '../../../../src/io/bundle/snapshot';
import { writeBundle } from '../../../../src/io/bundle/write';
import { gatherStudySnapshot, restoreStudy } from '../../../../src/store/bundle';
import { studyReadRows } from '../../../../src/store/read-log-rows';
import { freshDb, readTinyStudy } from '../../support/bundle-study';

const files = (zip: Uint8Array): Record<string, string> => {
  const out: Record<string, string> = {};
  for (const [path, bytes] of Object.entries(unzipSync(zip))) if (!path.startsWith('images/')) out[path] = new TextDecoder().decode(bytes);
  return out;
};

describe('study bundle round trip', () => {
  it('exports, verifies, restores on a fresh database and exports the same files again', async () => {
    const db = freshDb();
    const { study } = await readTinyStudy(db);
    const zip = writeBundle(await gatherStudySnapshot(db, study.id));
    const read = readBundle(zip);
    if (!read.ok) throw new Error(`verify failed: ${read.fault.file} ${read.fault.line} ${read.fault.message}`);
    expect(read.manifest.chain.reads).toBe(8);

    const other = freshDb();
    await expect(restoreStudy(other, read.snapshot)).rejects.toThrow(/not on this workstation.*images/);
    const withImages = readBundle(writeBundle(await gatherStudySnapshot(db, study.id, true)));
    if (!withImages.ok) throw new Error(withImages.fault.message);
    const restored = await restoreStudy(other, withImages.snapshot);
    expect(restored.caseSetImported).toBe(true);
    expect(await studyReadRows(other, study.id)).toEqual(await studyReadRows(db, study.id));
    const again = files(writeBundle(await gatherStudySnapshot(other, study.id)));
    const first = files(zip);
    expect(again['reads.csv']).toBe(first['reads.csv']);
    expect(again['events.jsonl']).toBe(first['events.jsonl']);
    expect(again['study.json']).toBe(first['study.json']);
    expect(again['manifest.json']).toBe(first['manifest.json']);
    // the stored reads keep the hashes of the events that committed them
    const storedHashes = (await other.reads.toArray()).map((r) => r.hash).sort();
    const csvHashes = first['reads.csv']!.trim().split('\n').slice(1).map((l) => l.split(',').at(-1)).sort();
    expect(storedHashes).toEqual(csvHashes);
    await expect(restoreStudy(other, withImages.snapshot)).rejects.toThrow(/already on this workstation/);
  });

  it('verifies a bundle of a study with no answers yet (reads.csv holds its header only)', async () => {
    const db = freshDb();
    const { study } = await readTinyStudy(db);
    const full = await gatherStudySnapshot(db, study.id);
    const events = chainLinks(genesisHash(study.id), full.events.filter((e) => !ANSWER_EVENTS.has(e.type)));
    const zip = writeBundle({ ...full, events });
    const read = readBundle(zip);
    if (!read.ok) throw new Error(`verify failed: ${read.fault.file} ${read.fault.line} ${read.fault.message}`);
    expect(read.manifest.chain.reads).toBe(0);
    expect(files(zip)['reads.csv']!.split('\n')).toHaveLength(2);
  });
});

import 'fake-indexeddb/auto';
import { encode } from 'fast-png';
import { memorySource } from '../../../src/io/case-set/memory-source';
import { readCaseSet } from '../../../src/io/case-set/read-case-set';
import { saveCaseSet } from '../../../src/store/case-sets';
import { renameCaseSet } from '../../../src/store/case-set-lifecycle';
import { openHeedDb } from '../../../src/store/db';
import { importCaseSet } from '../../../src/store/import-case-set';

// whole PNGs (validation reads every image's structure); k changes one pixel byte
const PNG = (k: number) => encode({ width: 2, height: 2, data: new Uint8Array([0, 80, 160, k]), depth: 8, channels: 1 });
const files = (k = 1): Record<string, Uint8Array | string> => ({
  'cases.csv': 'case_id,finding,truth,image,model_score\na1,mass,1,i/a1.png,0.9\na2,mass,0,i/a2.png,0.2\n', 'i/a1.png': PNG(k), 'i/a2.png': PNG(2),
});

let n = 0;
const fresh = () => openHeedDb(`heed-dup-${process.pid}-${++n}`);

describe('importing the same case set twice', () => {
  it('refuses the second import, naming the stored set (also after a rename or from another folder name), storing nothing', async () => {
    const db = fresh();
    const first = await importCaseSet(db, memorySource(files(), 'harbour'));
    if (!first.ok) throw new Error('first import refused');
    await renameCaseSet(db, first.caseSet.id, 'Harbour March');
    const before = JSON.stringify([await db.caseSets.toArray(), await db.images.count(), await db.events.count()]);
    for (const label of ['harbour', 'harbour-copy']) {
      const again = await importCaseSet(db, memorySource(files(), label));
      expect(again.ok).toBe(false);
      if (again.ok) return;
      expect(again.duplicateOf).toBe(first.caseSet.id);
      expect(again.problems[0]?.message).toMatch(/same cases and images as the stored case set “Harbour March”/);
      expect(JSON.stringify([await db.caseSets.toArray(), await db.images.count(), await db.events.count()])).toBe(before);
    }
  });

  it('takes a set that differs by one image byte', async () => {
    const db = fresh();
    expect((await importCaseSet(db, memorySource(files(1), 'a'))).ok).toBe(true);
    expect((await importCaseSet(db, memorySource(files(9), 'a'))).ok).toBe(true);
    expect(await db.caseSets.count()).toBe(2);
  });

  it('recognises a set stored before fingerprints existed', async () => {
    const db = fresh();
    const read = await readCaseSet(memorySource(files(), 'old'));
    if (!read.ok) throw new Error('fixture refused');
    const old = await saveCaseSet(db, { name: 'old', source: 'import', manifest: read.manifest, images: read.images });
    expect(old.contentHash).toBeUndefined();
    const again = await importCaseSet(db, memorySource(files(), 'old'));
    expect(!again.ok && again.duplicateOf).toBe(old.id);
  });
});

import 'fake-indexeddb/auto';
import { encode } from 'fast-png';
import { memorySource } from '../../../src/io/case-set/memory-source';
import { openHeedDb } from '../../../src/store/db';
import { importCaseSet, problemLine } from '../../../src/store/import-case-set';

// a whole PNG: validation reads every image's structure, so a bare signature is refused
const PNG = encode({ width: 2, height: 2, data: new Uint8Array([0, 80, 160, 255]), depth: 8, channels: 1 });
const csv = (rows: string[]) => ['case_id,finding,truth,image,model_score,case_site', ...rows].join('\n');

/** Everything the database holds, to compare before and after a refused import. */
const snapshot = async (db: ReturnType<typeof openHeedDb>) => JSON.stringify({
  sets: await db.caseSets.toArray(), images: (await db.images.toArray()).map((i) => [i.setId, i.path]), events: await db.events.count(),
});

describe('importing a case set', () => {
  it('stores a valid set with its images and a summary', async () => {
    const db = openHeedDb(`heed-import-${process.pid}-ok`);
    const outcome = await importCaseSet(db, memorySource({ 'cases.csv': csv(['a1,mass,1,i/a1.png,0.9,north', 'a2,mass,0,i/a2.png,0.2,south']), 'i/a1.png': PNG, 'i/a2.png': PNG }, 'good-set'));
    expect(outcome.ok).toBe(true);
    expect(await db.images.count()).toBe(2);
  });

  it('leaves the database exactly as it was after each kind of refusal', async () => {
    const db = openHeedDb(`heed-import-${process.pid}-bad`);
    await importCaseSet(db, memorySource({ 'cases.csv': csv(['a1,mass,1,i/a1.png,0.9,north']), 'i/a1.png': PNG }, 'first'));
    const before = await snapshot(db);
    const bad: Record<string, Record<string, Uint8Array | string>> = {
      badBit: { 'cases.csv': csv(['b1,mass,2,i/b1.png,0.5,north']), 'i/b1.png': PNG },
      missingImage: { 'cases.csv': csv(['b1,mass,1,i/nope.png,0.5,north']) },
      fakeImage: { 'cases.csv': csv(['b1,mass,1,i/b1.png,0.5,north']), 'i/b1.png': 'not an image' },
      escape: { 'cases.csv': csv(['b1,mass,1,../b1.png,0.5,north']) },
      score: { 'cases.csv': csv(['b1,mass,1,i/b1.png,1.5,north']), 'i/b1.png': PNG },
    };
    for (const [name, files] of Object.entries(bad)) {
      const outcome = await importCaseSet(db, memorySource(files, name));
      expect(outcome.ok, name).toBe(false);
      if (!outcome.ok) expect(problemLine(name, outcome.problems[0]!)).toMatch(new RegExp(`^${name}/`));
      expect(await snapshot(db), name).toBe(before);
    }
  });
});

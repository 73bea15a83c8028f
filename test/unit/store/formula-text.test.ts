// Typed text that a spreadsheet could run as a formula is refused: reader codes and study names.
import 'fake-indexeddb/auto';
import { openHeedDb } from '../../../src/store/db';
import { saveCaseSet } from '../../../src/store/case-sets';
import { readerCodeProblem } from '../../../src/store/readers';
import { createStudy } from '../../../src/store/studies';
import { tinyDesign, tinyImages, tinyManifest, tinySuggestions } from '../support/tiny-study';

describe('formula-looking typed text', () => {
  it('refuses a reader code starting with - or = (even after spaces), keeps R-01', () => {
    expect(readerCodeProblem('-R01')).toBe('Reader code "-R01" starts with "-", which a spreadsheet could run as a formula; remove or change the first character.');
    expect(readerCodeProblem('  =1+1')).toMatch(/^Reader code "=1\+1" starts with "="/);
    expect(readerCodeProblem('\t@x')).toMatch(/starts with a tab/);
    expect(readerCodeProblem('R-01')).toBeNull();
  });

  it('refuses a study name starting with @ and stores nothing', async () => {
    const db = openHeedDb(`heed-formula-${process.pid}`);
    const manifest = tinyManifest();
    const set = await saveCaseSet(db, { name: 'tiny', source: 'demo', manifest, images: tinyImages(manifest) });
    const input = { name: '@SUM(A1:A9)', caseSetId: set.id, design: tinyDesign(), suggestions: tinySuggestions(manifest) };
    await expect(createStudy(db, input)).rejects.toThrow('Study name "@SUM(A1:A9)" starts with "@", which a spreadsheet could run as a formula');
    expect(await db.studies.count()).toBe(0);
    db.close();
  });
});

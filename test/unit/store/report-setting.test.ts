import 'fake-indexeddb/auto';
import { openHeedDb } from '../../../src/store/db';
import { saveCaseSet } from '../../../src/store/case-sets';
import { setShowReportToReader } from '../../../src/store/report-setting';
import { createStudy, getStudy } from '../../../src/store/studies';
import { tinyDesign, tinyImages, tinyManifest, tinySuggestions } from '../support/tiny-study';

describe('the study setting "show readers their report at the end"', () => {
  it('is off for a study that never set it, and is stored on the study record without a schema change', async () => {
    const db = openHeedDb(`report-setting-${crypto.randomUUID()}`);
    const manifest = tinyManifest();
    const set = await saveCaseSet(db, { name: 'tiny', source: 'demo', manifest, images: tinyImages(manifest) });
    const study = await createStudy(db, { name: 'S', caseSetId: set.id, design: tinyDesign(), suggestions: tinySuggestions(manifest) });
    expect((await getStudy(db, study.id)).showReportToReader).toBeUndefined();
    await setShowReportToReader(db, study.id, true);
    expect((await getStudy(db, study.id)).showReportToReader).toBe(true);
    await setShowReportToReader(db, study.id, false);
    const after = await getStudy(db, study.id);
    expect(after.showReportToReader).toBe(false);
    expect(after.design).toEqual(study.design); // nothing else changed
    await expect(setShowReportToReader(db, 'no-such-study', true)).rejects.toThrow(/no study with id no-such-study/);
    db.close();
  });
});

// A tiny study read to the end by two readers through the store's own commit, for bundle tests.
import 'fake-indexeddb/auto';
import { openHeedDb, type HeedDb } from '../../../src/store/db';
import { saveCaseSet } from '../../../src/store/case-sets';
import { enrolReader } from '../../../src/store/readers';
import { createStudy } from '../../../src/store/studies';
import { commitAnswer, startSession } from '../../../src/store/sessions';
import { tinyDesign, tinyImages, tinyItems, tinyManifest, tinySuggestions } from './tiny-study';

let counter = 0;
export const freshDb = (): HeedDb => openHeedDb(`heed-bundle-test-${process.pid}-${++counter}`);

export const readTinyStudy = async (db: HeedDb) => {
  const manifest = tinyManifest();
  const set = await saveCaseSet(db, { name: 'tiny', source: 'demo', manifest, images: tinyImages(manifest) });
  const study = await createStudy(db, { name: 'Bundle study', caseSetId: set.id, design: tinyDesign(), suggestions: tinySuggestions(manifest) });
  for (const [r, code] of ['R01', 'R02'].entries()) {
    const reader = await enrolReader(db, study.id, { code, role: 'radiologist', years: 3 + r }, () => r);
    const session = await startSession(db, { study, readerId: reader.id, period: 1, items: tinyItems(manifest, 'sequential'), orderSeed: 's', override: null });
    const base = { session, findings: ['target'], suggestion: { call: 1 as const, score: 0.7, planted: false }, cautionShown: false };
    for (let i = 0; i < manifest.cases.length; i++) {
      const shownAt = `2026-12-01T10:0${i}:00.000Z`;
      await commitAnswer(db, { ...base, shownAt, step: { itemIndex: i, finding: 'target', phase: 'initial' }, call: (i % 2) as 0 | 1, confidence: 40 + i, ms: 900 + i });
      await commitAnswer(db, { ...base, shownAt, step: { itemIndex: i, finding: 'target', phase: 'final' }, call: ((i + r) % 2) as 0 | 1, confidence: 60 + i, ms: 1500 + i });
    }
  }
  return { manifest, set, study };
};

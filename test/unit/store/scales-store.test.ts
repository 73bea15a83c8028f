// Ratings and training through the store: a committed rating lands in the read log row with its
// scale and the training flag; a study stored before scales existed reads as call-confidence.
import 'fake-indexeddb/auto';
import { defaultAnswerScale } from '../../../src/core/answer-scale';
import { openHeedDb, type HeedDb } from '../../../src/store/db';
import { saveCaseSet } from '../../../src/store/case-sets';
import { readLogCsv } from '../../../src/io/read-log-export';
import { parseReadLog } from '../../../src/io/read-log-parse';
import { studyReadRows } from '../../../src/store/read-log-rows';
import { commitAnswer } from '../../../src/store/sessions';
import { getStudy, listStudies } from '../../../src/store/studies';
import { createStudyFromDesign, enrolInStudy, openPeriod } from '../../../src/store/study-service';
import { tinyDesign, tinyImages, tinyManifest } from '../support/tiny-study';

let n = 0;
const fresh = (): HeedDb => openHeedDb(`heed-scales-${process.pid}-${++n}`);

describe('ratings and training in the store', () => {
  it('exports the committed ratings, the scale and training = 1, and parses back the same', async () => {
    const db = fresh();
    const manifest = tinyManifest(5);
    const set = await saveCaseSet(db, { name: 'tiny', source: 'import', manifest, images: tinyImages(manifest) });
    const design = { ...tinyDesign(), answerScale: defaultAnswerScale('five-point'), training: true };
    const study = await createStudyFromDesign(db, 'Five', set.id, design);
    const reader = await enrolInStudy(db, study, { code: 'R1', role: 'radiologist', years: 3 });
    const opened = await openPeriod(db, study, reader, 1, null);
    if (!opened.open) throw new Error(opened.message);
    const { session } = opened;
    const ratings = [5, 1, 4, 2, 3];
    for (let i = 0; i < session.items.length; i++) {
      const item = session.items[i]!;
      const steps = item.assistance === 'sequential' ? (['initial', 'final'] as const) : (['final'] as const);
      for (const phase of steps) {
        const rating = phase === 'initial' ? 3 : ratings[i]!;
        await commitAnswer(db, {
          session, findings: design.findings, step: { itemIndex: i, finding: 'target', phase }, call: rating >= 4 ? 1 : 0, confidence: null, rating, ms: 10,
          shownAt: new Date().toISOString(), suggestion: item.assistance === 'none' ? null : { call: 1, score: 0.6, planted: false }, cautionShown: false,
        });
      }
    }
    const rows = await studyReadRows(db, study.id);
    expect(rows.map((r) => r.final_rating)).toEqual(session.items.map((_, i) => ratings[i]));
    expect(rows.every((r) => r.scale === 'five-point' && r.training === 1 && r.withdrawn === 0)).toBe(true);
    expect(rows.map((r) => r.final_call)).toEqual(session.items.map((_, i) => (ratings[i]! >= 4 ? 1 : 0)));
    expect(parseReadLog(readLogCsv(rows, ['scanner']))).toEqual(rows);
  });
  it('reads a study stored without answerScale or training as call-confidence, not training', async () => {
    const db = fresh();
    const manifest = tinyManifest(3);
    const set = await saveCaseSet(db, { name: 'tiny', source: 'import', manifest, images: tinyImages(manifest) });
    const study = await createStudyFromDesign(db, 'Old', set.id, tinyDesign());
    const { answerScale: _scale, training: _training, ...oldDesign } = study.design;
    await db.studies.put({ ...study, design: oldDesign as typeof study.design });
    expect((await db.studies.get(study.id))?.design.answerScale).toBeUndefined();
    expect((await getStudy(db, study.id)).design).toMatchObject({ answerScale: { kind: 'call-confidence' }, training: false });
    expect((await listStudies(db))[0]?.design.answerScale.kind).toBe('call-confidence');
  });
});

// The reading view's counter and the truth shown after a case (pure parts of the reading view).
import { progressLabel } from '../../../src/ui/reading/progress-label';
import { shouldShowTruth, truthLines } from '../../../src/ui/reading/truth-feedback';
import type { CaseRecord } from '../../../src/core/case-set';
import type { StoredRead } from '../../../src/store/records';

const items = [true, true, false, false, false].map((practice) => ({ practice }));

describe('progressLabel', () => {
  it('counts practice and main cases apart and marks the first main case', () => {
    expect(items.map((_, i) => progressLabel(items, i).text)).toEqual(['Practice 1 of 2', 'Practice 2 of 2', 'Case 1 of 3', 'Case 2 of 3', 'Case 3 of 3']);
    expect(items.map((_, i) => progressLabel(items, i).firstMainAfterPractice)).toEqual([false, false, true, false, false]);
  });
  it('announces nothing when there is no practice', () => {
    const main = [{ practice: false }, { practice: false }];
    expect(progressLabel(main, 0)).toEqual({ text: 'Case 1 of 2', practice: false, firstMainAfterPractice: false });
  });
});

describe('the truth after a case', () => {
  const read = (finding: string, final: 0 | 1, aiCall: 0 | 1 | null): StoredRead => ({
    id: `s/C1/${finding}`, sessionId: 's', studyId: 'st', readerId: 'r', period: 1, caseId: 'C1', finding,
    initial: null, final: { call: final, confidence: 70, ms: 1000 }, shownAt: '2026-01-01T00:00:00Z',
    aiCall, aiScore: null, aiPlanted: false, cautionShown: false,
  });
  const caseRecord: CaseRecord = {
    caseId: 'C1', images: ['a.png'], practice: false, attributes: {},
    findings: [{ finding: 'mass', truth: 1, modelScore: null, modelCall: null }, { finding: 'calc', truth: 0, modelScore: null, modelCall: null }],
  };
  it('is shown in training studies and on practice cases only', () => {
    expect([shouldShowTruth(true, false), shouldShowTruth(false, true), shouldShowTruth(false, false)]).toEqual([true, true, false]);
  });
  it('says per finding the truth, whether the answer was right, and whether the suggestion was right and followed', () => {
    const lines = truthLines(caseRecord, [read('calc', 1, 1), read('mass', 1, 0)], ['mass', 'calc']);
    expect(lines).toEqual([
      { finding: 'mass', truth: 1, finalCall: 1, rating: null, right: true, suggestion: { call: 0, right: false, followed: false } },
      { finding: 'calc', truth: 0, finalCall: 1, rating: null, right: false, suggestion: { call: 1, right: false, followed: true } },
    ]);
    expect(truthLines(caseRecord, [read('mass', 0, null)], ['mass'])[0]?.suggestion).toBeNull();
  });
});

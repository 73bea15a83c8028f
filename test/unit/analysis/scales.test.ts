// Answer scales in the analysis: the rating is the ROC score (ranks only), Brier and calibration
// only on a probability scale, weight of advice not on five-point; training and withdrawn reads
// kept out of the statistics and counted. Expected values are worked by hand in the comments.
import { analyzeReads } from '../../../src/analysis/engine';
import { finalLikelihood, finalScore, initialScore } from '../../../src/analysis/read-scores';
import { conditionSection } from '../../../src/analysis/condition-section';
import { sequentialSection } from '../../../src/analysis/sequential';
import type { ReadRow } from '../../../src/core/read-log';
import { makeRead, sequentialRead } from './make-read';

const fivePoint = (caseId: string, truth: 0 | 1, rating: number, over: Partial<ReadRow> = {}): ReadRow =>
  makeRead({ case_id: caseId, truth, scale: 'five-point', final_rating: rating, final_call: rating >= 4 ? 1 : 0, final_confidence: null, ...over });

// positives rated 5, 4, 3, 5; negatives rated 1, 2, 3, 4 (by hand: Mann-Whitney, ties count one half)
//   5 beats all 4 negatives: 4; 4 beats 1,2,3 and ties 4: 3.5; 3 beats 1,2 and ties 3: 2.5; 5: 4
//   AUC = (4 + 3.5 + 2.5 + 4) / 16 = 14/16 = 0.875
const FIVE = [
  fivePoint('P1', 1, 5), fivePoint('P2', 1, 4), fivePoint('P3', 1, 3), fivePoint('P4', 1, 5),
  fivePoint('N1', 0, 1), fivePoint('N2', 0, 2), fivePoint('N3', 0, 3), fivePoint('N4', 0, 4),
];

describe('scores of each scale', () => {
  it('call-confidence: the derived score (50 ± confidence/2)', () => {
    expect(finalScore(makeRead({ final_call: 1, final_confidence: 80 }))).toBe(90);
    expect(finalScore(makeRead({ final_call: 0, final_confidence: 80 }))).toBe(10);
    expect(finalLikelihood(makeRead({ final_call: 0, final_confidence: 80 }))).toBe(10);
  });
  it('five-point: the rating, with no likelihood', () => {
    const r = fivePoint('C1', 1, 2);
    expect(finalScore(r)).toBe(2);
    expect(finalLikelihood(r)).toBeNull();
    expect(initialScore(sequentialRead(1, 0, 1, 1, { scale: 'five-point', initial_rating: 3, final_rating: 4 }))).toBe(3);
  });
  it('percent: the rating, which is also the likelihood', () => {
    const r = makeRead({ scale: 'percent', final_rating: 35, final_call: 0, final_confidence: null });
    expect(finalScore(r)).toBe(35);
    expect(finalLikelihood(r)).toBe(35);
  });
});

describe('condition section on rating scales', () => {
  it('five-point: AUC of the ratings equals the Mann-Whitney count by hand; no Brier or calibration', () => {
    const s = conditionSection(FIVE);
    expect(s?.auc.estimate).toBeCloseTo(0.875, 12);
    expect(s?.brier).toBeNull();
    expect(s?.calibration).toBeNull();
    // calls from the threshold 4: positives called 5,4,5 present → sensitivity 3/4; negatives 1,2,3 absent → specificity 3/4
    expect(s?.sensitivity.k).toBe(3);
    expect(s?.specificity.k).toBe(3);
  });
  it('percent: Brier of rating/100 by hand, and calibration computed', () => {
    // ratings 90 (y=1), 20 (y=0), 60 (y=0): ((0.1)² + (0.2)² + (0.6)²)/3 = (0.01 + 0.04 + 0.36)/3 = 0.41/3
    const reads = [
      makeRead({ case_id: 'A', truth: 1, scale: 'percent', final_rating: 90, final_call: 1, final_confidence: null }),
      makeRead({ case_id: 'B', truth: 0, scale: 'percent', final_rating: 20, final_call: 0, final_confidence: null }),
      makeRead({ case_id: 'C', truth: 0, scale: 'percent', final_rating: 60, final_call: 1, final_confidence: null }),
    ];
    const s = conditionSection(reads);
    expect(s?.brier).toBeCloseTo(0.41 / 3, 12);
    expect(s?.calibration?.bins[9]?.n).toBe(1);
    // AUC: the positive (90) beats both negatives: 1
    expect(s?.auc.estimate).toBe(1);
  });
  it('a five-point read among probability reads turns Brier and calibration off', () => {
    const s = conditionSection([makeRead(), FIVE[4] as ReadRow]);
    expect(s?.brier).toBeNull();
    expect(s?.calibration).toBeNull();
  });
  it('weight of advice leaves five-point reads out and keeps percent reads', () => {
    const five = sequentialSection([sequentialRead(1, 0, 1, 1, { scale: 'five-point', initial_rating: 2, final_rating: 4, final_confidence: null, initial_confidence: null })]);
    expect(five?.woa.n).toBe(0);
    // percent: s0 = 20, s = 50, p = 0.8 → w = (50 − 20)/(80 − 20) = 0.5
    const pct = sequentialSection([sequentialRead(1, 0, 1, 1, { scale: 'percent', initial_rating: 20, final_rating: 50, ai_score: 0.8, final_confidence: null, initial_confidence: null })]);
    expect(pct?.woa.n).toBe(1);
    expect(pct?.woa.mean).toBeCloseTo(0.5, 12);
  });
});

describe('training and withdrawn reads', () => {
  const base = FIVE.map((r) => ({ ...r, reader_id: 'R1' }));
  const training = FIVE.map((r) => ({ ...r, reader_id: 'R2', training: 1 as const }));
  const withdrawn = FIVE.map((r) => ({ ...r, reader_id: 'R3', withdrawn: 1 as const }));
  const practice = [{ ...FIVE[0] as ReadRow, reader_id: 'R1', case_id: 'PR', practice: 1 as const, training: 1 as const }];
  const rows = [...base, ...training, ...withdrawn, ...practice];
  it('keeps training and withdrawn reads out by default and counts each', () => {
    const report = analyzeReads(rows, { boot: 0 });
    expect(report.readers.map((r) => r.reader_id)).toEqual(['R1']);
    expect(report.group).toMatchObject({ reads: 8, practice_excluded: 1, training_excluded: 8, withdrawn_excluded: 8, include_withdrawn: false });
  });
  it('includes withdrawn readers on request, never training reads', () => {
    const report = analyzeReads(rows, { boot: 0, includeWithdrawn: true });
    expect(report.readers.map((r) => r.reader_id)).toEqual(['R1', 'R3']);
    expect(report.group).toMatchObject({ reads: 16, training_excluded: 8, withdrawn_excluded: 0, include_withdrawn: true });
  });
});

describe('external rating logs', () => {
  it('analyses ratings without suggestions: performance only, reliance null, with a note', () => {
    const report = analyzeReads(FIVE, { boot: 0 });
    const r = report.readers[0];
    expect(r?.unaided?.auc.estimate).toBeCloseTo(0.875, 12);
    expect(r?.aided).toBeNull();
    expect(r?.sequential).toBeNull();
    expect(report.group.note).toMatch(/No suggestion was shown.*external rating log.*reliance sections are null/);
  });
  it('has no note when suggestions were shown', () => {
    const report = analyzeReads([makeRead(), sequentialRead(1, 1, 1, 1, { case_id: 'C2' })], { boot: 0 });
    expect(report.group.note).toBeNull();
  });
});

// The reader report's own summaries of a reader's rows, checked against counts worked by hand
// on small examples written out here (the arithmetic is beside each check). The Wilson
// intervals themselves are checked against Newcombe (1998) in test/unit/analysis.
import { describe, expect, it } from 'vitest';
import { caseReview } from '../../../../src/analysis/reader-report/case-review';
import { confidenceCalibration } from '../../../../src/analysis/reader-report/confidence-calibration';
import { followedConfidence } from '../../../../src/analysis/reader-report/followed-confidence';
import { readerComplete } from '../../../../src/analysis/reader-report/log-completion';
import { peerRange } from '../../../../src/analysis/reader-report/peer-range';
import { scoreBands } from '../../../../src/analysis/reader-report/score-bands';
import { switchingSplit } from '../../../../src/analysis/reader-report/switching-split';
import { sequentialSection } from '../../../../src/analysis/sequential';
import { aided, makeRead, sequentialRead } from '../make-read';

describe('confidenceCalibration', () => {
  // Unaided reads: (confidence, right?) = (10, yes) (15, no) (50, yes) x3 (100, yes) (85, no), one without confidence.
  const reads = [
    makeRead({ final_confidence: 10, truth: 1, final_call: 1 }),
    makeRead({ final_confidence: 15, truth: 1, final_call: 0 }),
    makeRead({ final_confidence: 50, truth: 0, final_call: 0 }),
    makeRead({ final_confidence: 50, truth: 1, final_call: 1 }),
    makeRead({ final_confidence: 50, truth: 1, final_call: 1 }),
    makeRead({ final_confidence: 100, truth: 0, final_call: 0 }),
    makeRead({ final_confidence: 85, truth: 0, final_call: 1 }),
    makeRead({ final_confidence: null, truth: 0, final_call: 1 }),
  ];
  const bins = confidenceCalibration(reads);
  it('bins stated confidence in fifths, the last closed, and leaves out reads without one', () => {
    expect(bins.map((b) => [b.lower, b.upper, b.n])).toEqual([[0, 20, 2], [20, 40, 0], [40, 60, 3], [60, 80, 0], [80, 100, 2]]);
  });
  it('gives the share right and the share a calibrated reader would have (by hand)', () => {
    // [0,20): mean (10+15)/2 = 12.5 → expected 0.5 + 12.5/200 = 0.5625; right 1 of 2
    expect(bins[0]).toMatchObject({ mean_confidence: 12.5, right: { k: 1, n: 2, estimate: 0.5 } });
    expect(bins[0]?.expected_right).toBeCloseTo(0.5625, 12);
    // [40,60): mean 50 → expected 0.75; right 3 of 3
    expect(bins[2]).toMatchObject({ mean_confidence: 50, expected_right: 0.75, right: { k: 3, n: 3, estimate: 1 } });
    // [80,100]: 100 falls in the last bin; mean (100+85)/2 = 92.5 → expected 0.9625; right 1 of 2
    expect(bins[4]).toMatchObject({ mean_confidence: 92.5, right: { k: 1, n: 2 } });
    expect(bins[4]?.expected_right).toBeCloseTo(0.9625, 12);
    expect(bins[1]).toMatchObject({ mean_confidence: null, expected_right: null, right: { n: 0, estimate: null } });
  });
  it('refuses a confidence outside 0..100', () => {
    expect(() => confidenceCalibration([makeRead({ final_confidence: 101 })])).toThrow(RangeError);
  });
});

describe('scoreBands', () => {
  // (score, suggestion right?, followed?) → band
  const reads = [
    aided(1, 1, 1, { ai_score: 0.05 }), // right, followed → [0,0.2) right 1/1
    aided(0, 1, 1, { ai_score: 0.15 }), // wrong, followed → [0,0.2) wrong 1/1
    aided(1, 1, 0, { ai_score: 0.2 }), // right, not followed; 0.2 opens [0.2,0.4) → right 0/1
    aided(0, 1, 0, { ai_score: 0.6 }), // wrong, not followed; 0.6 opens [0.6,0.8) → wrong 0/1
    aided(0, 1, 0, { ai_score: 0.95 }), // wrong, not followed → [0.8,1] wrong
    aided(1, 0, 0, { ai_score: 0.99 }), // suggestion 0, truth 1: wrong, followed → [0.8,1] wrong
    aided(1, 1, 1, { ai_score: 1 }), // 1 falls in the last band: right, followed
    makeRead(), // unaided: left out
  ];
  const bands = scoreBands(reads);
  it('counts reads following the suggestion per band, right and wrong apart (by hand)', () => {
    expect(bands.map((b) => [b.followed_right.k, b.followed_right.n, b.followed_wrong.k, b.followed_wrong.n])).toEqual([
      [1, 1, 1, 1],
      [0, 1, 0, 0],
      [0, 0, 0, 0],
      [0, 0, 0, 1],
      [1, 1, 1, 2],
    ]);
    expect(bands.map((b) => b.lower)).toEqual([0, 0.2, 0.4, 0.6, 0.8]);
  });
});

describe('switchingSplit', () => {
  // (truth, first call, suggestion, final) → group and outcome, worked by hand
  const reads = [
    sequentialRead(1, 0, 1, 1), // suggestion right; first wrong, final right → better
    sequentialRead(1, 1, 1, 1), // suggestion right; kept
    sequentialRead(0, 0, 1, 1), // suggestion wrong; first right, final wrong → worse
    sequentialRead(0, 0, 1, 0), // suggestion wrong; kept
    sequentialRead(0, 1, 0, 0), // suggestion right; first wrong, final right → better
    sequentialRead(1, 1, 0, 1), // suggestion wrong; kept
    aided(1, 1, 1), // concurrent: not sequential, left out
  ];
  const split = switchingSplit(reads);
  it('splits kept / better / worse by whether the suggestion was right', () => {
    expect(split).toEqual({ suggestion_right: { n: 3, kept: 1, better: 2, worse: 0 }, suggestion_wrong: { n: 3, kept: 2, better: 0, worse: 1 } });
  });
  it('sums to the analysis engine’s beneficial and detrimental counts', () => {
    const seq = sequentialSection(reads);
    expect((split?.suggestion_right.better ?? 0) + (split?.suggestion_wrong.better ?? 0)).toBe(seq?.beneficial.k);
    expect((split?.suggestion_right.worse ?? 0) + (split?.suggestion_wrong.worse ?? 0)).toBe(seq?.detrimental.k);
    expect(seq?.beneficial.k).toBe(2);
  });
  it('is null without sequential reads', () => {
    expect(switchingSplit([aided(1, 1, 1)])).toBeNull();
  });
});

describe('followedConfidence', () => {
  it('averages confidence when following a wrong and a right suggestion (by hand: (60+80)/2 = 70; 90)', () => {
    const f = followedConfidence([
      aided(0, 1, 1, { final_confidence: 60 }),
      aided(1, 0, 0, { final_confidence: 80 }),
      aided(1, 1, 1, { final_confidence: 90 }),
      aided(1, 1, 0, { final_confidence: 10 }), // not followed: left out
      aided(0, 1, 1, { final_confidence: null }), // no confidence: left out
    ]);
    expect(f).toEqual({ wrong: { n: 2, mean: 70 }, right: { n: 1, mean: 90 } });
  });
});

describe('caseReview', () => {
  it('lists reads that followed a wrong suggestion or went against a right one, in period and reading order', () => {
    const items = caseReview([
      aided(1, 1, 1, { case_id: 'A', order: 1 }), // followed right: not listed
      aided(0, 1, 1, { case_id: 'B', order: 3 }), // followed wrong
      aided(1, 1, 0, { case_id: 'C', order: 2 }), // rejected right
      aided(0, 1, 0, { case_id: 'D', order: 4 }), // rejected wrong: not listed
      aided(0, 1, 1, { case_id: 'E', order: 1, practice: 1 }), // practice: never listed
      makeRead({ case_id: 'F' }), // unaided
    ]);
    expect(items.map((i) => [i.case_id, i.kind])).toEqual([['C', 'rejected-right'], ['B', 'followed-wrong']]);
  });
});

describe('peerRange', () => {
  it('gives median and range of 3 or more values (median as numpy.median: middle value, or mean of the two middle)', () => {
    expect(peerRange([0.97, 0.5, 0.34])).toMatchObject({ count: 3, values: [0.34, 0.5, 0.97], median: 0.5, min: 0.34, max: 0.97, note: null });
    expect(peerRange([1, 0.2, 0.6, 0.4])?.median).toBeCloseTo(0.5, 12);
  });
  it('shows nothing of fewer than 3 other readers and says why', () => {
    const r = peerRange([0.2, 0.9]);
    expect(r).toMatchObject({ count: 2, values: [], median: null, min: null, max: null });
    expect(r.note).toMatch(/only 2 other readers .* fewer than 3/);
  });
});

describe('readerComplete', () => {
  const period = (reader: string, p: number, n: number) => Array.from({ length: n }, (_, i) => makeRead({ reader_id: reader, period: p, case_id: `C${i}` }));
  it('is true when the reader has every period with as many reads as any reader there', () => {
    const rows = [...period('R1', 1, 3), ...period('R1', 2, 3), ...period('R2', 1, 3), ...period('R2', 2, 2)];
    expect(readerComplete(rows, 'R1')).toBe(true);
    expect(readerComplete(rows, 'R2')).toBe(false);
    expect(readerComplete([...period('R1', 1, 3), ...period('R2', 1, 3), ...period('R2', 2, 3)], 'R1')).toBe(false);
    expect(readerComplete(rows, 'R9')).toBe(false);
  });
});

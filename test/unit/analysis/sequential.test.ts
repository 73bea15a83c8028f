import { reliance } from '../../../src/analysis/reliance';
import { sequentialSection } from '../../../src/analysis/sequential';
import { aided, sequentialRead } from './make-read';

// docs/methods.md sequential definitions (RAIR/RSR per Schemmer et al. 2023), counted by hand.
describe('sequentialSection', () => {
  // (truth, d0, ai, final)
  const reads = [
    sequentialRead(1, 0, 1, 1), // changed, toward, beneficial; RAIR case, reliant
    sequentialRead(1, 0, 1, 0), // RAIR case, not reliant
    sequentialRead(1, 1, 0, 1), // RSR case, self-reliant
    sequentialRead(1, 1, 0, 0), // changed, toward, detrimental; RSR case, not
    sequentialRead(0, 0, 0, 0), // nothing
  ];
  const s = sequentialSection(reads);
  it('counts changes and their direction', () => {
    expect(s?.n).toBe(5);
    expect(s?.changed.k).toBe(2);
    expect(s?.toward_ai.k).toBe(2);
    expect(s?.beneficial.k).toBe(1);
    expect(s?.detrimental.k).toBe(1);
  });
  it('gives RAIR and RSR', () => {
    expect(s?.rair).toMatchObject({ k: 1, n: 2, estimate: 0.5 });
    expect(s?.rsr).toMatchObject({ k: 1, n: 2, estimate: 0.5 });
  });
  it('computes weight of advice from the derived scores', () => {
    // read 1: s0 = 50 − 60/2 = 20, s = 50 + 80/2 = 90, advice 80 → w = 70/60 → 1
    const one = sequentialSection([sequentialRead(1, 0, 1, 1)]);
    expect(one?.woa).toEqual({ n: 1, mean: 1, median: 1 });
    // s0 = 20, s = 50 (final 1 at confidence 0), advice 80 → w = 30/60 = 0.5
    const half = sequentialSection([sequentialRead(1, 0, 1, 1, { final_confidence: 0 })]);
    expect(half?.woa.mean).toBeCloseTo(0.5, 12);
  });
  it('gives the signed and absolute weight of advice, and keeps woa as the signed form', () => {
    // truth 1, first call 1 at confidence 20 → s0 = 50 + 20/2 = 60; suggestion 0.9 → 90;
    // final call 1 at confidence 0 → s = 50: moved 10 away from the advice, gap 90 − 60 = 30.
    // signed −10/30 → truncated to 0; absolute 10/30 = 1/3.
    const away = sequentialSection([sequentialRead(1, 1, 1, 1, { initial_confidence: 20, ai_score: 0.9, final_confidence: 0 })]);
    expect(away?.woa_signed).toEqual({ n: 1, mean: 0, median: 0 });
    expect(away?.woa_absolute.mean).toBeCloseTo(1 / 3, 12);
    expect(away?.woa).toEqual(away?.woa_signed);
  });
  it('is null without sequential reads', () => {
    expect(sequentialSection([aided(1, 1, 1)])).toBeNull();
  });
});

// The conditional forms of Schemmer et al. (2023): over-reliance given the reader was first right
// (= 1 − RSR) and under-reliance given the reader was first wrong (= 1 − RAIR), counted by hand
// beside the unconditional over- and under-reliance of the same reads.
describe('conditional over- and under-reliance', () => {
  // (truth, d0, ai, final)
  const reads = [
    // first right, suggestion wrong (the RSR reads): 5, of which 3 end wrong (followed it)
    sequentialRead(1, 1, 0, 0), // followed
    sequentialRead(1, 1, 0, 1), // kept own right call
    sequentialRead(0, 0, 1, 1), // followed
    sequentialRead(0, 0, 1, 0), // kept
    sequentialRead(0, 0, 1, 1), // followed
    // first wrong, suggestion right (the RAIR reads): 5, of which 2 end wrong (rejected it)
    sequentialRead(1, 0, 1, 0), // rejected
    sequentialRead(1, 0, 1, 1), // accepted
    sequentialRead(0, 1, 0, 1), // rejected
    sequentialRead(0, 1, 0, 0), // accepted
    sequentialRead(1, 0, 1, 1), // accepted
    // neither: first right and suggestion right; first wrong and suggestion wrong (followed)
    sequentialRead(1, 1, 1, 1),
    sequentialRead(0, 1, 1, 1),
  ];
  const s = sequentialSection(reads);
  it('counts over-reliance given first right = 1 − RSR: 3 of 5', () => {
    expect(s?.rsr).toMatchObject({ k: 2, n: 5 });
    expect(s?.overreliance_given_first_right).toMatchObject({ k: 3, n: 5, estimate: 0.6 });
  });
  it('counts under-reliance given first wrong = 1 − RAIR: 2 of 5', () => {
    expect(s?.rair).toMatchObject({ k: 3, n: 5 });
    expect(s?.underreliance_given_first_wrong).toMatchObject({ k: 2, n: 5, estimate: 0.4 });
  });
  it('gives a Wilson interval worked by hand', () => {
    // Wilson 95%, k = 3, n = 5, p = 0.6, z = 1.959963984540054, z² = 3.841458820694124:
    // centre = (p + z²/2n)/(1 + z²/n) = (0.6 + 0.384146)/1.768292 = 0.556552
    // half = z/(1 + z²/n)·sqrt(p(1 − p)/n + z²/4n²) = 1.108394·sqrt(0.048 + 0.038415) = 0.325827
    const z = 1.959963984540054;
    const n = 5;
    const p = 0.6;
    const centre = (p + (z * z) / (2 * n)) / (1 + (z * z) / n);
    const half = (z / (1 + (z * z) / n)) * Math.sqrt((p * (1 - p)) / n + (z * z) / (4 * n * n));
    expect(centre).toBeCloseTo(0.556552, 5);
    expect(half).toBeCloseTo(0.325827, 5);
    expect(s?.overreliance_given_first_right.lower).toBeCloseTo(centre - half, 12);
    expect(s?.overreliance_given_first_right.upper).toBeCloseTo(centre + half, 12);
  });
  it('differs from the unconditional forms of the same reads', () => {
    // unconditional over-reliance: wrong suggestions are the 5 RSR reads plus (0,1,1,1): 6; followed 3 + 1 = 4
    // unconditional under-reliance: right suggestions are the 5 RAIR reads plus (1,1,1,1): 6; rejected 2
    const r = reliance(reads);
    expect(r.overreliance).toMatchObject({ k: 4, n: 6 });
    expect(r.underreliance).toMatchObject({ k: 2, n: 6 });
  });
  it('gives nulls when no read is first right with a wrong suggestion', () => {
    const none = sequentialSection([sequentialRead(1, 1, 1, 1)]);
    expect(none?.overreliance_given_first_right).toMatchObject({ k: 0, n: 0, estimate: null, lower: null, upper: null });
  });
});

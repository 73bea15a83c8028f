import { sequentialSection } from '../../../src/analysis/sequential';
import { aided, sequentialRead } from './make-read';

// SPEC Contract 2 sequential definitions (RAIR/RSR per Schemmer et al. 2023), counted by hand.
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
  it('is null without sequential reads', () => {
    expect(sequentialSection([aided(1, 1, 1)])).toBeNull();
  });
});

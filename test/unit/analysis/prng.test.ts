import { seededInts } from '../../../src/analysis/prng';

describe('seededInts', () => {
  it('repeats with a seed, differs between seeds, and stays in range', () => {
    const draw = (seed: number) => { const r = seededInts(seed); return Array.from({ length: 50 }, () => r.below(1000)); };
    expect(draw(7)).toEqual(draw(7));
    expect(draw(7)).not.toEqual(draw(8));
    expect(draw(7).every((v) => v >= 0 && v < 1000 && Number.isInteger(v))).toBe(true);
  });
  it('is roughly uniform (common practice check, no source)', () => {
    const r = seededInts(1);
    const counts = [0, 0, 0, 0];
    for (let i = 0; i < 40000; i++) { const b = r.below(4); counts[b] = (counts[b] ?? 0) + 1; }
    for (const c of counts) expect(Math.abs(c - 10000)).toBeLessThan(400);
  });
  it('refuses a bad seed or size', () => {
    expect(() => seededInts(1.5)).toThrow(/whole number/);
    expect(() => seededInts(1).below(0)).toThrow(/size >= 1/);
  });
});

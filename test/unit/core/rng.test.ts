import { createRng, deriveSeed, rngFromSeed } from '../../../src/core/rng';

describe('createRng', () => {
  it('gives the same draws for the same seed and stream', () => {
    const a = createRng(7, 'order/R1/p1');
    const b = createRng(7, 'order/R1/p1');
    const drawsA = Array.from({ length: 20 }, () => a.int(0, 1000));
    const drawsB = Array.from({ length: 20 }, () => b.int(0, 1000));
    expect(drawsA).toEqual(drawsB);
  });

  it('gives different draws for another stream or another seed', () => {
    const draws = (seed: number, stream: string): number[] => {
      const rng = createRng(seed, stream);
      return Array.from({ length: 20 }, () => rng.int(0, 1_000_000));
    };
    expect(draws(7, 'order/R1/p1')).not.toEqual(draws(7, 'order/R1/p2'));
    expect(draws(7, 'order/R1/p1')).not.toEqual(draws(8, 'order/R1/p1'));
  });

  it('keeps seed and stream apart (no accidental collision by concatenation)', () => {
    expect(deriveSeed(1, '2x')).not.toBe(deriveSeed(12, 'x'));
  });

  it('rebuilds a stream from its recorded derived seed', () => {
    const original = createRng(20261201, 'caution/R3/p2');
    const replay = rngFromSeed(original.seed);
    expect(replay.shuffle([1, 2, 3, 4, 5, 6, 7, 8])).toEqual(original.shuffle([1, 2, 3, 4, 5, 6, 7, 8]));
  });

  it('shuffles into a permutation and leaves the input alone', () => {
    const input = Array.from({ length: 50 }, (_, i) => i);
    const out = createRng(3, 's').shuffle(input);
    expect([...out].sort((x, y) => x - y)).toEqual(input);
    expect(out).not.toEqual(input);
    expect(input[0]).toBe(0);
  });

  it('draws floats in [0, 1) and ints within bounds', () => {
    const rng = createRng(5, 'range');
    for (let i = 0; i < 1000; i += 1) {
      const f = rng.float();
      expect(f >= 0 && f < 1).toBe(true);
      const n = rng.int(-2, 2);
      expect(n >= -2 && n <= 2 && Number.isInteger(n)).toBe(true);
    }
  });

  it('refuses a seed that is not a whole number', () => {
    expect(() => createRng(1.5, 's')).toThrow(RangeError);
  });
});

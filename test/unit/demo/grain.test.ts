// The demo's scanner grain and its random bytes: the grain has the mean, spread and neighbour
// correlation its kernel implies, and the same seed gives the same bytes.
import { grainAcross, writeRowWithGrain } from '../../../demo-cases/generator/grain';
import { makeRandom } from '../../../demo-cases/generator/random';

const SIZE = 320;

/** The grain itself: written on a line of 128 with a gain of 30, so clipping (beyond 4.3 sd) is rare. */
const grainImage = (seed: number): Float64Array => {
  const across = grainAcross(SIZE, makeRandom(seed));
  const line = new Float32Array(SIZE).fill(128);
  const row = new Uint8ClampedArray(SIZE);
  const out = new Float64Array(SIZE * SIZE);
  for (let y = 0; y < SIZE; y += 1) {
    writeRowWithGrain(across, SIZE, y, 30, line, row, 0);
    for (let x = 0; x < SIZE; x += 1) out[y * SIZE + x] = ((row[x] as number) - 128) / 30;
  }
  return out;
};

describe('grain', () => {
  const g = grainImage(4);
  const n = g.length;
  const mean = g.reduce((s, v) => s + v, 0) / n;
  const sd = Math.sqrt(g.reduce((s, v) => s + (v - mean) ** 2, 0) / n);

  it('has mean 0 and standard deviation 1 (up to rounding to gray levels)', () => {
    // Rounding to 1/30 adds variance 1/(12 x 30²), negligible; about 6,000 independent patches
    // give the mean a standard error near 0.013.
    expect(Math.abs(mean)).toBeLessThan(0.05);
    expect(sd).toBeGreaterThan(0.97);
    expect(sd).toBeLessThan(1.03);
  });

  it('correlates neighbours as the kernel [1, 2, 3, 2, 1] implies', () => {
    // Lag-1 autocorrelation of that kernel: (1·2 + 2·3 + 3·2 + 2·1) / (1 + 4 + 9 + 4 + 1) = 16/19
    // and lag 3: (1·2 + 2·1) / 19 = 4/19 (worked out here from the kernel, not from a source).
    const lag = (dx: number, dy: number): number => {
      let s = 0;
      let count = 0;
      for (let y = 0; y + dy < SIZE; y += 1) {
        for (let x = 0; x + dx < SIZE; x += 1) {
          s += ((g[y * SIZE + x] as number) - mean) * ((g[(y + dy) * SIZE + x + dx] as number) - mean);
          count += 1;
        }
      }
      return s / count / (sd * sd);
    };
    expect(lag(1, 0)).toBeCloseTo(16 / 19, 1);
    expect(lag(0, 1)).toBeCloseTo(16 / 19, 1);
    expect(lag(3, 0)).toBeCloseTo(4 / 19, 1);
    expect(Math.abs(lag(5, 0))).toBeLessThan(0.05);
  });

  it('is the same for the same seed and differs for another', () => {
    expect(grainImage(4)).toEqual(g);
    expect(grainImage(5)).not.toEqual(g);
  });
});

describe('Random.fillBytes', () => {
  it('fills every byte, including a tail shorter than one draw, the same way each time', () => {
    const a = new Uint8Array(4003);
    const b = new Uint8Array(4003);
    makeRandom(8).fillBytes(a);
    makeRandom(8).fillBytes(b);
    expect(a).toEqual(b);
    // All 256 values turn up, and the last three bytes are not left at zero.
    expect(new Set(a).size).toBe(256);
    expect(Array.from(a.subarray(4000)).some((v) => v !== 0)).toBe(true);
    const counts = new Array<number>(2).fill(0);
    for (const v of a) counts[v >> 7] = (counts[v >> 7] as number) + 1;
    // Halves of the byte range: 2001.5 expected each, standard deviation ~32.
    expect(Math.abs((counts[0] as number) - 2001.5)).toBeLessThan(130);
  });
});

// Fine scanner grain: uniform random bytes through the 5-tap kernel [1, 2, 3, 2, 1] across and
// down (the same as two 3 x 3 box means). That is a sum of 25 draws per pixel, near-Gaussian by
// the central limit theorem, with correlation sigma ~1.15 px. Integer sums, four bytes per
// random draw, and no edge cases: the noise is made 4 px larger and filtered "valid".
// The across pass is done here; the down pass is done row by row as the pixels are written
// (`writeRowWithGrain`), so the filtered grain is never stored.
import type { Random } from './random';

/** pixels the raw noise extends beyond the image, on each axis */
export const GRAIN_PAD = 4;
/** mean and standard deviation of a filtered pixel: 81 x 127.5, and sqrt(19² x (256² - 1) / 12) */
const MEAN = 81 * 127.5;
const SD = 19 * Math.sqrt((256 * 256 - 1) / 12);

// Buffers kept for the next image of the same size: fewer allocations, less garbage collection.
let scratch: { size: number; bytes: Uint8Array; across: Float32Array } | null = null;

/**
 * (size + 4) rows of `size` across-filtered sums each. The array is reused by the next call
 * (every value rewritten), so use it before making another image.
 */
export const grainAcross = (size: number, random: Random): Float32Array => {
  const wide = size + GRAIN_PAD;
  if (scratch?.size !== size) scratch = { size, bytes: new Uint8Array(wide * wide), across: new Float32Array(wide * size) };
  const { bytes, across } = scratch;
  random.fillBytes(bytes);
  for (let y = 0; y < wide; y += 1) {
    const src = y * wide;
    const dst = y * size;
    // A sliding window of five bytes kept in locals: one new load per pixel.
    let b0 = bytes[src] as number;
    let b1 = bytes[src + 1] as number;
    let b2 = bytes[src + 2] as number;
    let b3 = bytes[src + 3] as number;
    for (let x = 0; x < size; x += 1) {
      const b4 = bytes[src + x + 4] as number;
      across[dst + x] = b0 + 2 * b1 + 3 * b2 + 2 * b3 + b4;
      b0 = b1;
      b1 = b2;
      b2 = b3;
      b3 = b4;
    }
  }
  return across;
};

/**
 * Row y of the image: `line` (gray levels) plus `gain` times the grain (mean 0, standard
 * deviation 1) of that row, written to `out` from `at`, which rounds and clips to 0..255.
 */
export const writeRowWithGrain = (
  across: Float32Array, size: number, y: number, gain: number, line: Float32Array, out: Uint8ClampedArray, at: number,
): void => {
  const r0 = y * size;
  const r1 = r0 + size;
  const r2 = r1 + size;
  const r3 = r2 + size;
  const r4 = r3 + size;
  const scale = gain / SD;
  const offset = -MEAN * scale;
  for (let x = 0; x < size; x += 1) {
    const sum = (across[r0 + x] as number) + 2 * (across[r1 + x] as number) + 3 * (across[r2 + x] as number)
      + 2 * (across[r3 + x] as number) + (across[r4 + x] as number);
    out[at + x] = (line[x] as number) + sum * scale + offset;
  }
};

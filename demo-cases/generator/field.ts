// Grayscale fields as Float32Array rows (width x height), and the few filters the generator needs.
// Float32 halves the memory traffic of Float64; sums are kept in doubles, so nothing drifts.
// Vertical passes walk whole rows at a time so memory is read in order (several times faster).
import type { Random } from './random';

export type Field = { width: number; height: number; data: Float32Array };

export const whiteNoise = (width: number, height: number, random: Random): Field => {
  const data = new Float32Array(width * height);
  for (let i = 0; i < data.length; i += 1) data[i] = random.normal();
  return { width, height, data };
};

const clamp = (i: number, length: number): number => (i < 0 ? 0 : i >= length ? length - 1 : i);

/**
 * Mean over a (2r+1) x (2r+1) window by running sums (edges clamped). Three in a row
 * approximate a Gaussian of sigma² = r(r+1).
 */
export const boxMean = (field: Field, r: number): Field => {
  const { width, height, data } = field;
  const span = 2 * r + 1;
  const scale = 1 / (span * span);
  const tmp = new Float32Array(data.length);
  const out = new Float32Array(data.length);
  const line = new Float32Array(width + 2 * r + 1);
  for (let y = 0; y < height; y += 1) {
    const row = y * width;
    for (let i = -r; i <= width + r; i += 1) line[i + r] = data[row + clamp(i, width)] as number;
    let sum = 0;
    for (let i = 0; i < span; i += 1) sum += line[i] as number;
    for (let x = 0; x < width; x += 1) {
      tmp[row + x] = sum;
      sum += (line[x + span] as number) - (line[x] as number);
    }
  }
  // Vertical: one running sum per column, moved down a row at a time.
  const sums = new Float64Array(width);
  for (let k = -r; k <= r; k += 1) {
    const src = clamp(k, height) * width;
    for (let x = 0; x < width; x += 1) sums[x] = (sums[x] as number) + (tmp[src + x] as number);
  }
  for (let y = 0; y < height; y += 1) {
    const row = y * width;
    const add = clamp(y + r + 1, height) * width;
    const drop = clamp(y - r, height) * width;
    for (let x = 0; x < width; x += 1) {
      const s = sums[x] as number;
      out[row + x] = s * scale;
      sums[x] = s + (tmp[add + x] as number) - (tmp[drop + x] as number);
    }
  }
  return { width, height, data: out };
};

/** Rescale in place to mean 0 and standard deviation 1. */
export const standardise = (field: Field): Field => {
  const { data } = field;
  const n = data.length;
  let sum = 0;
  for (let i = 0; i < n; i += 1) sum += data[i] as number;
  const mean = sum / n;
  let squares = 0;
  for (let i = 0; i < n; i += 1) squares += ((data[i] as number) - mean) ** 2;
  const sd = Math.sqrt(squares / n) || 1;
  for (let i = 0; i < n; i += 1) data[i] = ((data[i] as number) - mean) / sd;
  return field;
};

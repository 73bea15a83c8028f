// Grayscale fields as Float64Array rows (width x height), and the few filters the generator needs.
// Vertical passes walk whole rows at a time so memory is read in order (several times faster).
import type { Random } from './random';

export type Field = { width: number; height: number; data: Float64Array };

export const whiteNoise = (width: number, height: number, random: Random): Field => {
  const data = new Float64Array(width * height);
  for (let i = 0; i < data.length; i += 1) data[i] = random.normal();
  return { width, height, data };
};

/** Uniform in (-0.5, 0.5): the cheap ingredient of smoothed noise. */
export const uniformNoise = (width: number, height: number, random: Random): Field => {
  const data = new Float64Array(width * height);
  for (let i = 0; i < data.length; i += 1) data[i] = random.uniform() - 0.5;
  return { width, height, data };
};

const clamp = (i: number, length: number): number => (i < 0 ? 0 : i >= length ? length - 1 : i);

/** Separable convolution with a symmetric 1-D kernel (edges clamped). */
export const convolveSeparable = (field: Field, kernel: Float64Array): Field => {
  const { width, height, data } = field;
  const radius = (kernel.length - 1) / 2;
  const taps = kernel.length;
  const tmp = new Float64Array(data.length);
  const out = new Float64Array(data.length);
  const line = new Float64Array(width + 2 * radius);
  for (let y = 0; y < height; y += 1) {
    const row = y * width;
    // A padded copy of the row keeps bounds checks out of the inner loop.
    for (let i = -radius; i < width + radius; i += 1) line[i + radius] = data[row + clamp(i, width)] as number;
    for (let x = 0; x < width; x += 1) {
      let sum = 0;
      for (let k = 0; k < taps; k += 1) sum += (kernel[k] as number) * (line[x + k] as number);
      tmp[row + x] = sum;
    }
  }
  for (let y = 0; y < height; y += 1) {
    const row = y * width;
    for (let k = 0; k < taps; k += 1) {
      const weight = kernel[k] as number;
      const src = clamp(y + k - radius, height) * width;
      for (let x = 0; x < width; x += 1) out[row + x] = (out[row + x] as number) + weight * (tmp[src + x] as number);
    }
  }
  return { width, height, data: out };
};

/** Normalised 1-D Gaussian kernel, radius ceil(3 sigma). */
export const gaussianKernel = (sigma: number): Float64Array => {
  const radius = Math.ceil(3 * sigma);
  const kernel = new Float64Array(2 * radius + 1);
  let total = 0;
  for (let i = -radius; i <= radius; i += 1) {
    const value = Math.exp(-(i * i) / (2 * sigma * sigma));
    kernel[i + radius] = value;
    total += value;
  }
  for (let i = 0; i < kernel.length; i += 1) kernel[i] = (kernel[i] as number) / total;
  return kernel;
};

/**
 * Mean over a (2r+1) x (2r+1) window by running sums (edges clamped). Three in a row
 * approximate a Gaussian of sigma² = r(r+1).
 */
export const boxMean = (field: Field, r: number): Field => {
  const { width, height, data } = field;
  const span = 2 * r + 1;
  const tmp = new Float64Array(data.length);
  const out = new Float64Array(data.length);
  const line = new Float64Array(width + 2 * r + 1);
  for (let y = 0; y < height; y += 1) {
    const row = y * width;
    for (let i = -r; i <= width + r; i += 1) line[i + r] = data[row + clamp(i, width)] as number;
    let sum = 0;
    for (let i = 0; i < span; i += 1) sum += line[i] as number;
    for (let x = 0; x < width; x += 1) {
      tmp[row + x] = sum / span;
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
      out[row + x] = s / span;
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

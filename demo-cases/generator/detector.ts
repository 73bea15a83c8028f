// The demo's "model": a matched filter for a round target, run on the 8-bit pixels.
// Its errors are genuine: it misses faint targets and fires on bright specks and background
// texture, more often where the scanner is noisy.
import { quickselect } from 'simple-statistics';

export type Detection = {
  /** peak filter response, in robust standard deviations of the image's own response */
  z: number;
  /** where the peak is */
  x: number;
  y: number;
  /** probability that a target is present, by a fixed logistic of z */
  score: number;
};

// Template: the mean of a 13 x 13 box (a flat stand-in for a blob of sigma 6-9 px) minus the
// mean of the 35 x 35 window around it, so it is zero-mean and blind to slow background shading.
const CENTRE = 6;
const SURROUND = 17;
// The response is searched on every 3rd pixel each way (9 times less work; the response is
// smooth at that scale: the template is 13 px wide, targets 12+ px), then refined at single
// pixels around the best one.
const STEP = 3;
/** Logistic centre and scale, set once by looking at z on generated negatives and positives. */
export const DETECTOR_Z0 = 4.2;
export const DETECTOR_SCALE = 0.5;

/** The upper median, by Floyd-Rivest selection (linear time; reorders `values`). */
const median = (values: number[]): number => {
  const middle = Math.floor(values.length / 2);
  quickselect(values, middle);
  return values[middle] as number;
};

// Every 7th response is plenty for a robust centre and spread, and 7 times cheaper to select.
const SAMPLE_STEP = 7;

/** Robust centre and spread of the response: median and 1.4826 x MAD of every 7th value. */
export const responseSpread = (values: Float32Array): { centre: number; spread: number } => {
  const sampled: number[] = [];
  for (let i = 0; i < values.length; i += SAMPLE_STEP) sampled.push(values[i] as number);
  const centre = median(sampled);
  return { centre, spread: 1.4826 * median(sampled.map((v) => Math.abs(v - centre))) || 1e-9 };
};

// Tables kept for the next image of the same size (row and column 0 stay zero; the rest is
// rewritten every time): fewer allocations, less garbage collection.
let tables: { size: number; table: Int32Array } | null = null;

/** Summed-area table, (size + 1)² with a zero first row and column. Exact: 320² x 255 < 2³¹. */
const summedArea = (pixels: Uint8Array, size: number): Int32Array => {
  const w = size + 1;
  if (tables?.size !== size) tables = { size, table: new Int32Array(w * w) };
  const { table } = tables;
  for (let y = 0; y < size; y += 1) {
    let run = 0;
    const src = y * size;
    const above = y * w + 1;
    const here = above + w;
    for (let x = 0; x < size; x += 1) {
      run += pixels[src + x] as number;
      table[here + x] = (table[above + x] as number) + run;
    }
  }
  return table;
};

/** Sum of pixels in the square of half-width r centred on (x, y), from the table (width w). */
const boxSum = (table: Int32Array, w: number, x: number, y: number, r: number): number => {
  const top = (y - r) * w;
  const bottom = (y + r + 1) * w;
  return (table[bottom + x + r + 1] as number) - (table[bottom + x - r] as number)
    - (table[top + x + r + 1] as number) + (table[top + x - r] as number);
};

const CENTRE_AREA = (2 * CENTRE + 1) ** 2;
const SURROUND_AREA = (2 * SURROUND + 1) ** 2;
const respond = (table: Int32Array, w: number, x: number, y: number): number =>
  boxSum(table, w, x, y, CENTRE) / CENTRE_AREA - boxSum(table, w, x, y, SURROUND) / SURROUND_AREA;

/** The filter response on the search grid, with the grid's first position and spacing. */
export type ResponseGrid = { values: Float32Array; across: number; first: number; step: number; table: Int32Array };

/**
 * Correlation with the zero-mean template at every 3rd pixel, by box sums from a summed-area
 * table (Crow 1984): eight look-ups a position. Throws RangeError when the image is not
 * size x size or too small for the template.
 */
export const responseGrid = (pixels: Uint8Array, size: number): ResponseGrid => {
  const least = 2 * (SURROUND + STEP) + 1;
  if (size < least || pixels.length !== size * size) {
    throw new RangeError(`detector needs a square image of at least ${least} px, got ${pixels.length} pixels for size ${size}`);
  }
  const w = size + 1;
  const table = summedArea(pixels, size);
  // Positions whose surround window lies inside the image, with room for the refinement.
  const first = SURROUND + STEP;
  const across = Math.floor((size - SURROUND - 1 - STEP - first) / STEP) + 1;
  const values = new Float32Array(across * across);
  for (let j = 0, i = 0; j < across; j += 1) {
    const y = first + j * STEP;
    for (let k = 0; k < across; k += 1, i += 1) values[i] = respond(table, w, first + k * STEP, y);
  }
  return { values, across, first, step: STEP, table };
};

/**
 * The peak of the matched-filter response (see responseGrid), refined to the best single pixel
 * next to the best grid point, standardised against the image's own response (median and
 * 1.4826 x MAD), so a noisier image needs a stronger target to stand out; then a probability
 * by a fixed logistic of that z. Throws RangeError as responseGrid does.
 * Example: detect(pixels, 320).score is near 1 for a clear target, near 0 for none.
 */
export const detect = (pixels: Uint8Array, size: number): Detection => {
  const { values, across, first, step, table } = responseGrid(pixels, size);
  let best = -Infinity;
  let bestAt = 0;
  for (let i = 0; i < values.length; i += 1) {
    if ((values[i] as number) > best) {
      best = values[i] as number;
      bestAt = i;
    }
  }
  const gridX = first + (bestAt % across) * step;
  const gridY = first + Math.floor(bestAt / across) * step;
  let peakX = gridX;
  let peakY = gridY;
  const near = step - 1;
  for (let dy = -near; dy <= near; dy += 1) {
    for (let dx = -near; dx <= near; dx += 1) {
      const value = respond(table, size + 1, gridX + dx, gridY + dy);
      if (value > best) {
        best = value;
        peakX = gridX + dx;
        peakY = gridY + dy;
      }
    }
  }
  const { centre, spread } = responseSpread(values);
  const z = (best - centre) / spread;
  const score = 1 / (1 + Math.exp(-(z - DETECTOR_Z0) / DETECTOR_SCALE));
  return { z, x: peakX, y: peakY, score };
};

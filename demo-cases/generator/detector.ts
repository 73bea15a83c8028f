// The demo's "model": a matched filter for a Gaussian blob, run on the 8-bit pixels.
// Its errors are genuine: it misses faint targets and fires on bright background texture,
// more often where the scanner is noisy.
import { boxMean } from './field';
import type { Field } from './field';

export type Detection = {
  /** peak filter response, in robust standard deviations of the image's own response */
  z: number;
  /** where the peak is */
  x: number;
  y: number;
  /** probability that a target is present, by a fixed logistic of z */
  score: number;
};

// Three box passes of radius 5 make a near-Gaussian template of sigma sqrt(5 * 6) ~ 5.5 px.
const TEMPLATE_BOX = 5;
const TEMPLATE_RADIUS = 15;
/** Logistic centre and scale, set once by looking at z on seed-default negatives and positives. */
export const DETECTOR_Z0 = 4.4;
export const DETECTOR_SCALE = 0.5;

const median = (values: Float64Array): number => {
  const sorted = values.slice().sort();
  return sorted[Math.floor(sorted.length / 2)] as number;
};

// Every 7th response is plenty for a robust centre and spread, and 7 times cheaper to sort.
const SAMPLE_STEP = 7;
const sample = (values: Float64Array): Float64Array => {
  const out = new Float64Array(Math.ceil(values.length / SAMPLE_STEP));
  for (let i = 0, j = 0; i < values.length; i += SAMPLE_STEP, j += 1) out[j] = values[i] as number;
  return out;
};

/**
 * Correlation with a zero-mean template (a near-Gaussian blob minus its mean over a 31 x 31
 * window) equals smoothing minus the window mean, and both are running sums: cheap.
 * The peak is standardised against the image's own response (median and 1.4826 x MAD), so a
 * noisier image needs a stronger target to stand out.
 */
export const detect = (pixels: Uint8Array, size: number): Detection => {
  const data = new Float64Array(pixels.length);
  for (let i = 0; i < pixels.length; i += 1) data[i] = (pixels[i] as number) / 255;
  const field: Field = { width: size, height: size, data };
  const smooth = boxMean(boxMean(boxMean(field, TEMPLATE_BOX), TEMPLATE_BOX), TEMPLATE_BOX);
  const surround = boxMean(field, TEMPLATE_RADIUS);
  const margin = TEMPLATE_RADIUS;
  const inner = size - 2 * margin;
  const response = new Float64Array(inner * inner);
  for (let y = 0; y < inner; y += 1) {
    for (let x = 0; x < inner; x += 1) {
      const i = (y + margin) * size + x + margin;
      response[y * inner + x] = (smooth.data[i] as number) - (surround.data[i] as number);
    }
  }
  const sampled = sample(response);
  const centre = median(sampled);
  const deviations = sampled.map((v) => Math.abs(v - centre));
  const spread = 1.4826 * median(deviations) || 1e-9;
  let best = -Infinity;
  let bestAt = 0;
  for (let i = 0; i < response.length; i += 1) {
    if ((response[i] as number) > best) {
      best = response[i] as number;
      bestAt = i;
    }
  }
  const z = (best - centre) / spread;
  const score = 1 / (1 + Math.exp(-(z - DETECTOR_Z0) / DETECTOR_SCALE));
  return { z, x: (bestAt % inner) + margin, y: Math.floor(bestAt / inner) + margin, score };
};

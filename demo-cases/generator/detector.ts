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

// The filter runs on 2 x 2 binned pixels (4 times less work; targets are 5+ px wide). There,
// three box passes of radius 3 make a near-Gaussian template of sigma sqrt(3 * 4) ~ 3.5 binned
// px (~7 px at full size), and the surround window is 17 x 17 binned px.
const BIN = 2;
const TEMPLATE_BOX = 3;
const TEMPLATE_RADIUS = 8;
/** Logistic centre and scale, set once by looking at z on generated negatives and positives. */
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
 * Correlation with a zero-mean template (a near-Gaussian blob minus its mean over a square
 * window) equals smoothing minus the window mean, and both are running sums: cheap.
 * The peak is standardised against the image's own response (median and 1.4826 x MAD), so a
 * noisier image needs a stronger target to stand out.
 */
export const detect = (pixels: Uint8Array, size: number): Detection => {
  const small = Math.floor(size / BIN);
  const data = new Float64Array(small * small);
  for (let y = 0; y < small * BIN; y += 1) {
    const row = Math.floor(y / BIN) * small;
    for (let x = 0; x < small * BIN; x += 1) {
      const i = row + Math.floor(x / BIN);
      data[i] = (data[i] as number) + (pixels[y * size + x] as number) / (255 * BIN * BIN);
    }
  }
  const field: Field = { width: small, height: small, data };
  const smooth = boxMean(boxMean(boxMean(field, TEMPLATE_BOX), TEMPLATE_BOX), TEMPLATE_BOX);
  const surround = boxMean(field, TEMPLATE_RADIUS);
  const margin = TEMPLATE_RADIUS;
  const inner = small - 2 * margin;
  const response = new Float64Array(inner * inner);
  for (let y = 0; y < inner; y += 1) {
    for (let x = 0; x < inner; x += 1) {
      const i = (y + margin) * small + x + margin;
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
  const at = (binned: number): number => (binned + margin) * BIN + (BIN - 1) / 2;
  return { z, x: at(bestAt % inner), y: at(Math.floor(bestAt / inner)), score };
};

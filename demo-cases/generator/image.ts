// One synthetic grayscale image: textured background, gentle vignette, optional faint target.
// Made row by row in a few flat loops over typed arrays: no per-pixel closures or exp calls.
import { boxMean, standardise, whiteNoise } from './field';
import type { Field } from './field';
import { grainAcross, writeRowWithGrain } from './grain';
import type { Random } from './random';

export type Target = { x: number; y: number; sigma: number; contrast: number };

/** The target (or null), and any bright specks: drawn the same way, as Gaussian blobs. */
export type ImageSpec = { size: number; noise: number; target: Target | null; specks?: readonly Target[] };

// Low-frequency "anatomy", made at 1/4 scale and enlarged (16 times fewer random draws): three
// box passes of radius 5 there approximate a Gaussian of sigma ~5.5, about 22 px at full size.
const ANATOMY_SCALE = 4;
const ANATOMY_RADIUS = 5;
const ANATOMY_SD = 0.02;
const BASE = 0.5;
const VIGNETTE = 0.3;
// Display gain: stretches every deviation from the base (a window/level choice). It changes how
// visible a target is to the eye, not its signal-to-noise ratio, so the detector is unaffected.
const GAIN = 2;
// Beyond 4 sigma the blob adds under 0.04% of its contrast: it is drawn within that box only.
const REACH = 4;

/** The small anatomy field enlarged across only: one row of `size` values per small row. */
const anatomyRows = (random: Random, size: number): Float32Array => {
  const small = Math.ceil(size / ANATOMY_SCALE) + 1;
  let anatomy: Field = whiteNoise(small, small, random);
  for (let pass = 0; pass < 3; pass += 1) anatomy = boxMean(anatomy, ANATOMY_RADIUS);
  const { data } = standardise(anatomy);
  const rows = new Float32Array(small * size);
  // Column x lies between small columns floor(x / 4) and the next, at a fixed fraction.
  const left = new Int32Array(size);
  const weight = new Float32Array(size);
  for (let x = 0; x < size; x += 1) {
    left[x] = Math.floor(x / ANATOMY_SCALE);
    weight[x] = x / ANATOMY_SCALE - (left[x] as number);
  }
  for (let y = 0; y < small; y += 1) {
    const src = y * small;
    const dst = y * size;
    for (let x = 0; x < size; x += 1) {
      const i = src + (left[x] as number);
      const t = weight[x] as number;
      rows[dst + x] = ANATOMY_SD * ((data[i] as number) * (1 - t) + (data[i + 1] as number) * t);
    }
  }
  return rows;
};

type Blob = Target & { reach: number; from: number; weights: Float32Array };

/** A blob with its columns (clipped to the image) and its profile across them, exp(-dx² / 2 sigma²). */
const toBlob = (target: Target, size: number): Blob => {
  const reach = REACH * target.sigma;
  const from = Math.max(0, Math.ceil(target.x - reach));
  const to = Math.min(size - 1, Math.floor(target.x + reach));
  const weights = new Float32Array(Math.max(0, to - from + 1));
  for (let x = from; x <= to; x += 1) weights[x - from] = Math.exp(-((x - target.x) ** 2) / (2 * target.sigma ** 2));
  return { ...target, reach, from, weights };
};

/** Pixels as 8-bit gray, row by row. */
export const synthesiseImage = (spec: ImageSpec, random: Random): Uint8Array => {
  const { size, noise, target, specks = [] } = spec;
  const across = grainAcross(size, random);
  const rows = anatomyRows(random, size);
  // Writing to a clamped array rounds and clips to 0..255 in one step.
  const pixels = new Uint8ClampedArray(size * size);
  const centre = (size - 1) / 2;
  const inv = 1 / (centre * centre);
  const columnShade = new Float32Array(size);
  for (let x = 0; x < size; x += 1) columnShade[x] = VIGNETTE * (x - centre) ** 2 * inv;
  const line = new Float32Array(size);
  // A Gaussian blob is the product of a column profile and a row profile: one exp per row.
  const blobs = [...(target ? [target] : []), ...specks].map((t) => toBlob(t, size));
  for (let y = 0; y < size; y += 1) {
    const fy = y / ANATOMY_SCALE;
    const y0 = Math.floor(fy);
    const ty = fy - y0;
    const top = y0 * size;
    const bottom = top + size;
    // Shaded signal in gray levels; the grain goes on top unshaded (it is the scanner's).
    const rowShade = 1 - VIGNETTE * (y - centre) ** 2 * inv;
    for (let x = 0; x < size; x += 1) {
      const smooth = (rows[top + x] as number) * (1 - ty) + (rows[bottom + x] as number) * ty;
      line[x] = 255 * (BASE + GAIN * smooth) * (rowShade - (columnShade[x] as number));
    }
    for (const blob of blobs) {
      if (Math.abs(y - blob.y) >= blob.reach) continue;
      const height = 255 * GAIN * blob.contrast * Math.exp(-((y - blob.y) ** 2) / (2 * blob.sigma ** 2));
      const { from, weights } = blob;
      for (let k = 0; k < weights.length; k += 1) {
        const x = from + k;
        line[x] = (line[x] as number) + height * (weights[k] as number) * (rowShade - (columnShade[x] as number));
      }
    }
    writeRowWithGrain(across, size, y, 255 * GAIN * noise, line, pixels, y * size);
  }
  return new Uint8Array(pixels.buffer);
};

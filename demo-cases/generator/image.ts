// One synthetic grayscale image: textured background, gentle vignette, optional faint target.
import { boxMean, standardise, uniformNoise, whiteNoise } from './field';
import type { Field } from './field';
import type { Random } from './random';

export type Target = { x: number; y: number; sigma: number; contrast: number };

export type ImageSpec = { size: number; noise: number; target: Target | null };

// Fine grain: uniform noise through two 3 x 3 box means, near-Gaussian by the central limit
// theorem (25 draws per pixel) with correlation sigma ~1.15 px, and cheap: no logs, no sines.
const GRAIN_RADIUS = 1;
// Low-frequency "anatomy", made at 1/4 scale and enlarged (16 times fewer random draws): three
// box passes of radius 5 there approximate a Gaussian of sigma ~5.5, about 22 px at full size.
const ANATOMY_SCALE = 4;
const ANATOMY_RADIUS = 5;
const ANATOMY_SD = 0.03;
const BASE = 0.5;
// Display gain: stretches every deviation from the base (a window/level choice). It changes how
// visible a target is to the eye, not its signal-to-noise ratio, so the detector is unaffected.
const GAIN = 2;

/** Bilinear enlargement of a small field to size x size. */
const enlarge = (field: Field, scale: number, size: number): Float64Array => {
  const out = new Float64Array(size * size);
  const w = field.width;
  for (let y = 0; y < size; y += 1) {
    const fy = y / scale;
    const y0 = Math.floor(fy);
    const ty = fy - y0;
    for (let x = 0; x < size; x += 1) {
      const fx = x / scale;
      const x0 = Math.floor(fx);
      const tx = fx - x0;
      const i = y0 * w + x0;
      const top = (field.data[i] as number) * (1 - tx) + (field.data[i + 1] as number) * tx;
      const bottom = (field.data[i + w] as number) * (1 - tx) + (field.data[i + w + 1] as number) * tx;
      out[y * size + x] = top * (1 - ty) + bottom * ty;
    }
  }
  return out;
};

/** Pixels as 8-bit gray, row by row. */
export const synthesiseImage = (spec: ImageSpec, random: Random): Uint8Array => {
  const { size, noise, target } = spec;
  const grain = standardise(boxMean(boxMean(uniformNoise(size, size, random), GRAIN_RADIUS), GRAIN_RADIUS));
  const small = Math.ceil(size / ANATOMY_SCALE) + 1;
  let anatomy = whiteNoise(small, small, random);
  for (let pass = 0; pass < 3; pass += 1) anatomy = boxMean(anatomy, ANATOMY_RADIUS);
  standardise(anatomy);
  const smooth = enlarge(anatomy, ANATOMY_SCALE, size);
  const pixels = new Uint8Array(size * size);
  const centre = (size - 1) / 2;
  const reach2 = target ? (4 * target.sigma) ** 2 : 0;
  for (let y = 0; y < size; y += 1) {
    for (let x = 0; x < size; x += 1) {
      const i = y * size + x;
      const r2 = ((x - centre) ** 2 + (y - centre) ** 2) / (centre * centre);
      let value = ANATOMY_SD * (smooth[i] as number);
      if (target) {
        const d2 = (x - target.x) ** 2 + (y - target.y) ** 2;
        // Beyond 4 sigma the blob adds under 0.04% of its contrast: skip the exp there.
        if (d2 < reach2) value += target.contrast * Math.exp(-d2 / (2 * target.sigma * target.sigma));
      }
      value = (BASE + GAIN * value) * (1 - 0.3 * r2) + GAIN * noise * (grain.data[i] as number);
      pixels[i] = Math.max(0, Math.min(255, Math.round(value * 255)));
    }
  }
  return pixels;
};

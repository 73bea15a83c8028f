// Draws public/favicon.png, the window's icon, from the same shapes as public/favicon.svg (a slate
// tile, a ring in the accent green, an amber point), at 32 x 32 with 8 x 8 samples per pixel for
// smooth edges. A PNG because the renderer builds a whole SVG document on its main thread for an
// SVG icon, in the middle of a relaunch (bench/README.md, "Cold start, sixth session").
// Run: node scripts/make-favicon.mjs (writes the file; the output is the same on every run).
import { writeFileSync } from 'node:fs';
import path from 'node:path';
import { PNG } from 'pngjs';

const SIZE = 32;
const SCALE = SIZE / 64; // the SVG's viewBox is 64 x 64
const SAMPLES = 8;

const hex = (h) => [1, 3, 5].map((i) => Number.parseInt(h.slice(i, i + 2), 16));
const TILE = hex('#1d2328');
const RING = hex('#7fb8a4');
const POINT = hex('#e3b36b');

// inside a rounded rectangle x 2..62, y 2..62, corner radius 14 (viewBox units)
const inTile = (x, y) => {
  if (x < 2 || x > 62 || y < 2 || y > 62) return false;
  const cx = Math.min(Math.max(x, 16), 48);
  const cy = Math.min(Math.max(y, 16), 48);
  return (x - cx) ** 2 + (y - cy) ** 2 <= 14 ** 2;
};
// the ring: circle r=17 at (32, 32), stroke 6 wide
const inRing = (x, y) => Math.abs(Math.hypot(x - 32, y - 32) - 17) <= 3;
const inPoint = (x, y) => Math.hypot(x - 44, y - 20) <= 6;

/** Colour and coverage of one sample, painted in the SVG's order (later shapes on top). */
const sample = (x, y) => {
  if (inPoint(x, y)) return POINT;
  if (inRing(x, y)) return RING;
  if (inTile(x, y)) return TILE;
  return null;
};

export const drawFavicon = () => {
  const png = new PNG({ width: SIZE, height: SIZE });
  for (let py = 0; py < SIZE; py++) {
    for (let px = 0; px < SIZE; px++) {
      const sum = [0, 0, 0];
      let covered = 0;
      for (let sy = 0; sy < SAMPLES; sy++) {
        for (let sx = 0; sx < SAMPLES; sx++) {
          const c = sample((px + (sx + 0.5) / SAMPLES) / SCALE, (py + (sy + 0.5) / SAMPLES) / SCALE);
          if (c === null) continue;
          covered++;
          for (let k = 0; k < 3; k++) sum[k] += c[k];
        }
      }
      const at = (py * SIZE + px) * 4;
      for (let k = 0; k < 3; k++) png.data[at + k] = covered === 0 ? 0 : Math.round(sum[k] / covered);
      png.data[at + 3] = Math.round((255 * covered) / (SAMPLES * SAMPLES));
    }
  }
  return PNG.sync.write(png, { colorType: 6 });
};

if (import.meta.url === `file://${process.argv[1]}`) {
  const out = path.join(import.meta.dirname, '..', 'public', 'favicon.png');
  writeFileSync(out, drawFavicon());
  console.log(`wrote ${out}`);
}

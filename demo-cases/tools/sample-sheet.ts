/**
 * A contact sheet of synthetic images, to judge by eye how visible the targets are
 * (run: npx tsx demo-cases/tools/sample-sheet.ts OUT.png [contrast ...]).
 * One row per scanner, one column per contrast (0 = no target), targets of the middle sigma at
 * seeded random places, plus the scanner's random specks; printed with the detector's z and
 * where it peaked, so a looker can first search each tile and then check.
 */
import { writeFileSync } from 'node:fs';
import { detect } from '../generator/detector';
import { synthesiseImage } from '../generator/image';
import { grayPng } from '../generator/png';
import { makeRandom } from '../generator/random';
import { drawSpecks } from '../generator/plan';
import { IMAGE_SIZE, SCANNERS, TARGET_SIGMA } from '../generator/scenario';

const [out, ...rest] = process.argv.slice(2);
if (!out) throw new Error('usage: npx tsx demo-cases/tools/sample-sheet.ts OUT.png [contrast ...]');
const contrasts = rest.length > 0 ? rest.map(Number) : [0.12, 0.09, 0.065, 0.05, 0];
const GAP = 6;
const tile = IMAGE_SIZE + GAP;
const width = contrasts.length * tile - GAP;
const height = SCANNERS.length * tile - GAP;
const sheet = new Uint8Array(width * height);
const random = makeRandom(97);
SCANNERS.forEach((scanner, row) => {
  contrasts.forEach((contrast, column) => {
    const target = contrast > 0
      ? { x: random.between(50, IMAGE_SIZE - 50), y: random.between(50, IMAGE_SIZE - 50), sigma: (TARGET_SIGMA[0] + TARGET_SIGMA[1]) / 2, contrast }
      : null;
    const specks = drawSpecks(scanner, random);
    const pixels = synthesiseImage({ size: IMAGE_SIZE, noise: scanner.noise, target, specks }, random);
    const found = detect(pixels, IMAGE_SIZE);
    for (let y = 0; y < IMAGE_SIZE; y += 1) {
      sheet.set(pixels.subarray(y * IMAGE_SIZE, (y + 1) * IMAGE_SIZE), (row * tile + y) * width + column * tile);
    }
    const at = (t: { x: number; y: number }): string => `(${t.x.toFixed(0)}, ${t.y.toFixed(0)})`;
    const where = `${target ? `target at ${at(target)}` : 'no target'}${specks.length > 0 ? `, specks at ${specks.map(at).join(' ')}` : ''}`;
    console.log(`row ${row + 1} ${scanner.name}, column ${column + 1}, contrast ${contrast}: ${where}; detector z ${found.z.toFixed(2)} at (${found.x}, ${found.y})`);
  });
});
writeFileSync(out, grayPng(sheet, width, height));

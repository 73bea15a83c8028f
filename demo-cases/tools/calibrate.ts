/**
 * How the demo detector behaves, to set its logistic and the contrast bands by looking, not by
 * guessing (run: npx tsx demo-cases/tools/calibrate.ts [seeds, default 1-5]).
 * For the default plan of each seed, prints the spread of the filter response on negatives,
 * the detector's z per scanner and contrast band
 * (10th, 50th, 90th percentiles), then each scanner's accuracy if the call threshold on z were
 * each of a few values; the generator calls present at z >= DETECTOR_Z0 (score 0.5).
 */
import { median, quantile } from 'simple-statistics';
import { detect, DETECTOR_Z0, responseGrid, responseSpread } from '../generator/detector';
import { synthesiseImage } from '../generator/image';
import { drawSpecks, drawTarget, planCases } from '../generator/plan';
import { makeRandom } from '../generator/random';
import { DEFAULT_CASES, IMAGE_SIZE } from '../generator/scenario';

type Row = { scanner: string; band: string; truth: number; z: number; spread: number };

const seeds = process.argv.length > 2 ? process.argv.slice(2).map(Number) : [1, 2, 3, 4, 5];
const rows: Row[] = [];
for (const seed of seeds) {
  const random = makeRandom(seed);
  for (const plan of planCases(DEFAULT_CASES, random)) {
    const target = plan.band === null ? null : drawTarget(plan.band, random);
    const specks = drawSpecks(plan.scanner, random);
    const pixels = synthesiseImage({ size: IMAGE_SIZE, noise: plan.scanner.noise, target, specks }, random);
    if (plan.practice) continue;
    const { spread } = responseSpread(responseGrid(pixels, IMAGE_SIZE).values);
    rows.push({ scanner: plan.scanner.name, band: plan.band ?? 'none', truth: target ? 1 : 0, z: detect(pixels, IMAGE_SIZE).z, spread });
  }
}
const scanners = [...new Set(rows.map((r) => r.scanner))];
console.log(`seeds ${seeds.join(', ')}: ${rows.length} main cases`);
for (const scanner of scanners) {
  const spreads = rows.filter((r) => r.scanner === scanner && r.truth === 0).map((r) => r.spread);
  console.log(`${scanner}: response spread on negatives (1.4826 x MAD, gray levels), median ${median(spreads).toFixed(2)}`);
  for (const band of ['none', 'low', 'high']) {
    const z = rows.filter((r) => r.scanner === scanner && r.band === band).map((r) => r.z);
    const q = [0.1, 0.5, 0.9].map((p) => quantile(z, p).toFixed(2)).join(' / ');
    console.log(`  ${scanner} ${band.padEnd(4)} n=${z.length}  z p10/p50/p90 ${q}`);
  }
}
for (const threshold of (process.env.TH ?? `${DETECTOR_Z0}`).split(",").map(Number)) {
  const parts = scanners.map((scanner) => {
    const of = rows.filter((r) => r.scanner === scanner);
    const right = of.filter((r) => (r.z >= threshold ? 1 : 0) === r.truth).length;
    const low = of.filter((r) => r.band === 'low');
    const found = low.filter((r) => r.z >= threshold).length;
    return `${scanner} ${(100 * right / of.length).toFixed(1)}% (low band found ${found}/${low.length})`;
  });
  console.log(`threshold z ${threshold.toFixed(2)}${threshold === DETECTOR_Z0 ? ' (current)' : ''}: ${parts.join(', ')}`);
}

// Benchmark: readCaseSet over a folder of 2,000 PNG images of 512 x 512, and the demo generator.
// Run: npx tsx bench/case-import.ts [images]   (prints figures; not a test)
// Targets (issue 4.1): import <= 15 s, peak memory beyond baseline <= 1.5 x the images' size;
// demo set of 120 cases in a few seconds.
import { mkdtemp, mkdir, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { encode } from 'fast-png';
import { generateDemoCaseSet } from '../demo-cases/generator/generate';
import { makeRandom } from '../demo-cases/generator/random';
import { readCaseSet } from '../src/io/case-set/read-case-set';
import { folderSource } from '../src/cli/node-set-source';

const COUNT = Number(process.argv[2] ?? 2000);
const SIZE = 512;
const DISTINCT = 25;

const gc = (): void => {
  const collect = (globalThis as { gc?: () => void }).gc;
  if (collect) collect();
};

// Textured 8-bit images: smooth gradient plus noise, so they compress like real grayscale scans
// (a few hundred kB each). Only DISTINCT images are encoded; each is written many times.
const makePng = (seed: number): Uint8Array => {
  const random = makeRandom(seed);
  const data = new Uint8Array(SIZE * SIZE);
  for (let y = 0; y < SIZE; y += 1) {
    for (let x = 0; x < SIZE; x += 1) {
      data[y * SIZE + x] = Math.max(0, Math.min(255, Math.round(90 + 0.15 * x + 0.1 * y + 18 * (random.uniform() - 0.5))));
    }
  }
  return encode({ width: SIZE, height: SIZE, data, depth: 8, channels: 1 });
};

const main = async (): Promise<void> => {
  const dir = await mkdtemp(join(tmpdir(), 'heed-bench-'));
  try {
    const pngs = Array.from({ length: DISTINCT }, (_, i) => makePng(i + 1));
    await mkdir(join(dir, 'images'));
    const rows = ['case_id,finding,truth,image,model_score,model_call,practice,case_site'];
    let imageBytes = 0;
    for (let i = 0; i < COUNT; i += 1) {
      const bytes = pngs[i % DISTINCT] as Uint8Array;
      imageBytes += bytes.length;
      await writeFile(join(dir, 'images', `b${i}.png`), bytes);
      rows.push(`B${i},target,${i % 2},images/b${i}.png,${((i * 37) % 100) / 100},${i % 3 === 0 ? 1 : 0},0,${i % 4 === 0 ? 'North' : 'South'}`);
    }
    await writeFile(join(dir, 'cases.csv'), `${rows.join('\n')}\n`);
    pngs.length = 0;
    gc();
    const baseline = process.memoryUsage().rss;
    let peak = baseline;
    const timer = setInterval(() => {
      peak = Math.max(peak, process.memoryUsage().rss);
    }, 5);
    const start = performance.now();
    const result = await readCaseSet(folderSource(dir));
    const seconds = (performance.now() - start) / 1000;
    clearInterval(timer);
    peak = Math.max(peak, process.memoryUsage().rss);
    if (!result.ok) throw new Error(`bench set refused: ${JSON.stringify(result.problems[0])}`);
    const mb = (n: number): string => `${(n / 1048576).toFixed(1)} MB`;
    const extra = peak - baseline;
    console.log(`readCaseSet: ${COUNT} PNG images of ${SIZE}x${SIZE}, ${mb(imageBytes)} in all`);
    console.log(`  time ${seconds.toFixed(2)} s (target <= 15 s)`);
    console.log(`  peak RSS beyond baseline ${mb(extra)} = ${(extra / imageBytes).toFixed(2)} x the images (target <= 1.5 x)`);
    console.log(`  images returned: ${result.images.length}`);
  } finally {
    await rm(dir, { recursive: true, force: true });
  }

  for (const run of ['first', 'second']) {
    const start = performance.now();
    const set = generateDemoCaseSet();
    const seconds = (performance.now() - start) / 1000;
    const bytes = set.images.reduce((sum, image) => sum + image.bytes.length, 0);
    console.log(`generateDemoCaseSet (120 + 5 practice cases, ${run} run): ${seconds.toFixed(2)} s, ${(bytes / 1048576).toFixed(1)} MB of PNG`);
  }
};

await main();

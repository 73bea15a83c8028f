/**
 * The demo case set: 120 main cases (by default) and 5 practice cases of one finding, "nodule"
 * (a faint round target present), in the fictional Vesper Valley Imaging network. Images are
 * placeholders made here from seeded noise, not patient data. The model suggestion is a real
 * matched-filter detector run on each image's pixels, so its errors are genuine and more
 * frequent on the noisier Korvik scanner. Same seed, same bytes. Pure TypeScript: runs in Node
 * and in the renderer. Throws RangeError for a case count outside 2..2000.
 * Example: generateDemoCaseSet({ seed: 7, cases: 40 }).manifest.cases.length -> 45.
 */
import type { CaseFinding, CaseImage, CaseRecord, CaseSetManifest } from '../../src/core/case-set';
import { casesCsv } from '../../src/io/case-set/write-cases-csv';
import { detect } from './detector';
import { synthesiseImage } from './image';
import { drawSpecks, drawTarget, planCases } from './plan';
import { grayPng } from './png';
import { makeRandom } from './random';
import { DEFAULT_CASES, DEFAULT_SEED, DEMO_FINDING, DEMO_SET_NAME, IMAGE_SIZE } from './scenario';

export type DemoOptions = { seed?: number; cases?: number };
export type DemoCaseSet = { manifest: CaseSetManifest; images: CaseImage[]; csv: string };

const MODEL_THRESHOLD = 0.5;

export const generateDemoCaseSet = (options: DemoOptions = {}): DemoCaseSet => {
  const seed = options.seed ?? DEFAULT_SEED;
  const count = options.cases ?? DEFAULT_CASES;
  if (!Number.isInteger(count) || count < 2 || count > 2000) {
    throw new RangeError(`demo case count must be a whole number from 2 to 2000, got ${count}`);
  }
  const random = makeRandom(seed);
  const cases: CaseRecord[] = [];
  const images: CaseImage[] = [];
  for (const plan of planCases(count, random)) {
    const target = plan.band === null ? null : drawTarget(plan.band, random);
    const specks = drawSpecks(plan.scanner, random);
    const pixels = synthesiseImage({ size: IMAGE_SIZE, noise: plan.scanner.noise, target, specks }, random);
    // Three decimals in the CSV; the manifest keeps the same rounded value so both agree.
    const score = Number(detect(pixels, IMAGE_SIZE).score.toFixed(3));
    const path = `images/${plan.caseId}.png`;
    images.push({ path, mime: 'image/png', bytes: grayPng(pixels, IMAGE_SIZE) });
    const finding: CaseFinding = {
      finding: DEMO_FINDING,
      truth: target ? 1 : 0,
      modelScore: score,
      modelCall: score >= MODEL_THRESHOLD ? 1 : 0,
    };
    cases.push({
      caseId: plan.caseId,
      images: [path],
      practice: plan.practice,
      attributes: { scanner: plan.scanner.name, contrast_band: plan.band ?? 'none' },
      findings: [finding],
    });
  }
  const manifest: CaseSetManifest = {
    name: DEMO_SET_NAME, cases, findings: [DEMO_FINDING], attributeNames: ['scanner', 'contrast_band'],
  };
  return { manifest, images, csv: casesCsv(manifest) };
};

// The demo generator: deterministic, balanced, with a detector whose errors are real and more
// frequent on the noisy scanner (misses of faint targets, false alarms on its specks); and its
// output passes the importer's validation unchanged.
import { decode } from 'fast-png';
import { generateDemoCaseSet } from '../../../demo-cases/generator/generate';
import type { DemoCaseSet } from '../../../demo-cases/generator/generate';
import { detect, DETECTOR_Z0 } from '../../../demo-cases/generator/detector';
import { synthesiseImage } from '../../../demo-cases/generator/image';
import { makeRandom } from '../../../demo-cases/generator/random';
import { IMAGE_SIZE } from '../../../demo-cases/generator/scenario';
import { memorySource } from '../../../src/io/case-set/memory-source';
import { readCaseSet } from '../../../src/io/case-set/read-case-set';

const sameBytes = (a: DemoCaseSet, b: DemoCaseSet): boolean =>
  a.csv === b.csv && a.images.length === b.images.length
  && a.images.every((img, i) => img.path === b.images[i]?.path && Buffer.from(img.bytes).equals(Buffer.from(b.images[i]?.bytes ?? [])));

/** Share of main cases whose model call differs from the truth, per scanner. */
const errorRate = (set: DemoCaseSet, scanner: string): number => {
  const cases = set.manifest.cases.filter((c) => !c.practice && c.attributes.scanner === scanner);
  return cases.filter((c) => c.findings[0]?.modelCall !== c.findings[0]?.truth).length / cases.length;
};

describe('generateDemoCaseSet (default: 120 cases)', () => {
  let set: DemoCaseSet;
  // Generous: the generator takes a few seconds, more on a busy machine (speed is in bench/).
  beforeAll(() => {
    set = generateDemoCaseSet();
  }, 120_000);

  it('has 120 main cases, 5 practice cases, one image each', () => {
    const main = set.manifest.cases.filter((c) => !c.practice);
    const practice = set.manifest.cases.filter((c) => c.practice);
    expect(main).toHaveLength(120);
    expect(practice).toHaveLength(5);
    expect(new Set(practice.map((c) => c.findings[0]?.truth))).toEqual(new Set([0, 1]));
    expect(set.images).toHaveLength(125);
    expect(set.manifest.findings).toEqual(['nodule']);
  });

  it('has 45% prevalence, balanced over the two scanners', () => {
    const main = set.manifest.cases.filter((c) => !c.practice);
    expect(main.filter((c) => c.findings[0]?.truth === 1)).toHaveLength(54);
    for (const scanner of ['Halden', 'Korvik']) {
      const of = main.filter((c) => c.attributes.scanner === scanner);
      expect(of).toHaveLength(60);
      expect(of.filter((c) => c.findings[0]?.truth === 1)).toHaveLength(27);
    }
  });

  it('gives a detector that errs more on the noisy Korvik scanner, and is neither perfect nor useless', () => {
    const halden = errorRate(set, 'Halden');
    const korvik = errorRate(set, 'Korvik');
    expect(korvik).toBeGreaterThan(halden + 0.1);
    expect(halden).toBeGreaterThan(0);
    expect(korvik).toBeLessThan(0.5);
    // Both kinds of error occur, so planted and genuine errors of each kind are possible.
    const main = set.manifest.cases.filter((c) => !c.practice).map((c) => c.findings[0]);
    expect(main.some((f) => f?.truth === 0 && f.modelCall === 1)).toBe(true);
    expect(main.some((f) => f?.truth === 1 && f.modelCall === 0)).toBe(true);
  });

  it('is right on 85-92% of Halden cases and 60-72% of Korvik cases with the default seed', () => {
    // Design targets set for the demo (issue 2), not from a source: a model good on the quiet
    // scanner and poor on the noisy one. demo-cases/tools/calibrate.ts shows them over seeds.
    expect(1 - errorRate(set, 'Halden')).toBeGreaterThanOrEqual(0.85);
    expect(1 - errorRate(set, 'Halden')).toBeLessThanOrEqual(0.92);
    expect(1 - errorRate(set, 'Korvik')).toBeGreaterThanOrEqual(0.6);
    expect(1 - errorRate(set, 'Korvik')).toBeLessThanOrEqual(0.72);
  });

  it('scores high-contrast targets above low-contrast ones, and those above no target (graded)', () => {
    const meanScore = (band: string): number => {
      const of = set.manifest.cases.filter((c) => !c.practice && c.attributes.contrast_band === band);
      return of.reduce((sum, c) => sum + (c.findings[0]?.modelScore ?? 0), 0) / of.length;
    };
    expect(meanScore('high')).toBeGreaterThan(meanScore('low'));
    expect(meanScore('low')).toBeGreaterThan(meanScore('none'));
  });

  it('makes model_call from the score at 0.5', () => {
    for (const c of set.manifest.cases) {
      const f = c.findings[0];
      expect(f?.modelCall).toBe((f?.modelScore ?? 0) >= 0.5 ? 1 : 0);
    }
  });

  it('writes real 8-bit grayscale PNGs of the stated size', () => {
    const image = decode(set.images[0]?.bytes ?? new Uint8Array());
    expect([image.width, image.height, image.channels, image.depth]).toEqual([IMAGE_SIZE, IMAGE_SIZE, 1, 8]);
  });

  it('passes case-set validation and reads back to the same manifest', async () => {
    const files: Record<string, Uint8Array | string> = { 'cases.csv': set.csv };
    for (const image of set.images) files[image.path] = image.bytes;
    const result = await readCaseSet(memorySource(files, 'demo'));
    if (!result.ok) throw new Error(JSON.stringify(result.problems.slice(0, 3)));
    expect(result.manifest.cases).toEqual(set.manifest.cases);
    expect(result.manifest.attributeNames).toEqual(['scanner', 'contrast_band']);
  });
});

describe('generateDemoCaseSet determinism', () => {
  it('gives identical bytes for the same seed and different ones for another seed', () => {
    const a = generateDemoCaseSet({ seed: 11, cases: 8 });
    const b = generateDemoCaseSet({ seed: 11, cases: 8 });
    const c = generateDemoCaseSet({ seed: 12, cases: 8 });
    expect(sameBytes(a, b)).toBe(true);
    expect(sameBytes(a, c)).toBe(false);
    expect(a.images[0]?.bytes).not.toEqual(c.images[0]?.bytes);
  });

  it('keeps the Korvik error rate above Halden for other seeds too', () => {
    const set = generateDemoCaseSet({ seed: 3, cases: 120 });
    expect(errorRate(set, 'Korvik')).toBeGreaterThan(errorRate(set, 'Halden'));
  });

  it('refuses a case count outside 2..2000', () => {
    expect(() => generateDemoCaseSet({ cases: 1 })).toThrow(RangeError);
    expect(() => generateDemoCaseSet({ cases: 2.5 })).toThrow(/whole number/);
  });
});

describe('detect (matched filter)', () => {
  it('peaks on a clear target and scores it high; scores a blank image low', () => {
    const random = makeRandom(5);
    const target = { x: 200, y: 90, sigma: 6, contrast: 0.12 };
    const withTarget = detect(synthesiseImage({ size: IMAGE_SIZE, noise: 0.02, target }, random), IMAGE_SIZE);
    expect(Math.hypot(withTarget.x - target.x, withTarget.y - target.y)).toBeLessThan(4);
    expect(withTarget.score).toBeGreaterThan(0.9);
    const blank = detect(synthesiseImage({ size: IMAGE_SIZE, noise: 0.02, target: null }, random), IMAGE_SIZE);
    expect(blank.score).toBeLessThan(withTarget.score);
    expect(blank.z).toBeLessThan(withTarget.z - 3);
  });

  it('fires on a small bright speck where there is no target (the false alarm Korvik invites)', () => {
    const speck = { x: 90, y: 230, sigma: 2, contrast: 0.35 };
    const plain = detect(synthesiseImage({ size: IMAGE_SIZE, noise: 0.029, target: null }, makeRandom(21)), IMAGE_SIZE);
    const specked = detect(synthesiseImage({ size: IMAGE_SIZE, noise: 0.029, target: null, specks: [speck] }, makeRandom(21)), IMAGE_SIZE);
    // A speck is far smaller than the 13 px box, so the response is flat wherever the box holds
    // it: the peak lands within the box's half-width (6 px each way), not on the speck itself.
    expect(Math.abs(specked.x - speck.x)).toBeLessThanOrEqual(7);
    expect(Math.abs(specked.y - speck.y)).toBeLessThanOrEqual(7);
    expect(specked.z).toBeGreaterThan(plain.z);
    // Over the call threshold: the model says "present" on an image with no target.
    expect(specked.z).toBeGreaterThan(DETECTOR_Z0);
    expect(specked.score).toBeGreaterThan(0.5);
  });

  it('gives a lower z for the same target under stronger noise', () => {
    const target = { x: 160, y: 160, sigma: 6, contrast: 0.07 };
    const quiet = detect(synthesiseImage({ size: IMAGE_SIZE, noise: 0.02, target }, makeRandom(9)), IMAGE_SIZE);
    const noisy = detect(synthesiseImage({ size: IMAGE_SIZE, noise: 0.05, target }, makeRandom(9)), IMAGE_SIZE);
    expect(noisy.z).toBeLessThan(quiet.z);
  });
});

// The demo plan's random parts: targets inside the margin with sizes and contrasts in range,
// and bright specks on Korvik only, as many as its Poisson mean says.
import { drawSpecks, drawTarget } from '../../../demo-cases/generator/plan';
import { makeRandom } from '../../../demo-cases/generator/random';
import { CONTRAST, IMAGE_SIZE, SCANNERS, SPECK_BRIGHTNESS, SPECK_SIGMA, TARGET_SIGMA } from '../../../demo-cases/generator/scenario';

const scanner = (name: string) => {
  const found = SCANNERS.find((s) => s.name === name);
  if (!found) throw new Error(`no scanner ${name}`);
  return found;
};

describe('drawTarget', () => {
  it('keeps targets 40 px from the edge, with sigma and contrast in their ranges', () => {
    const random = makeRandom(2);
    for (const band of ['low', 'high'] as const) {
      for (let i = 0; i < 500; i += 1) {
        const t = drawTarget(band, random);
        for (const v of [t.x, t.y]) {
          expect(v).toBeGreaterThanOrEqual(40);
          expect(v).toBeLessThanOrEqual(IMAGE_SIZE - 40);
        }
        expect(t.sigma).toBeGreaterThanOrEqual(TARGET_SIGMA[0]);
        expect(t.sigma).toBeLessThan(TARGET_SIGMA[1]);
        expect(t.contrast).toBeGreaterThanOrEqual(CONTRAST[band][0]);
        expect(t.contrast).toBeLessThan(CONTRAST[band][1]);
      }
    }
    // The bands meet but do not overlap: low is fainter than high.
    expect(CONTRAST.low[1]).toBeLessThanOrEqual(CONTRAST.high[0]);
  });
});

describe('drawSpecks', () => {
  it('never puts specks on Halden', () => {
    const random = makeRandom(3);
    for (let i = 0; i < 500; i += 1) expect(drawSpecks(scanner('Halden'), random)).toEqual([]);
  });

  it('puts a Poisson number on Korvik, small and bright', () => {
    const korvik = scanner('Korvik');
    const random = makeRandom(4);
    const counts = Array.from({ length: 4000 }, () => drawSpecks(korvik, random));
    const mean = counts.reduce((s, c) => s + c.length, 0) / counts.length;
    // Poisson: standard error of the mean sqrt(0.9 / 4000) ~ 0.015; P(0) = exp(-0.9) ~ 0.41.
    expect(Math.abs(mean - korvik.specks)).toBeLessThan(0.06);
    const none = counts.filter((c) => c.length === 0).length / counts.length;
    expect(Math.abs(none - Math.exp(-korvik.specks))).toBeLessThan(0.03);
    for (const speck of counts.flat()) {
      expect(speck.sigma).toBeGreaterThanOrEqual(SPECK_SIGMA[0]);
      expect(speck.sigma).toBeLessThan(SPECK_SIGMA[1]);
      expect(speck.contrast).toBeGreaterThanOrEqual(SPECK_BRIGHTNESS[0]);
      // Smaller than any target, and brighter than any.
      expect(speck.sigma).toBeLessThan(TARGET_SIGMA[0]);
      expect(speck.contrast).toBeGreaterThan(CONTRAST.high[1]);
    }
  });
});

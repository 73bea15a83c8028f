// Which cases the demo set has: scanner, contrast band (or no target) and the target's draw.
import type { Target } from './image';
import type { Random } from './random';
import {
  CONTRAST, IMAGE_SIZE, PRACTICE_CASES, PREVALENCE, SCANNERS, SPECK_BRIGHTNESS, SPECK_SIGMA, TARGET_SIGMA,
} from './scenario';
import type { ContrastBand, Scanner } from './scenario';

export type Plan = { caseId: string; practice: boolean; scanner: Scanner; band: ContrastBand | null };

/** Targets sit at least this far from the edge, where the vignette is darkest. */
const MARGIN = 40;

/** Balanced plan: positives and contrast bands spread evenly over the scanners, then shuffled. */
export const planCases = (count: number, random: Random): Plan[] => {
  const positives = Math.round(count * PREVALENCE);
  const bandOf = (i: number): ContrastBand | null =>
    i >= positives ? null : Math.floor(i / SCANNERS.length) % 2 === 0 ? 'low' : 'high';
  const main = Array.from({ length: count }, (_, i) => ({
    scanner: SCANNERS[i % SCANNERS.length] as Scanner,
    band: bandOf(i),
  }));
  const digits = Math.max(3, String(count).length);
  const shuffled = random.shuffle(main).map((p, i) => ({
    ...p, practice: false, caseId: `VV-${String(i + 1).padStart(digits, '0')}`,
  }));
  // Practice: clear examples first, one faint one, both scanners.
  const practiceBands: (ContrastBand | null)[] = ['high', null, 'high', null, 'low'];
  const practice = practiceBands.slice(0, PRACTICE_CASES).map((band, i) => ({
    caseId: `VV-P${i + 1}`, practice: true, scanner: SCANNERS[i % SCANNERS.length] as Scanner, band,
  }));
  return [...practice, ...shuffled];
};

export const drawTarget = (band: ContrastBand, random: Random): Target => ({
  x: random.between(MARGIN, IMAGE_SIZE - MARGIN),
  y: random.between(MARGIN, IMAGE_SIZE - MARGIN),
  sigma: random.between(...TARGET_SIGMA),
  contrast: random.between(...CONTRAST[band]),
});

/** Poisson count by multiplying uniforms (Knuth): fine for the small means used here. */
const poisson = (mean: number, random: Random): number => {
  const limit = Math.exp(-mean);
  let count = 0;
  for (let p = random.uniform(); p > limit; p *= random.uniform()) count += 1;
  return count;
};

/** The scanner's bright specks for one image: small sharp blobs anywhere inside the margin. */
export const drawSpecks = (scanner: Scanner, random: Random): Target[] =>
  Array.from({ length: scanner.specks > 0 ? poisson(scanner.specks, random) : 0 }, () => ({
    x: random.between(MARGIN, IMAGE_SIZE - MARGIN),
    y: random.between(MARGIN, IMAGE_SIZE - MARGIN),
    sigma: random.between(...SPECK_SIGMA),
    contrast: random.between(...SPECK_BRIGHTNESS),
  }));

// The fictional scenario of the demo set: Vesper Valley Imaging, a clinic network that does not
// exist, with two fictional scanners of different noise. Nothing here describes a real device.

export const DEMO_SET_NAME = 'Vesper Valley Imaging (demo)';
export const DEMO_FINDING = 'nodule';
export const DEMO_FINDING_TEXT = 'faint round target present';

export type Scanner = {
  name: string;
  /** standard deviation of the fine-grain noise, in intensity units (0..1) */
  noise: number;
  /** mean number of bright specks per image (a fictional sensor defect; Poisson) */
  specks: number;
};

/**
 * Halden: a quiet scanner. Korvik: about 1.45 times the grain, so faint targets drown more
 * often, and small bright specks, which a reader can tell from a soft round target but the
 * model often cannot. Set with demo-cases/tools/calibrate.ts and sample-sheet.ts.
 */
export const SCANNERS: readonly Scanner[] = [
  { name: 'Halden', noise: 0.02, specks: 0 },
  { name: 'Korvik', noise: 0.029, specks: 0.9 },
];

/** A speck: Gaussian sigma (px) and peak brightness (intensity units), drawn uniformly. */
export const SPECK_SIGMA: readonly [number, number] = [1.5, 2.5];
export const SPECK_BRIGHTNESS: readonly [number, number] = [0.2, 0.4];

export type ContrastBand = 'low' | 'high';

/**
 * Peak target contrast (intensity units) drawn uniformly within the band. Looked at by eye:
 * high is plain on Halden and findable on Korvik; low is findable with effort on Halden and
 * mostly lost in Korvik's grain.
 */
export const CONTRAST: Record<ContrastBand, readonly [number, number]> = {
  low: [0.05, 0.085],
  high: [0.09, 0.16],
};

/** Target size: Gaussian blob sigma in pixels, drawn uniformly. */
export const TARGET_SIGMA: readonly [number, number] = [6, 9];

export const IMAGE_SIZE = 320;
/** Share of main cases with the target present. */
export const PREVALENCE = 0.45;
export const PRACTICE_CASES = 5;
export const DEFAULT_SEED = 20240;
export const DEFAULT_CASES = 120;

// The fictional scenario of the demo set: Vesper Valley Imaging, a clinic network that does not
// exist, with two fictional scanners of different noise. Nothing here describes a real device.

export const DEMO_SET_NAME = 'Vesper Valley Imaging (demo)';
export const DEMO_FINDING = 'nodule';
export const DEMO_FINDING_TEXT = 'faint round target present';

export type Scanner = {
  name: string;
  /** standard deviation of the fine-grain noise, in intensity units (0..1) */
  noise: number;
};

/** Halden: a quiet scanner. Korvik: nearly twice the noise, so faint targets drown more often. */
export const SCANNERS: readonly Scanner[] = [
  { name: 'Halden', noise: 0.02 },
  { name: 'Korvik', noise: 0.032 },
];

export type ContrastBand = 'low' | 'high';

/** Peak target contrast (intensity units) drawn uniformly within the band. */
export const CONTRAST: Record<ContrastBand, readonly [number, number]> = {
  low: [0.04, 0.065],
  high: [0.065, 0.11],
};

/** Target size: Gaussian blob sigma in pixels, drawn uniformly. */
export const TARGET_SIGMA: readonly [number, number] = [5, 7.5];

export const IMAGE_SIZE = 320;
/** Share of main cases with the target present. */
export const PREVALENCE = 0.45;
export const PRACTICE_CASES = 5;
export const DEFAULT_SEED = 20240;
export const DEFAULT_CASES = 120;

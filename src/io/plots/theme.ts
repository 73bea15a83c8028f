/**
 * One look for every plot Heed draws, in the app and in the CLI's reports. Colours are the
 * Okabe-Ito palette (Okabe & Ito 2008, "Color Universal Design"), distinguishable under the
 * common colour-vision deficiencies; conditions also differ by mark shape or dash, so no plot
 * relies on red against green, or on colour alone.
 */
export const PALETTE = {
  unaided: '#0072B2', // blue
  aided: '#E69F00', // orange
  reader: '#D55E00', // vermilion: the one reader a private report is about
  peer: '#999999', // grey: anonymous peers
  model: '#009E73', // bluish green
  neutral: '#56B4E9', // sky blue
  ink: '#222222',
} as const;

/** Mark shapes per condition, so print in grey still tells them apart. */
export const SYMBOL = { unaided: 'circle', aided: 'triangle' } as const;

/** Dash per condition for lines (ROC curves, calibration). */
export const DASH = { unaided: '', aided: '6,3' } as const;

export const FONT = 'system-ui, -apple-system, "Segoe UI", Roboto, sans-serif';

/** Default size of a figure in CSS pixels; plots scale down with their container. */
export const SIZE = { width: 560, height: 300, small: 220 } as const;

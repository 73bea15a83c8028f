/** The standing caution shown on every screen and written into every export and report. */
export const RESEARCH_CAUTION =
  'Heed is a research and training tool, not a medical device. It makes no diagnosis. Use it under your local ethics board, data-protection rules and licensed clinical practice.';

/** A case set (docs/formats.md, "The case set") once validated: cases with ground truth and model outputs. */

export type CaseFinding = {
  finding: string;
  truth: 0 | 1;
  /** model score in [0,1], or null when the set has none for this finding */
  modelScore: number | null;
  /** model call when the set gives one; otherwise derived from the study's threshold */
  modelCall: 0 | 1 | null;
};

export type CaseRecord = {
  caseId: string;
  /** image paths relative to the set's root, in display order */
  images: string[];
  practice: boolean;
  /** case attributes without the `case_` prefix, e.g. { scanner: 'Halden' } */
  attributes: Record<string, string>;
  findings: CaseFinding[];
};

export type CaseSetManifest = {
  name: string;
  cases: CaseRecord[];
  /** finding keys in first-seen order */
  findings: string[];
  /** attribute names (without prefix) in column order */
  attributeNames: string[];
};

/** One image's bytes, as validated (type read from the bytes). */
export type CaseImage = { path: string; mime: 'image/png' | 'image/jpeg'; bytes: Uint8Array };

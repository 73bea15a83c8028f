// Shared types of case-set reading (docs/formats.md, "The case set"). No Node APIs: a source is abstract.

/** Where a case set's files come from: a folder, a zip, or memory. */
export type SetSource = {
  /** shown in messages, e.g. the folder or zip path */
  label: string;
  /** every file's path relative to the set's root, with '/' separators; no folders */
  list(): Promise<string[]>;
  read(path: string): Promise<Uint8Array>;
  /** a file's size in bytes without reading it, when the source can tell (lets limits refuse early) */
  size?(path: string): Promise<number>;
};

/**
 * One reason a set is refused. file is relative to the set's root ('' for the folder or zip
 * itself); row is the CSV line (header = line 1), null when not about a row.
 */
export type CaseSetProblem = { file: string; row: number | null; column: string | null; message: string };

/**
 * Size bounds, so a mistaken or hostile set cannot exhaust memory. Defaults (DEFAULT_LIMITS):
 * cases.csv at most 20 MB and 20,000 data rows; each image at most 25 MB; at most 20,000 images
 * and 4 GB of images in all.
 */
export type CaseSetLimits = {
  csvBytes: number;
  rows: number;
  imageBytes: number;
  images: number;
  totalBytes: number;
  /** at most this many problems are kept (the rest are only counted) */
  problems: number;
};

export const DEFAULT_LIMITS: CaseSetLimits = {
  csvBytes: 20 * 1024 * 1024,
  rows: 20_000,
  imageBytes: 25 * 1024 * 1024,
  images: 20_000,
  totalBytes: 4 * 1024 * 1024 * 1024,
  problems: 50,
};

/** A share with its counts; estimate null when n = 0. */
export type Share = { k: number; n: number; estimate: number | null };

export type FindingSummary = {
  finding: string;
  /** main (non-practice) cases that have this finding */
  cases: number;
  positives: number;
  prevalence: number | null;
  /** cases whose model call (given, or score >= 0.5) matches the truth, of those with a suggestion */
  suggestionAccuracy: Share;
};

export type SubgroupValue = { value: string; cases: number; suggestionAccuracy: Share };
export type SubgroupSummary = { attribute: string; values: SubgroupValue[] };

export type CaseSetSummary = {
  name: string;
  /** main cases: practice cases are left out of every figure but their own count */
  cases: number;
  practiceCases: number;
  /** distinct image files named, practice included */
  images: number;
  findings: FindingSummary[];
  subgroups: SubgroupSummary[];
  /** columns of cases.csv that Heed does not use (empty when the summary is made from a manifest) */
  ignoredColumns: string[];
};

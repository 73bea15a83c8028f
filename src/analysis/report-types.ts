// The shape of `heed analyze --json` (docs/formats.md), as analyzeReads returns it.
import type { ReadersAgreement } from './fleiss-readers';
import type { MrmcResult } from './mrmc-adapter';
import type { CovarianceMethod } from './or-covariances';
import type { ReaderAveraged } from './reader-bootstrap';
import type { Sections } from './sections';
import type { SubgroupEntry } from './subgroups';

/** One reader and finding: the unaided / aided / sequential / crossover, plus more. */
export type ReaderEntry = Sections & {
  reader_id: string;
  reader_role: string;
  finding: string;
  subgroups: SubgroupEntry[];
};

export type GroupFinding = {
  finding: string;
  readers: number;
  cases: number;
  /** all readers' reads taken together */
  pooled: Sections;
  /** means over readers, with two-way bootstrap intervals */
  reader_averaged: ReaderAveraged;
  /** Fleiss' kappa of final calls across readers, per condition */
  fleiss_kappa: { unaided: ReadersAgreement; aided: ReadersAgreement };
  /** pooled subgroups: each with the suggestion's own accuracy beside readers' over-reliance */
  subgroups: SubgroupEntry[];
  /**
   * Obuchowski-Rockette / Hillis analysis of aided minus unaided AUC, with each condition's own
   * interval (treatments), the covariance method and a warning below 4 readers; null unless fully crossed
   */
  mrmc: MrmcResult | null;
  /** why mrmc is null, else null */
  mrmc_note: string | null;
};

export type AnalysisReport = {
  readers: ReaderEntry[];
  group: {
    /** non-practice reads analysed */
    reads: number;
    /** practice reads left out of every statistic */
    practice_excluded: number;
    /** non-practice training reads (the truth was shown) left out of the statistics */
    training_excluded: number;
    /** reads of withdrawn readers left out (0 when include_withdrawn) */
    withdrawn_excluded: number;
    /** whether withdrawn readers' reads were kept in (option includeWithdrawn, CLI --include-withdrawn) */
    include_withdrawn: boolean;
    /** a note on the log as a whole (e.g. no suggestion shown: performance sections only), else null */
    note: string | null;
    seed: number;
    boot: number;
    /** error covariance method asked for the Obuchowski-Rockette analyses */
    covariance: CovarianceMethod;
    /** case attribute names found (case_<name> columns, without the prefix) */
    attributes: string[];
    findings: GroupFinding[];
  };
};

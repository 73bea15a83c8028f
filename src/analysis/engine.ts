import type { ReadRow } from '../core/read-log';
import { readersAgreementOf } from './fleiss-readers';
import { mrmcOf } from './mrmc-adapter';
import { COVARIANCE_METHODS, type CovarianceMethod } from './or-covariances';
import { bootstrapPlanOf, bootstrapResamples, readerAveragedOf, readerAveragedOfDraws, type BootstrapPlan, type ReaderAveraged } from './reader-bootstrap';
import type { AnalysisReport, GroupFinding, ReaderEntry } from './report-types';
import { attributeCodes, attributeNames } from './attribute-codes';
import { checkScores, firstAppearance, logColumns, type ReadColumns } from './read-columns';
import { partition, partitionReads, sectionReads, type SectionReads } from './read-set';
import { compareReaderIds } from './reader-order';
import { sectionsOf } from './sections';
import { subgroupsOf } from './subgroups';

export type { AnalysisReport } from './report-types';

export type AnalyzeOptions = {
  seed?: number;
  boot?: number;
  /** error covariances of the Obuchowski-Rockette analysis: 'jackknife' (default) or 'delong' */
  covariance?: CovarianceMethod;
  /** keep the reads of withdrawn readers (withdrawn = 1) in the statistics; default false */
  includeWithdrawn?: boolean;
  /** only the per-reader entries, group.findings left empty: all a reader's report needs, at a fraction of the time */
  readersOnly?: boolean;
};

export type { CovarianceMethod } from './or-covariances';
export const DEFAULT_COVARIANCE: CovarianceMethod = 'jackknife';

export const DEFAULT_SEED = 1;
export const DEFAULT_BOOT = 1000;

const byReaderId = compareReaderIds;

/**
 * The whole analysis of a read log (docs/methods.md, docs/formats.md): per reader and finding the
 * unaided, aided, sequential and crossover sections (null where they do not apply), time ratio
 * and subgroups per case attribute; per finding the pooled and reader-averaged figures with a
 * seeded two-way bootstrap (options.seed, default 1; options.boot resamples, default 1000, 0 for
 * none), Fleiss' kappa across readers, pooled subgroups and, when fully crossed, the
 * Obuchowski-Rockette analysis (options.covariance: 'jackknife', the default, or 'delong').
 * Practice reads are left out of every statistic, and so are training reads (training = 1: the
 * reader saw the truth) and, unless options.includeWithdrawn, the reads of withdrawn readers;
 * each is counted in `group`. A log with no suggestion shown (an external rating log) gets its
 * performance sections only and a note saying so.
 * Readers are ordered by id (numeric-aware), findings by first appearance.
 * Throws RangeError on a bad seed, boot or covariance, or a confidence outside 0..100.
 * Example: analyzeReads(parseReadLog(csv), { seed: 7, boot: 500 }).readers[0].aided.overreliance.
 */
export const analyzeReads = (rows: readonly ReadRow[], options: AnalyzeOptions = {}): AnalysisReport => {
  checkOptions(options);
  return analyzeColumns(logColumns(rows), options);
};

/**
 * analyzeReads of a log held as columns (the CLI parses straight into them: parseReadLogColumns),
 * with the same report to the last bit. Throws as analyzeReads.
 */
export const analyzeColumns = (cols: ReadColumns, options: AnalyzeOptions = {}): AnalysisReport =>
  analyzeWith(cols, options, (plan) => readerAveragedOfDraws(plan, bootstrapResamples(plan, 0, plan.boot)));

/**
 * The analysis with its bootstrap resamples left to the caller (the CLI runs them in two threads):
 * `report` is analyzeColumns' report but for each finding's reader_averaged, which
 * `complete(draws)` fills in from the resampled figures of each finding's plan, in the order of
 * `plans` (bootstrapResamples of [0, plan.boot), or its pieces joined in order). The completed
 * report equals analyzeColumns' to the last bit. Throws as analyzeReads; complete throws
 * RangeError when the draws do not fit the plans.
 */
export const analyzeColumnsDeferred = (cols: ReadColumns, options: AnalyzeOptions = {}): { plans: BootstrapPlan[]; complete: (draws: readonly Float64Array[]) => AnalysisReport } => {
  const plans: BootstrapPlan[] = [];
  const report = analyzeWith(cols, options, (plan) => {
    plans.push(plan);
    return null as unknown as ReaderAveraged;
  });
  return {
    plans,
    complete: (draws) => {
      if (draws.length !== plans.length) throw new RangeError(`expected the draws of ${plans.length} findings, got ${draws.length}`);
      report.group.findings.forEach((g, i) => {
        g.reader_averaged = readerAveragedOfDraws(plans[i] as BootstrapPlan, draws[i] as Float64Array);
      });
      return report;
    },
  };
};

const analyzeWith = (cols: ReadColumns, options: AnalyzeOptions, averaged: (plan: BootstrapPlan) => ReaderAveraged): AnalysisReport => {
  checkOptions(options);
  const seed = options.seed ?? DEFAULT_SEED;
  const boot = options.boot ?? DEFAULT_BOOT;
  const covariance = options.covariance ?? DEFAULT_COVARIANCE;
  const includeWithdrawn = options.includeWithdrawn ?? false;
  const { reads, excluded } = keptReads(cols, includeWithdrawn);
  checkScores(cols, reads);
  const attributes = attributeNames(cols, reads);
  // one index for the whole analysis: the reads as columns, each attribute's values as codes;
  // per finding the reads are split and sorted once, and every reader and subgroup takes its share
  const codes = attributeCodes(cols, attributes);
  const readers: ReaderEntry[] = [];
  const findings: GroupFinding[] = [];
  for (const { finding, all, order, pooled, readerReads } of findingIndexes(cols, reads)) {
    for (const k of order) {
      const rs = readerReads[k] as SectionReads;
      const id = cols.readerIds[k] as string;
      const role = cols.roleIds[cols.role[rs.all[0] as number] as number] ?? '';
      readers.push({ reader_id: id, reader_role: role, finding, ...sectionsOf(cols, rs), subgroups: subgroupsOf(cols, rs, codes) });
    }
    if (options.readersOnly === true) continue;
    const m = mrmcOf(cols, all, covariance);
    findings.push({
      finding,
      readers: order.length,
      cases: distinctCount(cols.case, all, cols.caseCount),
      pooled: sectionsOf(cols, pooled),
      reader_averaged: averaged(bootstrapPlanOf(cols, all, order.map((k) => readerReads[k] as SectionReads), { seed, boot })),
      fleiss_kappa: { unaided: readersAgreementOf(cols, pooled.unaided.rows), aided: readersAgreementOf(cols, pooled.aided.rows) },
      subgroups: subgroupsOf(cols, pooled, codes),
      mrmc: m.result,
      mrmc_note: m.note,
    });
  }
  readers.sort((a, b) => byReaderId(a.reader_id, b.reader_id));
  return {
    readers,
    group: {
      reads: reads.length,
      practice_excluded: excluded.practice,
      training_excluded: excluded.training,
      withdrawn_excluded: excluded.withdrawn,
      include_withdrawn: includeWithdrawn,
      note: logNote(cols, reads),
      seed, boot, covariance, attributes, findings,
    },
  };
};

/**
 * The reader-averaged figures of every finding (group.findings[i].reader_averaged of
 * analyzeColumns with the same options, in the same order and to the last bit), and nothing else:
 * the results page shows a report computed with boot = 0 first and fills in the bootstrap
 * intervals from this (withReaderAveraged). Throws as analyzeColumns.
 */
export const readerAveragedOfColumns = (cols: ReadColumns, options: AnalyzeOptions = {}): ReaderAveraged[] => {
  checkOptions(options);
  const seed = options.seed ?? DEFAULT_SEED;
  const boot = options.boot ?? DEFAULT_BOOT;
  const { reads } = keptReads(cols, options.includeWithdrawn ?? false);
  checkScores(cols, reads);
  if (options.readersOnly === true) return [];
  return [...findingIndexes(cols, reads)].map(({ all, order, readerReads }) =>
    readerAveragedOf(cols, all, order.map((k) => readerReads[k] as SectionReads), { seed, boot }));
};

/**
 * The report of analyzeColumns with `boot` resamples, from its report with boot = 0 (the same
 * other options) and readerAveragedOfColumns with `boot`.
 */
export const withReaderAveraged = (report: AnalysisReport, averaged: readonly ReaderAveraged[], boot: number): AnalysisReport => ({
  ...report,
  group: {
    ...report.group,
    boot,
    findings: report.group.findings.map((f, i) => ({ ...f, reader_averaged: averaged[i] ?? f.reader_averaged })),
  },
});

// The reads the statistics use: practice, training and (unless kept) withdrawn readers' reads left out, and counted.
const keptReads = (cols: ReadColumns, includeWithdrawn: boolean): { reads: Int32Array; excluded: { practice: number; training: number; withdrawn: number } } => {
  const excluded = { practice: 0, training: 0, withdrawn: 0 };
  const kept: number[] = [];
  for (let i = 0; i < cols.n; i++) {
    if (cols.practice[i] === 1) excluded.practice++;
    else if (cols.training[i] === 1) excluded.training++;
    else if (cols.withdrawn[i] === 1 && !includeWithdrawn) excluded.withdrawn++;
    else kept.push(i);
  }
  return { reads: Int32Array.from(kept), excluded };
};

type FindingIndex = { finding: string; all: Int32Array; order: number[]; pooled: SectionReads; readerReads: (SectionReads | null)[] };

// Per finding, in order of first appearance: its reads grouped by reader (readers ordered by id), pooled and per reader.
function* findingIndexes(cols: ReadColumns, reads: Int32Array): Generator<FindingIndex> {
  const findingsSeen = firstAppearance(cols.finding, reads, cols.findingIds.length);
  const byFinding = partition(reads, cols.finding, cols.findingIds.length);
  for (const f of findingsSeen.first) {
    const finding = cols.findingIds[f] as string;
    const rowsOfFinding = byFinding[f] as Int32Array;
    const perReader = partition(rowsOfFinding, cols.reader, cols.readerIds.length);
    const order = [...perReader.keys()].filter((k) => (perReader[k] as Int32Array).length > 0);
    order.sort((a, b) => byReaderId(cols.readerIds[a] as string, cols.readerIds[b] as string));
    const all = new Int32Array(rowsOfFinding.length);
    let at = 0;
    for (const k of order) {
      all.set(perReader[k] as Int32Array, at);
      at += (perReader[k] as Int32Array).length;
    }
    const pooled = sectionReads(cols, all);
    yield { finding, all, order, pooled, readerReads: partitionReads(pooled, cols.reader, cols.readerIds.length) };
  }
}

// What the reader of the output must know about the log as a whole, or null.
const logNote = (cols: ReadColumns, reads: Int32Array): string | null => {
  if (reads.length === 0) return null;
  if (reads.some((r) => cols.aided[r] === 1)) return null;
  const rated = reads.some((r) => cols.rated[r] === 1);
  return `No suggestion was shown in this log${rated ? ' (an external rating log)' : ''}: only the performance sections (accuracy, sensitivity, specificity, AUC${rated ? ' of the ratings' : ''}) are computed; the reliance sections are null.`;
};

const checkOptions = (options: AnalyzeOptions): void => {
  const seed = options.seed ?? DEFAULT_SEED;
  const boot = options.boot ?? DEFAULT_BOOT;
  if (!Number.isInteger(seed)) throw new RangeError(`seed must be a whole number, got ${seed}`);
  if (!Number.isInteger(boot) || boot < 0) throw new RangeError(`boot must be a whole number >= 0, got ${boot}`);
  const covariance = options.covariance ?? DEFAULT_COVARIANCE;
  if (!COVARIANCE_METHODS.includes(covariance)) throw new RangeError(`covariance must be jackknife or delong, got ${JSON.stringify(covariance)}`);
};

const distinctCount = (key: Int32Array, rows: Int32Array, keys: number): number => {
  const seen = new Uint8Array(keys);
  let n = 0;
  for (let k = 0; k < rows.length; k++) {
    const c = key[rows[k] as number] as number;
    if (seen[c] === 0) {
      seen[c] = 1;
      n++;
    }
  }
  return n;
};

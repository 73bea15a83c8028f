import type { ReadRow } from '../core/read-log';
import { readersAgreement } from './fleiss-readers';
import { mrmc } from './mrmc-adapter';
import { isAided } from './read-scores';
import { readerAveraged } from './reader-bootstrap';
import type { AnalysisReport, GroupFinding, ReaderEntry } from './report-types';
import { sections } from './sections';
import { subgroups } from './subgroups';

export type { AnalysisReport } from './report-types';

export type AnalyzeOptions = { seed?: number; boot?: number };

export const DEFAULT_SEED = 1;
export const DEFAULT_BOOT = 1000;

const byReaderId = (a: string, b: string) => a.localeCompare(b, 'en', { numeric: true });

/**
 * The whole analysis of a read log (SPEC Contracts 2 and 3): per reader and finding the
 * unaided, aided, sequential and crossover sections (null where they do not apply), time ratio
 * and subgroups per case attribute; per finding the pooled and reader-averaged figures with a
 * seeded two-way bootstrap (options.seed, default 1; options.boot resamples, default 1000, 0 for
 * none), Fleiss' kappa across readers, pooled subgroups and, when fully crossed, the
 * Obuchowski-Rockette analysis. Practice reads are left out of every statistic. Readers are
 * ordered by id (numeric-aware), findings by first appearance.
 * Throws RangeError on a bad seed or boot, or a confidence outside 0..100.
 * Example: analyzeReads(parseReadLog(csv), { seed: 7, boot: 500 }).readers[0].aided.overreliance.
 */
export const analyzeReads = (rows: readonly ReadRow[], options: AnalyzeOptions = {}): AnalysisReport => {
  const seed = options.seed ?? DEFAULT_SEED;
  const boot = options.boot ?? DEFAULT_BOOT;
  if (!Number.isInteger(seed)) throw new RangeError(`seed must be a whole number, got ${seed}`);
  if (!Number.isInteger(boot) || boot < 0) throw new RangeError(`boot must be a whole number >= 0, got ${boot}`);
  const reads = rows.filter((r) => r.practice === 0);
  const attributes: string[] = [];
  const byFinding = new Map<string, Map<string, ReadRow[]>>();
  for (const r of reads) {
    for (const a of Object.keys(r.case_attributes)) if (!attributes.includes(a)) attributes.push(a);
    let f = byFinding.get(r.finding);
    if (f === undefined) {
      f = new Map();
      byFinding.set(r.finding, f);
    }
    const list = f.get(r.reader_id);
    if (list === undefined) f.set(r.reader_id, [r]);
    else list.push(r);
  }
  const readers: ReaderEntry[] = [];
  const findings: GroupFinding[] = [];
  for (const [finding, perReader] of byFinding) {
    const ids = [...perReader.keys()].sort(byReaderId);
    const all: ReadRow[] = [];
    for (const id of ids) {
      const rs = perReader.get(id) ?? [];
      for (const r of rs) all.push(r);
      readers.push({ reader_id: id, reader_role: rs[0]?.reader_role ?? '', finding, ...sections(rs), subgroups: subgroups(rs, attributes) });
    }
    const m = mrmc(all);
    findings.push({
      finding,
      readers: ids.length,
      cases: new Set(all.map((r) => r.case_id)).size,
      pooled: sections(all),
      reader_averaged: readerAveraged(all, { seed, boot }),
      fleiss_kappa: { unaided: readersAgreement(all.filter((r) => !isAided(r))), aided: readersAgreement(all.filter(isAided)) },
      subgroups: subgroups(all, attributes),
      mrmc: m.result,
      mrmc_note: m.note,
    });
  }
  readers.sort((a, b) => byReaderId(a.reader_id, b.reader_id));
  return { readers, group: { reads: reads.length, practice_excluded: rows.length - reads.length, seed, boot, attributes, findings } };
};

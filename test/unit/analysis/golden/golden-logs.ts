// Seeded simulated logs (bench/simulate-log.ts, fictional) varied to reach every branch of the
// engine: sequential, concurrent and crossover designs, five-point and percent scales, a second
// finding, subgroups by two case attributes, and practice, training and withdrawn rows. The
// goldens in this folder were written from these logs by make-goldens.ts BEFORE the column-wise
// engine (issue 10), so the test guards "the same numbers to the last bit".
import type { ReadRow } from '../../../../src/core/read-log';
import type { AnalyzeOptions } from '../../../../src/analysis/engine';
import { simulateReadRows } from '../../../../bench/simulate-log';

export type GoldenLog = { name: string; rows: ReadRow[]; attributes: string[]; options: AnalyzeOptions };

// Deterministic small hash for choosing rows to alter (no randomness beyond the seeds).
const pick = (i: number, mod: number): boolean => ((i * 2654435761) >>> 0) % mod === 0;

const withAttributes = (rows: ReadRow[]): ReadRow[] =>
  rows.map((r) => ({ ...r, case_attributes: { ...r.case_attributes, density: Number(r.case_id.slice(1)) % 2 === 0 ? 'dense' : 'fatty', site: Number(r.case_id.slice(1)) % 5 === 0 ? 'north' : 'south' } }));

// A five-point rating from the confidence (1..5), and the initial one for sequential reads.
const fivePoint = (rows: ReadRow[]): ReadRow[] =>
  rows.map((r) => {
    const to5 = (call: number, conf: number | null): number => Math.min(5, Math.max(1, call === 1 ? 3 + Math.round((conf ?? 50) / 50) : 3 - Math.round((conf ?? 50) / 50)));
    return {
      ...r,
      scale: 'five-point',
      initial_rating: r.assistance === 'sequential' ? to5(r.initial_call ?? 0, r.initial_confidence) : null,
      final_rating: to5(r.final_call, r.final_confidence),
    };
  });

const percent = (rows: ReadRow[]): ReadRow[] =>
  rows.map((r) => {
    const to100 = (call: number, conf: number | null): number => (call === 1 ? 50 + (conf ?? 50) / 2 : 50 - (conf ?? 50) / 2);
    return {
      ...r,
      scale: 'percent',
      initial_rating: r.assistance === 'sequential' ? to100(r.initial_call ?? 0, r.initial_confidence) : null,
      final_rating: to100(r.final_call, r.final_confidence),
    };
  });

// Reader R2 withdrawn, and (with training) a few training reads.
const flagged = (rows: ReadRow[], training = true): ReadRow[] =>
  rows.map((r, i) => ({ ...r, training: training && pick(i, 17) ? 1 : 0, withdrawn: r.reader_id === 'R2' ? 1 : 0 }));

export const goldenLogs = (): GoldenLog[] => {
  const seq = simulateReadRows({ seed: 11, readers: 6, cases: 80, practiceCases: 3 });
  const conc = simulateReadRows({ seed: 12, readers: 6, cases: 80, aided: 'concurrent' });
  const second = simulateReadRows({ seed: 13, readers: 5, cases: 60, aided: 'concurrent', finding: 'second' });
  // one period only: aided reads of each reader, no crossover pairs (not fully crossed)
  const half = simulateReadRows({ seed: 14, readers: 4, cases: 50 }).filter((r) => r.assistance !== 'none');
  return [
    { name: 'sequential-crossover', rows: withAttributes(flagged(seq)), attributes: ['scanner', 'density', 'site'], options: { seed: 3, boot: 60 } },
    { name: 'sequential-withdrawn-kept', rows: flagged(seq, false), attributes: ['scanner'], options: { seed: 4, boot: 25, includeWithdrawn: true, covariance: 'delong' } },
    { name: 'concurrent-two-findings', rows: [...withAttributes(conc), ...withAttributes(second)], attributes: ['scanner', 'density', 'site'], options: { seed: 5, boot: 40 } },
    { name: 'five-point', rows: fivePoint(withAttributes(seq)), attributes: ['scanner', 'density', 'site'], options: { seed: 6, boot: 30 } },
    { name: 'percent-concurrent', rows: percent(conc), attributes: ['scanner'], options: { seed: 7, boot: 30, covariance: 'delong' } },
    { name: 'aided-only', rows: half, attributes: ['scanner'], options: { seed: 8, boot: 20 } },
    { name: 'readers-only', rows: withAttributes(flagged(conc)), attributes: ['scanner', 'density', 'site'], options: { boot: 0, readersOnly: true } },
  ];
};

/**
 * How a benchmark reports: readable lines for people, then one machine line
 * `BENCH_RESULT {json}` that scripts/bench.mjs collects into bench-results/summary.json.
 * Targets are reported beside the figure, never asserted (speed targets are not tests).
 */
import { availableParallelism, loadavg } from 'node:os';
import { max, quantileSorted } from 'simple-statistics';

export type Figure = {
  name: string;
  value: number;
  unit: string;
  /** the target as text, e.g. "<= 50", when there is one */
  target?: string;
  met?: boolean;
};

export type BenchResult = { bench: string; figures: Figure[]; notes: string[] };

export type Spread = { n: number; p50: number; p95: number; max: number };

/** p50 and p95 by linear interpolation (simple-statistics 7.12.1 quantileSorted, R/numpy type 7). */
export const spread = (values: number[]): Spread => {
  if (values.length === 0) throw new RangeError('spread: no values to summarise');
  const sorted = [...values].sort((a, b) => a - b);
  return { n: sorted.length, p50: quantileSorted(sorted, 0.5), p95: quantileSorted(sorted, 0.95), max: max(sorted) };
};

export const atMost = (name: string, value: number, unit: string, limit: number): Figure =>
  ({ name, value, unit, target: `<= ${limit}`, met: value <= limit });

export const plain = (name: string, value: number, unit: string): Figure => ({ name, value, unit });

/** Three figures (p50, p95, max) of one measured interval; the target, if any, applies to p95. */
export const spreadFigures = (name: string, s: Spread, unit: string, p95Limit?: number): Figure[] => [
  plain(`${name} p50`, s.p50, unit),
  p95Limit === undefined ? plain(`${name} p95`, s.p95, unit) : atMost(`${name} p95`, s.p95, unit, p95Limit),
  plain(`${name} max`, s.max, unit),
];

const round = (v: number) => Math.round(v * 10) / 10;

export const printResult = (result: BenchResult): void => {
  console.log(`\n${result.bench}`);
  for (const f of result.figures) {
    const verdict = f.target === undefined ? '' : `  (target ${f.target}: ${f.met ? 'met' : 'NOT met'})`;
    console.log(`  ${f.name.padEnd(48)} ${String(round(f.value)).padStart(9)} ${f.unit}${verdict}`);
  }
  for (const note of result.notes) console.log(`  note: ${note}`);
  console.log(`BENCH_RESULT ${JSON.stringify(result)}`);
};

/** The machine's state beside the figures: other work on a 2-core box moves them a lot. */
export const machineNote = (when: string): string => {
  const [one = 0, five = 0] = loadavg();
  return `${when}: load average ${one.toFixed(2)} (1 min), ${five.toFixed(2)} (5 min) on ${availableParallelism()} cores`;
};

/** Milliseconds one synchronous call takes. */
export const timeOnce = (f: () => unknown): number => {
  const t = performance.now();
  f();
  return performance.now() - t;
};

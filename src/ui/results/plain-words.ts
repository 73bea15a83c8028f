/**
 * The headline of each finding in plain words, from the report's own figures: what changed with
 * the suggestion, how sure we can be, and how often readers followed it when it was wrong.
 */
import type { AveragedValue } from '../../analysis/reader-bootstrap';
import type { GroupFinding } from '../../analysis/report-types';
import { dec, pct } from './format';
import { MIN_READERS_FOR_RANDOM, type IndexedReader } from './figure-data';

const points = (x: number): string => {
  const whole = Math.round(x * 100);
  return whole === 0 ? '0 points' : `${whole > 0 ? '+' : '−'}${Math.abs(whole)} points`;
};

/** How sure: an interval that excludes 0 points to a real change; one that includes 0 does not rule out none. */
export const sureness = (lower: number | null, upper: number | null): string => {
  if (lower === null || upper === null) return 'there is no interval to say how sure this is';
  if (lower > 0) return 'the interval lies above zero, so the data point to a real gain';
  if (upper < 0) return 'the interval lies below zero, so the data point to a real loss';
  return 'the interval includes zero, so the data are also consistent with no change';
};

const averaged = (v: AveragedValue, asPoints: boolean): string =>
  v.lower === null || v.upper === null ? '' : ` (95% interval ${asPoints ? `${points(v.lower)} to ${points(v.upper)}` : `${dec(v.lower, 3)} to ${dec(v.upper, 3)}`})`;

const range = (values: number[]): string => {
  if (values.length < 2) return '';
  let lo = Infinity;
  let hi = -Infinity;
  for (const v of values) { lo = Math.min(lo, v); hi = Math.max(hi, v); }
  return `; from ${pct(lo)} to ${pct(hi)} across readers`;
};

/** Sentences for the top of a finding's results. */
export const headline = (g: GroupFinding, readers: readonly IndexedReader[]): string[] => {
  const ra = g.reader_averaged;
  const out: string[] = [`${g.readers} reader${g.readers === 1 ? '' : 's'} read ${g.cases} case${g.cases === 1 ? '' : 's'} for “${g.finding}”.`];
  if (ra.unaided_accuracy.estimate !== null && ra.aided_accuracy.estimate !== null && ra.accuracy_difference.estimate !== null) {
    out.push(`On average a reader was right in ${pct(ra.unaided_accuracy.estimate)} of reads without the suggestion and ${pct(ra.aided_accuracy.estimate)} with it: a change of ${points(ra.accuracy_difference.estimate)}${averaged(ra.accuracy_difference, true)}; ${sureness(ra.accuracy_difference.lower, ra.accuracy_difference.upper)}.`);
  } else if (ra.aided_accuracy.estimate !== null) {
    out.push(`On average a reader was right in ${pct(ra.aided_accuracy.estimate)} of reads with the suggestion (no reads without it to compare).`);
  }
  if (g.mrmc) {
    const r = g.mrmc.random;
    out.push(`Telling present from absent (AUC, 1 is perfect, 0.5 is guessing) changed by ${r.difference >= 0 ? '+' : '−'}${Math.abs(r.difference).toFixed(3)} with the suggestion; for other readers and other cases like these, ${sureness(r.lower, r.upper)}${g.readers < MIN_READERS_FOR_RANDOM ? ` (but with fewer than ${MIN_READERS_FOR_RANDOM} readers this is a rough guide only)` : ''}.`);
  } else if (ra.auc_difference.estimate !== null) {
    out.push(`Telling present from absent (AUC) changed by ${ra.auc_difference.estimate >= 0 ? '+' : '−'}${Math.abs(ra.auc_difference.estimate).toFixed(3)} on average${averaged(ra.auc_difference, false)}; ${sureness(ra.auc_difference.lower, ra.auc_difference.upper)}.`);
  }
  const over = ra.overreliance;
  if (over.estimate !== null) {
    const per = readers.flatMap(({ entry }) => (entry.aided && entry.aided.overreliance.n > 0 && entry.aided.overreliance.estimate !== null ? [entry.aided.overreliance.estimate] : []));
    out.push(`When the suggestion was wrong, a reader followed it in ${pct(over.estimate)} of those reads on average${range(per)}.`);
  }
  const under = ra.underreliance;
  if (under.estimate !== null) out.push(`When the suggestion was right, a reader turned it down in ${pct(under.estimate)} of those reads on average.`);
  return out;
};

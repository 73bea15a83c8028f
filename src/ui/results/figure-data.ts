/**
 * The data behind each plot of the results page, taken from the engine's report (the same object
 * `heed analyze --json` prints) and nothing else, so every point drawn is a figure of the report.
 * Pure functions; the plot builders in src/io/plots turn them into pictures.
 */
import type { AnalysisReport, GroupFinding, ReaderEntry } from '../../analysis/report-types';
import type { Proportion } from '../../analysis/wilson';
import type { ForestRow } from '../../io/plots/forest-plot';
import type { CalibrationPoint } from '../../io/plots/calibration-plot';
import type { MrmcRow } from '../../io/plots/mrmc-plot';
import type { SubgroupPoint } from '../../io/plots/subgroup-plot';

export const Z95 = 1.959963984540054;
export const READER_AVERAGE = 'Reader average';
export const POOLED = 'All reads pooled';
export const MULTI_READER = 'Multi-reader result';

/** A reader entry with its index in report.readers (its place in the JSON). */
export type IndexedReader = { entry: ReaderEntry; index: number };

export const readersOf = (report: AnalysisReport, finding: string): IndexedReader[] =>
  report.readers.flatMap((entry, index) => (entry.finding === finding ? [{ entry, index }] : []));

const fromShare = (label: string, measure: string, series: string, p: Proportion | null | undefined, summary = false): ForestRow => ({
  label, measure, series, summary,
  estimate: p && p.n > 0 ? p.estimate : null, lower: p && p.n > 0 ? p.lower : null, upper: p && p.n > 0 ? p.upper : null,
});

const fromAveraged = (label: string, measure: string, v: { estimate: number | null; lower: number | null; upper: number | null }): ForestRow =>
  ({ label, measure, series: '', summary: true, estimate: v.estimate, lower: v.lower, upper: v.upper });

/** Over- and under-reliance per reader (Wilson intervals), then the reader average (bootstrap) and all reads pooled. */
export const relianceRows = (readers: readonly IndexedReader[], g: GroupFinding): ForestRow[] => {
  const rows: ForestRow[] = [];
  for (const [key, measure] of [['overreliance', 'Followed a wrong suggestion'], ['underreliance', 'Rejected a right suggestion']] as const) {
    for (const { entry } of readers) rows.push(fromShare(entry.reader_id, measure, '', entry.aided?.[key]));
    rows.push(fromAveraged(READER_AVERAGE, measure, g.reader_averaged[key]));
    rows.push(fromShare(POOLED, measure, '', g.pooled.aided?.[key], true));
  }
  return rows;
};

const difference = (a: number | null | undefined, b: number | null | undefined): number | null =>
  a === null || a === undefined || b === null || b === undefined ? null : a - b;

/** Clips an interval to [min, max] and says which ends were clipped. */
export const clipInterval = (lower: number, upper: number, min: number, max: number) => {
  const ends: number[] = [];
  const lo = lower < min ? (ends.push(min), min) : lower;
  const hi = upper > max ? (ends.push(max), max) : upper;
  return { lower: lo, upper: hi, clippedEnds: ends };
};

/**
 * With minus without, per reader: accuracy (a point: each reader's aided accuracy minus unaided
 * accuracy) and AUC (from the reader's cases read both ways, paired DeLong difference ± 1.96·SE,
 * clipped to [-1, 1]; a point only where there are no such pairs). Then the reader average
 * (bootstrap) and, for AUC, the multi-reader result for other readers and other cases.
 */
export const differenceRows = (readers: readonly IndexedReader[], g: GroupFinding): ForestRow[] => {
  const rows: ForestRow[] = [];
  const acc = 'Accuracy';
  const auc = 'AUC';
  for (const { entry } of readers) {
    rows.push({ label: entry.reader_id, measure: acc, series: '', summary: false, estimate: difference(entry.aided?.accuracy.estimate, entry.unaided?.accuracy.estimate), lower: null, upper: null });
  }
  rows.push(fromAveraged(READER_AVERAGE, acc, g.reader_averaged.accuracy_difference));
  for (const { entry } of readers) {
    const paired = entry.crossover?.auc_difference ?? null;
    if (paired !== null) {
      const c = clipInterval(paired.difference - Z95 * paired.se, paired.difference + Z95 * paired.se, -1, 1);
      rows.push({ label: entry.reader_id, measure: auc, series: '', summary: false, estimate: paired.difference, lower: c.lower, upper: c.upper, clippedEnds: c.clippedEnds });
    } else rows.push({ label: entry.reader_id, measure: auc, series: '', summary: false, estimate: difference(entry.aided?.auc.estimate, entry.unaided?.auc.estimate), lower: null, upper: null });
  }
  rows.push(fromAveraged(READER_AVERAGE, auc, g.reader_averaged.auc_difference));
  if (g.mrmc) {
    const c = clipInterval(g.mrmc.random.lower, g.mrmc.random.upper, -1, 1);
    rows.push({ label: MULTI_READER, measure: auc, series: '', summary: true, estimate: g.mrmc.random.difference, lower: c.lower, upper: c.upper, clippedEnds: c.clippedEnds });
  }
  return rows;
};

export const SWITCH_MEASURES = [
  ['changed', 'Changed the call'], ['toward_ai', 'Changed toward the suggestion'],
  ['beneficial', 'Wrong → right'], ['detrimental', 'Right → wrong'],
] as const;

/** Sequential reads: share of reads whose call changed, toward the suggestion, for the better, for the worse. */
export const switchingRows = (readers: readonly IndexedReader[], g: GroupFinding): ForestRow[] =>
  SWITCH_MEASURES.flatMap(([key, measure]) => [
    ...readers.filter(({ entry }) => entry.sequential).map(({ entry }) => fromShare(entry.reader_id, measure, '', entry.sequential?.[key])),
    fromShare(POOLED, measure, '', g.pooled.sequential?.[key], true),
  ]);

export const WITH_NOTICE = 'with notice';
export const WITHOUT_NOTICE = 'without notice';

/** Over-reliance with and without the caution notice, per reader and pooled. */
export const cautionRows = (readers: readonly IndexedReader[], g: GroupFinding): ForestRow[] => {
  const rows: ForestRow[] = [];
  const measure = 'Followed a wrong suggestion';
  for (const { entry } of readers) {
    rows.push(fromShare(entry.reader_id, measure, WITH_NOTICE, entry.aided?.caution.shown));
    rows.push(fromShare(entry.reader_id, measure, WITHOUT_NOTICE, entry.aided?.caution.not_shown));
  }
  rows.push(fromShare(POOLED, measure, WITH_NOTICE, g.pooled.aided?.caution.shown, true));
  rows.push(fromShare(POOLED, measure, WITHOUT_NOTICE, g.pooled.aided?.caution.not_shown, true));
  return rows;
};

export const UNAIDED = 'without suggestion';
export const AIDED = 'with suggestion';

type TimeLike = { median_ms: number | null; q1_ms: number | null; q3_ms: number | null } | undefined;
const timeRow = (label: string, series: string, t: TimeLike, summary = false): ForestRow => ({
  label, measure: 'Reading time per read', series, summary,
  estimate: t?.median_ms == null ? null : t.median_ms / 1000,
  lower: t?.q1_ms == null ? null : t.q1_ms / 1000, upper: t?.q3_ms == null ? null : t.q3_ms / 1000,
});

/** Reading time in seconds per reader and condition: median, with the middle half (quartiles) as the bar. */
export const timeRows = (readers: readonly IndexedReader[], g: GroupFinding): ForestRow[] => [
  ...readers.flatMap(({ entry }) => [timeRow(entry.reader_id, UNAIDED, entry.unaided?.time), timeRow(entry.reader_id, AIDED, entry.aided?.time)]),
  timeRow(POOLED, UNAIDED, g.pooled.unaided?.time, true), timeRow(POOLED, AIDED, g.pooled.aided?.time, true),
];

/** Pooled subgroups with both figures defined: the suggestion's accuracy and readers' over-reliance. */
export const subgroupPoints = (g: GroupFinding): SubgroupPoint[] =>
  g.subgroups.flatMap((s) => (s.ai_accuracy.estimate === null || s.overreliance.estimate === null ? [] : [{
    label: `${s.attribute}: ${s.value || '(empty)'}`,
    aiAccuracy: s.ai_accuracy.estimate, aiLower: s.ai_accuracy.lower ?? s.ai_accuracy.estimate, aiUpper: s.ai_accuracy.upper ?? s.ai_accuracy.estimate,
    over: s.overreliance.estimate, overLower: s.overreliance.lower ?? s.overreliance.estimate, overUpper: s.overreliance.upper ?? s.overreliance.estimate,
  }]));

/** The non-empty calibration bins of all reads pooled, per condition. */
export const calibrationPoints = (g: GroupFinding): CalibrationPoint[] =>
  (['unaided', 'aided'] as const).flatMap((condition) => (g.pooled[condition]?.calibration?.bins ?? [])
    .flatMap((b) => (b.mean_predicted === null || b.observed === null ? [] : [{ condition, predicted: b.mean_predicted, observed: b.observed, n: b.n }])));

export const MRMC_QUESTIONS = [
  { key: 'random', label: 'Other readers, other cases', sentence: 'generalises to other readers and other cases like these: the question a study is usually asked.' },
  { key: 'fixedReaders', label: 'These readers, other cases', sentence: 'holds for these readers only, reading other cases like these.' },
  { key: 'fixedCases', label: 'These cases, other readers', sentence: 'holds for these cases only, read by other readers like these.' },
] as const;

/** The three intervals of the multi-reader result, each clipped to [-1, 1] with the clipped ends flagged. */
export const mrmcRows = (g: GroupFinding): MrmcRow[] => {
  const m = g.mrmc;
  if (m === null) return [];
  return MRMC_QUESTIONS.map(({ key, label }) => {
    const t = m[key];
    const c = clipInterval(t.lower, t.upper, -1, 1);
    return { label, difference: t.difference, lower: c.lower, upper: c.upper, clippedLower: t.lower < -1, clippedUpper: t.upper > 1 };
  });
};

/** Rule used on the page: the random-reader result wants at least this many readers (common practice, no published source found). */
export const MIN_READERS_FOR_RANDOM = 4;

/**
 * A forest plot: one row per reader (and summary rows below a gap), a dot at each estimate with its
 * interval as a line, a reference line (0 for differences), one panel per measure side by side.
 * Several series in one row (e.g. with and without a notice) sit just above and below the row's
 * centre and differ by colour, shape and dash, never by colour alone. Interval ends clipped to what
 * is possible are drawn as open circles (the caller says so in words too).
 */
import * as Plot from '@observablehq/plot';
import type { PlotOptions } from './render';
import { FONT, PALETTE } from './theme';

export type ForestRow = {
  /** the row label (a reader code, or a summary such as "Reader average") */
  label: string;
  /** the panel (e.g. "Over-reliance") */
  measure: string;
  /** the series within a row (e.g. "with notice"); one series per plot is the common case */
  series: string;
  estimate: number | null;
  lower: number | null;
  upper: number | null;
  /** summary rows are drawn bolder, as diamonds */
  summary: boolean;
  /** ends of the interval that were clipped to the possible range (drawn as open circles) */
  clippedEnds?: readonly number[];
};

export type SeriesStyle = { name: string; color: string; symbol: string; dash: string };

export const DEFAULT_SERIES: SeriesStyle = { name: '', color: PALETTE.ink, symbol: 'circle', dash: '' };

export type ForestInput = {
  rows: readonly ForestRow[];
  series?: readonly SeriesStyle[];
  /** x domain; defaults to the data's extent with the reference line */
  domain?: [number, number];
  reference?: number | null;
  xLabel: string;
  /** show values as percentages on the axis */
  percent?: boolean;
  width: number;
};

/** The plot's options. Row order is the order of first appearance in rows. */
export const forestPlot = (input: ForestInput): PlotOptions => {
  const series = input.series ?? [DEFAULT_SERIES];
  const labels: string[] = [];
  for (const r of input.rows) if (!labels.includes(r.label)) labels.push(r.label);
  const measures: string[] = [];
  for (const r of input.rows) if (!measures.includes(r.measure)) measures.push(r.measure);
  const shown = input.rows.filter((r) => r.estimate !== null);
  const step = series.length > 1 ? 9 : 0;
  const offset = (i: number) => (i - (series.length - 1) / 2) * step;
  const height = 44 + labels.length * (series.length > 1 ? 26 : 20);
  const ref = input.reference === undefined ? null : input.reference;
  return {
    width: input.width, height, marginLeft: 120, marginRight: 16, marginTop: 26, marginBottom: 38,
    style: { fontFamily: FONT, fontSize: '12px' },
    x: { domain: input.domain, label: input.xLabel, grid: true, tickFormat: input.percent ? (d: number) => `${Math.round(d * 100)}%` : undefined, ticks: measures.length > 2 ? 3 : 5 },
    y: { domain: labels, label: null, tickFormat: (d: string) => d },
    fx: { domain: measures, label: null, padding: measures.length > 2 ? 0.18 : 0.08 },
    marks: [
      ...(ref === null ? [] : [Plot.ruleX([ref], { stroke: '#777', strokeDasharray: '3,3' })]),
      ...series.flatMap((s, i) => {
        const rows = shown.filter((r) => series.length === 1 || r.series === s.name);
        return [
          Plot.ruleY(rows.filter((r) => r.lower !== null && r.upper !== null), { y: 'label', x1: 'lower', x2: 'upper', fx: 'measure', dy: offset(i), stroke: s.color, strokeWidth: (d: ForestRow) => (d.summary ? 3 : 1.6), strokeDasharray: s.dash }),
          Plot.dot(rows, { y: 'label', x: 'estimate', fx: 'measure', dy: offset(i), fill: s.color, stroke: 'white', symbol: (d: ForestRow) => (d.summary ? 'diamond' : s.symbol), r: (d: ForestRow) => (d.summary ? 6 : 4) }),
          Plot.dot(rows.flatMap((r) => (r.clippedEnds ?? []).map((x) => ({ ...r, x }))), { y: 'label', x: 'x', fx: 'measure', dy: offset(i), stroke: s.color, fill: 'white', r: 3.5, strokeWidth: 1.5 }),
        ];
      }),
      Plot.axisFx({ anchor: 'top', label: null, fontWeight: 600 }),
    ],
  };
};

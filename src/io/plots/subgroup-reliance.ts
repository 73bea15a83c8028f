import * as Plot from '@observablehq/plot';
import type { PlotOptions } from './render';
import { PALETTE, SIZE } from './theme';

export type SubgroupPoint = { value: string; measure: 'suggestion right' | 'you followed it when wrong'; estimate: number; lower: number | null; upper: number | null };

/**
 * Per value of a case attribute: the suggestion's accuracy there (green squares) beside the
 * reader's over-reliance there (vermilion triangles), with 95% intervals.
 */
export const subgroupPlot = (points: readonly SubgroupPoint[]): PlotOptions => ({
  width: SIZE.width,
  height: 60 + 44 * new Set(points.map((p) => p.value)).size,
  marginLeft: 110,
  x: { domain: [0, 1], tickFormat: '.0%', grid: true, label: null },
  fy: { axis: 'left', label: null, domain: [...new Set(points.map((p) => p.value))] },
  y: { axis: null, domain: ['suggestion right', 'you followed it when wrong'] },
  color: { domain: ['suggestion right', 'you followed it when wrong'], range: [PALETTE.model, PALETTE.reader], legend: true },
  symbol: { domain: ['suggestion right', 'you followed it when wrong'], range: ['square', 'triangle'] },
  marks: [
    Plot.ruleY(points.filter((p) => p.lower !== null), { fy: 'value', y: 'measure', x1: 'lower', x2: 'upper', stroke: 'measure', strokeWidth: 2 }),
    Plot.dot(points, { fy: 'value', y: 'measure', x: 'estimate', fill: 'measure', symbol: 'measure', r: 5, stroke: PALETTE.ink, strokeWidth: 0.5 }),
  ],
});

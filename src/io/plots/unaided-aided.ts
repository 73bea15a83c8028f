import * as Plot from '@observablehq/plot';
import type { PlotOptions } from './render';
import { PALETTE, SIZE, SYMBOL } from './theme';

export type ConditionPoint = { measure: string; condition: 'unaided' | 'aided'; estimate: number; lower: number | null; upper: number | null };

/** Each measure unaided (blue circles) against aided (orange triangles), with 95% intervals as bars. */
export const unaidedAidedPlot = (points: readonly ConditionPoint[]): PlotOptions => ({
  width: SIZE.width,
  height: 60 + 44 * new Set(points.map((p) => p.measure)).size,
  marginLeft: 130,
  x: { domain: [0, 1], grid: true, label: 'estimate with 95% interval', labelAnchor: 'center', labelArrow: 'none' },
  y: { axis: null, domain: ['unaided', 'aided'] },
  fy: { axis: 'left', label: null, domain: [...new Set(points.map((p) => p.measure))] },
  color: { domain: ['unaided', 'aided'], range: [PALETTE.unaided, PALETTE.aided], legend: true },
  symbol: { domain: ['unaided', 'aided'], range: [SYMBOL.unaided, SYMBOL.aided] },
  marks: [
    Plot.ruleY(points.filter((p) => p.lower !== null), { fy: 'measure', y: 'condition', x1: 'lower', x2: 'upper', stroke: 'condition', strokeWidth: 2 }),
    Plot.dot(points, { fy: 'measure', y: 'condition', x: 'estimate', fill: 'condition', symbol: 'condition', r: 5, stroke: PALETTE.ink, strokeWidth: 0.5 }),
  ],
});

import * as Plot from '@observablehq/plot';
import type { PlotOptions } from './render';
import { DASH, PALETTE, SIZE, SYMBOL } from './theme';

export type CalibrationPoint = { condition: 'unaided' | 'aided'; expected: number; observed: number; lower: number | null; upper: number | null; n: number };

/**
 * Stated confidence against the share right: x is the share right that the stated confidence
 * implies, y the share actually right (95% interval as a bar); the dashed diagonal is a
 * perfectly calibrated reader. Unaided blue circles, aided orange triangles.
 */
export const confidenceCalibrationPlot = (points: readonly CalibrationPoint[]): PlotOptions => ({
  width: SIZE.width,
  height: SIZE.height + 40,
  x: { domain: [0.5, 1], tickFormat: '.0%', label: 'share right your confidence implied', labelAnchor: 'center', labelArrow: 'none' },
  y: { domain: [0, 1], tickFormat: '.0%', grid: true, label: 'share you got right', labelArrow: 'none' },
  color: { domain: ['unaided', 'aided'], range: [PALETTE.unaided, PALETTE.aided], legend: true },
  symbol: { domain: ['unaided', 'aided'], range: [SYMBOL.unaided, SYMBOL.aided] },
  marks: [
    Plot.line([{ x: 0.5, y: 0.5 }, { x: 1, y: 1 }], { x: 'x', y: 'y', stroke: PALETTE.ink, strokeDasharray: DASH.aided || '4,3', strokeOpacity: 0.6 }),
    Plot.ruleX(points.filter((p) => p.lower !== null), { x: 'expected', y1: 'lower', y2: 'upper', stroke: 'condition', strokeOpacity: 0.6, dx: 0 }),
    Plot.dot(points, { x: 'expected', y: 'observed', fill: 'condition', symbol: 'condition', r: (d: CalibrationPoint) => 3 + Math.min(6, Math.sqrt(d.n)), stroke: PALETTE.ink, strokeWidth: 0.5 }),
  ],
});

/**
 * Calibration (reliability) of the readers' stated likelihood: for each tenth of the 0–100 scale,
 * the mean stated likelihood against the share of cases where the finding was present, without
 * and with the suggestion (colour, dash and shape differ). On the diagonal, stated equals seen.
 */
import * as Plot from '@observablehq/plot';
import type { Condition } from './roc-plot';
import type { PlotOptions } from './render';
import { DASH, PALETTE, SYMBOL } from './theme';

export type CalibrationPoint = { condition: Condition; predicted: number; observed: number; n: number };

export const calibrationPlot = (input: { points: readonly CalibrationPoint[]; size: number }): PlotOptions => ({
  width: input.size + 40, height: input.size, marginLeft: 46, marginBottom: 40,
  x: { domain: [0, 1], label: 'Stated likelihood present →', tickFormat: (d: number) => `${Math.round(d * 100)}%` },
  y: { domain: [0, 1], label: '↑ Finding present (share)', tickFormat: (d: number) => `${Math.round(d * 100)}%` },
  marks: [
    Plot.frame({ stroke: '#ccc' }),
    Plot.line([[0, 0], [1, 1]], { stroke: '#aaa', strokeDasharray: '2,3' }),
    ...(['unaided', 'aided'] as const).flatMap((c) => {
      const pts = input.points.filter((p) => p.condition === c);
      return [
        Plot.line(pts, { x: 'predicted', y: 'observed', stroke: PALETTE[c], strokeWidth: 2, strokeDasharray: DASH[c] }),
        Plot.dot(pts, { x: 'predicted', y: 'observed', fill: PALETTE[c], symbol: SYMBOL[c], r: 4.5, stroke: 'white' }),
      ];
    }),
  ],
});

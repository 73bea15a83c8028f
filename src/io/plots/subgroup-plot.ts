/**
 * Where the model is weaker, do readers follow it more? One point per case attribute value
 * (e.g. "scanner: Korvik"): across, the suggestion's own accuracy there; up, readers' over-
 * reliance there (share of wrong suggestions followed), each with its 95% Wilson interval.
 */
import * as Plot from '@observablehq/plot';
import type { PlotOptions } from './render';
import { PALETTE } from './theme';

export type SubgroupPoint = { label: string; aiAccuracy: number; aiLower: number; aiUpper: number; over: number; overLower: number; overUpper: number };

export const subgroupPlot = (input: { points: readonly SubgroupPoint[]; width: number }): PlotOptions => ({
  width: input.width, height: 300, marginLeft: 52, marginBottom: 42, marginRight: 24,
  x: { domain: [0, 1], label: 'Suggestion right (share of cases) →', tickFormat: (d: number) => `${Math.round(d * 100)}%`, grid: true },
  y: { domain: [0, 1], label: '↑ Readers followed a wrong suggestion', tickFormat: (d: number) => `${Math.round(d * 100)}%`, grid: true },
  marks: [
    Plot.frame({ stroke: '#ccc' }),
    Plot.ruleY(input.points, { y: 'over', x1: 'aiLower', x2: 'aiUpper', stroke: PALETTE.model, strokeWidth: 1.5 }),
    Plot.ruleX(input.points, { x: 'aiAccuracy', y1: 'overLower', y2: 'overUpper', stroke: PALETTE.reader, strokeWidth: 1.5, strokeDasharray: '4,2' }),
    Plot.dot(input.points, { x: 'aiAccuracy', y: 'over', r: 5, fill: PALETTE.ink, symbol: 'square' }),
    // labels alternate above and below their point, so neighbours do not print over each other
    Plot.text(input.points.filter((_, i) => i % 2 === 0), { x: 'aiAccuracy', y: 'over', text: 'label', dx: 8, dy: -10, textAnchor: 'start', fill: PALETTE.ink, fontWeight: 600 }),
    Plot.text(input.points.filter((_, i) => i % 2 === 1), { x: 'aiAccuracy', y: 'over', text: 'label', dx: 8, dy: 12, textAnchor: 'start', fill: PALETTE.ink, fontWeight: 600 }),
  ],
});

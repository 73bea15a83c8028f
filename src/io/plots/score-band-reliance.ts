import * as Plot from '@observablehq/plot';
import type { PlotOptions } from './render';
import { PALETTE, SIZE } from './theme';

export type BandPoint = { band: string; suggestion: 'right' | 'wrong'; estimate: number; lower: number | null; upper: number | null; n: number };

/**
 * Share of reads following the suggestion per shown-score band (one facet each, in score
 * order), when the suggestion was right (blue circles) and wrong (orange triangles), with 95%
 * intervals.
 */
export const scoreBandPlot = (points: readonly BandPoint[], bands: readonly string[]): PlotOptions => ({
  width: SIZE.width,
  height: SIZE.height,
  fx: { domain: [...bands], label: 'score the suggestion showed', labelAnchor: 'center', labelArrow: 'none' },
  x: { domain: ['right', 'wrong'], axis: null, padding: 0.4 },
  y: { domain: [0, 1], tickFormat: '.0%', grid: true, label: 'you followed it', labelArrow: 'none' },
  color: { domain: ['right', 'wrong'], range: [PALETTE.unaided, PALETTE.aided], legend: true, tickFormat: (d: string) => `suggestion ${d}` },
  symbol: { domain: ['right', 'wrong'], range: ['circle', 'triangle'] },
  marks: [
    Plot.ruleX(points.filter((p) => p.lower !== null), { fx: 'band', x: 'suggestion', y1: 'lower', y2: 'upper', stroke: 'suggestion', strokeWidth: 2 }),
    Plot.dot(points, { fx: 'band', x: 'suggestion', y: 'estimate', fill: 'suggestion', symbol: 'suggestion', r: 5, stroke: PALETTE.ink, strokeWidth: 0.5 }),
  ],
});

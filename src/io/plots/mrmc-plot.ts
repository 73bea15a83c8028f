/**
 * The multi-reader result: the reader-averaged AUC difference (with minus without suggestion) as
 * one dot with three 95% intervals, one per question (other readers and cases; these readers;
 * these cases), against the line of no difference. An interval reaching past what an AUC
 * difference can be ([-1, 1]) is drawn to the limit with an open circle there; the caller marks
 * it in words too.
 */
import * as Plot from '@observablehq/plot';
import type { PlotOptions } from './render';
import { PALETTE } from './theme';

export type MrmcRow = { label: string; difference: number; lower: number; upper: number; clippedLower: boolean; clippedUpper: boolean };

export const mrmcPlot = (input: { rows: readonly MrmcRow[]; width: number }): PlotOptions => {
  let lo = 0;
  let hi = 0;
  for (const r of input.rows) { lo = Math.min(lo, r.lower); hi = Math.max(hi, r.upper); }
  const pad = Math.max(0.02, (hi - lo) * 0.08);
  const ends = input.rows.flatMap((r) => [...(r.clippedLower ? [{ label: r.label, x: r.lower }] : []), ...(r.clippedUpper ? [{ label: r.label, x: r.upper }] : [])]);
  return {
    width: input.width, height: 40 + input.rows.length * 42, marginLeft: 190, marginRight: 20, marginTop: 14, marginBottom: 40,
    x: { domain: [Math.max(-1, lo - pad), Math.min(1, hi + pad)], label: 'AUC with suggestion − AUC without →', grid: true, ticks: 6 },
    y: { domain: input.rows.map((r) => r.label), label: null },
    marks: [
      Plot.ruleX([0], { stroke: '#555', strokeDasharray: '4,3' }),
      Plot.ruleY(input.rows, { y: 'label', x1: 'lower', x2: 'upper', stroke: PALETTE.unaided, strokeWidth: 3 }),
      Plot.tickX(input.rows, { y: 'label', x: 'lower', stroke: PALETTE.unaided, strokeWidth: 2, inset: 8 }),
      Plot.tickX(input.rows, { y: 'label', x: 'upper', stroke: PALETTE.unaided, strokeWidth: 2, inset: 8 }),
      Plot.dot(ends, { y: 'label', x: 'x', r: 5, stroke: PALETTE.reader, fill: 'white', strokeWidth: 2 }),
      Plot.dot(input.rows, { y: 'label', x: 'difference', r: 6, fill: PALETTE.aided, stroke: PALETTE.ink, symbol: 'diamond' }),
    ],
  };
};

/**
 * ROC curves without and with the suggestion on one square: each condition its own colour and
 * dash (theme.ts), the chance diagonal, and each curve's AUC written in the corner.
 */
import * as Plot from '@observablehq/plot';
import type { PlotOptions } from './render';
import { DASH, PALETTE, SIZE } from './theme';

export type Condition = 'unaided' | 'aided';
export type RocLine = { condition: Condition; points: readonly { fpr: number; tpr: number }[] };

export const CONDITION_LABEL: Record<Condition, string> = { unaided: 'Without suggestion', aided: 'With suggestion' };

const flatten = (lines: readonly RocLine[]) => lines.flatMap((l) => l.points.map((p) => ({ condition: l.condition, fpr: p.fpr, tpr: p.tpr })));

/** One ROC square: lines per condition, AUC text per condition (null AUCs are left out). */
export const rocPlot = (input: { lines: readonly RocLine[]; auc: Record<Condition, number | null>; size?: number }): PlotOptions => {
  const size = input.size ?? SIZE.height;
  const data = flatten(input.lines);
  const labels = (['unaided', 'aided'] as const).filter((c) => input.auc[c] !== null)
    .map((c, i) => ({ text: `${CONDITION_LABEL[c]}: AUC ${(input.auc[c] as number).toFixed(3)}`, condition: c, row: i }));
  return {
    width: size + 40, height: size, marginLeft: 46, marginBottom: 40,
    x: { domain: [0, 1], label: 'False-positive rate (1 − specificity) →', ticks: 5 },
    y: { domain: [0, 1], label: '↑ True-positive rate (sensitivity)', ticks: 5 },
    color: { domain: ['unaided', 'aided'], range: [PALETTE.unaided, PALETTE.aided] },
    marks: [
      Plot.frame({ stroke: '#ccc' }),
      Plot.line([[0, 0], [1, 1]], { stroke: '#aaa', strokeDasharray: '2,3' }),
      ...(['unaided', 'aided'] as const).map((c) => Plot.line(data.filter((d) => d.condition === c), { x: 'fpr', y: 'tpr', stroke: PALETTE[c], strokeWidth: 2, strokeDasharray: DASH[c] })),
      labelRows(labels),
    ],
  };
};

// AUC labels stacked in the bottom-right corner, one text mark per row (Plot offsets are per mark;
// Plot takes a nested array of marks as marks).
const labelRows = (labels: { text: string; condition: Condition; row: number }[]) =>
  (labels.map((l) => Plot.text([l], { text: 'text', frameAnchor: 'bottom-right', dx: -6, dy: -6 - 16 * (labels.length - 1 - l.row), fill: l.condition === 'unaided' ? PALETTE.unaided : '#8a5a00', fontWeight: 600 })));

/** Small multiples: one ROC square per reader, both conditions in each, `columns` squares a row. */
export const rocSmallMultiples = (input: { readers: readonly { reader: string; lines: readonly RocLine[] }[]; columns: number; cell?: number }): PlotOptions => {
  const cell = input.cell ?? 170;
  const data = input.readers.flatMap((r, i) => flatten(r.lines).map((p) => ({ ...p, reader: r.reader, col: i % input.columns, row: Math.floor(i / input.columns) })));
  const names = input.readers.map((r, i) => ({ reader: r.reader, col: i % input.columns, row: Math.floor(i / input.columns) }));
  const rows = Math.max(1, Math.ceil(input.readers.length / input.columns));
  return {
    width: input.columns * cell + 50, height: rows * cell + 50, marginLeft: 40, marginBottom: 36,
    x: { domain: [0, 1], ticks: 2, label: 'False-positive rate →' },
    y: { domain: [0, 1], ticks: 2, label: '↑ True-positive rate' },
    fx: { axis: null, padding: 0.12 }, fy: { axis: null, padding: 0.16 },
    marks: [
      Plot.frame({ stroke: '#ccc' }),
      Plot.line([[0, 0], [1, 1]], { stroke: '#bbb', strokeDasharray: '2,3' }),
      ...(['unaided', 'aided'] as const).map((c) => Plot.line(data.filter((d) => d.condition === c), { x: 'fpr', y: 'tpr', z: 'reader', fx: 'col', fy: 'row', stroke: PALETTE[c], strokeWidth: 1.6, strokeDasharray: DASH[c] })),
      Plot.text(names, { text: 'reader', fx: 'col', fy: 'row', frameAnchor: 'bottom-right', dx: -4, dy: -4, fontWeight: 600, fill: PALETTE.ink }),
    ],
  };
};

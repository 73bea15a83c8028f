/**
 * Power curves of a plan (analysis/planner): the chance of each answer as one quantity of the
 * design grows (readers, cases or wrong-suggestion reads per reader), one figure per quantity.
 * Over-reliance power: sky blue, circles, solid; AUC power: bluish green, triangles, dashed.
 * Example: renderPlot(powerCurvePlot(report.curves.points, 'readers'), document).
 */
import * as Plot from '@observablehq/plot';
import type { CurveDimension, CurvePoint } from '../../analysis/planner/plan-report';
import type { PlotOptions } from './render';
import { PALETTE, SIZE } from './theme';

const X_LABEL: Record<CurveDimension, string> = { readers: 'Readers', cases: 'Cases', wrong: 'Wrong suggestions per reader' };

const xOf = (p: CurvePoint, vary: CurveDimension): number => (vary === 'readers' ? p.readers : vary === 'cases' ? p.cases : p.wrong_reads_per_reader);

export type PowerRow = { x: number; power: number; answer: string };

export const powerCurveRows = (points: readonly CurvePoint[], vary: CurveDimension): PowerRow[] =>
  points.filter((p) => p.vary === vary).flatMap((p) => [
    { x: xOf(p, vary), power: p.overreliance_power.rate, answer: 'over-reliance above the reference' },
    ...(p.auc_power === null ? [] : [{ x: xOf(p, vary), power: p.auc_power.rate, answer: 'AUC difference' }]),
  ]).sort((a, b) => a.x - b.x);

export const powerCurvePlot = (points: readonly CurvePoint[], vary: CurveDimension, design: number): PlotOptions => {
  const rows = powerCurveRows(points, vary);
  return {
    width: SIZE.small * 1.4,
    height: SIZE.small,
    marginLeft: 44,
    x: { label: X_LABEL[vary], grid: true },
    y: { label: 'Power', domain: [0, 1], grid: true, tickFormat: '%' },
    color: { domain: ['over-reliance above the reference', 'AUC difference'], range: [PALETTE.neutral, PALETTE.model], legend: true },
    symbol: { domain: ['over-reliance above the reference', 'AUC difference'], range: ['circle', 'triangle'] },
    marks: [
      Plot.ruleY([0.8], { stroke: PALETTE.peer, strokeDasharray: '2,3' }),
      Plot.ruleX([design], { stroke: PALETTE.peer }),
      Plot.line(rows.filter((d) => d.answer !== 'AUC difference'), { x: 'x', y: 'power', stroke: 'answer' }),
      Plot.line(rows.filter((d) => d.answer === 'AUC difference'), { x: 'x', y: 'power', stroke: 'answer', strokeDasharray: '6,3' }),
      Plot.dot(rows, { x: 'x', y: 'power', stroke: 'answer', symbol: 'answer', fill: 'white' }),
    ],
  };
};

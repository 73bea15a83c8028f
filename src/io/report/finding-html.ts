// One finding's part of the reader's report as HTML: each figure with its sentence, its table
// (exact values in data attributes) and its plot.
import type { ConfidenceBin } from '../../analysis/reader-report/confidence-calibration';
import type { FindingReport } from '../../analysis/reader-report/reader-report';
import { tooFew } from '../../analysis/reader-report/small-count';
import type { AidedSection, ConditionSection } from '../../analysis/condition-section';
import { confidenceCalibrationPlot, type CalibrationPoint } from '../plots/confidence-calibration';
import { peerStripPlot } from '../plots/peer-strip';
import { scoreBandPlot, type BandPoint } from '../plots/score-band-reliance';
import { subgroupPlot, type SubgroupPoint } from '../plots/subgroup-reliance';
import { unaidedAidedPlot, type ConditionPoint } from '../plots/unaided-aided';
import { countCell, esc, numberCell, pctText, shareCell } from './html';
import { inlinePlot, type PlotTarget } from './inline-plot';

const p = (text: string, cls = 'explain'): string => (text ? `<p class="${cls}">${esc(text)}</p>` : '');

export const findingHtml = (f: FindingReport, target: PlotTarget, showFinding: boolean): string => {
  const title = showFinding ? ` <span class="meta">(finding: ${esc(f.finding)})</span>` : '';
  return `<div class="finding" data-finding="${esc(f.finding)}">
${glance(f, target, title)}
${conditions(f, target, title)}
${switching(f, title)}
${confidence(f, target, title)}
${bands(f, target, title)}
${subgroups(f, target, title)}
${time(f, title)}
</div>`;
};

const glance = (f: FindingReport, target: PlotTarget, title: string): string => {
  const a = f.entry.aided;
  const own = a?.overreliance.estimate;
  const strip = own !== null && own !== undefined && f.peers.values.length > 0
    ? inlinePlot(peerStripPlot(f.peers.values, own, 'followed a wrong suggestion'), target, `Your share of wrong suggestions followed, ${pctText(own)}, among ${f.peers.count} other readers (unnamed dots)`)
    : '';
  const peerRow = f.peers.note === null
    ? `<tr><th scope="row">Other readers (${f.peers.count}, not named)</th><td class="num" data-figure="peers.median" data-value="${f.peers.median}">median ${pctText(f.peers.median)}</td><td class="num" data-figure="peers.range" data-lower="${f.peers.min}" data-upper="${f.peers.max}">range ${pctText(f.peers.min)}–${pctText(f.peers.max)}</td></tr>`
    : '';
  return `<section aria-labelledby="glance-${esc(f.finding)}"><h2 id="glance-${esc(f.finding)}">Following the suggestion${title}</h2>
${p(f.headline, 'lead')}${p(f.headline_sure, 'sure')}${strip}${strip ? p('Each grey dot is one other reader of this study (not named); the orange line is you.', 'note') : ''}${f.peers.note ? p(f.peers.note, 'note') : ''}${p(f.under_text)}
${a === null ? '' : `<table><caption class="sr">Reliance on the suggestion</caption><thead><tr><th scope="col">With the suggestion shown</th><th scope="col">You</th><th scope="col"></th></tr></thead><tbody>
<tr><th scope="row">Followed it when it was wrong (over-reliance)</th>${shareCell('aided.overreliance', a.overreliance, tooFew)}<td></td></tr>
<tr><th scope="row">Went against it when it was right (under-reliance)</th>${shareCell('aided.underreliance', a.underreliance, tooFew)}<td></td></tr>
<tr><th scope="row">Agreed with it overall</th>${shareCell('aided.agreement', a.agreement, tooFew)}<td></td></tr>
${peerRow}</tbody></table>`}
</section>`;
};

const MEASURES = [['accuracy', 'Right calls (accuracy)'], ['sensitivity', 'Finding present: found (sensitivity)'], ['specificity', 'Finding absent: cleared (specificity)']] as const;

const conditions = (f: FindingReport, target: PlotTarget, title: string): string => {
  const { unaided, aided } = f.entry;
  const points: ConditionPoint[] = [];
  const add = (c: ConditionSection | AidedSection | null, condition: 'unaided' | 'aided') => {
    if (c === null) return;
    for (const [key, label] of MEASURES) {
      const v = c[key];
      if (v.estimate !== null) points.push({ measure: label.split(' (')[0] ?? key, condition, estimate: v.estimate, lower: v.lower, upper: v.upper });
    }
    if (c.auc.estimate !== null) points.push({ measure: 'AUC', condition, estimate: c.auc.estimate, lower: c.auc.lower, upper: c.auc.upper });
  };
  add(unaided, 'unaided');
  add(aided, 'aided');
  const rows = MEASURES.map(([key, label]) => `<tr><th scope="row">${label}</th>${shareCell(`unaided.${key}`, unaided?.[key], tooFew)}${shareCell(`aided.${key}`, aided?.[key], tooFew)}</tr>`).join('');
  const auc = `<tr><th scope="row">AUC (0.5 chance, 1 perfect)</th>${numberCell('unaided.auc', unaided?.auc.estimate, 2, unaided?.auc)}${numberCell('aided.auc', aided?.auc.estimate, 2, aided?.auc)}</tr>`;
  return `<section><h2>Without and with the suggestion${title}</h2>${p(f.conditions_text)}
${points.length > 0 ? inlinePlot(unaidedAidedPlot(points), target, 'Accuracy, sensitivity, specificity and AUC without (circles) and with (triangles) the suggestion, with 95% intervals') : ''}
<table><thead><tr><th scope="col"></th><th scope="col">Without the suggestion</th><th scope="col">With the suggestion</th></tr></thead><tbody>${rows}${auc}</tbody></table></section>`;
};

const switching = (f: FindingReport, title: string): string => {
  const s = f.switching;
  const seq = f.entry.sequential;
  if (s === null || seq === null) return '';
  const row = (label: string, c: { n: number; kept: number; better: number; worse: number }) =>
    `<tr><th scope="row">${label}</th><td class="num">${c.n}</td><td class="num">${c.kept}</td><td class="num">${c.better}</td><td class="num">${c.worse}</td></tr>`;
  return `<section><h2>Changing your mind${title}</h2>${p(s.text)}
<table><thead><tr><th scope="col">Your first call, then the suggestion</th><th scope="col">Reads</th><th scope="col">Kept your call</th><th scope="col">Changed for the better</th><th scope="col">Changed for the worse</th></tr></thead><tbody>
${row('Suggestion right', s.split.suggestion_right)}${row('Suggestion wrong', s.split.suggestion_wrong)}
<tr><th scope="row">All (as in the analysis)</th>${countCell('sequential.n', seq.n)}<td class="num">${seq.n - seq.changed.k}</td>${countCell('sequential.beneficial.k', seq.beneficial.k)}${countCell('sequential.detrimental.k', seq.detrimental.k)}</tr></tbody></table>
${p(s.rair_text)}
<table><tbody><tr><th scope="row">First call wrong, suggestion right: switched to it (RAIR)</th>${shareCell('sequential.rair', seq.rair, tooFew)}</tr>
<tr><th scope="row">First call right, suggestion wrong: kept your call (RSR)</th>${shareCell('sequential.rsr', seq.rsr, tooFew)}</tr>
<tr><th scope="row">Changed your call at all</th>${shareCell('sequential.changed', seq.changed, tooFew)}</tr>
<tr><th scope="row">Weight of advice, mean (0 kept your view, 1 adopted the suggestion)</th>${numberCell('sequential.woa.mean', seq.woa.mean, 2)}</tr>
<tr><th scope="row">Weight of advice, median</th>${numberCell('sequential.woa.median', seq.woa.median, 2)}</tr></tbody></table>
${p(s.woa_text)}</section>`;
};

const calPoints = (bins: readonly ConfidenceBin[], condition: 'unaided' | 'aided'): CalibrationPoint[] =>
  bins.flatMap((b) => (b.expected_right === null || b.right.estimate === null ? [] : [{ condition, expected: b.expected_right, observed: b.right.estimate, lower: b.right.lower, upper: b.right.upper, n: b.n }]));

const confidence = (f: FindingReport, target: PlotTarget, title: string): string => {
  const points = [...calPoints(f.calibration.unaided, 'unaided'), ...calPoints(f.calibration.aided, 'aided')];
  if (points.length === 0) return `<section><h2>How sure you were${title}</h2>${p('No confidence was asked in this study, so calibration cannot be shown.')}</section>`;
  const rows = f.calibration.unaided.map((u, i) => {
    const a = f.calibration.aided[i] as ConfidenceBin;
    const label = `${u.lower}–${u.upper === 100 ? '100' : u.upper - 1}`;
    return `<tr><th scope="row">${label}</th>${shareCell(`calibration.unaided.${i}`, u.right, tooFew)}${shareCell(`calibration.aided.${i}`, a.right, tooFew)}<td class="num">${pctText(u.expected_right ?? a.expected_right)}</td></tr>`;
  }).join('');
  const fc = f.followed_confidence;
  return `<section><h2>How sure you were${title}</h2>${p(f.calibration.text)}
${inlinePlot(confidenceCalibrationPlot(points), target, 'Share right against the share your stated confidence implied, without (circles) and with (triangles) the suggestion')}
<table><thead><tr><th scope="col">Stated confidence</th><th scope="col">Right, without the suggestion</th><th scope="col">Right, with it</th><th scope="col">Expected if calibrated</th></tr></thead><tbody>${rows}</tbody></table>
<h3>Confidence when you followed the suggestion</h3>${p(fc.text)}
<table><tbody><tr><th scope="row">Followed a wrong suggestion: mean confidence</th>${numberCell('followed.wrong', fc.wrong.mean, 0)}<td class="num">${fc.wrong.n} reads</td></tr>
<tr><th scope="row">Followed a right suggestion: mean confidence</th>${numberCell('followed.right', fc.right.mean, 0)}<td class="num">${fc.right.n} reads</td></tr></tbody></table></section>`;
};

const bandLabel = (lo: number, hi: number): string => `${lo.toFixed(1)}–${hi.toFixed(1)}`;

const bands = (f: FindingReport, target: PlotTarget, title: string): string => {
  const b = f.score_bands;
  if (b === null) return '';
  const labels = b.bands.map((x) => bandLabel(x.lower, x.upper));
  const points: BandPoint[] = [];
  b.bands.forEach((x, i) => {
    for (const [suggestion, v] of [['right', x.followed_right], ['wrong', x.followed_wrong]] as const) {
      if (v.estimate !== null) points.push({ band: labels[i] as string, suggestion, estimate: v.estimate, lower: v.lower, upper: v.upper, n: v.n });
    }
  });
  const rows = b.bands.map((x, i) => `<tr><th scope="row">${labels[i]}</th>${shareCell(`bands.right.${i}`, x.followed_right, tooFew)}${shareCell(`bands.wrong.${i}`, x.followed_wrong, tooFew)}</tr>`).join('');
  return `<section><h2>Following by the score shown${title}</h2>${p(b.text)}
${inlinePlot(scoreBandPlot(points, labels), target, 'Share of reads following the suggestion per shown score band, when it was right (circles) and wrong (triangles)')}
<table><thead><tr><th scope="col">Score shown</th><th scope="col">Followed it, suggestion right</th><th scope="col">Followed it, suggestion wrong</th></tr></thead><tbody>${rows}</tbody></table></section>`;
};

const subgroups = (f: FindingReport, target: PlotTarget, title: string): string => {
  if (f.subgroups.length === 0) return '';
  const parts = f.subgroups.map((g) => {
    const points: SubgroupPoint[] = [];
    for (const r of g.rows) {
      if (r.ai_accuracy.estimate !== null) points.push({ value: r.value || '(blank)', measure: 'suggestion right', estimate: r.ai_accuracy.estimate, lower: r.ai_accuracy.lower, upper: r.ai_accuracy.upper });
      if (r.overreliance.estimate !== null) points.push({ value: r.value || '(blank)', measure: 'you followed it when wrong', estimate: r.overreliance.estimate, lower: r.overreliance.lower, upper: r.overreliance.upper });
    }
    const rows = g.rows.map((r) => `<tr><th scope="row">${esc(r.value || '(blank)')}</th>${shareCell(`subgroups|${g.attribute}|${r.value}|ai_accuracy`, r.ai_accuracy, () => false)}${shareCell(`subgroups|${g.attribute}|${r.value}|overreliance`, r.overreliance, tooFew)}</tr>`).join('');
    return `<h3>By ${esc(g.attribute)}</h3>${p(g.text)}
${points.length > 0 ? inlinePlot(subgroupPlot(points), target, `The suggestion's accuracy (squares) and your over-reliance (triangles) for each ${g.attribute}`) : ''}
<table><thead><tr><th scope="col">${esc(g.attribute)}</th><th scope="col">Suggestion right</th><th scope="col">You followed it when wrong</th></tr></thead><tbody>${rows}</tbody></table>`;
  }).join('');
  return `<section><h2>Where the suggestion is weaker${title}</h2>${parts}</section>`;
};

const time = (f: FindingReport, title: string): string => {
  const { unaided, aided } = f.entry;
  return `<section><h2>Reading time${title}</h2>${p(f.time_text)}
<table><thead><tr><th scope="col"></th><th scope="col">Without the suggestion</th><th scope="col">With the suggestion</th></tr></thead><tbody>
<tr><th scope="row">Median seconds per read</th>${numberCell('unaided.median_s', unaided?.median_ms === null || unaided === null ? null : unaided.median_ms / 1000, 1)}${numberCell('aided.median_s', aided?.median_ms === null || aided === null ? null : aided.median_ms / 1000, 1)}</tr>
</tbody></table></section>`;
};

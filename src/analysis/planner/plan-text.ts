/**
 * A plan in words: the plain sentences the dry-run panel leads with, and the readable table
 * `heed plan` prints without --json. Figures are those of the report, rounded for reading.
 */
import type { PlanReport, Rate } from './plan-report';

const pct = (x: number): string => `${Math.round(100 * x)}%`;
const two = (x: number | null): string => (x === null ? 'n/a' : x.toFixed(2));
const rateText = (r: Rate | null): string => (r === null ? 'n/a' : `${pct(r.rate)} (MC SE ${(100 * r.mcse).toFixed(1)} points, ${r.studies} studies)`);

/** Plain-words findings, first the reliance answer, then the AUC answer. */
export const planSentences = (r: PlanReport): string[] => {
  const o = r.overreliance;
  const out: string[] = [];
  const wrong = Math.round(o.wrong_reads_per_reader);
  out.push(
    `With ${r.design.readers} readers and ${wrong} wrong suggestions each (${r.design.planted_false_positive + r.design.planted_false_negative} planted, the rest the model's own errors), `
    + `a true over-reliance of ${pct(o.assumed_rate)} would be known to within ±${two(o.expected_halfwidth)} for each reader`
    + (o.median_halfwidth === null ? '.' : ` (in the simulated studies, typically ±${two(o.median_halfwidth)}).`),
  );
  out.push(`The chance that the study shows the group's over-reliance above ${pct(o.reference)} is ${pct(o.power.rate)}.`);
  if (r.notice.power !== null) out.push(`The chance that it detects a caution notice that cuts following wrong suggestions by ${pct(r.notice.effect)} is ${pct(r.notice.power.rate)}.`);
  const auc = r.auc;
  if (auc.power !== null) {
    out.push(
      `If the suggestion raised the readers' own accuracy (AUC) from ${auc.unaided.toFixed(2)} by ${auc.difference.toFixed(2)}, the study would show it ${pct(auc.power.rate)} of the time; `
      + `the difference would be known to within ±${two(auc.median_halfwidth)}.`,
    );
  } else if (auc.note !== null) out.push(`The accuracy (AUC) comparison cannot be run on this design: ${auc.note}.`);
  return out;
};

/** The table `heed plan` prints. */
export const planText = (r: PlanReport): string => {
  const o = r.overreliance;
  const lines = [
    `Heed plan: ${r.sims} simulated studies, seed ${r.seed}, finding "${r.finding}"`,
    `design: ${r.design.readers} readers x ${r.design.cases} cases (${r.design.positives} present) x ${r.design.periods} periods; ${r.design.sequences.join('; ')}; `
      + `planted ${r.design.planted_false_positive} false positive + ${r.design.planted_false_negative} false negative; caution notice ${r.design.caution}${r.design.from_study ? ' (from the study file)' : ''}`,
    '',
    ...planSentences(r),
    '',
    'over-reliance',
    `  wrong-suggestion reads per reader   ${o.wrong_reads_per_reader.toFixed(1)}`,
    `  Wilson 95% half-width at ${o.assumed_rate.toFixed(2)}      ${two(o.expected_halfwidth)}`,
    `  simulated median half-width         ${two(o.median_halfwidth)}   (mean true rate ${two(o.mean_true_rate)})`,
    `  coverage of reader intervals        ${rateText(o.coverage)}`,
    `  power, rate above ${o.reference.toFixed(2)}             ${rateText(o.power)}`,
    `    test: ${o.test}`,
    'caution notice',
    r.notice.power === null ? `  power: n/a (${r.notice.reason ?? ''})` : `  power at a ${pct(r.notice.effect)} cut          ${rateText(r.notice.power)}`,
    `    test: ${r.notice.test}`,
    'AUC, aided minus unaided',
    `  power at ${r.auc.difference.toFixed(3)}                     ${rateText(r.auc.power)}`,
    `  type I error at 0                   ${rateText(r.auc.type_i_error)}`,
    `  median 95% half-width               ${two(r.auc.median_halfwidth)}   (mean simulated difference ${r.auc.mean_difference === null ? 'n/a' : r.auc.mean_difference.toFixed(3)})`,
    `    test: ${r.auc.test}${r.auc.note === null ? '' : `; ${r.auc.note}`}`,
  ];
  if (r.curves.points.length > 0) {
    lines.push('', `curves (${r.curves.sims} studies per point off the design)`, '  vary     readers  cases  wrong/reader  over-reliance power  AUC power');
    for (const p of r.curves.points) {
      lines.push(`  ${p.vary.padEnd(8)} ${String(p.readers).padStart(7)} ${String(p.cases).padStart(6)} ${p.wrong_reads_per_reader.toFixed(1).padStart(13)} ${pct(p.overreliance_power.rate).padStart(20)} ${(p.auc_power === null ? 'n/a' : pct(p.auc_power.rate)).padStart(10)}`);
    }
    for (const s of r.curves.skipped) lines.push(`  skipped: ${s}`);
  }
  lines.push('', `model: ${r.assumptions.preset} (${r.assumptions.preset_source}); mu ${r.model.mu.toFixed(3)}, aided shift ${r.model.aided_shift.toFixed(3)}`);
  lines.push('Simulated readers, invented data: a planning aid. ' + r.research_notice);
  return lines.join('\n');
};

// The planner's AUC type I error: the random-reader Obuchowski-Rockette test over simulated studies
// of the planner's own-look model at difference 0 (src/analysis/planner/run-plan.ts aucRejections),
// under a named Roe & Metz preset (values from memory, see src/analysis/planner/assumptions.ts).
// Usage: npx tsx scripts/validate-plan.ts [--studies 2000] [--readers 5] [--cases 100] [--preset roe-metz-low] [--seed S]
// Exits 1 when the rate is outside [0.035, 0.065] (about 3 binomial SE at 2000 studies: common practice, no source).
import { parseArgs } from 'node:util';
import { DEFAULT_ASSUMPTIONS, isPresetName, PRESETS } from '../src/analysis/planner/assumptions';
import { aucRejections } from '../src/analysis/planner/run-plan';

const { values } = parseArgs({
  options: {
    studies: { type: 'string', default: '2000' },
    readers: { type: 'string', default: '5' },
    cases: { type: 'string', default: '100' },
    preset: { type: 'string', default: 'roe-metz-low' },
    seed: { type: 'string', default: '1997' },
  },
});
const preset = values.preset;
if (!isPresetName(preset)) {
  console.error(`validate-plan: --preset must be one of ${Object.keys(PRESETS).join(', ')}`);
  process.exit(2);
}
const assumptions = { ...DEFAULT_ASSUMPTIONS, preset, aucUnaided: PRESETS[preset].auc, readers: Number(values.readers), cases: Number(values.cases), seed: Number(values.seed), wrong: { mode: 'count' as const, value: 0 } };
const studies = Number(values.studies);
const start = performance.now();
const run = aucRejections(assumptions, studies, 0);
const seconds = (performance.now() - start) / 1000;
if (run.rejections === null) {
  console.error(`validate-plan: the test could not run: ${run.note ?? ''}`);
  process.exit(1);
}
const { rate, mcse } = run.rejections;
console.log(`planner null simulation: ${studies} studies x ${assumptions.readers} readers x ${assumptions.cases} cases, ${preset} (${PRESETS[preset].source}), seed ${assumptions.seed}`);
console.log(`random-reader OR type I error at alpha 0.05: ${rate.toFixed(4)} (MC SE ${mcse.toFixed(4)}), mean difference ${run.meanDifference?.toFixed(5) ?? 'n/a'}, ${seconds.toFixed(1)} s`);
if (rate < 0.035 || rate > 0.065) {
  console.error('validate-plan: outside [0.035, 0.065]');
  process.exit(1);
}

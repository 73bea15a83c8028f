// Null-simulation check of the Obuchowski-Rockette tests (src/analysis/obuchowski-rockette.ts):
// type I error at alpha = 0.05 under the Roe & Metz (1997) model, configuration and caveats in
// test/reference/support/roe-metz.ts (a low-AUC configuration recalled from memory).
// Usage: npm run validate:mrmc [-- --studies N --readers R --cases C --seed S --covariance jackknife|delong]
// Also prints the coverage of each condition's own 95% interval (single-treatment analysis).
// Prints figures; exits 1 if a test built for its scenario falls outside [0.03, 0.07]
// (about 3 binomial SE at 2000 studies: common practice, no source).
import { parseArgs } from 'node:util';
import { nullRun, ROE_METZ_LOW, type Scenario } from '../test/reference/support/roe-metz';

const { values } = parseArgs({
  options: {
    studies: { type: 'string', default: '2000' },
    readers: { type: 'string', default: '5' },
    cases: { type: 'string', default: '100' },
    seed: { type: 'string', default: '1997' },
    covariance: { type: 'string', default: 'jackknife' },
  },
});
const covariance = values.covariance;
if (covariance !== 'jackknife' && covariance !== 'delong') {
  console.error(`validate-mrmc: --covariance must be jackknife or delong, got ${String(covariance)}`);
  process.exit(2);
}
const studies = Number(values.studies);
const readers = Number(values.readers);
const cases = Number(values.cases);
const seed = Number(values.seed);
for (const [name, v] of Object.entries({ studies, readers, cases, seed })) {
  if (!Number.isInteger(v) || v < 0) {
    console.error(`validate-mrmc: --${name} must be a whole number, got ${String(v)}`);
    process.exit(2);
  }
}

console.log(`Obuchowski-Rockette null simulation: ${studies} studies x ${readers} readers x ${cases} cases (half positive), seed ${seed}`);
console.log(`Roe & Metz (1997) model, from memory: ${JSON.stringify(ROE_METZ_LOW)}; ${covariance} covariances`);
console.log('rejection rate at alpha 0.05 (binomial SE about', Math.sqrt(0.05 * 0.95 / studies).toFixed(4) + ')');
console.log('scenario        random(ddfH)  fixedReaders  fixedCases    coverage  seconds');

const own: Record<Scenario, 'random' | 'fixedReaders' | 'fixedCases'> = {
  random: 'random', 'fixed-readers': 'fixedReaders', 'fixed-cases': 'fixedCases',
};
let failed = false;
for (const [offset, scenario] of (['random', 'fixed-readers', 'fixed-cases'] as const).entries()) {
  const start = performance.now();
  const run = nullRun({ seed: seed + offset, studies, readers, cases, scenario, covariance });
  const secs = (performance.now() - start) / 1000;
  const cell = (k: 'random' | 'fixedReaders' | 'fixedCases') => `${run.rate[k].toFixed(4)}${own[scenario] === k ? '*' : ' '}`.padEnd(14);
  const coverage = (run.coverage === null ? '-' : run.coverage.toFixed(4)).padEnd(10);
  console.log(`${scenario.padEnd(16)}${cell('random')}${cell('fixedReaders')}${cell('fixedCases')}${coverage}${secs.toFixed(1)}`);
  const rate = run.rate[own[scenario]];
  if (rate < 0.03 || rate > 0.07) failed = true;
}
console.log('* the test built for that scenario (should be near 0.05). The others ignore a source of');
console.log('  variation present in that scenario, so they are expected to reject too often.');
console.log('coverage: share of single-treatment 95% intervals holding the true AUC (random-reader interval');
console.log('  for the random scenario, fixed-reader interval for fixed readers; not computed for fixed cases).');
if (failed) {
  console.error('validate-mrmc: a starred rate is outside [0.03, 0.07]');
  process.exit(1);
}

// Obuchowski-Rockette (src/analysis/obuchowski-rockette.ts) against an independent second
// computation: test/reference/scripts/or_numpy.py re-implements the same published formulas in
// numpy (brute-force leave-one-case-out AUCs, full jackknife covariance matrix; scipy.stats
// f.sf / t.ppf / norm.ppf / chi2.sf for p values and quantiles). It is NOT a reference library
// (none is used for this method); agreement shows the fast TypeScript path computes the formulas
// as written, not that the formulas are right — the null simulation
// (test/unit/analysis/obuchowski-rockette-null.test.ts, npm run validate:mrmc) checks that side.
// With covariance 'delong' the numpy side forms the DeLong et al. (1988) covariance matrix of all
// reader-by-modality AUCs from brute-force placement values and numpy.cov ("expected_delong");
// each modality's single-treatment interval ("treatments") comes from that matrix's diagonal block.
import { analyzeReads } from '../../src/analysis/engine';
import { obuchowskiRockette, type ORResult, type ORTest } from '../../src/analysis/obuchowski-rockette';
import { parseReadLog } from '../../src/io/read-log-parse';
import { loadReference, near, readFixture, type RefOr, type RefOrTest } from './support/fixtures';

const TOL = 1e-9;

type RefInterval = { se: number; ddf: number | null; lower: number; upper: number };
type RefTreatment = { modality: number; auc: number; random: RefInterval; fixedReaders: RefInterval; fixedCases: RefInterval; msR: number; varE: number; cov2: number };
type RefOrFull = RefOr & { treatments: RefTreatment[] };
type ScoresFixture = { scores: number[][][]; truth: (0 | 1)[]; expected: RefOrFull; expected_delong: RefOrFull };

const compareTreatments = (got: ORResult, want: RefTreatment[], where: string) => {
  expect(got.treatments).toHaveLength(want.length);
  want.forEach((w, i) => {
    const g = got.treatments[i];
    expect(g?.modality, `${where} treatment ${i}`).toBe(w.modality);
    for (const key of ['auc', 'msR', 'varE', 'cov2'] as const) near(g?.[key], w[key], 1e-12, `${where} treatment ${i} ${key}`);
    for (const test of ['random', 'fixedReaders', 'fixedCases'] as const) {
      for (const field of ['se', 'lower', 'upper'] as const) near(g?.[test][field], w[test][field], TOL, `${where} treatment ${i} ${test}.${field}`);
      const ddf = w[test].ddf;
      if (ddf === null) expect(g?.[test].ddf, `${where} treatment ${i} ${test}.ddf`).toBe(Infinity);
      else near(g?.[test].ddf, ddf, TOL * Math.max(1, ddf), `${where} treatment ${i} ${test}.ddf`);
    }
  });
};

const compare = (got: ORResult, want: RefOr, where: string) => {
  for (const key of ['random', 'fixedReaders', 'fixedCases'] as const) {
    const g: ORTest = got[key];
    const w: RefOrTest = want[key];
    for (const field of ['difference', 'se', 'lower', 'upper', 'f', 'df1', 'p'] as const) near(g[field], w[field], TOL, `${where} ${key}.${field}`);
    // numpy writes the fixed-reader ddf (infinite) as null
    if (w.ddf === null) expect(g.ddf, `${where} ${key}.ddf`).toBe(Infinity);
    else near(g.ddf, w.ddf, TOL * Math.max(1, w.ddf), `${where} ${key}.ddf`);
  }
  for (const key of ['varE', 'cov1', 'cov2', 'cov3'] as const) near(got.covariances[key], want.covariances[key], 1e-12, `${where} ${key}`);
  near(got.msT, want.msT, 1e-12, `${where} msT`);
  near(got.msTR, want.msTR, 1e-12, `${where} msTR`);
  want.auc.forEach((row, i) => row.forEach((v, j) => near(got.auc[i]?.[j], v, 1e-12, `${where} auc[${i}][${j}]`)));
};

describe('Obuchowski-Rockette vs independent numpy re-implementation', () => {
  it.each(['a', 'b', 'c'])('or-scores-%s.json (seeded scores with ties)', (name) => {
    const fx: ScoresFixture = JSON.parse(readFixture(`or-scores-${name}.json`));
    const got = obuchowskiRockette({ scores: fx.scores, truth: fx.truth });
    expect(got.covarianceMethod).toBe('jackknife');
    compare(got, fx.expected, `or-scores-${name}`);
    compareTreatments(got, fx.expected.treatments, `or-scores-${name}`);
  });

  it.each(['a', 'b', 'c'])('or-scores-%s.json with DeLong covariances', (name) => {
    const fx: ScoresFixture = JSON.parse(readFixture(`or-scores-${name}.json`));
    const got = obuchowskiRockette({ scores: fx.scores, truth: fx.truth, covariance: 'delong' });
    expect(got.covarianceMethod).toBe('delong');
    compare(got, fx.expected_delong, `or-scores-${name} delong`);
    compareTreatments(got, fx.expected_delong.treatments, `or-scores-${name} delong`);
  });

  // The engine's group mrmc from the parsed logs; numpy builds the same fully crossed arrays from the CSV.
  it.each(['crossover', 'sequential', 'ties', 'noconf'])('log-%s.csv through parseReadLog and analyzeReads', (name) => {
    const ref = loadReference(`reference-${name}.json`);
    const report = analyzeReads(parseReadLog(readFixture(`log-${name}.csv`)), { boot: 0 });
    const findings = Object.keys(ref.or);
    expect(findings.length).toBeGreaterThan(0);
    for (const finding of findings) {
      const g = report.group.findings.find((f) => f.finding === finding);
      expect(g?.mrmc_note ?? null, `${name} ${finding} note`).toBeNull();
      const m = g?.mrmc;
      expect(m, `${name} ${finding} mrmc`).toBeTruthy();
      if (m) compare(m, ref.or[finding] as RefOr, `${name} ${finding}`);
    }
  });
});

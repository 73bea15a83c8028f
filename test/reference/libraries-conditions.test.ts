// Per reader and condition, analyzeReads (through the project's parser) against general-purpose
// reference libraries, on seeded logs of our own (test/reference/scripts/simulate_logs.py).
// Values from test/reference/scripts/make_fixtures.py; versions and exact calls are in each
// fixture's "versions" and "calls" (Debian bookworm: numpy 1.24.2, scipy 1.10.1,
// statsmodels 0.13.5, scikit-learn 1.2.1, R 4.2.2, pROC 1.18.0).
import { analyzeReads } from '../../src/analysis/engine';
import { clopperPearson } from '../../src/analysis/clopper-pearson';
import type { Proportion } from '../../src/analysis/wilson';
import { parseReadLog } from '../../src/io/read-log-parse';
import { loadReference, near, readFixture, type RefProportion } from './support/fixtures';

const EXACT = 1e-9;
const LOGS = ['crossover', 'sequential', 'ties', 'noconf'];

// Wilson: statsmodels proportion_confint(k, n, method='wilson'); Clopper-Pearson: method='beta'.
const checkProportion = (got: Proportion | undefined, want: RefProportion | undefined, label: string) => {
  expect(got, label).toBeDefined();
  expect(want, label).toBeDefined();
  if (got === undefined || want === undefined) return;
  expect([got.k, got.n], label).toEqual([want.k, want.n]);
  near(got.estimate, want.estimate, EXACT, `${label} estimate`);
  near(got.lower, want.lower, EXACT, `${label} Wilson lower (statsmodels)`);
  near(got.upper, want.upper, EXACT, `${label} Wilson upper (statsmodels)`);
  const cp = clopperPearson(want.k, want.n);
  near(cp.lower, want.cp_lower, EXACT, `${label} Clopper-Pearson lower (statsmodels method='beta')`);
  near(cp.upper, want.cp_upper, EXACT, `${label} Clopper-Pearson upper (statsmodels method='beta')`);
};

describe.each(LOGS)('log-%s.csv: reader figures against reference libraries', (name) => {
  const ref = loadReference(`reference-${name}.json`);
  const report = analyzeReads(parseReadLog(readFixture(`log-${name}.csv`)), { boot: 0 });

  it('has the same reader and finding entries', () => {
    expect(report.readers.map((r) => `${r.reader_id}|${r.finding}`).sort())
      .toEqual(ref.readers.map((r) => `${r.reader_id}|${r.finding}`).sort());
  });

  for (const want of ref.readers) {
    const where = `${name} ${want.reader_id} ${want.finding}`;
    const got = () => report.readers.find((r) => r.reader_id === want.reader_id && r.finding === want.finding);

    it(`${want.reader_id} ${want.finding}: accuracy, sensitivity, specificity, agreement, reliance (Wilson, Clopper-Pearson)`, () => {
      for (const cond of ['unaided', 'aided'] as const) {
        const g = got()?.[cond];
        const w = want[cond];
        if (w === null) {
          expect(g ?? null, `${where} ${cond}`).toBeNull();
          continue;
        }
        expect(g?.n, `${where} ${cond} n`).toBe(w.n);
        for (const key of ['accuracy', 'sensitivity', 'specificity'] as const) checkProportion(g?.[key], w[key], `${where} ${cond} ${key}`);
      }
      const a = got()?.aided;
      if (want.aided !== null) {
        for (const key of ['agreement', 'overreliance', 'underreliance'] as const) checkProportion(a?.[key], want.aided[key], `${where} aided ${key}`);
      }
    });

    it(`${want.reader_id} ${want.finding}: AUC (scikit-learn), DeLong SE (R pROC), Brier (scikit-learn), median time (numpy)`, () => {
      for (const cond of ['unaided', 'aided'] as const) {
        const g = got()?.[cond];
        const w = want[cond];
        if (w === null || g === null || g === undefined) continue;
        // sklearn.metrics.roc_auc_score(truth, score)
        near(g.auc.estimate, w.auc?.estimate, EXACT, `${where} ${cond} auc`);
        // sqrt(pROC::var(roc(truth, score, levels = c(0, 1), direction = '<'), method = 'delong'))
        near(g.auc.se, w.auc?.se, EXACT, `${where} ${cond} auc se`);
        near(g.auc.lower, w.auc?.lower, EXACT, `${where} ${cond} auc lower`);
        near(g.auc.upper, w.auc?.upper, EXACT, `${where} ${cond} auc upper`);
        // sklearn.metrics.brier_score_loss(truth, score / 100)
        near(g.brier, w.brier, EXACT, `${where} ${cond} brier`);
        // numpy.median(total_ms)
        near(g.median_ms, w.median_ms, 0, `${where} ${cond} median_ms`);
      }
    });

    it(`${want.reader_id} ${want.finding}: Cohen's kappa (scikit-learn) and its SE (statsmodels cohens_kappa std_kappa)`, () => {
      const w = want.aided?.kappa;
      if (w === undefined) return expect(got()?.aided ?? null).toBeNull();
      const g = got()?.aided?.kappa;
      // sklearn.metrics.cohen_kappa_score(final_call, ai_call)
      near(g?.estimate, w.estimate, EXACT, `${where} kappa`);
      // statsmodels.stats.inter_rater.cohens_kappa(table).std_kappa: Fleiss, Cohen & Everitt (1969)
      near(g?.se, w.se, EXACT, `${where} kappa se`);
      // the fixture's own cross-check: the same variance in the po/pe form, computed in numpy
      near(w.se_numpy, w.se, EXACT, `${where} kappa se statsmodels vs numpy formula`);
    });
  }
});

// Crossover pairs, sequential reads and the paired DeLong test per reader, from analyzeReads
// (through the project's parser) against reference values in the fixtures written by
// test/reference/scripts/make_fixtures.py (statsmodels 0.13.5, scipy 1.10.1, R 4.2.2 pROC 1.18.0;
// exact calls in each fixture's "calls").
import { analyzeReads } from '../../src/analysis/engine';
import { parseReadLog } from '../../src/io/read-log-parse';
import { loadReference, near, readFixture } from './support/fixtures';

const EXACT = 1e-9;

describe.each(['crossover', 'sequential', 'ties', 'noconf'])('log-%s.csv: paired and sequential figures', (name) => {
  const ref = loadReference(`reference-${name}.json`);
  const report = analyzeReads(parseReadLog(readFixture(`log-${name}.csv`)), { boot: 0 });
  const entry = (id: string, finding: string) => report.readers.find((r) => r.reader_id === id && r.finding === finding);

  it.each(ref.readers.map((r) => [r.reader_id, r.finding, r] as const))('%s %s: crossover pairs, McNemar exact (statsmodels, scipy), paired DeLong (pROC)', (id, finding, want) => {
    const where = `${name} ${id} ${finding}`;
    const got = entry(id, finding)?.crossover;
    const w = want.crossover;
    if (w === null) return expect(got ?? null, where).toBeNull();
    expect(got?.n, `${where} pairs`).toBe(w.n);
    near(got?.accuracy_difference, w.accuracy_difference, EXACT, `${where} accuracy_difference`);
    expect([got?.mcnemar.b, got?.mcnemar.c], `${where} b, c`).toEqual([w.mcnemar.b, w.mcnemar.c]);
    // statsmodels.stats.contingency_tables.mcnemar([[0, b], [c, 0]], exact=True).pvalue
    near(got?.mcnemar.p, w.mcnemar.p, EXACT, `${where} McNemar p (statsmodels)`);
    // scipy.stats.binomtest(min(b, c), b + c, 0.5).pvalue
    near(got?.mcnemar.p, w.mcnemar.p_scipy_binomtest, EXACT, `${where} McNemar p (scipy binomtest)`);
    expect(got?.wrong_suggestion.n, `${where} wrong-suggestion pairs`).toBe(w.wrong_suggestion.n);
    expect([got?.wrong_suggestion.mcnemar.b, got?.wrong_suggestion.mcnemar.c]).toEqual([w.wrong_suggestion.b, w.wrong_suggestion.c]);
    near(got?.wrong_suggestion.mcnemar.p, w.wrong_suggestion.p, EXACT, `${where} wrong-suggestion McNemar p (statsmodels)`);
    const pd = w.paired_delong;
    const ad = got?.auc_difference;
    if (pd === undefined) return expect(ad ?? null).toBeNull();
    // pROC::roc.test(roc_unaided, roc_aided, method = 'delong', paired = TRUE): Z = (auc1 − auc2)/se,
    // ours is z = (aided − unaided)/se, so z = −Z. NaN Z in pROC (identical curves) is null here.
    near(ad?.auc1, pd.auc_unaided, EXACT, `${where} paired unaided AUC`);
    near(ad?.auc2, pd.auc_aided, EXACT, `${where} paired aided AUC`);
    near(ad?.z, -pd.z_proc, EXACT, `${where} paired DeLong z`);
    near(ad?.p, pd.p, EXACT, `${where} paired DeLong p`);
  });

  it.each(ref.readers.map((r) => [r.reader_id, r.finding, r] as const))('%s %s: sequential counts, RAIR/RSR (Wilson, statsmodels), weight of advice (numpy, by the definition in docs/methods.md)', (id, finding, want) => {
    const where = `${name} ${id} ${finding}`;
    const got = entry(id, finding)?.sequential;
    const w = want.sequential;
    if (w === null) return expect(got ?? null, where).toBeNull();
    expect(got?.n).toBe(w.n);
    expect([got?.changed.k, got?.toward_ai.k, got?.beneficial.k, got?.detrimental.k], `${where} counts`)
      .toEqual([w.changed, w.toward_ai, w.beneficial, w.detrimental]);
    for (const key of ['rair', 'rsr'] as const) {
      expect([got?.[key].k, got?.[key].n], `${where} ${key}`).toEqual([w[key].k, w[key].n]);
      near(got?.[key].lower, w[key].lower, EXACT, `${where} ${key} lower`);
      near(got?.[key].upper, w[key].upper, EXACT, `${where} ${key} upper`);
    }
    expect(got?.woa.n, `${where} woa n`).toBe(w.woa.n);
    near(got?.woa.mean, w.woa.mean, EXACT, `${where} woa mean`);
    near(got?.woa.median, w.woa.median, EXACT, `${where} woa median (numpy.median)`);
  });
});

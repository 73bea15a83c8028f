// The conditional reliance forms (over-reliance given first right = 1 − RSR, under-reliance given
// first wrong = 1 − RAIR; Schemmer et al. 2023) and both weight-of-advice forms (signed, Harvey &
// Fischer 1997; absolute, Yaniv 2004), per reader and finding of the seeded invented log-sequential.csv, through
// parseReadLog and analyzeReads, against test/reference/scripts/reliance_forms.py: counts and
// weights by the definitions of docs/methods.md in numpy 1.24.2 (an independent computation, not a
// library's), Wilson intervals from statsmodels 0.13.5 proportion_confint(k, n, alpha=0.05,
// method='wilson'), medians from numpy.median. Versions and calls are in the fixture.
import { analyzeReads } from '../../src/analysis/engine';
import type { WeightOfAdvice } from '../../src/analysis/weight-of-advice';
import type { Proportion } from '../../src/analysis/wilson';
import { parseReadLog } from '../../src/io/read-log-parse';
import { near, readFixture } from './support/fixtures';

type Forms = {
  overreliance_given_first_right: Proportion;
  underreliance_given_first_wrong: Proportion;
  woa_signed: WeightOfAdvice;
  woa_absolute: WeightOfAdvice;
};
type Fixture = { logs: Record<string, { reader_id: string; finding: string; forms: Forms | null }[]> };

const fixture: Fixture = JSON.parse(readFixture('reference-reliance-forms.json'));
const EXACT = 1e-12;

describe.each(Object.keys(fixture.logs))('%s: conditional reliance and weight of advice vs numpy/statsmodels', (log) => {
  const report = analyzeReads(parseReadLog(readFixture(log)), { boot: 0 });
  const want = fixture.logs[log] ?? [];
  it('has sequential reads to check', () => {
    expect(want.filter((w) => w.forms !== null).length).toBeGreaterThan(0);
  });
  it.each(want.map((w) => [w.reader_id, w.finding, w] as const))('%s %s', (id, finding, w) => {
    const got = report.readers.find((r) => r.reader_id === id && r.finding === finding)?.sequential ?? null;
    if (w.forms === null) return expect(got).toBeNull();
    for (const key of ['overreliance_given_first_right', 'underreliance_given_first_wrong'] as const) {
      expect([got?.[key].k, got?.[key].n], `${id} ${key}`).toEqual([w.forms[key].k, w.forms[key].n]);
      near(got?.[key].lower, w.forms[key].lower, EXACT, `${id} ${key} lower (statsmodels)`);
      near(got?.[key].upper, w.forms[key].upper, EXACT, `${id} ${key} upper (statsmodels)`);
    }
    for (const key of ['woa_signed', 'woa_absolute'] as const) {
      expect(got?.[key].n, `${id} ${key} n`).toBe(w.forms[key].n);
      near(got?.[key].mean, w.forms[key].mean, EXACT, `${id} ${key} mean`);
      near(got?.[key].median, w.forms[key].median, EXACT, `${id} ${key} median (numpy.median)`);
    }
  });
});

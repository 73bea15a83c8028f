// The simulated-reader model against its own definitions, with outside references for the
// numbers: the binormal AUC formula (AUC = Phi(mu / sqrt(var(X1 - X0)))) evaluated with
// @stdlib/stats-base-dists-normal-cdf, and Beta quantiles from @stdlib/stats-base-dists-beta-quantile.
import betaQuantile from '@stdlib/stats-base-dists-beta-quantile';
import normalCdf from '@stdlib/stats-base-dists-normal-cdf';
import type { CaseSetManifest } from '../../../src/core/case-set';
import { defaultDesign } from '../../../src/core/design';
import { createRng } from '../../../src/core/rng';
import { betaDraw, DEFAULT_SIMULATION, simulateAnswers } from '../../../src/core/simulated-readers';
import { buildSuggestions } from '../../../src/core/planting';

const manifest = (n: number): CaseSetManifest => ({
  name: 'synthetic', findings: ['target'], attributeNames: [],
  cases: Array.from({ length: n }, (_, i) => ({
    caseId: `c${i}`, images: [`c${i}.png`], practice: false, attributes: {},
    // a model right 80% of the time, by construction
    findings: [{ finding: 'target', truth: (i % 2) as 0 | 1, modelScore: null, modelCall: ((i % 10 < 8 ? i % 2 : 1 - (i % 2)) as 0 | 1) }],
  })),
});

const auc = (pairs: { score: number; truth: number }[]): number => {
  const pos = pairs.filter((p) => p.truth === 1).map((p) => p.score).sort((a, b) => a - b);
  const neg = pairs.filter((p) => p.truth === 0).map((p) => p.score).sort((a, b) => a - b);
  let wins = 0;
  let j = 0;
  let k = 0;
  for (const x of pos) {
    while (j < neg.length && (neg[j] as number) < x) j++;
    k = j;
    while (k < neg.length && neg[k] === x) k++;
    wins += j + (k - j) / 2;
  }
  return wins / (pos.length * neg.length);
};

describe('simulated readers', () => {
  const cases = manifest(600);
  const design = { ...defaultDesign(['target']), sequences: [{ label: 'UA', periods: ['none' as const, 'sequential' as const] }, { label: 'AU', periods: ['sequential' as const, 'none' as const] }] };
  const suggestions = buildSuggestions(cases, design);
  const readers = Array.from({ length: 40 }, (_, i) => ({ code: `S${i}`, slot: i, sequenceIndex: i % 2 }));
  const answers = simulateAnswers(design, cases, suggestions, readers, DEFAULT_SIMULATION, 99);
  const truth = new Map(cases.cases.map((c) => [c.caseId, c.findings[0]?.truth ?? 0]));
  const aiCall = new Map(suggestions.map((s) => [s.caseId, s.call]));

  it('is reproducible and does not depend on the other readers simulated', () => {
    const again = simulateAnswers(design, cases, suggestions, readers.slice(3, 5), DEFAULT_SIMULATION, 99);
    expect(again).toEqual(answers.filter((a) => a.readerCode === 'S3' || a.readerCode === 'S4'));
  });

  it('gives unaided reads the binormal AUC of the Roe and Metz model', () => {
    const v = DEFAULT_SIMULATION.variance;
    const total = v.reader + v.case + v.readerCase + v.modalityReader + v.modalityCase + v.error;
    const expected = normalCdf(DEFAULT_SIMULATION.mu / Math.sqrt(2 * total), 0, 1);
    const unaided = answers.filter((a) => a.assistance === 'none').map((a) => ({
      score: a.final.call === 1 ? 50 + (a.final.confidence ?? 0) / 2 : 50 - (a.final.confidence ?? 0) / 2, truth: truth.get(a.caseId) ?? 0,
    }));
    expect(unaided).toHaveLength(40 * 600);
    // 600 cases: the case terms are one draw, so allow their sampling error (about 0.015 here)
    expect(Math.abs(auc(unaided) - expected)).toBeLessThan(0.03);
  });

  it('follows wrong suggestions and takes up right ones at the set mean rates', () => {
    const seq = answers.filter((a) => a.assistance === 'sequential' && a.initial !== null);
    const rate = (own: 'right' | 'wrong') => {
      const eligible = seq.filter((a) => {
        const t = truth.get(a.caseId);
        const ai = aiCall.get(a.caseId);
        const ownRight = a.initial?.call === t;
        return ai !== a.initial?.call && (own === 'right' ? ownRight && ai !== t : !ownRight && ai === t);
      });
      return eligible.filter((a) => a.final.call === aiCall.get(a.caseId)).length / eligible.length;
    };
    expect(Math.abs(rate('right') - DEFAULT_SIMULATION.followWrong.mean)).toBeLessThan(0.04);
    expect(Math.abs(rate('wrong') - DEFAULT_SIMULATION.acceptRight.mean)).toBeLessThan(0.05);
  });

  it('reads for a log-normal time around the set median', () => {
    const times = answers.filter((a) => a.assistance === 'none').map((a) => a.final.ms).sort((a, b) => a - b);
    const median = times[Math.floor(times.length / 2)] as number;
    expect(median / DEFAULT_SIMULATION.medianMs.none).toBeGreaterThan(0.85);
    expect(median / DEFAULT_SIMULATION.medianMs.none).toBeLessThan(1.15);
  });

  it('draws Beta reliance probabilities with the quantiles of the stated Beta distribution', () => {
    const spec = { mean: 0.25, sd: 0.1 };
    const k = (spec.mean * (1 - spec.mean)) / spec.sd ** 2 - 1;
    const rng = createRng(5, 'test/beta');
    const draws = Array.from({ length: 20000 }, () => betaDraw(rng, spec)).sort((a, b) => a - b);
    for (const q of [0.1, 0.5, 0.9]) {
      expect(Math.abs((draws[Math.floor(q * draws.length)] as number) - betaQuantile(q, spec.mean * k, (1 - spec.mean) * k))).toBeLessThan(0.01);
    }
    expect(() => betaDraw(rng, { mean: 0.5, sd: 0.6 })).toThrow(RangeError);
  });
});

/**
 * What a case set holds, for a check before import: main and practice case counts, per finding
 * the prevalence and the suggestion's accuracy (model call against truth; where the set gives no
 * call, score >= 0.5), and per case attribute the values with their case counts and suggestion
 * accuracy (pooled over findings). Practice cases count only in practiceCases and images.
 * Never throws. Example: a set of 10 main cases, 4 with the finding, of which the model is right
 * on 8 -> findings[0] = { cases: 10, positives: 4, prevalence: 0.4,
 * suggestionAccuracy: { k: 8, n: 10, estimate: 0.8 } }.
 */
import type { CaseFinding, CaseSetManifest } from '../../core/case-set';
import type { CaseSetSummary, Share } from './types';

const SUMMARY_THRESHOLD = 0.5;

const callOf = (f: CaseFinding): 0 | 1 | null =>
  f.modelCall ?? (f.modelScore === null ? null : f.modelScore >= SUMMARY_THRESHOLD ? 1 : 0);

const share = (k: number, n: number): Share => ({ k, n, estimate: n === 0 ? null : k / n });

const accuracy = (findings: CaseFinding[]): Share => {
  let k = 0;
  let n = 0;
  for (const f of findings) {
    const call = callOf(f);
    if (call === null) continue;
    n += 1;
    if (call === f.truth) k += 1;
  }
  return share(k, n);
};

export const summarizeCaseSet = (manifest: CaseSetManifest): CaseSetSummary => {
  const main = manifest.cases.filter((c) => !c.practice);
  const findings = manifest.findings.map((finding) => {
    const entries = main.flatMap((c) => c.findings.filter((f) => f.finding === finding));
    const positives = entries.filter((f) => f.truth === 1).length;
    return {
      finding,
      cases: entries.length,
      positives,
      prevalence: entries.length === 0 ? null : positives / entries.length,
      suggestionAccuracy: accuracy(entries),
    };
  });
  const subgroups = manifest.attributeNames.map((attribute) => {
    const values = new Map<string, typeof main>();
    for (const c of main) {
      const value = c.attributes[attribute] ?? '';
      values.set(value, [...(values.get(value) ?? []), c]);
    }
    return {
      attribute,
      values: [...values].map(([value, cases]) => ({
        value, cases: cases.length, suggestionAccuracy: accuracy(cases.flatMap((c) => c.findings)),
      })),
    };
  });
  return {
    name: manifest.name,
    cases: main.length,
    practiceCases: manifest.cases.length - main.length,
    images: new Set(manifest.cases.flatMap((c) => c.images)).size,
    findings,
    subgroups,
    ignoredColumns: [],
  };
};

import { delongAuc } from '../../../src/analysis/delong';
import { hanleyMcNeilSe } from '../../../src/analysis/hanley-mcneil';

// Hanley JA, McNeil BJ (1982). The meaning and use of the area under a receiver operating
// characteristic (ROC) curve. Radiology 143:29-36, Table 1: CT images rated on a five-point
// scale (1 definitely normal ... 5 definitely abnormal) by one reader; 58 normal, 51 abnormal.
// Published: area W = 0.893 (the Wilcoxon / Mann-Whitney area, ties counting one half) with
// SE(W) = 0.032 by their exponential approximation (their Table 2 / equation 2).
const normal = [33, 6, 6, 11, 2];
const abnormal = [3, 2, 2, 11, 33];
const ratings = (counts: number[]) => counts.flatMap((c, i) => Array.from({ length: c }, () => i + 1));

describe('Hanley & McNeil (1982) Table 1', () => {
  const d = delongAuc(ratings(abnormal), ratings(normal));
  it('gives the published area 0.893', () => {
    expect(d.auc).toBeCloseTo(0.893, 3);
  });
  it('gives the published SE 0.032 by their formula', () => {
    expect(hanleyMcNeilSe(d.auc, 51, 58)).toBeCloseTo(0.032, 3);
  });
  it('gives a DeLong SE close to it (plausibility, common practice, no source)', () => {
    // DeLong's SE is not in the paper; the two estimators usually differ by a few thousandths.
    expect(Math.abs((d.se as number) - 0.032)).toBeLessThan(0.003);
  });
});

// The DeLong covariances behind Heed's Obuchowski-Rockette analysis with covariance 'delong'
// (src/analysis/or-covariances.ts), against R pROC 1.18.0 on R 4.2.2:
// test/reference/scripts/or_proc.R calls var(roc, method = "delong") for each reader-by-modality
// AUC and cov(roc_a, roc_b, method = "delong") for every pair read on the same cases (the input is
// fixtures/or-scores-b.json: 2 modalities x 3 readers x 25 invented cases with ties).
// Checked: every pairwise covariance, above all the two-modality one-reader term Cov(θ0j, θ1j),
// and the four averages varE, cov1, cov2, cov3 taken from pROC's matrix.
import { obuchowskiRockette } from '../../src/analysis/obuchowski-rockette';
import { caseDeviations } from '../../src/analysis/or-covariances';
import { near, readFixture } from './support/fixtures';

type ProcFixture = { auc: number[]; covariance: number[][] };
type Scores = { scores: number[][][]; truth: (0 | 1)[] };

const proc: ProcFixture = JSON.parse(readFixture('or-proc-delong.json'));
const input: Scores = JSON.parse(readFixture('or-scores-b.json'));
// pROC writes 15 significant digits
const TOL = 1e-14;

describe('Obuchowski-Rockette DeLong covariances vs R pROC', () => {
  const t = input.scores.length;
  const r = input.scores[0]?.length ?? 0;
  const d = caseDeviations('delong', input.scores, input.truth);
  const flat = d.dev.flat();
  // Cov(θa, θb) = Σ over case groups (positives, negatives) of weight · Σk devA[k]·devB[k]
  const pair = (a: number, b: number): number => d.groups.reduce((sum, g) => {
    let s = 0;
    for (let k = g.from; k < g.to; k++) s += ((flat[a] as Float64Array)[k] as number) * ((flat[b] as Float64Array)[k] as number);
    return sum + g.weight * s;
  }, 0);

  it('gives pROC\'s AUCs and every pairwise DeLong covariance', () => {
    expect(flat).toHaveLength(proc.auc.length);
    proc.auc.forEach((a, i) => near(d.auc.flat()[i], a, 1e-14, `auc ${i}`));
    proc.covariance.forEach((row, a) => row.forEach((v, b) => near(pair(a, b), v, TOL, `cov[${a}][${b}]`)));
  });

  it('averages them into varE, cov1 (one reader, two modalities), cov2 and cov3 as pROC\'s matrix gives', () => {
    const mean = (keep: (i: number, j: number, i2: number, j2: number) => boolean): number => {
      let s = 0;
      let n = 0;
      for (let a = 0; a < t * r; a++) {
        for (let b = 0; b < t * r; b++) {
          if (!keep(Math.floor(a / r), a % r, Math.floor(b / r), b % r)) continue;
          s += proc.covariance[a]?.[b] as number;
          n++;
        }
      }
      return s / n;
    };
    const got = obuchowskiRockette({ ...input, covariance: 'delong' }).covariances;
    near(got.varE, mean((i, j, i2, j2) => i === i2 && j === j2), TOL, 'varE');
    near(got.cov1, mean((i, j, i2, j2) => i !== i2 && j === j2), TOL, 'cov1');
    near(got.cov2, mean((i, j, i2, j2) => i === i2 && j !== j2), TOL, 'cov2');
    near(got.cov3, mean((i, j, i2, j2) => i !== i2 && j !== j2), TOL, 'cov3');
  });
});

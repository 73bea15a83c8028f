import { jackknifeAuc } from '../../../src/analysis/jackknife-auc';
import { jackknifeCovariances } from '../../../src/analysis/jackknife-covariance';
import { obuchowskiRockette } from '../../../src/analysis/obuchowski-rockette';

// Brute-force Mann-Whitney AUC over all pairs, ties ½: the definition, to check the fast paths.
const bruteAuc = (scores: number[], truth: number[]): number => {
  let s = 0;
  let pairs = 0;
  for (let a = 0; a < scores.length; a++) {
    for (let b = 0; b < scores.length; b++) {
      if (truth[a] === 1 && truth[b] === 0) {
        pairs++;
        const d = (scores[a] as number) - (scores[b] as number);
        s += d > 0 ? 1 : d === 0 ? 0.5 : 0;
      }
    }
  }
  return s / pairs;
};

// Small seeded LCG so the test data are the same on every run (values rounded to force ties).
const lcg = (seed: number) => {
  let x = seed >>> 0;
  return () => {
    x = (Math.imul(x, 1664525) + 1013904223) >>> 0;
    return x / 2 ** 32;
  };
};

const study = (seed: number, readers: number, cases: number) => {
  const u = lcg(seed);
  const truth: (0 | 1)[] = Array.from({ length: cases }, (_, k) => (k % 3 === 0 ? 1 : 0));
  const scores = [0, 1].map(() => Array.from({ length: readers }, () =>
    truth.map((y) => Math.round((y * 0.8 + u()) * 10) / 10)));
  return { scores, truth };
};

describe('jackknifeAuc', () => {
  it('gives the documented example', () => {
    const { auc, leaveOneOut } = jackknifeAuc([0.9, 0.4, 0.1, 0.4], [1, 1, 0, 0]);
    expect(auc).toBeCloseTo(0.875, 15);
    expect(Array.from(leaveOneOut)).toEqual([0.75, 1, 0.75, 1]);
  });

  it('matches recomputing the AUC without each case, with ties', () => {
    const { scores, truth } = study(3, 1, 31);
    const s = scores[0]?.[0] as number[];
    const { auc, leaveOneOut } = jackknifeAuc(s, truth);
    expect(auc).toBeCloseTo(bruteAuc(s, truth), 12);
    for (let k = 0; k < s.length; k++) {
      const keep = (_: number, i: number) => i !== k;
      expect(leaveOneOut[k]).toBeCloseTo(bruteAuc(s.filter(keep), truth.filter(keep)), 12);
    }
  });

  it('refuses a class with fewer than 2 cases, naming the counts', () => {
    expect(() => jackknifeAuc([0.2, 0.3, 0.9], [0, 0, 1])).toThrow(/at least 2 cases of each truth: 1 with truth 1, 2 with truth 0/);
    expect(() => jackknifeAuc([0.2, 0.3], [0, 1, 1])).toThrow(/2 scores but 3 truth values/);
  });
});

describe('jackknifeCovariances', () => {
  it('equals averaging the full jackknife covariance matrix', () => {
    const { scores, truth } = study(5, 3, 24);
    const loo = scores.map((m) => m.map((s) => jackknifeAuc(s, truth).leaveOneOut));
    const got = jackknifeCovariances(loo);
    const c = truth.length;
    const cells = loo.flatMap((m, i) => m.map((v, j) => ({ i, j, v: Array.from(v) })));
    const sums = { varE: [0, 0], cov1: [0, 0], cov2: [0, 0], cov3: [0, 0] };
    for (const a of cells) {
      for (const b of cells) {
        const ma = a.v.reduce((s, x) => s + x, 0) / c;
        const mb = b.v.reduce((s, x) => s + x, 0) / c;
        const cov = ((c - 1) / c) * a.v.reduce((s, x, k) => s + (x - ma) * ((b.v[k] as number) - mb), 0);
        const key = a.i === b.i ? (a.j === b.j ? 'varE' : 'cov2') : a.j === b.j ? 'cov1' : 'cov3';
        sums[key][0] = (sums[key][0] as number) + cov;
        sums[key][1] = (sums[key][1] as number) + 1;
      }
    }
    for (const key of ['varE', 'cov1', 'cov2', 'cov3'] as const) {
      expect(got[key]).toBeCloseTo((sums[key][0] as number) / (sums[key][1] as number), 14);
    }
  });
});

describe('obuchowskiRockette', () => {
  it('reports the reader-averaged AUC difference, aided minus unaided', () => {
    const input = study(11, 4, 30);
    const res = obuchowskiRockette(input);
    const mean = (m: number) => (res.auc[m] as number[]).reduce((s, v) => s + v, 0) / 4;
    expect(res.random.difference).toBeCloseTo(mean(1) - mean(0), 15);
    for (let j = 0; j < 4; j++) expect(res.auc[1]?.[j]).toBeCloseTo(bruteAuc(input.scores[1]?.[j] as number[], input.truth), 12);
    for (const test of [res.random, res.fixedReaders, res.fixedCases]) {
      expect(test.lower).toBeLessThan(test.difference);
      expect(test.upper).toBeGreaterThan(test.difference);
      expect(test.p).toBeGreaterThan(0);
      expect(test.p).toBeLessThanOrEqual(1);
    }
    expect(res.fixedCases.ddf).toBe(3);
    expect(res.fixedReaders.ddf).toBe(Infinity);
    // Hillis (2007): ddfH lies at or above (t-1)(r-1), since the covariance term only adds to the denominator
    expect(res.random.ddf).toBeGreaterThanOrEqual(3 - 1e-12);
  });

  it('negates the difference and keeps p when the modalities swap', () => {
    const input = study(12, 3, 27);
    const a = obuchowskiRockette(input);
    const b = obuchowskiRockette({ scores: [input.scores[1] as number[][], input.scores[0] as number[][]], truth: input.truth });
    expect(b.random.difference).toBeCloseTo(-a.random.difference, 15);
    expect(b.random.p).toBeCloseTo(a.random.p, 12);
    expect(b.fixedReaders.p).toBeCloseTo(a.fixedReaders.p, 12);
    expect(b.fixedCases.p).toBeCloseTo(a.fixedCases.p, 12);
  });

  it('gives difference 0 and p 1 when both modalities are the same reads', () => {
    const { scores, truth } = study(13, 3, 21);
    const same = scores[0] as number[][];
    const res = obuchowskiRockette({ scores: [same, same], truth });
    expect(res.random).toMatchObject({ difference: 0, f: 0, p: 1 });
    // cov2 - cov3 is 0 in exact arithmetic here; rounding may leave ~1e-19 in the variance
    expect(res.random.se).toBeLessThan(1e-8);
    expect(res.fixedCases).toMatchObject({ difference: 0, p: 1 });
  });

  it('refuses bad shapes with a message naming the problem', () => {
    const { scores, truth } = study(14, 3, 12);
    const [u, a] = scores as [number[][], number[][]];
    expect(() => obuchowskiRockette({ scores: [u], truth })).toThrow(/exactly 2 modalities.*got 1/);
    expect(() => obuchowskiRockette({ scores: [u, a, a], truth })).toThrow(/exactly 2 modalities.*got 3/);
    expect(() => obuchowskiRockette({ scores: [[u[0] as number[]], [a[0] as number[]]], truth })).toThrow(/at least 2 readers, got 1/);
    expect(() => obuchowskiRockette({ scores: [u, a.slice(0, 2)], truth })).toThrow(/modality 1 has 2 readers, modality 0 has 3/);
    expect(() => obuchowskiRockette({ scores: [u, [a[0] as number[], a[1] as number[], (a[2] as number[]).slice(1)]], truth }))
      .toThrow(/modality 1 reader 2 has 11 scores, truth has 12 cases/);
    expect(() => obuchowskiRockette({ scores, truth: truth.map(() => 0) })).toThrow(/both truths: 0 with truth 1, 12 with truth 0/);
    const onePositive: (0 | 1)[] = truth.map((_, k) => (k === 0 ? 1 : 0));
    expect(() => obuchowskiRockette({ scores, truth: onePositive })).toThrow(/modality 0 reader 0: .*at least 2 cases of each truth/);
    const nan = u.map((s) => [...s]);
    (nan[1] as number[])[4] = Number.NaN;
    expect(() => obuchowskiRockette({ scores: [nan, a], truth })).toThrow(/modality 0 reader 1 case 4: score NaN/);
    expect(() => obuchowskiRockette({ scores, truth: truth.map((y, k) => (k === 2 ? 2 : y)) as (0 | 1)[] })).toThrow(/truth of case 2 is 2/);
    expect(() => obuchowskiRockette({ scores: [u], truth })).toThrow(RangeError);
  });
});

describe('obuchowskiRockette options and warning', () => {
  it('warns below 4 readers (common practice, no source) and not from 4 up', () => {
    const three = study(7, 3, 30);
    const warned = obuchowskiRockette(three);
    expect(warned.warning).toMatch(/^Only 3 readers: .*random-reader result.*2 degrees of freedom/);
    expect(warned.warning).toMatch(/common-practice threshold with no published source/);
    expect(obuchowskiRockette(study(7, 4, 30)).warning).toBeNull();
  });
  it('names the covariance method and refuses an unknown one', () => {
    const s = study(8, 3, 30);
    expect(obuchowskiRockette(s).covarianceMethod).toBe('jackknife');
    expect(obuchowskiRockette({ ...s, covariance: 'delong' }).covarianceMethod).toBe('delong');
    // @ts-expect-error: an option from outside the type, as a JavaScript caller could pass
    expect(() => obuchowskiRockette({ ...s, covariance: 'bootstrap' })).toThrow(/covariance must be jackknife or delong, got "bootstrap"/);
  });
  it('gives each modality its reader-averaged AUC, the same as the modality means', () => {
    const s = study(9, 4, 36);
    const got = obuchowskiRockette({ ...s, covariance: 'delong' });
    got.auc.forEach((row, i) => {
      expect(got.treatments[i]?.auc).toBeCloseTo(row.reduce((a, b) => a + b, 0) / row.length, 14);
      expect(got.treatments[i]?.fixedCases.ddf).toBe(3);
      expect(got.treatments[i]?.fixedReaders.ddf).toBe(Infinity);
    });
  });
});


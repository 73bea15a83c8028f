"""Obuchowski-Rockette analysis, re-implemented independently in numpy from the published formulas.

NOT a reference library (none is allowed for this method): a second, deliberately different
computation to check src/analysis/obuchowski-rockette.ts against. Differences on purpose:
the jackknife recomputes every leave-one-case-out AUC by brute force over all case pairs
(the TypeScript uses the O(n) placement-value update), and the covariances are averaged from
the full (t*r) x (t*r) jackknife covariance matrix (the TypeScript uses per-case sums).
Formulas: Obuchowski & Rockette (1995); jackknife covariances Hillis, Obuchowski, Schartz &
Berbaum (2005); ddf Hillis (2007). p values and quantiles from scipy.stats.
DeLong covariances (method="delong"): DeLong, DeLong & Clarke-Pearson (1988); here the placement
values come from brute-force comparison of every positive with every negative (the TypeScript uses
midranks), and the full (t*r) x (t*r) matrix S10/m + S01/n is formed with numpy.cov.
Single-treatment intervals ("treatments"): each modality on its own, from the diagonal block of
the same covariance matrix (docs/methods.md gives the formulas).
Run as a script to write ../fixtures/or-scores-*.json (seeded inputs plus these results:
"expected" with jackknife covariances, "expected_delong" with DeLong covariances).
"""
import json
import os

import numpy as np
import scipy
from scipy import stats


def auc_pairs(score, truth):
    pos, neg = score[truth == 1], score[truth == 0]
    diff = pos[:, None] - neg[None, :]
    return float(((diff > 0) + 0.5 * (diff == 0)).mean())


def jackknife_matrix(scores, truth):
    t, r, c = scores.shape
    keep = ~np.eye(c, dtype=bool)
    jk = np.array([[[auc_pairs(scores[i, j][keep[k]], truth[keep[k]]) for k in range(c)]
                    for j in range(r)] for i in range(t)])  # t x r x c
    flat = jk.reshape(t * r, c)
    dev = flat - flat.mean(axis=1, keepdims=True)
    return (c - 1) / c * dev @ dev.T


def delong_matrix(scores, truth):
    """DeLong et al. (1988) covariance of all t*r AUCs: S10/m + S01/n, brute-force placements."""
    t, r, c = scores.shape
    flat = scores.reshape(t * r, c)
    pos, neg = flat[:, truth == 1], flat[:, truth == 0]
    m, n = pos.shape[1], neg.shape[1]
    psi = (pos[:, :, None] > neg[:, None, :]) + 0.5 * (pos[:, :, None] == neg[:, None, :])  # (t*r) x m x n
    v10 = psi.mean(axis=2)  # share of negatives below each positive
    v01 = psi.mean(axis=1)  # share of positives above each negative
    return np.cov(v10) / m + np.cov(v01) / n


def single_treatments(auc, cov, t, r):
    out = []
    for i in range(t):
        block = cov[i * r:(i + 1) * r, i * r:(i + 1) * r]
        var_e = np.diag(block).mean()
        cov2 = block[~np.eye(r, dtype=bool)].mean()
        a = auc[i]
        mean = a.mean()
        ms_r = np.sum((a - mean) ** 2) / (r - 1)
        den = ms_r + r * max(cov2, 0)
        ddf = den ** 2 / (ms_r ** 2 / (r - 1))
        se = np.sqrt(den / r)
        q = stats.t.ppf(0.975, ddf)
        random = {"se": se, "ddf": ddf, "lower": mean - q * se, "upper": mean + q * se}
        se = np.sqrt((var_e + (r - 1) * max(cov2, 0)) / r)
        q = stats.norm.ppf(0.975)
        fixed_readers = {"se": se, "ddf": None, "lower": mean - q * se, "upper": mean + q * se}
        se = np.sqrt(ms_r / r)
        q = stats.t.ppf(0.975, r - 1)
        fixed_cases = {"se": se, "ddf": r - 1, "lower": mean - q * se, "upper": mean + q * se}
        fl = lambda d: {k: (None if v is None else float(v)) for k, v in d.items()}  # noqa: E731
        out.append({"modality": i, "auc": float(mean), "random": fl(random), "fixedReaders": fl(fixed_readers),
                    "fixedCases": fl(fixed_cases), "msR": float(ms_r), "varE": float(var_e), "cov2": float(cov2)})
    return out


def or_analysis(scores, truth, method="jackknife"):
    scores = np.asarray(scores, float)
    truth = np.asarray(truth)
    t, r, c = scores.shape
    auc = np.array([[auc_pairs(scores[i, j], truth) for j in range(r)] for i in range(t)])
    cov = jackknife_matrix(scores, truth) if method == "jackknife" else delong_matrix(scores, truth)
    mod = np.repeat(np.arange(t), r)
    rdr = np.tile(np.arange(r), t)
    same_m = mod[:, None] == mod[None, :]
    same_r = rdr[:, None] == rdr[None, :]
    var_e = cov[same_m & same_r].mean()
    cov1 = cov[~same_m & same_r].mean()
    cov2 = cov[same_m & ~same_r].mean()
    cov3 = cov[~same_m & ~same_r].mean()
    mi, mj, g = auc.mean(1), auc.mean(0), auc.mean()
    ms_t = r * np.sum((mi - g) ** 2) / (t - 1)
    ms_tr = np.sum((auc - mi[:, None] - mj[None, :] + g) ** 2) / ((t - 1) * (r - 1))
    diff = mi[1] - mi[0]
    res = {}
    den = ms_tr + r * max(cov2 - cov3, 0)
    ddf = den ** 2 / (ms_tr ** 2 / ((t - 1) * (r - 1)))
    se = np.sqrt(2 * den / r)
    q = stats.t.ppf(0.975, ddf)
    res["random"] = {"difference": diff, "se": se, "lower": diff - q * se, "upper": diff + q * se,
                     "f": ms_t / den, "df1": t - 1, "ddf": ddf, "p": stats.f.sf(ms_t / den, t - 1, ddf)}
    den = var_e - cov1 + (r - 1) * max(cov2 - cov3, 0)
    se = np.sqrt(2 * den / r)
    chi2 = (t - 1) * ms_t / den
    q = stats.norm.ppf(0.975)
    res["fixedReaders"] = {"difference": diff, "se": se, "lower": diff - q * se, "upper": diff + q * se,
                           "f": chi2 / (t - 1), "df1": t - 1, "ddf": None, "p": stats.chi2.sf(chi2, t - 1)}
    ddf = (t - 1) * (r - 1)
    se = np.sqrt(2 * ms_tr / r)
    q = stats.t.ppf(0.975, ddf)
    res["fixedCases"] = {"difference": diff, "se": se, "lower": diff - q * se, "upper": diff + q * se,
                         "f": ms_t / ms_tr, "df1": t - 1, "ddf": ddf, "p": stats.f.sf(ms_t / ms_tr, t - 1, ddf)}
    res = {k: {kk: (None if vv is None else float(vv)) for kk, vv in v.items()} for k, v in res.items()}
    res["auc"] = auc.tolist()
    res["covariances"] = {"varE": float(var_e), "cov1": float(cov1), "cov2": float(cov2), "cov3": float(cov3)}
    res["msT"], res["msTR"] = float(ms_t), float(ms_tr)
    res["treatments"] = single_treatments(auc, cov, t, r)
    return res


def simulate(seed, readers, cases, decimals, effect):
    """Seeded scores of a made-up fully crossed study: shared case and reader effects, rounded to make ties."""
    rng = np.random.default_rng(seed)
    truth = (rng.random(cases) < 0.5).astype(int)
    truth[:2], truth[2:4] = 1, 0
    case = rng.normal(0, 0.7, cases)
    reader = rng.normal(0, 0.3, (readers, 1))
    base = truth * 1.2 + case
    s = np.stack([base + reader + rng.normal(0, 0.8, (readers, cases)),
                  base + effect * truth + reader + rng.normal(0, 0.8, (readers, cases))])
    return np.round(s, decimals), truth


def main():
    here = os.path.dirname(os.path.abspath(__file__))
    configs = [("or-scores-a.json", 11, 6, 60, 2, 0.4), ("or-scores-b.json", 12, 3, 25, 0, 0.0),
               ("or-scores-c.json", 13, 8, 40, 1, 0.2)]
    for name, seed, r, c, dec, eff in configs:
        scores, truth = simulate(seed, r, c, dec, eff)
        out = {"generated_by": "test/reference/scripts/or_numpy.py",
               "method": "independent numpy re-implementation (brute-force jackknife), not a reference library",
               "versions": {"numpy": np.__version__, "scipy": scipy.__version__},
               "scores": scores.tolist(), "truth": truth.tolist(), "expected": or_analysis(scores, truth),
               "expected_delong": or_analysis(scores, truth, "delong")}
        with open(os.path.join(here, "..", "fixtures", name), "w") as f:
            json.dump(out, f)
        print("wrote", name)


if __name__ == "__main__":
    main()

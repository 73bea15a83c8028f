"""The per-reader figures of `heed analyze` computed with numpy + scikit-learn + statsmodels,
for the speed comparison in bench/analysis-vs-python.ts (not a test; no bootstrap, no
Obuchowski-Rockette, no calibration or subgroups: the comparison covers the documented per-reader
figures plus pooled ones).
Usage: /usr/bin/python3 bench/analysis-vs-python.py READS.csv OUT.json
"""
import json
import sys
import time

import numpy as np
import pandas as pd
from scipy.stats import norm, rankdata
from sklearn.metrics import brier_score_loss, cohen_kappa_score, roc_auc_score
from statsmodels.stats.contingency_tables import mcnemar
from statsmodels.stats.inter_rater import cohens_kappa
from statsmodels.stats.proportion import proportion_confint

Z = 1.959963984540054


def prop(k, n):
    if n == 0:
        return {"k": 0, "n": 0, "estimate": None, "lower": None, "upper": None}
    lo, hi = proportion_confint(k, n, alpha=0.05, method="wilson")
    return {"k": int(k), "n": int(n), "estimate": k / n, "lower": float(lo), "upper": float(hi)}


def placements(pos, neg):
    """DeLong structural components by midranks (Sun & Xu 2014), scipy rankdata."""
    m, n = len(pos), len(neg)
    tz = rankdata(np.concatenate([pos, neg]))
    v10 = (tz[:m] - rankdata(pos)) / n
    v01 = 1 - (tz[m:] - rankdata(neg)) / m
    return v10, v01


def auc_block(y, s):
    if y.min() == y.max():
        return None
    pos, neg = s[y == 1], s[y == 0]
    v10, v01 = placements(pos, neg)
    se = float(np.sqrt(np.var(v10, ddof=1) / len(pos) + np.var(v01, ddof=1) / len(neg)))
    est = float(roc_auc_score(y, s))
    return {"estimate": est, "se": se, "lower": max(0.0, est - Z * se), "upper": min(1.0, est + Z * se)}


def condition(g, aided):
    y, d, s = g["truth"].to_numpy(), g["final_call"].to_numpy(), g["score"].to_numpy()
    out = {"n": len(g), "accuracy": prop(int((d == y).sum()), len(g)),
           "sensitivity": prop(int(((d == 1) & (y == 1)).sum()), int((y == 1).sum())),
           "specificity": prop(int(((d == 0) & (y == 0)).sum()), int((y == 0).sum())),
           "auc": auc_block(y, s), "brier": float(brier_score_loss(y, s / 100)),
           "median_ms": float(np.median(g["total_ms"].to_numpy()))}
    if aided:
        a = g["ai_call"].to_numpy().astype(int)
        out["agreement"] = prop(int((d == a).sum()), len(g))
        out["overreliance"] = prop(int(((d == a) & (a != y)).sum()), int((a != y).sum()))
        out["underreliance"] = prop(int(((d != a) & (a == y)).sum()), int((a == y).sum()))
        table = np.array([[((d == i) & (a == j)).sum() for j in (0, 1)] for i in (0, 1)], float)
        out["kappa"] = {"estimate": float(cohen_kappa_score(d, a)), "se": float(cohens_kappa(table).std_kappa)}
    return out


def sequential(g):
    g = g[g["assistance"] == "sequential"]
    if g.empty:
        return None
    y, d = g["truth"].to_numpy(), g["final_call"].to_numpy()
    d0, a = g["initial_call"].to_numpy().astype(int), g["ai_call"].to_numpy().astype(int)
    s0 = np.where(d0 == 1, 50 + g["initial_confidence"].fillna(100).to_numpy() / 2, 50 - g["initial_confidence"].fillna(100).to_numpy() / 2)
    den = 100 * g["ai_score"].to_numpy() - s0
    use = np.abs(den) >= 1
    w = np.clip((g["score"].to_numpy()[use] - s0[use]) / den[use], 0, 1)
    return {"n": len(g), "changed": int((d0 != d).sum()), "toward_ai": int(((d0 != a) & (d == a)).sum()),
            "beneficial": int(((d0 != y) & (d == y)).sum()), "detrimental": int(((d0 == y) & (d != y)).sum()),
            "rair": prop(int(((d0 != y) & (a == y) & (d == y)).sum()), int(((d0 != y) & (a == y)).sum())),
            "rsr": prop(int(((d0 == y) & (a != y) & (d == y)).sum()), int(((d0 == y) & (a != y)).sum())),
            "woa": {"n": int(use.sum()), "mean": float(w.mean()), "median": float(np.median(w))}}


def crossover(u, a):
    p = u.merge(a, on="case_id", suffixes=("_u", "_a"))
    p = p[p["period_u"] != p["period_a"]]
    ok_u = (p["final_call_u"] == p["truth_u"]).to_numpy()
    ok_a = (p["final_call_a"] == p["truth_a"]).to_numpy()
    b, c = int((ok_u & ~ok_a).sum()), int((~ok_u & ok_a).sum())
    y = p["truth_u"].to_numpy()
    su, sa = p["score_u"].to_numpy(), p["score_a"].to_numpy()
    v10u, v01u = placements(su[y == 1], su[y == 0])
    v10a, v01a = placements(sa[y == 1], sa[y == 0])
    m, n = (y == 1).sum(), (y == 0).sum()
    var = (np.var(v10u - v10a, ddof=1) / m + np.var(v01u - v01a, ddof=1) / n)
    diff = v10a.mean() - v10u.mean()
    z = diff / np.sqrt(var) if var > 0 else None
    return {"n": len(p), "accuracy_difference": float(ok_a.mean() - ok_u.mean()),
            "mcnemar": {"b": b, "c": c, "p": float(mcnemar([[0, b], [c, 0]], exact=True).pvalue) if b + c else 1.0},
            "auc_difference": {"difference": float(diff), "z": None if z is None else float(z),
                               "p": None if z is None else float(2 * norm.sf(abs(z)))}}


def main():
    start = time.perf_counter()
    df = pd.read_csv(sys.argv[1], dtype={"reader_id": str, "case_id": str, "finding": str})
    df = df[df["practice"] == 0].copy()
    conf = df["final_confidence"].fillna(100)
    df["score"] = np.where(df["final_call"] == 1, 50 + conf / 2, 50 - conf / 2)
    readers = []
    for (rid, finding), g in df.groupby(["reader_id", "finding"], sort=False):
        u, a = g[g["assistance"] == "none"], g[g["assistance"] != "none"]
        readers.append({"reader_id": rid, "finding": finding,
                        "unaided": condition(u, False) if len(u) else None,
                        "aided": condition(a, True) if len(a) else None,
                        "sequential": sequential(g),
                        "crossover": crossover(u, a) if len(u) and len(a) else None})
    pooled = {f: {"unaided": condition(g[g["assistance"] == "none"], False),
                  "aided": condition(g[g["assistance"] != "none"], True)} for f, g in df.groupby("finding")}
    with open(sys.argv[2], "w") as f:
        json.dump({"readers": readers, "pooled": pooled}, f)
    print(f"python: {len(df)} reads, {len(readers)} reader entries, {time.perf_counter() - start:.3f} s inside the script")


if __name__ == "__main__":
    main()

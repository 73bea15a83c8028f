"""Reference values for Heed's analysis, from general-purpose libraries, written as JSON fixtures.

Run from anywhere with Debian's Python (the pyenv python3 on PATH lacks these libraries):
  /usr/bin/python3 test/reference/scripts/simulate_logs.py   # the input logs (committed)
  /usr/bin/python3 test/reference/scripts/make_fixtures.py   # this: ../fixtures/reference-*.json
It calls Rscript proc_delong.R for the DeLong values (R pROC). Library versions and the exact
calls are written into each fixture. Definitions follow docs/methods.md; where a figure is a
plain count or mean by that definition (sequential counts, weight of advice) it is computed here
in numpy and marked "numpy, by the definition in docs/methods.md": that is an independent computation, not a
reference library.
"""
import csv
import json
import os
import subprocess
import sys
import tempfile

import numpy as np
import scipy
import sklearn
import statsmodels
from scipy.stats import binomtest
from sklearn.metrics import brier_score_loss, cohen_kappa_score, roc_auc_score
from statsmodels.stats.contingency_tables import mcnemar
from statsmodels.stats.inter_rater import cohens_kappa
from statsmodels.stats.proportion import proportion_confint

sys.path.insert(0, os.path.dirname(os.path.abspath(__file__)))
from or_numpy import or_analysis  # noqa: E402

HERE = os.path.dirname(os.path.abspath(__file__))
FIX = os.path.join(HERE, "..", "fixtures")
LOGS = ["log-crossover.csv", "log-sequential.csv", "log-ties.csv", "log-noconf.csv"]
Z = 1.959963984540054

CALLS = {
    "wilson": "statsmodels.stats.proportion.proportion_confint(k, n, alpha=0.05, method='wilson')",
    "clopper_pearson": "statsmodels.stats.proportion.proportion_confint(k, n, alpha=0.05, method='beta')",
    "auc": "sklearn.metrics.roc_auc_score(truth, score)",
    "auc_se": "R pROC: sqrt(var(roc(truth, score, levels = c(0, 1), direction = '<'), method = 'delong'))",
    "paired_delong": "R pROC: roc.test(roc_unaided, roc_aided, method = 'delong', paired = TRUE); Z = (auc1 - auc2)/se",
    "brier": "sklearn.metrics.brier_score_loss(truth, score / 100)",
    "kappa": "sklearn.metrics.cohen_kappa_score(final_call, ai_call)",
    "kappa_se": "statsmodels.stats.inter_rater.cohens_kappa(table).std_kappa (Fleiss, Cohen & Everitt 1969 large-sample variance, kappa form); cross-checked against the same formula in numpy in the po/pe form (kappa_se_numpy)",
    "mcnemar": "statsmodels.stats.contingency_tables.mcnemar([[0, b], [c, 0]], exact=True).pvalue; also scipy.stats.binomtest(min(b, c), b + c, 0.5).pvalue",
    "median_ms": "numpy.median(total_ms)",
    "sequential": "numpy, by the definition in docs/methods.md",
    "or": "or_numpy.py: independent re-implementation in numpy from the published formulas (brute-force jackknife), not a reference library; scipy.stats.f / t / norm for p and quantiles",
}


def read_log(name):
    with open(os.path.join(FIX, name), encoding="utf-8", newline="") as f:
        return [r for r in csv.DictReader(f) if r["practice"] == "0"]


def derived(call, conf):
    c = 100.0 if conf == "" else float(conf)  # no confidence asked: treated as 100 (the engine rule, docs/formats.md)
    return 50 + c / 2 if call == 1 else 50 - c / 2


def prop(k, n):
    if n == 0:
        return {"k": 0, "n": 0, "estimate": None, "lower": None, "upper": None, "cp_lower": None, "cp_upper": None}
    lo, hi = proportion_confint(k, n, alpha=0.05, method="wilson")
    cl, cu = proportion_confint(k, n, alpha=0.05, method="beta")
    return {"k": int(k), "n": int(n), "estimate": k / n, "lower": float(lo), "upper": float(hi),
            "cp_lower": float(cl), "cp_upper": float(cu)}


def kappa_numpy(d, a):
    """Fleiss, Cohen & Everitt (1969) variance in the po/pe form, a second route to the same value."""
    t = np.array([[np.sum((d == i) & (a == j)) for j in (0, 1)] for i in (0, 1)], float)
    n = t.sum()
    p = t / n
    r, c = p.sum(1), p.sum(0)
    po, pe = np.trace(p), float(r @ c)
    if pe >= 1:
        return None
    A = sum(p[i, i] * ((1 - pe) - (c[i] + r[i]) * (1 - po)) ** 2 for i in (0, 1))
    B = sum(p[i, j] * (c[i] + r[j]) ** 2 for i in (0, 1) for j in (0, 1) if i != j)
    v = (A + (1 - po) ** 2 * B - (po * pe - 2 * pe + po) ** 2) / (n * (1 - pe) ** 4)
    return float(np.sqrt(max(v, 0)))


def condition(rows, aided, delong_jobs, key):
    y = np.array([int(r["truth"]) for r in rows])
    d = np.array([int(r["final_call"]) for r in rows])
    s = np.array([derived(int(r["final_call"]), r["final_confidence"]) for r in rows])
    out = {"n": len(rows),
           "accuracy": prop(int(np.sum(d == y)), len(rows)),
           "sensitivity": prop(int(np.sum((d == 1) & (y == 1))), int(np.sum(y == 1))),
           "specificity": prop(int(np.sum((d == 0) & (y == 0))), int(np.sum(y == 0))),
           "brier": float(brier_score_loss(y, s / 100)),
           "median_ms": float(np.median([float(r["total_ms"]) for r in rows]))}
    if 0 < y.sum() < len(y):
        out["auc"] = {"estimate": float(roc_auc_score(y, s))}
        delong_jobs.append({"id": key, "truth": y.tolist(), "score": s.tolist()})
    else:
        out["auc"] = None
    if aided:
        a = np.array([int(r["ai_call"]) for r in rows])
        out["agreement"] = prop(int(np.sum(d == a)), len(rows))
        out["overreliance"] = prop(int(np.sum((d == a) & (a != y))), int(np.sum(a != y)))
        out["underreliance"] = prop(int(np.sum((d != a) & (a == y))), int(np.sum(a == y)))
        table = np.array([[np.sum((d == i) & (a == j)) for j in (0, 1)] for i in (0, 1)], float)
        if len(set(d)) == 1 and len(set(a)) == 1 and d[0] == a[0]:
            out["kappa"] = {"estimate": None, "se": None, "se_numpy": None}
        else:
            res = cohens_kappa(table)
            out["kappa"] = {"estimate": float(cohen_kappa_score(d, a)), "estimate_statsmodels": float(res.kappa),
                            "se": float(res.std_kappa), "se0": float(np.sqrt(res.var_kappa0)),
                            "se_numpy": kappa_numpy(d, a)}
    return out


def sequential(rows):
    rows = [r for r in rows if r["assistance"] == "sequential"]
    if not rows:
        return None
    y = np.array([int(r["truth"]) for r in rows])
    d = np.array([int(r["final_call"]) for r in rows])
    d0 = np.array([int(r["initial_call"]) for r in rows])
    a = np.array([int(r["ai_call"]) for r in rows])
    s = np.array([derived(int(r["final_call"]), r["final_confidence"]) for r in rows])
    s0 = np.array([derived(int(r["initial_call"]), r["initial_confidence"]) for r in rows])
    p = np.array([float(r["ai_score"]) for r in rows])
    den = 100 * p - s0
    use = np.abs(den) >= 1
    w = np.clip((s[use] - s0[use]) / den[use], 0, 1)
    return {"n": len(rows), "changed": int(np.sum(d0 != d)), "toward_ai": int(np.sum((d0 != a) & (d == a))),
            "beneficial": int(np.sum((d0 != y) & (d == y))), "detrimental": int(np.sum((d0 == y) & (d != y))),
            "rair": prop(int(np.sum((d0 != y) & (a == y) & (d == y))), int(np.sum((d0 != y) & (a == y)))),
            "rsr": prop(int(np.sum((d0 == y) & (a != y) & (d == y))), int(np.sum((d0 == y) & (a != y)))),
            "woa": {"n": int(use.sum()), "mean": float(w.mean()) if use.any() else None,
                    "median": float(np.median(w)) if use.any() else None}}


def crossover(rows, paired_jobs, key):
    un = {r["case_id"]: r for r in rows if r["assistance"] == "none"}
    ai = {r["case_id"]: r for r in rows if r["assistance"] != "none"}
    ids = sorted(set(un) & set(ai))
    pairs = [(un[i], ai[i]) for i in ids if un[i]["period"] != ai[i]["period"]]
    if not pairs:
        return None
    ok_u = np.array([u["final_call"] == u["truth"] for u, _ in pairs])
    ok_a = np.array([a["final_call"] == a["truth"] for _, a in pairs])
    b, c = int(np.sum(ok_u & ~ok_a)), int(np.sum(~ok_u & ok_a))
    p_sm = float(mcnemar([[0, b], [c, 0]], exact=True).pvalue) if b + c > 0 else 1.0
    p_sp = float(binomtest(min(b, c), b + c, 0.5).pvalue) if b + c > 0 else 1.0
    wrong = [(u, a) for u, a in pairs if a["ai_call"] != a["truth"]]
    bw = sum(1 for u, a in wrong if u["final_call"] == u["truth"] and a["final_call"] != a["truth"])
    cw = sum(1 for u, a in wrong if u["final_call"] != u["truth"] and a["final_call"] == a["truth"])
    y = np.array([int(u["truth"]) for u, _ in pairs])
    if 0 < y.sum() < len(y):
        su = [derived(int(u["final_call"]), u["final_confidence"]) for u, _ in pairs]
        sa = [derived(int(a["final_call"]), a["final_confidence"]) for _, a in pairs]
        paired_jobs.append({"id": key, "truth": y.tolist(), "score1": su, "score2": sa})
    return {"n": len(pairs), "accuracy_difference": float(ok_a.mean() - ok_u.mean()),
            "mcnemar": {"b": b, "c": c, "p": p_sm, "p_scipy_binomtest": p_sp},
            "wrong_suggestion": {"n": len(wrong), "b": bw, "c": cw,
                                 "p": float(mcnemar([[0, bw], [cw, 0]], exact=True).pvalue) if bw + cw > 0 else 1.0}}


def or_from_log(rows, finding):
    rows = [r for r in rows if r["finding"] == finding]
    readers = sorted({r["reader_id"] for r in rows})
    case_ids = sorted({r["case_id"] for r in rows})
    truth = {r["case_id"]: int(r["truth"]) for r in rows}
    score = {(r["assistance"] != "none", r["reader_id"], r["case_id"]): derived(int(r["final_call"]), r["final_confidence"]) for r in rows}
    scores = np.array([[[score[(m == 1, rid, cid)] for cid in case_ids] for rid in readers] for m in (0, 1)])
    return or_analysis(scores, np.array([truth[c] for c in case_ids]))


def run_r(single, paired):
    with tempfile.TemporaryDirectory() as tmp:
        inp, out = os.path.join(tmp, "in.json"), os.path.join(tmp, "out.json")
        with open(inp, "w") as f:
            json.dump({"single": single, "paired": paired}, f)
        subprocess.run(["Rscript", os.path.join(HERE, "proc_delong.R"), inp, out], check=True)
        with open(out) as f:
            return json.load(f)


def main():
    for log in LOGS:
        rows = read_log(log)
        single, paired, readers = [], [], []
        for rid in sorted({r["reader_id"] for r in rows}):
            for finding in sorted({r["finding"] for r in rows}):
                mine = [r for r in rows if r["reader_id"] == rid and r["finding"] == finding]
                key = f"{rid}|{finding}"
                un = [r for r in mine if r["assistance"] == "none"]
                ai = [r for r in mine if r["assistance"] != "none"]
                readers.append({"reader_id": rid, "finding": finding,
                                "unaided": condition(un, False, single, key + "|unaided") if un else None,
                                "aided": condition(ai, True, single, key + "|aided") if ai else None,
                                "sequential": sequential(mine),
                                "crossover": crossover(mine, paired, key)})
        r = run_r(single, paired)
        by_id = {x["id"]: x for x in r["single"]}
        for entry in readers:
            for cond in ("unaided", "aided"):
                sec = entry[cond]
                if sec and sec["auc"]:
                    x = by_id[f"{entry['reader_id']}|{entry['finding']}|{cond}"]
                    assert abs(x["auc"] - sec["auc"]["estimate"]) < 1e-12, "pROC and sklearn AUC differ"
                    se = float(np.sqrt(x["var"]))
                    sec["auc"].update({"se": se, "lower": max(0.0, sec["auc"]["estimate"] - Z * se),
                                       "upper": min(1.0, sec["auc"]["estimate"] + Z * se)})
        pdl = {x["id"]: x for x in r["paired"]}
        for entry in readers:
            x = pdl.get(f"{entry['reader_id']}|{entry['finding']}")
            if entry["crossover"] and x:
                entry["crossover"]["paired_delong"] = {"auc_unaided": x["auc1"], "auc_aided": x["auc2"], "z_proc": x["z"], "p": x["p"]}
        findings = sorted({r["finding"] for r in rows})
        out = {"log": log,
               "generated_by": "test/reference/scripts/make_fixtures.py",
               "versions": {"python": sys.version.split()[0], "numpy": np.__version__, "scipy": scipy.__version__,
                            "statsmodels": statsmodels.__version__, "scikit-learn": sklearn.__version__,
                            "R": r["r_version"], "pROC": r["proc_version"]},
               "calls": CALLS, "readers": readers,
               "or": {f: or_from_log(rows, f) for f in findings}}
        name = "reference-" + log.replace("log-", "").replace(".csv", ".json")
        with open(os.path.join(FIX, name), "w") as f:
            json.dump(out, f, indent=1)
        print("wrote", name)


if __name__ == "__main__":
    main()

"""Reference values for the conditional reliance forms and both weight-of-advice forms.

Reads the seeded invented log fixtures/log-sequential.csv (written
by simulate_logs.py) and writes fixtures/reference-reliance-forms.json, per reader and finding:
- over-reliance given first right  k = #(d0 = y, a != y, d != y), n = #(d0 = y, a != y)
- under-reliance given first wrong k = #(d0 != y, a = y, d != y), n = #(d0 != y, a = y)
  each with its Wilson 95% interval from statsmodels
  proportion_confint(k, n, alpha=0.05, method="wilson");
- weight of advice, signed (s - s0)/(100p - s0) and absolute |s - s0|/|100p - s0|, left out where
  |100p - s0| < 1, clipped to [0, 1] (numpy.clip), mean (numpy.mean) and median (numpy.median).
Definitions: docs/methods.md. The counts and weights are computed here in numpy by those
definitions (an independent computation, not a library's); the intervals come from statsmodels.
Run with Debian's python3 (python3-numpy, python3-statsmodels):
  /usr/bin/python3 test/reference/scripts/reliance_forms.py
"""
import csv
import json
import os

import numpy as np
import statsmodels
from statsmodels.stats.proportion import proportion_confint

HERE = os.path.dirname(os.path.abspath(__file__))
FIX = os.path.join(HERE, "..", "fixtures")
LOGS = ["log-sequential.csv"]


def derived(call, conf):
    c = 100.0 if conf == "" else float(conf)  # no confidence asked: taken as 100 (docs/formats.md)
    return 50 + c / 2 if call == 1 else 50 - c / 2


def prop(k, n):
    if n == 0:
        return {"k": 0, "n": 0, "estimate": None, "lower": None, "upper": None}
    lo, hi = proportion_confint(k, n, alpha=0.05, method="wilson")
    return {"k": int(k), "n": int(n), "estimate": k / n, "lower": float(lo), "upper": float(hi)}


def woa(values):
    if len(values) == 0:
        return {"n": 0, "mean": None, "median": None}
    return {"n": int(len(values)), "mean": float(np.mean(values)), "median": float(np.median(values))}


def forms(rows):
    rows = [r for r in rows if r["assistance"] == "sequential" and r["initial_call"] != "" and r["ai_call"] != ""]
    if not rows:
        return None
    y = np.array([int(r["truth"]) for r in rows])
    d = np.array([int(r["final_call"]) for r in rows])
    d0 = np.array([int(r["initial_call"]) for r in rows])
    a = np.array([int(r["ai_call"]) for r in rows])
    scored = [r for r in rows if r["ai_score"] != ""]
    s = np.array([derived(int(r["final_call"]), r["final_confidence"]) for r in scored])
    s0 = np.array([derived(int(r["initial_call"]), r["initial_confidence"]) for r in scored])
    p = np.array([float(r["ai_score"]) for r in scored])
    gap = 100 * p - s0
    use = np.abs(gap) >= 1
    first_right_wrong_ai = (d0 == y) & (a != y)
    first_wrong_right_ai = (d0 != y) & (a == y)
    return {
        "overreliance_given_first_right": prop(int(np.sum(first_right_wrong_ai & (d != y))), int(np.sum(first_right_wrong_ai))),
        "underreliance_given_first_wrong": prop(int(np.sum(first_wrong_right_ai & (d != y))), int(np.sum(first_wrong_right_ai))),
        "woa_signed": woa(np.clip((s[use] - s0[use]) / gap[use], 0, 1)),
        "woa_absolute": woa(np.clip(np.abs(s[use] - s0[use]) / np.abs(gap[use]), 0, 1)),
    }


def main():
    out = {"generated_by": "test/reference/scripts/reliance_forms.py",
           "versions": {"numpy": np.__version__, "statsmodels": statsmodels.__version__},
           "calls": {"wilson": "statsmodels.stats.proportion.proportion_confint(k, n, alpha=0.05, method='wilson')",
                     "woa": "numpy.clip, numpy.mean, numpy.median over the reads kept, by the definitions in docs/methods.md"},
           "logs": {}}
    for name in LOGS:
        with open(os.path.join(FIX, name), encoding="utf-8", newline="") as f:
            rows = [r for r in csv.DictReader(f) if r["practice"] == "0"]
        groups = {}
        for r in rows:
            groups.setdefault((r["reader_id"], r["finding"]), []).append(r)
        out["logs"][name] = [{"reader_id": rid, "finding": fnd, "forms": forms(rs)} for (rid, fnd), rs in sorted(groups.items())]
    with open(os.path.join(FIX, "reference-reliance-forms.json"), "w") as f:
        json.dump(out, f, indent=1)
    print("wrote reference-reliance-forms.json")


if __name__ == "__main__":
    main()

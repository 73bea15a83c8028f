"""ROC curve points from scikit-learn for Heed's ROC plots (src/analysis/roc-points.ts).

Run with Debian's Python: /usr/bin/python3 test/reference/scripts/roc_fixture.py
Writes ../fixtures/roc-points.json. For each committed log (non-practice reads), finding, reader
and condition (unaided: assistance none; aided: otherwise), the derived final score
(call 1: 50 + confidence/2, call 0: 50 - confidence/2, empty confidence = 100) and truth go to
sklearn.metrics.roc_curve(truth, score, drop_intermediate=False) and sklearn.metrics.auc(fpr, tpr).
The reader-averaged curve (vertical averaging, Fawcett 2006 section 8.1) is re-implemented here in
numpy as an independent check (not a reference library), with its area.
"""
import csv
import json
import os

import numpy as np
import sklearn
from sklearn.metrics import auc, roc_curve

HERE = os.path.dirname(os.path.abspath(__file__))
FIX = os.path.join(HERE, "..", "fixtures")
LOGS = ["log-sequential.csv", "log-ties.csv", "log-crossover.csv"]


def derived(call, conf):
    c = 100.0 if conf == "" else float(conf)
    return 50 + c / 2 if call == "1" else 50 - c / 2


def vertical_average(curves):
    grid = np.unique(np.concatenate([c[0] for c in curves]))
    out = []
    for x in grid:
        lows, highs = [], []
        for fpr, tpr in curves:
            at = tpr[fpr == x]
            if at.size:
                lows.append(at.min())
                highs.append(at.max())
            else:
                i = np.searchsorted(fpr, x)
                y = tpr[i - 1] + (tpr[i] - tpr[i - 1]) * (x - fpr[i - 1]) / (fpr[i] - fpr[i - 1])
                lows.append(y)
                highs.append(y)
        lo, hi = float(np.mean(lows)), float(np.mean(highs))
        out.append([float(x), lo])
        if hi != lo:
            out.append([float(x), hi])
    return out


cases = []
for name in LOGS:
    with open(os.path.join(FIX, name), encoding="utf-8", newline="") as f:
        rows = [r for r in csv.DictReader(f) if r["practice"] == "0"]
    groups = {}
    for r in rows:
        cond = "unaided" if r["assistance"] == "none" else "aided"
        g = groups.setdefault((r["finding"], cond, r["reader_id"]), ([], []))
        g[0].append(derived(r["final_call"], r["final_confidence"]))
        g[1].append(int(r["truth"]))
    by_condition = {}
    for (finding, cond, reader), (scores, truth) in sorted(groups.items()):
        if len(set(truth)) < 2:
            continue
        fpr, tpr, thr = roc_curve(truth, scores, drop_intermediate=False)
        cases.append({
            "log": name, "finding": finding, "condition": cond, "reader_id": reader,
            "scores": scores, "truth": truth,
            "fpr": fpr.tolist(), "tpr": tpr.tolist(), "thresholds": thr.tolist(), "auc": float(auc(fpr, tpr)),
        })
        by_condition.setdefault((name, finding, cond), []).append((fpr, tpr, float(auc(fpr, tpr))))
    for (log, finding, cond), curves in sorted(by_condition.items()):
        avg = vertical_average([(c[0], c[1]) for c in curves])
        pts = np.array(avg)
        cases.append({
            "log": log, "finding": finding, "condition": cond, "reader_id": "(vertical average)",
            "average": avg, "area": float(np.trapz(pts[:, 1], pts[:, 0])), "mean_auc": float(np.mean([c[2] for c in curves])),
        })

with open(os.path.join(FIX, "roc-points.json"), "w", encoding="utf-8") as f:
    json.dump({
        "source": "scikit-learn roc_curve and auc; vertical average re-implemented in numpy",
        "versions": {"scikit-learn": sklearn.__version__, "numpy": np.__version__},
        "calls": {
            "roc": "sklearn.metrics.roc_curve(truth, score, drop_intermediate=False); thresholds[0] is max(score) + 1 in this version (later versions: inf)",
            "auc": "sklearn.metrics.auc(fpr, tpr)",
            "average": "numpy re-implementation of vertical averaging on the union of false-positive rates (independent check, not a library)",
        },
        "cases": cases,
    }, f, indent=None)
    f.write("\n")
print(len(cases), "cases")

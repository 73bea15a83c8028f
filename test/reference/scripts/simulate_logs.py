"""Write the small seeded read logs (docs/formats.md, "The read log") that the reference checks run on.

Fictional scenario, invented data for checks only: readers R1.. read cases from two made-up
scanners ("Orion-3", "Vega-X") at two made-up sites ("North Annex", "Harbour Clinic").
No patient data. Run with Debian's Python (numpy): /usr/bin/python3 simulate_logs.py
Output: ../fixtures/log-*.csv. The script is deterministic (numpy default_rng with fixed seeds).
"""
import csv
import io
import os
from datetime import datetime, timedelta, timezone

import numpy as np

COLUMNS = [
    "study_id", "reader_id", "reader_role", "reader_years", "sequence", "period", "assistance",
    "case_id", "finding", "practice", "order", "truth", "ai_call", "ai_score", "ai_planted",
    "caution_shown", "initial_call", "initial_confidence", "initial_ms", "final_call",
    "final_confidence", "total_ms", "shown_at", "case_scanner", "case_site",
]
HERE = os.path.dirname(os.path.abspath(__file__))
OUT = os.path.join(HERE, "..", "fixtures")
ROLES = ["radiologist", "resident", "radiologist", "surgeon", "resident", "radiologist"]


def cases(rng, n, findings):
    out = []
    for k in range(n):
        cid = f"C{k + 1:03d}"
        attrs = {"scanner": ["Orion-3", "Vega-X"][int(rng.random() < 0.4)],
                 "site": ["North Annex", "Harbour Clinic"][int(rng.random() < 0.5)]}
        for f in findings:
            truth = int(rng.random() < 0.45)
            # model score: binormal, planted errors flip the shown call and mirror the score
            score = float(1 / (1 + np.exp(-(rng.normal(1.6 if truth else -1.2, 1.3)))))
            planted = int(rng.random() < 0.12)
            if planted:
                score = 1 - score if (score >= 0.5) == bool(truth) else score
            out.append({"case_id": cid, "finding": f, "truth": truth,
                        "ai_score": round(score, 4), "ai_call": int(round(score, 4) >= 0.5),
                        "ai_planted": planted, **attrs})
    return out


def confidence(rng, margin, step):
    c = float(np.clip(abs(margin) * 45 + rng.normal(0, 12), 0, 100))
    return int(round(c / step) * step)


def reads(rng, study, readers, case_rows, periods, step, ask_confidence=True):
    rows = []
    t0 = datetime(2024, 3, 4, 8, 0, 0, tzinfo=timezone.utc)
    practice = [{"case_id": f"P{i}", "finding": case_rows[0]["finding"], "truth": i % 2,
                 "ai_score": 0.8 if i % 2 else 0.2, "ai_call": i % 2, "ai_planted": 0,
                 "scanner": "Orion-3", "site": "North Annex"} for i in (1, 2)]
    for r in range(readers):
        rid = f"R{r + 1}"
        skill = rng.normal(1.3, 0.25)
        seq_label, plan = periods[r % len(periods)]
        years = "" if r == 2 else str(int(rng.integers(1, 25)))
        clock = t0 + timedelta(days=r)
        for p, assistance in enumerate(plan, start=1):
            clock += timedelta(days=28 * (p - 1))
            order = [*practice, *[case_rows[i] for i in rng.permutation(len(case_rows))]]
            for pos, c in enumerate(order, start=1):
                is_practice = c["case_id"].startswith("P")
                latent = skill * (1 if c["truth"] else -1) + rng.normal(0, 1)
                shown = assistance != "none"
                row = {"study_id": study, "reader_id": rid, "reader_role": ROLES[r % len(ROLES)],
                       "reader_years": years, "sequence": seq_label, "period": p,
                       "assistance": assistance, "case_id": c["case_id"], "finding": c["finding"],
                       "practice": int(is_practice), "order": pos, "truth": c["truth"],
                       "ai_call": c["ai_call"] if shown else "", "ai_score": c["ai_score"] if shown else "",
                       "ai_planted": c["ai_planted"] if shown else 0,
                       "caution_shown": int(shown and rng.random() < 0.5),
                       "initial_call": "", "initial_confidence": "", "initial_ms": "",
                       "case_scanner": c["scanner"], "case_site": c["site"]}
                call = int(latent > 0)
                conf = confidence(rng, latent, step)
                total = int(rng.lognormal(8.6, 0.45))
                if assistance == "sequential":
                    row["initial_call"], row["initial_confidence"] = call, conf
                    row["initial_ms"] = total
                    total += int(rng.lognormal(7.4, 0.5))
                if shown:
                    # lean toward the suggestion: follow it sometimes, else blend it in
                    pull = 2.2 * (c["ai_score"] - 0.5)
                    if call != c["ai_call"] and rng.random() < 0.3:
                        call, conf = c["ai_call"], confidence(rng, pull, step)
                    else:
                        mixed = latent + pull
                        call, conf = int(mixed > 0), confidence(rng, mixed, step)
                row["final_call"], row["final_confidence"] = call, conf if ask_confidence else ""
                if not ask_confidence and assistance == "sequential":
                    row["initial_confidence"] = ""
                row["total_ms"] = total
                row["shown_at"] = clock.strftime("%Y-%m-%dT%H:%M:%S.") + f"{clock.microsecond // 1000:03d}Z"
                clock += timedelta(milliseconds=total + int(rng.integers(500, 4000)))
                rows.append(row)
    return rows


def write(name, rows):
    buf = io.StringIO()
    w = csv.DictWriter(buf, fieldnames=COLUMNS, lineterminator="\n")
    w.writeheader()
    w.writerows(rows)
    with open(os.path.join(OUT, name), "w", encoding="utf-8", newline="") as f:
        f.write(buf.getvalue())
    print(name, len(rows), "rows")


def main():
    os.makedirs(OUT, exist_ok=True)
    crossover = [("U-A", ["none", "concurrent"]), ("A-U", ["concurrent", "none"])]
    rng = np.random.default_rng(20240301)
    write("log-crossover.csv", reads(rng, "ref-crossover", 4, cases(rng, 40, ["target"]), crossover, 5))
    rng = np.random.default_rng(20240302)
    sequential = [("U-S", ["none", "sequential"]), ("S-U", ["sequential", "none"])]
    write("log-sequential.csv", reads(rng, "ref-sequential", 4, cases(rng, 36, ["target"]), sequential, 1))
    rng = np.random.default_rng(20240303)
    # coarse confidence (steps of 50) gives heavy ties in the derived score; two findings
    write("log-ties.csv", reads(rng, "ref-ties", 3, cases(rng, 24, ["target", "margin"]), crossover, 50))
    rng = np.random.default_rng(20240304)
    # no confidence asked: derived scores are 0 or 100 only
    write("log-noconf.csv", reads(rng, "ref-noconf", 3, cases(rng, 30, ["target"]), crossover, 1, ask_confidence=False))


if __name__ == "__main__":
    main()

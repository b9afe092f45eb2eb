"""The peer: what a data scientist would write for the same paired test, in Python.

Reads both predictions CSVs with pandas, merges them on id, and runs scipy's exact binomial test on
the discordant pairs (McNemar's exact test) for `id,correct`, or scipy's paired t-test for `id,loss`.
Prints one JSON line with the counts, so that the benchmark can check both tools agree.

    python3 bench/peer.py BASELINE.csv CANDIDATE.csv
"""
import json
import sys

import pandas as pd
from scipy import stats


def main(base_path: str, cand_path: str) -> None:
    base = pd.read_csv(base_path, dtype={"id": str})
    cand = pd.read_csv(cand_path, dtype={"id": str})
    pairs = base.merge(cand, on="id", suffixes=("_b", "_c"))
    if "correct_b" in pairs:
        # McNemar (1947), exact: a two-sided binomial test of one discordant count out of both.
        b_only = int(((pairs.correct_b == 1) & (pairs.correct_c == 0)).sum())
        c_only = int(((pairs.correct_b == 0) & (pairs.correct_c == 1)).sum())
        p = stats.binomtest(b_only, b_only + c_only, 0.5).pvalue if b_only + c_only > 0 else 1.0
        out = {"rows": len(pairs), "baselineOnly": b_only, "candidateOnly": c_only, "p": p}
    else:
        test = stats.ttest_rel(pairs.loss_c, pairs.loss_b)
        out = {"rows": len(pairs), "meanDiff": float((pairs.loss_c - pairs.loss_b).mean()), "p": float(test.pvalue)}
    print(json.dumps(out))


if __name__ == "__main__":
    main(sys.argv[1], sys.argv[2])

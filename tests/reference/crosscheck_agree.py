#!/usr/bin/python3
"""Cross-checks `fourfold-cli agree --data FILE --json` against Debian's reference libraries.

On random reliability matrices (2-6 coders, 2-8 values, 0-30% missing cells) it compares:
- Krippendorff's alpha, nominal/ordinal/interval/ratio and Jaccard/MASI on label sets, with
  NLTK's AnnotationTask.alpha (nltk.metrics.agreement; Krippendorff 1980) given the matching
  distance function;
- on complete two-coder data: Cohen's kappa with scikit-learn's cohen_kappa_score and with
  statsmodels' cohens_kappa (also its standard errors, Fleiss, Cohen & Everitt 1969), Scott's pi
  with NLTK's pi() and Bennett et al.'s S with NLTK's S(); on ordered values also the linear and
  quadratic weighted kappa (Cohen 1968, `--weights`) with both libraries;
- on complete data for any number of coders: Fleiss' kappa with statsmodels' fleiss_kappa and
  NLTK's pi() (multi-pi equals Fleiss' kappa), and percent agreement with NLTK's avg_Ao().

Documented differences minded here: NLTK returns 1 (or divides by zero) where alpha is undefined
(we print null with a reason), so undefined cases are only checked to be null; NLTK has no ordinal
distance (we build Krippendorff's from the pairable marginals); NLTK's masi_distance rounds its
weights to 0.67/0.33, so MASI uses exact thirds through NLTK's custom-distance hook; NLTK's
jaccard_distance divides by zero on two empty sets, so the empty-set convention d(∅,∅)=0 is
passed the same way. Installs nothing: the packages come from the README's set-up.

usage: crosscheck_agree.py --cli PATH [--matrices N] [--seed S]
"""
import argparse
import csv
import json
import math
import os
import random
import subprocess
import sys
import tempfile

from nltk.metrics.agreement import AnnotationTask
from sklearn.metrics import cohen_kappa_score
from statsmodels.stats.inter_rater import cohens_kappa, fleiss_kappa

TOLERANCE = 1e-9


def run_cli(cli, path, extra):
    out = subprocess.run([cli, "agree", "--data", path, "--json"] + extra,
                         capture_output=True, text=True, check=False)
    if out.returncode != 0:
        raise RuntimeError("fourfold-cli failed: %s" % out.stderr.strip())
    return json.loads(out.stdout)


def write_matrix(path, coders, rows):
    with open(path, "w", newline="", encoding="utf-8") as f:
        w = csv.writer(f)
        w.writerow(["unit"] + coders)
        for i, row in enumerate(rows):
            w.writerow(["u%d" % i] + ["" if v is None else v for v in row])


def triples(coders, rows, convert):
    return [(c, "u%d" % i, convert(v)) for i, row in enumerate(rows)
            for c, v in zip(coders, row) if v is not None]


def pairable_marginals(rows, convert):
    counts = {}
    for row in rows:
        values = [convert(v) for v in row if v is not None]
        if len(values) >= 2:
            for v in values:
                counts[v] = counts.get(v, 0) + 1
    return counts


def ordinal_distance(marginals):
    # Krippendorff (2011), "Computing Krippendorff's Alpha-Reliability", ordinal metric:
    # delta^2(c,k) = (sum_{g=c..k} n_g - (n_c + n_k)/2)^2 over the ranks between c and k.
    ranks = sorted(marginals)

    def distance(a, b):
        lo, hi = sorted((a, b))
        inner = sum(marginals.get(g, 0) for g in ranks if lo <= g <= hi)
        return (inner - (marginals.get(lo, 0) + marginals.get(hi, 0)) / 2.0) ** 2
    return distance


def jaccard(a, b):
    if not a and not b:
        return 0.0
    return 1.0 - len(a & b) / len(a | b)


def masi(a, b):
    # Passonneau (2006) with exact thirds; d(empty, empty) = 0.
    if not a and not b:
        return 0.0
    if a == b:
        m = 1.0
    elif a <= b or b <= a:
        m = 2.0 / 3.0
    elif a & b:
        m = 1.0 / 3.0
    else:
        m = 0.0
    return 1.0 - (len(a & b) / len(a | b)) * m


class Checker:
    def __init__(self):
        self.failures = []
        self.compared = {}

    def close(self, name, ours, reference, context):
        self.compared[name] = self.compared.get(name, 0) + 1
        if ours is None or reference is None or not math.isfinite(reference) \
                or abs(ours - reference) > TOLERANCE:
            self.failures.append("%s: fourfold %r, reference %r (%s)" % (name, ours, reference, context))


def random_rows(rng, units, coders, labels, missing):
    rows = []
    for _ in range(units):
        row = [None if rng.random() < missing else rng.choice(labels) for _ in range(coders)]
        rows.append(row)
    return rows


def main():
    parser = argparse.ArgumentParser()
    parser.add_argument("--cli", required=True)
    parser.add_argument("--matrices", type=int, default=200)
    parser.add_argument("--seed", type=int, default=20261201)
    args = parser.parse_args()
    rng = random.Random(args.seed)
    check = Checker()
    workdir = tempfile.mkdtemp(prefix="fourfold-crosscheck-")
    path = os.path.join(workdir, "m.csv")

    for m in range(args.matrices):
        coders = ["c%d" % i for i in range(rng.randint(2, 6))]
        n_values = rng.randint(2, 8)
        units = rng.randint(5, 40)
        # A third of the matrices are complete, so the kappa family can be compared too.
        missing = 0.0 if m % 3 == 0 else rng.uniform(0.0, 0.3)
        level = ["nominal", "ordinal", "interval", "ratio", "jaccard", "masi"][m % 6]
        context = "matrix %d, %s, %d coders, %d values, missing %.2f" % (m, level, len(coders), n_values, missing)

        if level in ("jaccard", "masi"):
            pool = ["a", "b", "c", "d"][: max(2, min(4, n_values))]
            sets = [frozenset(s for s in pool if rng.random() < 0.5) for _ in range(n_values)]
            rows = random_rows(rng, units, len(coders), sets, missing)
            cells = [[None if v is None else ("|".join(sorted(v)) or "{}") for v in row] for row in rows]
            write_matrix(path, coders, cells)
            ours = run_cli(args.cli, path, ["--distance", level])
            distance = jaccard if level == "jaccard" else masi
            convert = lambda v: v
        else:
            if level == "nominal":
                labels = ["v%d" % i for i in range(n_values)]
                convert = str
            elif level == "ordinal":
                labels = list(range(1, n_values + 1))
                convert = float
            else:
                labels = sorted(rng.sample(range(0, 60), n_values))
                convert = float
            rows = random_rows(rng, units, len(coders), labels, missing)
            write_matrix(path, coders, [[None if v is None else str(v) for v in row] for row in rows])
            ours = run_cli(args.cli, path, ["--level", level])
            if level == "nominal":
                distance = lambda a, b: 0.0 if a == b else 1.0
            elif level == "ordinal":
                distance = ordinal_distance(pairable_marginals(rows, convert))
            elif level == "interval":
                distance = lambda a, b: (a - b) ** 2
            else:
                distance = lambda a, b: 0.0 if a + b == 0 else ((a - b) / (a + b)) ** 2

        data = triples(coders, rows, convert)
        alpha = ours["alpha"]["value"]
        marg = pairable_marginals(rows, convert)
        if len(marg) < 2 or alpha is None:
            # Undefined: only one value among the pairable values (NLTK returns 1 or fails).
            if alpha is not None or "reason" not in ours["alpha"]:
                check.failures.append("alpha should be undefined with a reason (%s)" % context)
            check.compared["alpha undefined"] = check.compared.get("alpha undefined", 0) + 1
        else:
            task = AnnotationTask(data=data, distance=distance)
            try:
                reference = task.alpha()
            except ZeroDivisionError:
                reference = float("nan")
            check.close("alpha " + level, alpha, reference, context)

        complete = all(v is not None for row in rows for v in row)
        if not complete or level in ("jaccard", "masi"):
            continue
        task = AnnotationTask(data=data)
        if len(set(v for row in rows for v in row)) > 1:
            check.close("percent agreement", ours["percent_agreement"], task.avg_Ao(), context)
        categories = sorted(set(convert(v) for row in rows for v in row))
        index = {v: i for i, v in enumerate(categories)}
        if len(categories) > 1:
            counts = [[0] * len(categories) for _ in rows]
            for u, row in enumerate(rows):
                for v in row:
                    counts[u][index[convert(v)]] += 1
            check.close("fleiss kappa", ours["fleiss_kappa"]["value"], fleiss_kappa(counts, method="fleiss"), context)
            check.close("fleiss kappa = multi-pi", ours["fleiss_kappa"]["value"], task.pi(), context)
        if len(coders) == 2 and len(categories) > 1:
            a = [convert(r[0]) for r in rows]
            b = [convert(r[1]) for r in rows]
            kappa = ours["cohen_kappa"]
            if kappa["value"] is None:
                continue  # p_e = 1: undefined, sklearn divides by zero
            check.close("cohen kappa (sklearn)", kappa["value"], cohen_kappa_score(a, b), context)
            table = [[0] * len(categories) for _ in categories]
            for x, y in zip(a, b):
                table[index[x]][index[y]] += 1
            sm = cohens_kappa(table)
            check.close("cohen kappa (statsmodels)", kappa["value"], sm["kappa"], context)
            check.close("cohen kappa SE", kappa["se"], sm["std_kappa"], context)
            check.close("cohen kappa null SE", kappa["se0"], sm["std_kappa0"], context)
            check.close("scott pi", ours["scott_pi"], task.pi(), context)
            check.close("bennett S", ours["bennett_s"], task.S(), context)
            # Weighted kappa (Cohen 1968) on ordered values: the positions of the values in
            # their order, as scikit-learn takes them from the sorted labels and statsmodels
            # from the table's rows.
            if level in ("ordinal", "interval", "ratio"):
                for weights in ("linear", "quadratic"):
                    weighted = run_cli(args.cli, path, ["--level", level, "--weights", weights])
                    wk = weighted["cohen_kappa"]
                    if wk["value"] is None:
                        continue
                    check.close("weighted kappa %s (sklearn)" % weights, wk["value"],
                                cohen_kappa_score(a, b, labels=categories, weights=weights), context)
                    smw = cohens_kappa(table, wt=weights)
                    check.close("weighted kappa %s (statsmodels)" % weights, wk["value"],
                                smw["kappa"], context)
                    check.close("weighted kappa %s SE" % weights, wk["se"], smw["std_kappa"],
                                context)

    # Weighted kappa on complete two-coder matrices of ordered values: numbers (their order is
    # their size) and words given an order with --order (not their alphabetical order).
    words = ["never", "rarely", "sometimes", "often", "always"]
    for m in range(max(1, args.matrices // 4)):
        units = rng.randint(8, 60)
        if m % 2 == 0:
            labels = sorted(rng.sample(range(-20, 40), rng.randint(2, 6)))
            extra = ["--level", "interval"]
            order = labels
        else:
            order = words[: rng.randint(2, 5)]
            labels = order
            extra = ["--level", "ordinal", "--order", ",".join(order)]
        rows = [[rng.choice(labels), rng.choice(labels)] for _ in range(units)]
        if len(set(v for row in rows for v in row)) < 2:
            continue
        write_matrix(path, ["c0", "c1"], rows)
        context = "weighted matrix %d, %s" % (m, " ".join(extra))
        a = [r[0] for r in rows]
        b = [r[1] for r in rows]
        present = [v for v in order if any(v in row for row in rows)]
        position = {v: i for i, v in enumerate(present)}
        table = [[0] * len(present) for _ in present]
        for x, y in zip(a, b):
            table[position[x]][position[y]] += 1
        for weights in ("linear", "quadratic"):
            wk = run_cli(args.cli, path, extra + ["--weights", weights])["cohen_kappa"]
            if wk["value"] is None:
                continue
            check.close("weighted kappa %s (sklearn)" % weights, wk["value"],
                        cohen_kappa_score(a, b, labels=present, weights=weights), context)
            smw = cohens_kappa(table, wt=weights)
            check.close("weighted kappa %s (statsmodels)" % weights, wk["value"], smw["kappa"],
                        context)
            check.close("weighted kappa %s SE" % weights, wk["se"], smw["std_kappa"], context)

    for name in sorted(check.compared):
        print("%-28s %4d comparisons" % (name, check.compared[name]))
    if check.failures:
        print("\n%d differences beyond %g:" % (len(check.failures), TOLERANCE))
        for f in check.failures[:40]:
            print("  " + f)
        return 1
    print("all agree to %g" % TOLERANCE)
    return 0


if __name__ == "__main__":
    sys.exit(main())

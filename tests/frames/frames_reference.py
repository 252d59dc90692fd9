#!/usr/bin/python3
"""Reference figures for the frame kernels' tests, from Debian's python3-scipy and python3-sklearn.

usage: frames_reference.py INPUT.json
INPUT holds {"cases": [{"op": ..., ...}, ...]}; prints {"results": [...]} in the same order.
  linkage     {"data": rows}             -> scipy.cluster.hierarchy.linkage(data, method="ward")
  kmeans      {"data", "centres"}        -> sklearn KMeans(init=centres, n_init=1,
                                            algorithm="lloyd", tol=0): labels, inertia
  silhouette  {"data", "labels"}         -> sklearn.metrics.silhouette_score (euclidean)
  ch          {"data", "labels"}         -> sklearn.metrics.calinski_harabasz_score
  ari         {"a", "b"}                 -> sklearn.metrics.adjusted_rand_score
  chi2        {"table"}                  -> scipy.stats.chi2_contingency(correction=False) and
                                            scipy.stats.contingency.association(method="cramer")
Called with /usr/bin/python3 so that another python3 earlier on PATH cannot hide the packages.
"""
import json
import sys

import numpy as np
from scipy.cluster.hierarchy import linkage
from scipy.stats import chi2_contingency
from scipy.stats.contingency import association
from sklearn.cluster import KMeans
from sklearn.metrics import adjusted_rand_score, calinski_harabasz_score, silhouette_score


def run(case):
    op = case["op"]
    if op == "linkage":
        z = linkage(np.array(case["data"], dtype=float), method="ward")
        return [[int(r[0]), int(r[1]), float(r[2]), int(r[3])] for r in z]
    if op == "kmeans":
        centres = np.array(case["centres"], dtype=float)
        km = KMeans(n_clusters=len(centres), init=centres, n_init=1, algorithm="lloyd", tol=0,
                    max_iter=300)
        km.fit(np.array(case["data"], dtype=float))
        return {"labels": [int(v) for v in km.labels_], "inertia": float(km.inertia_)}
    if op == "silhouette":
        return float(silhouette_score(np.array(case["data"], dtype=float), case["labels"]))
    if op == "ch":
        return float(calinski_harabasz_score(np.array(case["data"], dtype=float), case["labels"]))
    if op == "ari":
        return float(adjusted_rand_score(case["a"], case["b"]))
    if op == "chi2":
        table = np.array(case["table"])
        stat, p, dof, _ = chi2_contingency(table, correction=False)
        v = association(table, method="cramer", correction=False)
        return {"statistic": float(stat), "p": float(p), "dof": int(dof), "v": float(v)}
    raise ValueError("unknown op " + op)


def main():
    with open(sys.argv[1], encoding="utf-8") as f:
        cases = json.load(f)["cases"]
    json.dump({"results": [run(c) for c in cases]}, sys.stdout)


if __name__ == "__main__":
    main()

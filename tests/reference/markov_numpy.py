"""Reference values for shared/markov/numpyReference.test.ts, computed with NumPy (Debian python3-numpy).

Reads {"cases": [{"rows": [[...]], "x0": [...], "steps": [...], "kind": "ergodic" | "absorbing",
"absorbing": [...], "transient": [...]}]} on stdin and writes one result per case. Methods are
deliberately different from the TypeScript ones where possible: stationary distribution from the
eigenvector of P^T for the eigenvalue nearest 1; mean first passage times by solving, for each
target j, m_ij = 1 + sum_{k != j} p_ik m_kj; projections by numpy.linalg.matrix_power.
"""
import json
import sys

import numpy as np


def ergodic(p):
    k = p.shape[0]
    values, vectors = np.linalg.eig(p.T)
    v = np.real(vectors[:, np.argmin(np.abs(values - 1))])
    pi = v / v.sum()
    mfp = np.zeros((k, k))
    for j in range(k):
        others = [i for i in range(k) if i != j]
        q = p[np.ix_(others, others)]
        m = np.linalg.solve(np.eye(k - 1) - q, np.ones(k - 1))
        mfp[others, j] = m
    return {"stationary": pi.tolist(), "meanFirstPassage": mfp.tolist()}


def absorbing(p, transient, absorbing_states):
    q = p[np.ix_(transient, transient)]
    r = p[np.ix_(transient, absorbing_states)]
    n = np.linalg.inv(np.eye(len(transient)) - q)
    return {"fundamental": n.tolist(), "expectedSteps": (n @ np.ones(len(transient))).tolist(), "probabilities": (n @ r).tolist()}


out = []
for case in json.load(sys.stdin)["cases"]:
    p = np.array(case["rows"], dtype=float)
    moduli = sorted(np.abs(np.linalg.eigvals(p)), reverse=True)
    result = {
        "moduli": [float(v) for v in moduli],
        "projection": [(np.array(case["x0"]) @ np.linalg.matrix_power(p, t)).tolist() for t in case["steps"]],
    }
    if case["kind"] == "ergodic":
        result.update(ergodic(p))
    else:
        result.update(absorbing(p, case["transient"], case["absorbing"]))
    out.append(result)
json.dump(out, sys.stdout)

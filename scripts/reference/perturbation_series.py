#!/usr/bin/env python3
"""Reference vectors for the engine's perturbation series (server/src/physics/engine/perturbationSeries.ts).

Run from the repository root:  python3 scripts/reference/perturbation_series.py
Writes tests/reference/perturbation_series.json, read by tests/physics/engine.perturbationSeries.test.ts.

Independent of the TypeScript code: H(t) = D + t U^T diag(z) U with D, z random and U a random
orthogonal matrix (numpy, fixed seed). The Rayleigh-Schroedinger coefficients of every eigenvalue
come from the plain textbook recursion in intermediate normalisation, in 50-digit arithmetic
(mpmath), with the states carried to the full order (no 2n+1 rule); the exact eigenvalues at a few
offsets t from numpy.linalg.eigvalsh.
"""
import json
import os

import mpmath as mp
import numpy as np

mp.mp.dps = 50
ORDER = 16


def rs_coefficients(d, zp):
    """c[k][j], j = 0..ORDER, of each eigenvalue of diag(d) + t zp (textbook recursion)."""
    n = len(d)
    out = []
    for k in range(n):
        psi = [[mp.mpf(1) if l == k else mp.mpf(0) for l in range(n)]]
        c = [mp.mpf(d[k])]
        for j in range(1, ORDER + 1):
            zpsi = [mp.fsum(zp[l][i] * psi[j - 1][i] for i in range(n)) for l in range(n)]
            c.append(zpsi[k])
            nxt = []
            for l in range(n):
                if l == k:
                    nxt.append(mp.mpf(0))
                    continue
                s = -zpsi[l] + mp.fsum(c[i] * psi[j - i][l] for i in range(1, j))
                nxt.append(s / (d[l] - d[k]))
            psi.append(nxt)
        out.append(c)
    return out


def case(rng, n, gap):
    d = np.sort(rng.normal(size=n)) * gap
    # keep every gap at least a tenth of the typical one
    for k in range(1, n):
        d[k] = max(d[k], d[k - 1] + 0.1 * gap)
    u, _ = np.linalg.qr(rng.normal(size=(n, n)))
    z = rng.normal(size=n)
    zp_np = u.T @ np.diag(z) @ u
    dm = [mp.mpf(float(x)) for x in d]
    um = [[mp.mpf(float(u[i, j])) for j in range(n)] for i in range(n)]
    zm = [mp.mpf(float(x)) for x in z]
    zp = [[mp.fsum(um[i][k] * zm[i] * um[i][l] for i in range(n)) for l in range(n)] for k in range(n)]
    coef = rs_coefficients(dm, zp)
    radius = 0.01 * gap / np.max(np.abs(zp_np - np.diag(np.diag(zp_np))))
    offsets = [-radius, -0.3 * radius, 0.2 * radius, radius]
    exact = [np.linalg.eigvalsh(np.diag(d) + t * zp_np).tolist() for t in offsets]
    return {
        "values": d.tolist(),
        "vectors": u.reshape(-1).tolist(),
        "zeeman": z.tolist(),
        "coefficients": [[float(x) for x in c] for c in coef],
        "offsets": offsets,
        "exact": exact,
    }


def main():
    rng = np.random.default_rng(20261202)
    cases = [case(rng, n, gap) for n, gap in [(3, 1.0), (6, 1e8), (9, 2.5e6), (16, 1.0)]]
    out = {"order": ORDER, "cases": cases}
    path = os.path.join("tests", "reference", "perturbation_series.json")
    with open(path, "w") as f:
        json.dump(out, f, indent=1)
        f.write("\n")
    print(f"wrote {path}")


if __name__ == "__main__":
    main()

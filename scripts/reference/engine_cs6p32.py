#!/usr/bin/env python3
"""Reference vectors for the Zeeman engine: Cs 6P3/2 (J = 3/2, I = 7/2, 32 states).

Run from the repository root:  python3 scripts/reference/engine_cs6p32.py
Writes tests/reference/engine_cs6p32.json, read by tests/physics/engine.reference.test.ts.

Independent of the TypeScript code: the 32 x 32 Hamiltonian is built from
Kronecker products of spin matrices, diagonalised with numpy.linalg.eigh
(energies, eigenvectors, Hellmann-Feynman slopes), and the second field
derivative comes from central differences of block eigenvalues computed with
mpmath.eigsy at 50 significant digits (no perturbation formula involved).

Level data (alkali D-line data compilation for 133Cs, 6P3/2): A = 50.28827 MHz,
B = -0.4934 MHz, g_J = 1.3340; g_I = -0.00039885395 (same compilation, nuclear
g-factor in Bohr magnetons with the Zeeman term +mu_B B g_I I_z).
mu_B/h from scipy.constants (CODATA 2022).
"""
import json
import os

import mpmath
import numpy as np
import scipy
import scipy.constants as sc
from scipy.optimize import brentq

TWO_J, TWO_I = 3, 7
A_HZ, B_HZ = 50.28827e6, -0.4934e6
G_J, G_I = 1.3340, -0.00039885395
MU_B_HZ_PER_T = sc.physical_constants["Bohr magneton"][0] / sc.h
FIELDS_T = [0.0, 1e-4, 2e-3, 0.01, 0.037, 0.1, 0.25, 0.5, 1.0]
CURVATURE_FIELDS_T = [0.0, 2e-3, 0.1, 1.0]
CROSSING_SCAN = (0.0, 1.0, 20001)  # from, to (tesla), points


def spin_matrices(two_j):
    """Jz, J+ for spin j = two_j/2 in the basis m = j, j-1, ..., -j."""
    j = two_j / 2
    ms = np.array([j - k for k in range(two_j + 1)])
    jz = np.diag(ms)
    jp = np.zeros((two_j + 1, two_j + 1))
    for k in range(1, two_j + 1):  # <m+1| J+ |m>, m = ms[k]
        m = ms[k]
        jp[k - 1, k] = np.sqrt(j * (j + 1) - m * (m + 1))
    return ms, jz, jp


def hamiltonian_parts():
    mj, jz, jp = spin_matrices(TWO_J)
    mi, iz, ip = spin_matrices(TWO_I)
    one_j, one_i = np.eye(TWO_J + 1), np.eye(TWO_I + 1)
    x = np.kron(jz, iz) + 0.5 * (np.kron(jp, ip.T) + np.kron(jp.T, ip))  # I.J
    i_, j_ = TWO_I / 2, TWO_J / 2
    ii, jj = i_ * (i_ + 1), j_ * (j_ + 1)
    quad = (3 * x @ x + 1.5 * x - ii * jj * np.eye(len(x))) / (2 * i_ * (2 * i_ - 1) * j_ * (2 * j_ - 1))
    h0 = A_HZ * x + B_HZ * quad
    z = MU_B_HZ_PER_T * (G_J * np.kron(jz, one_i) + G_I * np.kron(one_j, iz))
    two_mj = np.repeat(np.round(2 * mj).astype(int), TWO_I + 1)
    two_mi = np.tile(np.round(2 * mi).astype(int), TWO_J + 1)
    return h0, z, two_mj, two_mi


def find_crossings(h0, zdiag, two_m):
    """Crossings between levels of different m blocks: sign changes of E_a - E_b on a
    fine grid (block eigenvalues from numpy.linalg.eigvalsh), refined with scipy brentq."""
    blocks = {m: np.where(two_m == m)[0] for m in sorted(set(two_m.tolist()))}

    def block_eigs(m, b):
        idx = blocks[m]
        return np.linalg.eigvalsh(h0[np.ix_(idx, idx)] + b * np.diag(zdiag[idx]))

    grid = np.linspace(*CROSSING_SCAN)
    tables = {m: np.array([block_eigs(m, b) for b in grid]) for m in blocks}
    levels = [(m, r) for m in blocks for r in range(len(blocks[m]))]
    scale = max(np.abs(t).max() for t in tables.values())
    found = []
    for i, (ma, ra) in enumerate(levels):
        for mb, rb in levels[i + 1 :]:
            if ma == mb:
                continue
            d = tables[ma][:, ra] - tables[mb][:, rb]
            sign = np.where(np.abs(d) <= 1e-10 * scale, 0, np.sign(d))
            nz = np.nonzero(sign)[0]
            for k0, k1 in zip(nz[:-1], nz[1:]):
                if sign[k0] != sign[k1]:
                    f = lambda b: block_eigs(ma, b)[ra] - block_eigs(mb, b)[rb]
                    root = brentq(f, grid[k0], grid[k1], xtol=1e-16, rtol=1e-15)
                    found.append({"twoMA": int(ma), "rankA": ra, "twoMB": int(mb), "rankB": rb, "fieldT": root})
    return sorted(found, key=lambda c: c["fieldT"])


def main():
    h0, z, two_mj, two_mi = hamiltonian_parts()
    two_m = two_mj + two_mi
    zdiag = np.diag(z)
    results = []
    for b in FIELDS_T:
        w, v = np.linalg.eigh(h0 + b * z)
        states = []
        for k in range(len(w)):
            vec = v[:, k]
            support = np.abs(vec) > 1e-12
            ms = set(two_m[support].tolist())
            single_block = len(ms) == 1
            entry = {
                "energyHz": float(w[k]),
                "slopeHzPerT": float(vec @ (zdiag * vec)),
                "twoM": int(ms.pop()) if single_block else None,
            }
            if single_block and b != 0.0:
                entry["vector"] = [
                    {"twoMJ": int(two_mj[i]), "twoMI": int(two_mi[i]), "c": float(vec[i])}
                    for i in range(len(vec))
                    if support[i]
                ]
            states.append(entry)
        results.append({"fieldT": b, "states": states})

    # Curvature per block and rank from mpmath central differences.
    mpmath.mp.dps = 50
    step = mpmath.mpf("1e-12")
    curvature = []
    for b in CURVATURE_FIELDS_T:
        for m in sorted(set(two_m.tolist())):
            idx = np.where(two_m == m)[0]
            hb = mpmath.matrix(h0[np.ix_(idx, idx)].tolist())
            zb = [mpmath.mpf(float(zdiag[i])) for i in idx]

            def eig_at(field):
                mat = hb.copy()
                for r in range(len(idx)):
                    mat[r, r] += field * zb[r]
                e, _ = mpmath.eigsy(mat)
                return sorted(e[r] for r in range(len(idx)))

            bb = mpmath.mpf(b)
            lo, mid, hi = eig_at(bb - step), eig_at(bb), eig_at(bb + step)
            for rank in range(len(idx)):
                d2 = (hi[rank] - 2 * mid[rank] + lo[rank]) / step**2
                curvature.append(
                    {"fieldT": b, "twoM": int(m), "rank": rank, "energyHz": float(mid[rank]), "d2EdB2": float(d2)}
                )

    crossings = find_crossings(h0, zdiag, two_m)

    out = {
        "generator": "scripts/reference/engine_cs6p32.py",
        "libraries": {"numpy": np.__version__, "scipy": scipy.__version__, "mpmath": mpmath.__version__},
        "method": "numpy.linalg.eigh of the full 32x32 Kronecker-product Hamiltonian; curvature by mpmath.eigsy central differences (50 digits, step 1e-12 T) per m block",
        "level": {
            "twoJ": TWO_J,
            "twoI": TWO_I,
            "A": A_HZ,
            "B": B_HZ,
            "gJ": G_J,
            "gI": G_I,
            "source": "alkali D-line data compilation, 133Cs 6P3/2",
        },
        "muBOverHHzPerT": MU_B_HZ_PER_T,
        "results": results,
        "curvature": curvature,
        "crossingScan": {"fromT": CROSSING_SCAN[0], "toT": CROSSING_SCAN[1], "points": CROSSING_SCAN[2]},
        "crossings": crossings,
    }
    path = os.path.join("tests", "reference", "engine_cs6p32.json")
    with open(path, "w", encoding="utf-8") as f:
        json.dump(out, f, indent=1)
        f.write("\n")
    print(f"wrote {path}: {len(results)} fields, {len(curvature)} curvature values, {len(crossings)} crossings")


if __name__ == "__main__":
    main()

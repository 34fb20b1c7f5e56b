#!/usr/bin/env python3
"""Reference vectors for the whole-term engine: 7Li 2P and 87Rb 5P with their nuclei.

Run from the repository root:  python3 scripts/reference/engine_whole_term.py
Writes tests/reference/engine_whole_term.json, read by tests/physics/engine.wholeTerm.test.ts.

Independent of the TypeScript code: the full (2L+1)(2S+1)(2I+1) Hamiltonian is built in the
fully uncoupled basis from Kronecker products of Cartesian spin matrices (no m blocks), the
fine structure from Clebsch-Gordan projectors (sympy), the spin-dipolar part as the Cartesian
contraction sum_ij S_i I_j T_ij with T_ij = -3/((2L-1)(2L+3)) (L_i L_j + L_j L_i - 2/3 L(L+1) d_ij),
the radial parameters from the J-level A constants by numpy.linalg.lstsq on projections of those
operators onto the stretched states (assumption a_L = a_SD, as the engine states), and the
energies from numpy.linalg.eigvalsh of the whole matrix.

Level data as in the built-in table: 7Li J-level energies from its 2P fine structure (the
difference of its D2 and D1 lines), 87Rb from the D-line frequencies (alkali D-line data
compilation); A_J, B_3/2, g_I.
g_L = 1, g_S = |g_e| and mu_B/h from scipy.constants (CODATA 2022).
"""
import json
import os

import numpy as np
import scipy
import scipy.constants as sc
import sympy
from sympy.physics.quantum.cg import CG

MU_B_HZ_PER_T = sc.physical_constants["Bohr magneton"][0] / sc.h
G_S = -sc.physical_constants["electron g factor"][0]
G_L = 1.0
FIELDS_T = [0.0, 0.01, 0.03, 0.1, 0.3, 1.0]

CASES = {
    "Li7_2P": {
        "twoI": 3, "gI": -0.0011822136,
        # 2P3/2 - 2P1/2: the built-in 7Li D2 - D1, i.e. the 2P fine structure 10 053.154 MHz
        # (2009 critical review of the lithium data, abstract; docs/species-data.md, "Lithium D lines").
        "energies": {1: 0.0, 3: 10053.154e6},
        "A": {1: 91.873e6 / 2, 3: -3.055e6}, "B": {3: -0.221e6},
    },
    "Rb87_5P": {
        "twoI": 3, "gI": -0.0009951414,
        "energies": {1: 0.0, 3: (384.2304844685 - 377.10746338) * 1e12},
        "A": {1: 408.328e6, 3: 84.7185e6}, "B": {3: 12.4965e6},
    },
}
TWO_L, TWO_S = 2, 1


def cartesian(two_j):
    """Jx, Jy, Jz (complex) for j = two_j/2 in the basis m = j ... -j."""
    j = two_j / 2
    ms = np.array([j - k for k in range(two_j + 1)])
    jp = np.zeros((two_j + 1, two_j + 1))
    for k in range(1, two_j + 1):
        m = ms[k]
        jp[k - 1, k] = np.sqrt(j * (j + 1) - m * (m + 1))
    jm = jp.T
    return [(jp + jm) / 2, (jp - jm) / 2j, np.diag(ms).astype(complex)], ms


def operators(two_i):
    (l, ml), (s, ms), (i, mi) = cartesian(TWO_L), cartesian(TWO_S), cartesian(two_i)
    el, es, ei = np.eye(TWO_L + 1), np.eye(TWO_S + 1), np.eye(two_i + 1)
    L = [np.kron(np.kron(x, es), ei) for x in l]
    S = [np.kron(np.kron(el, x), ei) for x in s]
    I = [np.kron(np.kron(el, es), x) for x in i]
    labels = [(a, b, c) for a in ml for b in ms for c in mi]
    return L, S, I, labels


def dot(a, b):
    return sum(x @ y for x, y in zip(a, b))


def fine_projector(two_j, two_i, labels):
    """P_J = sum_mJ |J mJ><J mJ| (x) 1_I from Clebsch-Gordan coefficients."""
    n = len(labels)
    p = np.zeros((n, n))
    lq, sq, jq = sympy.Rational(TWO_L, 2), sympy.Rational(TWO_S, 2), sympy.Rational(two_j, 2)
    for mj2 in range(-two_j, two_j + 1, 2):
        mj = sympy.Rational(mj2, 2)
        for mi2 in range(-two_i, two_i + 1, 2):
            v = np.zeros(n)
            for k, (a, b, c) in enumerate(labels):
                if abs(c - mi2 / 2) < 1e-9 and abs(a + b - mj2 / 2) < 1e-9:
                    v[k] = float(CG(lq, sympy.Rational(round(2 * a), 2), sq, sympy.Rational(round(2 * b), 2), jq, mj).doit())
            p += np.outer(v, v)
    return p


def hamiltonian(case):
    """H0 and Z = dH/dB (Hz, Hz/T) in the uncoupled basis, with the basis labels (m_L, m_S, m_I)."""
    two_i = case["twoI"]
    L, S, I, labels = operators(two_i)
    ll = (TWO_L / 2) * (TWO_L / 2 + 1)
    ii = (two_i / 2) * (two_i / 2 + 1)
    lq = TWO_L / 2
    iq = two_i / 2
    cT = -3 / ((2 * lq - 1) * (2 * lq + 3))
    D = sum(S[a] @ I[b] @ (cT * (L[a] @ L[b] + L[b] @ L[a] - (2 / 3) * ll * (a == b) * np.eye(len(labels))))
            for a in range(3) for b in range(3))
    LI = dot(L, I)
    Q = (3 * LI @ LI + 1.5 * LI - ll * ii * np.eye(len(labels))) / (2 * iq * (2 * iq - 1) * lq * (2 * lq - 1))
    ops = {"orbital": LI, "contact": dot(S, I), "spinDipolar": D, "quadrupole": Q}
    proj = {tj: fine_projector(tj, two_i, labels) for tj in case["energies"]}
    # Stretched state |J, J>|I, I>: the m_J = J, m_I = I column space of P_J.
    coeffs = {}
    for tj, p in proj.items():
        mask = np.array([abs(c - iq) < 1e-9 and abs(a + b - tj / 2) < 1e-9 for a, b, c in labels])
        w, v = np.linalg.eigh(p[np.ix_(mask, mask)])
        vec = np.zeros(len(labels), dtype=complex)
        vec[mask] = v[:, -1]
        ji = (tj / 2) * iq
        coeffs[tj] = {k: float(np.real(vec.conj() @ op @ vec)) / ji for k, op in ops.items()}
        jq = tj / 2
        if jq >= 1:
            K = 2 * iq * jq
            coeffs[tj]["quadrupole"] = float(np.real(vec.conj() @ Q @ vec)) / (
                (0.75 * K * (K + 1) - ii * jq * (jq + 1)) / (2 * iq * (2 * iq - 1) * jq * (2 * jq - 1)))
    rows = [[coeffs[tj]["orbital"] + coeffs[tj]["spinDipolar"], coeffs[tj]["contact"]] for tj in case["A"]]
    a, ac = np.linalg.lstsq(np.array(rows), np.array(list(case["A"].values())), rcond=None)[0]
    bl = case["B"][3] / coeffs[3]["quadrupole"]
    h0 = sum(e * proj[tj] for tj, e in case["energies"].items()) + a * (ops["orbital"] + ops["spinDipolar"]) + ac * ops["contact"] + bl * Q
    z = MU_B_HZ_PER_T * (G_L * L[2] + G_S * S[2] + case["gI"] * I[2])
    return h0, z, labels, {"a": a, "ac": ac, "bl": bl}, coeffs


def build(case):
    h0, z, labels, r, coeffs = hamiltonian(case)
    a, ac, bl = r["a"], r["ac"], r["bl"]
    out = {"radial": {"orbital": a, "spinDipolar": a, "contact": ac, "quadrupole": bl},
           "coefficients": {str(tj): c for tj, c in coeffs.items()}, "fields_T": FIELDS_T, "energies_Hz": []}
    for b in FIELDS_T:
        h = h0 + b * z
        assert np.max(np.abs(h - h.conj().T)) < 1e-6
        out["energies_Hz"].append(np.linalg.eigvalsh(h).tolist())
    return out


def main():
    data = {
        "generator": "scripts/reference/engine_whole_term.py",
        "numpy": np.__version__, "scipy": scipy.__version__, "sympy": sympy.__version__,
        "g_L": G_L, "g_S": G_S, "mu_B_Hz_per_T": MU_B_HZ_PER_T,
        "cases": {name: {**{k: v for k, v in c.items() if k not in ("energies", "A", "B")},
                         "energies": {str(k): v for k, v in c["energies"].items()},
                         "A": {str(k): v for k, v in c["A"].items()}, "B": {str(k): v for k, v in c["B"].items()},
                         **build(c)} for name, c in CASES.items()},
    }
    path = os.path.join("tests", "reference", "engine_whole_term.json")
    with open(path, "w") as f:
        json.dump(data, f, indent=1)
    print("wrote", path)


if __name__ == "__main__":
    main()

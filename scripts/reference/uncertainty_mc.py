#!/usr/bin/env python3
"""Monte Carlo propagation (JCGM 101 style) of a nonlinear case, for the GUM propagation checks.

Run from the repository root:  python3 scripts/reference/uncertainty_mc.py
Writes tests/reference/uncertainty_mc.json, read by tests/eval/uncertaintyReference.test.ts.

Case: the field at which the m_F = 0 -> 0 microwave line of a J = 1/2, I = 3/2 ground level
(87Rb-like constants, written in the test's setup file) is resonant with a source frequency f,
just above the line's field-insensitive point at B = 0. Independent of the TypeScript engine:
the closed Breit-Rabi form for m = 0 (textbook), f = dE sqrt(1 + x^2) with dE = 2A and
x = (g_J - g_I) mu_B B / dE, inverted for B. Inputs A ~ N(A0, uA) and f ~ N(f0, uf)
(independent Gaussians, seeded); the output's standard deviation is compared with the GUM value.
The MC's own standard uncertainty of that standard deviation is s / sqrt(2 (N - 1)).
mu_B/h from scipy.constants (CODATA 2022).
"""
import json
import os

import numpy as np
import scipy
import scipy.constants as sc

SEED = 20261202
N = 400_000
MU_B_HZ_PER_T = sc.physical_constants["Bohr magneton"][0] / sc.h
G_J = 2.00233113
G_I = -0.0009951414
CASES = [
    # name, A (Hz), u(A) (Hz), f (Hz), u(f) (Hz)
    ("half_gauss", 3417341305.452, 1.0, 6834682754.0, 2.0),
    ("near_insensitive", 3417341305.452, 0.5, 6834682620.0, 1.5),
]


def resonance_field(a_hz, f_hz):
    de = 2.0 * a_hz  # (I + 1/2) A for I = 3/2
    return de / ((G_J - G_I) * MU_B_HZ_PER_T) * np.sqrt((f_hz / de) ** 2 - 1.0)


def main():
    rng = np.random.default_rng(SEED)
    out = []
    for name, a0, ua, f0, uf in CASES:
        a = rng.normal(a0, ua, N)
        f = rng.normal(f0, uf, N)
        b = resonance_field(a, f)
        ok = np.isfinite(b)
        b = b[ok]
        s = float(np.std(b, ddof=1))
        out.append({
            "name": name,
            "A_Hz": a0, "u_A_Hz": ua, "f_Hz": f0, "u_f_Hz": uf,
            "field_T": float(resonance_field(a0, f0)),
            "mc_mean_T": float(np.mean(b)),
            "mc_std_T": s,
            "mc_std_uncertainty_T": s / np.sqrt(2.0 * (len(b) - 1)),
            "samples": int(len(b)),
        })
    doc = {
        "generator": "scripts/reference/uncertainty_mc.py",
        "numpy": np.__version__,
        "scipy": scipy.__version__,
        "seed": SEED,
        "g_J": G_J, "g_I": G_I,
        "cases": out,
    }
    path = os.path.join("tests", "reference", "uncertainty_mc.json")
    with open(path, "w", encoding="utf-8") as fh:
        json.dump(doc, fh, indent=2)
        fh.write("\n")


if __name__ == "__main__":
    main()

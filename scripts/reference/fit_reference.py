#!/usr/bin/env python3
"""Reference fits of hyperfine resonance data with SciPy, for tests/physics/fitReference.test.ts.

Writes tests/reference/fit_reference.json. The model is the Breit-Rabi formula for a J = 1/2
level (closed form, independent of the TypeScript engine, which diagonalises the Hamiltonian):

  E(F = I +- 1/2, m) = -dE/(2(2I+1)) + g_I mu_B B m +- (dE/2) sqrt(1 + 4 m x/(2I+1) + x^2),
  dE = A (I + 1/2),  x = (g_J - g_I) mu_B B / dE,   H = A I.J + mu_B B (g_J J_z + g_I I_z).

The level constants are those of a 87Rb-like ground level (I = 3/2); the "measurements" are
invented: generated from chosen parameters plus seeded Gaussian noise.

Cases:
  * calibration: one resonance of the pair (F=1, m=-1) <-> (F=2, m=+1) slightly above its
    field-insensitive minimum: every root in 0..1 mT (brentq), u(B) = u(f)/|df/dB|;
  * gj_a: g_J and A from eight resonances at known fields (curve_fit, absolute_sigma=True);
  * field_a: one unknown field and A from four resonances taken at that field (curve_fit).

Run from the repository root:  python3 scripts/reference/fit_reference.py
"""
import json
import math
import os

import numpy as np
import scipy
from scipy.optimize import brentq, curve_fit, minimize_scalar

MU_B_HZ_PER_T = 13996244917.1  # CODATA 2022 mu_B/h
TWO_I = 3
I = TWO_I / 2
A_HZ = 3417.341305452145e6
G_J = 2.00233113
G_I = -0.0009951414


def energy(two_f, two_m, b, a=A_HZ, gj=G_J, gi=G_I):
    de = a * (I + 0.5)
    m = two_m / 2
    x = (gj - gi) * MU_B_HZ_PER_T * b / de
    sign = 1 if two_f == TWO_I + 1 else -1
    return -de / (2 * (2 * I + 1)) + gi * MU_B_HZ_PER_T * b * m + sign * de / 2 * math.sqrt(1 + 4 * m * x / (2 * I + 1) + x * x)


def interval(lower, upper, b, a=A_HZ, gj=G_J):
    return abs(energy(*upper, b, a, gj) - energy(*lower, b, a, gj))


def calibration():
    lower, upper = (2, -2), (4, 2)
    f = lambda b: interval(lower, upper, b)
    best = minimize_scalar(f, bounds=(0, 1e-3), method="bounded", options={"xatol": 1e-14})
    f_meas = round(best.fun + 500.0, 1)
    u_f = 5.0
    roots = [brentq(lambda b: f(b) - f_meas, 0, best.x, xtol=1e-16), brentq(lambda b: f(b) - f_meas, best.x, 1e-3, xtol=1e-16)]
    out = []
    for b in roots:
        h = 1e-9
        slope = (f(b + h) - f(b - h)) / (2 * h)
        out.append({"field_T": b, "uncertainty_T": u_f / abs(slope), "dfdB_Hz_per_T": slope})
    return {"lower": lower, "upper": upper, "frequency_Hz": f_meas, "uncertainty_Hz": u_f, "range_T": [0, 1e-3], "roots": out}


def gj_a(rng):
    pairs = [((2, 0), (4, 0)), ((2, 2), (4, 2)), ((2, -2), (4, -2)), ((2, 0), (4, 2))]
    fields = [0.5e-3, 20e-3, 60e-3, 150e-3]
    points = [(lo, up, b) for b in fields for (lo, up) in pairs[:2]]
    sigma = 300.0
    y = [interval(lo, up, b) + rng.normal(0, sigma) for (lo, up, b) in points]

    def model(idx, gj, a_mhz):
        return np.array([interval(points[int(i)][0], points[int(i)][1], points[int(i)][2], a_mhz * 1e6, gj) for i in idx])

    idx = np.arange(len(points), dtype=float)
    popt, pcov = curve_fit(model, idx, y, p0=[2.0, 3417.0], sigma=np.full(len(y), sigma), absolute_sigma=True, epsfcn=1e-14, xtol=1e-15, ftol=1e-15, gtol=1e-15)
    chi2 = float(np.sum(((np.array(y) - model(idx, *popt)) / sigma) ** 2))
    # A in MHz inside the fit for conditioning; reported in Hz.
    s = np.array([1.0, 1e6])
    return {
        "points": [{"lower": lo, "upper": up, "field_T": b, "frequency_Hz": f, "sigma_Hz": sigma} for (lo, up, b), f in zip(points, y)],
        "free": ["g_J", "A"],
        "start": [2.0, 3417.0e6],
        "params": list(popt * s),
        "errors": list(np.sqrt(np.diag(pcov)) * s),
        "covariance": (pcov * np.outer(s, s)).tolist(),
        "chi2": chi2,
    }


def field_a(rng):
    b_true = 7.3e-3
    pairs = [((2, 0), (4, 0)), ((2, 2), (4, 2)), ((2, -2), (4, -2)), ((2, 0), (4, 2))]
    sigma = 50.0
    y = [interval(lo, up, b_true) + rng.normal(0, sigma) for (lo, up) in pairs]

    def model(idx, b_mt, a_mhz):
        return np.array([interval(pairs[int(i)][0], pairs[int(i)][1], b_mt * 1e-3, a_mhz * 1e6) for i in idx])

    idx = np.arange(len(pairs), dtype=float)
    popt, pcov = curve_fit(model, idx, y, p0=[5.0, 3417.0], sigma=np.full(len(y), sigma), absolute_sigma=True, xtol=1e-15, ftol=1e-15, gtol=1e-15)
    chi2 = float(np.sum(((np.array(y) - model(idx, *popt)) / sigma) ** 2))
    s = np.array([1e-3, 1e6])
    return {
        "points": [{"lower": lo, "upper": up, "field_T": None, "frequency_Hz": f, "sigma_Hz": sigma} for (lo, up), f in zip(pairs, y)],
        "free": ["field", "A"],
        "start": [5e-3, 3417.0e6],
        "params": list(popt * s),
        "errors": list(np.sqrt(np.diag(pcov)) * s),
        "covariance": (pcov * np.outer(s, s)).tolist(),
        "chi2": chi2,
    }


def main():
    rng = np.random.default_rng(20261202)
    out = {
        "generator": "scripts/reference/fit_reference.py",
        "numpy": np.__version__,
        "scipy": scipy.__version__,
        "level": {"twoJ": 1, "twoI": TWO_I, "A_Hz": A_HZ, "gJ": G_J, "gI": G_I, "muB_Hz_per_T": MU_B_HZ_PER_T},
        "calibration": calibration(),
        "gj_a": gj_a(rng),
        "field_a": field_a(rng),
    }
    path = os.path.join("tests", "reference", "fit_reference.json")
    with open(path, "w") as fh:
        json.dump(out, fh, indent=1)
        fh.write("\n")
    print("wrote", path)


if __name__ == "__main__":
    main()

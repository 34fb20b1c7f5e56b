#!/usr/bin/env python3
"""Reference fits for tests/physics/fitRoundOffStop.test.ts: one field and A from three resonances.

Twelve invented data sets: the three pairs (F=1, m) -> (F=2, m), m = -1, 0, +1, of an 87Rb-like
ground level at 3.1 G (A = 3417.3413054 MHz), each value plus seeded Gaussian noise of 20 Hz
(numpy default_rng(seed), seeds 1..12), rounded to 1 mHz as a data file would hold them. Each set is
fitted with scipy.optimize.curve_fit (absolute_sigma=True) on the closed-form Breit-Rabi model of
fit_reference.py. Writes tests/reference/fit_noise_seeds.json.

Run from the repository root:  python3 scripts/reference/fit_noise_seeds.py
"""
import json
import os
import sys

import numpy as np
from scipy.optimize import curve_fit

sys.path.insert(0, os.path.dirname(os.path.abspath(__file__)))
from fit_reference import interval  # noqa: E402

B_TRUE = 3.1e-4
A_TRUE = 3.4173413054e9
SIGMA = 20.0
TWO_M = (-2, 0, 2)


def freq(two_m, b, a):
    return interval((2, two_m), (4, two_m), b, a)


def one(seed):
    rng = np.random.default_rng(seed)
    y = [round((freq(tm, B_TRUE, A_TRUE) + rng.normal(0, SIGMA)) / 1e3, 6) * 1e3 for tm in TWO_M]

    def model(idx, b_gauss, a_mhz):
        return np.array([freq(TWO_M[int(i)], b_gauss * 1e-4, a_mhz * 1e6) for i in idx])

    idx = np.arange(3, dtype=float)
    p, c = curve_fit(model, idx, y, p0=[2.0, 3417.0], sigma=np.full(3, SIGMA), absolute_sigma=True, xtol=1e-15, ftol=1e-15, gtol=1e-15, maxfev=10000)
    res = np.array(y) - model(idx, *p)
    return {"seed": seed, "frequency_kHz": [round(v / 1e3, 6) for v in y], "field_G": p[0], "A_MHz": p[1], "u_field_G": float(np.sqrt(c[0, 0])), "u_A_MHz": float(np.sqrt(c[1, 1])), "chi2": float(np.sum((res / SIGMA) ** 2))}


def main():
    out = {"source": "scripts/reference/fit_noise_seeds.py (scipy curve_fit, closed-form Breit-Rabi)", "sigma_Hz": SIGMA, "sets": [one(s) for s in range(1, 13)]}
    path = os.path.join("tests", "reference", "fit_noise_seeds.json")
    with open(path, "w") as fh:
        json.dump(out, fh, indent=1)


if __name__ == "__main__":
    main()

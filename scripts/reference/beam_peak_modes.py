#!/usr/bin/env python3
"""Reference peak positions (modes) of narrow-slit multi-peak beams.

Writes tests/reference/beam_peak_modes.json. For every sublevel of each invented scenario the
mode of its own detector profile P(x) = int p(z) K(x - z) dz (oven flux v^3 exp(-v^2/alpha^2),
z = k/v^2, K = two-slit trapezoid (x) detector box) is found with SciPy quad + minimize_scalar,
reusing pattern_case() of beam_reference.py (independent of the TypeScript). A negative
moment gives the mirror image of the positive one (K is symmetric); zero moment gives 0.

Scenarios (invented):
  * J = 2 level, g_J = 3/2, five sublevels mu = -m_J g_J mu_B;
  * J = 1/2, I = 1 level at the intermediate field x = 0.5 (Breit-Rabi moments).

Run from the repository root:  python3 scripts/reference/beam_peak_modes.py
"""
import json
import math
import os
import sys

import numpy as np
import scipy

sys.path.insert(0, os.path.dirname(os.path.abspath(__file__)))
from beam_reference import MU_B, pattern_case  # noqa: E402

GEOMETRY = {
    "slit1M": 10e-6,
    "slit2M": 10e-6,
    "slitSeparationM": 0.5,
    "magnetLengthM": 0.1,
    "driftM": 0.4,
    "detectorWidthM": 10e-6,
    "gradientTPerM": 200.0,
}


def breit_rabi_moments(two_i, g_j, g_i, x):
    """mu = -dE/dB of every |F = I +- 1/2, m> of a J = 1/2 level at x = (g_J - g_I) mu_B B / dE, in J/T."""
    out = []
    for upper in (False, True):
        two_f = two_i + (1 if upper else -1)
        for two_m in range(-two_f, two_f + 1, 2):
            m = two_m / 2
            if abs(two_m) == two_i + 1:
                slope = math.copysign(1, two_m) * (g_j - g_i) / 2 + g_i * m  # dE/dB in mu_B
            else:
                root = math.sqrt(1 + 4 * m * x / (two_i + 1) + x * x)
                slope = g_i * m + (1 if upper else -1) * 0.5 * (g_j - g_i) * (2 * m / (two_i + 1) + x) / root
            label = f"F={two_f}/2, m_F={'+' if two_m > 0 else ''}{two_m}/2"
            out.append((label, -slope * MU_B))
    return out


def mode_of(name, mass_u, moment, source):
    if moment == 0:
        return 0.0, None
    c = pattern_case(name, GEOMETRY, mass_u, abs(moment), source, [])
    return math.copysign(c["peak_position_m"], moment), c["fwhm_m"]


def scenario(name, mass_u, source, sublevels):
    rows = []
    for label, mu in sublevels:
        mode, fwhm = mode_of(f"{name} {label}", mass_u, mu, source)
        rows.append({"label": label, "moment_JT": mu, "mode_m": mode, "fwhm_m": fwhm})
    return {"name": name, "geometry": GEOMETRY, "mass_u": mass_u, "source": source, "sublevels": rows}


def main():
    j2 = [(f"m_J={m:+d}", -m * 1.5 * MU_B) for m in (-2, -1, 0, 1, 2)]
    br = breit_rabi_moments(2, 2.0023193, -0.000447654, 0.5)
    out = {
        "scipy_version": scipy.__version__,
        "numpy_version": np.__version__,
        "scenarios": [
            scenario("J = 2, oven 900 K, 40 u", 40.0, {"kind": "effusive", "temperatureK": 900.0}, j2),
            scenario("J = 1/2, I = 1, x = 0.5, oven 700 K, 6 u", 6.0, {"kind": "effusive", "temperatureK": 700.0}, br),
        ],
    }
    path = os.path.join("tests", "reference", "beam_peak_modes.json")
    with open(path, "w") as fh:
        json.dump(out, fh, indent=1)
    print("wrote", path)


if __name__ == "__main__":
    main()

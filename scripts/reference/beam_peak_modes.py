#!/usr/bin/env python3
"""Reference peak positions (modes) of narrow-slit multi-peak beams.

Writes tests/reference/beam_peak_modes.json. For every sublevel of each invented scenario the
mode of its own detector profile P(x) = int p(z) K(x - z) dz (oven flux v^3 exp(-v^2/alpha^2),
z = k/v^2, K = two-slit trapezoid (x) detector box) is the zero of its slope
  P'(x) = (1/w) int p(z) [T(x - z + w/2) - T(x - z - w/2)] dz   (T the trapezoid, K = T (x) box_w / w),
by mpmath quadrature at 30 digits split at T's corners, and mpmath's Illinois root finder started
from SciPy's search on the values (pattern_case() of beam_reference.py, good to ~1e-6 of the
position only: a search on values settles a flat top to ~sqrt(eps)). Independent of the TypeScript,
which differences an antiderivative in closed form instead. The slope at three points beside each mode
is written too. A negative moment gives the mirror image of the positive one (K is symmetric); zero gives 0.

Scenarios (invented):
  * J = 2 level, g_J = 3/2, five sublevels mu = -m_J g_J mu_B;
  * J = 1/2, I = 1 level at the intermediate field x = 0.5 (Breit-Rabi moments).

Run from the repository root:  python3 scripts/reference/beam_peak_modes.py
"""
import json
import math
import os
import sys

import mpmath as mp
import numpy as np
import scipy
import scipy.constants as sc

sys.path.insert(0, os.path.dirname(os.path.abspath(__file__)))
from beam_reference import MU_B, image_widths, pattern_case  # noqa: E402

mp.mp.dps = 30
KB = sc.k
U = sc.physical_constants["atomic mass constant"][0]

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


def slope_function(mass_u, moment, temp_k):
    """P'(x) of an oven beam (moment > 0), as an mpmath function."""
    g = {key: mp.mpf(v) for key, v in GEOMETRY.items()}
    m = mp.mpf(mass_u) * mp.mpf(U)
    lever = g["magnetLengthM"] ** 2 / 2 + g["magnetLengthM"] * g["driftM"]
    k = mp.mpf(moment) * g["gradientTPerM"] * lever / m
    alpha2 = 2 * mp.mpf(KB) * mp.mpf(temp_k) / m
    norm = alpha2**2 / 2  # int_0^inf v^3 exp(-v^2/alpha^2) dv
    a, b = (mp.mpf(x) for x in image_widths(GEOMETRY))
    w = g["detectorWidthM"]
    top = 1 / max(a, b)
    corners = [-(a + b) / 2, -abs(a - b) / 2, abs(a - b) / 2, (a + b) / 2]

    def trapezoid(y):
        if y <= corners[0] or y >= corners[3]:
            return mp.mpf(0)
        if y < corners[1]:
            return top * (y - corners[0]) / (corners[1] - corners[0])
        if y > corners[2]:
            return top * (corners[3] - y) / (corners[3] - corners[2])
        return top

    def density(z):  # p(z) dz = flux fraction, v = sqrt(k/z)
        v2 = k / z
        return v2**1.5 * mp.exp(-v2 / alpha2) * mp.sqrt(k) / 2 * z ** mp.mpf(-1.5) / norm

    def image_integral(centre):  # int p(z) T(centre - z) dz, split at T's corners
        return mp.quad(lambda z: density(z) * trapezoid(centre - z), sorted(centre - c for c in corners))

    return lambda x: (image_integral(x + w / 2) - image_integral(x - w / 2)) / w


def mode_of(name, mass_u, moment, source):
    if moment == 0:
        return 0.0, None, []
    c = pattern_case(name, GEOMETRY, mass_u, abs(moment), source, [])
    slope = slope_function(mass_u, abs(moment), source["temperatureK"])
    start = mp.mpf(c["peak_position_m"])
    span = mp.mpf(1e-4) * start  # the values' search is good to ~1e-6 of the position
    lo, hi = start - span, start + span
    assert slope(lo) > 0 > slope(hi), name
    mode = mp.findroot(slope, (lo, hi), solver="illinois", tol=mp.mpf(10) ** -50, maxsteps=200)
    # P is mirrored for a negative moment: P_-(x) = P_+(-x), so P_-'(-x) = -P_+'(x)
    sign = math.copysign(1, moment)
    samples = [[float(sign * (mode + d)), float(sign * slope(mode + d))] for d in (mp.mpf(-1e-4), mp.mpf(1e-4), mp.mpf(3e-4))]
    return math.copysign(float(mode), moment), c["fwhm_m"], samples


def scenario(name, mass_u, source, sublevels):
    rows = []
    for label, mu in sublevels:
        mode, fwhm, samples = mode_of(f"{name} {label}", mass_u, mu, source)
        rows.append({"label": label, "moment_JT": mu, "mode_m": mode, "fwhm_m": fwhm, "slope_samples_per_m2": samples})
    return {"name": name, "geometry": GEOMETRY, "mass_u": mass_u, "source": source, "sublevels": rows}


def main():
    j2 = [(f"m_J={m:+d}", -m * 1.5 * MU_B) for m in (-2, -1, 0, 1, 2)]
    br = breit_rabi_moments(2, 2.0023193, -0.000447654, 0.5)
    out = {
        "scipy_version": scipy.__version__,
        "numpy_version": np.__version__,
        "mpmath_version": mp.__version__,
        "method": "mode = zero of the slope P'(x), mpmath quad (30 digits) + Illinois; FWHM from SciPy (beam_reference.py)",
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

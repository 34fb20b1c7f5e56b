#!/usr/bin/env python3
"""Reference maxima of synthesized spectra (printed; the values are pasted into
tests/physics/spectrumPeak.test.ts with this script named beside them).

A spectrum is sum_k w_k V(nu - nu_k; sigma, gamma) with V SciPy's voigt_profile. Its highest
point is found with scipy.optimize.minimize_scalar (Brent, xtol 1e-12) from a bracket around the
highest sample of a coarse grid, and checked by a dense grid (1 Hz steps around it).

Run from the repository root:  python3 scripts/reference/spectrum_peak.py
"""
import numpy as np
import scipy
from scipy import optimize, special

CASES = {
    # Three invented components, Doppler-broadened so that they merge into one asymmetric peak.
    'merged': dict(nu=[-120e6, 0.0, 95e6], w=[0.5, 1.0, 0.3], sigma=80e6, gamma=3e6),
    # Two narrow, well separated components: the stronger wins.
    'separate': dict(nu=[-40e6, 55e6], w=[0.7, 1.0], sigma=2e6, gamma=1.5e6),
    # Pure Lorentzians (no Doppler width) of unequal weight, overlapping.
    'lorentz': dict(nu=[0.0, 10e6], w=[1.0, 0.6], sigma=0.0, gamma=4e6),
}


def shape(x, c):
    x = np.asarray(x, dtype=float)
    if c['sigma'] == 0:
        return sum(w * c['gamma'] / np.pi / ((x - nu) ** 2 + c['gamma'] ** 2) for nu, w in zip(c['nu'], c['w']))
    return sum(w * special.voigt_profile(x - nu, c['sigma'], c['gamma']) for nu, w in zip(c['nu'], c['w']))


print(f'# SciPy {scipy.__version__}, NumPy {np.__version__}')
for name, c in CASES.items():
    grid = np.linspace(-400e6, 400e6, 801)
    k = int(np.argmax(shape(grid, c)))
    r = optimize.minimize_scalar(lambda x: -shape(x, c), bracket=(grid[k - 1], grid[k], grid[k + 1]), tol=1e-12)
    dense = np.linspace(r.x - 1e3, r.x + 1e3, 2001)
    assert abs(dense[np.argmax(shape(dense, c))] - r.x) <= 1.0
    print(f"{name}: peak at {r.x:.6f} Hz, value {float(shape(r.x, c)):.12e} per Hz")

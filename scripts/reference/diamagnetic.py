#!/usr/bin/env python3
"""Reference values for the diamagnetic term of a whole term (server/src/physics/engine/diamagnetic.ts).

Run from the repository root:  python3 scripts/reference/diamagnetic.py
Writes tests/reference/diamagnetic.json, read by tests/physics/engine.diamagnetic.test.ts.

- <l m|sin^2(theta)|l m> by SymPy integration of |Y_lm|^2 sin^2(theta) over the sphere, l = 0..4,
  and the closed form 2(l^2 + l - 1 + m^2)/((2l - 1)(2l + 3)) checked against it exactly.
- Hydrogenic <r^2> by SymPy integration of R_nl^2 r^4 (sympy.physics.hydrogen), a few (n, l),
  against n^2(5n^2 + 1 - 3l(l + 1))/2 (in a0^2, Z = 1).
- e^2 a0^2/(8 m_e h) in Hz/T^2 from scipy.constants (CODATA 2022).
- 7Li 2P with its nucleus and a diamagnetic term for a scenario <r^2> = 27.1 a0^2 (a round
  number of our own, not a measured value): eigenvalues of H0 + B Z + B^2 D of the full
  uncoupled matrix from engine_whole_term.py, D diagonal from the SymPy integrals; and the
  analytic first-order shift (e^2 B^2 <r^2>/8 m_e)<sin^2 theta> of the stretched state
  |m_L = 1, m_S = 1/2, m_I = 3/2> (alone in its m block, so the shift is exact).
"""
import json
import os
import sys

import numpy as np
import scipy
import scipy.constants as sc
import sympy
from sympy import Rational, Ynm, conjugate, integrate, pi, simplify, sin, symbols
from sympy.physics.hydrogen import R_nl

sys.path.insert(0, os.path.dirname(__file__))
import engine_whole_term as ewt  # noqa: E402

theta, phi, r = symbols("theta phi r", positive=True)
R2_BOHR2 = 27.1
FIELDS_T = [0.0, 0.1, 1.0, 10.0, 30.0]


def sin2_integral(l, m):
    y = Ynm(l, m, theta, phi).expand(func=True)
    return simplify(integrate(integrate(sympy.expand(y * conjugate(y)) * sin(theta) ** 2 * sin(theta), (theta, 0, pi)), (phi, 0, 2 * pi)))


def main():
    sin2 = {}
    for l in range(0, 5):
        for m in range(-l, l + 1):
            exact = sin2_integral(l, m)
            closed = Rational(2 * (l * l + l - 1 + m * m), (2 * l - 1) * (2 * l + 3))
            assert simplify(exact - closed) == 0, (l, m, exact, closed)
            sin2[f"{l},{m}"] = float(exact)
    r2 = {}
    for n, l in [(1, 0), (2, 0), (2, 1), (3, 1), (3, 2), (5, 1)]:
        value = integrate(R_nl(n, l, r, 1) ** 2 * r ** 4, (r, 0, sympy.oo))
        assert simplify(value - Rational(n * n * (5 * n * n + 1 - 3 * l * (l + 1)), 2)) == 0, (n, l, value)
        r2[f"{n},{l}"] = float(value)
    a0 = sc.physical_constants["Bohr radius"][0]
    unit = sc.e ** 2 * a0 ** 2 / (8 * sc.m_e * sc.h)
    coef = unit * R2_BOHR2
    case = ewt.CASES["Li7_2P"]
    h0, z, labels, _, _ = ewt.hamiltonian(case)
    d = np.diag([coef * sin2[f"1,{round(ml)}"] for ml, _, _ in labels]).astype(complex)
    without, with_dia = [], []
    for b in FIELDS_T:
        without.append(np.linalg.eigvalsh(h0 + b * z).tolist())
        with_dia.append(np.linalg.eigvalsh(h0 + b * z + b * b * d).tolist())
    stretched = [coef * sin2["1,1"] * b * b for b in FIELDS_T]
    data = {
        "generator": "scripts/reference/diamagnetic.py",
        "numpy": np.__version__, "scipy": scipy.__version__, "sympy": sympy.__version__,
        "sin2": sin2, "hydrogenic_r2_bohr2": r2,
        "e2_a02_over_8me_h_Hz_per_T2": unit, "bohr_radius_m": a0,
        "Li7_2P": {"r2_bohr2": R2_BOHR2, "fields_T": FIELDS_T, "energies_Hz": without,
                   "energies_with_diamagnetic_Hz": with_dia, "stretched_shift_Hz": stretched},
    }
    path = os.path.join("tests", "reference", "diamagnetic.json")
    with open(path, "w") as f:
        json.dump(data, f, indent=1)
    print("wrote", path)


if __name__ == "__main__":
    main()

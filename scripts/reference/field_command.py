#!/usr/bin/env python3
"""Reference field values for `sublevel field` on examples/coils-and-wires.sublevel.

Writes tests/reference/field_command.json: B and the gradient tensor dB_i/dx_j of the file's
coils (`quad`: two loops of 120 turns, radius 3.5 cm, at z = +-3.5 cm, 15 A in opposite senses, the
loop on the +axis side reversed as the model builds an opposed pair;
`bias`: 40 turns, radius 6 cm, at z = 9 cm, 2 A) and its wire rail (40 A along +x through
y = +2 mm and back through y = -2 mm, each 20 cm long, centred on x = 0) at a few points, by
direct numerical Biot-Savart quadrature (SciPy quad over the conductor), independent of the
TypeScript:
    B(r)        = mu0 I / 4 pi  int dl x R / |R|^3,                 R = r - r'
    dB_i/dx_j   = mu0 I / 4 pi  int eps_ilk dl_l (delta_jk/|R|^3 - 3 R_j R_k/|R|^5)
mu0 = 1.25663706127e-6 N/A^2 (CODATA 2022).

Run from the repository root:  python3 scripts/reference/field_command.py
"""
import json
import os

import numpy as np
import scipy
from scipy.integrate import quad

MU0 = 1.25663706127e-6
EPS = np.zeros((3, 3, 3))
EPS[0, 1, 2] = EPS[1, 2, 0] = EPS[2, 0, 1] = 1
EPS[0, 2, 1] = EPS[2, 1, 0] = EPS[1, 0, 2] = -1


def integrand(r, rp, dl):
    """(B integrand (3), gradient integrand (3x3)) per unit current and parameter step."""
    R = r - rp
    n = np.linalg.norm(R)
    b = np.cross(dl, R) / n**3
    dk = np.eye(3) / n**3 - 3 * np.outer(R, R) / n**5  # d(R_k/|R|^3)/dr_j as [j, k]
    g = np.einsum("ilk,l,jk->ij", EPS, dl, dk)
    return b, g


def integrate(r, path, a, b, current):
    """Field and gradient of current I along path(t) -> (r', dr'/dt), t from a to b."""
    out_b = np.zeros(3)
    out_g = np.zeros((3, 3))
    for i in range(3):
        out_b[i] = quad(lambda t: integrand(r, *path(t))[0][i], a, b, epsabs=0, epsrel=1e-13, limit=400)[0]
        for j in range(3):
            out_g[i, j] = quad(lambda t: integrand(r, *path(t))[1][i, j], a, b, epsabs=0, epsrel=1e-13, limit=400)[0]
    k = MU0 * current / (4 * np.pi)
    return k * out_b, k * out_g


def loop(z0, radius):
    return lambda t: (np.array([radius * np.cos(t), radius * np.sin(t), z0]), np.array([-radius * np.sin(t), radius * np.cos(t), 0.0]))


def line(y0, direction):
    return lambda t: (np.array([t, y0, 0.0]), np.array([direction, 0.0, 0.0]))


SOURCES = {
    "quad": [(loop(0.035, 0.035), 0, 2 * np.pi, -120 * 15.0), (loop(-0.035, 0.035), 0, 2 * np.pi, 120 * 15.0)],
    "bias": [(loop(0.09, 0.06), 0, 2 * np.pi, 40 * 2.0)],
    "rail": [(line(0.002, 1.0), -0.1, 0.1, 40.0), (line(-0.002, -1.0), -0.1, 0.1, 40.0)],
}

CASES = [
    {"sources": ["quad"], "point_m": [0.0, 0.0, 0.01]},
    {"sources": ["quad"], "point_m": [0.01, 0.005, 0.02]},
    {"sources": ["quad", "bias"], "point_m": [0.0, 0.0, 0.0]},
    {"sources": ["rail"], "point_m": [0.0, 0.0, 0.0]},
    {"sources": ["rail"], "point_m": [0.01, 0.003, 0.001]},
]


def main():
    out = []
    for case in CASES:
        r = np.array(case["point_m"])
        b = np.zeros(3)
        g = np.zeros((3, 3))
        for name in case["sources"]:
            for path, a, c, current in SOURCES[name]:
                db, dg = integrate(r, path, a, c, current)
                b += db
                g += dg
        out.append({**case, "B_T": b.tolist(), "gradient_T_per_m": g.tolist()})
    doc = {
        "about": "Biot-Savart quadrature of the coils and rail of examples/coils-and-wires.sublevel (scripts/reference/field_command.py)",
        "numpy": np.__version__,
        "scipy": scipy.__version__,
        "cases": out,
    }
    path = os.path.join("tests", "reference", "field_command.json")
    with open(path, "w") as f:
        json.dump(doc, f, indent=1)
        f.write("\n")
    print("wrote", path)


if __name__ == "__main__":
    main()

#!/usr/bin/env python3
"""Reference field and gradients of a thin magnetised film, near and far (eval/cleanField.ts's cancellation floor).

Run from the repository root:  python3 scripts/reference/thin_film_gradient.py
Writes tests/reference/thin_film_gradient.json, read by tests/eval/cleanFieldFloor.test.ts.

A uniformly magnetised block is its surface charge sigma = M.n on the faces, so (B = mu0 H outside)
  B(x) = (mu0 sigma / 4 pi) sum over faces of the double integral of (x - x') / |x - x'|^3 dA.
Each face's double integral has the textbook closed form (s, t the offsets from the point to the
face's corners along its edges, w to its plane, R = sqrt(s^2 + t^2 + w^2), [[f]] the alternating
sum over the four corners): B_s = c [[ln(t + R)]], B_t = c [[ln(s + R)]], B_w = -c [[atan(st/(wR))]].
Here it is evaluated in mpmath at 50 significant digits, where none of its cancellations matter
(the film's two large faces, 1 um apart, cancel to ~1e-5 of either at 10 cm), and the gradient is
mpmath.diff of it. Two points are checked against mpmath.quad of the gradient's own surface
integral, (delta_ij r^2 - 3 r_i r_j) / r^5 over the faces, so the closed form is not taken on trust.
Far away the closed form is also checked against the point dipole of the same moment, whose
relative difference falls as (size/distance)^2.
The film (1 um x 10 mm x 10 mm, 1 T) and the points are a scenario of our own.
"""
import json
import os
import time

import mpmath as mp

import block_charge_form as charge_form

mp.mp.dps = 50

SIZE = [mp.mpf("10e-3"), mp.mpf("10e-3"), mp.mpf("1e-6")]  # x, y, z: the film's normal is z
# Points along one generic direction (no component vanishes by symmetry) and along the film's normal
# through its centre (where symmetry makes some components exactly 0), at these distances from the centre.
DIRECTION = [mp.mpf("0.36"), mp.mpf("0.48"), mp.mpf("0.8")]
DIRECTIONS = {"generic": DIRECTION, "axis": [mp.mpf(0), mp.mpf(0), mp.mpf(1)]}
DISTANCES = ["1e-3", "3e-3", "1e-2", "3e-2", "1e-1", "3e-1", "1", "2", "3", "10"]
MAGNETISATIONS = {"normal": [0, 0, 1], "in-plane": [1, 0, 0], "oblique": ["0.36", "0.48", "0.8"]}
# Below this fraction of the largest component a 50-digit value is a symmetry zero, written as 0.
SYMMETRY_ZERO = mp.mpf("1e-35")


ZERO = [mp.mpf(0)] * 3  # the film is centred at the origin


def faces(mag):
    return charge_form.faces(mag, SIZE, ZERO)


def dipole_field(mag, x):
    return charge_form.dipole_field(mag, x, SIZE, ZERO)


def symmetry_zeros(values):
    return charge_form.symmetry_zeros(values, SYMMETRY_ZERO)


def film_field(mag, x):
    return charge_form.block_field(mag, x, SIZE, ZERO)


def gradient_by_diff(mag, x):
    return charge_form.gradient_by_diff(mag, x, SIZE, ZERO)


def gradient_by_quadrature(mag, x, i, j):
    """dB_i/dx_j from the surface integral of the gradient kernel, split at the point's projection."""
    mp.mp.dps = 25
    total = mp.mpf(0)
    for k, plane, charge in faces(mag):
        a, b = (k + 1) % 3, (k + 2) % 3
        cuts = lambda m: [-SIZE[m] / 2] + ([x[m]] if abs(x[m]) < SIZE[m] / 2 else []) + [SIZE[m] / 2]

        def f(p, q):
            xp = [None] * 3
            xp[k], xp[a], xp[b] = plane, p, q
            r = [x[m] - xp[m] for m in range(3)]
            rr = r[0] ** 2 + r[1] ** 2 + r[2] ** 2
            return ((1 if i == j else 0) * rr - 3 * r[i] * r[j]) / (rr ** 2 * mp.sqrt(rr))

        total += charge * mp.quad(f, cuts(a), cuts(b)) / (4 * mp.pi)
    mp.mp.dps = 50
    return total


def main():
    out = {
        "about": "B (T) and dB_i/dx_j (T/m) of a block 10 mm x 10 mm x 1 um (x, y, z) centred at 0, magnetised 1 T: the closed-form surface-charge field and its mpmath.diff at 50 digits; components that vanish by symmetry are exactly 0",
        "sizeM": [float(s) for s in SIZE],
        "mpmath": mp.__version__,
        "cases": [],
    }
    for name, mag in MAGNETISATIONS.items():
        for where, direction in DIRECTIONS.items():
            for d in DISTANCES:
                x = [mp.mpf(d) * c for c in direction]
                B = film_field(mag, x)
                g = gradient_by_diff(mag, x)
                dip = dipole_field(mag, x)
                flat = symmetry_zeros([v for row in g for v in row])
                out["cases"].append({
                    "magnetisation": name,
                    "magnetisationT": [float(mp.mpf(v)) for v in mag],
                    "direction": where,
                    "distanceM": float(mp.mpf(d)),
                    "point": [float(c) for c in x],
                    "B": symmetry_zeros(B),
                    "gradient": [flat[0:3], flat[3:6], flat[6:9]],
                    "dipoleRelativeDifference": float(max(abs(B[i] - dip[i]) for i in range(3)) / max(abs(v) for v in B)),
                })
                print(name, where, d, "B", [mp.nstr(v, 6) for v in B], "dBz/dz", mp.nstr(g[2][2], 6), flush=True)
    # The closed form against the surface integral itself, at one far and one near point.
    checks = []
    for name, d in (("normal", "1e-3"), ("normal", "1e-1"), ("in-plane", "1e-2"), ("in-plane", "1e-1")):
        x = [mp.mpf(d) * c for c in DIRECTION]
        t0 = time.time()
        g = gradient_by_diff(MAGNETISATIONS[name], x)
        for i in range(3):
            for j in range(i, 3):
                q = gradient_by_quadrature(MAGNETISATIONS[name], x, i, j)
                checks.append({"magnetisation": name, "distanceM": float(mp.mpf(d)), "i": i, "j": j, "quadrature": float(q), "closedForm": float(g[i][j]), "relativeDifference": float(abs(q / g[i][j] - 1))})
        worst = max(c["relativeDifference"] for c in checks[-6:])
        print("quadrature check", name, d, "largest relative difference", mp.nstr(worst, 3), f"{time.time() - t0:.0f} s", flush=True)
    out["quadratureChecks"] = checks
    path = os.path.join("tests", "reference", "thin_film_gradient.json")
    with open(path, "w") as fh:
        json.dump(out, fh, indent=1)
        fh.write("\n")


if __name__ == "__main__":
    main()

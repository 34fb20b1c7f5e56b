#!/usr/bin/env python3
"""Reference gradients of a magnetised block off the origin, on its symmetry planes and far away
(eval/cleanField.ts: the gradient's cancellation floor and the derivative along an axis).

Run from the repository root:  python3 scripts/reference/block_gradient_planes.py
Writes tests/reference/block_gradient_planes.json, read by tests/eval/cleanFieldGradient.test.ts.

The block (20 x 10 x 5 mm along x, y, z, centred at (13, -70, 31) mm) and its magnetisations are a
scenario of our own. Every coordinate is taken as the double the test uses (mpf of the float), so
a point written on a symmetry plane is exactly on it here, and what vanishes by symmetry is 0 at
50 digits (written as exactly 0). The field is the surface-charge closed form of
scripts/reference/block_charge_form.py (checked in thin_film_gradient.py against mpmath quadrature
of the surface integral), at 50 significant digits; the gradient is mpmath.diff of it. Far away it is also
checked against the point dipole of the same moment, whose relative difference falls as
(size/distance)^2.

Cases:
- "tilted": mu0 M = 1.2 T along (0.6, 0, 0.8); points on the plane y = centre y, along (0.8, 0, 0.6).
  By the mirror y -> -y: B_y = 0 and dB_x/dy, dB_z/dy, dB_y/dx, dB_y/dz = 0.
- "along-z": mu0 M = 1.2 T along z; points on the plane z = centre z, along (0.6, 0.8, 0). The charge
  is odd under z -> -z: B_x = B_y = 0 and so dB_x/dx, dB_x/dy, dB_y/dx, dB_y/dy = 0, dB_z/dz = 0.
  The derivative along any axis in the plane, a.G.a, is then 0 as well.
Each case also gives a.G.a (at 50 digits, for the axis as the test's doubles) along two axes, and
one near point gives an axis chosen where a.G.a is about 8e-13 of the largest entry of G: small
against G, above its rounding.
"""
import json
import os

import mpmath as mp

import block_charge_form as charge_form

mp.mp.dps = 50

F = lambda v: mp.mpf(float(v))  # the double the test uses, exactly
SIZE = [F("0.02"), F("0.01"), F("0.005")]
CENTRE = [F("0.013"), F("-0.07"), F("0.031")]
DISTANCES = ["3e-2", "1e-1", "3e-1", "1", "3", "10"]
CASES = {
    "tilted": {"magnetisationT": [0.72, 0.0, 0.96], "direction": [0.8, 0.0, 0.6], "axes": {"magnetisation": [0.6, 0.0, 0.8], "y": [0.0, 1.0, 0.0]}},
    "along-z": {"magnetisationT": [0.0, 0.0, 1.2], "direction": [0.6, 0.8, 0.0], "axes": {"in-plane": [0.6, 0.8, 0.0], "oblique": [0.6, 0.0, 0.8]}},
}
# Below this fraction of the largest component a 50-digit value is a symmetry zero, written as 0.
SYMMETRY_ZERO = mp.mpf("1e-35")


def block_field(mag, x):
    return charge_form.block_field(mag, x, SIZE, CENTRE)


def gradient(mag, x):
    return charge_form.gradient_by_diff(mag, x, SIZE, CENTRE)


def dipole_field(mag, x):
    return charge_form.dipole_field(mag, x, SIZE, CENTRE)


def symmetry_zeros(values):
    return charge_form.symmetry_zeros(values, SYMMETRY_ZERO)


def along_axis(g, axis):
    return sum(axis[i] * g[i][j] * axis[j] for i in range(3) for j in range(3))


def near_null_axis(g):
    """An axis (cos t, 0, sin t) with a.G.a about 8e-13 of the largest entry: a root of a.G.a, moved."""
    gxx, gxz, gzz = g[0][0], g[0][2] + g[2][0], g[2][2]
    t = mp.atan((-gxz + mp.sqrt(gxz * gxz - 4 * gxx * gzz)) / (2 * gzz))
    slope = -2 * gxx * mp.cos(t) * mp.sin(t) + gxz * mp.cos(2 * t) + 2 * gzz * mp.sin(t) * mp.cos(t)
    largest = max(abs(v) for row in g for v in row)
    t += 8e-13 * largest / abs(slope)
    return [float(mp.cos(t)), 0.0, float(mp.sin(t))]


def main():
    out = {
        "about": "B (T), dB_i/dx_j (T/m) and a.G.a along axes (T/m) of a block 20 x 10 x 5 mm centred at (13, -70, 31) mm, on its symmetry planes from 3 cm to 10 m: the closed-form surface-charge field and its mpmath.diff at 50 digits, every input the test's double; components that vanish by symmetry are exactly 0",
        "sizeM": [float(v) for v in SIZE],
        "centreM": [float(v) for v in CENTRE],
        "mpmath": mp.__version__,
        "cases": [],
    }
    for name, case in CASES.items():
        mag = [F(v) for v in case["magnetisationT"]]
        for dist in DISTANCES:
            point = [float(CENTRE[i] + F(dist) * F(case["direction"][i])) for i in range(3)]
            x = [F(v) for v in point]
            B = block_field(mag, x)
            g = gradient(mag, x)
            flat = symmetry_zeros([v for row in g for v in row])
            exact = [[mp.mpf(flat[3 * i + j]) if flat[3 * i + j] == 0 else g[i][j] for j in range(3)] for i in range(3)]
            axes = dict(case["axes"])
            if name == "tilted" and dist == "3e-2":
                axes["near-null"] = near_null_axis(g)
            along = {}
            for axis_name, axis in axes.items():
                value = along_axis(exact, [F(v) for v in axis])
                along[axis_name] = {"axis": axis, "value": 0.0 if value == 0 else float(value)}
            dip = dipole_field(mag, x)
            out["cases"].append({
                "magnetisation": name,
                "magnetisationT": case["magnetisationT"],
                "distanceM": float(F(dist)),
                "point": point,
                "B": symmetry_zeros(B),
                "gradient": [flat[0:3], flat[3:6], flat[6:9]],
                "alongAxes": along,
                "dipoleRelativeDifference": float(max(abs(B[i] - dip[i]) for i in range(3)) / max(abs(v) for v in B)),
            })
            print(name, dist, "B", [mp.nstr(v, 6) for v in B], {k: mp.nstr(v["value"], 6) for k, v in along.items()}, flush=True)
    path = os.path.join("tests", "reference", "block_gradient_planes.json")
    with open(path, "w") as fh:
        json.dump(out, fh, indent=1)
        fh.write("\n")


if __name__ == "__main__":
    main()

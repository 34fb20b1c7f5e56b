#!/usr/bin/env python3
"""Reference vectors for the field sources (server/src/physics/fields/).

Run from the repository root:  python3 scripts/reference/field_sources.py
Writes tests/reference/field_sources.json, read by tests/physics/fields.*.test.ts.

Everything here is direct numerical quadrature of the defining integrals, independent of the
closed forms the TypeScript uses:
- K(m), E(m) from scipy.special.ellipk/ellipe (parameter m = k^2), for the cel check.
- A circular loop in a tilted frame: the Biot-Savart line integral B = mu0 I/(4 pi) \u222e dl x R/|R|^3
  and its gradient (the x-derivative of the integrand, integrated) by scipy.integrate.quad_vec.
- A finite solenoid (current sheet): the same integrand over the angle and the axial position, nested quad_vec.
- A finite straight segment: the Biot-Savart integral along it by quad_vec.
- A uniformly magnetised block: H = (1/4 pi) sum over faces of sigma \u222c (x - x')/|x - x'|^3 dA
  (sigma = M.n the surface charge) by nested quad_vec; B = mu0 H, plus mu0 M inside.
- mu0 from scipy.constants (CODATA 2022).
The geometries are scenarios of our own (round numbers), not any real apparatus.
"""
import json
import os

import numpy as np
import scipy
import scipy.constants as sc
from scipy import integrate, special

MU0 = sc.mu_0
def frame(axis):
    n = np.asarray(axis, float)
    n = n / np.linalg.norm(n)
    helper = np.array([1.0, 0, 0]) if abs(n[0]) < 0.9 else np.array([0, 1.0, 0])
    e1 = np.cross(n, helper)
    e1 /= np.linalg.norm(e1)
    e2 = np.cross(n, e1)  # e1 x e2 = n: the current runs counter-clockwise about n
    return n, e1, e2


def segment_integrand(dl, R):
    """(dl x R)/|R|^3 and its derivatives with respect to the field point, d/dx_j."""
    r = np.linalg.norm(R)
    c = np.cross(dl, R)
    b = c / r**3
    g = np.empty((3, 3))
    for j in range(3):
        e = np.zeros(3)
        e[j] = 1
        g[:, j] = np.cross(dl, e) / r**3 - 3 * c * R[j] / r**5
    return b, g


def vector_quad(fun12, a, b, points=None):
    """Integrate a function returning 12 numbers (B, gradient) at once (scipy.integrate.quad_vec).
    The error test uses the largest component, so callers scale the gradient by a length to keep
    both parts of similar size."""
    v, _ = integrate.quad_vec(fun12, a, b, epsabs=0.0, epsrel=1e-13, norm="max", limit=2000, points=points)
    return v


def loop_field(centre, axis, radius, ni, x):
    n, e1, e2 = frame(axis)
    c = np.asarray(centre, float)
    x = np.asarray(x, float)

    def f(phi):
        rp = c + radius * (np.cos(phi) * e1 + np.sin(phi) * e2)
        dl = radius * (-np.sin(phi) * e1 + np.cos(phi) * e2)
        b, g = segment_integrand(dl, x - rp)
        return np.concatenate([b, radius * g.ravel()])

    v = vector_quad(f, 0, 2 * np.pi) * MU0 * ni / (4 * np.pi)
    return v[:3], v[3:].reshape(3, 3) / radius


def solenoid_field(centre, axis, radius, length, ni, x):
    n, e1, e2 = frame(axis)
    c = np.asarray(centre, float)
    x = np.asarray(x, float)
    per_m = ni / length

    def at_z(zp):
        def f(phi):
            rp = c + zp * n + radius * (np.cos(phi) * e1 + np.sin(phi) * e2)
            dl = radius * (-np.sin(phi) * e1 + np.cos(phi) * e2)
            b, g = segment_integrand(dl, x - rp)
            return np.concatenate([b, radius * g.ravel()])

        return vector_quad(f, 0, 2 * np.pi)

    v = vector_quad(at_z, -length / 2, length / 2) * MU0 * per_m / (4 * np.pi)
    return v[:3], v[3:].reshape(3, 3) / radius


def segment_field(point, direction, length, current, x):
    t = np.asarray(direction, float)
    t /= np.linalg.norm(t)
    p0 = np.asarray(point, float)
    x = np.asarray(x, float)

    def f(s):
        b, g = segment_integrand(t, x - (p0 + s * t))
        return np.concatenate([b, 0.01 * g.ravel()])

    v = vector_quad(f, -length / 2, length / 2) * MU0 * current / (4 * np.pi)
    return v[:3], v[3:].reshape(3, 3) / 0.01


def block_field(centre, size, mag_t, x):
    """B (T) and its gradient; mag_t = mu0 M in T."""
    c = np.asarray(centre, float)
    s = np.asarray(size, float)
    J = np.asarray(mag_t, float)
    x = np.asarray(x, float)
    lo, hi = c - s / 2, c + s / 2
    total = np.zeros(12)
    for k in range(3):
        if J[k] == 0:
            continue
        a, b = (k + 1) % 3, (k + 2) % 3
        for plane, sigma in ((hi[k], J[k]), (lo[k], -J[k])):
            def inner(vb):
                def f(ua):
                    xp = np.zeros(3)
                    xp[a], xp[b], xp[k] = ua, vb, plane
                    R = x - xp
                    r = np.linalg.norm(R)
                    return np.concatenate([R / r**3, 0.01 * (np.eye(3) / r**3 - 3 * np.outer(R, R) / r**5).ravel()])

                return vector_quad(f, lo[a], hi[a])

            total += sigma / (4 * np.pi) * vector_quad(inner, lo[b], hi[b])
    total[3:] /= 0.01
    B = total[:3].copy()
    if np.all(x > lo) and np.all(x < hi):
        B += J
    return B, total[3:].reshape(3, 3)


def rows(g):
    return [list(map(float, r)) for r in g]


def main():
    out = {
        "generator": "scripts/reference/field_sources.py",
        "numpy_version": np.__version__,
        "scipy_version": scipy.__version__,
        "mu0": MU0,
        "elliptic": [{"m": m, "K": float(special.ellipk(m)), "E": float(special.ellipe(m))} for m in [0.0, 1e-6, 0.01, 0.049, 0.051, 0.3, 0.7, 0.9, 0.99, 0.999999]],
    }
    loop = {"centre": [0.01, -0.02, 0.005], "axis": [1 / 3, 2 / 3, 2 / 3], "radius": 0.035, "ampereTurns": 1800.0}
    n, e1, e2 = frame(loop["axis"])
    c = np.array(loop["centre"])
    loop_pts = [
        c + 0.0 * n,
        c + 0.02 * n,
        c + 0.01 * e1 + 0.015 * n,
        c + 0.03 * e1 - 0.004 * e2 + 0.002 * n,
        c + 0.05 * e2 - 0.03 * n,
        c + 0.0349 * e1 + 0.0001 * n,
        c + 1e-7 * e1 + 0.01 * n,
        c + 0.3 * e1 + 0.4 * n,
    ]
    out["loop"] = {"spec": loop, "points": []}
    for p in loop_pts:
        B, G = loop_field(loop["centre"], loop["axis"], loop["radius"], loop["ampereTurns"], p)
        out["loop"]["points"].append({"x": list(map(float, p)), "B": list(map(float, B)), "gradient": rows(G)})

    sol = {"centre": [0.0, 0.01, -0.02], "axis": [0.0, 0.6, 0.8], "radius": 0.02, "length": 0.15, "ampereTurns": 3000.0}
    n, e1, e2 = frame(sol["axis"])
    c = np.array(sol["centre"])
    sol_pts = [c, c + 0.005 * e1 + 0.03 * n, c + 0.015 * e2 - 0.07 * n, c + 0.03 * e1 + 0.02 * n, c + 0.019 * e1 + 0.09 * n, c + 0.1 * e2 + 0.2 * n]
    out["solenoid"] = {"spec": sol, "points": []}
    for p in sol_pts:
        B, G = solenoid_field(sol["centre"], sol["axis"], sol["radius"], sol["length"], sol["ampereTurns"], p)
        out["solenoid"]["points"].append({"x": list(map(float, p)), "B": list(map(float, B)), "gradient": rows(G)})

    wire = {"point": [0.0, 0.002, 0.0], "direction": [1.0, 0.0, 0.0], "length": 0.2, "current": 40.0}
    wire_pts = [[0.0, 0.0, 0.0], [0.05, -0.003, 0.004], [0.099, 0.01, -0.002], [0.15, 0.002, 0.001], [-0.3, 0.02, 0.05]]
    out["segment"] = {"spec": wire, "points": []}
    for p in wire_pts:
        B, G = segment_field(wire["point"], wire["direction"], wire["length"], wire["current"], p)
        out["segment"]["points"].append({"x": p, "B": list(map(float, B)), "gradient": rows(G)})

    block = {"centre": [0.0, 0.0, 0.0], "size": [0.01, 0.02, 0.005], "magnetisation": [0.3, 1.1, -0.4]}
    block_pts = [[0.0, 0.0, 0.0], [0.001, -0.003, 0.001], [0.012, 0.004, 0.003], [0.0, 0.0, 0.01], [0.002, 0.015, -0.001], [0.03, -0.04, 0.02], [0.0, 0.0, 0.004]]
    out["block"] = {"spec": block, "points": []}
    for p in block_pts:
        B, G = block_field(block["centre"], block["size"], block["magnetisation"], p)
        out["block"]["points"].append({"x": p, "B": list(map(float, B)), "gradient": rows(G)})

    path = os.path.join("tests", "reference", "field_sources.json")
    with open(path, "w") as fh:
        json.dump(out, fh, indent=1)
        fh.write("\n")
    print("wrote", path)


if __name__ == "__main__":
    main()

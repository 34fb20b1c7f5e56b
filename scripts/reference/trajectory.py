#!/usr/bin/env python3
"""Reference trajectories for the field-map beam integrator (server/src/physics/beam/trajectory/).

Writes tests/reference/trajectory.json: transverse position and angle at the magnet exit and at
the detector for sublevels of an alkali-like J = 1/2, I = 3/2 ground level flying through the
field of two long parallel wires with opposite currents (an invented two-wire deflecting magnet),
integrated with SciPy solve_ivp (DOP853, rtol 1e-13) at constant forward speed:
    d^2 y/ds^2 = mu(|B|) d|B|/dy / (M v^2),  d^2 z/ds^2 = mu(|B|) d|B|/dz / (M v^2).
The moment mu = -dE/dB comes from the Breit-Rabi formula (textbook closed form for J = 1/2),
differentiated analytically; the wire field and its derivatives are the textbook infinite-wire
field mu0 I / (2 pi r). A third case uses wires of finite length (Biot-Savart segment field,
differentiated by central differences of the closed form) so the field changes along the beam.
"slopes" holds dk/dp of the deflection coefficient k = z_detector v^2 for the wires' current, the
beam line's height and A: central differences of these flights (for the uncertainty pass).
Nothing here is read from the project's TypeScript.

Run from the repository root:  python3 scripts/reference/trajectory.py
"""
import json
import math
import os

import numpy as np
import scipy
import scipy.constants as sc
from scipy.integrate import solve_ivp

MU_B = sc.physical_constants["Bohr magneton"][0]
H = sc.h
MU0 = sc.physical_constants["vacuum mag. permeability"][0]
U = sc.physical_constants["atomic mass constant"][0]

# Level: 7Li 2S1/2 constants (same numbers as tests/physics/engine.fixtures.ts, from memory there).
I = 1.5
A_HZ = 401.7520433e6
G_J = 2.002301
G_I = -0.001182213
MASS = 7.0160034366 * U  # 7Li atomic mass in u (AME 2020, from memory)
DW = A_HZ * (I + 0.5)  # zero-field splitting, Hz


def breit_rabi(F_upper, m, b):
    """E/h (Hz) and dE/dB (Hz/T) of |F = I +- 1/2, m> at field b >= 0 (H = A I.J + mu_B B (gJ Jz + gI Iz))."""
    x = (G_J - G_I) * MU_B * b / (H * DW)
    dx = (G_J - G_I) * MU_B / (H * DW)
    base = -DW / (2 * (2 * I + 1)) + G_I * MU_B * b * m / H
    dbase = G_I * MU_B * m / H
    if abs(abs(m) - (I + 0.5)) < 1e-9:
        # stretched states: the square root is 1 + x sign(m), linear in B
        s = 1 + x * math.copysign(1, m)
        ds = dx * math.copysign(1, m)
        return base + DW / 2 * s, dbase + DW / 2 * ds
    root = math.sqrt(1 + 4 * m * x / (2 * I + 1) + x * x)
    droot = (4 * m / (2 * I + 1) + 2 * x) * dx / (2 * root)
    sign = 1 if F_upper else -1
    return base + sign * DW / 2 * root, dbase + sign * DW / 2 * droot


def infinite_wires(wires):
    """wires: list of (y0, z0, current); each runs along +x. Returns field(p) -> (B, grad) with grad[i][j] = dB_i/dx_j."""

    def field(p):
        B = np.zeros(3)
        G = np.zeros((3, 3))
        for y0, z0, cur in wires:
            k = MU0 * cur / (2 * math.pi)
            ry, rz = p[1] - y0, p[2] - z0
            r2 = ry * ry + rz * rz
            r4 = r2 * r2
            B[1] += -k * rz / r2
            B[2] += k * ry / r2
            G[1][1] += 2 * k * ry * rz / r4
            G[1][2] += -k * (ry * ry - rz * rz) / r4
            G[2][1] += k * (rz * rz - ry * ry) / r4
            G[2][2] += -2 * k * ry * rz / r4
        return B, G

    return field


def segment_B(p, a, b, cur):
    """Biot-Savart field of a straight segment a -> b carrying cur (textbook closed form)."""
    d = b - a
    L = np.linalg.norm(d)
    e = d / L
    r = p - a
    along = r @ e
    perp = r - along * e
    rho2 = perp @ perp
    c1 = along / math.sqrt(along * along + rho2)
    c2 = (along - L) / math.sqrt((along - L) ** 2 + rho2)
    mag = MU0 * cur / (4 * math.pi * rho2) * (c1 - c2)
    return mag * np.cross(e, perp)


def finite_wires(wires, half_length):
    def B_at(p):
        out = np.zeros(3)
        for y0, z0, cur in wires:
            out += segment_B(p, np.array([-half_length, y0, z0]), np.array([half_length, y0, z0]), cur)
        return out

    def field(p):
        B = B_at(p)
        G = np.zeros((3, 3))
        for j in range(3):
            h = 1e-6
            dp = np.zeros(3)
            dp[j] = h
            # fourth-order central difference
            G[:, j] = (-B_at(p + 2 * dp) + 8 * B_at(p + dp) - 8 * B_at(p - dp) + B_at(p - 2 * dp)) / (12 * h)
        return B, G

    return field, B_at


def fly(field, F_upper, m, speed, centre, length, drift, rtol=1e-13, moment=None):
    x0 = centre[0] - length / 2

    def rhs(s, u):
        p = np.array([x0 + s, centre[1] + u[0], centre[2] + u[1]])
        B, G = field(p)
        b = np.linalg.norm(B)
        grad = G.T @ B / b
        _, dE = (moment or breit_rabi)(F_upper, m, b)
        mu = -dE * H
        a = mu / (MASS * speed * speed)
        return [u[2], u[3], a * grad[1], a * grad[2]]

    sol = solve_ivp(rhs, (0, length), [0.0, 0.0, 0.0, 0.0], method="DOP853", rtol=rtol, atol=1e-16)
    y, z, dy, dz = sol.y[:, -1]
    return {
        "exit": {"y_m": y, "z_m": z, "angle_y": dy, "angle_z": dz},
        "detector": {"y_m": y + dy * drift, "z_m": z + dz * drift, "angle_y": dy, "angle_z": dz},
    }


def main():
    # Invented two-wire magnet: wires 4 mm apart along y = +-2 mm, opposite currents of 900 A
    # (an equivalent of many turns); the beam passes 1.5 mm above their plane.
    wires = [(2e-3, 0.0, 900.0), (-2e-3, 0.0, -900.0)]
    centre = [0.0, 0.0, 1.5e-3]
    length = 0.08
    drift = 0.3
    states = [(True, 2), (True, 1), (True, 0), (True, -1), (True, -2), (False, 1), (False, 0), (False, -1)]
    cases = []
    inf = infinite_wires(wires)
    for F_upper, m in states:
        for speed in (400.0, 1200.0):
            r = fly(inf, F_upper, m, speed, centre, length, drift)
            cases.append({"field": "infinite", "twoF": 4 if F_upper else 2, "twoM": 2 * m, "speed_m_per_s": speed, **r})
    fin, _ = finite_wires(wires, 0.05)
    # the finite wires are centred on x = 0 and 10 cm long; the magnet stretch is the middle 8 cm
    for F_upper, m in [(True, 2), (False, -1), (True, -1)]:
        r = fly(fin, F_upper, m, 600.0, centre, length, drift, rtol=1e-12)
        cases.append({"field": "finite", "half_length_m": 0.05, "twoF": 4 if F_upper else 2, "twoM": 2 * m, "speed_m_per_s": 600.0, **r})
    # dk/dp by central differences of the flights (k = z_detector v^2), at one speed.
    speed = 800.0

    def k_of(wire_current=900.0, height=centre[2], a_scale=1.0):
        global A_HZ, DW
        saved = (A_HZ, DW)
        A_HZ, DW = A_HZ * a_scale, DW * a_scale
        try:
            f = infinite_wires([(2e-3, 0.0, wire_current), (-2e-3, 0.0, -wire_current)])
            return [fly(f, Fu, mm, speed, [0.0, 0.0, height], length, drift)["detector"]["z_m"] * speed**2 for Fu, mm in slope_states]
        finally:
            A_HZ, DW = saved

    slope_states = [(True, 2), (True, 0), (False, -1)]
    steps = {"current_A": 1.0, "height_m": 1e-6, "A_Hz": 1e-4 * A_HZ}
    slopes = {}
    for name, h in steps.items():
        if name == "current_A":
            plus, minus = k_of(wire_current=900.0 + h), k_of(wire_current=900.0 - h)
        elif name == "height_m":
            plus, minus = k_of(height=centre[2] + h), k_of(height=centre[2] - h)
        else:
            plus, minus = k_of(a_scale=1 + h / A_HZ), k_of(a_scale=1 - h / A_HZ)
        slopes[name] = {"step": h, "dk": [(p - q) / (2 * h) for p, q in zip(plus, minus)]}
    base_k = k_of()
    out = {
        "generator": "scripts/reference/trajectory.py",
        "numpy": np.__version__,
        "scipy": scipy.__version__,
        "method": "solve_ivp DOP853, rtol 1e-13 (infinite wires) / 1e-12 (finite wires), atol 1e-16",
        "level": {"twoJ": 1, "twoI": 3, "gJ": G_J, "gI": G_I, "A": A_HZ, "mass_kg": MASS},
        "wires": [{"y_m": w[0], "z_m": w[1], "current_A": w[2]} for w in wires],
        "centre_m": centre,
        "length_m": length,
        "drift_m": drift,
        "cases": cases,
        "slopes": {
            "speed_m_per_s": speed,
            "states": [{"twoF": 4 if Fu else 2, "twoM": 2 * mm} for Fu, mm in slope_states],
            "k_m3_per_s2": base_k,
            "derivatives": slopes,
        },
    }
    path = os.path.join("tests", "reference", "trajectory.json")
    with open(path, "w") as f:
        json.dump(out, f, indent=1)
        f.write("\n")
    print("wrote", path, len(cases), "cases")


if __name__ == "__main__":
    main()

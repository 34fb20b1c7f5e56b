#!/usr/bin/env python3
"""Write tests/reference/traps.json: reference numbers for the magnetic-trap physics.

Run from the repository root:  python3 scripts/reference/traps_reference.py
Independent of the TypeScript code: the ground-level energies come from the Breit–Rabi formula
(E(F = I ± 1/2, m) = −ΔE/(2(2I+1)) + g_I μ_B m B ± ΔE/2 √(1 + 4mx/(2I+1) + x²),
x = (g_J − g_I) μ_B B / ΔE, ΔE = A (I + 1/2); standard atomic physics), the constants from
scipy.constants (CODATA 2022 in SciPy 1.17), minima from scipy.optimize. The ⁸⁷Rb numbers are
the project's built-in ones (mass, A, g_J, g_I) so the comparison tests the trap code alone.
Analytic fields: the ideal quadrupole B = b′(x/2, y/2, −z) and the Ioffe–Pritchard field
B = (b′x − b″xz/2, −b′y − b″yz/2, B0 + b″(z² − (x² + y²)/2)/2).
"""
import json
import os

import numpy as np
import scipy
import scipy.constants as sc
from scipy.optimize import brentq, minimize

MU_B_HZ = sc.physical_constants["Bohr magneton in Hz/T"][0]
H = sc.h
G = sc.g  # standard acceleration of gravity, 9.80665 m/s² exactly
KB = sc.k
HBAR = sc.hbar

# Built-in 87Rb ground level (server/src/physics/species/data-rubidium.ts).
MASS = 86.909180531 * sc.physical_constants["atomic mass constant"][0]
A = 3417.341305452145e6
GJ = 2.00233113
GI = -0.0009951414
TWO_I = 3
I = TWO_I / 2
DE = A * (I + 0.5)


def energy_hz(two_f, two_m, b):
    """Breit–Rabi E/h (Hz) of |F, m_F> at field b (T), following the state adiabatically from low field."""
    m = two_m / 2
    x = (GJ - GI) * MU_B_HZ * b / DE
    sign = 1 if two_f == TWO_I + 1 else -1
    if abs(two_m) == TWO_I + 1:
        # Stretched states: the square root is (1 ± x) exactly; keep it linear through x = 1.
        root = 1 + x * np.sign(m)
    else:
        root = np.sqrt(1 + 4 * m * x / (2 * I + 1) + x * x)
    return -DE / (2 * (2 * I + 1)) + GI * MU_B_HZ * m * b + sign * DE / 2 * root


def slope_hz_per_t(two_f, two_m, b, h=1e-7):
    return (energy_hz(two_f, two_m, b + h) - energy_hz(two_f, two_m, b - h)) / (2 * h)


def ioffe(p, b0, b1, b2):
    x, y, z = p
    return np.array([b1 * x - b2 * x * z / 2, -b1 * y - b2 * y * z / 2, b0 + b2 * (z * z - (x * x + y * y) / 2) / 2])


def quadrupole(p, b1):
    x, y, z = p
    return np.array([b1 * x / 2, b1 * y / 2, -b1 * z])


out = {
    "generator": "scripts/reference/traps_reference.py",
    "numpy": np.__version__,
    "scipy": scipy.__version__,
    "standard_gravity": G,
    "mass_kg": MASS,
}

# Levitation gradient m g / (dE/dB) of |2,+2> and |2,+1> at low field (stretched: exactly linear).
lev = {}
for two_f, two_m in [(4, 4), (4, 2), (2, -2)]:
    slope = (energy_hz(two_f, two_m, 1e-7) - energy_hz(two_f, two_m, 0.0)) / 1e-7
    lev[f"{two_f}/{two_m}"] = MASS * G / (H * slope)
out["levitation_T_per_m"] = lev

# Turning field of |1,-1>: where dE/dB changes sign.
out["turning_field_T_1_m1"] = brentq(lambda b: slope_hz_per_t(2, -2, b), 0.01, 0.5, xtol=1e-15)
bt = out["turning_field_T_1_m1"]
out["turning_depth_J_1_m1"] = H * (energy_hz(2, -2, bt) - energy_hz(2, -2, 0.0))

# A deep quadrupole without gravity: b' = 10 T/m, region radius 5 cm. |2,+2> leaves at the
# weakest point of the edge (radial, |B| = b' R / 2), |1,-1> at its turning field.
b1, R = 10.0, 0.05
out["deep_quadrupole"] = {
    "gradient_T_per_m": b1,
    "radius_m": R,
    "depth_J_2_2": H * (energy_hz(4, 4, b1 * R / 2) - energy_hz(4, 4, 0.0)),
    "depth_J_2_1": H * (energy_hz(4, 2, b1 * R / 2) - energy_hz(4, 2, 0.0)),
    "depth_J_1_m1": out["turning_depth_J_1_m1"],
}

# The minimum of U = E(|B|) - m g.r for |1,-1> in an Ioffe–Pritchard trap with gravity along -x
# (B0 = 1 G, b' = 100 G/cm, b'' = 100 G/cm²), by SciPy. Positions in micrometres for the optimiser.
b0, b1, b2 = 1e-4, 1.0, 100.0
gvec = np.array([-G, 0.0, 0.0])


def u_over_h(p_um, two_f, two_m):
    # Measured from E(B0) so the optimiser works with numbers of kHz, not the GHz offset.
    p = np.asarray(p_um) * 1e-6
    return energy_hz(two_f, two_m, np.linalg.norm(ioffe(p, b0, b1, b2))) - energy_hz(two_f, two_m, b0) - MASS * np.dot(gvec, p) / H


minima = {}
for two_f, two_m in [(2, -2), (4, 2)]:
    # The axial direction is soft (about 9 Hz): Nelder–Mead restarted with ever smaller simplices.
    x = np.zeros(3)
    for k in range(7):
        simplex = x + np.vstack([np.zeros(3), np.eye(3) * 10.0 ** -k])
        r = minimize(u_over_h, x, args=(two_f, two_m), method="Nelder-Mead",
                     options={"xatol": 1e-12, "fatol": 1e-15, "maxiter": 40000, "initial_simplex": simplex})
        x = r.x
    r.x = x
    minima[f"{two_f}/{two_m}"] = {"position_m": list(r.x * 1e-6), "field_T": float(np.linalg.norm(ioffe(r.x * 1e-6, b0, b1, b2)))}
out["ioffe_gravity_minimum"] = {"B0_T": b0, "b1_T_per_m": b1, "b2_T_per_m2": b2, "gravity": list(gvec), "minima": minima}

# The RF knife for |2,+2> in that trap without gravity: the field where E rose by 1 MHz·h, and
# the exact |2,+2> -> |2,+1> splitting there.
cut_hz = 1e6
bc = brentq(lambda b: energy_hz(4, 4, b) - energy_hz(4, 4, b0) - cut_hz, b0, 1e-2, xtol=1e-18)
out["rf_cut"] = {
    "B0_T": b0,
    "cut_J": H * cut_hz,
    "field_T": bc,
    "frequency_Hz": energy_hz(4, 4, bc) - energy_hz(4, 2, bc),
}

# Majorana estimate Γ = 1.85 ħ/m (μ b'/k_B T)² for |2,+2> in a 1 T/m quadrupole at 100 µK.
mu = H * (energy_hz(4, 4, 1e-7) - energy_hz(4, 4, 0.0)) / 1e-7
out["majorana"] = {"gradient_T_per_m": 1.0, "temperature_K": 1e-4, "rate_per_s": 1.85 * HBAR / MASS * (mu * 1.0 / (KB * 1e-4)) ** 2}

path = os.path.join("tests", "reference", "traps.json")
with open(path, "w") as f:
    json.dump(out, f, indent=2)
    f.write("\n")
print("wrote", path)

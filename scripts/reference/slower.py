#!/usr/bin/env python3
"""Reference values for the slower physics (writes tests/reference/slower.json).

Independent of the TypeScript: for invented sodium-like and rubidium-like slowers
  * a_max = hbar k Gamma / (2 m) with scipy.constants (CODATA 2022), the length
    L = (v0^2 - vf^2) / (2 eta a_max), the stop length L0 = v0^2 / (2 eta a_max);
  * the Zeeman rate of the stretched sigma+ pair, mu_B/h (g_u J_u - g_l J_l) (the g_I m_I terms
    cancel between the stretched states), and Delta B = v0 / (lambda rate);
  * the ideal profile B(z) = B_bias + s Delta B sqrt(1 - z/L0) at a few z;
  * one atom's flight through the field with the scattering force
    a = a_max s0 / (1 + s0 + (2 delta / Gamma)^2), delta = detuning + v/lambda - shift B(z), by
    scipy.integrate.solve_ivp (DOP853, rtol 1e-12) with terminal events at z = L and v = 0;
  * for a field with a steep step added (tanh), the first z where the needed deceleration
    -v_res dv_res/dz exceeds a_max s0/(1+s0), by scipy.optimize.brentq.

Atomic data (line wavelengths, lifetimes, g_J) are those of the public alkali D-line data
compilations the project's species table cites (D. A. Steck, "Sodium D Line Data" and
"Rubidium 87 D Line Data"); the scenarios (speeds, eta, s0, bias) are invented.

Run from the repository root:  python3 scripts/reference/slower.py
"""
import json
import math
import os

import numpy as np
import scipy
from scipy import constants, integrate, optimize

HBAR = constants.hbar
H = constants.h
MU_B = constants.physical_constants["Bohr magneton"][0]
U = constants.physical_constants["atomic mass constant"][0]

SODIUM = {"wavelength_m": 589.1583264e-9, "lifetime_s": 16.2492e-9, "mass_kg": 22.989769282 * U, "g_lower": 2.002296, "J_lower": 0.5, "g_upper": 1.3342, "J_upper": 1.5}
RUBIDIUM = {"wavelength_m": 780.241209686e-9, "lifetime_s": 26.2348e-9, "mass_kg": 86.909180531 * U, "g_lower": 2.00233113, "J_lower": 0.5, "g_upper": 1.3362, "J_upper": 1.5}

CASES = [
    {"name": "sodium decreasing", "atom": SODIUM, "v0": 1000.0, "vf": 30.0, "eta": 0.5, "s0": 2.0, "design": "decreasing"},
    {"name": "sodium spin flip", "atom": SODIUM, "v0": 900.0, "vf": 25.0, "eta": 0.5, "s0": 2.0, "design": "spin_flip"},
    {"name": "rubidium increasing", "atom": RUBIDIUM, "v0": 350.0, "vf": 20.0, "eta": 0.6, "s0": 3.0, "design": "increasing"},
    {"name": "sodium with a step", "atom": SODIUM, "v0": 1000.0, "vf": 30.0, "eta": 0.5, "s0": 2.0, "design": "decreasing", "step": {"z_m": 0.3, "width_m": 0.01, "size_T": 0.004}},
    {"name": "sodium example file", "atom": SODIUM, "v0": 950.0, "vf": 30.0, "eta": 0.55, "s0": 2.5, "design": "spin_flip"},
    {"name": "rubidium given bias", "atom": RUBIDIUM, "v0": 300.0, "vf": 15.0, "eta": 0.7, "s0": 5.0, "design": "decreasing", "bias_T": -0.002},
]


def profile(case):
    a = case["atom"]
    k = 2 * math.pi / a["wavelength_m"]
    a_max = HBAR * k / a["lifetime_s"] / (2 * a["mass_kg"])
    acc = case["eta"] * a_max
    length = (case["v0"] ** 2 - case["vf"] ** 2) / (2 * acc)
    stop = case["v0"] ** 2 / (2 * acc)
    rate = MU_B / H * (a["g_upper"] * a["J_upper"] - a["g_lower"] * a["J_lower"])
    delta_b = case["v0"] / (a["wavelength_m"] * rate)
    sign = -1 if case["design"] == "increasing" else 1
    ratio = case["vf"] / case["v0"]
    default = {"decreasing": -delta_b * ratio, "increasing": delta_b, "spin_flip": -delta_b * (1 + ratio) / 2}[case["design"]]
    bias = case.get("bias_T", default)
    detuning = sign * rate * bias
    return {"a_max": a_max, "acc": acc, "length": length, "stop": stop, "rate": rate, "delta_b": delta_b, "sign": sign, "bias": bias, "detuning": detuning}


def field(case, p):
    step = case.get("step")

    def b(z):
        zc = min(max(z, 0.0), p["length"])
        value = p["bias"] + p["sign"] * p["delta_b"] * math.sqrt(1 - zc / p["stop"])
        if step:
            value -= step["size_T"] * 0.5 * (1 + math.tanh((z - step["z_m"]) / step["width_m"]))
        return value

    def db(z):
        out = 0.0
        if 0 <= z <= p["length"]:
            out = -p["sign"] * p["delta_b"] / (2 * p["stop"] * math.sqrt(1 - z / p["stop"]))
        if step:
            out -= step["size_T"] * 0.5 / step["width_m"] / math.cosh((z - step["z_m"]) / step["width_m"]) ** 2
        return out

    return b, db


def fly(case, p, b):
    a = case["atom"]
    shift = p["sign"] * p["rate"]

    def rhs(_t, y):
        seen = p["detuning"] + y[1] / a["wavelength_m"] - shift * b(y[0])
        x = 2 * (2 * math.pi * seen) * a["lifetime_s"]
        return [y[1], -p["a_max"] * case["s0"] / (1 + case["s0"] + x * x)]

    def at_end(_t, y):
        return y[0] - p["length"]

    def stopped(_t, y):
        return y[1]

    at_end.terminal = True
    stopped.terminal = True
    sol = integrate.solve_ivp(rhs, (0, 1.0), [0.0, case["v0"]], method="DOP853", rtol=1e-12, atol=[1e-14, 1e-11], events=[at_end, stopped])
    if sol.t_events[0].size:
        return {"final_m_per_s": float(sol.y_events[0][0][1]), "time_s": float(sol.t_events[0][0])}
    return {"final_m_per_s": 0.0, "stopped_at_m": float(sol.y_events[1][0][0]), "time_s": float(sol.t_events[1][0])}


def drop(case, p, b, db):
    a = case["atom"]
    shift = p["sign"] * p["rate"]
    reach = p["a_max"] * case["s0"] / (1 + case["s0"])

    def excess(z):
        v = a["wavelength_m"] * (shift * b(z) - p["detuning"])
        need = -v * a["wavelength_m"] * shift * db(z) if v > 0 else 0.0
        return need - reach

    zs = np.linspace(0, p["length"], 20001)
    vals = [excess(z) for z in zs]
    for i in range(1, len(zs)):
        if vals[0] > 0:
            return 0.0
        if vals[i] > 0:
            return float(optimize.brentq(excess, zs[i - 1], zs[i], xtol=1e-12))
    return None


def main():
    out = {
        "generator": "scripts/reference/slower.py",
        "scipy": scipy.__version__,
        "numpy": np.__version__,
        "constants": "scipy.constants (CODATA 2022)",
        "cases": [],
    }
    for case in CASES:
        p = profile(case)
        b, db = field(case, p)
        entry = {
            "name": case["name"],
            "input": {k: v for k, v in case.items() if k not in ("name",)},
            "a_max_m_per_s2": p["a_max"],
            "length_m": p["length"],
            "stop_length_m": p["stop"],
            "rate_Hz_per_T": p["rate"],
            "delta_B_T": p["delta_b"],
            "bias_T": p["bias"],
            "detuning_Hz": p["detuning"],
            "field_samples": [{"z_m": z, "B_T": b(z)} for z in np.linspace(0, p["length"], 7).tolist()],
            "flight": fly(case, p, b),
        }
        if "step" in case:
            entry["drop_at_m"] = drop(case, p, b, db)
        out["cases"].append(entry)
    path = os.path.join(os.path.dirname(__file__), "..", "..", "tests", "reference", "slower.json")
    with open(path, "w") as f:
        json.dump(out, f, indent=1)
        f.write("\n")


if __name__ == "__main__":
    main()

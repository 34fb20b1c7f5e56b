#!/usr/bin/env python3
"""Reference vectors for the transitions module (server/src/physics/transitions).

Run from the repository root:  python3 scripts/reference/transitions_strengths.py
Writes tests/reference/transitions_strengths.json, read by tests/physics/transitions.reference.test.ts.

Independent of the TypeScript code. Library versions are recorded in the JSON.

1. Sodium D lines with I = 0 (g_s = 2, g_L = 1 exactly): every component's offset in units of
   mu_B B/h and its strength (2J'+1) (J' 1 J; -m' q m)^2, exact rationals from SymPy's
   sympy.physics.wigner.wigner_3j.
2. 87Rb D2 (5S1/2 -> 5P3/2, I = 3/2) at zero field, hyperfine resolved, from the coupled-basis
   formula: strength(F m -> F' m') = (2J'+1)(2F+1)(2F'+1) {J J' 1; F' F I}^2 (F' 1 F; -m' q m)^2,
   and the F-summed factors S_FF' = (2F'+1)(2J+1) {J J' 1; F' F I}^2 (SymPy wigner_6j / wigner_3j).
3. 87Rb D2 at finite fields: both levels diagonalised block by block (fixed m_J + m_I) with
   numpy.linalg.eigh in the uncoupled basis, dipole matrix from SymPy 3j symbols; components keyed by
   (2m, rank in block) of both ends.
4. 87Rb 5S1/2 magnetic-dipole elements |<u| g_J J_q + g_I I_q |l>|^2: at zero field from the
   Wigner-Eckart theorem with 6j symbols (reduced elements of a tensor acting on one part of a coupled
   system, standard textbook formulas), cross-checked here against explicit SymPy Clebsch-Gordan
   states; at finite fields from numpy.linalg.eigh, with frequencies and Hellmann-Feynman df/dB.
5. 87Rb |1,-1> <-> |2,+1> field-insensitive point from the closed Breit-Rabi formula (scipy brentq).

Level data (rubidium-87 D-line data compilation): 5S1/2 A = 3417.341305452145 MHz, g_J = 2.00233113;
5P3/2 A = 84.7185 MHz, B = 12.4965 MHz, g_J = 1.3362; g_I = -0.0009951414 (Zeeman term
+mu_B B (g_J J_z + g_I I_z)). mu_B/h from scipy.constants (CODATA 2022).
"""
import json
import os
from fractions import Fraction

import numpy as np
import scipy
import scipy.constants as sc
import sympy
from scipy.optimize import brentq
from sympy import Rational
from sympy.physics.wigner import clebsch_gordan, wigner_3j, wigner_6j

MU_B_HZ_PER_T = sc.physical_constants["Bohr magneton"][0] / sc.h
G_I = -0.0009951414
RB_S = dict(twoJ=1, twoI=3, gJ=2.00233113, gI=G_I, A=3417.341305452145e6, B=0.0)
RB_P = dict(twoJ=3, twoI=3, gJ=1.3362, gI=G_I, A=84.7185e6, B=12.4965e6)
E1_FIELDS_T = [1e-4, 0.01, 0.1, 5.0]
M1_FIELDS_T = [1e-4, 0.05, 1.0]


def h(two):
    return Rational(two, 2)


def sign_pow(two_exp):
    """(-1)^(two_exp/2) for an even two_exp."""
    assert two_exp % 2 == 0
    return 1 if (two_exp // 2) % 2 == 0 else -1


def w3j(tj1, tj2, tj3, tm1, tm2, tm3):
    return wigner_3j(h(tj1), h(tj2), h(tj3), h(tm1), h(tm2), h(tm3))


def uncoupled_dipole(two_ju, two_mju, two_jl, two_mjl, q):
    """(-1)^(J'-m') (J' 1 J; -m' q m) as an exact SymPy number."""
    return sign_pow(two_ju - two_mju) * w3j(two_ju, 2, two_jl, -two_mju, 2 * q, two_mjl)


# ---------------------------------------------------------------- 1. sodium D, I = 0
def lande_exact(two_s, l, two_j):
    jj, ss, ll = Fraction(two_j * (two_j + 2), 4), Fraction(two_s * (two_s + 2), 4), l * (l + 1)
    return 1 + (jj + ss - ll) / (2 * jj)


def sodium_line(two_ju, l_u):
    g_l = lande_exact(1, 0, 1)
    g_u = lande_exact(1, l_u, two_ju)
    out = []
    for two_ml in (-1, 1):
        for two_mu in range(-two_ju, two_ju + 1, 2):
            two_q = two_mu - two_ml
            if abs(two_q) > 2:
                continue
            amp = uncoupled_dipole(two_ju, two_mu, 1, two_ml, two_q // 2)
            strength = (two_ju + 1) * amp**2
            if strength == 0:
                continue
            offset = g_u * Fraction(two_mu, 2) - g_l * Fraction(two_ml, 2)
            out.append(
                dict(twoMLower=two_ml, twoMUpper=two_mu, q=two_q // 2,
                     offsetMuB=[offset.numerator, offset.denominator],
                     strength=[int(sympy.fraction(strength)[0]), int(sympy.fraction(strength)[1])])
            )
    return dict(gLower=[g_l.numerator, g_l.denominator], gUpper=[g_u.numerator, g_u.denominator], components=out)


# ---------------------------------------------------------------- 2. 87Rb D2, zero field, coupled basis
def rb_d2_zero_field():
    tj, tjp, ti = 1, 3, 3
    comps, factors = [], []
    for tf in range(abs(tj - ti), tj + ti + 1, 2):
        for tfp in range(abs(tjp - ti), tjp + ti + 1, 2):
            six = wigner_6j(h(tj), h(tjp), 1, h(tfp), h(tf), h(ti))
            s_ffp = (tfp + 1) * (tj + 1) * six**2
            factors.append(dict(twoF=tf, twoFUpper=tfp, S=float(s_ffp)))
            for tm in range(-tf, tf + 1, 2):
                for tmp in range(-tfp, tfp + 1, 2):
                    tq = tmp - tm
                    if abs(tq) > 2:
                        continue
                    val = (tjp + 1) * (tf + 1) * (tfp + 1) * six**2 * w3j(tfp, 2, tf, -tmp, tq, tm) ** 2
                    if val != 0:
                        comps.append(dict(twoF=tf, twoMF=tm, twoFUpper=tfp, twoMFUpper=tmp, strength=float(val)))
    return dict(components=comps, factorsSFF=factors)


# ---------------------------------------------------------------- 3./4. block diagonalisation
def spin_ops(two_j):
    """m values (twice) descending, Jz, J+ for spin two_j/2."""
    ms = list(range(two_j, -two_j - 1, -2))
    n = two_j + 1
    jz = np.diag([m / 2 for m in ms])
    jp = np.zeros((n, n))
    for k in range(1, n):
        m = ms[k] / 2
        j = two_j / 2
        jp[k - 1, k] = np.sqrt(j * (j + 1) - m * (m + 1))
    return ms, jz, jp


def level_model(p):
    msj, jz, jp = spin_ops(p["twoJ"])
    msi, iz, ip = spin_ops(p["twoI"])
    nj, ni = len(msj), len(msi)
    x = np.kron(jz, iz) + 0.5 * (np.kron(jp, ip.T) + np.kron(jp.T, ip))
    h0 = p["A"] * x
    j, i = p["twoJ"] / 2, p["twoI"] / 2
    if p["B"] != 0:
        h0 = h0 + p["B"] * (3 * x @ x + 1.5 * x - i * (i + 1) * j * (j + 1) * np.eye(nj * ni)) / (
            2 * i * (2 * i - 1) * j * (2 * j - 1))
    z = MU_B_HZ_PER_T * (p["gJ"] * np.kron(jz, np.eye(ni)) + p["gI"] * np.kron(np.eye(nj), iz))
    labels = [(a, b) for a in msj for b in msi]  # (twoMJ, twoMI), kron order
    return h0, z, labels


def solve_blocks(p, field):
    """List of states: dict(twoM, rank, energy, slope, vec (full-space vector))."""
    h0, z, labels = level_model(p)
    hmat = h0 + field * z
    states = []
    for tm in sorted({a + b for a, b in labels}):
        idx = [k for k, (a, b) in enumerate(labels) if a + b == tm]
        w, v = np.linalg.eigh(hmat[np.ix_(idx, idx)])
        for r in range(len(idx)):
            full = np.zeros(len(labels))
            full[idx] = v[:, r]
            states.append(dict(twoM=tm, rank=r, energy=float(w[r]), slope=float(full @ z @ full), vec=full))
    return states, labels


def dipole_matrices(lower_labels, upper_labels, two_jl, two_ju):
    mats = {}
    for q in (-1, 0, 1):
        d = np.zeros((len(upper_labels), len(lower_labels)))
        for a, (mju, miu) in enumerate(upper_labels):
            for b, (mjl, mil) in enumerate(lower_labels):
                if miu == mil and mju - mjl == 2 * q:
                    d[a, b] = float(uncoupled_dipole(two_ju, mju, two_jl, mjl, q))
        mats[q] = d
    return mats


def rb_d2_finite_fields():
    out = []
    for field in E1_FIELDS_T:
        low, ll = solve_blocks(RB_S, field)
        up, ul = solve_blocks(RB_P, field)
        mats = dipole_matrices(ll, ul, RB_S["twoJ"], RB_P["twoJ"])
        comps = []
        sums = []
        for u in up:
            total = 0.0
            for l in low:
                tq = u["twoM"] - l["twoM"]
                if abs(tq) > 2:
                    continue
                amp = u["vec"] @ mats[tq // 2] @ l["vec"]
                s = (RB_P["twoJ"] + 1) * amp * amp
                total += s
                if s > 1e-14:
                    comps.append(dict(lowerTwoM=l["twoM"], lowerRank=l["rank"], upperTwoM=u["twoM"],
                                      upperRank=u["rank"], offsetHz=u["energy"] - l["energy"], strength=s))
            sums.append(total)
        assert max(abs(s - 1) for s in sums) < 1e-12, "sum rule failed in the reference itself"
        out.append(dict(fieldT=field, components=comps))
    return out


# ---------------------------------------------------------------- 4. M1 in 87Rb 5S1/2
def m1_zero_field_6j(p):
    """|<F' m'| g_J J_q + g_I I_q |F m>|^2 from reduced elements with 6j symbols."""
    tj, ti = p["twoJ"], p["twoI"]
    J, I = h(tj), h(ti)
    red_j = sympy.sqrt(J * (J + 1) * (2 * J + 1))
    red_i = sympy.sqrt(I * (I + 1) * (2 * I + 1))
    gj, gi = sympy.nsimplify(p["gJ"], rational=True), sympy.nsimplify(p["gI"], rational=True)
    out = {}
    fs = range(abs(tj - ti), tj + ti + 1, 2)
    for tf in fs:
        for tfp in fs:
            F, Fp = h(tf), h(tfp)
            root = sympy.sqrt((2 * F + 1) * (2 * Fp + 1))
            # Tensor on the first part (J) and on the second part (I) of |(J I) F>.
            rj = (-1) ** (J + I + F + 1) * root * wigner_6j(J, Fp, I, F, J, 1) * red_j
            ri = (-1) ** (J + I + Fp + 1) * root * wigner_6j(I, Fp, J, F, I, 1) * red_i
            red = gj * rj + gi * ri
            for tm in range(-tf, tf + 1, 2):
                for tmp in range(-tfp, tfp + 1, 2):
                    tq = tmp - tm
                    if abs(tq) > 2:
                        continue
                    el = sign_pow(tfp - tmp) * w3j(tfp, 2, tf, -tmp, tq, tm) * red
                    out[(tf, tm, tfp, tmp)] = el
    return out


def m1_zero_field_cg(p):
    """The same elements from explicit Clebsch-Gordan states and ladder operators (cross-check)."""
    tj, ti = p["twoJ"], p["twoI"]
    gj, gi = sympy.nsimplify(p["gJ"], rational=True), sympy.nsimplify(p["gI"], rational=True)

    def state(tf, tm):
        return {(mj, tm - mj): clebsch_gordan(h(tj), h(ti), h(tf), h(mj), h(tm - mj), h(tm))
                for mj in range(-tj, tj + 1, 2) if abs(tm - mj) <= ti}

    def ladder(two_j, two_m, up):
        j, m = h(two_j), h(two_m)
        return sympy.sqrt(j * (j + 1) - m * (m + 1)) if up else sympy.sqrt(j * (j + 1) - m * (m - 1))

    def apply(vec, q):
        out = {}
        for (mj, mi), c in vec.items():
            if c == 0:
                continue
            if q == 0:
                out[(mj, mi)] = out.get((mj, mi), 0) + c * (gj * h(mj) + gi * h(mi))
                continue
            up = q > 0
            coef = -1 / sympy.sqrt(2) if up else 1 / sympy.sqrt(2)
            if abs(mj + 2 * q) <= tj:
                key = (mj + 2 * q, mi)
                out[key] = out.get(key, 0) + c * gj * coef * ladder(tj, mj, up)
            if abs(mi + 2 * q) <= ti:
                key = (mj, mi + 2 * q)
                out[key] = out.get(key, 0) + c * gi * coef * ladder(ti, mi, up)
        return out

    res = {}
    fs = range(abs(tj - ti), tj + ti + 1, 2)
    for tf in fs:
        for tm in range(-tf, tf + 1, 2):
            for tfp in fs:
                for tmp in range(-tfp, tfp + 1, 2):
                    tq = tmp - tm
                    if abs(tq) > 2:
                        continue
                    moved = apply(state(tf, tm), tq // 2)
                    bra = state(tfp, tmp)
                    res[(tf, tm, tfp, tmp)] = sum(bra.get(k, 0) * v for k, v in moved.items())
    return res


def rb_m1_zero_field():
    six = m1_zero_field_6j(RB_S)
    cg = m1_zero_field_cg(RB_S)
    rows = []
    for key, el in six.items():
        a, b = float(el), float(cg[key])
        assert abs(a - b) < 1e-12, f"6j and CG routes disagree at {key}: {a} vs {b}"
        tf, tm, tfp, tmp = key
        if (tf, tm) == (tfp, tmp) or a * a < 1e-20:
            continue
        rows.append(dict(twoF=tf, twoMF=tm, twoFUpper=tfp, twoMFUpper=tmp, strength=a * a))
    return rows


def rb_m1_finite_fields():
    out = []
    for field in M1_FIELDS_T:
        states, labels = solve_blocks(RB_S, field)
        mats = {}
        msj, jz, jp = spin_ops(1)
        msi, iz, ip = spin_ops(3)
        gj, gi = RB_S["gJ"], RB_S["gI"]
        ej, ei = np.eye(2), np.eye(4)
        mats[0] = gj * np.kron(jz, ei) + gi * np.kron(ej, iz)
        mats[1] = -(gj * np.kron(jp, ei) + gi * np.kron(ej, ip)) / np.sqrt(2)
        mats[-1] = (gj * np.kron(jp.T, ei) + gi * np.kron(ej, ip.T)) / np.sqrt(2)
        rows = []
        for a in states:
            for b in states:
                if b["energy"] <= a["energy"]:
                    continue
                tq = b["twoM"] - a["twoM"]
                if abs(tq) > 2:
                    continue
                amp = b["vec"] @ mats[tq // 2] @ a["vec"]
                if amp * amp < 1e-20:
                    continue
                rows.append(dict(lowerTwoM=a["twoM"], lowerRank=a["rank"], upperTwoM=b["twoM"], upperRank=b["rank"],
                                 frequencyHz=b["energy"] - a["energy"], dfdB=b["slope"] - a["slope"], strength=amp * amp))
        out.append(dict(fieldT=field, transitions=rows))
    return out


# ---------------------------------------------------------------- 5. two-photon point, Breit-Rabi
def breit_rabi_two_photon_point():
    dE = RB_S["A"] * (RB_S["twoI"] + 1) / 2  # A (I + 1/2)
    two_i_plus_1 = RB_S["twoI"] + 1
    gj, gi = RB_S["gJ"], RB_S["gI"]

    def slope_of(sign, m, b):
        """Analytic dE/dB of the Breit-Rabi branch (no finite differences)."""
        x = (gj - gi) * MU_B_HZ_PER_T * b / dE
        dx = (gj - gi) * MU_B_HZ_PER_T / dE
        a = 4 * m / two_i_plus_1
        return gi * MU_B_HZ_PER_T * m + sign * dE / 2 * (a + 2 * x) * dx / (2 * np.sqrt(1 + a * x + x * x))

    def slope(b):
        return slope_of(1, 1, b) - slope_of(-1, -1, b)

    return brentq(slope, 1e-4, 1e-3, xtol=1e-16)


def main():
    ref = dict(
        generator="scripts/reference/transitions_strengths.py",
        libraries=dict(sympy=sympy.__version__, numpy=np.__version__, scipy=scipy.__version__),
        muBOverHHzPerT=MU_B_HZ_PER_T,
        sodiumD1=sodium_line(1, 1),
        sodiumD2=sodium_line(3, 1),
        rb87Levels=dict(ground=RB_S, upper=RB_P),
        rb87D2ZeroField=rb_d2_zero_field(),
        rb87D2Fields=rb_d2_finite_fields(),
        rb87GroundM1ZeroField=rb_m1_zero_field(),
        rb87GroundM1Fields=rb_m1_finite_fields(),
        rb87TwoPhotonPointBreitRabiT=breit_rabi_two_photon_point(),
    )
    path = os.path.join("tests", "reference", "transitions_strengths.json")
    with open(path, "w") as f:
        json.dump(ref, f, indent=1)
        f.write("\n")
    print("wrote", path)


if __name__ == "__main__":
    main()

#!/usr/bin/env python3
"""Reference vectors for the beam-deflection model (server/src/physics/beam/).

Writes tests/reference/beam_reference.json with, made by SciPy quad / optimize and
NumPy (versions recorded in the file):
  * speed laws: oven flux v^3 exp(-v^2/alpha^2) and jet flux v^3 exp(-(v-u)^2/alpha^2):
    normalisation, <1/v^2>, <v>, rms spread, most probable speed, slower fractions;
  * Gauss-Legendre nodes (numpy.polynomial.legendre.leggauss);
  * the two-slit image: trapezoid (x) detector box, by numerical convolution;
  * full detector patterns P(x) = int p(z) K(x - z) dz by nested quad, with peak
    position and FWHM (scipy.optimize), for invented oven and jet scenarios;
  * a seeded Monte-Carlo sample (numpy.random.default_rng) of the same beams
    (speed, slit positions, detector aperture) with in-range fraction, mean and quantiles.

Run from the repository root:  python3 scripts/reference/beam_reference.py
Independent of the TypeScript: nothing here is read from the project's code.
"""
import json
import math
import os

import numpy as np
import scipy
import scipy.constants as sc
from scipy import integrate, optimize

KB = sc.k
U = sc.physical_constants["atomic mass constant"][0]
MU_B = sc.physical_constants["Bohr magneton"][0]


# ---------- speed laws (unnormalised flux densities) ----------
def oven_flux(v, alpha):
    return v**3 * np.exp(-(v / alpha) ** 2)


def jet_flux(v, u, alpha):
    return v**3 * np.exp(-(((v - u) / alpha) ** 2))


def law_moments(f, lo, hi, peak_guess, want_mode=True):
    pts = [peak_guess]
    norm = integrate.quad(f, lo, hi, points=pts, epsabs=0, epsrel=1e-13, limit=500)[0]
    m1 = integrate.quad(lambda v: v * f(v), lo, hi, points=pts, epsabs=0, epsrel=1e-13, limit=500)[0] / norm
    c2 = integrate.quad(lambda v: (v - m1) ** 2 * f(v), lo, hi, points=pts, epsabs=0, epsrel=1e-13, limit=500)[0] / norm
    inv2 = integrate.quad(lambda v: f(v) / v**2, lo, hi, points=pts, epsabs=0, epsrel=1e-13, limit=500)[0] / norm
    mp = None
    if want_mode:
        # the flux densities here are unimodal on (lo, hi)
        mp = optimize.minimize_scalar(lambda v: -f(v) / f(peak_guess), bounds=(max(lo, 1e-6 * hi), hi), method="bounded",
                                      options={"xatol": 1e-12 * hi, "maxiter": 2000}).x
    return norm, m1, math.sqrt(c2), inv2, mp


def slower_fraction(f, norm, v, lo):
    return integrate.quad(f, lo, v, epsabs=0, epsrel=1e-13, limit=500)[0] / norm


def oven_case(mass_u, temp_k):
    m = mass_u * U
    alpha = math.sqrt(2 * KB * temp_k / m)
    f = lambda v: oven_flux(v, alpha)
    norm, mean, rms, inv2, mp = law_moments(f, 0, 40 * alpha, alpha)
    speeds = [0.3 * alpha, alpha, 1.7 * alpha, 3 * alpha]
    return {
        "mass_u": mass_u,
        "temperature_K": temp_k,
        "mean_inverse_square": inv2,
        "mean_speed": mean,
        "rms_spread": rms,
        "most_probable_speed": mp,
        "slower_fraction": [[v, slower_fraction(f, norm, v, 0)] for v in speeds],
    }


def jet_shape_ratio(s):
    """rms/mean of w^3 exp(-(w - s)^2) for speed ratio s."""
    f = lambda w: jet_flux(w, s, 1.0)
    lo = max(0.0, s - 12)
    _, mean, rms, _, _ = law_moments(f, lo, s + 12, max(s, 1.0), want_mode=False)
    return rms / mean


def jet_case(mean_speed, rel_spread):
    s = optimize.brentq(lambda x: jet_shape_ratio(x) - rel_spread, 1e-6, 4 / rel_spread + 20, xtol=1e-13, rtol=1e-14)
    f1 = lambda w: jet_flux(w, s, 1.0)
    lo = max(0.0, s - 12)
    _, mean_w, _, _, _ = law_moments(f1, lo, s + 12, max(s, 1.0), want_mode=False)
    alpha = mean_speed / mean_w
    u = s * alpha
    f = lambda v: jet_flux(v, u, alpha)
    vlo = max(0.0, u - 12 * alpha)
    norm, mean, rms, inv2, mp = law_moments(f, vlo, u + 12 * alpha, max(u, alpha))
    speeds = [u - 2 * alpha, u - 0.5 * alpha, u, u + alpha]
    speeds = [v for v in speeds if v > 0]
    return {
        "mean_speed_in": mean_speed,
        "relative_spread_in": rel_spread,
        "speed_ratio": s,
        "stream_speed": u,
        "alpha": alpha,
        "mean_inverse_square": inv2,
        "mean_speed": mean,
        "rms_spread": rms,
        "most_probable_speed": mp,
        "slower_fraction": [[v, slower_fraction(f, norm, v, vlo)] for v in speeds],
    }


# ---------- instrument kernel ----------
def trapezoid(y, a, b):
    """Unit-area image of two uniformly lit slits: box(a) convolved with box(b)."""
    top = 1 / max(a, b)
    xs = [-(a + b) / 2, -abs(a - b) / 2, abs(a - b) / 2, (a + b) / 2]
    return np.interp(y, xs, [0, top, top, 0], left=0, right=0)


def kernel(x, a, b, w):
    if w == 0:
        return float(trapezoid(x, a, b))
    pts = [p for p in (-(a + b) / 2, -abs(a - b) / 2, abs(a - b) / 2, (a + b) / 2) if x - w / 2 < p < x + w / 2]
    val = integrate.quad(lambda y: trapezoid(y, a, b), x - w / 2, x + w / 2, points=pts or None, epsabs=1e-15, epsrel=1e-12)[0]
    return val / w


def image_widths(g):
    l = g["magnetLengthM"] + g["driftM"]
    a = g["slit2M"] * (1 + l / g["slitSeparationM"])
    b = g["slit1M"] * l / g["slitSeparationM"]
    return a, b


# ---------- full pattern by nested quadrature ----------
def pattern_case(name, g, mass_u, moment, source, xs_rel):
    m = mass_u * U
    lever = 0.5 * g["magnetLengthM"] ** 2 + g["magnetLengthM"] * g["driftM"]
    k = moment * g["gradientTPerM"] * lever / m  # z = k / v^2
    a, b = image_widths(g)
    w = g["detectorWidthM"]
    half = (a + b + w) / 2
    if source["kind"] == "effusive":
        alpha = math.sqrt(2 * KB * source["temperatureK"] / m)
        f = lambda v: oven_flux(v, alpha)
        vlo, vhi = 0.0, 12 * alpha
        vpeak = alpha
    else:
        jc = jet_case(source["meanSpeed"], source["relativeSpread"])
        u, alpha = jc["stream_speed"], jc["alpha"]
        f = lambda v: jet_flux(v, u, alpha)
        vlo, vhi = max(0.0, u - 12 * alpha), u + 12 * alpha
        vpeak = u
    norm = integrate.quad(f, vlo, vhi, points=[vpeak], epsabs=0, epsrel=1e-13, limit=500)[0]
    # density of z (k > 0): p(z) = f(v) |dv/dz| / norm, v = sqrt(k/z)
    def pz(z):
        if z <= 0:
            return 0.0
        v = math.sqrt(k / z)
        return f(v) * 0.5 * math.sqrt(k) * z**-1.5 / norm

    def pattern(x):
        lo = max(1e-30, x - half)
        hi = x + half
        if hi <= 0:
            return 0.0
        kinks = [x + s1 * (a + b) / 2 + s2 * w / 2 for s1 in (-1, 1) for s2 in (-1, 1)]
        kinks += [x + s1 * abs(a - b) / 2 + s2 * w / 2 for s1 in (-1, 1) for s2 in (-1, 1)]
        kinks = sorted(p for p in kinks if lo < p < hi)
        return integrate.quad(lambda z: pz(z) * kernel(x - z, a, b, w), lo, hi, points=kinks or None,
                              epsabs=0, epsrel=1e-10, limit=400)[0]

    # mode of the z-density as a starting point for the pattern's peak
    z0 = k / vpeak**2
    zmode = optimize.minimize_scalar(lambda z: -pz(z), bounds=(0.02 * z0, 5 * z0), method="bounded",
                                     options={"xatol": 1e-9 * z0}).x
    res = optimize.minimize_scalar(lambda x: -pattern(x), bracket=(zmode - half, zmode, zmode + half), tol=1e-10)
    xpk, hpk = res.x, -res.fun
    left = optimize.brentq(lambda x: pattern(x) - hpk / 2, xpk - 50 * half - 10 * zmode, xpk, xtol=1e-13)
    right = optimize.brentq(lambda x: pattern(x) - hpk / 2, xpk, xpk + 50 * half + 50 * zmode, xtol=1e-13)
    xs = [xpk + r * (right - left) for r in xs_rel]
    return {
        "name": name,
        "geometry": g,
        "mass_u": mass_u,
        "moment_JT": moment,
        "source": source,
        "coefficient_m3_per_s2": k,
        "image_a_m": a,
        "image_b_m": b,
        "peak_position_m": xpk,
        "peak_height_per_m": hpk,
        "fwhm_m": right - left,
        "samples": [[x, pattern(x)] for x in xs],
    }


# ---------- Monte-Carlo of the same beams ----------
def monte_carlo(case, span, n_batches=16, per_batch=250_000, seed=20240611):
    g = case["geometry"]
    m = case["mass_u"] * U
    k = case["coefficient_m3_per_s2"]
    l = g["magnetLengthM"] + g["driftM"]
    d = g["slitSeparationM"]
    rng = np.random.default_rng(seed)
    src = case["source"]
    fractions, means, quants = [], [], []
    for _ in range(n_batches):
        if src["kind"] == "effusive":
            alpha = math.sqrt(2 * KB * src["temperatureK"] / m)
            v = alpha * np.sqrt(rng.gamma(2.0, 1.0, per_batch))  # v^2/alpha^2 ~ Gamma(2) for v^3 e^{-v^2/alpha^2}
        else:
            jc = jet_case(src["meanSpeed"], src["relativeSpread"])
            s, alpha = jc["speed_ratio"], jc["alpha"]
            wmax = s + 8
            out = []
            got = 0
            while got < per_batch:
                w = rng.normal(s, math.sqrt(0.5), 4 * per_batch)
                keep = (w > 0) & (w < wmax) & (rng.random(w.size) < (np.clip(w, 0, None) / wmax) ** 3)
                out.append(w[keep])
                got += int(keep.sum())
            v = alpha * np.concatenate(out)[:per_batch]
        z = k / v**2
        y1 = rng.uniform(-g["slit1M"] / 2, g["slit1M"] / 2, per_batch)
        y2 = rng.uniform(-g["slit2M"] / 2, g["slit2M"] / 2, per_batch)
        det = rng.uniform(-g["detectorWidthM"] / 2, g["detectorWidthM"] / 2, per_batch)
        x = z + y2 * (1 + l / d) - y1 * l / d + det
        inside = x[(x >= span[0]) & (x <= span[1])]
        fractions.append(inside.size / per_batch)
        means.append(float(inside.mean()))
        quants.append(np.quantile(inside, [0.1, 0.25, 0.5, 0.75, 0.9]))
    quants = np.array(quants)
    se = lambda arr: float(np.std(arr, ddof=1) / math.sqrt(len(arr)))
    return {
        "seed": seed,
        "samples": n_batches * per_batch,
        "span_m": span,
        "fraction_inside": float(np.mean(fractions)),
        "fraction_inside_se": se(fractions),
        "mean_inside_m": float(np.mean(means)),
        "mean_inside_se_m": se(means),
        "quantile_levels": [0.1, 0.25, 0.5, 0.75, 0.9],
        "quantiles_m": quants.mean(axis=0).tolist(),
        "quantiles_se_m": [se(quants[:, i]) for i in range(quants.shape[1])],
    }


def main():
    geometry_a = {"slit1M": 60e-6, "slit2M": 40e-6, "slitSeparationM": 0.5, "magnetLengthM": 0.1,
                  "driftM": 0.4, "detectorWidthM": 20e-6, "gradientTPerM": 100.0}
    geometry_b = dict(geometry_a, detectorWidthM=10e-6, gradientTPerM=60.0)
    xs_rel = [-1.5, -1.0, -0.6, -0.3, -0.1, 0.0, 0.1, 0.3, 0.6, 1.0, 2.0, 4.0]
    oven = pattern_case("oven, 40 u at 600 K, moment = Bohr magneton", geometry_a, 40.0, MU_B,
                        {"kind": "effusive", "temperatureK": 600.0}, xs_rel)
    jet = pattern_case("jet, 23 u at 800 m/s with 8 % rms spread, moment = Bohr magneton", geometry_b, 23.0, MU_B,
                       {"kind": "jet", "meanSpeed": 800.0, "relativeSpread": 0.08}, xs_rel)
    # Monte-Carlo ranges: well below the undeflected image up to 12 (oven) / 3 (jet) times the mean deflection
    oven_mean = oven["coefficient_m3_per_s2"] * (40.0 * U) / (2 * KB * 600.0)
    oven["monte_carlo"] = monte_carlo(oven, [-1e-3, 12 * oven_mean])
    jet_inv2 = jet_case(800.0, 0.08)["mean_inverse_square"]
    jet["monte_carlo"] = monte_carlo(jet, [-1e-3, 3 * jet["coefficient_m3_per_s2"] * jet_inv2])

    a, b = image_widths(geometry_a)
    kernels = []
    for (aa, bb, w) in [(a, b, 20e-6), (a, b, 0.0), (50e-6, 50e-6, 5e-6), (30e-6, 90e-6, 200e-6)]:
        xs = np.linspace(-(aa + bb + w) / 2 * 1.1, (aa + bb + w) / 2 * 1.1, 23)
        kernels.append({"a": aa, "b": bb, "w": w, "samples": [[float(x), kernel(float(x), aa, bb, w)] for x in xs]})

    gl = {}
    for n in (5, 8, 12):
        nodes, weights = np.polynomial.legendre.leggauss(n)
        gl[str(n)] = {"nodes": nodes.tolist(), "weights": weights.tolist()}

    out = {
        "source": "SciPy quad/brentq/minimize_scalar and NumPy (leggauss, default_rng Monte-Carlo); constants from scipy.constants (CODATA 2022)",
        "generator": "scripts/reference/beam_reference.py",
        "scipy_version": scipy.__version__,
        "numpy_version": np.__version__,
        "oven_laws": [oven_case(40.0, 600.0), oven_case(7.0, 720.0), oven_case(133.0, 400.0)],
        "jet_laws": [jet_case(800.0, 0.08), jet_case(1500.0, 0.02), jet_case(500.0, 0.3)],
        "gauss_legendre": gl,
        "kernels": kernels,
        "patterns": [oven, jet],
    }
    path = os.path.join("tests", "reference", "beam_reference.json")
    with open(path, "w", encoding="utf-8") as fh:
        json.dump(out, fh, indent=1)
        fh.write("\n")
    print(f"wrote {path}")


if __name__ == "__main__":
    main()

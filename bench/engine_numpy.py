#!/usr/bin/env python3
"""NumPy side of the engine benchmark (run by bench/run.mjs through engine.bench.ts).

Same physics as the TypeScript sweep: Cs 6P3/2 (J = 3/2, I = 7/2, A = 50.28827 MHz,
B = -0.4934 MHz, g_J = 1.3340, g_I = -0.00039885395), energies and Hellmann-Feynman
moments at N evenly spaced fields, done two ways:
  loop    - numpy.linalg.eigh of the full 32 x 32 matrix, one field at a time;
  blocked - the m blocks of equal size stacked across blocks and fields, one
            batched eigh call per block size (rank in block = adiabatic label).
Prints one JSON line with timings; writes both energy tables (sorted per field,
float64 little-endian, loop table first) to --out for the accuracy comparison.
"""
import argparse
import json
import statistics
import time

import numpy as np
import scipy.constants as sc

TWO_J, TWO_I = 3, 7
A_HZ, B_HZ = 50.28827e6, -0.4934e6
G_J, G_I = 1.3340, -0.00039885395
MU = sc.physical_constants["Bohr magneton"][0] / sc.h
H = sc.h


def spin(two_j):
    j = two_j / 2
    ms = np.array([j - k for k in range(two_j + 1)])
    jp = np.zeros((two_j + 1, two_j + 1))
    for k in range(1, two_j + 1):
        jp[k - 1, k] = np.sqrt(j * (j + 1) - ms[k] * (ms[k] + 1))
    return ms, np.diag(ms), jp


def parts():
    mj, jz, jp = spin(TWO_J)
    mi, iz, ip = spin(TWO_I)
    x = np.kron(jz, iz) + 0.5 * (np.kron(jp, ip.T) + np.kron(jp.T, ip))
    i_, j_ = TWO_I / 2, TWO_J / 2
    quad = (3 * x @ x + 1.5 * x - i_ * (i_ + 1) * j_ * (j_ + 1) * np.eye(len(x))) / (
        2 * i_ * (2 * i_ - 1) * j_ * (2 * j_ - 1)
    )
    h0 = A_HZ * x + B_HZ * quad
    z = MU * (G_J * np.kron(np.diag(mj), np.eye(TWO_I + 1)) + G_I * np.kron(np.eye(TWO_J + 1), np.diag(mi)))
    two_m = np.round(2 * (np.repeat(mj, TWO_I + 1) + np.tile(mi, TWO_J + 1))).astype(int)
    return h0, np.diag(z).copy(), two_m


def loop_sweep(h0, z, fields):
    energies = np.empty((len(fields), len(z)))
    moments = np.empty_like(energies)
    zmat = np.diag(z)
    for p, b in enumerate(fields):
        w, v = np.linalg.eigh(h0 + b * zmat)
        energies[p] = w
        moments[p] = -H * np.einsum("ik,i,ik->k", v, z, v)
    return energies, moments


def blocked_sweep(h0, z, two_m, fields):
    blocks = [np.where(two_m == m)[0] for m in sorted(set(two_m.tolist()))]
    by_size = {}
    for idx in blocks:
        by_size.setdefault(len(idx), []).append(idx)
    out = {}
    for size, group in by_size.items():
        h0s = np.stack([h0[np.ix_(idx, idx)] for idx in group])  # (nb, s, s)
        zs = np.stack([z[idx] for idx in group])  # (nb, s)
        diag = fields[None, :, None] * zs[:, None, :]  # (nb, points, s)
        mats = np.broadcast_to(h0s[:, None], (len(group), len(fields), size, size)).copy()
        mats[..., np.arange(size), np.arange(size)] += diag
        w, v = np.linalg.eigh(mats)
        mom = -H * np.einsum("bpik,bi,bpik->bpk", v, zs, v)
        for g, idx in enumerate(group):
            out[tuple(idx)] = (w[g], mom[g])  # (points, s): rank = adiabatic label
    return out


def timed(fn, repeats):
    times, result = [], None
    for _ in range(repeats):
        t0 = time.perf_counter()
        result = fn()
        times.append((time.perf_counter() - t0) * 1e3)
    return statistics.median(times), result


def main():
    ap = argparse.ArgumentParser()
    ap.add_argument("--points", type=int, default=2001)
    ap.add_argument("--from-t", type=float, default=0.0)
    ap.add_argument("--to-t", type=float, default=1.0)
    ap.add_argument("--repeats", type=int, default=5)
    ap.add_argument("--out", required=True)
    args = ap.parse_args()
    fields = np.linspace(args.from_t, args.to_t, args.points)
    h0, z, two_m = parts()
    loop_ms, (loop_e, _) = timed(lambda: loop_sweep(h0, z, fields), args.repeats)
    blocked_ms, blocked = timed(lambda: blocked_sweep(h0, z, two_m, fields), args.repeats)
    blocked_e = np.sort(np.concatenate([w for w, _ in blocked.values()], axis=1), axis=1)
    with open(args.out, "wb") as f:
        np.ascontiguousarray(loop_e, dtype="<f8").tofile(f)
        np.ascontiguousarray(blocked_e, dtype="<f8").tofile(f)
    print(
        json.dumps(
            {
                "numpy": np.__version__,
                "points": args.points,
                "states": len(z),
                "loopMs": loop_ms,
                "blockedMs": blocked_ms,
                "repeats": args.repeats,
            }
        )
    )


if __name__ == "__main__":
    main()

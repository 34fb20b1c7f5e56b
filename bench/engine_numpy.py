#!/usr/bin/env python3
"""NumPy side of the engine benchmark (run by bench/run.mjs through engine.bench.ts).

Same physics and the same outputs as the TypeScript sweep: Cs 6P3/2 (J = 3/2, I = 7/2,
A = 50.28827 MHz, B = -0.4934 MHz, g_J = 1.3340, g_I = -0.00039885395), energies and
Hellmann-Feynman moments (so eigenvectors are needed) at N evenly spaced fields, done
three ways, each with numpy.linalg.eigh with vectors:
  loop-full    - one field at a time, the full 32 x 32 matrix (as the reference script
                 scripts/reference/engine_cs6p32.py does it);
  loop-blocks  - one field and one m block at a time;
  blocked      - the m blocks of equal size stacked across blocks and fields, one
                 batched eigh call per block size (rank in block = adiabatic label).
Each variant does only the work its outputs need: the matrix at a field is H0 plus the
diagonal B*z, written in place, and the moments are sum_i v_ik^2 z_i.
Prints one JSON line with timings; writes the energy tables (sorted per field, float64
little-endian, in the order loop-full, loop-blocks, blocked) to --out for the accuracy
comparison.
With --serve it writes the tables, prints one JSON line (version, states) and then runs one
variant per line read from stdin (its name), answering each with one JSON line of that run's
CPU and wall time (ms): the engine bench alternates its own runs with these, round by round,
so that both sides see the same load.
"""
import argparse
import json
import statistics
import sys
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


def block_indices(two_m):
    return [np.where(two_m == m)[0] for m in sorted(set(two_m.tolist()))]


def loop_full(h0, z, two_m, fields):
    n = len(z)
    energies = np.empty((len(fields), n))
    moments = np.empty_like(energies)
    diag = np.arange(n)
    m = np.empty_like(h0)
    for p, b in enumerate(fields):
        m[...] = h0
        m[diag, diag] += b * z
        w, v = np.linalg.eigh(m)
        energies[p] = w
        moments[p] = -H * ((v * v).T @ z)
    return energies, moments


def loop_blocks(h0, z, two_m, fields):
    blocks = [(idx, h0[np.ix_(idx, idx)], z[idx]) for idx in block_indices(two_m)]
    energies = np.empty((len(fields), len(z)))
    moments = np.empty_like(energies)
    for p, b in enumerate(fields):
        at = 0
        for idx, hb, zb in blocks:
            s = len(idx)
            m = hb.copy()
            m[np.arange(s), np.arange(s)] += b * zb
            w, v = np.linalg.eigh(m)
            energies[p, at : at + s] = w
            moments[p, at : at + s] = -H * ((v * v).T @ zb)
            at += s
    return energies, moments


def blocked(h0, z, two_m, fields):
    by_size = {}
    for idx in block_indices(two_m):
        by_size.setdefault(len(idx), []).append(idx)
    energies, moments = [], []
    for size, group in by_size.items():
        h0s = np.stack([h0[np.ix_(idx, idx)] for idx in group])  # (nb, s, s)
        zs = np.stack([z[idx] for idx in group])  # (nb, s)
        mats = np.broadcast_to(h0s[:, None], (len(group), len(fields), size, size)).copy()
        mats[..., np.arange(size), np.arange(size)] += fields[None, :, None] * zs[:, None, :]
        w, v = np.linalg.eigh(mats)  # (nb, points, s), (nb, points, s, s)
        mom = -H * np.einsum("bpik,bi->bpk", v * v, zs)
        energies.extend(w)  # each (points, s): rank = adiabatic label
        moments.extend(mom)
    return np.concatenate(energies, axis=1), np.concatenate(moments, axis=1)


def timed(fn, repeats):
    """Wall and CPU time (ms) of `repeats` runs: on a shared machine the CPU time of this
    process is the steadier measure, the wall time the one a user sees."""
    wall, cpu, result = [], [], None
    for _ in range(repeats):
        w0, c0 = time.perf_counter(), time.process_time()
        result = fn()
        cpu.append((time.process_time() - c0) * 1e3)
        wall.append((time.perf_counter() - w0) * 1e3)
    stats = {"medianMs": statistics.median(wall), "bestMs": min(wall), "cpuMedianMs": statistics.median(cpu), "cpuBestMs": min(cpu)}
    return stats, result


def serve(h0, z, two_m, fields, variants):
    """One timed run per variant name read from stdin; an empty line ends."""
    for line in sys.stdin:
        name = line.strip()
        if not name:
            break
        fn = variants[name]
        w0, c0 = time.perf_counter(), time.process_time()
        fn(h0, z, two_m, fields)
        cpu = (time.process_time() - c0) * 1e3
        wall = (time.perf_counter() - w0) * 1e3
        print(json.dumps({"cpuMs": cpu, "wallMs": wall}), flush=True)


def main():
    ap = argparse.ArgumentParser()
    ap.add_argument("--points", type=int, default=2001)
    ap.add_argument("--from-t", type=float, default=0.0)
    ap.add_argument("--to-t", type=float, default=1.0)
    ap.add_argument("--repeats", type=int, default=7)
    ap.add_argument("--out", required=True)
    ap.add_argument("--serve", action="store_true")
    args = ap.parse_args()
    fields = np.linspace(args.from_t, args.to_t, args.points)
    h0, z, two_m = parts()
    variants = {"loopFull": loop_full, "loopBlocks": loop_blocks, "blocked": blocked}
    if args.serve:
        with open(args.out, "wb") as f:
            for fn in variants.values():
                e, _ = fn(h0, z, two_m, fields)
                np.ascontiguousarray(np.sort(e, axis=1), dtype="<f8").tofile(f)
        print(json.dumps({"numpy": np.__version__, "points": args.points, "states": len(z)}), flush=True)
        serve(h0, z, two_m, fields, variants)
        return
    times = {}
    with open(args.out, "wb") as f:
        for name, fn in variants.items():
            times[name], (e, _) = timed(lambda: fn(h0, z, two_m, fields), args.repeats)
            np.ascontiguousarray(np.sort(e, axis=1), dtype="<f8").tofile(f)
    print(json.dumps({"numpy": np.__version__, "points": args.points, "states": len(z), "repeats": args.repeats, **times}))


if __name__ == "__main__":
    main()

#!/usr/bin/env python3
"""LAPACK reference for bench/eigen.bench.ts: numpy.linalg.eigh (eigenvalues and
vectors) on random symmetric matrices of the given orders, one BLAS thread.
Prints one JSON line: numpy version, the OpenBLAS core in use, and per order the
median and best microseconds per decomposition (wall and CPU time of this process).

With --serve it stays up for the alternating protocol (bench/eigenSteady.ts): it prints one
JSON line with the version and core, then answers each request line
"PATH N COUNT TIMINGS" (COUNT matrices of order N as float64 rows in PATH, the same matrices
the engine solves) with one JSON line: the CPU microseconds per call of TIMINGS timings, each
one eigh of every matrix."""
import argparse
import ctypes
import glob
import json
import os
import statistics
import sys
import time

import numpy as np


def openblas_core():
    """Name of the OpenBLAS kernel numpy's bundled library runs (None if it cannot be asked)."""
    libs = glob.glob(os.path.join(os.path.dirname(np.__file__), "..", "numpy.libs", "*openblas*"))
    for path in libs:
        lib = ctypes.CDLL(path)
        for name in ("scipy_openblas_get_corename64_", "openblas_get_corename64_", "openblas_get_corename"):
            if hasattr(lib, name):
                fn = getattr(lib, name)
                fn.restype = ctypes.c_char_p
                return fn().decode()
    return None


def serve():
    """Answer timing requests on stdin until it closes (one JSON line each)."""
    print(json.dumps({"numpy": np.__version__, "core": openblas_core()}), flush=True)
    loaded = {}
    for line in sys.stdin:
        path, n, count, timings = line.split()
        n, count, timings = int(n), int(count), int(timings)
        if path not in loaded:
            loaded[path] = [m.copy() for m in np.fromfile(path, dtype=np.float64).reshape(count, n, n)]
            np.linalg.eigh(loaded[path][0])  # warm-up
        mats = loaded[path]
        cpu = []
        for _ in range(timings):
            c0 = time.process_time()
            for m in mats:
                np.linalg.eigh(m)
            cpu.append((time.process_time() - c0) * 1e6 / count)
        print(json.dumps({"cpu": cpu}), flush=True)


def main():
    ap = argparse.ArgumentParser()
    ap.add_argument("--orders", default="16,32,64,128,160,192,256")
    ap.add_argument("--serve", action="store_true")
    args = ap.parse_args()
    if args.serve:
        serve()
        return
    rng = np.random.default_rng(1234)
    out = {"numpy": np.__version__, "core": openblas_core(), "orders": {}}
    for n in [int(x) for x in args.orders.split(",")]:
        count = max(4, 2000 // n)
        mats = []
        for _ in range(count):
            a = rng.uniform(-0.5, 0.5, (n, n))
            mats.append((a + a.T) / 2)
        np.linalg.eigh(mats[0])  # warm-up
        reps = max(1, 20000 // (n * n))
        wall, cpu = [], []
        for _ in range(5):
            w0, c0 = time.perf_counter(), time.process_time()
            for _ in range(reps):
                for m in mats:
                    np.linalg.eigh(m)
            cpu.append((time.process_time() - c0) * 1e6 / (reps * count))
            wall.append((time.perf_counter() - w0) * 1e6 / (reps * count))
        out["orders"][n] = {"median": statistics.median(wall), "best": min(wall), "cpuMedian": statistics.median(cpu), "cpuBest": min(cpu)}
    print(json.dumps(out))


if __name__ == "__main__":
    main()

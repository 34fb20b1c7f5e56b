#!/usr/bin/env python3
"""LAPACK reference for bench/eigen.bench.ts: numpy.linalg.eigh (eigenvalues and
vectors) on random symmetric matrices of the given orders, one BLAS thread.
Prints one JSON line: numpy version, the OpenBLAS core in use, and per order the
median and best microseconds per decomposition (wall and CPU time of this process)."""
import argparse
import ctypes
import glob
import json
import os
import statistics
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


def main():
    ap = argparse.ArgumentParser()
    ap.add_argument("--orders", default="16,32,64,128,160,192,256")
    args = ap.parse_args()
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

#!/usr/bin/env python3
"""Write tests/reference/wigner.json: Wigner 3j, 6j and Clebsch-Gordan reference values
computed exactly by SymPy's sympy.physics.wigner (then rounded to double).

Run from the repository root:  python3 scripts/reference/wigner.py
All quantum numbers are stored as twice their value (twoJ...), matching the TypeScript API.
The draw is seeded, so re-running gives the same file.
"""
import json
import os
import random

import sympy
from sympy import Rational
from sympy.physics.wigner import clebsch_gordan, wigner_3j, wigner_6j

SEED = 20240607
rng = random.Random(SEED)


def half(two: int) -> Rational:
    return Rational(two, 2)


def tri_range(ta: int, tb: int):
    """All twoC with (a, b, c) a triangle and a+b+c integer."""
    return list(range(abs(ta - tb), ta + tb + 1, 2))


def m_values(tj: int):
    return list(range(-tj, tj + 1, 2))


def to_float(expr) -> float:
    return float(sympy.N(expr, 40))


def safe(fn, *args):
    """SymPy raises on some unphysical arguments; the physical answer there is 0."""
    try:
        return fn(*args)
    except ValueError:
        return sympy.Integer(0)


def random_3j(max_two: int):
    while True:
        t1 = rng.randint(0, max_two)
        t2 = rng.randint(0, max_two)
        t3 = rng.choice(tri_range(t1, t2))
        m1 = rng.choice(m_values(t1))
        m2 = rng.choice(m_values(t2))
        m3 = -m1 - m2
        if abs(m3) <= t3:
            return [t1, t2, t3, m1, m2, m3]


def random_6j(max_two: int):
    while True:
        t1 = rng.randint(0, max_two)
        t2 = rng.randint(0, max_two)
        t3 = rng.choice(tri_range(t1, t2))
        t4 = rng.randint(0, max_two)
        t5 = rng.choice(tri_range(t4, t3))
        lo = max(abs(t1 - t5), abs(t4 - t2))
        hi = min(t1 + t5, t4 + t2)
        cands = [t6 for t6 in range(lo, hi + 1) if (t1 + t5 + t6) % 2 == 0 and (t4 + t2 + t6) % 2 == 0]
        if cands:
            return [t1, t2, t3, t4, t5, rng.choice(cands)]


def main() -> None:
    three_j = []
    # Random valid cases: mostly small (the physics uses small J), some large to stress exactness.
    for max_two, count in ((6, 120), (12, 120), (30, 50), (80, 20)):
        for _ in range(count):
            a = random_3j(max_two)
            v = safe(wigner_3j, *[half(x) for x in a])
            three_j.append({"args": a, "value": to_float(v), "exact": str(v)})
    # Zero cases: broken triangle, m-sum not zero, |m| > j, all m = 0 with odd j1+j2+j3.
    zero_3j = [
        [2, 2, 6, 0, 0, 0],
        [1, 1, 4, 1, -1, 0],
        [2, 2, 2, 2, 0, 0],
        [2, 2, 2, 0, 0, 0],
        [4, 2, 4, 0, 0, 0],
        [6, 4, 4, 0, 0, 0],
        [1, 1, 2, 3, -3, 0],
        [2, 4, 2, 2, 0, -4],
        [1, 3, 2, 1, 1, -1],
        [3, 3, 0, 1, 1, -2],
    ]
    for a in zero_3j:
        v = safe(wigner_3j, *[half(x) for x in a])
        three_j.append({"args": a, "value": to_float(v), "exact": str(v)})

    six_j = []
    for max_two, count in ((6, 120), (12, 100), (30, 40), (60, 15)):
        for _ in range(count):
            a = random_6j(max_two)
            v = safe(wigner_6j, *[half(x) for x in a])
            six_j.append({"args": a, "value": to_float(v), "exact": str(v)})
    zero_6j = [
        [2, 2, 6, 2, 2, 2],  # (1 1 3) not a triangle
        [1, 1, 2, 1, 1, 3],  # (j1 j5 j6) = (1/2 1/2 3/2) fails
        [2, 2, 2, 2, 2, 5],  # half-integer sum
        [0, 2, 2, 4, 2, 2],  # (0 2 1) fails
    ]
    for a in zero_6j:
        v = safe(wigner_6j, *[half(x) for x in a])
        six_j.append({"args": a, "value": to_float(v), "exact": str(v)})

    cg = []
    for max_two, count in ((6, 100), (14, 80), (40, 20)):
        for _ in range(count):
            t1, t2, t3, m1, m2, m3 = random_3j(max_two)
            # <j1 m1 j2 m2 | J M> with M = m1 + m2 = -m3
            args = [t1, m1, t2, m2, t3, -m3]
            v = safe(clebsch_gordan, half(t1), half(t2), half(t3), half(m1), half(m2), half(-m3))
            cg.append({"args": args, "value": to_float(v), "exact": str(v)})
    for args in ([1, 1, 1, 1, 0, 0], [2, 2, 2, 0, 2, 0], [1, 1, 1, -1, 4, 0]):
        t1, m1, t2, m2, t3, m3 = args
        v = safe(clebsch_gordan, half(t1), half(t2), half(t3), half(m1), half(m2), half(m3))
        cg.append({"args": args, "value": to_float(v), "exact": str(v)})

    out = {
        "source": "sympy.physics.wigner (exact), rounded to IEEE double",
        "sympy_version": sympy.__version__,
        "generator": "scripts/reference/wigner.py",
        "seed": SEED,
        "conventions": {
            "wigner3j": "args = [twoJ1, twoJ2, twoJ3, twoM1, twoM2, twoM3]",
            "wigner6j": "args = [twoJ1, twoJ2, twoJ3, twoJ4, twoJ5, twoJ6] for {j1 j2 j3; j4 j5 j6}",
            "clebschGordan": "args = [twoJ1, twoM1, twoJ2, twoM2, twoJ, twoM] for <j1 m1 j2 m2 | J M>",
        },
        "wigner3j": three_j,
        "wigner6j": six_j,
        "clebschGordan": cg,
    }
    path = os.path.join("tests", "reference", "wigner.json")
    with open(path, "w", encoding="utf-8") as f:
        json.dump(out, f, indent=1)
        f.write("\n")
    print(f"wrote {path}: {len(three_j)} 3j, {len(six_j)} 6j, {len(cg)} CG")


if __name__ == "__main__":
    main()

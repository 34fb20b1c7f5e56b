import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { clebschGordan, isTriangle, wigner3j, wigner6j } from '../../server/src/physics/angularMomentum';

interface RefCase {
  args: number[];
  value: number;
  exact: string;
}
interface WignerReference {
  sympy_version: string;
  wigner3j: RefCase[];
  wigner6j: RefCase[];
  clebschGordan: RefCase[];
}

// Reference values: tests/reference/wigner.json, written by scripts/reference/wigner.py
// from SymPy 1.14 sympy.physics.wigner (exact arithmetic), rounded to double.
const ref = JSON.parse(
  readFileSync(join(__dirname, '..', 'reference', 'wigner.json'), 'utf8'),
) as WignerReference;
const TOL = 1e-12;

describe('Wigner symbols vs SymPy sympy.physics.wigner (tests/reference/wigner.json)', () => {
  it('has a few hundred cases of each kind, including zeros', () => {
    expect(ref.wigner3j.length).toBeGreaterThan(300);
    expect(ref.wigner6j.length).toBeGreaterThan(250);
    expect(ref.clebschGordan.length).toBeGreaterThan(200);
    expect(ref.wigner3j.filter((c) => c.value === 0).length).toBeGreaterThanOrEqual(10);
  });

  it('3j agrees to 1e-12 (and exact zeros are exact)', () => {
    for (const c of ref.wigner3j) {
      const [a, b, d, e, f, g] = c.args;
      const v = wigner3j(a, b, d, e, f, g);
      if (c.value === 0) expect(v, `3j(${c.args})`).toBe(0);
      else expect(Math.abs(v - c.value), `3j(${c.args}) = ${c.exact}`).toBeLessThan(TOL);
    }
  });

  it('6j agrees to 1e-12', () => {
    for (const c of ref.wigner6j) {
      const [a, b, d, e, f, g] = c.args;
      const v = wigner6j(a, b, d, e, f, g);
      if (c.value === 0) expect(v, `6j(${c.args})`).toBe(0);
      else expect(Math.abs(v - c.value), `6j(${c.args}) = ${c.exact}`).toBeLessThan(TOL);
    }
  });

  it('Clebsch–Gordan agrees to 1e-12', () => {
    for (const c of ref.clebschGordan) {
      const [a, b, d, e, f, g] = c.args;
      const v = clebschGordan(a, b, d, e, f, g);
      if (c.value === 0) expect(v, `CG(${c.args})`).toBe(0);
      else expect(Math.abs(v - c.value), `CG(${c.args}) = ${c.exact}`).toBeLessThan(TOL);
    }
  });

  it('is accurate to ~1e-14 relative on the large-j cases (exact BigInt path)', () => {
    const big = ref.wigner3j.filter((c) => Math.max(...c.args.slice(0, 3)) > 40 && c.value !== 0);
    expect(big.length).toBeGreaterThan(5);
    for (const c of big) {
      const [a, b, d, e, f, g] = c.args;
      expect(Math.abs(wigner3j(a, b, d, e, f, g) / c.value - 1)).toBeLessThan(1e-13);
    }
  });
});

describe('textbook closed forms (from memory; standard tables)', () => {
  it('simple 3j and CG values', () => {
    // (1/2 1/2 0; 1/2 -1/2 0) = 1/√2
    expect(wigner3j(1, 1, 0, 1, -1, 0)).toBeCloseTo(Math.SQRT1_2, 15);
    // <1/2 1/2, 1/2 -1/2 | 0 0> = 1/√2, <1/2 -1/2, 1/2 1/2 | 0 0> = -1/√2 (singlet)
    expect(clebschGordan(1, 1, 1, -1, 0, 0)).toBeCloseTo(Math.SQRT1_2, 15);
    expect(clebschGordan(1, -1, 1, 1, 0, 0)).toBeCloseTo(-Math.SQRT1_2, 15);
    // <1 1, 1/2 -1/2 | 3/2 1/2> = √(1/3)
    expect(clebschGordan(2, 2, 1, -1, 3, 1)).toBeCloseTo(Math.sqrt(1 / 3), 15);
    // {1/2 1/2 1; 1/2 1/2 0} = 1/2 ; {1 1 1; 1 1 1} = 1/6
    expect(wigner6j(1, 1, 2, 1, 1, 0)).toBeCloseTo(0.5, 15);
    expect(wigner6j(2, 2, 2, 2, 2, 2)).toBeCloseTo(1 / 6, 15);
  });

  it('(j j 0; m −m 0) = (−1)^(j−m)/√(2j+1) for j up to 70, asked twice (remembered values, both cache keys)', () => {
    // Standard closed form (from memory). 2j = 0 … 140 covers the packed key (2j < 128) and the text key.
    for (let pass = 0; pass < 2; pass++) {
      for (let twoJ = 0; twoJ <= 140; twoJ += 1) {
        for (let twoM = -twoJ; twoM <= twoJ; twoM += 2) {
          const sign = ((twoJ - twoM) / 2) % 2 === 0 ? 1 : -1;
          expect(wigner3j(twoJ, twoJ, 0, twoM, -twoM, 0)).toBeCloseTo(sign / Math.sqrt(twoJ + 1), 13);
        }
      }
    }
  });

  it('returns 0 outside the physical domain and NaN for non-integer twice-values', () => {
    expect(wigner3j(2, 2, 6, 0, 0, 0)).toBe(0);
    expect(wigner3j(2, 2, 2, 2, 2, -4)).toBe(0);
    expect(wigner3j(-2, 2, 2, 0, 0, 0)).toBe(0);
    expect(wigner3j(1.5, 2, 2, 0, 0, 0)).toBeNaN();
    expect(wigner6j(1, 1, 1, 1, 1, 1)).toBe(0); // odd triangle sums
    expect(wigner6j(2, 2, 2, 2, 2, 2.5)).toBeNaN();
  });

  it('isTriangle', () => {
    expect(isTriangle(1, 1, 0)).toBe(true);
    expect(isTriangle(1, 1, 2)).toBe(true);
    expect(isTriangle(1, 1, 4)).toBe(false);
    expect(isTriangle(1, 1, 1)).toBe(false); // 1/2+1/2+1/2 not an integer
    expect(isTriangle(7, 1, 8)).toBe(true);
    expect(isTriangle(7, 1, 6)).toBe(true);
    expect(isTriangle(7, 1, 4)).toBe(false);
  });
});

/** All valid twoM for twoJ. */
function projections(twoJ: number): number[] {
  const out: number[] = [];
  for (let m = -twoJ; m <= twoJ; m += 2) out.push(m);
  return out;
}

describe('orthogonality and sum rules (properties)', () => {
  const smallJ = fc.integer({ min: 0, max: 9 });

  it('Σ_{m1 m2} (2j3+1)(j1 j2 j3; m1 m2 m3)(j1 j2 j3\'; m1 m2 m3) = δ', () => {
    fc.assert(
      fc.property(smallJ, smallJ, fc.nat(20), fc.nat(20), fc.nat(20), (t1, t2, i3, i3b, im) => {
        const allowed = [];
        for (let t3 = Math.abs(t1 - t2); t3 <= t1 + t2; t3 += 2) allowed.push(t3);
        const t3 = allowed[i3 % allowed.length];
        const t3b = allowed[i3b % allowed.length];
        const ms = projections(Math.min(t3, t3b));
        const m3 = ms[im % ms.length];
        let s = 0;
        for (const m1 of projections(t1)) {
          const m2 = -m1 - m3;
          if (Math.abs(m2) > t2) continue;
          s += wigner3j(t1, t2, t3, m1, m2, m3) * wigner3j(t1, t2, t3b, m1, m2, m3);
        }
        const expected = t3 === t3b ? 1 / (t3 + 1) : 0;
        return Math.abs(s - expected) < 1e-13;
      }),
      { numRuns: 200 },
    );
  });

  it('CG completeness: Σ_J |<j1 m1 j2 m2|J M>|² = 1', () => {
    fc.assert(
      fc.property(smallJ, smallJ, fc.nat(30), fc.nat(30), (t1, t2, i1, i2) => {
        const m1 = projections(t1)[i1 % (t1 + 1)];
        const m2 = projections(t2)[i2 % (t2 + 1)];
        let s = 0;
        for (let tJ = Math.abs(t1 - t2); tJ <= t1 + t2; tJ += 2) s += clebschGordan(t1, m1, t2, m2, tJ, m1 + m2) ** 2;
        return Math.abs(s - 1) < 1e-13;
      }),
      { numRuns: 200 },
    );
  });

  it('6j orthogonality: Σ_x (2x+1)(2p+1){a b x; c d p}{a b x; c d p\'} = δ(p, p\')', () => {
    fc.assert(
      fc.property(smallJ, smallJ, smallJ, smallJ, fc.nat(20), fc.nat(20), (a, b, c, d, i, k) => {
        // {a b x; c d p} needs triangles (a b x), (a d p), (c b p), (c d x); pick p, p' allowed.
        const ps: number[] = [];
        for (let p = 0; p <= 20; p++) if (isTriangle(a, d, p) && isTriangle(c, b, p)) ps.push(p);
        if (ps.length === 0) return true;
        const p = ps[i % ps.length];
        const pb = ps[k % ps.length];
        let s = 0;
        for (let x = 0; x <= 20; x++) s += (x + 1) * (p + 1) * wigner6j(a, b, x, c, d, p) * wigner6j(a, b, x, c, d, pb);
        return Math.abs(s - (p === pb ? 1 : 0)) < 1e-12;
      }),
      { numRuns: 200 },
    );
  });

  it('3j symmetry: odd column swap gives (−1)^(j1+j2+j3)', () => {
    fc.assert(
      fc.property(smallJ, smallJ, fc.nat(20), fc.nat(20), fc.nat(20), (t1, t2, i3, i1, i2) => {
        const t3 = Math.abs(t1 - t2) + 2 * (i3 % (Math.min(t1, t2) + 1));
        const m1 = projections(t1)[i1 % (t1 + 1)];
        const m2 = projections(t2)[i2 % (t2 + 1)];
        const m3 = -m1 - m2;
        if (Math.abs(m3) > t3) return true;
        const phase = ((t1 + t2 + t3) / 2) % 2 === 0 ? 1 : -1;
        return Math.abs(wigner3j(t2, t1, t3, m2, m1, m3) - phase * wigner3j(t1, t2, t3, m1, m2, m3)) < 1e-14;
      }),
      { numRuns: 300 },
    );
  });
});

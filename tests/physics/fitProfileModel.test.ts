/**
 * The detector-profile model's exact Jacobian columns (offset, populations, amplitude, background)
 * against central differences of the model itself, and its cost: a Jacobian at the point just
 * evaluated computes new patterns only for the columns taken by differences. Invented scenario:
 * a J = 1/2, I = 3/2 beam (87Rb-like ground constants) from a 450 K oven.
 */
import { describe, expect, it } from 'vitest';
import { ATOMIC_MASS_UNIT } from '../../server/src/physics/constants';
import { solveLevel, type HyperfineLevelSpec } from '../../server/src/physics/engine';
import { profileModel, type ProfileParameter } from '../../server/src/physics/fit';

const spec: HyperfineLevelSpec = { kind: 'hyperfine', twoJ: 1, twoI: 3, gJ: 2.00233113, gI: -0.0009951414, A: 3417.341305452145e6 };
const fieldT = 0.05;
const states = solveLevel(spec, fieldT).states;
const input = {
  massKg: 87 * ATOMIC_MASS_UNIT,
  geometry: { slit1M: 30e-6, slit2M: 30e-6, slitSeparationM: 0.5, magnetLengthM: 0.1, driftM: 0.4, detectorWidthM: 10e-6, gradientTPerM: 150 },
  source: { kind: 'effusive' as const, temperatureK: 450 },
  sublevels: states.map((s) => ({ label: s.low.text, momentJT: s.momentJT, population: 1 })),
};
const twoF = states.map((s) => (s.low.scheme === 'F' ? s.low.twoF : 0));
const n = 601;
const positions = Float64Array.from({ length: n }, (_, i) => -3e-3 + (6e-3 * i) / (n - 1));
const counts = new Float64Array(n).fill(1);

function build(free: ProfileParameter[]) {
  return profileModel({ input, spec, magnetFieldT: fieldT, twoF }, positions, counts, free, 20e-6);
}

/** Central difference of the model in parameter j with step h. */
function difference(model: ReturnType<typeof build>, p: Float64Array, j: number, h: number): Float64Array {
  const plus = new Float64Array(n);
  const minus = new Float64Array(n);
  const q = Float64Array.from(p);
  q[j] = p[j]! + h;
  model.model(q, plus);
  q[j] = p[j]! - h;
  model.model(q, minus);
  return Float64Array.from(plus, (v, i) => (v - minus[i]!) / (2 * h));
}

function column(jac: Float64Array, m: number, j: number): Float64Array {
  return Float64Array.from({ length: n }, (_, i) => jac[i * m + j]!);
}

/** ‖a − b‖ / ‖b‖. */
function relativeDistance(a: Float64Array, b: Float64Array): number {
  let d = 0;
  let s = 0;
  for (let i = 0; i < a.length; i++) {
    d += (a[i]! - b[i]!) ** 2;
    s += b[i]! ** 2;
  }
  return Math.sqrt(d / s);
}

describe('detector-profile model', () => {
  const free: ProfileParameter[] = ['gradient', 'offset', 'background', 'populations'];
  const model = build(free);
  // gradient, offset, background, population F=2, amplitude
  expect(model.names).toEqual(['gradient', 'offset', 'background', 'population F=2', 'amplitude']);
  const m = model.names.length;
  const p = Float64Array.from([150, 20e-6, 5, 1.3, 0.05]);
  const jac = new Float64Array(n * m);
  model.model(p, new Float64Array(n));
  const before = model.patterns();
  expect(model.jacobian(p, jac)).toBe(true);
  const cost = model.patterns() - before;

  it('a Jacobian right after the model computes two new patterns (the gradient ± h), not seven', () => {
    expect(cost).toBe(2);
  });

  it('the population column is exact: the difference quotient agrees to 1e-7', () => {
    // The pattern is a ratio of terms linear in the population: its difference quotient has only h² error.
    expect(relativeDistance(column(jac, m, 3), difference(model, p, 3, 1e-5))).toBeLessThan(1e-7);
  });

  it('the offset column is minus the interpolant slope: differences far below a bin agree', () => {
    // Bins are ≈ 7 µm; a 1 nm step straddles a knot at a few points only (there it averages two slopes).
    expect(relativeDistance(column(jac, m, 1), difference(model, p, 1, 1e-9))).toBeLessThan(2e-2);
    // Away from the knots the two are the same number.
    const d = difference(model, p, 1, 1e-9);
    const close = Array.from(column(jac, m, 1)).filter((v, i) => Math.abs(v - d[i]!) <= 1e-6 * Math.abs(v) + 1e-9).length;
    expect(close).toBeGreaterThan(0.95 * n);
  });

  it('amplitude and background columns are the unit shape and ones', () => {
    expect(relativeDistance(column(jac, m, 4), difference(model, p, 4, 1e-4))).toBeLessThan(1e-9);
    expect(column(jac, m, 2).every((v) => v === 1)).toBe(true);
  });

  it('the gradient column (by differences) still matches a finer difference', () => {
    expect(relativeDistance(column(jac, m, 0), difference(model, p, 0, 0.003))).toBeLessThan(1e-3);
  });

  it('a step in offset, background or amplitude reuses the pattern; a cached value equals a fresh one', () => {
    const q = Float64Array.from(p);
    q[1] = 25e-6;
    q[2] = 7;
    q[4] = 0.06;
    const cached = new Float64Array(n);
    model.model(p, cached);
    const at = model.patterns();
    model.model(q, cached);
    expect(model.patterns()).toBe(at);
    const fresh = new Float64Array(n);
    build(free).model(q, fresh);
    expect(Array.from(cached)).toEqual(Array.from(fresh));
  });

  it('at a population of zero the column falls back to differences and stays finite', () => {
    const z = Float64Array.from(p);
    z[3] = 0;
    const jz = new Float64Array(n * m);
    expect(model.jacobian(z, jz)).toBe(true);
    expect(column(jz, m, 3).every(Number.isFinite)).toBe(true);
    // |π| has a kink at 0: the central difference is zero there, as from the model itself.
    expect(Array.from(column(jz, m, 3))).toEqual(Array.from(difference(model, z, 3, 1.3e-4)));
  });
});

/**
 * ∂k/∂p of re-flown deflection coefficients (physics/beam/trajectory/coefficientSlopes.ts): against
 * SciPy finite differences of independent flights (tests/reference/trajectory.json, "slopes") and
 * against the closed form of the uniform-gradient magnet, k = μ G (L1²/2 + L1 L2)/M (docs/beam.md §1).
 */
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { ATOMIC_MASS_UNIT, BOHR_MAGNETON } from '../../server/src/physics/constants';
import type { HyperfineLevelSpec } from '../../server/src/physics/engine';
import { CoefficientFlyer, coefficientSlopes, sublevelCurves, type CoefficientSetup } from '../../server/src/physics/beam/trajectory';
import { infiniteWires, uniformGradientField } from './trajectoryFields';

const ref = JSON.parse(readFileSync(path.join(__dirname, '../reference/trajectory.json'), 'utf8')) as {
  level: { twoJ: number; twoI: number; gJ: number; gI: number; A: number; mass_kg: number };
  wires: { y_m: number; z_m: number; current_A: number }[];
  centre_m: [number, number, number];
  length_m: number;
  drift_m: number;
  slopes: {
    speed_m_per_s: number;
    states: { twoF: number; twoM: number }[];
    k_m3_per_s2: number[];
    derivatives: Record<'current_A' | 'height_m' | 'A_Hz', { step: number; dk: number[] }>;
  };
};

const spec: HyperfineLevelSpec = { kind: 'hyperfine', ...ref.level };
const labelOf = (twoF: number, twoM: number): string => {
  const l = sublevelCurves(spec, 1).curves!.labels.find((x) => x.low.startsWith(`F=${twoF / 2},`) && x.twoM === twoM)!;
  return l.low;
};

describe('coefficient slopes through two long wires (SciPy DOP853 differences, tests/reference/trajectory.json)', () => {
  const s = ref.slopes;
  const wiresAt = (current: number) => infiniteWires(ref.wires.map((w) => ({ y: w.y_m, z: w.z_m, current: Math.sign(w.current_A) * current })));
  const base: CoefficientSetup = {
    field: wiresAt(900),
    centre: ref.centre_m,
    magnetLengthM: ref.length_m,
    driftM: ref.drift_m,
    massKg: ref.level.mass_kg,
    spec,
    labels: s.states.map((x) => labelOf(x.twoF, x.twoM)),
    maxFieldT: 1,
  };
  const flyer = new CoefficientFlyer();
  const k0 = flyer.fly(base, s.speed_m_per_s).k!;

  it('re-flies the reference coefficients', () => {
    s.k_m3_per_s2.forEach((k, i) => expect(Math.abs(k0[i]! / k - 1)).toBeLessThan(1e-8));
  });

  it('∂k/∂I, ∂k/∂(height of the beam line) and ∂k/∂A agree with SciPy to 1e-5 of the largest', () => {
    const [dI, dz, dA] = coefficientSlopes(flyer, base, s.speed_m_per_s, k0, [
      { step: 1, at: (t) => ({ field: wiresAt(900 + t) }) },
      { step: 1e-6, at: (t) => ({ centre: [0, 0, ref.centre_m[2] + t] }) },
      { step: 1e-4 * spec.A, at: (t) => ({ spec: { ...spec, A: spec.A + t } }) },
    ]);
    const close = (got: Float64Array | null, want: number[], tol: number) => {
      const scale = Math.max(...want.map(Math.abs));
      want.forEach((w, i) => expect(Math.abs(got![i]! - w)).toBeLessThan(tol * scale));
    };
    close(dI!.dk, s.derivatives.current_A.dk, 1e-5);
    close(dz!.dk, s.derivatives.height_m.dk, 1e-5);
    // k barely depends on A here (a stretched state not at all): the scale is set by the others, 1e-7 of k per Hz·MHz
    close(dA!.dk, s.derivatives.A_Hz.dk, 1e-3);
    expect(dA!.dk![0]).toBe(0); // the stretched state's moment does not depend on A: 0, not round-off
  });
});

describe('coefficient slopes in a uniform gradient (closed form k = μ G (L1²/2 + L1 L2)/M)', () => {
  // A spin-1/2 without a nucleus: μ = ∓ g_J μ_B / 2 at every field, so k is exactly linear in G.
  const bare: HyperfineLevelSpec = { kind: 'hyperfine', twoJ: 1, twoI: 0, gJ: 2.00231930436, gI: 0, A: 0 };
  const mass = 39 * ATOMIC_MASS_UNIT;
  const L1 = 0.1, L2 = 0.5, G = 200, B0 = 0.5, v = 700;
  const labels = sublevelCurves(bare, 1).curves!.labels.map((l) => l.low);
  const base: CoefficientSetup = { field: uniformGradientField(B0, G), centre: [0, 0, 0], magnetLengthM: L1, driftM: L2, massKg: mass, spec: bare, labels, maxFieldT: 1 };
  const flyer = new CoefficientFlyer();
  const k0 = flyer.fly(base, v).k!;
  const mu = labels.map((_, i) => (k0[i]! * mass) / (G * (L1 * L1 / 2 + L1 * L2)));

  it('flies the closed-form coefficients (moments ±g_J μ_B/2)', () => {
    for (const m of mu) expect(Math.abs(Math.abs(m) / (bare.gJ * BOHR_MAGNETON / 2) - 1)).toBeLessThan(1e-9);
  });

  it('∂k/∂G = μ (L1²/2 + L1 L2)/M, ∂k/∂L1 = μ G (L1 + L2)/M, and ∂k/∂v = 0, to the differences’ precision', () => {
    const [dG, dL, dv] = coefficientSlopes(flyer, base, v, k0, [
      { step: 2, at: (t) => ({ field: uniformGradientField(B0, G + t) }) },
      { step: 1e-3, at: (t) => ({ magnetLengthM: L1 + t }) },
      { step: 7, at: (t) => ({ speed: v + t }) },
    ]);
    mu.forEach((m, i) => {
      expect(Math.abs(dG!.dk![i]! / ((m * (L1 * L1 / 2 + L1 * L2)) / mass) - 1)).toBeLessThan(1e-7);
      expect(Math.abs(dL!.dk![i]! / ((m * G * (L1 + L2)) / mass) - 1)).toBeLessThan(1e-7);
      expect(dv!.dk![i]).toBe(0);
    });
  });

  it('cuts the step where k is not linear over it, and gives up on a kink', () => {
    // |k| as a function of the gradient has a kink at G = 0: no derivative there.
    const flat = { ...base, field: uniformGradientField(B0, 0) };
    const zero = flyer.fly(flat, v).k!;
    const [kink] = coefficientSlopes(flyer, flat, v, zero, [{ step: 1, at: (t) => ({ field: uniformGradientField(B0, Math.abs(t)) }) }]);
    expect(kink!.dk).toBeNull();
    expect(kink!.reason).toBe('not-linear');
    expect(kink!.step).toBeCloseTo(1 / 16, 12);
  });
});

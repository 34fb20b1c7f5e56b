import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { ATOMIC_MASS_UNIT, BOHR_MAGNETON, PLANCK_H } from '../../server/src/physics/constants';
import { deflectionAtSpeed, type BeamGeometry } from '../../server/src/physics/beam';
import { solveLevel, type HyperfineLevelSpec } from '../../server/src/physics/engine';
import { flySublevel, sublevelCurves, type SublevelCurves } from '../../server/src/physics/beam/trajectory';
import { finiteWires, infiniteWires, uniformGradientField } from './trajectoryFields';
import { LI7_2S, RB87_5S } from './engine.fixtures';

const ref = JSON.parse(readFileSync(path.join(__dirname, '../reference/trajectory.json'), 'utf8')) as {
  level: { twoJ: number; twoI: number; gJ: number; gI: number; A: number; mass_kg: number };
  wires: { y_m: number; z_m: number; current_A: number }[];
  centre_m: [number, number, number];
  length_m: number;
  drift_m: number;
  cases: {
    field: 'infinite' | 'finite';
    half_length_m?: number;
    twoF: number;
    twoM: number;
    speed_m_per_s: number;
    exit: { y_m: number; z_m: number; angle_y: number; angle_z: number };
    detector: { y_m: number; z_m: number; angle_y: number; angle_z: number };
  }[];
};

function curvesFor(spec: HyperfineLevelSpec, maxT: number): SublevelCurves {
  const { curves, issues } = sublevelCurves(spec, maxT);
  expect(issues.filter((i) => i.severity === 'error')).toEqual([]);
  return curves!;
}

function stateIndex(curves: SublevelCurves, twoF: number, twoM: number): number {
  const f = twoF % 2 === 0 ? String(twoF / 2) : `${twoF}/2`;
  const i = curves.labels.findIndex((l) => l.low.startsWith(`F=${f},`) && l.twoM === twoM);
  expect(i).toBeGreaterThanOrEqual(0);
  return i;
}

describe('sublevel curves (quintic Hermite table of the exact engine)', () => {
  it('gives the engine energies and moments between its nodes (engine: solveLevel at the same field)', () => {
    const curves = curvesFor(RB87_5S, 0.6);
    const out = new Float64Array(2);
    for (const b of [0.0123457, 0.2468, 0.4444444, 0.5999]) {
      for (const s of solveLevel(RB87_5S, b).states) {
        const i = curves.labels.findIndex((l) => l.low === s.low.text);
        curves.at(i, b, out);
        expect(Math.abs(out[0] - s.energyHz)).toBeLessThan(1e-11 * Math.abs(s.energyHz)); // ~h·(μ error): below 0.1 Hz of GHz energies
        expect(Math.abs(out[1] - s.momentJT)).toBeLessThan(1e-9 * BOHR_MAGNETON);
      }
    }
    expect(curves.interpolationErrorJT).toBeLessThan(1e-9 * BOHR_MAGNETON);
    expect(curves.interpolationErrorJT).toBeGreaterThan(0);
  });

  it('neighbour gap of a stretched state at low field is the Larmor splitting g_F μ_B B / h (g_F = 1/2 for F = 2 of a J = 1/2, I = 3/2 level; textbook)', () => {
    const curves = curvesFor(RB87_5S, 0.01);
    const i = stateIndex(curves, 4, 4);
    const gap = curves.neighbourGapHz(i, 1e-6);
    expect(gap / ((0.5 * BOHR_MAGNETON * 1e-6) / PLANCK_H)).toBeCloseTo(1, 3);
  });

  it('rejects a non-positive field range as a value', () => {
    const { curves, issues } = sublevelCurves(RB87_5S, 0);
    expect(curves).toBeUndefined();
    expect(issues[0]!.code).toBe('trajectory-field-range-invalid');
  });
});

describe('flight through a uniform gradient = the analytic deflection (physics/beam/deflection.ts)', () => {
  // The stretched state |F=2, m_F=+2⟩ of a J = 1/2 level has E linear in B (Breit–Rabi, textbook), so its
  // moment is the same at every field, as the uniform model assumes.
  const mass = 7.0160034366 * ATOMIC_MASS_UNIT; // 7Li, AME 2020 (from memory)
  const geometry: BeamGeometry = { slit1M: 1e-4, slit2M: 1e-4, slitSeparationM: 0.4, magnetLengthM: 0.08, driftM: 0.35, detectorWidthM: 0, gradientTPerM: 180 };
  const curves = curvesFor(LI7_2S, 2);
  const i = stateIndex(curves, 4, 4);
  const mu = solveLevel(LI7_2S, 1).states.find((s) => s.low.text === curves.labels[i]!.low)!.momentJT;
  const setup = { field: uniformGradientField(1, 180), centre: [0, 0, 0] as const, magnetLengthM: 0.08, driftM: 0.35, massKg: mass, curves };

  for (const method of ['adaptive', 'rk4'] as const) {
    it(`agrees to 1e-9 (${method})`, () => {
      // |B| = 1 T + 180 T/m · z stays above 0.7 T along these paths
      for (const v of [600, 900, 2500]) {
        const flight = flySublevel(setup, i, v, { method });
        expect(flight.ok).toBe(true);
        const z = deflectionAtSpeed(mu, mass, geometry, v);
        expect(Math.abs(flight.detector.zM / z - 1)).toBeLessThan(1e-9);
        expect(flight.detector.yM).toBe(0);
        // exit angle of a uniform push: a L1 / v² with a = μ G / M
        expect(Math.abs(flight.exit.angleZ / ((mu * 180 * 0.08) / (mass * v * v)) - 1)).toBeLessThan(1e-9);
      }
    });
  }

  it('every other sublevel agrees to the size of its moment change across its own deflection', () => {
    const out = new Float64Array(2);
    for (let k = 0; k < curves.labels.length; k++) {
      const s = solveLevel(LI7_2S, 1).states.find((x) => x.low.text === curves.labels[k]!.low)!;
      const flight = flySublevel(setup, k, 900);
      const z = deflectionAtSpeed(s.momentJT, mass, geometry, 900);
      curves.at(k, 1 + 180 * flight.exit.zM, out);
      const change = Math.abs(out[1] - s.momentJT) / Math.abs(s.momentJT);
      expect(Math.abs(flight.detector.zM / z - 1)).toBeLessThanOrEqual(change + 1e-9);
    }
  });
});

describe('flight through two long wires (field independent of x)', () => {
  const wires = ref.wires.map((w) => ({ y: w.y_m, z: w.z_m, current: w.current_A }));
  const spec: HyperfineLevelSpec = { kind: 'hyperfine', ...ref.level };
  const curves = curvesFor(spec, 1);
  const base = { centre: ref.centre_m, magnetLengthM: ref.length_m, driftM: ref.drift_m, massKg: ref.level.mass_kg, curves };

  it('conserves transverse kinetic + sublevel energy (exact for a field that does not change along the beam)', () => {
    for (const [twoF, twoM] of [[4, 4], [4, -2], [2, 0], [2, -2]]) {
      const flight = flySublevel({ ...base, field: infiniteWires(wires) }, stateIndex(curves, twoF, twoM), 400);
      expect(flight.ok).toBe(true);
      expect(flight.potentialSpanJ).toBeGreaterThan(0);
      // relative to the energy exchanged between motion and field along the way
      expect(Math.abs(flight.energyOutJ - flight.energyInJ) / flight.potentialSpanJ).toBeLessThan(1e-8);
    }
  });

  it('matches SciPy solve_ivp (DOP853, rtol 1e-13) with the Breit–Rabi moment (tests/reference/trajectory.json)', () => {
    for (const c of ref.cases) {
      const field = c.field === 'infinite' ? infiniteWires(wires) : finiteWires(wires, c.half_length_m!);
      const flight = flySublevel({ ...base, field }, stateIndex(curves, c.twoF, c.twoM), c.speed_m_per_s);
      expect(flight.ok).toBe(true);
      const tol = c.field === 'infinite' ? 1e-8 : 1e-6; // the finite wires' gradient is a finite difference on both sides
      expect(Math.abs(flight.detector.zM - c.detector.z_m)).toBeLessThan(tol * Math.abs(c.detector.z_m));
      expect(Math.abs(flight.exit.angleZ - c.exit.angle_z)).toBeLessThan(tol * Math.abs(c.exit.angle_z));
      expect(Math.abs(flight.detector.yM - c.detector.y_m)).toBeLessThan(1e-12 + tol * Math.abs(c.detector.z_m));
    }
  });

  it('fixed-step RK4 with 200 steps agrees with the adaptive integrator to 1e-6 here', () => {
    const field = infiniteWires(wires);
    const i = stateIndex(curves, 2, -2);
    const a = flySublevel({ ...base, field }, i, 600);
    const b = flySublevel({ ...base, field }, i, 600, { method: 'rk4', steps: 200 });
    expect(Math.abs(b.detector.zM / a.detector.zM - 1)).toBeLessThan(1e-6);
  });

  it('reports a path into a wire as an error value, not NaN', () => {
    // aim the atom straight at the wire at y = +2 mm, z = 0
    const flight = flySublevel({ ...base, field: infiniteWires(wires) }, 0, 1000, { start: { y: 2e-3, z: -1.5e-3 } });
    expect(flight.ok).toBe(false);
    expect(flight.issues.map((x) => x.code)).toEqual(['trajectory-meets-source']);
    expect(Number.isFinite(flight.detector.zM)).toBe(true);
  });

  it('reports a field beyond the tabulated moments', () => {
    const small = curvesFor(spec, 0.01);
    const flight = flySublevel({ ...base, curves: small, field: infiniteWires(wires) }, 0, 1000);
    expect(flight.issues.map((x) => x.code)).toEqual(['trajectory-field-beyond-table']);
  });
});

describe('adiabaticity', () => {
  it('a beam line through the zero of a quadrupole-like field is flagged; a strong bias is not', () => {
    const curves = curvesFor(LI7_2S, 0.2);
    const i = stateIndex(curves, 4, 4);
    // Two wires with the same current: |B| = 0 midway between them, on the beam line.
    const same = infiniteWires([
      { y: 2e-3, z: 0, current: 50 },
      { y: -2e-3, z: 0, current: 50 },
    ]);
    // Offset the zero by 1 µm so the field is defined on the line; its direction still turns fast.
    const near = flySublevel({ field: same, centre: [0, 1e-6, 0], magnetLengthM: 0.05, driftM: 0.1, massKg: 1.165e-26, curves }, i, 1000, { start: { dz: 1e-3 } });
    expect(near.adiabaticity).toBeGreaterThan(0.1);
    expect(near.minFieldT).toBeLessThan(1e-4);
    const far = flySublevel({ field: uniformGradientField(0.1, 10), centre: [0, 0, 0], magnetLengthM: 0.05, driftM: 0.1, massKg: 1.165e-26, curves }, i, 1000);
    expect(far.adiabaticity).toBeLessThan(1e-12); // the field never turns (round-off only)
  });
});

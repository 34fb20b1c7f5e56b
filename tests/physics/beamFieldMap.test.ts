import { describe, expect, it } from 'vitest';
import { ATOMIC_MASS_UNIT, BOLTZMANN_K } from '../../server/src/physics/constants';
import { deflectionCoefficient, detectorPattern, type BeamGeometry } from '../../server/src/physics/beam';
import { solveLevel } from '../../server/src/physics/engine';
import { closestApproach, fieldMapBeam, fieldMapPattern, surveyBeamLine } from '../../server/src/physics/beam/trajectory';
import { infiniteWires, uniformGradientField } from './trajectoryFields';
import { LI7_2S } from './engine.fixtures';

const MU0 = 1.25663706127e-6; // CODATA 2022

/** Two opposite currents ±I at y = ±a, z = 0: on the plane y = 0, |B| = μ0 I a / (π (a² + z²)) (textbook superposition of two infinite wires). */
function twoWireGradient(current: number, a: number, z: number): number {
  return (-2 * MU0 * current * a * z) / (Math.PI * (a * a + z * z) ** 2);
}

describe('beam-line survey', () => {
  it('a uniform gradient: the centre values, no variation', () => {
    const s = surveyBeamLine({ field: uniformGradientField(0.5, 120), centre: [0.1, 0, 0], magnetLengthM: 0.1, halfHeightM: 1e-3 });
    expect(s.fieldT).toBeCloseTo(0.5, 14);
    expect(s.gradientTPerM).toBeCloseTo(120, 10);
    expect(s.gradientVariation).toBeLessThan(1e-12);
    expect(s.issues).toEqual([]);
  });

  it('two wires: the gradient of |B| at the beam line and across the beam height match the closed form', () => {
    const field = infiniteWires([
      { y: 2e-3, z: 0, current: 900 },
      { y: -2e-3, z: 0, current: -900 },
    ]);
    const h = 0.5e-3;
    const s = surveyBeamLine({ field, centre: [0, 0, 1.5e-3], magnetLengthM: 0.08, halfHeightM: h });
    const g = (z: number) => twoWireGradient(900, 2e-3, z);
    expect(s.gradientTPerM / g(1.5e-3) - 1).toBeLessThan(1e-12);
    expect(Math.abs(s.meanGradientTPerM.above / g(2e-3) - 1)).toBeLessThan(1e-12);
    const expected = Math.max(Math.abs(g(1e-3) - g(1.5e-3)), Math.abs(g(2e-3) - g(1.5e-3))) / Math.abs(g(1.5e-3));
    expect(s.gradientVariation).toBeCloseTo(expected, 10);
    expect(expected).toBeGreaterThan(0.05);
    expect(s.issues.map((i) => i.code)).toEqual(['magnet-gradient-uneven']);
    expect(s.issues[0]!.message).toContain(`${Math.round(100 * expected)} %`);
  });

  it('a beam line through a wire is an error, and nothing is NaN', () => {
    const field = infiniteWires([{ y: 0, z: 0, current: 10 }]);
    const s = surveyBeamLine({ field, centre: [0, 0, 0], magnetLengthM: 0.08, halfHeightM: 1e-3 });
    expect(s.issues.map((i) => i.code)).toEqual(['magnet-line-meets-source']);
    expect(Number.isFinite(s.fieldT) && Number.isFinite(s.gradientTPerM)).toBe(true);
  });
});

describe('a beam through a field map', () => {
  const mass = 7.0160034366 * ATOMIC_MASS_UNIT; // 7Li, AME 2020 (from memory)
  const labels = solveLevel(LI7_2S, 1).states.map((s) => s.low.text);

  it('in a uniform gradient gives each sublevel the uniform model’s coefficient μ G (L1²/2 + L1 L2)/M', () => {
    const geometry: BeamGeometry = { slit1M: 1e-4, slit2M: 1e-4, slitSeparationM: 0.4, magnetLengthM: 0.08, driftM: 0.35, detectorWidthM: 0, gradientTPerM: 20 };
    const r = fieldMapBeam({ field: uniformGradientField(1, 20), centre: [0, 0, 0], magnetLengthM: 0.08, driftM: 0.35, massKg: mass, spec: LI7_2S, labels, speeds: [1500, 800, 3000], halfHeightM: 1e-4 });
    expect(r.ok).toBe(true);
    expect(r.issues.filter((i) => i.severity !== 'info')).toEqual([]);
    const states = solveLevel(LI7_2S, 1).states;
    for (const s of r.sublevels) {
      const mu = states.find((x) => x.low.text === s.label)!.momentJT;
      // the moments change by < 1e-4 across these sub-millimetre deflections at 1 T
      expect(Math.abs(s.coefficientM3PerS2 / deflectionCoefficient(mu, mass, geometry) - 1)).toBeLessThan(1e-4);
      expect(s.coefficientSpread).toBeLessThan(1e-4);
    }
    expect(r.survey.gradientTPerM).toBeCloseTo(20, 10);
    expect(r.tableErrorJT).toBeLessThan(1e-32);
  });

  it('warns of spin flips when the beam line passes the zero of the field', () => {
    const same = infiniteWires([
      { y: 2e-3, z: 0, current: 50 },
      { y: -2e-3, z: 0, current: 50 },
    ]);
    const r = fieldMapBeam({ field: same, centre: [0, 1e-6, 1e-7], magnetLengthM: 0.05, driftM: 0.1, massKg: mass, spec: LI7_2S, labels, speeds: [1000], halfHeightM: 0 });
    const flip = r.issues.find((i) => i.code === 'magnet-spin-flip-risk');
    expect(flip?.severity).toBe('warning');
    expect(flip!.message).toMatch(/falls to below 1 mG [0-9.]+ cm into the magnet/);
    expect(r.adiabaticity).toBeGreaterThan(0.1);
  });
});

describe('the detector pattern of a field-map magnet', () => {
  const mass = 7.0160034366 * ATOMIC_MASS_UNIT; // 7Li, AME 2020 (from memory)
  const states = solveLevel(LI7_2S, 1).states;
  const geometry: BeamGeometry = { slit1M: 2e-5, slit2M: 2e-5, slitSeparationM: 0.4, magnetLengthM: 0.08, driftM: 0.35, detectorWidthM: 1e-5, gradientTPerM: 20 };

  it('equals the uniform model’s pattern in a uniform gradient: stretched states at one speed to 1e-9, all sublevels from an oven to 1e-4', () => {
    const only = (twoM: number) => states.map((s) => ({ label: s.low.text, momentJT: s.momentJT, population: s.twoM === twoM && s.low.text.startsWith('F=2') ? 1 : 0 }));
    for (const [source, sublevels, tol] of [
      [{ kind: 'single', speed: 1500 } as const, only(4), 1e-9],
      [{ kind: 'single', speed: 1500 } as const, only(-4), 1e-9],
      [{ kind: 'effusive', temperatureK: 900 } as const, states.map((s) => ({ label: s.low.text, momentJT: s.momentJT, population: 1 })), 1e-4],
    ] as const) {
      const uniform = { massKg: mass, geometry, source, sublevels };
      const mapped = fieldMapPattern({ pattern: uniform, field: uniformGradientField(1, 20), centre: [0, 0, 0], spec: LI7_2S, labels: states.map((s) => s.low.text) });
      expect(mapped.fieldMap!.ok).toBe(true);
      const a = detectorPattern(uniform);
      const b = detectorPattern(mapped.pattern);
      expect(b.peaks.length).toBe(a.peaks.length);
      a.peaks.forEach((p, i) => expect(Math.abs(b.peaks[i]!.positionM - p.positionM)).toBeLessThan(tol * Math.abs(p.positionM) + 1e-12));
      a.sublevels.forEach((s, i) => {
        if (s.weight > 0) expect(Math.abs(b.sublevels[i]!.meanDeflectionM / s.meanDeflectionM - 1)).toBeLessThan(tol);
      });
    }
  });

  it('with an oven flies the reference speed ⟨1/v²⟩^(−1/2) = √(2kT/M) and the 5 % and 95 % flux points', () => {
    const sublevels = states.map((s) => ({ label: s.low.text, momentJT: s.momentJT, population: 1 }));
    const mapped = fieldMapPattern({ pattern: { massKg: mass, geometry, source: { kind: 'effusive', temperatureK: 900 }, sublevels }, field: uniformGradientField(1, 20), centre: [0, 0, 0], spec: LI7_2S, labels: states.map((s) => s.low.text) });
    // oven flux law: ⟨1/v²⟩ = M/2kT (closed form, docs/beam.md §2)
    expect(Math.abs(mapped.referenceSpeed! / Math.sqrt((2 * BOLTZMANN_K * 900) / mass) - 1)).toBeLessThan(1e-12);
    expect(mapped.speeds!.length).toBe(3);
    expect(mapped.speeds![1]).toBeLessThan(mapped.referenceSpeed!);
    expect(mapped.speeds![2]).toBeGreaterThan(mapped.referenceSpeed!);
  });
});

describe('clearance of the beam line from the sources (geometry)', () => {
  const start: [number, number, number] = [-0.04, 0, 0];
  it('a wire across the line at height d: closest approach d where they cross', () => {
    const r = closestApproach({ kind: 'wire', point: [0.01, 0, 3e-4], direction: [0, 1, 0], currentA: 1 }, start, 0.08);
    expect(r.distanceM).toBeCloseTo(3e-4, 12);
    expect(r.atM).toBeCloseTo(0.05, 9);
  });
  it('an oblique wire off the grid points: the distance between two skew lines, |(p − s)·(x̂ × t)| / |x̂ × t| (textbook)', () => {
    const t = [0.6, 0.48, 0.64]; // unit: 0.36 + 0.2304 + 0.4096 = 1
    const p = [0.0123456789, 0.002, 7e-4];
    const r = closestApproach({ kind: 'wire', point: [p[0], p[1], p[2]], direction: [t[0], t[1], t[2]], currentA: 1 }, start, 0.08);
    // x̂ × t = (0, −t_z, t_y); the closest points: the line's parameter s solves (d + s x̂ − u t)·x̂ = 0 and ·t = 0.
    const d = [p[0] - start[0], p[1] - start[1], p[2] - start[2]];
    const distance = Math.abs(-d[1] * t[2] + d[2] * t[1]) / Math.hypot(t[1], t[2]);
    const dt = d[0] * t[0] + d[1] * t[1] + d[2] * t[2];
    const along = (d[0] - t[0] * dt) / (1 - t[0] * t[0]);
    expect(Math.abs(r.distanceM - distance)).toBeLessThan(1e-17);
    expect(Math.abs(r.atM - along)).toBeLessThan(1e-10);
  });
  it('a short wire segment beside the line: distance to its nearer end (Pythagoras)', () => {
    const r = closestApproach({ kind: 'wire', point: [0, 0.003, 0], direction: [0, 1, 0], currentA: 1, lengthM: 0.002 }, start, 0.08);
    expect(r.distanceM).toBeCloseTo(0.002, 12);
  });
  it('a loop around the line (coaxial) keeps its radius; one the line crosses near its wire does not', () => {
    expect(closestApproach({ kind: 'loop', centre: [0, 0, 0], axis: [1, 0, 0], radiusM: 0.01, ampereTurns: 1 }, start, 0.08).distanceM).toBeCloseTo(0.01, 12);
    // a loop in the x–z plane whose wire passes through the origin, on the line
    expect(closestApproach({ kind: 'loop', centre: [0, 0, 0.01], axis: [0, 1, 0], radiusM: 0.01, ampereTurns: 1 }, start, 0.08).distanceM).toBeCloseTo(0, 12);
  });
  it('inside a block is distance 0; beside it, the gap', () => {
    expect(closestApproach({ kind: 'slab', centre: [0, 0, 0.002], sizeM: [0.01, 0.01, 0.002], magnetisationT: [0, 0, 1] }, start, 0.08).distanceM).toBeCloseTo(0.001, 12);
    expect(closestApproach({ kind: 'slab', centre: [0, 0, 0], sizeM: [0.01, 0.01, 0.002], magnetisationT: [0, 0, 1] }, start, 0.08).distanceM).toBe(0);
  });
  it('the survey reports the source the line runs into, by name', () => {
    const spec = { kind: 'wire' as const, point: [0.01, 0, 2e-5] as const, direction: [0, 1, 0] as const, currentA: 1 };
    const s = surveyBeamLine({ field: uniformGradientField(1, 1), centre: [0, 0, 0], magnetLengthM: 0.08, halfHeightM: 5e-5, obstacles: [{ name: 'cross', spec: { ...spec, point: [...spec.point], direction: [...spec.direction] } }] });
    expect(s.issues.map((i) => i.code)).toEqual(['magnet-line-meets-source']);
    expect(s.issues[0]!.message).toContain("source 'cross' 5 cm into the magnet (it passes 20 µm from it, within the beam's half height of 50 µm)");
  });
});

/**
 * Field sources against textbook closed forms and limits: the on-axis loop field, Helmholtz and
 * anti-Helmholtz pairs, the far field of a loop (a dipole), the long solenoid, the infinite wire,
 * the two-wire field; the gradient against central differences of B; div B = 0 and curl B = 0
 * off the sources (fast-check); points on a source give an issue and no NaN.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { VACUUM_PERMEABILITY as MU0 } from '../../server/src/physics/constants';
import {
  fieldIssuesAt,
  loopField,
  magnitudeGradient,
  magnitudeHessian,
  partField,
  sampleGrid,
  sampleSegment,
  slabField,
  solenoidField,
  sumField,
  wireField,
  type FieldSourceSpec,
  type LoopSpec,
  type SolenoidSpec,
  type Vec3,
} from '../../server/src/physics/fields';
import { centralGradient, divCurl, expectFinite, relMat, relVec } from './fields.fixtures';

const Z: Vec3 = [0, 0, 1];
const loop = (z: number, radius: number, ampereTurns: number, axis: Vec3 = Z, centre: Vec3 = [0, 0, z]): LoopSpec => ({ kind: 'loop', centre, axis, radiusM: radius, ampereTurns });

describe('circular loop: textbook limits', () => {
  it('on the axis: B_z = μ0 N I R²/(2(R² + z²)^{3/2}) (D. J. Griffiths, Introduction to Electrodynamics, 4th ed., Ex. 5.6; from memory)', () => {
    const R = 0.035;
    const NI = 1800;
    for (const z of [0, 0.01, -0.05, 0.4]) {
      const s = loopField(loop(0, R, NI), [0, 0, z]);
      const expected = (MU0 * NI * R * R) / (2 * (R * R + z * z) ** 1.5);
      expect(Math.abs(s.B[2] / expected - 1)).toBeLessThan(1e-14);
      expect(Math.abs(s.B[0]) + Math.abs(s.B[1])).toBe(0);
      // ∂B_z/∂z on the axis from the same formula; the radial gradients are −½ of it.
      const dz = (-3 * MU0 * NI * R * R * z) / (2 * (R * R + z * z) ** 2.5);
      expect(Math.abs(s.gradient[2][2] - dz)).toBeLessThan(1e-13 * Math.abs(expected) / R);
      expect(Math.abs(s.gradient[0][0] + dz / 2)).toBeLessThan(1e-13 * Math.abs(expected) / R);
    }
  });

  it('Helmholtz pair (spacing R, same sense): centre field (4/5)^{3/2} μ0 N I/R, flat to 4th order (Griffiths, Problem 5.46; from memory)', () => {
    const R = 0.1;
    const NI = 500;
    const f = sumField([loop(-R / 2, R, NI), loop(R / 2, R, NI)]);
    const centre = f([0, 0, 0]);
    expect(Math.abs(centre.B[2] / ((4 / 5) ** 1.5 * MU0 * NI / R) - 1)).toBeLessThan(1e-14);
    // The first and second derivatives vanish at the centre: the gradient is zero there.
    for (const row of centre.gradient) for (const x of row) expect(Math.abs(x)).toBeLessThan(1e-12 * centre.B[2] / R);
    // Fourth-order flatness: at z = R/10 the field changes by about (144/125)(z/R)^4 of itself.
    const off = f([0, 0, R / 10]).B[2];
    expect(Math.abs(off / centre.B[2] - 1)).toBeLessThan(2e-4);
    expect(Math.abs(off / centre.B[2] - 1)).toBeGreaterThan(5e-6);
  });

  it('anti-Helmholtz pair (spacing R, opposite sense): ∂B_z/∂z = (48/(25√5)) μ0 N I/R², radial −½ of it, B = 0 at the centre (from the on-axis loop field)', () => {
    const R = 0.04;
    const NI = 120 * 15;
    // Upper loop counter-clockwise about +z, lower one clockwise: B_z grows along +z.
    const f = sumField([loop(-R / 2, R, -NI), loop(R / 2, R, NI)]);
    const c = f([0, 0, 0]);
    const expected = (48 / (25 * Math.sqrt(5))) * MU0 * NI / (R * R);
    expect(Math.abs(c.gradient[2][2] / expected - 1)).toBeLessThan(1e-13);
    expect(Math.abs(c.gradient[0][0] / (-expected / 2) - 1)).toBeLessThan(1e-13);
    expect(Math.abs(c.gradient[1][1] / (-expected / 2) - 1)).toBeLessThan(1e-13);
    expect(Math.hypot(...c.B)).toBeLessThan(1e-18);
  });

  it('far field is the dipole μ0/4π (3(m·r̂)r̂ − m)/r³ with m = N I πR² (Griffiths eq. 5.88), deviating as (R/r)²', () => {
    const R = 0.02;
    const NI = 100;
    const axis: Vec3 = [0, 0.6, 0.8];
    const spec = loop(0, R, NI, axis, [0.001, 0.002, -0.003]);
    const m = NI * Math.PI * R * R;
    const deviation = (dist: number): number => {
      const dir: Vec3 = [0.48, 0.6, 0.64];
      const r: Vec3 = [dir[0] * dist, dir[1] * dist, dir[2] * dist];
      const p: Vec3 = [spec.centre[0] + r[0], spec.centre[1] + r[1], spec.centre[2] + r[2]];
      const mr = m * (axis[0] * dir[0] + axis[1] * dir[1] + axis[2] * dir[2]);
      const k = MU0 / (4 * Math.PI * dist ** 3);
      const dip: Vec3 = [k * (3 * mr * dir[0] - m * axis[0]), k * (3 * mr * dir[1] - m * axis[1]), k * (3 * mr * dir[2] - m * axis[2])];
      return relVec(loopField(spec, p).B, dip);
    };
    const d100 = deviation(100 * R);
    const d200 = deviation(200 * R);
    expect(d100).toBeLessThan(3e-4);
    expect(d100 / d200).toBeGreaterThan(3.9);
    expect(d100 / d200).toBeLessThan(4.1);
  });

  it('near the wire and on the axis close to the centre the formulas do not lose accuracy (no 0/0)', () => {
    const spec = loop(0, 0.035, 1800);
    // ρ = 1e-12 m: B_z and the gradient as on the axis to rounding, B_ρ = −(ρ/2) ∂B_z/∂z (div B = 0).
    const onAxis = loopField(spec, [0, 0, 0.01]);
    const nearAxis = loopField(spec, [1e-12, 0, 0.01]);
    expect(Math.abs(nearAxis.B[2] / onAxis.B[2] - 1)).toBeLessThan(1e-14);
    expect(Math.abs(nearAxis.B[0] / (-0.5e-12 * onAxis.gradient[2][2]) - 1)).toBeLessThan(1e-9);
    expect(relMat(nearAxis.gradient, onAxis.gradient)).toBeLessThan(1e-9);
    // 1 µm from the wire: finite, and close to the infinite-wire field μ0 N I/(2π d).
    const near = loopField(spec, [0.035 - 1e-6, 0, 0]);
    expectFinite(near);
    expect(Math.abs(near.B[2] / ((MU0 * 1800) / (2 * Math.PI * 1e-6)) - 1)).toBeLessThan(1e-3);
  });
});

describe('solenoid, wires: textbook limits', () => {
  it('on the axis: B_z = (μ0 n I/2)[ζ₊/√(a² + ζ₊²) − ζ₋/√(a² + ζ₋²)], and μ0 n I inside a long one (Griffiths Problem 5.11, Ex. 5.9; from memory)', () => {
    const a = 0.01;
    const L = 1;
    const NI = 2000;
    const spec: SolenoidSpec = { kind: 'solenoid', centre: [0, 0, 0], axis: Z, radiusM: a, lengthM: L, ampereTurns: NI };
    const n = NI / L;
    for (const z of [0, 0.3, 0.5, 0.9]) {
      const zp = z + L / 2;
      const zm = z - L / 2;
      const expected = (MU0 * n / 2) * (zp / Math.hypot(a, zp) - zm / Math.hypot(a, zm));
      // Beyond the end the two end terms nearly cancel (in the textbook form too): 1e-11.
      expect(Math.abs(solenoidField(spec, [0, 0, z]).B[2] / expected - 1)).toBeLessThan(z < L / 2 ? 1e-13 : 1e-11);
    }
    const centre = solenoidField(spec, [0.005, 0, 0]).B[2];
    expect(Math.abs(centre / (MU0 * n) - 1)).toBeLessThan(2 * (a / L) ** 2 * 1.5);
    // Outside a long solenoid, beside its middle, the field is small (a² /L² of the inside).
    expect(Math.abs(solenoidField(spec, [0.02, 0, 0]).B[2]) / centre).toBeLessThan(1e-3);
  });

  it('a short solenoid tends to a loop of the same ampere-turns', () => {
    const NI = 300;
    const sol: SolenoidSpec = { kind: 'solenoid', centre: [0, 0, 0], axis: Z, radiusM: 0.03, lengthM: 1e-5, ampereTurns: NI };
    const p: Vec3 = [0.02, 0.01, 0.015];
    const a = solenoidField(sol, p);
    const b = loopField(loop(0, 0.03, NI), p);
    expect(relVec(a.B, b.B)).toBeLessThan(1e-7);
    expect(relMat(a.gradient, b.gradient)).toBeLessThan(1e-7);
  });

  it('infinite wire: B = μ0 I/(2πρ) around it (Ampère; Griffiths Ex. 5.7); a wire with its return: 2 μ0 I/(π d) midway', () => {
    const I = 40;
    const w = wireField({ kind: 'wire', point: [0, 0.002, 0], direction: [1, 0, 0], currentA: I }, [0.3, 0.002, 0.005]);
    expect(Math.abs(w.B[1] / (-(MU0 * I) / (2 * Math.PI * 0.005)) - 1)).toBeLessThan(1e-14);
    expect(Math.abs(w.B[2])).toBe(0);
    const pair = sumField([
      { kind: 'wire', point: [0, 0.002, 0], direction: [1, 0, 0], currentA: I },
      { kind: 'wire', point: [0, -0.002, 0], direction: [1, 0, 0], currentA: -I },
    ]);
    const mid = pair([0, 0, 0]).B;
    // Current along +x at y = +2 mm, back along −x at y = −2 mm: B points along −z between them.
    expect(Math.abs(mid[2] / (-(2 * MU0 * I) / (Math.PI * 0.004)) - 1)).toBeLessThan(1e-14);
  });

  it('a long finite wire tends to the infinite one; on its line beyond the ends B = 0 exactly', () => {
    const base = { kind: 'wire' as const, point: [0, 0, 0] as Vec3, direction: [0, 0, 1] as Vec3, currentA: 5 };
    const p: Vec3 = [0.003, 0.004, 0.01];
    const fin = wireField({ ...base, lengthM: 1000 }, p);
    const inf = wireField(base, p);
    expect(relVec(fin.B, inf.B)).toBeLessThan(1e-9);
    expect(relMat(fin.gradient, inf.gradient)).toBeLessThan(1e-9);
    const beyond = wireField({ ...base, lengthM: 0.1 }, [0, 0, 0.2]);
    expectFinite(beyond);
    expect(Math.hypot(...beyond.B)).toBe(0);
  });
});

const GENERIC: FieldSourceSpec[] = [
  loop(0, 0.035, 1800, [1 / 3, 2 / 3, 2 / 3], [0.01, -0.02, 0.005]),
  { kind: 'solenoid', centre: [0, 0.01, -0.02], axis: [0, 0.6, 0.8], radiusM: 0.02, lengthM: 0.15, ampereTurns: 3000 },
  { kind: 'wire', point: [0, 0.002, 0], direction: [1, 0, 0], currentA: 40, lengthM: 0.2 },
  { kind: 'wire', point: [0, -0.05, 0.01], direction: [0, 0.8, 0.6], currentA: -12 },
  { kind: 'slab', centre: [0.004, 0, 0.03], sizeM: [0.01, 0.02, 0.005], magnetisationT: [0.3, 1.1, -0.4] },
];

describe('gradient tensor', () => {
  const points: Vec3[] = [
    [0.012, -0.004, 0.02],
    [-0.03, 0.02, -0.01],
    [0.004, 0.001, 0.0405],
    [0.05, 0.05, 0.05],
    [0.001, 0.012, -0.02],
  ];
  it('equals central differences of B for every kind of source (h = 1e-7 m, 1e-6 relative)', () => {
    for (const spec of GENERIC) {
      const f = (p: Vec3) => partField(spec, p);
      for (const p of points) {
        const s = f(p);
        expect(relMat(s.gradient, centralGradient(f, p, 1e-7)), `${spec.kind} at ${p}`).toBeLessThan(1e-6);
      }
    }
  });

  it('is traceless and symmetric (div B = 0, curl B = 0) at random points off the sources (fast-check)', () => {
    // A finite wire alone is not a closed circuit: its Biot–Savart field has div B = 0 but not curl B = 0.
    const closed = (spec: FieldSourceSpec): boolean => !(spec.kind === 'wire' && spec.lengthM !== undefined);
    const f = (spec: FieldSourceSpec) => (p: Vec3) => partField(spec, p);
    fc.assert(
      fc.property(fc.integer({ min: 0, max: GENERIC.length - 1 }), fc.tuple(fc.double({ min: -0.1, max: 0.1, noNaN: true }), fc.double({ min: -0.1, max: 0.1, noNaN: true }), fc.double({ min: -0.1, max: 0.1, noNaN: true })), (i, p) => {
        const spec = GENERIC[i]!;
        fc.pre(fieldIssuesAt([spec], p).length === 0);
        const s = f(spec)(p);
        expectFinite(s);
        const { div, curl } = divCurl(s.gradient);
        return div < 1e-9 && (curl < 1e-9 || !closed(spec));
      }),
      { numRuns: Number(process.env.FUZZ_RUNS ?? 300) },
    );
  });
});

describe('points on a source', () => {
  it('say, per kind of part, one code and one conductor in words, the same in the issue and in conductorOf', async () => {
    const { conductorOf, onSourceIssue } = await import('../../server/src/physics/fields/onSource');
    const kinds = ['loop', 'solenoid', 'wire', 'slab'] as const;
    expect(kinds.map((k) => [onSourceIssue(k, 2).code, conductorOf(onSourceIssue(k)), onSourceIssue(k, 2).partIndex])).toEqual([
      ['source-point-on-loop', 'the wire of a loop', 2],
      ['source-point-on-winding', 'the winding of a solenoid', 2],
      ['source-point-on-wire', 'a wire', 2],
      ['source-point-on-block', 'the surface of a magnetised block', 2],
    ]);
    expect(onSourceIssue('solenoid').message).toBe('The point lies on the winding of a solenoid, where the field jumps; that solenoid is left out there.');
    for (const k of kinds) expect(onSourceIssue(k).message).toContain(`lies on ${conductorOf(onSourceIssue(k))}, where`);
    expect(conductorOf({ severity: 'warning', code: 'something-else', message: '' })).toBe('a conductor');
  });
  it('give an issue naming the part, and a finite sum without that part', () => {
    const parts = GENERIC;
    const onLoop: Vec3 = (() => {
      const s = parts[0] as LoopSpec;
      // A point on the loop: centre + R·(unit vector ⟂ axis).
      const e: Vec3 = [2 / 3, -1 / 3 * 2, 1 / 3]; // (2, −2, 1)/3 is ⟂ (1, 2, 2)/3
      return [s.centre[0] + s.radiusM * e[0], s.centre[1] + s.radiusM * e[1], s.centre[2] + s.radiusM * e[2]];
    })();
    const cases: [Vec3, string, number][] = [
      [onLoop, 'source-point-on-loop', 0],
      [[0, 0.01 + 0.02 * 0.8 + 0.05 * 0.6, -0.02 - 0.02 * 0.6 + 0.05 * 0.8], 'source-point-on-winding', 1],
      [[0.05, 0.002, 0], 'source-point-on-wire', 2],
      [[0, -0.05 + 0.8 * 0.3, 0.01 + 0.6 * 0.3], 'source-point-on-wire', 3],
      [[0.009, 0.003, 0.03], 'source-point-on-block', 4],
      [[-0.001, -0.01, 0.0325], 'source-point-on-block', 4],
    ];
    const f = sumField(parts);
    for (const [p, code, index] of cases) {
      const issues = fieldIssuesAt(parts, p);
      expect(issues.map((i) => [i.code, i.partIndex])).toContainEqual([code, index]);
      const s = f(p);
      expectFinite(s);
      // The sample itself says what the sum left out: the same issues as fieldIssuesAt.
      expect(s.leftOut).toEqual(issues);
      const without = sumField(parts.filter((_, i) => i !== index))(p);
      expect(relVec(s.B, without.B)).toBeLessThan(1e-12);
    }
    expect(fieldIssuesAt(parts, [0.05, 0.05, 0.05])).toEqual([]);
    expect(f([0.05, 0.05, 0.05]).leftOut).toBeUndefined();
  });

  it('invalid parts are reported and left out of the sum', () => {
    const bad: FieldSourceSpec[] = [loop(0, 0, 10), { kind: 'wire', point: [0, 0, 0], direction: [0, 0, 2], currentA: 1 }, { kind: 'slab', centre: [0, 0, 0], sizeM: [1, Number.NaN, 1], magnetisationT: [0, 0, 1] }];
    expect(fieldIssuesAt(bad, [1, 1, 1]).map((i) => [i.code, i.partIndex])).toEqual([
      ['source-invalid-part', 0],
      ['source-invalid-part', 1],
      ['source-invalid-part', 2],
    ]);
    expect(sumField(bad)([1, 1, 1]).B).toEqual([0, 0, 0]);
    // Invalid parts are the model's to report: the sample does not repeat them.
    expect(sumField(bad)([1, 1, 1]).leftOut).toBeUndefined();
  });

  it('a part whose field overflows just off its conductor is left out and named, never Infinity', () => {
    // 1e300 A at 1 µm: B = μ0 I/(2π ρ) ≈ 2e299 T is still a double, but the gradient's formula
    // overflows on the way (IEEE 754 doubles end near 1.8e308) and gives NaN.
    const wire: FieldSourceSpec = { kind: 'wire', point: [0, 0, 0], direction: [1, 0, 0], currentA: 1e300 };
    const s = sumField([loop(0, 0.03, 100), wire])([0, 1e-6, 0]);
    expectFinite(s);
    expect(s.leftOut?.map((i) => [i.code, i.partIndex])).toEqual([['source-point-on-wire', 1]]);
  });
});

describe('curvature and sampling', () => {
  it('the Hessian of |B| at a Helmholtz centre is the on-axis second derivative (Griffiths on-axis loop field, differentiated)', () => {
    // Two loops at ±h: d²B_z/dz² on the axis is Σ 3μ0NIR²(4z² − R²)/(2(R² + z²)^{7/2}), zero at h = R/2.
    // With h = 0.6 R it is not zero: compare with that sum.
    const R = 0.05;
    const NI = 400;
    const h = 0.6 * R;
    const f = sumField([loop(-h, R, NI), loop(h, R, NI)]);
    const d2 = 2 * ((3 * MU0 * NI * R * R * (4 * h * h - R * R)) / (2 * (R * R + h * h) ** 3.5));
    const c = magnitudeHessian(f, [0, 0, 0]);
    expect(c.issues).toEqual([]);
    expect(Math.abs(c.hessian![2][2] / d2 - 1)).toBeLessThan(1e-6);
    // Laplace: ∇²B_z = 0, and at an axial extremum of |B| = B_z the radial curvatures are −½ of the axial one.
    expect(Math.abs(c.hessian![0][0] / (-d2 / 2) - 1)).toBeLessThan(1e-6);
  });

  it('|B| has no curvature at a field zero: an issue, not a number', () => {
    const f = sumField([loop(-0.02, 0.04, 100), loop(0.02, 0.04, -100)]);
    expect(magnitudeGradient(f([0, 0, 0]))).toBeUndefined();
    expect(magnitudeHessian(f, [0, 0, 0]).issues.map((i) => i.code)).toEqual(['source-zero-field']);
    expect(magnitudeHessian(f, [0, 0, 0], 0).issues.map((i) => i.code)).toEqual(['source-bad-step']);
  });

  it('samples a segment end to end and a grid row by row', () => {
    const f = sumField([loop(0, 0.03, 100)]);
    const line = sampleSegment(f, [0, 0, -0.1], [0, 0, 0.1], 5);
    expect(line.s).toEqual([0, 0.05, 0.1, 0.15000000000000002, 0.2]);
    expect(line.samples[2]!.magnitude).toBeCloseTo((MU0 * 100) / (2 * 0.03), 12);
    expect(sampleSegment(f, [0, 0, 0], [1, 0, 0], 1).issues.map((i) => i.code)).toEqual(['source-bad-sampling']);
    const grid = sampleGrid(f, { centre: [0, 0, 0], uHalf: [0.01, 0, 0], vHalf: [0, 0, 0.02], nu: 3, nv: 2 });
    expect(grid.u).toEqual([-1, 0, 1]);
    expect(grid.rows.length).toBe(2);
    expect(grid.rows[1]![2]!.point).toEqual([0.01, 0, 0.02]);
    expect(sampleGrid(f, { centre: [0, 0, 0], uHalf: [1, 0, 0], vHalf: [0, 1, 0], nu: 2000, nv: 2000 }).issues.map((i) => i.code)).toEqual(['source-bad-sampling']);
  });

  it('a block outside and inside: B = μ0H outside, μ0(H + M) inside, B_normal continuous across a face', () => {
    const spec = { kind: 'slab' as const, centre: [0, 0, 0] as Vec3, sizeM: [0.01, 0.01, 0.01] as Vec3, magnetisationT: [0, 0, 1] as Vec3 };
    const inside = slabField(spec, [0, 0, 0.005 - 1e-9]).B[2];
    const outside = slabField(spec, [0, 0, 0.005 + 1e-9]).B[2];
    expect(Math.abs(inside - outside)).toBeLessThan(1e-6);
    // Centre of a cube magnetised along z: B_z = J/3 + … no: μ0H = −J/3 (demagnetising factor 1/3 of a cube), B = 2J/3.
    expect(Math.abs(slabField(spec, [0, 0, 0]).B[2] - 2 / 3)).toBeLessThan(1e-14);
  });
});

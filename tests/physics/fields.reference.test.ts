/**
 * Field sources against direct numerical quadrature of their defining integrals with SciPy
 * (tests/reference/field_sources.json, written by scripts/reference/field_sources.py): the
 * Biot–Savart line integral of a tilted loop, the current sheet of a solenoid, a finite wire,
 * and the surface-charge integral of a magnetised block; K and E from scipy.special; μ0 from
 * scipy.constants (CODATA 2022).
 */
import { describe, expect, it } from 'vitest';
import { VACUUM_PERMEABILITY } from '../../server/src/physics/constants';
import { cel, ellipticParts, loopField, slabField, solenoidField, wireField, type Mat3, type Vec3 } from '../../server/src/physics/fields';
import ref from '../reference/field_sources.json';
import { matNorm, relVec, vecNorm } from './fields.fixtures';

const v3 = (x: number[]): Vec3 => [x[0]!, x[1]!, x[2]!];

/**
 * Gradient error relative to the larger of the reference gradient and |B|/size: at a centre of
 * symmetry the gradient is zero and the quadrature returns only its rounding there.
 */
function gradError(g: Mat3, ref: number[][], b: number[], size: number): number {
  const d = g.map((r, i) => r.map((x, j) => x - ref[i]![j]!));
  return matNorm(d) / Math.max(matNorm(ref), vecNorm(b) / size);
}

describe('reference file', () => {
  it('was made by the committed generator with SciPy', () => {
    expect(ref.generator).toBe('scripts/reference/field_sources.py');
    expect(ref.scipy_version).toMatch(/^1\./);
  });
  it('μ0 in constants.ts is the CODATA 2022 value of scipy.constants', () => {
    expect(VACUUM_PERMEABILITY).toBe(ref.mu0);
  });
});

describe('complete elliptic integrals (scipy.special.ellipk, ellipe)', () => {
  it('K = cel(kc, 1, 1, 1) and E = cel(kc, 1, 1, kc²) to 1e-14 (Bulirsch 1969)', () => {
    for (const e of ref.elliptic) {
      if (e.m === 0) continue;
      const kc = Math.sqrt(1 - e.m);
      expect(Math.abs(cel(kc, 1, 1, 1) / e.K - 1), `K(${e.m})`).toBeLessThan(1e-14);
      expect(Math.abs(cel(kc, 1, 1, kc * kc) / e.E - 1), `E(${e.m})`).toBeLessThan(1e-14);
    }
  });
  it('the series and cel parts agree with K = Bq + Dq and E = Bq + (1 − m)Dq on both sides of the switch', () => {
    for (const e of ref.elliptic) {
      const p = ellipticParts(e.m, Math.sqrt(1 - e.m));
      expect(Math.abs((p.bq + p.dq) / e.K - 1), `K(${e.m})`).toBeLessThan(2e-15);
      expect(Math.abs((p.bq + (1 - e.m) * p.dq) / e.E - 1), `E(${e.m})`).toBeLessThan(2e-15);
      if (e.m > 0.01) expect(Math.abs(p.gq - (p.bq - p.dq) / e.m)).toBeLessThan(1e-13);
    }
  });
});

describe('exact fields against SciPy quadrature', () => {
  it('tilted loop, off the axis, near the wire and far away: B to 1e-10, gradient to 1e-9', () => {
    const s = ref.loop.spec;
    const spec = { kind: 'loop' as const, centre: v3(s.centre), axis: v3(s.axis), radiusM: s.radius, ampereTurns: s.ampereTurns };
    for (const p of ref.loop.points) {
      const f = loopField(spec, v3(p.x));
      expect(relVec(f.B, p.B), `B at ${p.x}`).toBeLessThan(1e-10);
      expect(gradError(f.gradient, p.gradient, p.B, s.radius), `gradient at ${p.x}`).toBeLessThan(1e-9);
    }
  });

  it('finite solenoid (current sheet), inside, outside, beyond the ends: B and gradient to 1e-10', () => {
    const s = ref.solenoid.spec;
    const spec = { kind: 'solenoid' as const, centre: v3(s.centre), axis: v3(s.axis), radiusM: s.radius, lengthM: s.length, ampereTurns: s.ampereTurns };
    for (const p of ref.solenoid.points) {
      const f = solenoidField(spec, v3(p.x));
      expect(relVec(f.B, p.B), `B at ${p.x}`).toBeLessThan(1e-10);
      expect(gradError(f.gradient, p.gradient, p.B, s.radius), `gradient at ${p.x}`).toBeLessThan(1e-9);
    }
  });

  it('finite straight wire: B and gradient to 1e-10', () => {
    const s = ref.segment.spec;
    const spec = { kind: 'wire' as const, point: v3(s.point), direction: v3(s.direction), lengthM: s.length, currentA: s.current };
    for (const p of ref.segment.points) {
      const f = wireField(spec, v3(p.x));
      expect(relVec(f.B, p.B), `B at ${p.x}`).toBeLessThan(1e-10);
      expect(gradError(f.gradient, p.gradient, p.B, s.length), `gradient at ${p.x}`).toBeLessThan(1e-10);
    }
  });

  it('magnetised block (surface-charge integral), inside and outside: B to 1e-9, gradient to 1e-9', () => {
    const s = ref.block.spec;
    const spec = { kind: 'slab' as const, centre: v3(s.centre), sizeM: v3(s.size), magnetisationT: v3(s.magnetisation) };
    for (const p of ref.block.points) {
      const f = slabField(spec, v3(p.x));
      expect(relVec(f.B, p.B), `B at ${p.x}`).toBeLessThan(1e-9);
      expect(gradError(f.gradient, p.gradient, p.B, Math.max(...s.size)), `gradient at ${p.x}`).toBeLessThan(1e-9);
    }
  });
});

/**
 * The summed field of some parts as reports print it. Two things the bare sum does not say:
 * - a point on a conductor (a loop's wire, a wire, a winding, a block's face): the sum leaves that
 *   part out there and says so in the sample's `leftOut`, so a value would mislead; here the point
 *   has no value, only the issue;
 * - exact cancellations (the centre of an opposed coil pair, the axial derivative at the centre of a
 *   Helmholtz pair) leave rounding of ~1e-16 of the parts' own size, which would print as a value:
 *   below 1e-12 of that size a component is 0. A magnetised block cancels inside its own closed
 *   form (corner terms of size μ0·M), so its scale is its own magnetisation, even when it is alone.
 */
import type { FieldIssue } from '../physics/fields';
import type { FieldFunction, FieldSample, FieldSourceSpec, Vec3 } from '../physics/fields/types';

export const CANCELLATION_FLOOR = 1e-12;

export type FieldOf = (parts: readonly FieldSourceSpec[]) => FieldFunction;

export type CleanSample = { sample: FieldSample } | { onSource: FieldIssue };

export function cleanField(parts: readonly FieldSourceSpec[], fieldOf: FieldOf): (point: Vec3) => CleanSample {
  if (parts.length <= 1 && parts[0]?.kind !== 'slab') {
    // One loop, solenoid or wire alone cannot cancel against itself.
    const only = fieldOf(parts);
    return (point) => {
      const sample = only(point);
      return sample.leftOut ? { onSource: sample.leftOut[0]! } : { sample };
    };
  }
  // The sum is made here from the parts' own fields, which also give the size of what cancels.
  const each = parts.map((p) => fieldOf([p]));
  return (point) => {
    const own = each.map((f) => f(point));
    const k = own.findIndex((s) => s.leftOut);
    // Each part was summed alone: its issue's index is made the part's place in `parts`.
    if (k >= 0) return { onSource: { ...own[k]!.leftOut![0]!, partIndex: k } };
    const B = [0, 0, 0];
    const G = [0, 0, 0, 0, 0, 0, 0, 0, 0];
    let bScale = 0;
    let gScale = 0;
    for (const p of parts) {
      const inner = intrinsicScale(p);
      bScale += inner.field;
      gScale = Math.max(gScale, inner.gradient);
    }
    for (const s of own) {
      for (let i = 0; i < 3; i++) {
        B[i] += s.B[i];
        bScale += Math.abs(s.B[i]);
        for (let j = 0; j < 3; j++) {
          G[3 * i + j] += s.gradient[i][j];
          gScale = Math.max(gScale, Math.abs(s.gradient[i][j]));
        }
      }
    }
    const b = (k: number): number => (Math.abs(B[k]!) <= CANCELLATION_FLOOR * bScale ? 0 : B[k]!);
    const g = (k: number): number => (Math.abs(G[k]!) <= CANCELLATION_FLOOR * gScale * parts.length ? 0 : G[k]!);
    const row = (i: number): Vec3 => [g(3 * i), g(3 * i + 1), g(3 * i + 2)];
    return { sample: { B: [b(0), b(1), b(2)], gradient: [row(0), row(1), row(2)] } };
  };
}

/**
 * The size of the terms a part's own closed form sums: for a block, its corner terms, each of the
 * order of μ0·M (field) and μ0·M over its smallest half-edge (gradient); nothing for the others,
 * whose closed forms have no such inner cancellation.
 */
function intrinsicScale(p: FieldSourceSpec): { field: number; gradient: number } {
  if (p.kind !== 'slab') return { field: 0, gradient: 0 };
  const m = Math.hypot(...p.magnetisationT);
  return { field: m, gradient: m / (Math.min(...p.sizeM) / 2) };
}

/**
 * The summed field of some parts as reports print it. Two things the bare sum does not say:
 * - a point on a conductor (a loop's wire, a wire, a winding, a block's face): the sum leaves that
 *   part out there, so a value would mislead; here the point has no value, only the issue;
 * - exact cancellations (the centre of an opposed coil pair, the axial derivative at the centre of a
 *   Helmholtz pair) leave rounding of ~1e-16 of the parts' own size, which would print as a value:
 *   below 1e-12 of that size a component is 0.
 */
import { pointOnSource, type FieldIssue } from '../physics/fields';
import type { FieldFunction, FieldSample, FieldSourceSpec, Vec3 } from '../physics/fields/types';

export const CANCELLATION_FLOOR = 1e-12;

export type FieldOf = (parts: readonly FieldSourceSpec[]) => FieldFunction;

export type CleanSample = { sample: FieldSample } | { onSource: FieldIssue };

export function cleanField(parts: readonly FieldSourceSpec[], fieldOf: FieldOf): (point: Vec3) => CleanSample {
  const total = fieldOf(parts);
  // One part alone cannot cancel against itself.
  const each = parts.length > 1 ? parts.map((p) => fieldOf([p])) : [];
  return (point) => {
    for (const part of parts) {
      const on = pointOnSource(part, point);
      if (on) return { onSource: on };
    }
    const s = total(point);
    if (each.length === 0) return { sample: s };
    let bScale = 0;
    let gScale = 0;
    for (const f of each) {
      const own = f(point);
      bScale += Math.hypot(own.B[0], own.B[1], own.B[2]);
      for (const row of own.gradient) for (const g of row) gScale = Math.max(gScale, Math.abs(g));
    }
    const b = (x: number): number => (Math.abs(x) <= CANCELLATION_FLOOR * bScale ? 0 : x);
    const g = (x: number): number => (Math.abs(x) <= CANCELLATION_FLOOR * gScale * parts.length ? 0 : x);
    const row = (r: Vec3): Vec3 => [g(r[0]), g(r[1]), g(r[2])];
    return { sample: { B: [b(s.B[0]), b(s.B[1]), b(s.B[2])], gradient: [row(s.gradient[0]), row(s.gradient[1]), row(s.gradient[2])] } };
  };
}

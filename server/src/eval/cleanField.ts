/**
 * The summed field of some parts with exact cancellations cleaned: where the parts' fields cancel
 * (the centre of an opposed coil pair, the axial derivative at the centre of a Helmholtz pair) the
 * sum is left with rounding of ~1e-16 of the parts' own size, which would print as a value. Below
 * 1e-12 of that size a component is 0. Not finite (a point on a conductor): undefined.
 */
import { magnitude } from '../physics/fields/magnitude';
import type { FieldFunction, FieldSample, FieldSourceSpec, Vec3 } from '../physics/fields/types';

export const CANCELLATION_FLOOR = 1e-12;

export type FieldOf = (parts: readonly FieldSourceSpec[]) => FieldFunction;

export function cleanField(parts: readonly FieldSourceSpec[], fieldOf: FieldOf): (point: Vec3) => FieldSample | undefined {
  const total = fieldOf(parts);
  // One part alone cannot cancel against itself.
  const each = parts.length > 1 ? parts.map((p) => fieldOf([p])) : [];
  return (point) => {
    const s = total(point);
    if (!s.B.every(Number.isFinite) || !s.gradient.every((r) => r.every(Number.isFinite))) return undefined;
    if (each.length === 0) return s;
    let bScale = 0;
    let gScale = 0;
    for (const f of each) {
      const own = f(point);
      bScale += magnitude(own.B);
      for (const row of own.gradient) for (const g of row) if (Number.isFinite(g)) gScale = Math.max(gScale, Math.abs(g));
    }
    const b = (x: number): number => (Math.abs(x) <= CANCELLATION_FLOOR * bScale ? 0 : x);
    const g = (x: number): number => (Math.abs(x) <= CANCELLATION_FLOOR * gScale * parts.length ? 0 : x);
    const row = (r: Vec3): Vec3 => [g(r[0]), g(r[1]), g(r[2])];
    return { B: [b(s.B[0]), b(s.B[1]), b(s.B[2])], gradient: [row(s.gradient[0]), row(s.gradient[1]), row(s.gradient[2])] };
  };
}

/**
 * The summed field of some parts as reports print it. Two things the bare sum does not say:
 * - a point on a conductor (a loop's wire, a wire, a winding, a block's face): the sum leaves that
 *   part out there and says so in the sample's `leftOut`, so a value would mislead; here the point
 *   has no value, only the issue;
 * - exact cancellations (the centre of an opposed coil pair, the axial derivative at the centre of a
 *   Helmholtz pair) leave rounding of ~1e-16 of the parts' own size, which would print as a value:
 *   below 1e-12 of that size B (or the gradient) is 0. A magnetised block also cancels inside its
 *   own closed form, by an amount that depends on the point (far away its terms cancel to a dipole
 *   field); the closed form says how much rounding it leaves there (slabFieldWithRoundOff), and that
 *   is added to the floor, even when the block is alone.
 * The floor is the rounding at the point, so a component below it is indistinguishable from 0:
 * zeroing it never turns the printed direction by more than that rounding.
 */
import { slabFieldWithRoundOff } from '../physics/fields';
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
    let bFloor = CANCELLATION_FLOOR * bScale;
    let gFloor = CANCELLATION_FLOOR * gScale * parts.length;
    for (const p of parts) {
      if (p.kind !== 'slab') continue;
      const { roundOff } = slabFieldWithRoundOff(p, point);
      bFloor += roundOff.B;
      gFloor += roundOff.gradient;
    }
    // A component is 0 only when it is itself within the rounding bound at the point, so the printed
    // direction moves by no more than that rounding (a floor not tied to the point zeroed real parts).
    const b = (i: number): number => (Math.abs(B[i]!) <= bFloor ? 0 : B[i]!);
    const g = (k: number): number => (Math.abs(G[k]!) <= gFloor ? 0 : G[k]!);
    const row = (i: number): Vec3 => [g(3 * i), g(3 * i + 1), g(3 * i + 2)];
    return { sample: { B: [b(0), b(1), b(2)], gradient: [row(0), row(1), row(2)] } };
  };
}

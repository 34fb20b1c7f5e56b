/**
 * The summed field of some parts as reports print it. Two things the bare sum does not say:
 * - a point on a conductor (a loop's wire, a wire, a winding, a block's face): the sum leaves that
 *   part out there and says so in the sample's `leftOut`, so a value would mislead; here the point
 *   has no value, only the issue;
 * - exact cancellations (the centre of an opposed coil pair, the axial derivative at the centre of a
 *   Helmholtz pair) leave rounding of ~1e-16 of the parts' own size, which would print as a value:
 *   below 1e-12 of that size B (or the gradient) is 0. A magnetised block also cancels inside its
 *   own closed form, by an amount that depends on the point (far away its terms cancel to a dipole
 *   field); the closed form says how much rounding it leaves there (slabFieldWithRoundOff, whose
 *   one evaluation gives both the block's field and that rounding), and that is added to the
 *   floor, even when the block is alone.
 * The floor is the rounding at the point, so a component below it is indistinguishable from 0:
 * zeroing it never turns the printed direction by more than that rounding. The floor goes with
 * the sample, for numbers made from it (a derivative along an axis: axialDerivative).
 */
import { slabPartWithRoundOff, sumField } from '../physics/fields';
import type { FieldIssue } from '../physics/fields';
import type { FieldSample, FieldSourceSpec, Mat3, Vec3 } from '../physics/fields/types';

export const CANCELLATION_FLOOR = 1e-12;

/** The rounding a cleaned sample's components may carry: B (T) and each gradient entry (T/m). */
export interface FieldFloor {
  B: number;
  gradient: number;
}

export type CleanSample = { sample: FieldSample; floor: FieldFloor } | { onSource: FieldIssue };

/** One loop, solenoid or wire alone cannot cancel against itself: nothing is zeroed. */
const NO_FLOOR: FieldFloor = Object.freeze({ B: 0, gradient: 0 });

/** A part's field at the point with the rounding its own formula leaves there (0 where it cannot cancel). */
type PartField = (point: Vec3) => { sample: FieldSample; roundOff: FieldFloor };

/**
 * The field of `parts` (the physics core's sumField) cleaned of rounding. A block's field is its
 * closed form under the sum's rules (slabPartWithRoundOff: the one evaluation that also gives its rounding).
 */
export function cleanField(parts: readonly FieldSourceSpec[]): (point: Vec3) => CleanSample {
  if (parts.length <= 1 && parts[0]?.kind !== 'slab') {
    const only = sumField(parts);
    return (point) => {
      const sample = only(point);
      return sample.leftOut ? { onSource: sample.leftOut[0]! } : { sample, floor: NO_FLOOR };
    };
  }
  // The sum is made here from the parts' own fields, which also give the size of what cancels.
  const each: PartField[] = parts.map((p) => {
    if (p.kind === 'slab') return slabPartWithRoundOff(p);
    const f = sumField([p]);
    return (point) => ({ sample: f(point), roundOff: NO_FLOOR });
  });
  return (point) => {
    const own = each.map((f) => f(point));
    const k = own.findIndex((s) => s.sample.leftOut);
    // Each part was summed alone: its issue's index is made the part's place in `parts`.
    if (k >= 0) return { onSource: { ...own[k]!.sample.leftOut![0]!, partIndex: k } };
    const B = [0, 0, 0];
    const G = [0, 0, 0, 0, 0, 0, 0, 0, 0];
    let bScale = 0;
    let gScale = 0;
    let bRound = 0;
    let gRound = 0;
    for (const { sample: s, roundOff } of own) {
      bRound += roundOff.B;
      gRound += roundOff.gradient;
      for (let i = 0; i < 3; i++) {
        B[i] += s.B[i];
        bScale += Math.abs(s.B[i]);
        for (let j = 0; j < 3; j++) {
          G[3 * i + j] += s.gradient[i][j];
          gScale = Math.max(gScale, Math.abs(s.gradient[i][j]));
        }
      }
    }
    // Parts cancel against each other only when there are two or more; a block alone leaves its own rounding.
    const across = parts.length > 1 ? CANCELLATION_FLOOR : 0;
    const floor = { B: across * bScale + bRound, gradient: across * gScale * parts.length + gRound };
    // A component is 0 only when it is itself within the rounding bound at the point, so the printed
    // direction moves by no more than that rounding (a floor not tied to the point zeroed real parts).
    const b = (i: number): number => (Math.abs(B[i]!) <= floor.B ? 0 : B[i]!);
    const g = (k: number): number => (Math.abs(G[k]!) <= floor.gradient ? 0 : G[k]!);
    const row = (i: number): Vec3 => [g(3 * i), g(3 * i + 1), g(3 * i + 2)];
    return { sample: { B: [b(0), b(1), b(2)], gradient: [row(0), row(1), row(2)] }, floor };
  };
}

/**
 * aᵀ G a, the derivative of B along a unit axis a, from a cleaned gradient G with its floor; 0 when
 * within the rounding it carries. Each printed entry of G is within the floor of the sum it came
 * from (zeroing moves it by no more), which is within the floor of the exact value: 2·floor per
 * entry, reaching aᵀ G a through the weights |a_i a_j|. The axis's own rounding (ε of each
 * component) and the products and sum add a few ε of the size of the terms.
 */
export function axialDerivative(G: Mat3, axis: Vec3, gradientFloor: number): number {
  let d = 0;
  let size = 0;
  let weight = 0;
  for (let i = 0; i < 3; i++) {
    for (let j = 0; j < 3; j++) {
      const t = axis[i]! * G[i]![j]! * axis[j]!;
      d += t;
      size += Math.abs(t);
      weight += Math.abs(axis[i]! * axis[j]!);
    }
  }
  return Math.abs(d) <= 2 * gradientFloor * weight + 4 * Number.EPSILON * size ? 0 : d;
}

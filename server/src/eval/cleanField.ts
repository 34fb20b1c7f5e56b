/**
 * The summed field of some parts as reports print it. Two things the bare sum does not say:
 * - a point on a conductor (a loop's wire, a wire, a winding, a block's face): the sum leaves that
 *   part out there and says so in the sample's `leftOut`, so a value would mislead; here the point
 *   has no value, only the issue;
 * - exact cancellations (the centre of an opposed coil pair, the axial derivative at the centre of a
 *   Helmholtz pair) leave rounding of ~1e-16 of the parts' own size, which would print as a value:
 *   below 1e-12 of that size a component is 0. A magnetised block cancels inside its own closed
 *   form (face terms of size μ0·M, and μ0·M over the distance to its nearest edge for the
 *   gradient), so that is its scale, even when it is alone.
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
      const inner = intrinsicScale(p, point);
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
 * The size of the terms a part's own closed form sums at `point`: for a block, its face terms,
 * each of the order of μ0·M (field) and of μ0·M over the point's distance to the block's nearest
 * edge (gradient: the terms are 1/R to a corner and |u|/(u² + w²) ≤ 1/√(u² + w²) to an edge line,
 * physics/fields/slabField.ts), so their round-off is ε times that. Far from a thin film the
 * gradient is small because the film is thin, not because it cancels: its own scale shrinks with
 * the distance, not with the film's thickness. Nothing for the other parts, whose closed forms
 * have no such inner cancellation.
 */
function intrinsicScale(p: FieldSourceSpec, point: Vec3): { field: number; gradient: number } {
  if (p.kind !== 'slab') return { field: 0, gradient: 0 };
  const m = Math.hypot(...p.magnetisationT);
  const d = distanceToNearestEdge(p.centre, p.sizeM, point);
  return { field: m, gradient: d > 0 ? m / d : 0 };
}

/** Distance from `point` to the nearest of the 12 edges of the box `centre` ± `size`/2 (corners included). */
export function distanceToNearestEdge(centre: Vec3, size: Vec3, point: Vec3): number {
  let best = Number.POSITIVE_INFINITY;
  for (let k = 0; k < 3; k++) {
    // Edges along axis k: the offset along k clamped to the edge, the two others to one of its four lines.
    const along = Math.max(0, Math.abs(point[k] - centre[k]) - size[k] / 2);
    const a = (k + 1) % 3;
    const b = (k + 2) % 3;
    const da = Math.abs(Math.abs(point[a] - centre[a]) - size[a] / 2);
    const db = Math.abs(Math.abs(point[b] - centre[b]) - size[b] / 2);
    best = Math.min(best, Math.hypot(along, da, db));
  }
  return best;
}

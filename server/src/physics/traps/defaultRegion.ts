/**
 * The default trap region when a setup gives none: the sphere about the centre that reaches 90 %
 * of the way to the nearest conductor of the trap's sources (a loop's winding, a solenoid's
 * current sheet, a wire, a magnetised block). Atoms that get that far would meet the hardware.
 */
import type { FieldSourceSpec, Vec3 } from '../fields/types';
import { figureIssue } from './issues';
import type { TrapIssue } from './types';
import { addScaled, dot, norm, sub } from './vec3';

export const DEFAULT_REGION_FRACTION = 0.9;

/** Distance from `p` to the nearest conductor of one source part, m. */
export function distanceToSource(p: Vec3, s: FieldSourceSpec): number {
  switch (s.kind) {
    case 'loop': {
      const d = sub(p, s.centre);
      const z = dot(d, s.axis);
      const rho = norm(addScaled(d, s.axis, -z));
      return Math.hypot(rho - s.radiusM, z);
    }
    case 'solenoid': {
      const d = sub(p, s.centre);
      const z = dot(d, s.axis);
      const rho = norm(addScaled(d, s.axis, -z));
      const beyond = Math.max(0, Math.abs(z) - s.lengthM / 2);
      return Math.hypot(rho - s.radiusM, beyond);
    }
    case 'wire': {
      const d = sub(p, s.point);
      let t = dot(d, s.direction);
      if (s.lengthM !== undefined) t = Math.max(-s.lengthM / 2, Math.min(s.lengthM / 2, t));
      return norm(addScaled(d, s.direction, -t));
    }
    case 'slab': {
      // Outside the block: distance to the box; inside it: 0.
      let sq = 0;
      for (let k = 0; k < 3; k++) {
        const out = Math.abs(p[k] - s.centre[k]) - s.sizeM[k] / 2;
        if (out > 0) sq += out * out;
      }
      return Math.sqrt(sq);
    }
  }
}

/** The default radius about `centre`, or undefined when no part has a conductor (no parts). */
export function defaultRegionRadius(centre: Vec3, parts: readonly FieldSourceSpec[]): number | undefined {
  if (parts.length === 0) return undefined;
  let nearest = Number.POSITIVE_INFINITY;
  for (const s of parts) nearest = Math.min(nearest, distanceToSource(centre, s));
  return Number.isFinite(nearest) ? DEFAULT_REGION_FRACTION * nearest : undefined;
}

/** A region given by hand that reaches a conductor: atoms would meet the hardware before the edge. */
export function regionIssues(centre: Vec3, radiusM: number, parts: readonly FieldSourceSpec[]): TrapIssue[] {
  let nearest = Number.POSITIVE_INFINITY;
  for (const s of parts) nearest = Math.min(nearest, distanceToSource(centre, s));
  if (!(radiusM >= nearest)) return [];
  return [figureIssue('warning', { code: 'trap-region-reaches-source', radiusM, nearestM: nearest })];
}

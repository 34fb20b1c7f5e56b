/**
 * What the field does in the trap region, before any atom is placed in it: where |B| is smallest,
 * the range of |B| (the maximum sits on the region's surface: each component of a current-free
 * field is harmonic, so |B| is subharmonic and has no interior maximum), and the strongest |B|
 * gradient along gravity below the centre (what has to hold atoms up).
 */
import type { FieldIssue } from '../fields/issues';
import type { FieldFunction, Vec3 } from '../fields/types';
import { nelderMead } from './nelderMead';
import { magnitudeGradient } from '../fields';
import type { TrapRegion } from './types';
import { addScaled, dot, norm, sphereDirections, sub, unit } from './vec3';

export const SURFACE_SAMPLES = 98;
const GRAVITY_RAY_STEPS = 64;

export interface FieldSurvey {
  centre: Vec3;
  fieldAtCentreT: number;
  maxFieldT: number;
  gravityGradientTPerM: number;
  /** The first sampled point that lies on a conductor (the sum left a part out there), if any. */
  onConductor?: { point: Vec3; issue: FieldIssue };
}

/** |B| at r; +Infinity outside the region (keeps the search inside it) or on a conductor. */
function insideMagnitude(field: FieldFunction, region: TrapRegion): (r: Vec3) => number {
  return (r) => {
    if (norm(sub(r, region.centre)) > region.radiusM) return Number.POSITIVE_INFINITY;
    const s = field(r);
    return s.leftOut ? Number.POSITIVE_INFINITY : norm(s.B);
  };
}

export function surveyField(field: FieldFunction, region: TrapRegion, gravity: Vec3): FieldSurvey {
  const R = region.radiusM;
  let onConductor: FieldSurvey['onConductor'];
  // Every sample of the survey goes through here, so the first one on a conductor is kept.
  const noted: FieldFunction = (r) => {
    const s = field(r);
    if (s.leftOut && !onConductor) onConductor = { point: r, issue: s.leftOut[0]! };
    return s;
  };
  const f = insideMagnitude(noted, region);
  // Two passes: the second restarts from the first's best point with a fresh, smaller simplex.
  let best = nelderMead(f, region.centre, R / 8, R * 1e-10);
  best = nelderMead(f, best.point, R / 200, R * 1e-11);
  let maxFieldT = Number.isFinite(best.value) ? best.value : 0;
  for (const d of sphereDirections(SURFACE_SAMPLES)) {
    const s = noted(addScaled(region.centre, d, R));
    if (!s.leftOut) maxFieldT = Math.max(maxFieldT, norm(s.B));
  }
  let gravityGradientTPerM = 0;
  const down = unit(gravity);
  if (norm(down) > 0 && !onConductor) {
    // From the centre down to the region's surface along gravity.
    const exit = rayExit(best.point, down, region);
    for (let k = 0; k <= GRAVITY_RAY_STEPS; k++) {
      const s = noted(addScaled(best.point, down, (exit * k) / GRAVITY_RAY_STEPS));
      if (s.leftOut) continue;
      // The |B| gradient opposing gravity: how fast |B| rises going down.
      const mg = magnitudeGradient(s);
      const g = mg ? dot(mg, down) : 0;
      if (Number.isFinite(g)) gravityGradientTPerM = Math.max(gravityGradientTPerM, g);
    }
  }
  const fieldAtCentreT = Number.isFinite(best.value) ? best.value : 0;
  return { centre: best.point, fieldAtCentreT, maxFieldT, gravityGradientTPerM, ...(onConductor ? { onConductor } : {}) };
}

/** Distance s ≥ 0 at which r0 + s·d leaves the region's sphere (r0 inside). */
export function rayExit(r0: Vec3, d: Vec3, region: TrapRegion): number {
  const o = sub(r0, region.centre);
  const b = dot(o, d);
  const c = dot(o, o) - region.radiusM ** 2;
  return Math.max(0, -b + Math.sqrt(Math.max(0, b * b - c)));
}

/**
 * One sublevel's minimum of U(r) = E(|B|) − m g·r inside the region: a simplex search from the
 * field's own minimum (robust at a quadrupole's cone), then, where the minimum is smooth, Newton
 * steps on the exact gradient with a finite-difference Hessian.
 */
import type { Vec3 } from '../fields/types';
import { nelderMead } from './nelderMead';
import type { TrapPotential } from './potential';
import type { TrapRegion } from './types';
import { norm, sub } from './vec3';
import { hessian, solve3 } from './hessian';

export interface MinimumFound {
  position: Vec3;
  energyJ: number;
  fieldT: number;
  /** The search ended against the region's surface: no minimum inside. */
  onEdge: boolean;
}

/** Restarts of the simplex search at most (each costs a few hundred potential evaluations). */
const MAX_RESTARTS = 6;

/** Fraction of the radius beyond which a minimum counts as lying on the edge. */
export const EDGE_FRACTION = 0.995;

export function findMinimum(u: TrapPotential, start: Vec3, region: TrapRegion, smooth: (r: Vec3) => number): MinimumFound {
  const R = region.radiusM;
  const inside = (r: Vec3): number => (norm(sub(r, region.centre)) > R ? Number.POSITIVE_INFINITY : u.energy(r));
  // A simplex can stall in a tilted valley (a quadrupole's cone with gravity): restart it with a
  // fresh, full-size simplex until a restart no longer moves, then refine with a small one.
  let best = nelderMead(inside, start, R / 20, R * 1e-10);
  for (let k = 0; k < MAX_RESTARTS; k++) {
    const again = nelderMead(inside, best.point, R / 20, R * 1e-10);
    const moved = norm(sub(again.point, best.point));
    best = again;
    // A stall leaves the simplex far from the minimum; small moves are the final digits, which Newton steps (or the last refinement) supply.
    if (moved < R * 1e-6) break;
  }
  best = nelderMead(inside, best.point, R / 400, R * 1e-11);
  let p = best.point;
  // Newton polish where the potential is smooth (a length scale over which |B| rounds off is known).
  const ell = smooth(p);
  if (ell > 0) {
    for (let k = 0; k < 4; k++) {
      const h = hessian(u.gradient, p, ell * 1e-4);
      const step = solve3(h, u.gradient(p));
      if (!step) break;
      const next = sub(p, step);
      // Accept only steps that shrink the force: near round-off a Newton step can wander.
      if (norm(step) > ell || norm(sub(next, region.centre)) > R || !(norm(u.gradient(next)) < norm(u.gradient(p)))) break;
      p = next;
      if (norm(step) < R * 1e-14) break;
    }
  }
  const onEdge = norm(sub(p, region.centre)) > EDGE_FRACTION * R;
  return { position: p, energyJ: u.energy(p), fieldT: u.fieldT(p), onEdge };
}

/**
 * The depth of a sublevel's trap: the lowest energy above the minimum at which an atom can leave.
 * It leaves either through the region's surface (the edge) or where |B| passes the turning field
 * of its E(B) (beyond it the sublevel is high-field seeking and is pushed out). Rays go out from
 * the minimum in evenly spread directions; each ray's barrier is the highest U on it before it
 * exits, and the depth is the lowest barrier over the rays, refined around the best ray.
 * Paths are straight rays, so a curved escape route could be a little lower (docs/traps.md).
 */
import { PLANCK_H } from '../constants';
import type { FieldFunction, Vec3 } from '../fields/types';
import type { EnergyCurve } from './energyCurves';
import { rayExit } from './fieldSurvey';
import type { TrapRegion } from './types';
import { addScaled, dot, norm, sphereDirections, unit } from './vec3';

export const DEPTH_DIRECTIONS = 42;
export const DEPTH_STEPS = 16;
const REFINE_ROUNDS = 8;

export interface DepthFound {
  depthJ: number;
  limit: 'edge' | 'turning';
  direction: Vec3;
}

/**
 * |B| along rays, kept for the sublevels of one summary: sublevels whose minima coincide (all of
 * a quadrupole's, at its zero) walk the same rays, and the field is the costly part.
 */
export type RayCache = Map<string, Float64Array>;

interface RayBarrier {
  barrierJ: number;
  limit: 'edge' | 'turning';
}

export function trapDepth(
  field: FieldFunction,
  curve: EnergyCurve,
  massKg: number,
  gravity: Vec3,
  region: TrapRegion,
  minimum: { position: Vec3; energyJ: number },
  turningFieldT: number | null,
  cache: RayCache = new Map(),
): DepthFound {
  const r0 = minimum.position;
  const u = (r: Vec3, b: number): number => PLANCK_H * curve.energyHz(b) - massKg * dot(gravity, r);
  // `beat`: a ray whose coarse barrier is already above this cannot win, so its maximum is not refined.
  const ray = (d: Vec3, beat = Number.POSITIVE_INFINITY): RayBarrier => {
    const exit = rayExit(r0, d, region);
    const key = `${r0[0]},${r0[1]},${r0[2]}|${d[0]},${d[1]},${d[2]}`;
    let fields = cache.get(key);
    if (!fields) {
      fields = new Float64Array(DEPTH_STEPS + 1);
      for (let k = 1; k <= DEPTH_STEPS; k++) fields[k] = norm(field(addScaled(r0, d, (exit * k) / DEPTH_STEPS)).B);
      cache.set(key, fields);
    }
    let top = minimum.energyJ;
    let prevS = 0;
    let at = 0;
    for (let k = 1; k <= DEPTH_STEPS; k++) {
      const s = (exit * k) / DEPTH_STEPS;
      const r = addScaled(r0, d, s);
      const b = fields[k]!;
      if (!Number.isFinite(b)) return { barrierJ: top, limit: 'edge' };
      if (turningFieldT !== null && b >= turningFieldT) {
        // Bisect for the point where |B| reaches the turning field.
        let lo = prevS;
        let hi = s;
        for (let i = 0; i < 40; i++) {
          const mid = 0.5 * (lo + hi);
          if (norm(field(addScaled(r0, d, mid)).B) >= turningFieldT) hi = mid;
          else lo = mid;
        }
        return { barrierJ: Math.max(top, u(addScaled(r0, d, hi), turningFieldT)), limit: 'turning' };
      }
      const v = u(r, b);
      if (v > top) {
        top = v;
        at = k;
      }
      prevS = s;
    }
    // An interior maximum (gravity tilting the edge): refine it between its neighbouring samples.
    if (at > 0 && at < DEPTH_STEPS && top < beat) top = Math.max(top, refineMax(r0, d, exit, at, u, field));
    return { barrierJ: top, limit: 'edge' };
  };
  let bestDir: Vec3 = [0, 0, 1];
  let best: RayBarrier = { barrierJ: Number.POSITIVE_INFINITY, limit: 'edge' };
  const down = unit(gravity);
  const candidates = sphereDirections(DEPTH_DIRECTIONS);
  if (norm(down) > 0) candidates.push(down);
  for (const d of candidates) {
    const b = ray(d, best.barrierJ);
    if (b.barrierJ < best.barrierJ) [best, bestDir] = [b, d];
  }
  // Pattern search on the sphere around the best direction.
  let spread = Math.sqrt((4 * Math.PI) / DEPTH_DIRECTIONS);
  for (let round = 0; round < REFINE_ROUNDS; round++) {
    const [e1, e2] = perpendiculars(bestDir);
    let moved = false;
    for (const [a, b] of [[1, 0], [-1, 0], [0, 1], [0, -1]] as const) {
      const d = unit(addScaled(addScaled(bestDir, e1, a * spread), e2, b * spread));
      const r = ray(d, best.barrierJ);
      if (r.barrierJ < best.barrierJ) {
        [best, bestDir] = [r, d];
        moved = true;
      }
    }
    if (!moved) spread /= 2;
  }
  return { depthJ: Math.max(0, best.barrierJ - minimum.energyJ), limit: best.limit, direction: bestDir };
}

function perpendiculars(d: Vec3): [Vec3, Vec3] {
  const a: Vec3 = Math.abs(d[0]) < 0.9 ? [1, 0, 0] : [0, 1, 0];
  const e1 = unit(addScaled(a, d, -dot(a, d)));
  const e2: Vec3 = [d[1] * e1[2] - d[2] * e1[1], d[2] * e1[0] - d[0] * e1[2], d[0] * e1[1] - d[1] * e1[0]];
  return [e1, e2];
}

/** Golden-section search for the highest U on a ray between samples at−1 and at+1. */
function refineMax(r0: Vec3, d: Vec3, exit: number, at: number, u: (r: Vec3, b: number) => number, field: FieldFunction): number {
  const f = (s: number): number => {
    const r = addScaled(r0, d, s);
    return u(r, norm(field(r).B));
  };
  let lo = (exit * (at - 1)) / DEPTH_STEPS;
  let hi = (exit * (at + 1)) / DEPTH_STEPS;
  const g = (Math.sqrt(5) - 1) / 2;
  let x1 = hi - g * (hi - lo);
  let x2 = lo + g * (hi - lo);
  let f1 = f(x1);
  let f2 = f(x2);
  for (let i = 0; i < 24; i++) {
    if (f1 > f2) {
      hi = x2;
      [x2, f2] = [x1, f1];
      x1 = hi - g * (hi - lo);
      f1 = f(x1);
    } else {
      lo = x1;
      [x1, f1] = [x2, f2];
      x2 = lo + g * (hi - lo);
      f2 = f(x2);
    }
  }
  return Math.max(f1, f2);
}

/**
 * How close a straight stretch of beam line comes to a field source: the thin conductor of a
 * wire or a loop, the current sheet of a solenoid, the volume of a magnetised block. The thin
 * models have no field on the conductor itself, and a real one has a thickness, so a beam line
 * that comes within the beam's own half height of one runs into it.
 */
import type { FieldSourceSpec, Vec3 } from '../../fields/types';
import { goldenMaximum } from '../../goldenMaximum';

/** Distance from a point to the source (0 inside a block), m. */
export function distanceToSource(spec: FieldSourceSpec, p: Vec3): number {
  switch (spec.kind) {
    case 'wire': {
      const d = [p[0] - spec.point[0], p[1] - spec.point[1], p[2] - spec.point[2]];
      const t = spec.direction;
      let u = d[0] * t[0] + d[1] * t[1] + d[2] * t[2];
      if (spec.lengthM !== undefined) u = Math.max(-spec.lengthM / 2, Math.min(spec.lengthM / 2, u));
      return Math.hypot(d[0] - u * t[0], d[1] - u * t[1], d[2] - u * t[2]);
    }
    case 'loop': {
      const { rho, z } = cylinder(p, spec.centre, spec.axis);
      return Math.hypot(rho - spec.radiusM, z);
    }
    case 'solenoid': {
      const { rho, z } = cylinder(p, spec.centre, spec.axis);
      return Math.hypot(Math.max(0, Math.abs(z) - spec.lengthM / 2), rho - spec.radiusM);
    }
    case 'slab': {
      let s = 0;
      for (let k = 0; k < 3; k++) {
        const out = Math.max(0, Math.abs(p[k] - spec.centre[k]) - spec.sizeM[k] / 2);
        s += out * out;
      }
      return Math.sqrt(s);
    }
  }
}

function cylinder(p: Vec3, c: Vec3, axis: Vec3): { rho: number; z: number } {
  const d = [p[0] - c[0], p[1] - c[1], p[2] - c[2]];
  const z = d[0] * axis[0] + d[1] * axis[1] + d[2] * axis[2];
  return { rho: Math.hypot(d[0] - z * axis[0], d[1] - z * axis[1], d[2] - z * axis[2]), z };
}

/**
 * Closest approach of the segment from `start` along +x for `lengthM` to the source: the
 * smallest distance on a grid of 2001 points, then refined by golden-section search around it
 * (the distance is smooth and has one minimum near the best grid point).
 */
export function closestApproach(spec: FieldSourceSpec, start: Vec3, lengthM: number): { distanceM: number; atM: number } {
  const at = (s: number): number => distanceToSource(spec, [start[0] + s, start[1], start[2]]);
  const n = 2000;
  let best = 0;
  let bestD = Infinity;
  for (let k = 0; k <= n; k++) {
    const d = at((lengthM * k) / n);
    if (d < bestD) {
      bestD = d;
      best = k;
    }
  }
  const lo = (lengthM * Math.max(0, best - 1)) / n;
  const hi = (lengthM * Math.min(n, best + 1)) / n;
  // The smallest distance is the largest of its negative.
  const s = goldenMaximum((x) => -at(x), lo, hi, 1e-15 * Math.max(1, lengthM), 60);
  const d = at(s);
  return d < bestD ? { distanceM: d, atM: s } : { distanceM: bestD, atM: (lengthM * best) / n };
}

/** The vector helpers the trap code needs beyond the field sources' own (fields/vec3.ts). */
import type { Vec3 } from '../fields/types';
import { norm } from '../fields/vec3';

export { dot, norm, sub } from '../fields/vec3';

/** a + s·b */
export function addScaled(a: Vec3, b: Vec3, s: number): Vec3 {
  return [a[0] + s * b[0], a[1] + s * b[1], a[2] + s * b[2]];
}

export function unit(a: Vec3): Vec3 {
  const n = norm(a);
  return n > 0 ? [a[0] / n, a[1] / n, a[2] / n] : [0, 0, 0];
}

/** Evenly spread unit vectors (a Fibonacci lattice on the sphere): directions for rays and surface samples. */
export function sphereDirections(count: number): Vec3[] {
  const out: Vec3[] = [];
  const golden = Math.PI * (3 - Math.sqrt(5));
  for (let i = 0; i < count; i++) {
    const z = 1 - (2 * (i + 0.5)) / count;
    const r = Math.sqrt(Math.max(0, 1 - z * z));
    const phi = golden * i;
    out.push([r * Math.cos(phi), r * Math.sin(phi), z]);
  }
  return out;
}

/** The few 3-vector operations the trap code needs (plain tuples, no allocation-heavy classes). */
import type { Mat3, Vec3 } from '../fields/types';

export function add(a: Vec3, b: Vec3): Vec3 {
  return [a[0] + b[0], a[1] + b[1], a[2] + b[2]];
}
export function sub(a: Vec3, b: Vec3): Vec3 {
  return [a[0] - b[0], a[1] - b[1], a[2] - b[2]];
}
export function scale(a: Vec3, s: number): Vec3 {
  return [a[0] * s, a[1] * s, a[2] * s];
}
/** a + s·b */
export function addScaled(a: Vec3, b: Vec3, s: number): Vec3 {
  return [a[0] + s * b[0], a[1] + s * b[1], a[2] + s * b[2]];
}
export function dot(a: Vec3, b: Vec3): number {
  return a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
}
export function norm(a: Vec3): number {
  return Math.hypot(a[0], a[1], a[2]);
}
export function unit(a: Vec3): Vec3 {
  const n = norm(a);
  return n > 0 ? scale(a, 1 / n) : [0, 0, 0];
}
/** Gᵀ·v: with G[i][j] = ∂B_i/∂x_j this is ∇(B·v) for a fixed v. */
export function transposeTimes(g: Mat3, v: Vec3): Vec3 {
  return [
    g[0][0] * v[0] + g[1][0] * v[1] + g[2][0] * v[2],
    g[0][1] * v[0] + g[1][1] * v[1] + g[2][1] * v[2],
    g[0][2] * v[0] + g[1][2] * v[1] + g[2][2] * v[2],
  ];
}
export function times(g: Mat3, v: Vec3): Vec3 {
  return [dot(g[0], v), dot(g[1], v), dot(g[2], v)];
}
export function isFiniteVec(a: Vec3): boolean {
  return Number.isFinite(a[0]) && Number.isFinite(a[1]) && Number.isFinite(a[2]);
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

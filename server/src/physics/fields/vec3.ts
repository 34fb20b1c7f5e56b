/** Small 3-vector and 3×3 helpers for the field sources (plain tuples, no allocation tricks). */
import type { Mat3, Vec3 } from './types';

export function sub(a: Vec3, b: Vec3): Vec3 {
  return [a[0] - b[0], a[1] - b[1], a[2] - b[2]];
}
export function scale(a: Vec3, s: number): Vec3 {
  return [a[0] * s, a[1] * s, a[2] * s];
}
export function dot(a: Vec3, b: Vec3): number {
  return a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
}
export function cross(a: Vec3, b: Vec3): Vec3 {
  return [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]];
}
export function norm(a: Vec3): number {
  return Math.sqrt(a[0] * a[0] + a[1] * a[1] + a[2] * a[2]);
}
export function isFiniteVec(a: Vec3): boolean {
  return Number.isFinite(a[0]) && Number.isFinite(a[1]) && Number.isFinite(a[2]);
}

/** A unit vector perpendicular to the unit vector `n` (any one; used where the direction is arbitrary). */
export function perpendicular(n: Vec3): Vec3 {
  const helper: Vec3 = Math.abs(n[0]) < 0.9 ? [1, 0, 0] : [0, 1, 0];
  const p = cross(n, helper);
  return scale(p, 1 / norm(p));
}

/** Mutable 3×3 accumulator, turned into a `Mat3` at the end. */
export type Mat3Acc = [number, number, number, number, number, number, number, number, number];

export function newAcc(): Mat3Acc {
  return [0, 0, 0, 0, 0, 0, 0, 0, 0];
}
/** acc += s · a bᵀ */
export function addOuter(acc: Mat3Acc, s: number, a: Vec3, b: Vec3): void {
  for (let i = 0; i < 3; i++) {
    const ai = s * a[i];
    acc[3 * i] += ai * b[0];
    acc[3 * i + 1] += ai * b[1];
    acc[3 * i + 2] += ai * b[2];
  }
}
export function accToMat(acc: Mat3Acc): Mat3 {
  return [
    [acc[0], acc[1], acc[2]],
    [acc[3], acc[4], acc[5]],
    [acc[6], acc[7], acc[8]],
  ];
}

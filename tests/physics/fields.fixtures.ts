/** Helpers shared by the field-source tests. */
import { expect } from 'vitest';
import type { FieldFunction, FieldSample, Mat3, Vec3 } from '../../server/src/physics/fields';

export function vecNorm(v: Vec3 | readonly number[]): number {
  return Math.hypot(v[0]!, v[1]!, v[2]!);
}
export function matNorm(m: Mat3 | readonly (readonly number[])[]): number {
  let s = 0;
  for (const r of m) for (const x of r) s += x * x;
  return Math.sqrt(s);
}

/** |a − b| / |b| for vectors, with the norm of the reference as the scale. */
export function relVec(a: Vec3, b: readonly number[]): number {
  return vecNorm([a[0] - b[0]!, a[1] - b[1]!, a[2] - b[2]!]) / vecNorm(b);
}
export function relMat(a: Mat3, b: readonly (readonly number[])[]): number {
  const d = a.map((r, i) => r.map((x, j) => x - b[i]![j]!));
  return matNorm(d) / matNorm(b);
}

/** Central differences of B: column j = ∂B/∂x_j. */
export function centralGradient(field: FieldFunction, p: Vec3, h: number): number[][] {
  const out = [
    [0, 0, 0],
    [0, 0, 0],
    [0, 0, 0],
  ];
  for (let j = 0; j < 3; j++) {
    const a: [number, number, number] = [p[0], p[1], p[2]];
    const b: [number, number, number] = [p[0], p[1], p[2]];
    a[j] += h;
    b[j] -= h;
    const fa = field(a).B;
    const fb = field(b).B;
    for (let i = 0; i < 3; i++) out[i]![j] = (fa[i] - fb[i]) / (2 * h);
  }
  return out;
}

/** Every number in a sample is finite. */
export function expectFinite(s: FieldSample): void {
  for (const x of [...s.B, ...s.gradient.flat()]) expect(Number.isFinite(x)).toBe(true);
}

/** Trace and antisymmetric part of the gradient relative to its size (both 0 in free space). */
export function divCurl(g: Mat3): { div: number; curl: number } {
  const n = matNorm(g);
  return {
    div: Math.abs(g[0][0] + g[1][1] + g[2][2]) / n,
    curl: Math.hypot(g[0][1] - g[1][0], g[0][2] - g[2][0], g[1][2] - g[2][1]) / n,
  };
}

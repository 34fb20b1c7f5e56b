/** The Hessian of a potential from central differences of its exact gradient, and a 3×3 solve. */
import type { Vec3 } from '../fields/types';

/** Row-major symmetric 3×3 (the two off-diagonal estimates averaged). */
export function hessian(gradient: (r: Vec3) => Vec3, at: Vec3, step: number): Float64Array {
  const h = new Float64Array(9);
  for (let j = 0; j < 3; j++) {
    const plus: [number, number, number] = [at[0], at[1], at[2]];
    const minus: [number, number, number] = [at[0], at[1], at[2]];
    plus[j] += step;
    minus[j] -= step;
    const gp = gradient(plus);
    const gm = gradient(minus);
    for (let i = 0; i < 3; i++) h[i * 3 + j] = (gp[i] - gm[i]) / (2 * step);
  }
  for (let i = 0; i < 3; i++) {
    for (let j = i + 1; j < 3; j++) {
      const m = 0.5 * (h[i * 3 + j] + h[j * 3 + i]);
      h[i * 3 + j] = m;
      h[j * 3 + i] = m;
    }
  }
  return h;
}

/** x with A x = b by Cramer's rule; null when A is singular to round-off. */
export function solve3(a: Float64Array, b: Vec3): Vec3 | null {
  const det = (m: Float64Array): number =>
    m[0] * (m[4] * m[8] - m[5] * m[7]) - m[1] * (m[3] * m[8] - m[5] * m[6]) + m[2] * (m[3] * m[7] - m[4] * m[6]);
  const d = det(a);
  let scale = 0;
  for (const v of a) scale = Math.max(scale, Math.abs(v));
  if (!(Math.abs(d) > 1e-12 * scale ** 3)) return null;
  const out: number[] = [];
  for (let c = 0; c < 3; c++) {
    const m = Float64Array.from(a);
    for (let r = 0; r < 3; r++) m[r * 3 + c] = b[r];
    out.push(det(m) / d);
  }
  return [out[0], out[1], out[2]];
}

/** |B| and its gradient from a field sample: what a low-field-seeking atom feels (U = μ|B|). */
import type { FieldSample, Vec3 } from './types';

export function magnitude(B: Vec3): number {
  return Math.hypot(B[0], B[1], B[2]);
}

/**
 * ∂|B|/∂x_j = Σ_i B_i ∂B_i/∂x_j / |B|. Undefined where B = 0 (|B| has a cone there, no
 * derivative) or where the sample is not finite (on a conductor).
 */
export function magnitudeGradient(s: FieldSample): Vec3 | undefined {
  const b = magnitude(s.B);
  if (!(b > 0) || !Number.isFinite(b)) return undefined;
  const g = s.gradient;
  const out: [number, number, number] = [0, 0, 0];
  for (let j = 0; j < 3; j++) out[j] = (s.B[0] * g[0][j] + s.B[1] * g[1][j] + s.B[2] * g[2][j]) / b;
  return out.every(Number.isFinite) ? out : undefined;
}


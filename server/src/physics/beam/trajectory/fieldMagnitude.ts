/**
 * What a sublevel that follows the field adiabatically feels: the magnitude |B| and its
 * gradient ∇|B| = Gᵀ B / |B| (G[i][j] = ∂B_i/∂x_j), and how fast the field's direction turns
 * along a path (for the adiabaticity check).
 */
import type { FieldSample } from '../../fields/types';

/** |B| (T) into out[0] and ∂|B|/∂x, ∂|B|/∂y, ∂|B|/∂z (T/m) into out[1..3]. At |B| = 0 the gradient of |B| is undefined: 0 is written. */
export function magnitudeAndGradient(sample: FieldSample, out: Float64Array): void {
  const [bx, by, bz] = sample.B;
  const g = sample.gradient;
  const b = Math.hypot(bx, by, bz);
  out[0] = b;
  if (!(b > 0)) {
    out[1] = 0;
    out[2] = 0;
    out[3] = 0;
    return;
  }
  for (let j = 0; j < 3; j++) out[j + 1] = (bx * g[0][j] + by * g[1][j] + bz * g[2][j]) / b;
}

/** |dB̂/ds| (rad/m) along the direction (1, dy, dz) per unit of s (the beam coordinate x). */
export function directionTurnRate(sample: FieldSample, dy: number, dz: number): number {
  const [bx, by, bz] = sample.B;
  const b = Math.hypot(bx, by, bz);
  if (!(b > 0)) return Infinity;
  const g = sample.gradient;
  const d0 = g[0][0] + g[0][1] * dy + g[0][2] * dz;
  const d1 = g[1][0] + g[1][1] * dy + g[1][2] * dz;
  const d2 = g[2][0] + g[2][1] * dy + g[2][2] * dz;
  const along = (d0 * bx + d1 * by + d2 * bz) / b;
  const p0 = d0 - (along * bx) / b;
  const p1 = d1 - (along * by) / b;
  const p2 = d2 - (along * bz) / b;
  return Math.hypot(p0, p1, p2) / b;
}

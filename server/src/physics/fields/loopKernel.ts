/**
 * The field of one circular current loop in its own cylindrical frame (ρ, z), with the derivatives
 * and the vector potential that the loop, the solenoid and the gradient tensor need.
 *
 * With α² = (a − ρ)² + z², β² = (a + ρ)² + z², m = 4aρ/β² and P = μ0 I a/π:
 *   B_z = P [Bq (a − ρ)/(α²β) + Dq (a + ρ)/β³],   B_ρ = P z [Bq/(α²β) − Dq/β³],
 *   A_φ = −P m Gq/β,
 * which are the textbook elliptic-integral forms (e.g. J. D. Jackson, Classical Electrodynamics,
 * 3rd ed., §5.5, from memory; checked here against SciPy quadrature of the Biot–Savart law)
 * rewritten in Bq, Dq, Gq so that nothing cancels on the axis (ρ → 0) or far away (m → 0).
 * ∂/∂z follows by the chain rule with ∂m/∂z = −2zm/β²; B_ρ/ρ is taken in closed form so the
 * gradient tensor needs no 0/0 on the axis.
 */
import { ellipticParts, type EllipticParts } from './ellipticParts';

export interface LoopLocal {
  bRho: number;
  bZ: number;
  /** B_ρ/ρ, finite on the axis. */
  bRhoOverRho: number;
  dBzDz: number;
  dBrhoDz: number;
  /** Azimuthal vector potential A_φ, T·m. */
  aPhi: number;
  /** A_φ/ρ, finite on the axis. */
  aPhiOverRho: number;
}

export function newLoopLocal(): LoopLocal {
  return { bRho: 0, bZ: 0, bRhoOverRho: 0, dBzDz: 0, dBrhoDz: 0, aPhi: 0, aPhiOverRho: 0 };
}

const parts: EllipticParts = { bq: 0, dq: 0, gq: 0 };

/**
 * `muI` = μ0·I (T·m); `rho` ≥ 0. The caller keeps the point off the wire (α > 0). Writes into
 * `out` (the field code reuses one object per call site) and returns it.
 */
export function loopLocal(radius: number, muI: number, rho: number, z: number, out: LoopLocal = newLoopLocal()): LoopLocal {
  const a = radius;
  const am = a - rho;
  const ap = a + rho;
  const z2 = z * z;
  const alpha2 = am * am + z2;
  const beta2 = ap * ap + z2;
  const beta = Math.sqrt(beta2);
  const m = (4 * a * rho) / beta2;
  const oneMinusM = alpha2 / beta2;
  const { bq, dq, gq } = ellipticParts(m, Math.sqrt(oneMinusM), parts);
  const P = (muI * a) / Math.PI;
  const beta3 = beta2 * beta;
  const ab = alpha2 * beta;
  const inner = bq / ab - dq / beta3;
  const bRhoOverRho = ((4 * P * a * z) / (beta3 * alpha2)) * (gq * oneMinusM + bq);

  const mz = (-2 * z * m) / beta2;
  const dB = (bq - gq - dq) / (2 * oneMinusM);
  const dD = (gq + dq) / (2 * oneMinusM);
  // ∂/∂z of 1/(α²β) and of 1/β³.
  const dInvAb = -2 * z / (alpha2 * ab) - z / (alpha2 * beta3);
  const dInvB3 = (-3 * z) / (beta3 * beta2);
  out.bZ = P * (bq * am / ab + dq * ap / beta3);
  // P z · inner cancels near the axis; ρ · (B_ρ/ρ) does not.
  out.bRho = rho * bRhoOverRho;
  out.bRhoOverRho = bRhoOverRho;
  out.dBzDz = P * (am * (dB * mz / ab + bq * dInvAb) + ap * (dD * mz / beta3 + dq * dInvB3));
  out.dBrhoDz = P * (inner + z * (dB * mz / ab + bq * dInvAb - dD * mz / beta3 - dq * dInvB3));
  out.aPhi = (-P * m * gq) / beta;
  out.aPhiOverRho = (-4 * P * a * gq) / beta3;
  return out;
}

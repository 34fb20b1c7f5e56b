/**
 * Field and gradient of a straight thin wire: infinite (B = μ0 I/(2πρ) around it, Ampère's law),
 * or a finite segment by the closed form of the Biot–Savart integral in the compact shape of
 * J. D. Hanson and S. P. Hirshman, "Compact expressions for the Biot–Savart fields of a
 * filamentary segment", Phys. Plasmas 9, 4410 (2002):
 *   B = (μ0 I/4π) · 2L(R₁ + R₂)/(R₁R₂((R₁ + R₂)² − L²)) · t̂ × r,
 * R₁, R₂ the distances to the ends, t̂ the current direction. It has no 0/0 on the wire's line
 * beyond its ends (there B = 0). (R₁ + R₂)² − L² is taken as 2L²ρ²/(R₁R₂ − d₁·d₂) beside the
 * segment so that it does not cancel close to the wire.
 * Both are B = κ(x) t̂ × r⊥, so ∂B_i/∂x_j = (t̂ × r⊥)_i ∂κ/∂x_j + κ [t̂]×_ij.
 */
import { VACUUM_PERMEABILITY } from '../constants';
import type { FieldSample, Vec3, WireSpec } from './types';
import { accToMat, addOuter, cross, dot, newAcc, sub } from './vec3';

export function wireField(spec: WireSpec, point: Vec3): FieldSample {
  const t = spec.direction;
  const d = sub(point, spec.point);
  const u = dot(d, t);
  const rPerp: Vec3 = [d[0] - u * t[0], d[1] - u * t[1], d[2] - u * t[2]];
  const around = cross(t, rPerp);
  let kappa: number;
  let gradKappa: Vec3;
  if (spec.lengthM === undefined) {
    const rho2 = dot(rPerp, rPerp);
    kappa = (VACUUM_PERMEABILITY * spec.currentA) / (2 * Math.PI * rho2);
    const s = (-2 * kappa) / rho2;
    gradKappa = [s * rPerp[0], s * rPerp[1], s * rPerp[2]];
  } else {
    const L = spec.lengthM;
    const h = L / 2;
    const d1: Vec3 = [d[0] + h * t[0], d[1] + h * t[1], d[2] + h * t[2]];
    const d2: Vec3 = [d[0] - h * t[0], d[1] - h * t[1], d[2] - h * t[2]];
    const r1 = Math.hypot(d1[0], d1[1], d1[2]);
    const r2 = Math.hypot(d2[0], d2[1], d2[2]);
    const s = r1 + r2;
    const d12 = dot(d1, d2);
    const q = d12 < 0 ? (2 * L * L * dot(rPerp, rPerp)) / (r1 * r2 - d12) : 2 * (r1 * r2 + d12);
    kappa = ((VACUUM_PERMEABILITY * spec.currentA) / (4 * Math.PI)) * ((2 * L * s) / (r1 * r2 * q));
    const common = 1 / s - (2 * s) / q;
    const g1 = (kappa * (common - 1 / r1)) / r1;
    const g2 = (kappa * (common - 1 / r2)) / r2;
    gradKappa = [g1 * d1[0] + g2 * d2[0], g1 * d1[1] + g2 * d2[1], g1 * d1[2] + g2 * d2[2]];
  }
  const acc = newAcc();
  addOuter(acc, 1, around, gradKappa);
  // κ [t̂]×: (t̂ × v)_i = Σ_j M_ij v_j.
  acc[1] -= kappa * t[2];
  acc[2] += kappa * t[1];
  acc[3] += kappa * t[2];
  acc[5] -= kappa * t[0];
  acc[6] -= kappa * t[1];
  acc[7] += kappa * t[0];
  return { B: [kappa * around[0], kappa * around[1], kappa * around[2]], gradient: accToMat(acc) };
}

/**
 * An axisymmetric, curl- and divergence-free field given in its cylindrical frame, turned into a
 * lab-frame B and gradient tensor. In the frame (ρ̂, φ̂, ẑ) the gradient is
 *   [[∂B_ρ/∂ρ, 0, ∂B_ρ/∂z], [0, B_ρ/ρ, 0], [∂B_z/∂ρ, 0, ∂B_z/∂z]],
 * with ∂B_z/∂ρ = ∂B_ρ/∂z (curl-free) and ∂B_ρ/∂ρ = −∂B_z/∂z − B_ρ/ρ (divergence-free).
 * On the axis ρ̂ is any perpendicular: there B_ρ = 0 and the tensor does not depend on it.
 * Written to add into a flat accumulator [Bx, By, Bz, ∂xBx, ∂yBx, ∂zBx, ∂xBy, …] without
 * allocating, because the sum over many loops is the hot path of traps and beams.
 */
import type { FieldSample, Vec3 } from './types';
import { perpendicular } from './vec3';

export interface CylinderPoint {
  rho: number;
  z: number;
  rhoHat: [number, number, number];
}

export function newCylinderPoint(): CylinderPoint {
  return { rho: 0, z: 0, rhoHat: [0, 0, 0] };
}

export function toCylinder(point: Vec3, centre: Vec3, axis: Vec3, out: CylinderPoint = newCylinderPoint()): CylinderPoint {
  const dx = point[0] - centre[0];
  const dy = point[1] - centre[1];
  const dz = point[2] - centre[2];
  const z = dx * axis[0] + dy * axis[1] + dz * axis[2];
  let px = dx - z * axis[0];
  let py = dy - z * axis[1];
  let pz = dz - z * axis[2];
  // On a tilted axis, rounding leaves a perpendicular part that is not perpendicular; one more
  // projection fixes its direction (ρ itself is already right to rounding).
  const again = px * axis[0] + py * axis[1] + pz * axis[2];
  px -= again * axis[0];
  py -= again * axis[1];
  pz -= again * axis[2];
  const rho = Math.sqrt(px * px + py * py + pz * pz);
  out.rho = rho;
  out.z = z;
  if (rho > 0) {
    out.rhoHat[0] = px / rho;
    out.rhoHat[1] = py / rho;
    out.rhoHat[2] = pz / rho;
  } else {
    const p = perpendicular(axis);
    out.rhoHat[0] = p[0];
    out.rhoHat[1] = p[1];
    out.rhoHat[2] = p[2];
  }
  return out;
}

export interface AxisymmetricLocal {
  bRho: number;
  bZ: number;
  bRhoOverRho: number;
  dBzDz: number;
  dBrhoDz: number;
}

/** Flat accumulator: B in [0..2], gradient row-major in [3..11]. */
export type FieldAcc = Float64Array;

export function newFieldAcc(): FieldAcc {
  return new Float64Array(12);
}

export function accToSample(acc: FieldAcc): FieldSample {
  return {
    B: [acc[0], acc[1], acc[2]],
    gradient: [
      [acc[3], acc[4], acc[5]],
      [acc[6], acc[7], acc[8]],
      [acc[9], acc[10], acc[11]],
    ],
  };
}

export function addAxisymmetric(acc: FieldAcc, local: AxisymmetricLocal, axis: Vec3, rhoHat: Vec3): void {
  const [rx, ry, rz] = rhoHat;
  const [ax, ay, az] = axis;
  // φ̂ = ẑ × ρ̂
  const px = ay * rz - az * ry;
  const py = az * rx - ax * rz;
  const pz = ax * ry - ay * rx;
  acc[0] += local.bRho * rx + local.bZ * ax;
  acc[1] += local.bRho * ry + local.bZ * ay;
  acc[2] += local.bRho * rz + local.bZ * az;
  const rr = -local.dBzDz - local.bRhoOverRho;
  const rzc = local.dBrhoDz;
  const zz = local.dBzDz;
  const pp = local.bRhoOverRho;
  // Row i: (rr ρ̂_i + rzc ẑ_i) ρ̂ᵀ + (rzc ρ̂_i + zz ẑ_i) ẑᵀ + pp φ̂_i φ̂ᵀ.
  addRow(acc, 3, rr * rx + rzc * ax, rzc * rx + zz * ax, pp * px, rx, ry, rz, ax, ay, az, px, py, pz);
  addRow(acc, 6, rr * ry + rzc * ay, rzc * ry + zz * ay, pp * py, rx, ry, rz, ax, ay, az, px, py, pz);
  addRow(acc, 9, rr * rz + rzc * az, rzc * rz + zz * az, pp * pz, rx, ry, rz, ax, ay, az, px, py, pz);
}

function addRow(acc: FieldAcc, at: number, u: number, w: number, q: number, rx: number, ry: number, rz: number, ax: number, ay: number, az: number, px: number, py: number, pz: number): void {
  acc[at] += u * rx + w * ax + q * px;
  acc[at + 1] += u * ry + w * ay + q * py;
  acc[at + 2] += u * rz + w * az + q * pz;
}

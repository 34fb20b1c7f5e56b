/**
 * Field and gradient of a finite solenoid taken as a uniform current sheet of radius a, length L
 * and n = N/L turns per metre.
 *
 * B_z in closed form: integrating the loop's Biot–Savart B_z over the sheet, the axial integral is
 * elementary and the azimuthal one is Bulirsch's cel with p = γ²:
 *   B_z = μ0 n I a/(π(a + ρ)) [ζ₊/β₊ cel(kc₊, γ², 1, γ) − ζ₋/β₋ cel(kc₋, γ², 1, γ)],
 * ζ± = z ± L/2, β±² = (a + ρ)² + ζ±², kc± = √((a − ρ)² + ζ±²)/β±, γ = (a − ρ)/(a + ρ)
 * (the same result as N. Derby and S. Olbert, Am. J. Phys. 78, 229 (2010), derived here
 * again and checked against SciPy quadrature). B_ρ is the difference of the end loops' vector
 * potentials, B_ρ = n[A_φ(ζ₋) − A_φ(ζ₊)], because a loop's B_ρ is −∂A_φ/∂z.
 * The axial derivatives are exact too: ∂B/∂z = n[B_loop(ζ₊) − B_loop(ζ₋)], the two end loops.
 */
import { VACUUM_PERMEABILITY } from '../constants';
import { accToSample, addAxisymmetric, newCylinderPoint, newFieldAcc, toCylinder, type FieldAcc } from './axisymmetric';
import { cel } from './cel';
import { loopLocal, newLoopLocal } from './loopKernel';
import { onWinding } from './onSource';
import type { FieldSample, SolenoidSpec, Vec3 } from './types';

const cyl = newCylinderPoint();
const near = newLoopLocal();
const far = newLoopLocal();

/** Adds the solenoid's B and gradient to `acc`; false (nothing added) for a point on its winding. */
export function addSolenoidField(acc: FieldAcc, spec: SolenoidSpec, point: Vec3): boolean {
  const { rho, z, rhoHat } = toCylinder(point, spec.centre, spec.axis, cyl);
  const a = spec.radiusM;
  if (onWinding(rho, z, a, spec.lengthM)) return false;
  const half = spec.lengthM / 2;
  const muNI = (VACUUM_PERMEABILITY * spec.ampereTurns) / spec.lengthM;
  const zp = z + half;
  const zm = z - half;
  const gamma = (a - rho) / (a + rho);
  const endTerm = (zeta: number): number => {
    if (zeta === 0) return 0;
    const am = a - rho;
    const beta = Math.sqrt((a + rho) * (a + rho) + zeta * zeta);
    const kc = Math.sqrt(am * am + zeta * zeta) / beta;
    return (zeta / beta) * cel(kc, gamma * gamma, 1, gamma);
  };
  const bZ = ((muNI * a) / (Math.PI * (a + rho))) * (endTerm(zp) - endTerm(zm));
  loopLocal(a, muNI, rho, zp, near);
  loopLocal(a, muNI, rho, zm, far);
  addAxisymmetric(
    acc,
    {
      bZ,
      bRho: far.aPhi - near.aPhi,
      bRhoOverRho: far.aPhiOverRho - near.aPhiOverRho,
      dBzDz: near.bZ - far.bZ,
      dBrhoDz: near.bRho - far.bRho,
    },
    spec.axis,
    rhoHat,
  );
  return true;
}

export function solenoidField(spec: SolenoidSpec, point: Vec3): FieldSample {
  const acc = newFieldAcc();
  addSolenoidField(acc, spec, point);
  return accToSample(acc);
}

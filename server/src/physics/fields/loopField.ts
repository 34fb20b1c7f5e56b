/** Field and gradient of a circular loop of N turns (N·I ampere-turns) anywhere off its wire. */
import { VACUUM_PERMEABILITY } from '../constants';
import { accToSample, addAxisymmetric, newCylinderPoint, newFieldAcc, toCylinder, type FieldAcc } from './axisymmetric';
import { loopLocal, newLoopLocal } from './loopKernel';
import { onLoopWire } from './onSource';
import type { FieldSample, LoopSpec, Vec3 } from './types';

const cyl = newCylinderPoint();
const local = newLoopLocal();

/** Adds the loop's B and gradient to `acc`; false (nothing added) for a point on its wire. */
export function addLoopField(acc: FieldAcc, spec: LoopSpec, point: Vec3): boolean {
  const { rho, z, rhoHat } = toCylinder(point, spec.centre, spec.axis, cyl);
  if (onLoopWire(rho, z, spec.radiusM)) return false;
  addAxisymmetric(acc, loopLocal(spec.radiusM, VACUUM_PERMEABILITY * spec.ampereTurns, rho, z, local), spec.axis, rhoHat);
  return true;
}

export function loopField(spec: LoopSpec, point: Vec3): FieldSample {
  const acc = newFieldAcc();
  addLoopField(acc, spec, point);
  return accToSample(acc);
}

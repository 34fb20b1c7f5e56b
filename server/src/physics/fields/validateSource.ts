/** A source part the formulas can use: finite numbers, positive sizes, unit directions. */
import { issue, type FieldIssue } from './issues';
import type { FieldSourceSpec, Vec3 } from './types';
import { isFiniteVec, norm } from './vec3';

const UNIT_TOLERANCE = 1e-9;

function isUnit(v: Vec3): boolean {
  return isFiniteVec(v) && Math.abs(norm(v) - 1) <= UNIT_TOLERANCE;
}
function positive(x: number): boolean {
  return Number.isFinite(x) && x > 0;
}

export function validateFieldSource(spec: FieldSourceSpec, partIndex?: number): FieldIssue[] {
  const bad = (what: string): FieldIssue[] => [issue('error', 'source-invalid-part', `A ${spec.kind} with ${what}; it is left out of the field.`, partIndex)];
  switch (spec.kind) {
    case 'loop':
      if (!isFiniteVec(spec.centre)) return bad('a centre that is not three finite numbers');
      if (!isUnit(spec.axis)) return bad('an axis that is not a unit vector');
      if (!positive(spec.radiusM)) return bad('a radius that is not a positive length');
      if (!Number.isFinite(spec.ampereTurns)) return bad('ampere-turns that are not a finite number');
      return [];
    case 'solenoid':
      if (!isFiniteVec(spec.centre)) return bad('a centre that is not three finite numbers');
      if (!isUnit(spec.axis)) return bad('an axis that is not a unit vector');
      if (!positive(spec.radiusM)) return bad('a radius that is not a positive length');
      if (!positive(spec.lengthM)) return bad('a length that is not a positive length');
      if (!Number.isFinite(spec.ampereTurns)) return bad('ampere-turns that are not a finite number');
      return [];
    case 'wire':
      if (!isFiniteVec(spec.point)) return bad('a point that is not three finite numbers');
      if (!isUnit(spec.direction)) return bad('a direction that is not a unit vector');
      if (spec.lengthM !== undefined && !positive(spec.lengthM)) return bad('a length that is not a positive length');
      if (!Number.isFinite(spec.currentA)) return bad('a current that is not a finite number');
      return [];
    case 'slab':
      if (!isFiniteVec(spec.centre)) return bad('a centre that is not three finite numbers');
      if (!(positive(spec.sizeM[0]) && positive(spec.sizeM[1]) && positive(spec.sizeM[2]))) return bad('a size that is not three positive lengths');
      if (!isFiniteVec(spec.magnetisationT)) return bad('a magnetisation that is not three finite numbers');
      return [];
  }
}

/**
 * The potential energy of one sublevel in the trap: U(r) = E(|B(r)|) − m g·r (J), and its gradient
 * ∇U = h dE/dB ∇|B| − m g, with ∇|B| = Gᵀ B̂ from the field's exact gradient tensor.
 */
import { PLANCK_H } from '../constants';
import type { FieldFunction, Vec3 } from '../fields/types';
import type { EnergyCurve } from './energyCurves';
import { magnitudeGradient } from '../fields';
import { dot, norm } from './vec3';

export interface TrapPotential {
  /** J; +Infinity where the field is not finite (on a wire or a loop). */
  energy(r: Vec3): number;
  gradient(r: Vec3): Vec3;
  fieldT(r: Vec3): number;
}

export function trapPotential(field: FieldFunction, curve: EnergyCurve, massKg: number, gravity: Vec3): TrapPotential {
  const fieldT = (r: Vec3): number => norm(field(r).B);
  return {
    fieldT,
    energy(r) {
      const b = fieldT(r);
      if (!Number.isFinite(b)) return Number.POSITIVE_INFINITY;
      return PLANCK_H * curve.energyHz(b) - massKg * dot(gravity, r);
    },
    gradient(r) {
      const s = field(r);
      // |B| has a cone, no gradient, where B vanishes: no force from the field there.
      const g = magnitudeGradient(s) ?? [0, 0, 0];
      const k = PLANCK_H * curve.slopeHzPerT(norm(s.B));
      return [k * g[0] - massKg * gravity[0], k * g[1] - massKg * gravity[1], k * g[2] - massKg * gravity[2]];
    },
  };
}

/**
 * Standard acceleration of gravity g_n = 9.806 65 m/s², a conventional exact value (3rd CGPM, 1901;
 * the value scipy.constants.g ships, checked in tests/physics/traps/trapSummary.test.ts against tests/reference/traps.json).
 */
import type { Vec3 } from '../fields/types';

export const STANDARD_GRAVITY = 9.80665;

/** Gravity as an acceleration vector along the unit direction `down` (m/s²). */
export function gravityAlong(down: Vec3, g = STANDARD_GRAVITY): Vec3 {
  return [down[0] * g, down[1] * g, down[2] * g];
}

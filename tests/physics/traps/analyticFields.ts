/**
 * Analytic trap fields with exact gradients, the same as scripts/reference/traps_reference.py:
 * the ideal quadrupole B = b′(x/2, y/2, −z) (an anti-Helmholtz pair near its centre) and the
 * Ioffe–Pritchard field B = (b′x − b″xz/2, −b′y − b″yz/2, B0 + b″(z² − (x² + y²)/2)/2), both
 * divergence- and curl-free (textbook form, e.g. Pethick & Smith, Bose–Einstein Condensation in
 * Dilute Gases, 2nd ed., ch. 4).
 */
import type { FieldFunction, Mat3 } from '../../../server/src/physics/fields/types';
import { ATOMIC_MASS_UNIT } from '../../../server/src/physics/constants';
import type { HyperfineLevelSpec } from '../../../server/src/physics/engine';

export function quadrupole(b1: number, bias: [number, number, number] = [0, 0, 0]): FieldFunction {
  const gradient: Mat3 = [
    [b1 / 2, 0, 0],
    [0, b1 / 2, 0],
    [0, 0, -b1],
  ];
  return ([x, y, z]) => ({ B: [bias[0] + (b1 * x) / 2, bias[1] + (b1 * y) / 2, bias[2] - b1 * z], gradient });
}

export function ioffe(b0: number, b1: number, b2: number): FieldFunction {
  return ([x, y, z]) => ({
    B: [b1 * x - (b2 * x * z) / 2, -b1 * y - (b2 * y * z) / 2, b0 + (b2 * (z * z - (x * x + y * y) / 2)) / 2],
    gradient: [
      [b1 - (b2 * z) / 2, 0, (-b2 * x) / 2],
      [0, -b1 - (b2 * z) / 2, (-b2 * y) / 2],
      [(-b2 * x) / 2, (-b2 * y) / 2, b2 * z],
    ],
  });
}

/** The built-in ⁸⁷Rb ground level (data-rubidium.ts; the same numbers as the reference script). */
export const RB87_GROUND: HyperfineLevelSpec = { kind: 'hyperfine', twoJ: 1, twoI: 3, gJ: 2.00233113, gI: -0.0009951414, A: 3417.341305452145e6 };
export const RB87_MASS = 86.909180531 * ATOMIC_MASS_UNIT;

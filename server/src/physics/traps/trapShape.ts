/**
 * The shape of a sublevel's minimum. Where |B| stays above zero the potential is smooth and
 * harmonic: trap frequencies ω_i = √(λ_i/m) from the Hessian's eigenvalues λ_i. At a zero of the
 * field (a quadrupole) |B| grows linearly in every direction, a cone with no harmonic frequency;
 * its numbers are the |B| gradients along the principal axes: with B ≈ G r, the gradient of |B|
 * along a unit n is |G n|, so they are the singular values of G.
 */
import { symmetricEigen } from '../engine';
import type { Mat3, Vec3 } from '../fields/types';
import { hessian } from './hessian';
import type { HarmonicShape, LinearShape } from './types';

function eigen3(a: Float64Array): { values: Float64Array; axes: [Vec3, Vec3, Vec3] } {
  const values = new Float64Array(3);
  const vectors = new Float64Array(9);
  symmetricEigen(Float64Array.from(a), 3, values, vectors);
  const col = (k: number): Vec3 => [vectors[k], vectors[3 + k], vectors[6 + k]];
  return { values, axes: [col(0), col(1), col(2)] };
}

/** Frequencies (Hz, ascending) from the Hessian of U at the minimum; null when it is not a proper minimum. */
export function harmonicShape(gradient: (r: Vec3) => Vec3, at: Vec3, step: number, massKg: number): HarmonicShape | null {
  const { values, axes } = eigen3(hessian(gradient, at, step));
  if (!(values[0] > 0)) return null;
  const f = (k: number): number => Math.sqrt(values[k] / massKg) / (2 * Math.PI);
  return { kind: 'harmonic', frequenciesHz: [f(0), f(1), f(2)], axes };
}

/** The |B| gradients along the principal axes of a field zero (strongest first). */
export function linearShape(gradient: Mat3): LinearShape {
  const gtg = new Float64Array(9);
  for (let i = 0; i < 3; i++) for (let j = 0; j < 3; j++) for (let k = 0; k < 3; k++) gtg[i * 3 + j] += gradient[k][i] * gradient[k][j];
  const { values, axes } = eigen3(gtg);
  const s = (k: number): number => Math.sqrt(Math.max(0, values[k]));
  return { kind: 'linear', gradientsTPerM: [s(2), s(1), s(0)], axes: [axes[2], axes[1], axes[0]] };
}

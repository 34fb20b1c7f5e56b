/**
 * Angular weights of dipole radiation for the three polarisations, per unit strength and
 * relative to the π intensity at right angles to the field (standard dipole radiation
 * pattern, textbook):
 *   π (q = 0):  sin²θ              — linear, E along the field
 *   σ (q = ±1): (1 + cos²θ)/2      — circular along the field, linear ⊥ field across it
 * θ is the angle between the line of sight and the field. Both integrate to 8π/3 over the
 * sphere, so the strength is the total power of the component. The same weights hold for
 * absorption of unpolarised light travelling at θ.
 */
import type { Polarization } from './types';

export function emissionWeight(polarization: Polarization, thetaRad: number): number {
  const c = Math.cos(thetaRad);
  return polarization === 'π' ? 1 - c * c : (1 + c * c) / 2;
}

/** Along the field (θ = 0): σ weight 1 (seen as circular light), π absent. */
export function alongFieldWeight(polarization: Polarization): number {
  return polarization === 'π' ? 0 : 1;
}

/** Across the field (θ = 90°): π weight 1, σ weight 1/2 (both seen as linear light). */
export function acrossFieldWeight(polarization: Polarization): number {
  return polarization === 'π' ? 1 : 0.5;
}

export function polarizationOf(q: number): Polarization {
  return q === 0 ? 'π' : q > 0 ? 'σ+' : 'σ−';
}

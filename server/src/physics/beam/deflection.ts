/**
 * Transverse deflection of an atom with moment μ in a uniform gradient:
 * F = μ ∂B/∂z, a = F/M; inside the magnet z = a t²/2, then a straight drift, so at
 * the detector z(v) = a (L1²/2 + L1·L2) / v². Averaging over speeds only needs ⟨1/v²⟩.
 */
import { speedLawFor } from './speedLawFor';
import type { BeamGeometry, SpeedDistribution } from './types';
import { validateSource } from './validateSource';

/** Lever factor L1²/2 + L1·L2 in m². */
export function leverArmM2(geometry: BeamGeometry): number {
  const l1 = geometry.magnetLengthM;
  return 0.5 * l1 * l1 + l1 * geometry.driftM;
}

/** k in z = k / v²: μ (∂B/∂z) (L1²/2 + L1 L2) / M, in m³/s². */
export function deflectionCoefficient(momentJT: number, massKg: number, geometry: BeamGeometry): number {
  return (momentJT * geometry.gradientTPerM * leverArmM2(geometry)) / massKg;
}

/** Deflection at the detector plane for one speed, m (NaN when the speed or mass is not positive). */
export function deflectionAtSpeed(momentJT: number, massKg: number, geometry: BeamGeometry, speed: number): number {
  if (!(speed > 0) || !(massKg > 0)) return NaN;
  return deflectionCoefficient(momentJT, massKg, geometry) / (speed * speed);
}

/**
 * Flux-averaged deflection ⟨z⟩ = k ⟨1/v²⟩, m. Closed form for the oven (⟨1/v²⟩ = M/2kT,
 * so ⟨z⟩ = μ (∂B/∂z)(L1²/2 + L1 L2)/(2kT), independent of the mass) and the single speed;
 * quadrature for the jet. NaN when the source or mass is invalid.
 */
export function meanDeflection(momentJT: number, massKg: number, geometry: BeamGeometry, source: SpeedDistribution): number {
  if (validateSource(source, massKg).some((i) => i.severity === 'error')) return NaN;
  const law = speedLawFor(source, massKg);
  return deflectionCoefficient(momentJT, massKg, geometry) * law.meanInverseSquare;
}

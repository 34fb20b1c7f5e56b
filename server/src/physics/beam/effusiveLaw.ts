/**
 * Flux from a thin-walled oven: f(v) = (2/α⁴) v³ exp(−v²/α²), α = √(2kT/M).
 * Closed forms (standard molecular-beam results; derivation in docs/beam.md):
 *   slower fraction  1 − (1 + x²) e^{−x²},  x = v/α
 *   ⟨1/v²⟩ = 1/α² = M/(2kT)
 *   most probable flux speed √(3/2)·α = √(3kT/M),  ⟨v⟩ = (3√π/4)·α,  ⟨v²⟩ = 2α².
 */
import { BOLTZMANN_K } from '../constants';
import type { SpeedLaw } from './speedLaw';

/** 1 − (1 + y) e^{−y} without cancellation for small y (series Σ_{n≥2} (−1)^n (n−1) yⁿ / n!). */
function slowerFractionOfSquare(y: number): number {
  if (y < 0.02) {
    let term = (y * y) / 2; // n = 2
    let sum = term;
    for (let n = 3; n <= 12; n++) {
      term *= (-y * (n - 1)) / ((n - 2) * n);
      sum += term;
    }
    return sum;
  }
  return -Math.expm1(-y) - y * Math.exp(-y);
}

export function effusiveLaw(temperatureK: number, massKg: number): SpeedLaw {
  const alpha2 = (2 * BOLTZMANN_K * temperatureK) / massKg;
  const alpha = Math.sqrt(alpha2);
  return {
    slowerFraction: (v) => (v <= 0 ? 0 : v === Infinity ? 1 : slowerFractionOfSquare((v * v) / alpha2)),
    inverseSquareBelow: (v) => (v <= 0 ? 0 : v === Infinity ? 1 / alpha2 : -Math.expm1((-v * v) / alpha2) / alpha2),
    meanInverseSquare: 1 / alpha2,
    meanSpeed: ((3 * Math.sqrt(Math.PI)) / 4) * alpha,
    rmsSpread: alpha * Math.sqrt(2 - (9 * Math.PI) / 16),
    mostProbableSpeed: Math.sqrt(1.5) * alpha,
    // (1 + x²) e^{−x²} < 1e-15 for x² > 38.
    fastestSpeed: Math.sqrt(38) * alpha,
  };
}

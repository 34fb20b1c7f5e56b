/**
 * Flux from a thin-walled oven: f(v) = (2/α⁴) v³ exp(−v²/α²), α = √(2kT/M).
 * Closed forms (standard molecular-beam results; derivation in docs/beam.md):
 *   slower fraction  1 − (1 + x²) e^{−x²},  x = v/α
 *   ⟨1/v²⟩ = 1/α² = M/(2kT)
 *   most probable flux speed √(3/2)·α = √(3kT/M),  ⟨v⟩ = (3√π/4)·α,  ⟨v²⟩ = 2α².
 */
import { BOLTZMANN_K } from '../constants';
import type { SpeedLaw } from './speedLaw';

/** Σ_{n≥2} (−1)^n (n−1) yⁿ / n! = 1 − (1 + y) e^{−y}, for small y where the direct form cancels. */
function slowerFractionSeries(y: number): number {
  let term = (y * y) / 2; // n = 2
  let sum = term;
  for (let n = 3; n <= 12; n++) {
    term *= (-y * (n - 1)) / ((n - 2) * n);
    sum += term;
  }
  return sum;
}

export function effusiveLaw(temperatureK: number, massKg: number): SpeedLaw {
  const alpha2 = (2 * BOLTZMANN_K * temperatureK) / massKg;
  const alpha = Math.sqrt(alpha2);
  // The pattern code asks for both cumulative integrals at the same speed: share the exponentials.
  // memo = [y, e^{−y}, 1 − e^{−y}], in a typed array because doubles assigned to captured
  // variables are boxed (a small garbage object) on every write.
  const memo = Float64Array.of(NaN, 1, 0);
  const prepare = (y: number): void => {
    if (y !== memo[0]) {
      memo[0] = y;
      const expNeg = Math.exp(-y);
      memo[1] = expNeg;
      // 1 − e^{−y} loses digits only for small y; expm1 is needed there alone.
      memo[2] = y < 0.5 ? -Math.expm1(-y) : 1 - expNeg;
    }
  };
  return {
    slowerFraction: (v) => {
      if (v <= 0) return 0;
      if (v === Infinity) return 1;
      const y = (v * v) / alpha2;
      if (y < 0.02) return slowerFractionSeries(y);
      prepare(y);
      return memo[2] - y * memo[1];
    },
    inverseSquareBelow: (v) => {
      if (v <= 0) return 0;
      if (v === Infinity) return 1 / alpha2;
      prepare((v * v) / alpha2);
      return memo[2] / alpha2;
    },
    cumulativeBelow: (v, into) => {
      // As the two functions above, computed together (same operations, same values).
      if (v <= 0) {
        into[0] = 0;
        into[1] = 0;
      } else if (v === Infinity) {
        into[0] = 1;
        into[1] = 1 / alpha2;
      } else {
        const y = (v * v) / alpha2;
        const expNeg = Math.exp(-y);
        const oneMinusExp = y < 0.5 ? -Math.expm1(-y) : 1 - expNeg;
        into[0] = y < 0.02 ? slowerFractionSeries(y) : oneMinusExp - y * expNeg;
        into[1] = oneMinusExp / alpha2;
      }
    },
    meanInverseSquare: 1 / alpha2,
    meanSpeed: ((3 * Math.sqrt(Math.PI)) / 4) * alpha,
    rmsSpread: alpha * Math.sqrt(2 - (9 * Math.PI) / 16),
    mostProbableSpeed: Math.sqrt(1.5) * alpha,
    // (1 + x²) e^{−x²} < 1e-15 for x² > 38.
    fastestSpeed: Math.sqrt(38) * alpha,
  };
}

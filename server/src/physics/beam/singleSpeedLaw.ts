/** Every atom at one speed v₀: a step in the slower fraction, ⟨1/v²⟩ = 1/v₀². */
import type { SpeedLaw } from './speedLaw';

export function singleSpeedLaw(speed: number): SpeedLaw {
  return {
    slowerFraction: (v) => (v < speed ? 0 : 1),
    inverseSquareBelow: (v) => (v < speed ? 0 : 1 / (speed * speed)),
    cumulativeBelow: (v, into) => {
      into[0] = v < speed ? 0 : 1;
      into[1] = v < speed ? 0 : 1 / (speed * speed);
    },
    meanInverseSquare: 1 / (speed * speed),
    meanSpeed: speed,
    rmsSpread: 0,
    mostProbableSpeed: speed,
    fastestSpeed: speed,
    singleSpeed: speed,
  };
}

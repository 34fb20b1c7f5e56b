/**
 * ∂k/∂p of every sublevel's deflection coefficient for inputs p that change the flights (a
 * source's current, radius or place, the beam line, the magnet's length, the level's constants,
 * the reference speed): central differences of re-flown coefficients,
 * (k(p + h) − k(p − h)) / 2h. The step comes from the caller (the input's uncertainty, within
 * bounds); it is checked by comparing the two one-sided differences: where they disagree by
 * more than a tenth (beyond what the integrator's tolerance can explain), k is not linear over
 * ±h, the step is cut by four and the flights repeated, twice at most. What is still unstable
 * then is marked so: its first-order uncertainty is not defined (the caller says so).
 */
import type { LevelSpec } from '../../engine';
import type { FieldFunction, Vec3 } from '../../fields/types';
import type { CoefficientFlyer, CoefficientSetup } from './coefficientFlights';

/** What one nudged input changes in the flights; absent parts stay as the beam has them. */
export interface FlightChange {
  field?: FieldFunction;
  centre?: Vec3;
  magnetLengthM?: number;
  spec?: LevelSpec;
  speed?: number;
}

export interface CoefficientNudge {
  /** The first step tried, in the input's unit (> 0). */
  step: number;
  /** The flights with the input moved by t. */
  at(t: number): FlightChange;
}

export interface CoefficientSlope {
  /** ∂k_i/∂p, (m³/s²) per unit of p; null when the flights failed or stayed unstable. */
  dk: Float64Array | null;
  /** The step used last. */
  step: number;
  /** Why dk is null. */
  reason?: 'flight-failed' | 'not-linear';
}

/** One-sided differences may differ by this fraction before the step is cut (our choice). */
export const LINEARITY_LIMIT = 0.1;
/** Relative noise of a re-flown coefficient: the integrator's tolerance (1e-10) with a margin. */
const FLIGHT_NOISE = 1e-8;
const RETRIES = 2;

export function coefficientSlopes(flyer: CoefficientFlyer, base: CoefficientSetup, speed: number, k0: Float64Array, nudges: readonly CoefficientNudge[]): CoefficientSlope[] {
  const kScale = Math.max(0, ...Array.from(k0, Math.abs));
  const flyAt = (change: FlightChange): Float64Array | null =>
    flyer.fly(
      {
        ...base,
        ...(change.field ? { field: change.field } : {}),
        ...(change.centre ? { centre: change.centre } : {}),
        ...(change.magnetLengthM !== undefined ? { magnetLengthM: change.magnetLengthM } : {}),
        ...(change.spec ? { spec: change.spec } : {}),
      },
      change.speed ?? speed,
    ).k;
  return nudges.map((nudge) => {
    let h = nudge.step;
    for (let attempt = 0; attempt <= RETRIES; attempt++) {
      const plus = flyAt(nudge.at(h));
      const minus = flyAt(nudge.at(-h));
      if (!plus || !minus) return { dk: null, step: h, reason: 'flight-failed' as const };
      const dk = new Float64Array(k0.length);
      let linear = true;
      const noise = (FLIGHT_NOISE * kScale) / h;
      for (let i = 0; i < k0.length; i++) {
        const up = (plus[i]! - k0[i]!) / h;
        const down = (k0[i]! - minus[i]!) / h;
        // A change within the flights' own noise is no change (a stretched state and A): 0, not round-off.
        dk[i] = Math.abs(plus[i]! - minus[i]!) > 2 * FLIGHT_NOISE * kScale ? (plus[i]! - minus[i]!) / (2 * h) : 0;
        if (Math.abs(up - down) > LINEARITY_LIMIT * Math.max(Math.abs(up), Math.abs(down)) + 2 * noise) linear = false;
      }
      if (linear) return { dk, step: h };
      if (attempt < RETRIES) h /= 4;
    }
    return { dk: null, step: h, reason: 'not-linear' as const };
  });
}

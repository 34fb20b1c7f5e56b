/**
 * Automatic extent of the detector grid: every sublevel's deflections from the
 * fastest atoms (all but 1e-12 of the flux) to the slow-tail cut (`tailFraction`
 * of the flux slower), widened by the instrument kernel's half-support and a 2 % pad.
 * An oven beam's deflection has a heavy slow tail (density ∝ z⁻³), so some cut is needed.
 */
import { speedAtSlowerFraction, type SpeedLaw } from './speedLaw';

export function patternSpan(
  coefficients: readonly number[],
  law: SpeedLaw,
  halfSupportM: number,
  tailFraction: number,
): { startM: number; endM: number } {
  const vFast = speedAtSlowerFraction(law, 1 - 1e-12);
  const vSlow = speedAtSlowerFraction(law, tailFraction);
  const sNear = 1 / (vFast * vFast);
  const sFar = 1 / (vSlow * vSlow);
  let lo = Infinity;
  let hi = -Infinity;
  for (const k of coefficients) {
    for (const z of [k * sNear, k * sFar]) {
      lo = Math.min(lo, z);
      hi = Math.max(hi, z);
    }
  }
  if (!Number.isFinite(lo)) {
    lo = 0;
    hi = 0;
  }
  const pad = 0.02 * (hi - lo + 2 * halfSupportM);
  return { startM: lo - halfSupportM - pad, endM: hi + halfSupportM + pad };
}

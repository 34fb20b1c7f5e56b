/**
 * Where one sublevel's atoms land: deflections from the fastest atoms (all but 1e-12
 * of the flux) to the slow-tail cut (`tailFraction` of the flux slower), widened by
 * the instrument kernel's half-support and a 2 % pad. An oven beam's deflection has
 * a heavy slow tail (density ∝ z⁻³), so some cut is needed; what lies beyond is
 * reported as off-grid flux.
 */
import { speedAtSlowerFraction, type SpeedLaw } from './speedLaw';

export interface Extent {
  startM: number;
  endM: number;
}

/** 1/v² at the fast end and at the slow-tail cut, shared by all sublevels of one law. */
export function inverseSquareRange(law: SpeedLaw, tailFraction: number): { near: number; far: number } {
  const vFast = speedAtSlowerFraction(law, 1 - 1e-12);
  const vSlow = speedAtSlowerFraction(law, tailFraction);
  return { near: 1 / (vFast * vFast), far: 1 / (vSlow * vSlow) };
}

export function sublevelExtent(k: number, range: { near: number; far: number }, halfSupportM: number): Extent {
  const a = k * range.near;
  const b = k * range.far;
  const lo = Math.min(a, b);
  const hi = Math.max(a, b);
  const pad = 0.02 * (hi - lo + 2 * halfSupportM);
  return { startM: lo - halfSupportM - pad, endM: hi + halfSupportM + pad };
}

/**
 * Scale x₀ of the sinh grid: image FWHM over the relative width of the deflection
 * distribution, taken as 2 × 2.355 × (rms/mean speed) since z ∝ v⁻² (Infinity for a single speed).
 */
export function gridScaleM(kernelFwhmM: number, law: SpeedLaw): number {
  const relative = (2 * 2.355 * law.rmsSpread) / law.meanSpeed;
  return relative > 0 ? kernelFwhmM / relative : Infinity;
}

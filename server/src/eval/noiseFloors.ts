/** The precision of the computed numbers that reports print, so that rounding noise prints as 0. */
import { BOHR_MAGNETON_HZ_PER_T } from '../physics/constants';
import type { NoiseFloor } from './quantityText';
import type { BeamResult } from './resultTypes';

/** A dip below a millionth of the smaller peak is the numerical floor of the pattern, not a number to read. */
export const DIP_NOISE: NoiseFloor = { scale: 1, relative: 1e-6 };

/**
 * Positions on the detector: the pattern is sampled and refined on a grid far coarser than a
 * millionth of its own extent, so anything smaller is rounding (common practice).
 */
export function beamPositionNoise(b: BeamResult): NoiseFloor {
  const sizes = [
    ...b.peaks.flatMap((p) => [Math.abs(p.position_m), p.fwhm_m ?? 0]),
    ...b.sublevels.map((s) => Math.abs(s.mean_deflection_m)),
  ].filter(Number.isFinite);
  return { scale: Math.max(0, ...sizes), relative: 1e-6 };
}

/**
 * Field sensitivities df/dB: their natural size is μ_B/h (14 GHz/T) and the engine's derivatives
 * carry about nine significant digits of it, so a df/dB below 1e-9 μ_B/h (~1.4 mHz/G) is rounding.
 */
export const SENSITIVITY_NOISE: NoiseFloor = { scale: BOHR_MAGNETON_HZ_PER_T, relative: 1e-9 };

/**
 * Widths of the three broadenings, in Hz of optical frequency.
 *  - Natural: an upper level of lifetime τ decays at Γ = 1/τ; the Lorentzian has FWHM
 *    Γ/2π = 1/(2πτ) (textbook; e.g. Steck's alkali D-line data list Γ/2π beside τ).
 *  - Doppler: a line of sight sees the velocity component along it; for a gas at temperature T
 *    that is a Gaussian of standard deviation √(k_B T/m), so the line has σ_ν = ν₀ √(k_B T/m)/c
 *    and FWHM = ν₀/c √(8 ln2 k_B T/m) (textbook).
 *  - Instrument: a Gaussian of given FWHM (common practice); Gaussians add in quadrature.
 */
import { BOLTZMANN_K, SPEED_OF_LIGHT } from '../constants';

/** FWHM of a Gaussian over its standard deviation, √(8 ln 2). */
export const GAUSS_FWHM_PER_SIGMA = Math.sqrt(8 * Math.LN2);

export function naturalFwhmHz(lifetimeS: number): number {
  return 1 / (2 * Math.PI * lifetimeS);
}

export function lifetimeFromFwhm(fwhmHz: number): number {
  return 1 / (2 * Math.PI * fwhmHz);
}

/** Standard deviation of the Doppler profile of a gas at `temperatureK`. */
export function dopplerSigmaHz(lineHz: number, temperatureK: number, massKg: number): number {
  return (lineHz * Math.sqrt((BOLTZMANN_K * temperatureK) / massKg)) / SPEED_OF_LIGHT;
}

/** Standard deviation of the Doppler profile for atoms whose speed along the line of sight has rms spread `speedRmsMPerS`. */
export function dopplerSigmaFromSpeedSpread(lineHz: number, speedRmsMPerS: number): number {
  return (lineHz * speedRmsMPerS) / SPEED_OF_LIGHT;
}

/** σ of the Gaussian part: Doppler and instrument (given as FWHM) added in quadrature. */
export function gaussianSigmaHz(dopplerSigma: number, instrumentFwhmHz: number): number {
  const s = instrumentFwhmHz / GAUSS_FWHM_PER_SIGMA;
  return Math.hypot(dopplerSigma, s);
}

/**
 * FWHM of a Voigt profile from its Lorentzian FWHM fL and Gaussian FWHM fG, by the
 * approximation of Olivero & Longbothum, JQSRT 17 (1977) 233 (about 2e-4 relative): used only
 * to choose a plotting window and to state a width in words, never for values of the profile.
 */
export function voigtFwhmApprox(lorentzFwhm: number, gaussFwhm: number): number {
  return 0.5346 * lorentzFwhm + Math.sqrt(0.2166 * lorentzFwhm * lorentzFwhm + gaussFwhm * gaussFwhm);
}

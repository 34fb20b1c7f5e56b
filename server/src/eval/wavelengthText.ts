/**
 * A vacuum wavelength computed from a line frequency (λ = c/ν by physics/species/conversions'
 * vacuumWavelengthM, the one place it is computed), printed with the frequency's uncertainty
 * carried over: u(λ) = λ·u(ν)/ν (first order; the next term is u(ν)/ν smaller, far below the
 * two digits printed). One place for it, so the text report, hovers and inlay hints
 * never print a wavelength to more digits than the energies behind it support.
 */
import { vacuumWavelengthM } from '../physics/species/conversions';
import { MISSING, trimNumber, withUncertainty } from './quantityText';

/** λ in m and its standard uncertainty (undefined when the frequency has none) for a frequency ν > 0. */
export function vacuumWavelengthOf(hz: number, hzUnc?: number): { m: number; unc?: number } | undefined {
  if (!(hz > 0) || !Number.isFinite(hz)) return undefined;
  const m = vacuumWavelengthM(hz);
  return hzUnc !== undefined && hzUnc > 0 && Number.isFinite(hzUnc) ? { m, unc: (m * hzUnc) / hz } : { m };
}

/**
 * "689.4489954(16) nm": the wavelength in nm with `digits` significant digits, or rounded to the
 * uncertainty's two digits in concise notation when there is one.
 */
export function vacuumWavelengthNmText(hz: number, hzUnc: number | undefined, digits: number): string {
  const w = vacuumWavelengthOf(hz, hzUnc);
  if (!w) return MISSING;
  const nm = w.m * 1e9;
  const plain = (v: number): string => `${trimNumber(v, digits)} nm`;
  return w.unc === undefined ? plain(nm) : withUncertainty(nm, w.unc * 1e9, plain);
}

/**
 * "vacuum wavelength 689.45 nm" for a line centre ν. A negative ν means the level written as upper
 * lies below the one written as lower: the wavelength is that of |ν|, and the text says why.
 * The text report and the hover both print a line's wavelength through here.
 */
export function lineWavelengthText(hz: number, hzUnc: number | undefined, digits: number): string {
  const w = `vacuum wavelength ${vacuumWavelengthNmText(Math.abs(hz), hzUnc, digits)}`;
  return hz < 0 ? `${w} of |ν| (ν < 0: the upper level as written lies below the lower)` : w;
}

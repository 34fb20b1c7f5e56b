/**
 * The vacuum wavelength printed from a line frequency carries the frequency's uncertainty:
 * λ = c/ν with c exact (SI definition of the metre), and u(λ)/λ = u(ν)/ν to first order (GUM,
 * JCGM 100:2008, §5.1.2, for a function of one input).
 */
import { describe, expect, it } from 'vitest';
import { vacuumWavelengthNmText, vacuumWavelengthOf } from '../../server/src/eval/wavelengthText';
import { vacuumWavelengthM } from '../../server/src/physics/species/conversions';

// c/(500 nm) exactly: 299 792 458 m/s / 500e-9 m.
const NU_500NM = 299792458 / 500e-9;

describe('vacuum wavelength with the line frequency\'s uncertainty', () => {
  it('λ = c/ν and u(λ) = λ u(ν)/ν', () => {
    const w = vacuumWavelengthOf(NU_500NM, NU_500NM * 1e-6);
    expect(w?.m).toBeCloseTo(500e-9, 20);
    expect((w?.unc ?? 0) / 500e-9).toBeCloseTo(1e-6, 15);
    expect(vacuumWavelengthOf(NU_500NM)?.unc).toBeUndefined();
    expect(vacuumWavelengthOf(-NU_500NM)).toBeUndefined();
  });

  it('is the physics conversion, bit for bit (one c/ν), and c/ν exact where SI makes it so', () => {
    // ν = 299 792 458 MHz is exactly c / 1 m × 1e6: λ = 1 µm exactly (SI definition of the metre).
    expect(vacuumWavelengthM(299792458e6)).toBe(1e-6);
    for (const hz of [NU_500NM, 384230484468500, 434829059122866, 6834682610.904]) {
      expect(vacuumWavelengthOf(hz)?.m).toBe(vacuumWavelengthM(hz));
    }
  });

  it('prints the value rounded to the uncertainty\'s two digits, in concise notation', () => {
    expect(vacuumWavelengthNmText(NU_500NM, NU_500NM * 1e-6, 9)).toBe('500.00000(50) nm');
    // ⁸⁷Sr 689 nm line as stored: 434 829 059 122.866 kHz ± 1 MHz → u(λ) = 689.449 nm × 2.3e-9 = 1.6e-6 nm.
    expect(vacuumWavelengthNmText(434829059122866, 1e6, 9)).toBe('689.4489954(16) nm');
  });

  it('without an uncertainty it is the plain value at the digits asked for', () => {
    expect(vacuumWavelengthNmText(NU_500NM, undefined, 9)).toBe('500 nm');
    expect(vacuumWavelengthNmText(0, 1, 9)).toBe('—');
  });

});

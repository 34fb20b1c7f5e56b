/**
 * Refractive index of standard air (dry, 15 °C, 101 325 Pa, 450 µmol/mol CO₂) from the
 * updated Edlén equation of Birch & Downs, Metrologia 31 (1994) 315, in the form the IAU
 * adopted (Morton, ApJS 130 (2000) 403):
 *   n = 1 + 8.34254e-5 + 2.406147e-2/(130 − s²) + 1.5998e-4/(38.9 − s²),  s = 1/λ_vac in µm⁻¹.
 * Valid from about 200 nm into the near infrared; below 200 nm wavelengths are quoted in vacuum
 * by convention, and `airWavelengthM` returns undefined there.
 */
export const AIR_STANDARD = 'dry air at 15 °C and 101 325 Pa (Birch & Downs 1994 updated Edlén equation, IAU standard)';

/** Shortest vacuum wavelength for which an air wavelength is given, m. */
export const AIR_MIN_WAVELENGTH_M = 200e-9;

export function airIndex(vacuumWavelengthM: number): number {
  const s = 1e-6 / vacuumWavelengthM;
  const s2 = s * s;
  return 1 + 8.34254e-5 + 2.406147e-2 / (130 - s2) + 1.5998e-4 / (38.9 - s2);
}

export function airWavelengthM(vacuumWavelengthM: number): number | undefined {
  if (!(vacuumWavelengthM >= AIR_MIN_WAVELENGTH_M) || !Number.isFinite(vacuumWavelengthM)) return undefined;
  return vacuumWavelengthM / airIndex(vacuumWavelengthM);
}

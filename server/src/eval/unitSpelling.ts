/** How a unit the user wrote in ASCII is shown back: `um` as µm, `cm^-1` as cm⁻¹. */
const DISPLAY: Readonly<Record<string, string>> = {
  uT: 'µT', um: 'µm', uK: 'µK', nK: 'nK', ueV: 'µeV', uG: 'µG', us: 'µs', 'cm^-1': 'cm⁻¹', '1/cm': 'cm⁻¹', 'cm-1': 'cm⁻¹', degC: '°C', muN: 'μ_N', muB: 'μ_B',
  'μT': 'µT', 'μm': 'µm',
};

export function displayUnit(unit: string): string {
  return DISPLAY[unit] ?? unit;
}

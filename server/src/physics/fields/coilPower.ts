/**
 * Electrical and thermal numbers of a winding of round copper wire: length of wire, resistance,
 * current density, dissipated power I²R and the voltage across it. A coil's field says nothing
 * about whether it survives being run: these numbers do, and the cautions are built from them.
 * SI in, SI out (m, A, Ω, W, V, A/m²). No I/O.
 */

/**
 * Resistivity of annealed copper at 20 °C, Ω·m: the International Annealed Copper Standard,
 * 1/58 Ω·mm²/m (IEC 60028; from memory).
 */
export const COPPER_RESISTIVITY_20C = 1 / 58e6;
/** Temperature coefficient of that resistivity at 20 °C, 1/K (IEC 60028: 0.00393; from memory). */
export const COPPER_ALPHA_20C = 0.00393;
export const REFERENCE_TEMPERATURE_C = 20;

/** Current densities (A/m²) that round copper windings carry continuously (common practice, rough). */
export const AIR_COOLED_LIMIT_A_PER_M2 = 3e6;
export const WATER_COOLED_LIMIT_A_PER_M2 = 20e6;

export interface WindingInput {
  /** Total length of conductor, m (all turns, all coils of a pair). */
  wireLengthM: number;
  /** Bare diameter of the round conductor, m. */
  diameterM: number;
  /** Current through the conductor, A (its sign does not matter). */
  currentA: number;
  /** Conductor temperature, °C; default 20 °C. */
  temperatureC?: number;
}

export interface WindingPower {
  wireLengthM: number;
  areaM2: number;
  resistanceOhm: number;
  /** |I| / area, A/m². */
  currentDensityAPerM2: number;
  powerW: number;
  voltageV: number;
  temperatureC: number;
  /** How the winding compares with the common-practice limits. */
  cooling: 'air' | 'water' | 'beyond';
}

/** Resistivity of copper at `temperatureC` (linear in T about 20 °C; fine over the range a coil lives in). */
export function copperResistivity(temperatureC = REFERENCE_TEMPERATURE_C): number {
  return COPPER_RESISTIVITY_20C * (1 + COPPER_ALPHA_20C * (temperatureC - REFERENCE_TEMPERATURE_C));
}

/** Length of wire in `turns` circular turns of `radiusM` (one coil; a pair has twice this). */
export function loopWireLength(turns: number, radiusM: number): number {
  return Math.abs(turns) * 2 * Math.PI * radiusM;
}

/** The winding's numbers, or undefined when an input is missing or not positive (the model reports those). */
export function windingPower(w: WindingInput): WindingPower | undefined {
  const temperatureC = w.temperatureC ?? REFERENCE_TEMPERATURE_C;
  if (!(w.wireLengthM > 0) || !(w.diameterM > 0) || !Number.isFinite(w.currentA) || !Number.isFinite(w.wireLengthM)) return undefined;
  const rho = copperResistivity(temperatureC);
  if (!(rho > 0)) return undefined;
  const areaM2 = (Math.PI * w.diameterM * w.diameterM) / 4;
  const resistanceOhm = (rho * w.wireLengthM) / areaM2;
  const current = Math.abs(w.currentA);
  const j = current / areaM2;
  return {
    wireLengthM: w.wireLengthM,
    areaM2,
    resistanceOhm,
    currentDensityAPerM2: j,
    powerW: current * current * resistanceOhm,
    voltageV: current * resistanceOhm,
    temperatureC,
    cooling: j <= AIR_COOLED_LIMIT_A_PER_M2 ? 'air' : j <= WATER_COOLED_LIMIT_A_PER_M2 ? 'water' : 'beyond',
  };
}

/**
 * Spin flips near a zero of the field. An atom crossing the region where the field's direction
 * turns faster than its moment precesses can flip into an untrapped sublevel. For a linear
 * quadrupole at temperature T the published estimate is
 *   Γ = χ ħ/m · (μ b′ / k_B T)²,  χ ≈ 1.85,
 * with b′ the strongest (axial) |B| gradient and μ the sublevel's moment: the dimensional form
 * ħ/(m l²) with l = k_B T/(μ b′) the cloud size, and χ fitted to measured ⁸⁷Rb losses
 * (Phys. Rev. A 79, 063631 (2009); from memory — the prefactor is an empirical fit).
 * For a trap with a field at its minimum the rule used is the adiabatic condition, common
 * practice: the Larmor frequency there should exceed the highest trap frequency by a wide margin.
 */
import { BOLTZMANN_K, HBAR } from '../constants';
import type { MajoranaEstimate } from './types';

export const MAJORANA_PREFACTOR = 1.85;
export const MAJORANA_SOURCE = 'Γ = 1.85 ħ/m (μ b′/k_B T)², Phys. Rev. A 79, 063631 (2009) (prefactor from memory, an empirical fit)';
/**
 * Below this Majorana rate (a lifetime over a minute, about what the background gas allows in a
 * typical vacuum; common practice) the loss is a note, not a warning.
 */
export const MAJORANA_NOTE_RATE = 1 / 60;
/** Warn when the Larmor frequency at the minimum is less than this many times the highest trap frequency (common practice). */
export const ADIABATIC_MARGIN = 100;

/** `momentJT`: the size of the moment that holds the atom (dE/dB), J/T. */
export function majoranaRate(momentJT: number, gradientTPerM: number, massKg: number, temperatureK: number): MajoranaEstimate {
  const x = (momentJT * gradientTPerM) / (BOLTZMANN_K * temperatureK);
  return { rateHz: ((MAJORANA_PREFACTOR * HBAR) / massKg) * x * x, gradientTPerM, source: MAJORANA_SOURCE };
}

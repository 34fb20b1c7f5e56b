/**
 * Unit conversions used while building the table: published energies (wavenumbers,
 * frequencies) to Hz, and the nuclear g-factor from the nuclear moment.
 */
import { BOHR_MAGNETON, NUCLEAR_MAGNETON, SPEED_OF_LIGHT } from '../constants';
import { nuclearGFromMoment as gFromMoment } from '../gFactors';
import type { PublishedEnergyUnit } from './types';

/** Hz per unit of each published energy unit (cm⁻¹ uses c in cm/s, exact). */
const HZ_PER_UNIT: Readonly<Record<PublishedEnergyUnit, number>> = {
  Hz: 1,
  kHz: 1e3,
  MHz: 1e6,
  THz: 1e12,
  'cm-1': SPEED_OF_LIGHT * 100,
};

/** Converts a published energy to E/h in Hz. */
export function publishedEnergyToHz(value: number, unit: PublishedEnergyUnit): number {
  return value * HZ_PER_UNIT[unit];
}

/** Vacuum wavelength (m) of a line of frequency `hz`: λ = c/ν (the one place it is computed). */
export function vacuumWavelengthM(hz: number): number {
  return SPEED_OF_LIGHT / hz;
}

/** μ_N/μ_B from the CODATA 2022 magnetons in constants.ts. */
export const NUCLEAR_TO_BOHR_MAGNETON = NUCLEAR_MAGNETON / BOHR_MAGNETON;

/**
 * Nuclear g-factor in units of μ_B, H_Z = μ_B B g_I I_z convention:
 * g_I = −(μ_I/μ_N)(μ_N/μ_B)/I. Returns undefined for I = 0 or non-finite input.
 */
export function nuclearGFromMoment(muOverMuN: number, twoI: number): number | undefined {
  if (!Number.isFinite(muOverMuN) || !Number.isInteger(twoI) || twoI <= 0) return undefined;
  return gFromMoment(muOverMuN, twoI);
}

/** Inverse of `nuclearGFromMoment`: μ_I/μ_N from g_I (μ_B units). */
export function nuclearMomentFromG(gI: number, twoI: number): number | undefined {
  if (!Number.isFinite(gI) || !Number.isInteger(twoI) || twoI <= 0) return undefined;
  return (-gI * (twoI / 2)) / NUCLEAR_TO_BOHR_MAGNETON;
}

/**
 * Linear (weak-field) Zeeman sublevels: E(m)/h = m g μ_B B / h.
 *
 * Works for a fine-structure level (g = g_J, twoF = twoJ) or a hyperfine level (g = g_F).
 * Sign convention as in gFactors.ts: H = μ_B B (g_J J_z + g_I I_z), so a positive g puts
 * positive m above zero for B > 0. Valid only while the Zeeman shift is small compared with
 * the neighbouring level spacing; the full treatment lives in the exact diagonalisation.
 */
import { BOHR_MAGNETON_HZ_PER_T } from './constants';

/** Sublevels m = −F … F (ascending) with their linear shifts in Hz at `fieldT` tesla. */
export function linearSublevels(g: number, twoF: number, fieldT: number): { twoM: number; energyHz: number }[] {
  if (!Number.isInteger(twoF) || twoF < 0) return [];
  const out: { twoM: number; energyHz: number }[] = [];
  for (let twoM = -twoF; twoM <= twoF; twoM += 2) {
    // (twoM/2) g μ_B B / h; +0 turns a −0 (m = 0 or B = 0) into 0
    out.push({ twoM, energyHz: (twoM / 2) * g * BOHR_MAGNETON_HZ_PER_T * fieldT + 0 });
  }
  return out;
}

/** Linear shift per unit field of one sublevel, Hz/T. */
export function linearShiftPerTesla(g: number, twoM: number): number {
  return (twoM / 2) * g * BOHR_MAGNETON_HZ_PER_T + 0;
}

/**
 * Landé factors in the engine's argument order, delegating to the project's g-factor module
 * so there is one implementation of each formula.
 */
import { hyperfineGF, landeGJ as landeGJFromTerm } from '../gFactors';

/** g_F with both electronic and nuclear parts; F = 0 has no linear shift and gives 0. */
export function landeGF(twoF: number, twoJ: number, twoI: number, gJ: number, gI: number): number {
  if (twoF === 0) return 0;
  return hyperfineGF(gJ, gI, twoJ, twoI, twoF);
}

/** g_J of an LS term with arbitrary g_L, g_S; J = 0 gives 0. */
export function landeGJ(L: number, twoS: number, twoJ: number, gL: number, gS: number): number {
  if (twoJ === 0) return 0;
  return landeGJFromTerm(twoS, L, twoJ, { gS, gL });
}

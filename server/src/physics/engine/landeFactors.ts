/**
 * Landé factors for the low-field (linear) formula. Kept inside the engine so
 * it has no dependency on the project's separate g-factor module.
 */
import { jj1 } from './halfIntegers';

/**
 * g_F with both electronic and nuclear parts (g_I in units of μ_B, Zeeman term +μ_B B g):
 * g_F = g_J [F(F+1) + J(J+1) − I(I+1)] / 2F(F+1) + g_I [F(F+1) + I(I+1) − J(J+1)] / 2F(F+1).
 * F = 0 has no linear shift; 0 is returned.
 */
export function landeGF(twoF: number, twoJ: number, twoI: number, gJ: number, gI: number): number {
  if (twoF === 0) return 0;
  const f = jj1(twoF);
  const j = jj1(twoJ);
  const i = jj1(twoI);
  return (gJ * (f + j - i) + gI * (f + i - j)) / (2 * f);
}

/**
 * g_J of an LS term with arbitrary g_L, g_S:
 * g_J = g_L [J(J+1) + L(L+1) − S(S+1)] / 2J(J+1) + g_S [J(J+1) − L(L+1) + S(S+1)] / 2J(J+1).
 * J = 0 has no linear shift; 0 is returned.
 */
export function landeGJ(L: number, twoS: number, twoJ: number, gL: number, gS: number): number {
  if (twoJ === 0) return 0;
  const j = jj1(twoJ);
  const l = L * (L + 1);
  const s = jj1(twoS);
  return (gL * (j + l - s) + gS * (j - l + s)) / (2 * j);
}

/**
 * Landé g-factors in LS coupling, hyperfine g_F, and the nuclear g-factor conversion.
 *
 * Sign convention used throughout the physics core: the Zeeman Hamiltonian is
 *     H_Z = μ_B B (g_J J_z + g_I I_z)          (B along z; J_z, I_z in units of ħ)
 * so g_J is positive for ordinary electron levels (the electron's moment points against its
 * angular momentum and μ_B > 0 carries that sign), and g_I is expressed in units of μ_B with
 * the OPPOSITE sign to the nuclear moment: a nucleus with positive μ_I has g_I < 0,
 *     g_I = −(μ_I/μ_N)(μ_N/μ_B)/I.
 * A sublevel's linear shift is then m g μ_B B (see linearZeeman.ts).
 */
import { BOHR_MAGNETON, ELECTRON_GS, ELECTRON_MASS, NUCLEAR_MAGNETON } from './constants';

export interface Fraction {
  num: number;
  den: number;
}

/**
 * g_J = g_L [J(J+1) − S(S+1) + L(L+1)] / [2J(J+1)] + g_S [J(J+1) + S(S+1) − L(L+1)] / [2J(J+1)].
 * Defaults: g_S = |g_e| (CODATA 2022), g_L = 1. J = 0 has no magnetic moment: returns 0.
 * The J value is not checked against S and L here (the term-symbol parser does that).
 */
export function landeGJ(twoS: number, L: number, twoJ: number, opts?: { gS?: number; gL?: number }): number {
  const gS = opts?.gS ?? ELECTRON_GS;
  const gL = opts?.gL ?? 1;
  if (twoJ === 0) return 0;
  // Work in units of 1/4 so every product is an exact integer.
  const jj = twoJ * (twoJ + 2); // 4 J(J+1)
  const ss = twoS * (twoS + 2); // 4 S(S+1)
  const ll = 4 * L * (L + 1); // 4 L(L+1)
  return (gL * (jj - ss + ll) + gS * (jj + ss - ll)) / (2 * jj);
}

/**
 * Exact Landé factor with g_S = 2 and g_L = 1, as a reduced fraction (den > 0):
 * g_J = 1 + [J(J+1) + S(S+1) − L(L+1)] / [2J(J+1)]. J = 0 gives 0/1.
 */
export function landeGJFraction(twoS: number, L: number, twoJ: number): Fraction {
  if (twoJ === 0) return { num: 0, den: 1 };
  const jj = twoJ * (twoJ + 2);
  const ss = twoS * (twoS + 2);
  const ll = 4 * L * (L + 1);
  return reduce(3 * jj + ss - ll, 2 * jj);
}

/** '4/3', '2', '-2/3' */
export function formatFraction(f: Fraction): string {
  return f.den === 1 ? String(f.num) : `${f.num}/${f.den}`;
}

/**
 * Orbital g-factor. Without a mass, 1. With the atom's mass M (kg), the reduced-mass
 * correction g_L = 1 − m_e/M (the nucleus co-moves with the orbiting electron). Passing the
 * atomic rather than the nuclear mass changes g_L by about Z(m_e/M)², below 1e-8 for every
 * atom — far below any measured g_J. A mass that is not a positive finite number gives NaN.
 */
export function orbitalGFactor(atomMassKg?: number): number {
  if (atomMassKg === undefined) return 1;
  if (!Number.isFinite(atomMassKg) || atomMassKg <= 0) return NaN;
  return 1 - ELECTRON_MASS / atomMassKg;
}

/**
 * Hyperfine g_F by the projection theorem with both terms:
 * g_F = g_J [F(F+1) − I(I+1) + J(J+1)] / [2F(F+1)] + g_I [F(F+1) + I(I+1) − J(J+1)] / [2F(F+1)],
 * with g_I in units of μ_B in the convention of the file header. F = 0 gives 0.
 */
export function hyperfineGF(gJ: number, gI: number, twoJ: number, twoI: number, twoF: number): number {
  if (twoF === 0) return 0;
  const ff = twoF * (twoF + 2);
  const ii = twoI * (twoI + 2);
  const jj = twoJ * (twoJ + 2);
  return (gJ * (ff - ii + jj) + gI * (ff + ii - jj)) / (2 * ff);
}

/**
 * g_I (units of μ_B, sign opposite to the moment) from a nuclear moment μ_I in nuclear
 * magnetons and the spin I: g_I = −(μ_I/μ_N)(μ_N/μ_B)/I. I = 0 has no moment: returns 0.
 */
export function nuclearGFromMoment(muI_in_muN: number, twoI: number): number {
  if (twoI === 0) return 0;
  return (-muI_in_muN * (NUCLEAR_MAGNETON / BOHR_MAGNETON)) / (twoI / 2);
}

function gcd(a: number, b: number): number {
  a = Math.abs(a);
  b = Math.abs(b);
  while (b) [a, b] = [b, a % b];
  return a;
}

function reduce(num: number, den: number): Fraction {
  const g = gcd(num, den) || 1;
  const sign = den < 0 ? -1 : 1;
  return { num: (sign * num) / g || 0, den: (sign * den) / g };
}

/**
 * Zero-field energies in closed form (the Casimir-type formulas), used to
 * order the low-field labels and as cross-checks of the matrices.
 */
import { jj1 } from './halfIntegers';

/** Quadrupole B acts only when I ≥ 1 and J ≥ 1. */
export function quadrupoleActs(twoJ: number, twoI: number): boolean {
  return twoJ >= 2 && twoI >= 2;
}

/** Octupole C acts only when I ≥ 3/2 and J ≥ 3/2. */
export function octupoleActs(twoJ: number, twoI: number): boolean {
  return twoJ >= 3 && twoI >= 3;
}

/**
 * E(F)/h of a hyperfine level with dipole A, quadrupole B, octupole C (Hz),
 * K = F(F+1) − I(I+1) − J(J+1):
 *   A K/2
 * + B [3/2 K(K+1) − 2 I(I+1) J(J+1)] / [4 I(2I−1) J(2J−1)]
 * + C [5K²(K/4+1) + K(I(I+1)+J(J+1)+3 − 3I(I+1)J(J+1)) − 5I(I+1)J(J+1)]
 *     / [I(I−1)(2I−1) J(J−1)(2J−1)].
 * B and C are skipped where they cannot act.
 */
export function hyperfineZeroFieldHz(twoJ: number, twoI: number, twoF: number, A: number, B = 0, C = 0): number {
  const ii = jj1(twoI);
  const j2 = jj1(twoJ);
  const K = jj1(twoF) - ii - j2;
  let e = (A * K) / 2;
  const I = twoI / 2;
  const J = twoJ / 2;
  if (B !== 0 && quadrupoleActs(twoJ, twoI)) {
    e += (B * (1.5 * K * (K + 1) - 2 * ii * j2)) / (4 * I * (2 * I - 1) * J * (2 * J - 1));
  }
  if (C !== 0 && octupoleActs(twoJ, twoI)) {
    const num = 5 * K * K * (K / 4 + 1) + K * (ii + j2 + 3 - 3 * ii * j2) - 5 * ii * j2;
    e += (C * num) / (I * (I - 1) * (2 * I - 1) * J * (J - 1) * (2 * J - 1));
  }
  return e;
}

/** E(J)/h of a fine-structure level: ζ/2 [J(J+1) − L(L+1) − S(S+1)]. */
export function fineZeroFieldHz(L: number, twoS: number, twoJ: number, zeta: number): number {
  return (zeta / 2) * (jj1(twoJ) - L * (L + 1) - jj1(twoS));
}

/**
 * Hyperfine levels at zero field: the Casimir formula with magnetic-dipole A,
 * electric-quadrupole B and magnetic-octupole C constants (all in Hz, energies E/h in Hz).
 *
 *   K  = F(F+1) − I(I+1) − J(J+1)
 *   ΔE = A K/2
 *      + B [ (3/2)K(K+1) − 2I(I+1)J(J+1) ] / [ 4I(2I−1) J(2J−1) ]                    (I, J ≥ 1)
 *      + C [ 5K²(K/4 + 1) + K(I(I+1) + J(J+1) + 3 − 3I(I+1)J(J+1)) − 5I(I+1)J(J+1) ]
 *          / [ I(I−1)(2I−1) J(J−1)(2J−1) ]                                         (I, J ≥ 3/2)
 *
 * A rank-k term only acts when both I and J are at least k/2; below that its constant has no
 * effect and is ignored here (quadrupoleActs / octupoleActs tell a caller to warn about it).
 * The shifts are relative to the hyperfine centre of gravity: Σ_F (2F+1) ΔE(F) = 0.
 */

/** twoF values |J − I| … J + I, ascending. */
export function hyperfineFValues(twoJ: number, twoI: number): number[] {
  if (!Number.isInteger(twoJ) || !Number.isInteger(twoI) || twoJ < 0 || twoI < 0) return [];
  const out: number[] = [];
  for (let twoF = Math.abs(twoJ - twoI); twoF <= twoJ + twoI; twoF += 2) out.push(twoF);
  return out;
}

/** The quadrupole constant B can act only when I ≥ 1 and J ≥ 1. */
export function quadrupoleActs(twoJ: number, twoI: number): boolean {
  return twoJ >= 2 && twoI >= 2;
}

/** The octupole constant C can act only when I ≥ 3/2 and J ≥ 3/2. */
export function octupoleActs(twoJ: number, twoI: number): boolean {
  return twoJ >= 3 && twoI >= 3;
}

/** Zero-field shift of level F (Hz) from A, and optionally B and C (Hz). */
export function hyperfineShift(twoJ: number, twoI: number, twoF: number, A: number, B = 0, C = 0): number {
  const I = twoI / 2;
  const J = twoJ / 2;
  const F = twoF / 2;
  const II = I * (I + 1);
  const JJ = J * (J + 1);
  const K = F * (F + 1) - II - JJ;
  let shift = (A * K) / 2;
  if (B !== 0 && quadrupoleActs(twoJ, twoI)) {
    shift += (B * (1.5 * K * (K + 1) - 2 * II * JJ)) / (4 * I * (2 * I - 1) * J * (2 * J - 1));
  }
  if (C !== 0 && octupoleActs(twoJ, twoI)) {
    const numerator = 5 * K * K * (K / 4 + 1) + K * (II + JJ + 3 - 3 * II * JJ) - 5 * II * JJ;
    shift += (C * numerator) / (I * (I - 1) * (2 * I - 1) * J * (J - 1) * (2 * J - 1));
  }
  return shift;
}

/** All F levels with their zero-field shifts, ascending in F. */
export function hyperfineLevels(twoJ: number, twoI: number, A: number, B = 0, C = 0): { twoF: number; shift: number }[] {
  return hyperfineFValues(twoJ, twoI).map((twoF) => ({ twoF, shift: hyperfineShift(twoJ, twoI, twoF, A, B, C) }));
}

/**
 * The zero-field parts of a whole term's Hamiltonian inside one block of |m_L, m_S, m_I>:
 *
 *   fine structure   ζ L·S, or Σ_J E_J P_J with P_J = Π_{J'≠J} (L·S − x_J')/(x_J − x_J'),
 *                    x_J = ½[J(J+1) − L(L+1) − S(S+1)] (the eigenvalue of L·S on level J);
 *   dipole hyperfine a_L L·I + a_C S·I + a_SD D, with the spin-dipolar operator written inside
 *                    the term by the operator-equivalent of r̂_i r̂_j − δ_ij/3:
 *                    D = −3/((2L−1)(2L+3)) [(L·S)(L·I) + (L·I)(L·S) − ⅔ L(L+1) S·I]
 *                    (for one electron a_SD D = a_SD [3(s·r̂)(r̂·I) − s·I]);
 *   quadrupole       b_L [3(L·I)² + 3/2 L·I − L(L+1)I(I+1)] / [2I(2I−1) L(2L−1)]
 *                    (the electric field gradient of the electrons is orbital; b_L is B of a
 *                    level with J = L).
 * All of these conserve the total m, so the matrix products are exact inside the block.
 */
import { jj1 } from './halfIntegers';
import { multiplySquare } from './couplingMatrix';
import { termDotBlock, type TermBlockBasis } from './termBasis';

export interface TermOperators {
  n: number;
  LS: Float64Array;
  LI: Float64Array;
  SI: Float64Array;
  /** Spin-dipolar operator D (zero matrix when L = 0 or S = 0). */
  D: Float64Array;
  /** Quadrupole operator for b_L = 1 (zero matrix when it cannot act: L < 1 or I < 1). */
  Q: Float64Array;
}

export function spinDipolarActs(twoL: number, twoS: number): boolean {
  return twoL >= 2 && twoS >= 1;
}

export function orbitalQuadrupoleActs(twoL: number, twoI: number): boolean {
  return twoL >= 2 && twoI >= 2;
}

export function termOperators(two: readonly [number, number, number], basis: TermBlockBasis): TermOperators {
  const n = basis.states.length;
  const LS = termDotBlock(two, basis, 0, 1);
  const LI = termDotBlock(two, basis, 0, 2);
  const SI = termDotBlock(two, basis, 1, 2);
  const D = new Float64Array(n * n);
  const Q = new Float64Array(n * n);
  const L = two[0] / 2;
  const ll = jj1(two[0]);
  if (spinDipolarActs(two[0], two[1])) {
    const c = -3 / ((2 * L - 1) * (2 * L + 3));
    const a = multiplySquare(LS, LI, n);
    const b = multiplySquare(LI, LS, n);
    for (let k = 0; k < n * n; k++) D[k] = c * (a[k] + b[k] - (2 / 3) * ll * SI[k]);
  }
  if (orbitalQuadrupoleActs(two[0], two[2])) {
    const I = two[2] / 2;
    const c = 1 / (2 * I * (2 * I - 1) * L * (2 * L - 1));
    const sq = multiplySquare(LI, LI, n);
    for (let k = 0; k < n * n; k++) Q[k] = c * (3 * sq[k] + 1.5 * LI[k]);
    for (let k = 0; k < n; k++) Q[k * n + k] -= c * ll * jj1(two[2]);
  }
  return { n, LS, LI, SI, D, Q };
}

/** x_J, the eigenvalue of L·S on the level J. */
export function spinOrbitEigenvalue(twoL: number, twoS: number, twoJ: number): number {
  return (jj1(twoJ) - jj1(twoL) - jj1(twoS)) / 2;
}

/** Projector P_J onto the level J of the term inside the block, as a polynomial in L·S. */
export function levelProjector(two: readonly [number, number, number], jValues: readonly number[], twoJ: number, LS: Float64Array, n: number): Float64Array {
  let p: Float64Array = new Float64Array(n * n);
  for (let k = 0; k < n; k++) p[k * n + k] = 1;
  const xJ = spinOrbitEigenvalue(two[0], two[1], twoJ);
  for (const other of jValues) {
    if (other === twoJ) continue;
    const xo = spinOrbitEigenvalue(two[0], two[1], other);
    const f = new Float64Array(n * n);
    for (let k = 0; k < n * n; k++) f[k] = LS[k] / (xJ - xo);
    for (let k = 0; k < n; k++) f[k * n + k] -= xo / (xJ - xo);
    p = multiplySquare(p, f, n);
  }
  return p;
}

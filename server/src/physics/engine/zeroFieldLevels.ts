/**
 * Zero-field energies in closed form (the Casimir-type formulas), used to
 * order the low-field labels and as cross-checks of the matrices.
 */
import { jj1 } from './halfIntegers';

/** Closed-form hyperfine energies live in the project's zero-field module; re-exported for the engine. */
export { hyperfineShift as hyperfineZeroFieldHz, octupoleActs, quadrupoleActs } from '../hyperfineZeroField';

/** E(J)/h of a fine-structure level: ζ/2 [J(J+1) − L(L+1) − S(S+1)]. */
export function fineZeroFieldHz(L: number, twoS: number, twoJ: number, zeta: number): number {
  return (zeta / 2) * (jj1(twoJ) - L * (L + 1) - jj1(twoS));
}

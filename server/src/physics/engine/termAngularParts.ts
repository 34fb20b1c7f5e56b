/**
 * The parts of a whole term's Hamiltonian that depend only on its angular momenta (2L, 2S, 2I):
 * each block's basis, the scalar-product operators and the J-level projectors. They are the
 * same for every set of constants, so they are built once per term and kept for the few terms
 * used last (a sweep, a fit or an editor re-evaluation builds the same term again and again).
 * Callers must not modify the arrays.
 */
import { couplings } from './halfIntegers';
import { termBlockBasis, type TermBlockBasis } from './termBasis';
import { levelProjector, termOperators, type TermOperators } from './termOperators';

export interface TermBlockParts {
  basis: TermBlockBasis;
  ops: TermOperators;
  /** P_J inside the block, by twoJ (every J of the term). */
  projectors: Map<number, Float64Array>;
}

/** Terms kept: enough for a few species side by side; the largest (4096 states) keeps about 10 MB each. */
const KEPT_TERMS = 4;
const kept = new Map<string, Map<number, TermBlockParts>>();

/** The angular parts of the block of total twoM of the term with twice-momenta `two`. */
export function termBlockParts(two: readonly [number, number, number], twoM: number): TermBlockParts {
  const key = `${two[0]},${two[1]},${two[2]}`;
  let blocks = kept.get(key);
  if (blocks) {
    // Most recently used last.
    kept.delete(key);
    kept.set(key, blocks);
  } else {
    blocks = new Map();
    kept.set(key, blocks);
    if (kept.size > KEPT_TERMS) kept.delete(kept.keys().next().value as string);
  }
  let parts = blocks.get(twoM);
  if (!parts) {
    const basis = termBlockBasis(two, twoM);
    const ops = termOperators(two, basis);
    const jValues = couplings(two[0], two[1]);
    const projectors = new Map(jValues.map((twoJ) => [twoJ, levelProjector(two, jValues, twoJ, ops.LS, ops.n)] as const));
    parts = { basis, ops, projectors };
    blocks.set(twoM, parts);
  }
  return parts;
}

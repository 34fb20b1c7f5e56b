/**
 * The engine gives each eigenvector on the uncoupled basis of its own m block. Matrix
 * elements between states of different blocks (or levels) need to find "the same
 * uncoupled state" in another basis: these helpers turn a basis label into its list of
 * projections and a lookup key, and cache one index map per basis array.
 */
import type { HighFieldLabel } from '../engine';

/**
 * Twice-projections of the uncoupled state in a fixed order:
 * hyperfine |m_J, m_I> → [m_J, m_I]; fine |m_L, m_S(, m_I)> → [m_L, m_S, m_I] (m_I = 0 without a nucleus).
 */
export function projectionsOf(label: HighFieldLabel): number[] {
  if (label.scheme === 'mJ,mI') return [label.twoMJ, label.twoMI];
  return [label.twoML, label.twoMS, label.twoMI ?? 0];
}

export function keyOf(projections: readonly number[]): string {
  return projections.join(',');
}

const cache = new WeakMap<readonly HighFieldLabel[], Map<string, number>>();

/** key → position in `basis` (states of one block share one basis array, so this is cached). */
export function basisIndex(basis: readonly HighFieldLabel[]): Map<string, number> {
  let map = cache.get(basis);
  if (!map) {
    map = new Map();
    basis.forEach((label, i) => map?.set(keyOf(projectionsOf(label)), i));
    cache.set(basis, map);
  }
  return map;
}

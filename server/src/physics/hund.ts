/**
 * Ground level of a configuration by Hund's rules (LS coupling).
 *
 * One open subshell l^n: fill m_l = l, l−1, …, −l with spin up first, then spin down.
 *   S = |Σ m_s| (largest spin), L = |Σ m_l| (largest L for that S),
 *   J = |L − S| if the subshell is less than half full, L + S if more than half full
 *   (half full: L = 0, so J = S).
 *
 * Several open subshells (rule used here, stated because textbooks only give the one-shell
 * case): each open subshell takes its own Hund term; the spins are then all parallel and the
 * orbital momenta aligned, S = Σ S_i and L = Σ L_i. This is also the highest-S, then
 * highest-L term of the coupled configuration. For J, only subshells that are neither half
 * nor completely full matter: if all of them are less than half full J = |L − S|, if all
 * are more than half full J = L + S; if they disagree, the subshell with the largest l
 * (then the largest n) decides; if there is none, L = 0 and J = S.
 * Example: 4f7 5d 6s2 → 4f7 gives ⁸S, 5d gives ²D, coupled ⁹D, and 5d¹ is less than half
 * full, so J = 2: ⁹D₂, which is the observed ground level for that configuration.
 *
 * Hund's rules are a rule of thumb for the lowest level of the given configuration; they
 * say nothing about which configuration is lowest, and they fail for some atoms with
 * strongly mixed open shells (e.g. the 4f 5d 6s2 configuration).
 */
import type { Configuration } from './configuration';
import { subshellCapacity } from './lsTerms';

export interface HundLevel {
  twoS: number;
  L: number;
  twoJ: number;
}

/** Hund's-rules term and J of one subshell l^n (n within 0 … 4l+2), or null if impossible. */
export function hundSubshell(l: number, n: number): HundLevel | null {
  const cap = subshellCapacity(l);
  if (!Number.isInteger(l) || !Number.isInteger(n) || l < 0 || n < 0 || n > cap) return null;
  let twoMS = 0;
  let ML = 0;
  for (let k = 0; k < n; k++) {
    const spinUp = k < 2 * l + 1;
    const ml = l - (spinUp ? k : k - (2 * l + 1));
    ML += ml;
    twoMS += spinUp ? 1 : -1;
  }
  const twoS = Math.abs(twoMS);
  const L = Math.abs(ML);
  const half = 2 * l + 1;
  const twoJ = n < half ? Math.abs(2 * L - twoS) : 2 * L + twoS;
  return { twoS, L, twoJ };
}

/**
 * Ground level of the open subshell(s) of a configuration, by the rules in the file header.
 * Closed shells give ¹S₀. Returns null for an impossible configuration (an occupancy above
 * 4l+2 or below 0).
 */
export function hundGroundLevel(c: Configuration): HundLevel | null {
  let twoS = 0;
  let L = 0;
  let decider: { l: number; n: number; lessThanHalf: boolean } | null = null;
  let lessCount = 0;
  let moreCount = 0;
  for (const s of c.subshells) {
    const h = hundSubshell(s.l, s.occupancy);
    if (!h) return null;
    twoS += h.twoS;
    L += h.L;
    const half = 2 * s.l + 1;
    const cap = subshellCapacity(s.l);
    if (s.occupancy === 0 || s.occupancy === cap || s.occupancy === half) continue;
    const lessThanHalf = s.occupancy < half;
    if (lessThanHalf) lessCount++;
    else moreCount++;
    if (!decider || s.l > decider.l || (s.l === decider.l && s.n > decider.n)) {
      decider = { l: s.l, n: s.n, lessThanHalf };
    }
  }
  let lessThanHalf: boolean;
  if (lessCount > 0 && moreCount === 0) lessThanHalf = true;
  else if (moreCount > 0 && lessCount === 0) lessThanHalf = false;
  else if (decider) lessThanHalf = decider.lessThanHalf;
  else return { twoS, L, twoJ: twoS }; // only half-full or closed subshells: L = 0
  const twoJ = lessThanHalf ? Math.abs(2 * L - twoS) : 2 * L + twoS;
  return { twoS, L, twoJ };
}

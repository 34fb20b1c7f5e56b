/**
 * LS (Russell–Saunders) terms allowed by the Pauli principle.
 *
 * Equivalent electrons l^n: count the microstates (M_L, M_S) of n electrons in the 2(2l+1)
 * spin-orbitals, then peel off terms from the top of the table:
 *   count(L, S) = N(L, S) − N(L+1, S) − N(L, S+1) + N(L+1, S+1),
 * where N(M_L, M_S) is the number of microstates with those projections. The microstate
 * table is built by a small dynamic programme over spin-orbitals rather than by listing every
 * determinant, so even g or h shells are instant.
 *
 * A configuration with several open subshells couples their terms: S from |S1−S2| to S1+S2
 * and L from |L1−L2| to L1+L2, multiplicities multiplied. Closed subshells contribute ¹S.
 */
import type { Configuration } from './configuration';

export interface LSTerm {
  twoS: number;
  L: number;
  /** how many independent times this term occurs (e.g. d³ has ²D twice) */
  count: number;
}

/** Electrons a subshell of orbital l can hold. */
export function subshellCapacity(l: number): number {
  return 4 * l + 2;
}

const equivalentCache = new Map<string, LSTerm[]>();

/**
 * Terms of l^n (n electrons in one subshell). Returns [] for impossible input
 * (negative or non-integer l, n outside 0 … 4l+2).
 */
export function termsOfEquivalentElectrons(l: number, n: number): LSTerm[] {
  if (!Number.isInteger(l) || !Number.isInteger(n) || l < 0 || n < 0 || n > subshellCapacity(l)) return [];
  const key = `${l},${n}`;
  const cached = equivalentCache.get(key);
  if (cached) return cached.map((t) => ({ ...t }));

  const N = microstateTable(l, n);
  const maxML = n * l; // loose upper bound is fine
  const terms: LSTerm[] = [];
  for (let L = 0; L <= maxML; L++) {
    for (let twoS = n % 2; twoS <= n; twoS += 2) {
      const count = N(L, twoS) - N(L + 1, twoS) - N(L, twoS + 2) + N(L + 1, twoS + 2);
      if (count > 0) terms.push({ twoS, L, count });
    }
  }
  const sorted = sortTerms(terms);
  equivalentCache.set(key, sorted);
  return sorted.map((t) => ({ ...t }));
}

/**
 * Terms of a whole configuration: couple the terms of each open subshell.
 * Closed subshells and the noble-gas core add nothing (¹S). A configuration with only closed
 * subshells gives [¹S].
 */
export function termsOfConfiguration(c: Configuration): LSTerm[] {
  let acc: LSTerm[] = [{ twoS: 0, L: 0, count: 1 }];
  for (const s of c.subshells) {
    const terms = termsOfEquivalentElectrons(s.l, s.occupancy);
    if (terms.length === 0) return [];
    acc = coupleTerms(acc, terms);
  }
  return acc;
}

/** Couple two lists of terms (vector addition of S and of L, counts multiplied). */
export function coupleTerms(a: LSTerm[], b: LSTerm[]): LSTerm[] {
  const counts = new Map<string, LSTerm>();
  for (const x of a) {
    for (const y of b) {
      for (let twoS = Math.abs(x.twoS - y.twoS); twoS <= x.twoS + y.twoS; twoS += 2) {
        for (let L = Math.abs(x.L - y.L); L <= x.L + y.L; L++) {
          const key = `${twoS},${L}`;
          const t = counts.get(key);
          if (t) t.count += x.count * y.count;
          else counts.set(key, { twoS, L, count: x.count * y.count });
        }
      }
    }
  }
  return sortTerms([...counts.values()]);
}

/** Order used everywhere: by spin (2S) then by L, both ascending. */
export function sortTerms(terms: LSTerm[]): LSTerm[] {
  return [...terms].sort((p, q) => p.twoS - q.twoS || p.L - q.L);
}

/** Total number of microstates in a term list: Σ count (2S+1)(2L+1). */
export function microstateCount(terms: LSTerm[]): number {
  return terms.reduce((s, t) => s + t.count * (t.twoS + 1) * (2 * t.L + 1), 0);
}

/**
 * N(M_L, 2M_S) for l^n: number of ways to put n electrons in distinct spin-orbitals with the
 * given total projections. Dynamic programme over the 2(2l+1) spin-orbitals, on flat arrays
 * indexed by (electrons placed, M_L, 2M_S): string-keyed maps made 4f⁹ cost a CLI start-up
 * tens of milliseconds (docs/speed.md). The counts are exact integers either way.
 */
function microstateTable(l: number, n: number): (ML: number, twoMS: number) => number {
  const maxML = n * l;
  const width = 2 * maxML + 1; // M_L from −maxML to maxML
  const height = 2 * n + 1; // 2M_S from −n to n
  const plane = width * height;
  const at = (k: number, ML: number, twoMS: number): number => k * plane + (ML + maxML) * height + (twoMS + n);
  let ways = new Float64Array((n + 1) * plane);
  ways[at(0, 0, 0)] = 1;
  for (let ml = -l; ml <= l; ml++) {
    for (const twoMs of [1, -1]) {
      const next = ways.slice();
      // Each orbital takes at most one electron: add it to every state of k < n electrons.
      for (let k = 0; k < n; k++) {
        for (let ML = -maxML; ML <= maxML; ML++) {
          for (let twoMS = -n; twoMS <= n; twoMS++) {
            const w = ways[at(k, ML, twoMS)]!;
            if (w === 0) continue;
            // Reachable states never leave the box: |M_L| ≤ n·l and |2M_S| ≤ n for n electrons.
            next[at(k + 1, ML + ml, twoMS + twoMs)]! += w;
          }
        }
      }
      ways = next;
    }
  }
  return (ML, twoMS) => (Math.abs(ML) <= maxML && Math.abs(twoMS) <= n ? ways[at(n, ML, twoMS)]! : 0);
}

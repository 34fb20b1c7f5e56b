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
  const terms: LSTerm[] = [];
  for (let L = 0; L <= N.maxML; L++) {
    for (let twoS = n % 2; twoS <= n; twoS += 2) {
      const count = N.at(L, twoS) - N.at(L + 1, twoS) - N.at(L, twoS + 2) + N.at(L + 1, twoS + 2);
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
 * N(M_L, 2M_S) for l^n, M_L ≥ 0 and 2M_S ≥ 0: number of ways to put n electrons in distinct
 * spin-orbitals with the given total projections. The spin-up and spin-down electrons fill the
 * 2l+1 orbitals independently, so N is a sum over (up, down) counts of products of subset counts:
 * ways[k][M] = number of k-orbital subsets of m_l = −l … l with Σ m_l = M (a small dynamic
 * programme). The table is filled once, only up to the largest M_L there is (k orbitals sum to at
 * most the k highest m_l): 4f⁹ was tens of milliseconds of a CLI start-up while still interpreted
 * (docs/speed.md); the counts are exact integers either way. Outside the table N is 0.
 */
function microstateTable(l: number, n: number): { maxML: number; at(ML: number, twoMS: number): number } {
  const orbitals = 2 * l + 1;
  const maxM = l * orbitals; // |Σ m_l| of any subset
  const width = 2 * maxM + 1;
  // ways[k * width + M + maxM]: subsets of k orbitals with Σ m_l = M.
  const ways = new Float64Array((orbitals + 1) * width);
  ways[maxM] = 1;
  for (let ml = -l; ml <= l; ml++) {
    // Largest k first, so each orbital is taken at most once (0/1 knapsack).
    for (let k = orbitals; k >= 1; k--) {
      for (let M = -maxM; M <= maxM; M++) {
        const from = M - ml;
        if (from < -maxM || from > maxM) continue;
        ways[k * width + M + maxM]! += ways[(k - 1) * width + from + maxM]!;
      }
    }
  }
  /** The largest Σ m_l of k distinct orbitals: the k highest m_l. */
  const top = (k: number): number => k * l - (k * (k - 1)) / 2;
  // Rows: 2M_S = n mod 2, +2, … n (up = (n + 2M_S)/2 spin-up electrons); columns: M_L = 0 … maxML.
  const rows = (n >> 1) + 1;
  let maxML = 0;
  for (let r = 0; r < rows; r++) {
    const up = (n + (n % 2) + 2 * r) / 2;
    if (up <= orbitals) maxML = Math.max(maxML, top(up) + top(n - up));
  }
  const cols = maxML + 1;
  const table = new Float64Array(rows * cols);
  for (let r = 0; r < rows; r++) {
    const up = (n + (n % 2) + 2 * r) / 2;
    const down = n - up;
    if (up > orbitals) continue;
    const topUp = top(up);
    const topDown = top(down);
    for (let ML = 0; ML <= maxML; ML++) {
      let total = 0;
      for (let M = Math.max(-topUp, ML - topDown); M <= Math.min(topUp, ML + topDown); M++) {
        total += ways[up * width + M + maxM]! * ways[down * width + ML - M + maxM]!;
      }
      table[r * cols + ML] = total;
    }
  }
  return {
    maxML,
    at: (ML, twoMS) => {
      const r = (twoMS - (n % 2)) / 2;
      return ML < 0 || ML > maxML || r < 0 || r >= rows || !Number.isInteger(r) ? 0 : table[r * cols + ML]!;
    },
  };
}

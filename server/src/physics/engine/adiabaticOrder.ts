/**
 * Adiabatic labelling. Inside one block the levels never cross (the block has
 * no further symmetry), so the k-th lowest eigenvalue at any field of one sign
 * is the k-th lowest zero-field state and the k-th lowest strong-field state.
 * These functions sort the candidate labels into that rank order.
 */
import type { RankedHigh, RankedLow } from './levelModel';

function nearlyEqual(a: number, b: number, scale: number): boolean {
  return Math.abs(a - b) <= 1e-12 * scale;
}

/**
 * Rank order at weak field of sign `sign`: by zero-field energy; states that
 * are degenerate at zero field separate by their linear slope sign·g m μ_B.
 */
export function orderLowLabels(cands: RankedLow[], sign: 1 | -1, energyScale: number, slopeScale: number): RankedLow[] {
  return [...cands].sort((a, b) => {
    if (!nearlyEqual(a.zeroFieldHz, b.zeroFieldHz, energyScale)) return a.zeroFieldHz - b.zeroFieldHz;
    const sa = sign * a.slopeHzPerT;
    const sb = sign * b.slopeHzPerT;
    if (!nearlyEqual(sa, sb, slopeScale)) return sa - sb;
    return 0;
  });
}

/**
 * Rank order at strong field of sign `sign`: by the Zeeman slope sign·(g m)
 * first; equal slopes separate by the diagonal of the zero-field Hamiltonian.
 */
export function orderHighLabels(cands: RankedHigh[], sign: 1 | -1, energyScale: number, slopeScale: number): RankedHigh[] {
  return [...cands].sort((a, b) => {
    const sa = sign * a.slopeHzPerT;
    const sb = sign * b.slopeHzPerT;
    if (!nearlyEqual(sa, sb, slopeScale)) return sa - sb;
    if (!nearlyEqual(a.diagonalHz, b.diagonalHz, energyScale)) return a.diagonalHz - b.diagonalHz;
    return 0;
  });
}

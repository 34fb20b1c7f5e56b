/**
 * Shared shapes of a level prepared for diagonalisation: its m blocks, each
 * with the zero-field matrix, the diagonal Zeeman slope, and the adiabatic
 * label tables for both signs of the field.
 */
import type { CleanSpec } from './validateSpec';
import type { HighFieldLabel, LowFieldLabel } from './types';

/** A low-field label with what the linear formula needs: E(B) = zeroFieldHz + slopeHzPerT · B. */
export interface RankedLow {
  label: LowFieldLabel;
  zeroFieldHz: number;
  slopeHzPerT: number;
}

/** A high-field label with what the strong-field formula needs: E(B) = diagonalHz + slopeHzPerT · B. */
export interface RankedHigh {
  label: HighFieldLabel;
  diagonalHz: number;
  slopeHzPerT: number;
}

/** One block of conserved quantum numbers (total m; for the fine mode m_J and m_I separately). */
export interface LevelBlock {
  /** Twice the total m of every state in the block. */
  twoM: number;
  size: number;
  /** The uncoupled basis states, in matrix order. */
  basis: HighFieldLabel[];
  /** Zero-field Hamiltonian, Hz, row-major size × size. */
  h0: Float64Array;
  /** ∂H/∂B, diagonal in the uncoupled basis, Hz/T. */
  zeeman: Float64Array;
  /**
   * The B² coefficient (the diamagnetic term), diagonal in the uncoupled basis, Hz/T², when the
   * level asks for it: H = h0 + B·zeeman + B²·quadratic. Such a block is never swept by series.
   */
  quadratic?: Float64Array;
  /** Low-field labels by energy rank: [0] for B ≥ 0, [1] for B < 0. */
  low: [RankedLow[], RankedLow[]];
  /** High-field labels by energy rank: [0] for B → +∞, [1] for B → −∞. */
  high: [RankedHigh[], RankedHigh[]];
}

export interface LevelModel {
  spec: CleanSpec;
  blocks: LevelBlock[];
  dimension: number;
  largestBlock: number;
  /** max − min of the zero-field energies (hyperfine or fine structure), Hz. */
  zeroFieldSpreadHz: number;
}

/** Index 0 for B ≥ 0, 1 for B < 0 (which label table applies). */
export function fieldSide(fieldT: number): 0 | 1 {
  return fieldT < 0 ? 1 : 0;
}

/**
 * Diagonalise one block at one field into reusable buffers, and derive the
 * field derivatives from the eigenvectors:
 *   dE_k/dB   = <k|Z|k>                                 (Hellmann–Feynman)
 *   d²E_k/dB² = 2 Σ_{l≠k} <k|Z|l>² / (E_k − E_l)         (second-order perturbation)
 * where Z = ∂H/∂B is diagonal in the uncoupled basis. Other blocks do not
 * contribute because Z conserves the block's quantum numbers.
 */
import type { LevelBlock } from './levelModel';
import { symmetricEigen } from './symmetricEigen';

export interface BlockWorkspace {
  /** Largest block order the buffers can hold; smaller blocks use the leading part. */
  capacity: number;
  a: Float64Array;
  /** Eigenvalues ascending, Hz. */
  values: Float64Array;
  /** Column k is the k-th eigenvector (row-major n × n). */
  vectors: Float64Array;
}

export function makeWorkspace(n: number): BlockWorkspace {
  return { capacity: n, a: new Float64Array(n * n), values: new Float64Array(n), vectors: new Float64Array(n * n) };
}

/** H = H0 + B·Z, diagonalised; returns false if the solver failed. */
export function solveBlockAt(block: LevelBlock, fieldT: number, ws: BlockWorkspace): boolean {
  const n = block.size;
  const a = ws.a;
  const h0 = block.h0;
  const z = block.zeeman;
  for (let i = 0; i < n * n; i++) a[i] = h0[i];
  for (let i = 0; i < n; i++) a[i * n + i] += fieldT * z[i];
  return symmetricEigen(a, n, ws.values, ws.vectors);
}

/** out[k] = dE_k/dB in Hz/T for the eigenvectors in `ws`. */
export function slopesOf(block: LevelBlock, ws: BlockWorkspace, out: Float64Array, offset = 0): void {
  const n = block.size;
  const v = ws.vectors;
  const z = block.zeeman;
  for (let k = 0; k < n; k++) {
    let s = 0;
    for (let i = 0; i < n; i++) {
      const c = v[i * n + k];
      s += c * c * z[i];
    }
    out[offset + k] = s;
  }
}

/**
 * out[k] = d²E_k/dB² in Hz/T². Pairs closer than 1e-12 of the block's energy
 * scale are left out (an exact degeneracy inside a block only happens for
 * non-generic constants); the number left out is returned.
 */
export function curvaturesOf(block: LevelBlock, ws: BlockWorkspace, out: Float64Array, offset = 0): number {
  const n = block.size;
  const v = ws.vectors;
  const z = block.zeeman;
  const e = ws.values;
  let scale = 0;
  for (let k = 0; k < n; k++) scale = Math.max(scale, Math.abs(e[k]));
  const gapFloor = 1e-12 * scale + 1e-300;
  let skipped = 0;
  for (let k = 0; k < n; k++) out[offset + k] = 0;
  for (let k = 0; k < n; k++) {
    for (let l = k + 1; l < n; l++) {
      let zkl = 0;
      for (let i = 0; i < n; i++) zkl += v[i * n + k] * v[i * n + l] * z[i];
      if (zkl === 0) continue;
      const gap = e[k] - e[l];
      if (Math.abs(gap) <= gapFloor) {
        skipped++;
        continue;
      }
      const t = (2 * zkl * zkl) / gap;
      out[offset + k] += t;
      out[offset + l] -= t;
    }
  }
  return skipped;
}

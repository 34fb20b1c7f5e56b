/**
 * Diagonalise one block at one field into reusable buffers, and derive the
 * field derivatives from the eigenvectors:
 *   dE_k/dB   = <k|Z|k>                                 (Hellmann–Feynman)
 *   d²E_k/dB² = 2 Σ_{l≠k} <k|Z|l>² / (E_k − E_l)         (second-order perturbation)
 * where Z = ∂H/∂B is diagonal in the uncoupled basis. Other blocks do not
 * contribute because Z conserves the block's quantum numbers. With a diamagnetic
 * term H = H0 + B·Z + B²·D (D diagonal): ∂H/∂B = Z + 2B·D, and the curvature
 * gains ⟨k|∂²H/∂B²|k⟩ = 2⟨k|D|k⟩.
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
  /** Scratch for ∂H/∂B of a block with a B² term. */
  dz: Float64Array;
}

export function makeWorkspace(n: number): BlockWorkspace {
  return { capacity: n, a: new Float64Array(n * n), values: new Float64Array(n), vectors: new Float64Array(n * n), dz: new Float64Array(n) };
}

/** H = H0 + B·Z (+ B²·D), diagonalised; returns false if the solver failed. */
export function solveBlockAt(block: LevelBlock, fieldT: number, ws: BlockWorkspace): boolean {
  const n = block.size;
  const a = ws.a;
  const h0 = block.h0;
  const z = block.zeeman;
  const q = block.quadratic;
  for (let i = 0; i < n * n; i++) a[i] = h0[i];
  for (let i = 0; i < n; i++) a[i * n + i] += fieldT * z[i] + (q ? fieldT * fieldT * q[i] : 0);
  return symmetricEigen(a, n, ws.values, ws.vectors);
}

/** ∂H/∂B at `fieldT` (diagonal, Hz/T): the block's Zeeman slopes itself when it has no B² term. */
export function fieldDerivative(block: LevelBlock, fieldT: number, scratch: Float64Array): Float64Array {
  const q = block.quadratic;
  if (!q) return block.zeeman;
  for (let i = 0; i < block.size; i++) scratch[i] = block.zeeman[i] + 2 * fieldT * q[i];
  return scratch;
}

/** out[k] = dE_k/dB in Hz/T for the eigenvectors in `ws` (solved at `fieldT`). */
export function slopesOf(block: LevelBlock, ws: BlockWorkspace, out: Float64Array, offset = 0, fieldT = 0): void {
  const n = block.size;
  const v = ws.vectors;
  const z = fieldDerivative(block, fieldT, ws.dz);
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
export function curvaturesOf(block: LevelBlock, ws: BlockWorkspace, out: Float64Array, offset = 0, fieldT = 0): number {
  const n = block.size;
  const v = ws.vectors;
  const z = fieldDerivative(block, fieldT, ws.dz);
  const q = block.quadratic;
  const e = ws.values;
  let scale = 0;
  for (let k = 0; k < n; k++) scale = Math.max(scale, Math.abs(e[k]));
  const gapFloor = 1e-12 * scale + 1e-300;
  let skipped = 0;
  for (let k = 0; k < n; k++) {
    let own = 0;
    if (q) for (let i = 0; i < n; i++) own += 2 * v[i * n + k] * v[i * n + k] * q[i];
    out[offset + k] = own;
  }
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

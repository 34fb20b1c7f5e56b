/** Shared by the eigen-solver tests: a seeded generator and the quality of an eigen-decomposition. */

/** Linear congruential generator (Numerical Recipes' constants), uniform in [−0.5, 0.5). */
export function lcg(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
    return s / 4294967296 - 0.5;
  };
}

/** ‖A‖_F, the largest ‖A v_k − λ_k v_k‖ / ‖A‖_F and the largest |VᵀV − I| entry. */
export function quality(a: Float64Array, n: number, values: Float64Array, v: Float64Array): { norm: number; residual: number; orthogonality: number } {
  let norm = 0;
  for (const x of a) norm += x * x;
  norm = Math.sqrt(norm);
  let residual = 0;
  let orthogonality = 0;
  for (let k = 0; k < n; k++) {
    let r2 = 0;
    for (let i = 0; i < n; i++) {
      let s = -values[k] * v[i * n + k];
      for (let j = 0; j < n; j++) s += a[i * n + j] * v[j * n + k];
      r2 += s * s;
    }
    residual = Math.max(residual, Math.sqrt(r2) / norm);
    for (let l = k; l < n; l++) {
      let dot = k === l ? -1 : 0;
      for (let i = 0; i < n; i++) dot += v[i * n + k] * v[i * n + l];
      orthogonality = Math.max(orthogonality, Math.abs(dot));
    }
  }
  return { norm, residual, orthogonality };
}

/**
 * Cyclic Jacobi diagonalisation of a real symmetric matrix (row-major
 * Float64Array, order n; only the upper triangle is read and kept up to
 * date). Chosen for the small m blocks of this engine: it needs no
 * allocation, is accurate to a few ulps of the matrix norm, and on the block
 * orders met here beat ml-matrix's Householder + QL routine in
 * bench/eigen.bench.ts (numbers in docs/engine.md).
 *
 * Off-diagonal elements are only ever mixed with other off-diagonal elements,
 * so they fall to zero without a round-off floor; the loop stops when their
 * squared sum is below (1e-16 · ‖A‖_F)² (norms of the scaled matrix A/max|a_ij|).
 */

/** Squared sum of the strict upper triangle, after scaling by `inv` (keeps squares in range). */
function offNorm2(a: Float64Array, n: number, inv: number): number {
  let off = 0;
  for (let p = 0; p < n - 1; p++) {
    for (let q = p + 1; q < n; q++) {
      const x = a[p * n + q] * inv;
      off += x * x;
    }
  }
  return off;
}

/**
 * Diagonalise `a` in place. On return the diagonal of `a` holds the
 * eigenvalues (unsorted) and column k of `vectors` the k-th eigenvector; the
 * strict lower triangle of `a` is left stale. Returns false if the matrix
 * holds non-finite numbers or did not converge.
 */
export function jacobiInPlace(a: Float64Array, n: number, vectors: Float64Array, maxSweeps = 60): boolean {
  // Plain loops: TypedArray.fill/set carry a call overhead that matters for 2 × 2 … 4 × 4 blocks.
  for (let i = 0; i < n * n; i++) vectors[i] = 0;
  for (let i = 0; i < n; i++) vectors[i * n + i] = 1;
  if (n === 1) return Number.isFinite(a[0]);
  let big = 0;
  for (let i = 0; i < n; i++) for (let j = i; j < n; j++) big = Math.max(big, Math.abs(a[i * n + j]));
  if (!(big < Number.POSITIVE_INFINITY)) return false; // NaN or infinite entries
  if (big === 0) return true;
  // Norms are taken of A / max|a_ij| so that neither huge nor tiny entries overflow or underflow.
  const inv = 1 / big < Number.POSITIVE_INFINITY ? 1 / big : 1;
  let frob = 0;
  for (let i = 0; i < n; i++) {
    const d = a[i * n + i] * inv;
    frob += d * d;
    for (let j = i + 1; j < n; j++) {
      const x = a[i * n + j] * inv;
      frob += 2 * x * x;
    }
  }
  const tol = 1e-32 * frob;
  for (let sweep = 0; sweep < maxSweeps; sweep++) {
    if (offNorm2(a, n, inv) <= tol) return true;
    for (let p = 0; p < n - 1; p++) {
      for (let q = p + 1; q < n; q++) {
        const apq = a[p * n + q];
        if (apq === 0) continue;
        const app = a[p * n + p];
        const aqq = a[q * n + q];
        // Rotation that zeroes a_pq: t = tan φ is the smaller root of t² + 2θt − 1 = 0 with
        // θ = (a_qq − a_pp)/(2 a_pq), written as t = 2a_pq / (d + sign(d) sqrt(d² + 4a_pq²)), d = a_qq − a_pp,
        // which saves a division; overflow or underflow of d² + 4a_pq² falls back to the θ form.
        const d = aqq - app;
        const g = 2 * apq;
        const r = Math.sqrt(d * d + g * g);
        let t: number;
        if (r > 0 && r < Number.POSITIVE_INFINITY) {
          t = g / (d >= 0 ? d + r : d - r);
        } else {
          const theta = d / g;
          t = Math.abs(theta) > 1e150 ? 0.5 / theta : (theta >= 0 ? 1 : -1) / (Math.abs(theta) + Math.sqrt(theta * theta + 1));
        }
        const c = 1 / Math.sqrt(t * t + 1);
        const s = t * c;
        a[p * n + p] = app - t * apq;
        a[q * n + q] = aqq + t * apq;
        a[p * n + q] = 0;
        // Element (r, p) and (r, q) live in the upper triangle at different places for r < p, p < r < q, r > q.
        for (let r = 0; r < p; r++) {
          const arp = a[r * n + p];
          const arq = a[r * n + q];
          a[r * n + p] = c * arp - s * arq;
          a[r * n + q] = s * arp + c * arq;
        }
        for (let r = p + 1; r < q; r++) {
          const arp = a[p * n + r];
          const arq = a[r * n + q];
          a[p * n + r] = c * arp - s * arq;
          a[r * n + q] = s * arp + c * arq;
        }
        for (let r = q + 1; r < n; r++) {
          const arp = a[p * n + r];
          const arq = a[q * n + r];
          a[p * n + r] = c * arp - s * arq;
          a[q * n + r] = s * arp + c * arq;
        }
        for (let r = 0; r < n; r++) {
          const vrp = vectors[r * n + p];
          const vrq = vectors[r * n + q];
          vectors[r * n + p] = c * vrp - s * vrq;
          vectors[r * n + q] = s * vrp + c * vrq;
        }
      }
    }
  }
  return offNorm2(a, n, inv) <= tol;
}

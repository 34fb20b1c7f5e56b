/**
 * Jacobi diagonalisation of a real symmetric matrix (row-major Float64Array,
 * order n; only the upper triangle is read). Chosen for the small m blocks of
 * this engine: no allocation, accurate to a few ulps of the matrix norm, and
 * on the block orders met here faster than both the own Householder + QR route
 * and ml-matrix (bench/eigen.bench.ts, docs/engine.md).
 *
 * Pivots are visited in a round-robin ("tournament") order, each round a set
 * of disjoint planes. Small angles (most rotations after the first sweep) use
 * a short series instead of square roots. Off-diagonal elements are only ever
 * mixed with other off-diagonal elements, so they fall to zero without a
 * round-off floor; the stopping rule (see `converged`) asks each of them to be
 * negligible against the gap of its two diagonal entries, which on the
 * engine's blocks saves the third sweep a norm-only rule needs. Together these
 * took the Cs 6P3/2 sweep's eigen-work from about 7.1 to 6.0 ms.
 *
 * Layout and order, tuned later (same operations on the same numbers, so the
 * results are bit-identical; together about a fifth off the eigen-work):
 * - the upper triangle is mirrored into the lower one and both are kept up to
 *   date, so a rotation updates rows and columns p, q in one plain loop over r
 *   instead of three loops over where (r, p) and (r, q) sit in an upper-only
 *   layout — on 2 × 2 … 4 × 4 blocks the loop overhead was the cost;
 * - each rotation is applied as soon as its angle is known. An earlier version
 *   computed a whole round's angles first; a rotation in plane (p, q) never
 *   touches the three entries a disjoint plane's angle reads, so the numbers
 *   are the same, without the scratch arrays and the second pass.
 */

/** Round-robin schedules by order: pairs (p, q) with p < q, round after round, flattened; built on first use. */
const SCHEDULES: (Int32Array | undefined)[] = new Array(257);

function roundRobin(n: number): Int32Array {
  const cached = SCHEDULES[n];
  if (cached) return cached;
  const m = n % 2 === 0 ? n : n + 1; // odd orders get a dummy player that sits out
  const players = Array.from({ length: m }, (_, i) => i);
  const pairs: number[] = [];
  for (let round = 0; round < m - 1; round++) {
    for (let k = 0; k < m / 2; k++) {
      const a = players[k];
      const b = players[m - 1 - k];
      if (a < n && b < n) pairs.push(Math.min(a, b), Math.max(a, b));
    }
    players.splice(1, 0, players.pop() as number); // keep player 0, rotate the rest
  }
  const out = Int32Array.from(pairs);
  SCHEDULES[n] = out;
  return out;
}

/**
 * Converged when every off-diagonal element is below 1e-15 of the gap between
 * its two diagonal entries — first-order eigenvector error ≤ 1e-15, eigenvalue
 * error ≤ 1e-30 of the gap — or below the absolute floor (1e-17 max|a_ij|),
 * which covers (near-)degenerate pairs.
 */
function converged(a: Float64Array, n: number, floor: number): boolean {
  for (let p = 0; p < n - 1; p++) {
    const app = a[p * n + p];
    for (let q = p + 1; q < n; q++) {
      const apq = Math.abs(a[p * n + q]);
      if (apq > floor && apq > 1e-15 * Math.abs(a[q * n + q] - app)) return false;
    }
  }
  return true;
}

/** tan φ of the rotation that zeroes a_pq (the smaller root of t² + 2θt − 1 = 0, θ = (a_qq − a_pp)/2a_pq). */
function rotationTangent(app: number, aqq: number, apq: number): number {
  // Written as t = 2a_pq / (d + sign(d) sqrt(d² + 4a_pq²)), d = a_qq − a_pp, which saves a
  // division; overflow or underflow of d² + 4a_pq² falls back to the θ form.
  const d = aqq - app;
  const g = 2 * apq;
  const r = Math.sqrt(d * d + g * g);
  if (r > 0 && r < Number.POSITIVE_INFINITY) return g / (d >= 0 ? d + r : d - r);
  const theta = d / g;
  return Math.abs(theta) > 1e150 ? 0.5 / theta : (theta >= 0 ? 1 : -1) / (Math.abs(theta) + Math.sqrt(theta * theta + 1));
}

/**
 * Apply the rotation (c, s) in plane (p, q), p < q, to the full symmetric a
 * (both triangles) and to the vectors. Rows and columns r ≠ p, q mix pairwise;
 * the (p, q) plane itself gets its closed form (a_pq becomes exactly zero).
 */
function rotate(a: Float64Array, n: number, vectors: Float64Array, p: number, q: number, t: number, c: number, s: number): void {
  const pn = p * n;
  const qn = q * n;
  const apq = a[pn + q];
  a[pn + p] -= t * apq;
  a[qn + q] += t * apq;
  a[pn + q] = 0;
  a[qn + p] = 0;
  for (let r = 0, rn = 0; r < n; r++, rn += n) {
    const vrp = vectors[rn + p];
    const vrq = vectors[rn + q];
    vectors[rn + p] = c * vrp - s * vrq;
    vectors[rn + q] = s * vrp + c * vrq;
    if (r === p || r === q) continue;
    const arp = a[rn + p];
    const arq = a[rn + q];
    const np = c * arp - s * arq;
    const nq = s * arp + c * arq;
    a[rn + p] = np;
    a[rn + q] = nq;
    a[pn + r] = np;
    a[qn + r] = nq;
  }
}

/**
 * Diagonalise `a` in place (only its upper triangle is read). On return the
 * diagonal of `a` holds the eigenvalues (unsorted), the rest the small
 * remaining off-diagonal elements (both triangles), and column k of `vectors`
 * the k-th eigenvector. Returns false if the matrix holds non-finite numbers
 * or did not converge.
 */
export function jacobiInPlace(a: Float64Array, n: number, vectors: Float64Array, maxSweeps = 60): boolean {
  // Plain loops: TypedArray.fill/set carry a call overhead that matters for 2 × 2 … 4 × 4 blocks.
  for (let i = 0; i < n * n; i++) vectors[i] = 0;
  for (let i = 0; i < n; i++) vectors[i * n + i] = 1;
  if (n === 1) return Number.isFinite(a[0]);
  let big = 0;
  for (let i = 0; i < n; i++) {
    for (let j = i; j < n; j++) {
      const x = a[i * n + j];
      a[j * n + i] = x; // mirror: rotate() keeps both triangles
      big = Math.max(big, Math.abs(x));
    }
  }
  if (!(big < Number.POSITIVE_INFINITY)) return false; // NaN or infinite entries
  if (big === 0) return true;
  // Absolute floor for off-diagonal elements: 1e-17 of the largest entry (no squares, so
  // neither huge nor tiny matrices overflow or underflow).
  const floor = 1e-17 * big;
  const schedule = n < SCHEDULES.length ? roundRobin(n) : null;
  for (let sweep = 0; sweep < maxSweeps; sweep++) {
    if (converged(a, n, floor)) return true;
    if (!schedule) {
      // Very large orders (not used by the engine): row-cyclic order.
      for (let p = 0; p < n - 1; p++) {
        for (let q = p + 1; q < n; q++) {
          if (a[p * n + q] === 0) continue;
          const t = rotationTangent(a[p * n + p], a[q * n + q], a[p * n + q]);
          const c = 1 / Math.sqrt(t * t + 1);
          rotate(a, n, vectors, p, q, t, c, t * c);
        }
      }
      continue;
    }
    for (let i = 0; i < schedule.length; i += 2) {
      const p = schedule[i];
      const q = schedule[i + 1];
      const apq = a[p * n + q];
      if (apq === 0) continue;
      const app = a[p * n + p];
      const aqq = a[q * n + q];
      const d = aqq - app;
      let t: number;
      let c: number;
      if (Math.abs(apq) < 1e-3 * Math.abs(d)) {
        // Small angle (most rotations after the first sweep): with ε = a_pq/d the series
        // t = ε(1 − ε² + 2ε⁴) and cos φ = 1 − t²/2 + 3t⁴/8 leave out terms of relative size
        // 5ε⁶ and 5t⁶/16, below 1e-17 for |ε| < 1e-3: exact in double precision, no square root.
        const e = apq / d;
        const e2 = e * e;
        t = e * (1 - e2 + 2 * e2 * e2);
        const t2 = t * t;
        c = 1 - 0.5 * t2 + 0.375 * t2 * t2;
      } else {
        t = rotationTangent(app, aqq, apq);
        c = 1 / Math.sqrt(t * t + 1);
      }
      if (t !== 0) rotate(a, n, vectors, p, q, t, c, t * c);
    }
  }
  return converged(a, n, floor);
}

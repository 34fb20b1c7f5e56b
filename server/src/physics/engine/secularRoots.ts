/**
 * Roots of the secular equation of a rank-one update D + ρ z zᵀ (D = diag(d), d strictly
 * ascending, every z_j ≠ 0, ρ > 0):
 *
 *   f(λ) = 1/ρ + Σ_j z_j² / (d_j − λ) = 0,
 *
 * one root in each (d_i, d_{i+1}) and the last in (d_{k−1}, d_{k−1} + ρ‖z‖²] (Golub & Van Loan,
 * Matrix Computations, 4th ed., §8.4.3). Each root is kept as an offset τ from the nearer pole
 * d_o, so the differences d_j − λ_i = (d_j − d_o) − τ that the eigenvectors need keep their
 * relative accuracy even where λ_i lies within a few ulps of d_o (Gu & Eisenstat, SIAM J. Matrix
 * Anal. Appl. 16 (1995) 172).
 *
 * The iteration matches f at the current point by a constant plus one simple pole at each end of
 * the interval (values and slopes of the two halves of the sum, the approach of Bunch, Nielsen &
 * Sorensen, Numer. Math. 31 (1978) 31, as in Demmel, Applied Numerical Linear Algebra, §5.3.3)
 * and steps to that model's root; a bracket kept from the signs of f catches any step that leaves
 * it, which then bisects. It stops when |f| is within its own rounding error or the bracket is
 * a few ulps wide; a root that has neither after MAX_STEPS steps makes the call return false, so
 * the caller falls back to another route instead of using an unconverged root.
 *
 * The WebAssembly route runs this iteration operation for operation as one kernel call per merge
 * (secularRoots in scripts/wasm/eigenKernelsWat.mjs): a change here must be made there too.
 */

const EPS = 2.220446049250313e-16;
const MAX_STEPS = 120;

/**
 * Where the sums run (JavaScript loops or a WebAssembly kernel) and their operands: `gaps`
 * (k × k, row i for root i), `z2` (the squared weights) and `out`. `sums(row, split, k, t)` sets
 * out[0] = Σ_{j≤split} z2_j r_j, out[1] = Σ_{j≤split} z2_j r_j², out[2], out[3] the same over
 * split < j < k, with r_j = 1/(gaps[row + j] − t).
 */
export interface SecularSums {
  gaps: Float64Array;
  z2: Float64Array;
  out: Float64Array;
  sums(row: number, split: number, k: number, t: number): void;
  /** gaps[row + j] ← (d_j − pole) − t for j < k, d being the `d` of secularRoots (kept there). */
  offsets(row: number, k: number, pole: number, t: number): void;
}

/**
 * Fills origin[i], tau[i] (λ_i = d[origin[i]] + tau[i]) and row i of `space.gaps` (stride k):
 * gaps[i·k + j] = d_j − λ_i, for the k roots of the equation above. `space.z2` must hold z_j²,
 * and `d` must be the array `space.offsets` reads.
 */
export function secularRoots(d: Float64Array, k: number, rho: number, origin: Int32Array, tau: Float64Array, space: SecularSums): boolean {
  const { gaps, z2, out } = space;
  const invRho = 1 / rho;
  let zz = 0;
  for (let j = 0; j < k; j++) zz += z2[j];
  for (let i = 0; i < k; i++) {
    const row = i * k;
    // The left half of the sum runs over poles 0..i, the right half over i+1..k−1.
    let o = i;
    space.offsets(row, k, d[i], 0);
    let lo = 0;
    let hi: number;
    let t: number;
    if (i < k - 1) {
      // Halfway between the poles; the sign of f there tells which pole is nearer.
      hi = 0.5 * gaps[row + i + 1];
      t = hi;
      space.sums(row, i, k, t);
      if (invRho + out[0] + out[2] < 0) {
        // Nearer d_{i+1}: offsets from there; f and its halves at this point are the same.
        o = i + 1;
        const shift = gaps[row + i + 1];
        space.offsets(row, k, d[o], 0);
        lo = hi - shift;
        hi = 0;
        t = lo;
      }
    } else {
      hi = rho * zz;
      t = 0.5 * hi;
      space.sums(row, i, k, t);
    }
    const a = gaps[row + i];
    const b = i < k - 1 ? gaps[row + i + 1] : 0;
    let settled = false;
    for (let step = 0; step < MAX_STEPS; step++) {
      const psi = out[0];
      const dpsi = out[1];
      const phi = out[2];
      const dphi = out[3];
      const f = invRho + psi + phi;
      if (f === 0) {
        settled = true;
        break;
      }
      if (f < 0) lo = t;
      else hi = t;
      // Rounding error of f: its terms' magnitudes (ψ < 0 < φ) and the ulp of τ times the slope.
      const noise = EPS * (8 * (invRho - psi + phi) + Math.abs(t) * (dpsi + dphi));
      if (Math.abs(f) <= noise || hi - lo <= 4 * EPS * Math.max(Math.abs(lo), Math.abs(hi))) {
        settled = true;
        break;
      }
      const next = modelRoot(invRho, psi, dpsi, phi, dphi, a, b, t, i < k - 1);
      t = next > lo && next < hi ? next : 0.5 * (lo + hi);
      space.sums(row, i, k, t);
    }
    if (!settled) return false;
    origin[i] = o;
    tau[i] = t;
    space.offsets(row, k, d[o], t);
  }
  return true;
}

/** The sums in JavaScript loops, for orders up to n, with the poles d read by `offsets`. */
export function javascriptSecularSums(n: number, d: Float64Array): SecularSums {
  const gaps = new Float64Array(n * n);
  const z2 = new Float64Array(n);
  const out = new Float64Array(4);
  return {
    gaps,
    z2,
    out,
    offsets(row, k, pole, t) {
      for (let j = 0; j < k; j++) gaps[row + j] = d[j] - pole - t;
    },
    sums(row, split, k, t) {
      let psi = 0;
      let dpsi = 0;
      for (let j = 0; j <= split; j++) {
        const r = 1 / (gaps[row + j] - t);
        const w = z2[j] * r;
        psi += w;
        dpsi += w * r;
      }
      let phi = 0;
      let dphi = 0;
      for (let j = split + 1; j < k; j++) {
        const r = 1 / (gaps[row + j] - t);
        const w = z2[j] * r;
        phi += w;
        dphi += w * r;
      }
      out[0] = psi;
      out[1] = dpsi;
      out[2] = phi;
      out[3] = dphi;
    },
  };
}

/**
 * Root inside the interval of c + c1/(a − x) + c2/(b − x), the model that matches ψ and φ (and
 * their slopes) at t with one pole each at a and b; NaN if the model has none there. Without a
 * right half (the last root) only the left pole is kept.
 */
function modelRoot(invRho: number, psi: number, dpsi: number, phi: number, dphi: number, a: number, b: number, t: number, twoPoles: boolean): number {
  const c1 = dpsi * (a - t) * (a - t);
  if (!twoPoles) {
    const c = invRho + psi - dpsi * (a - t) + phi;
    return c > 0 ? a + c1 / c : Number.NaN;
  }
  const c2 = dphi * (b - t) * (b - t);
  const c = invRho + psi - dpsi * (a - t) + phi - dphi * (b - t);
  // c x² − (c(a + b) + c1 + c2) x + (c a b + c1 b + c2 a) = 0, one of a, b being zero.
  const qb = -(c * (a + b) + c1 + c2);
  const q0 = c * a * b + c1 * b + c2 * a;
  if (c === 0) return qb === 0 ? Number.NaN : -q0 / qb;
  const disc = qb * qb - 4 * c * q0;
  if (!(disc >= 0)) return Number.NaN;
  const q = -0.5 * (qb + (qb >= 0 ? 1 : -1) * Math.sqrt(disc));
  const x1 = q / c;
  const x2 = q === 0 ? Number.NaN : q0 / q;
  const low = Math.min(a, b);
  const high = Math.max(a, b);
  return x1 > low && x1 < high ? x1 : x2;
}

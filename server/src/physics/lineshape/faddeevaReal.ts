/**
 * The real part of the Faddeeva function, K(x, y) = Re w(x + iy) for y ≥ 0 (the Voigt
 * function), to about 1e-14 relative.
 *
 * Near the centre (x < 9, y ≤ 7): the exponentially convergent sums of Zaghloul & Ali,
 * "Algorithm 916: computing the Faddeyeva and Voigt functions", ACM TOMS 38 (2011) 15, with
 * their step a = 0.51832… (double precision). The sums over n are rearranged here as sums of
 * Gaussians exp(−(x ∓ a·n)²), which keeps every term in range out to x = 9 and lets one
 * exponential start a recurrence.
 * Elsewhere: the Laplace continued fraction of w (Gautschi, SIAM J. Numer. Anal. 7 (1970)
 * 187), whose length below was chosen against 50-digit mpmath values (scripts/reference/voigt.py).
 *
 * A shape ratio y is fixed for a whole spectrum, so `FaddeevaReal` precomputes what depends
 * on y alone; `faddeevaReal(x, y)` is the one-off form.
 */
import { erfcx } from './erfcx';

const A = 0.518321480430085929872;
const A2 = A * A;
const C = (2 * A) / Math.PI;
const INV_SQRT_PI = 0.5641895835477562869480794515608;
/** Terms in the Gaussian sums: a·N must pass x + 6.1 (exp(−37) ≈ 1e-16) for every x < 9. */
const N_TERMS = 32;
const STEP_RATIO = Math.exp(-2 * A2);
/** Regions: the sums below X_SUMS (and y ≤ Y_SUMS), the continued fraction elsewhere. */
const X_SUMS = 9;
const Y_SUMS = 7;

export class FaddeevaReal {
  readonly y: number;
  private readonly inv = new Float64Array(N_TERMS + 1);
  private readonly centreFactor: number;

  constructor(y: number) {
    if (!(y >= 0) || !Number.isFinite(y)) throw new RangeError(`FaddeevaReal needs a finite y ≥ 0, got ${y}`);
    this.y = y;
    let t1 = 0;
    for (let n = 1; n <= N_TERMS; n++) {
      this.inv[n] = 1 / (A2 * n * n + y * y);
      t1 += Math.exp(-A2 * n * n) * this.inv[n]!;
    }
    this.centreFactor = y <= Y_SUMS ? erfcx(y) - C * y * t1 : 0;
  }

  /** K(x, y) = Re w(x + iy); even in x. */
  at(xSigned: number): number {
    const x = Math.abs(xSigned);
    const y = this.y;
    if (y === 0) return Math.exp(-x * x);
    if (x < X_SUMS && y <= Y_SUMS) return this.sums(x);
    return continuedFraction(x, y);
  }

  private sums(x: number): number {
    const y = this.y;
    const inv = this.inv;
    const xy = x * y;
    const s = Math.sin(xy);
    const head = Math.exp(-x * x) * (this.centreFactor * Math.cos(2 * xy) + (C * s * s) / y);
    // Σ exp(−(x − a n)²)/(a²n² + y²): ratio of neighbours exp(2a(x − a n) − a²), itself shrinking by exp(−2a²).
    let g = Math.exp(-(x - A) * (x - A));
    let q = Math.exp(2 * A * (x - A) - A2);
    let sum = 0;
    for (let n = 1; n <= N_TERMS; n++) {
      const term = g * inv[n]!;
      sum += term;
      if (A * n > x && term < 1e-17 * sum) break;
      g *= q;
      q *= STEP_RATIO;
    }
    // Σ exp(−(x + a n)²)/(a²n² + y²): only matters near x = 0.
    let h = Math.exp(-(x + A) * (x + A));
    let r = Math.exp(-2 * A * (x + A) - A2);
    for (let n = 1; n <= N_TERMS && h > 1e-17 * sum; n++) {
      sum += h * inv[n]!;
      h *= r;
      r *= STEP_RATIO;
    }
    return head + 0.5 * C * y * sum;
  }
}

/**
 * w(z) = (i/√π) / (z − ½/(z − 1/(z − (3/2)/(z − …)))), evaluated from the back with a length
 * that falls with |z| (checked to 1e-15 for |z| ≥ 7). Near the real axis the fraction holds only
 * the Dawson part of w, so the exponentially small exp(y² − x²)cos 2xy is added back there.
 */
function continuedFraction(x: number, y: number): number {
  const r = Math.hypot(x, y);
  let tr = x;
  let ti = y;
  if (r < 1e7) {
    for (let k = Math.ceil(4 + 72 / r); k >= 1; k--) {
      const d = (0.5 * k) / (tr * tr + ti * ti);
      tr = x - tr * d;
      ti = y + ti * d;
    }
  }
  // Im(1/t) with t scaled first, so that |t|² cannot overflow for huge arguments.
  const m = Math.max(Math.abs(tr), ti);
  const ur = tr / m;
  const ui = ti / m;
  let v = (INV_SQRT_PI * ui) / (m * (ur * ur + ui * ui));
  if (y < 1e-6) v += Math.exp((y - x) * (y + x)) * Math.cos(2 * x * y);
  return v;
}

let last: FaddeevaReal | undefined;

/** K(x, y) for one point; repeated calls with the same y reuse the precomputed terms. */
export function faddeevaReal(x: number, y: number): number {
  if (!last || last.y !== y) last = new FaddeevaReal(y);
  return last.at(x);
}

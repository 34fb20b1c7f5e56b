/**
 * The complete elliptic integrals a circular loop needs, in forms that stay accurate where K and E
 * nearly cancel (on the axis, far away):
 *   Bq(m) = ∫ cos²θ / √(1 − m sin²θ) dθ = (E − (1 − m)K)/m,
 *   Dq(m) = ∫ sin²θ / √(1 − m sin²θ) dθ = (K − E)/m,
 *   Gq(m) = (Bq − Dq)/m,
 * over θ ∈ [0, π/2], so K = Bq + Dq and E = Bq + (1 − m)Dq (the B and D of Jahnke–Emde and of
 * Bulirsch's papers; named Bq, Dq here to keep them apart from fields). Derivatives:
 *   dBq/dm = (Bq − Gq − Dq)/(2(1 − m)),  dDq/dm = (Gq + Dq)/(2(1 − m)),
 * from dK/dm = (E − (1 − m)K)/(2m(1 − m)) and dE/dm = (E − K)/(2m) (DLMF 19.4.1).
 * Below m = 0.05 all three come from their power series (DLMF 19.5.1–19.5.2, term by term), which
 * converge as m^n; above it from one pass of Bulirsch's cel iteration for Bq = cel(kc, 1, 1, 0)
 * and Dq = cel(kc, 1, 0, 1) together (with p = 1 the two share every step but the last sums).
 */

const SERIES_BELOW = 0.05;
const SERIES_TERMS = 16;
const STEP_TOLERANCE = 1e-9;
const MAX_ITERATIONS = 40;

/** c_n² with c_n = (2n)!/(4ⁿ n!²): K = (π/2) Σ c_n² mⁿ, E = (π/2) Σ c_n² mⁿ/(1 − 2n). */
const C2: number[] = (() => {
  const out = [1];
  let c = 1;
  for (let n = 1; n <= SERIES_TERMS + 2; n++) {
    c *= (2 * n - 1) / (2 * n);
    out.push(c * c);
  }
  return out;
})();
/** Dq = (π/2) Σ_{n≥0} c_{n+1}² (2n+2)/(2n+1) mⁿ. */
const D_COEF = Array.from({ length: SERIES_TERMS }, (_, n) => (Math.PI / 2) * C2[n + 1] * ((2 * n + 2) / (2 * n + 1)));
/** Bq = K − Dq. */
const B_COEF = Array.from({ length: SERIES_TERMS }, (_, n) => (Math.PI / 2) * C2[n] - D_COEF[n]);
/** Gq = (Bq − Dq)/m: the constant term of Bq − Dq is zero. */
const G_COEF = Array.from({ length: SERIES_TERMS - 1 }, (_, n) => B_COEF[n + 1] - D_COEF[n + 1]);

function poly(coef: readonly number[], m: number): number {
  let s = 0;
  for (let i = coef.length - 1; i >= 0; i--) s = s * m + coef[i];
  return s;
}

export interface EllipticParts {
  bq: number;
  dq: number;
  gq: number;
}

/**
 * m = k² in [0, 1), kc = √(1 − m) > 0 given separately so that callers keep its full accuracy near
 * m = 1. Writes into `out` (reused by the hot loop field) and returns it.
 */
export function ellipticParts(m: number, kc: number, out: EllipticParts = { bq: 0, dq: 0, gq: 0 }): EllipticParts {
  if (m < SERIES_BELOW) {
    out.bq = poly(B_COEF, m);
    out.dq = poly(D_COEF, m);
    out.gq = poly(G_COEF, m);
    return out;
  }
  // Bulirsch's cel with p = 1 (see cel.ts), run for (a, b) = (1, 0) and (0, 1) at once.
  let k = kc;
  let pp = 1;
  let c1 = 1;
  let s1 = 0;
  let c2 = 0;
  let s2 = 1;
  let f1 = c1;
  let f2 = c2;
  c1 += s1;
  c2 += s2;
  let g = k;
  s1 = 2 * (s1 + f1 * g);
  s2 = 2 * (s2 + f2 * g);
  pp = g + pp;
  g = 1;
  let em = k + 1;
  let kk = k;
  for (let i = 0; i < MAX_ITERATIONS && Math.abs(g - k) > g * STEP_TOLERANCE; i++) {
    k = 2 * Math.sqrt(kk);
    kk = k * em;
    f1 = c1;
    f2 = c2;
    c1 += s1 / pp;
    c2 += s2 / pp;
    g = kk / pp;
    s1 = 2 * (s1 + f1 * g);
    s2 = 2 * (s2 + f2 * g);
    pp = g + pp;
    g = em;
    em = k + em;
  }
  const scale = Math.PI / 2 / (em * (em + pp));
  out.bq = (s1 + c1 * em) * scale;
  out.dq = (s2 + c2 * em) * scale;
  out.gq = (out.bq - out.dq) / m;
  return out;
}

/**
 * Bulirsch's generalised complete elliptic integral
 *   cel(kc, p, a, b) = ∫₀^{π/2} (a cos²θ + b sin²θ) / ((cos²θ + p sin²θ) √(cos²θ + kc² sin²θ)) dθ,
 * by his AGM-like iteration: R. Bulirsch, "Numerical calculation of elliptic integrals and elliptic
 * functions. III", Numer. Math. 13, 305–315 (1969), in the form printed by N. Derby and S. Olbert,
 * "Cylindrical magnets and ideal solenoids", Am. J. Phys. 78, 229–235 (2010), appendix.
 * Special cases: K(k) = cel(kc, 1, 1, 1), E(k) = cel(kc, 1, 1, kc²), with kc = √(1 − k²).
 * The iteration converges quadratically, so stopping at a relative step of 1e-9 leaves an error
 * near the rounding of doubles (checked against SciPy in tests/physics/fields.cel.test.ts).
 */

const STEP_TOLERANCE = 1e-9;
const MAX_ITERATIONS = 40;

/** kc must be non-zero (kc = 0 is the logarithmic singularity, a point on a conductor). */
export function cel(kc: number, p: number, a: number, b: number): number {
  let k = Math.abs(kc);
  let pp = p;
  let cc = a;
  let ss = b;
  let em = 1;
  if (p > 0) {
    pp = Math.sqrt(p);
    ss = b / pp;
  } else {
    let f = kc * kc;
    let q = 1 - f;
    const g = 1 - pp;
    f = f - pp;
    q = q * (ss - a * pp);
    pp = Math.sqrt(f / g);
    cc = (a - ss) / g;
    ss = -q / (g * g * pp) + cc * pp;
  }
  let f = cc;
  cc = cc + ss / pp;
  let g = k / pp;
  ss = 2 * (ss + f * g);
  pp = g + pp;
  g = em;
  em = k + em;
  let kk = k;
  for (let i = 0; i < MAX_ITERATIONS && Math.abs(g - k) > g * STEP_TOLERANCE; i++) {
    k = 2 * Math.sqrt(kk);
    kk = k * em;
    f = cc;
    cc = cc + ss / pp;
    g = kk / pp;
    ss = 2 * (ss + f * g);
    pp = g + pp;
    g = em;
    em = k + em;
  }
  return (Math.PI / 2) * (ss + cc * em) / (em * (em + pp));
}

/**
 * A root of a continuous function inside [lo, hi] where it changes sign, by bisection down to
 * neighbouring doubles. Bisection, not a faster secant-type step: it needs nothing but signs,
 * so round-off in the function near its root (where its values are noise) cannot send it out of
 * the bracket, and the answer depends only on the bracket and on where the sign flips.
 * NaN when the ends do not have opposite signs (the caller keeps its own estimate then).
 * Used by the beam's peak refinement (the zero of the profile's derivative).
 */
export function bracketedRoot(f: (x: number) => number, lo: number, hi: number): number {
  let fLo = f(lo);
  const fHi = f(hi);
  if (fLo === 0) return lo;
  if (fHi === 0) return hi;
  if (!(Math.sign(fLo) === -Math.sign(fHi))) return NaN;
  // At most about 64 + 11 halvings between two doubles of one sign (the exponent range bounds the rest).
  for (let step = 0; step < 2200; step++) {
    const mid = lo + 0.5 * (hi - lo);
    if (!(mid > lo && mid < hi)) break;
    const fMid = f(mid);
    if (fMid === 0) return mid;
    if (Math.sign(fMid) === Math.sign(fLo)) {
      lo = mid;
      fLo = fMid;
    } else hi = mid;
  }
  return lo + 0.5 * (hi - lo);
}

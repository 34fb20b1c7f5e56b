/**
 * Root of a continuous function inside a sign-changing bracket, by the
 * Illinois variant of regula falsi (superlinear on smooth functions) with a
 * bisection step whenever the secant point leaves the bracket. Stops when the
 * bracket is a few ulps wide or |f| is below `fTol`.
 */
export function bracketedRoot(f: (x: number) => number, lo: number, hi: number, flo: number, fhi: number, fTol: number): number {
  let side = 0;
  let best = Math.abs(flo) < Math.abs(fhi) ? lo : hi;
  let bestF = Math.min(Math.abs(flo), Math.abs(fhi));
  for (let it = 0; it < 200; it++) {
    if (Math.abs(hi - lo) <= 4e-16 * Math.max(Math.abs(lo), Math.abs(hi)) + 1e-300) break;
    let x = hi - (fhi * (hi - lo)) / (fhi - flo);
    const inside = lo < hi ? x > lo && x < hi : x < lo && x > hi;
    if (!inside || !Number.isFinite(x)) x = 0.5 * (lo + hi);
    const fx = f(x);
    if (!Number.isFinite(fx)) return Number.NaN;
    if (Math.abs(fx) < bestF) {
      best = x;
      bestF = Math.abs(fx);
    }
    if (fx === 0 || Math.abs(fx) <= fTol) return x;
    if (Math.sign(fx) === Math.sign(fhi)) {
      hi = x;
      fhi = fx;
      if (side === 1) flo /= 2; // Illinois: halve the stale end so it cannot stall
      side = 1;
    } else {
      lo = x;
      flo = fx;
      if (side === -1) fhi /= 2;
      side = -1;
    }
  }
  return best;
}

/** Helpers for sampled series (x ascending): extents, linear read-off and local slope. */

export function finiteExtent(values: Iterable<number>): [number, number] | undefined {
  let lo = Infinity;
  let hi = -Infinity;
  for (const v of values) {
    if (!Number.isFinite(v)) continue;
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  }
  return lo <= hi ? [lo, hi] : undefined;
}

export function* arrayValues(a: ArrayLike<number>, n = a.length): Generator<number> {
  for (let i = 0; i < Math.min(n, a.length); i++) yield a[i];
}

/** Index k with xs[k] ≤ x ≤ xs[k+1], or −1 when x lies outside the samples. */
function segmentOf(xs: ArrayLike<number>, n: number, x: number): number {
  if (!(n >= 2) || !Number.isFinite(x) || x < xs[0] || x > xs[n - 1]) return -1;
  let lo = 0;
  let hi = n - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (xs[mid] <= x) lo = mid;
    else hi = mid;
  }
  return lo;
}

/** Linear interpolation of ys at x; NaN outside the sampled range or across a gap. */
export function valueAt(xs: ArrayLike<number>, ys: ArrayLike<number>, x: number): number {
  const n = Math.min(xs.length, ys.length);
  if (n === 1 && xs[0] === x) return ys[0];
  const k = segmentOf(xs, n, x);
  if (k < 0) return NaN;
  const x0 = xs[k];
  const x1 = xs[k + 1];
  if (x1 === x0) return ys[k];
  const t = (x - x0) / (x1 - x0);
  return ys[k] + t * (ys[k + 1] - ys[k]);
}

/** Slope dy/dx of the segment holding x; NaN outside the samples. */
export function slopeAt(xs: ArrayLike<number>, ys: ArrayLike<number>, x: number): number {
  const n = Math.min(xs.length, ys.length);
  const k = segmentOf(xs, n, x);
  if (k < 0 || xs[k + 1] === xs[k]) return NaN;
  return (ys[k + 1] - ys[k]) / (xs[k + 1] - xs[k]);
}

/**
 * Samples of f on [a, b], denser where it bends: each interval of a uniform start is halved
 * while f at its midpoint lies more than `tol` off the chord (a curve drawn through the samples
 * then strays at most about `tol` from f). Used where a profile has a steep end, such as
 * √(1 − z/L0) at z → L0, which uniform samples draw with a kink.
 */
export function adaptiveSamples(f: (x: number) => number, a: number, b: number, tol: number, start = 32, maxDepth = 14): { x: number[]; y: number[] } {
  const xs: number[] = [a];
  const ys: number[] = [f(a)];
  const refine = (x0: number, y0: number, x1: number, y1: number, depth: number): void => {
    const xm = (x0 + x1) / 2;
    const ym = f(xm);
    if (depth < maxDepth && Number.isFinite(ym) && Math.abs(ym - (y0 + y1) / 2) > tol) {
      refine(x0, y0, xm, ym, depth + 1);
      refine(xm, ym, x1, y1, depth + 1);
      return;
    }
    xs.push(x1);
    ys.push(y1);
  };
  for (let i = 0; i < start; i++) {
    const x0 = a + ((b - a) * i) / start;
    const x1 = i === start - 1 ? b : a + ((b - a) * (i + 1)) / start;
    refine(x0, ys[ys.length - 1]!, x1, f(x1), 0);
  }
  return { x: xs, y: ys };
}

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

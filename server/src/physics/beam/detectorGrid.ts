/**
 * The output grid of detector positions, adapted to where atoms land. Inside the
 * sublevels' landing ranges the bin density is ∝ 1/√(x² + x₀²): an oven or jet
 * beam's peaks widen in proportion to their distance from the axis (every sublevel has
 * the same relative speed spread) while an undeflected peak is only as wide as the slit
 * image, so with x₀ = (image FWHM)/(relative deflection width) every peak gets about
 * the same number of bins. For a single speed (x₀ = ∞) the density is uniform inside
 * the landing ranges. Empty gaps between ranges share 2 % of the bins.
 */
import type { Extent } from './sublevelExtent';

export interface DetectorGrid {
  /** Bin edges, ascending, n + 1 values, m. */
  edgesM: Float64Array;
  /** Bin centres (midpoints of the edges), n values, m. */
  centresM: Float64Array;
}

const GAP_SHARE = 0.02;

interface Piece {
  a: number;
  b: number;
  covered: boolean;
  weight: number;
}

/** Union of the ranges clipped to [start, end], as covered pieces and gaps filling [start, end]. */
function pieces(ranges: readonly Extent[], start: number, end: number): Piece[] {
  const sorted = ranges
    .map((r) => ({ a: Math.max(start, r.startM), b: Math.min(end, r.endM) }))
    .filter((r) => r.b > r.a)
    .sort((p, q) => p.a - q.a);
  const merged: { a: number; b: number }[] = [];
  for (const r of sorted) {
    const last = merged[merged.length - 1];
    if (last && r.a <= last.b) last.b = Math.max(last.b, r.b);
    else merged.push({ ...r });
  }
  const out: Piece[] = [];
  let x = start;
  for (const r of merged) {
    if (r.a > x) out.push({ a: x, b: r.a, covered: false, weight: 0 });
    out.push({ a: r.a, b: r.b, covered: true, weight: 0 });
    x = r.b;
  }
  if (x < end) out.push({ a: x, b: end, covered: false, weight: 0 });
  return out;
}

export function detectorGrid(startM: number, endM: number, bins: number, ranges: readonly Extent[], scaleM: number): DetectorGrid {
  const edgesM = new Float64Array(bins + 1);
  const finite = scaleM > 0 && Number.isFinite(scaleM);
  const g = (x: number): number => (finite ? Math.asinh(x / scaleM) : x); // antiderivative of the bin density
  const gInv = (u: number): number => (finite ? scaleM * Math.sinh(u) : u);
  let parts = pieces(ranges, startM, endM);
  if (!parts.some((p) => p.covered)) parts = [{ a: startM, b: endM, covered: true, weight: 0 }];
  let coveredWeight = 0;
  let gapLength = 0;
  for (const p of parts) {
    if (p.covered) {
      p.weight = g(p.b) - g(p.a);
      coveredWeight += p.weight;
    } else gapLength += p.b - p.a;
  }
  const gapDensity = gapLength > 0 ? (GAP_SHARE * coveredWeight) / gapLength : 0;
  let total = 0;
  for (const p of parts) {
    if (!p.covered) p.weight = gapDensity * (p.b - p.a);
    total += p.weight;
  }
  let piece = 0;
  let before = 0; // weight of pieces left of `piece`
  for (let j = 0; j <= bins; j++) {
    const target = (total * j) / bins;
    while (piece < parts.length - 1 && before + parts[piece].weight < target) before += parts[piece++].weight;
    const p = parts[piece];
    const within = Math.min(p.weight, Math.max(0, target - before));
    let x: number;
    if (p.weight === 0) x = p.a;
    else if (p.covered) x = gInv(g(p.a) + within);
    else x = p.a + within / gapDensity;
    edgesM[j] = Math.min(p.b, Math.max(p.a, x));
  }
  edgesM[0] = startM;
  edgesM[bins] = endM;
  const centresM = new Float64Array(bins);
  for (let j = 0; j < bins; j++) centresM[j] = 0.5 * (edgesM[j] + edgesM[j + 1]);
  return { edgesM, centresM };
}

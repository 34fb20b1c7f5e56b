/**
 * Position, height and FWHM of the highest peak of a profile sampled at (possibly
 * unevenly spaced) bin centres. The position is the midpoint of the two crossings of
 * the level (1 − 1e-4) × maximum on either side of the highest sample: for a flat top
 * (the trapezoid image of a mono-energetic beam) that is the middle of the plateau; for
 * a rounded peak it is the vertex to ~1e-4 of the FWHM (the cubic skew term is that
 * small so close to the top). When the whole region above that level lies between
 * the neighbouring samples, a parabola through the top three samples is used instead.
 */
export interface PeakShape {
  index: number;
  positionM: number;
  height: number;
  /** null when the profile does not fall to half height inside the grid. */
  fwhmM: number | null;
}

/** Relative depth below the maximum that defines the top of a peak. */
const TOP_LEVEL = 1e-4;

/** Vertex of the parabola through three points (x ascending). */
function parabolaVertex(x0: number, y0: number, x1: number, y1: number, x2: number, y2: number): { x: number; y: number } | null {
  const d01 = (y1 - y0) / (x1 - x0);
  const d12 = (y2 - y1) / (x2 - x1);
  const a = (d12 - d01) / (x2 - x0);
  if (!(a < 0)) return null;
  const b = d01 - a * (x0 + x1);
  const xv = -b / (2 * a);
  if (xv < x0 || xv > x2) return null;
  const yv = y1 + (xv - x1) * (d01 + a * (xv - x0));
  return { x: xv, y: yv };
}

/** Walks outwards from i to the first samples below `level`; crossing positions by linear interpolation (null at the grid ends). */
function crossings(profile: Float64Array, centresM: Float64Array, i: number, level: number): { left: number; right: number; l: number; r: number } | null {
  const n = profile.length;
  let l = i;
  while (l >= 0 && profile[l] >= level) l--;
  let r = i;
  while (r < n && profile[r] >= level) r++;
  if (l < 0 || r >= n) return null;
  return {
    left: crossing(centresM[l], profile[l], centresM[l + 1], profile[l + 1], level),
    right: crossing(centresM[r - 1], profile[r - 1], centresM[r], profile[r], level),
    l,
    r,
  };
}

/** `from`, `to`: the profile is known to be zero outside [from, to) (the maximum is looked for there only). */
export function peakShape(profile: Float64Array, centresM: Float64Array, from = 0, to = profile.length): PeakShape | null {
  const n = profile.length;
  let i = Math.max(0, Math.min(from, n - 1));
  const end = Math.min(to, n);
  for (let j = i + 1; j < end; j++) if (profile[j] > profile[i]) i = j;
  const top = profile[i];
  if (!(top > 0)) return null;
  let position = centresM[i];
  let height = top;
  const near = crossings(profile, centresM, i, top * (1 - TOP_LEVEL));
  if (near && (near.l < i - 1 || near.r > i + 1)) {
    position = 0.5 * (near.left + near.right);
  } else if (i > 0 && i < n - 1) {
    const v = parabolaVertex(centresM[i - 1], profile[i - 1], centresM[i], top, centresM[i + 1], profile[i + 1]);
    if (v) {
      position = v.x;
      height = Math.max(top, v.y);
    }
  }
  const half = crossings(profile, centresM, i, 0.5 * height);
  return { index: i, positionM: position, height, fwhmM: half ? half.right - half.left : null };
}

function crossing(x0: number, y0: number, x1: number, y1: number, level: number): number {
  return x0 + ((level - y0) / (y1 - y0)) * (x1 - x0);
}

/** Index of the last centre ≤ x (−1 if none), by bisection. */
export function centreBelow(centresM: Float64Array, x: number): number {
  let lo = -1;
  let hi = centresM.length;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (centresM[mid] <= x) lo = mid;
    else hi = mid;
  }
  return lo;
}

/** Linear interpolation between bin centres; 0 outside the grid's edges. */
export function sampleAt(profile: Float64Array, centresM: Float64Array, edgesM: Float64Array, x: number): number {
  const n = profile.length;
  if (n === 0 || x < edgesM[0] || x > edgesM[n]) return 0;
  const k = centreBelow(centresM, x);
  if (k < 0) return profile[0];
  if (k >= n - 1) return profile[n - 1];
  const f = (x - centresM[k]) / (centresM[k + 1] - centresM[k]);
  return profile[k] * (1 - f) + profile[k + 1] * f;
}

export interface LocalMaximum {
  positionM: number;
  height: number;
  /** Height above the higher of the two lowest points separating it from higher ground. */
  prominence: number;
}

/** Local maxima whose prominence is at least `minRelativeProminence` of the global maximum. */
export function localMaxima(profile: Float64Array, centresM: Float64Array, minRelativeProminence: number): LocalMaximum[] {
  const n = profile.length;
  let globalMax = 0;
  for (const v of profile) globalMax = Math.max(globalMax, v);
  const out: LocalMaximum[] = [];
  if (!(globalMax > 0)) return out;
  let i = 0;
  while (i < n) {
    const y = profile[i];
    if (i > 0 && profile[i - 1] >= y) {
      i++;
      continue;
    }
    let k = i;
    while (k + 1 < n && profile[k + 1] === y) k++;
    if (k + 1 < n && profile[k + 1] > y) {
      i = k + 1;
      continue;
    }
    // i..k is higher than both neighbours.
    let leftMin = y;
    for (let j = i - 1; j >= 0 && profile[j] <= y; j--) leftMin = Math.min(leftMin, profile[j]);
    // Ties: a later sample of equal height counts as higher ground, so of several equal
    // maxima (a flat top with round-off ripples) only the last keeps its prominence.
    let rightMin = y;
    for (let j = k + 1; j < n && profile[j] < y; j++) rightMin = Math.min(rightMin, profile[j]);
    const prominence = y - Math.max(leftMin, rightMin);
    if (y > 0 && prominence >= minRelativeProminence * globalMax) {
      out.push({ positionM: 0.5 * (centresM[i] + centresM[k]), height: y, prominence });
    }
    i = k + 1;
  }
  return out;
}

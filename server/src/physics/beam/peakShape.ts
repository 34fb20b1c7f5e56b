/**
 * Position, height and FWHM of the highest peak of a sampled profile. A flat top
 * (the trapezoid image of a mono-energetic beam) is located at the middle of the
 * plateau; otherwise a parabola through the top three samples refines the maximum.
 */
export interface PeakShape {
  index: number;
  positionM: number;
  height: number;
  /** null when the profile does not fall to half height inside the grid. */
  fwhmM: number | null;
}

/** Relative tolerance for "equal" samples on a flat top. */
const PLATEAU_TOLERANCE = 1e-12;

export function peakShape(profile: Float64Array, startM: number, binM: number): PeakShape | null {
  const n = profile.length;
  let i = 0;
  for (let j = 1; j < n; j++) if (profile[j] > profile[i]) i = j;
  const top = profile[i];
  if (!(top > 0)) return null;
  let a = i;
  let b = i;
  while (a > 0 && profile[a - 1] >= top * (1 - PLATEAU_TOLERANCE)) a--;
  while (b < n - 1 && profile[b + 1] >= top * (1 - PLATEAU_TOLERANCE)) b++;
  let centre = 0.5 * (a + b);
  let height = top;
  if (a === b && i > 0 && i < n - 1) {
    const ym = profile[i - 1];
    const yp = profile[i + 1];
    const curv = ym - 2 * top + yp;
    if (curv < 0) {
      const delta = (0.5 * (ym - yp)) / curv;
      centre = i + delta;
      height = top - 0.25 * (ym - yp) * delta;
    }
  }
  const half = 0.5 * height;
  let left = a;
  while (left >= 0 && profile[left] >= half) left--;
  let right = b;
  while (right < n && profile[right] >= half) right++;
  let fwhmM: number | null = null;
  if (left >= 0 && right < n) {
    // Linear interpolation of the half-height crossings between sample centres.
    const xl = left + (half - profile[left]) / (profile[left + 1] - profile[left]);
    const xr = right - 1 + (profile[right - 1] - half) / (profile[right - 1] - profile[right]);
    fwhmM = (xr - xl) * binM;
  }
  return { index: i, positionM: startM + (centre + 0.5) * binM, height, fwhmM };
}

/** Linear interpolation of a profile sampled at bin centres. */
export function sampleAt(profile: Float64Array, startM: number, binM: number, x: number): number {
  const t = (x - startM) / binM - 0.5;
  const n = profile.length;
  if (t < -0.5 || t > n - 0.5) return 0;
  if (t <= 0) return profile[0];
  if (t >= n - 1) return profile[n - 1];
  const i = Math.floor(t);
  const f = t - i;
  return profile[i] * (1 - f) + profile[i + 1] * f;
}

export interface LocalMaximum {
  positionM: number;
  height: number;
  /** Height above the higher of the two lowest points separating it from higher ground. */
  prominence: number;
}

/** Local maxima whose prominence is at least `minRelativeProminence` of the global maximum. */
export function localMaxima(profile: Float64Array, startM: number, binM: number, minRelativeProminence: number): LocalMaximum[] {
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
    // i..k is a maximum (strictly higher than both neighbours).
    let leftMin = y;
    for (let j = i - 1; j >= 0 && profile[j] <= y; j--) leftMin = Math.min(leftMin, profile[j]);
    let rightMin = y;
    for (let j = k + 1; j < n && profile[j] <= y; j++) rightMin = Math.min(rightMin, profile[j]);
    const prominence = y - Math.max(leftMin, rightMin);
    if (y > 0 && prominence >= minRelativeProminence * globalMax) {
      out.push({ positionM: startM + (0.5 * (i + k) + 0.5) * binM, height: y, prominence });
    }
    i = k + 1;
  }
  return out;
}

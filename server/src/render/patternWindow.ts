/**
 * Which part of the detector grid a pattern figure shows, and whether its height axis must be
 * logarithmic. The computed grid runs far out into the slow-atom tail, so the figure keeps the
 * region above a floor of the tallest sample — but never at the cost of a counted peak: each
 * peak widens the window by two of its widths either side, however low and broad it is.
 */
import type { PatternPeak } from './viewData';

/** Samples below this fraction of the tallest one are tail (common practice for display). */
const TAIL_FLOOR = 0.01;
/** Each peak keeps this many of its FWHM visible on either side. */
const PEAK_MARGIN_FWHM = 2;
/** Peak heights differing by more than this factor get a log axis, so the low ones stay readable. */
export const LOG_AXIS_RATIO = 30;

export interface PatternWindow {
  x0: number;
  x1: number;
  /** Index range of samples to draw, [from, to), one sample beyond the window each side. */
  from: number;
  to: number;
}

export function patternWindow(xs: ArrayLike<number>, total: ArrayLike<number>, peaks: readonly PatternPeak[]): PatternWindow | undefined {
  const n = Math.min(xs.length, total.length);
  let max = 0;
  for (let k = 0; k < n; k++) if (Number.isFinite(total[k]) && Number.isFinite(xs[k])) max = Math.max(max, total[k]);
  let lo = Infinity;
  let hi = -Infinity;
  for (let k = 0; k < n; k++) {
    if (!Number.isFinite(xs[k]) || !(total[k] >= TAIL_FLOOR * max)) continue;
    lo = Math.min(lo, xs[k]);
    hi = Math.max(hi, xs[k]);
  }
  for (const p of peaks) {
    if (!Number.isFinite(p.positionM)) continue;
    const w = p.fwhmM && Number.isFinite(p.fwhmM) ? PEAK_MARGIN_FWHM * p.fwhmM : 0;
    lo = Math.min(lo, p.positionM - w);
    hi = Math.max(hi, p.positionM + w);
  }
  if (!(lo <= hi)) return undefined;
  const margin = 0.06 * (hi - lo);
  lo -= margin;
  hi += margin;
  // Never wider than the grid itself.
  let gridLo = Infinity;
  let gridHi = -Infinity;
  for (let k = 0; k < n; k++) {
    if (!Number.isFinite(xs[k])) continue;
    gridLo = Math.min(gridLo, xs[k]);
    gridHi = Math.max(gridHi, xs[k]);
  }
  if (gridLo <= gridHi) {
    lo = Math.max(lo, gridLo);
    hi = Math.min(hi, gridHi);
  }
  let from = 0;
  while (from < n - 1 && !(xs[from + 1] >= lo)) from++;
  let to = n;
  while (to > from + 1 && !(xs[to - 2] <= hi)) to--;
  return { x0: lo, x1: hi, from, to };
}

/** True when the counted peaks differ in height so much that a linear axis would flatten the low ones. */
export function needsLogAxis(peaks: readonly PatternPeak[]): boolean {
  const h = peaks.map((p) => p.height).filter((v) => Number.isFinite(v) && v > 0);
  if (h.length < 2) return false;
  return Math.max(...h) / Math.min(...h) > LOG_AXIS_RATIO;
}

/**
 * Undeflected image of the two-slit collimator at the detector, and the instrument
 * kernel (image ⊗ detector aperture). Straight rays through slit 1 (width w1) and
 * slit 2 (width w2, a distance d further) reach the detector, a distance
 * L = L1 + L2 beyond slit 2, at y = y2 (1 + L/d) − y1 L/d. With y1, y2 uniform the image
 * is the convolution of two boxes of widths
 *   a = w2 (1 + L/d)   and   b = w1 L/d,
 * i.e. a trapezoid with base a + b, flat top |a − b| and FWHM max(a, b).
 */
import type { BeamGeometry } from './types';

export interface SlitImage {
  /** Box width from slit 2 projected from slit 1's far edge, m. */
  boxAM: number;
  /** Box width from slit 1 projected through slit 2, m. */
  boxBM: number;
  /** Full width at the base (zero intensity) of the trapezoid, m. */
  baseWidthM: number;
  /** Width of the flat top, m. */
  topWidthM: number;
  /** FWHM of the trapezoid alone, m. */
  fwhmM: number;
  /** Detector aperture width, m. */
  detectorM: number;
  /** Half of the full support of trapezoid ⊗ aperture, m. */
  halfSupportM: number;
  /** FWHM of trapezoid ⊗ aperture (the undeflected peak a scan would show), m. */
  kernelFwhmM: number;
}

/** Unit-area trapezoid = box(a) ⊗ box(b), density at x. */
export function trapezoidDensity(x: number, a: number, b: number): number {
  const ax = Math.abs(x);
  const lo = Math.abs(a - b) / 2;
  const hi = (a + b) / 2;
  const top = 1 / Math.max(a, b);
  if (ax <= lo) return top;
  if (ax >= hi) return 0;
  return (top * (hi - ax)) / (hi - lo);
}

/** ∫_{−∞}^{x} of the unit-area trapezoid (piecewise quadratic). */
export function trapezoidCdf(x: number, a: number, b: number): number {
  const lo = Math.abs(a - b) / 2;
  const hi = (a + b) / 2;
  const top = 1 / Math.max(a, b);
  const ramp = hi - lo;
  const sideArea = 0.5 * top * ramp; // area of one ramp
  if (x <= -hi) return 0;
  if (x >= hi) return 1;
  if (x < -lo) {
    const t = x + hi;
    return (0.5 * top * t * t) / ramp;
  }
  if (x <= lo) return sideArea + top * (x + lo);
  const t = hi - x;
  return 1 - (0.5 * top * t * t) / ramp;
}

/** Instrument kernel: trapezoid averaged over a detector aperture of width w (w = 0: the trapezoid). */
export function kernelDensity(x: number, a: number, b: number, w: number): number {
  if (w <= 0) return trapezoidDensity(x, a, b);
  return (trapezoidCdf(x + w / 2, a, b) - trapezoidCdf(x - w / 2, a, b)) / w;
}

export function slitImage(geometry: BeamGeometry): SlitImage {
  const d = geometry.slitSeparationM;
  const l = geometry.magnetLengthM + geometry.driftM;
  const a = geometry.slit2M * (1 + l / d);
  const b = (geometry.slit1M * l) / d;
  const w = Math.max(0, geometry.detectorWidthM);
  const peak = kernelDensity(0, a, b, w);
  // The kernel is symmetric and falls monotonically away from 0: bisect for half maximum.
  let lo = 0;
  let hi = (a + b + w) / 2;
  for (let i = 0; i < 200 && hi - lo > 1e-15 * (a + b + w); i++) {
    const mid = 0.5 * (lo + hi);
    if (kernelDensity(mid, a, b, w) > 0.5 * peak) lo = mid;
    else hi = mid;
  }
  return {
    boxAM: a,
    boxBM: b,
    baseWidthM: a + b,
    topWidthM: Math.abs(a - b),
    fwhmM: Math.max(a, b),
    detectorM: w,
    halfSupportM: (a + b + w) / 2,
    kernelFwhmM: lo + hi,
  };
}

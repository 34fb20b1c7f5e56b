/**
 * The highest point of a synthesized spectrum, refined between grid samples, against SciPy:
 * `scripts/reference/spectrum_peak.py` (voigt_profile, minimize_scalar with xtol 1e-12; SciPy 1.17.1,
 * NumPy 2.4.6), whose printed values are pasted below.
 */
import { describe, expect, it } from 'vitest';
import { spectrumPeak } from '../../server/src/physics/lineshape/spectrumPeak';

const comps = (nu: number[], w: number[]) => nu.map((frequencyHz, k) => ({ frequencyHz, weight: w[k]! }));

describe('spectrumPeak', () => {
  it.each([
    // name, components, σ, γ, bracket, SciPy's peak (Hz) and value (per Hz)
    ['merged', comps([-120e6, 0, 95e6], [0.5, 1, 0.3]), 80e6, 3e6, [-9e6, -7e6], -7697975.398546, 6.409904931505e-9],
    ['separate', comps([-40e6, 55e6], [0.7, 1]), 2e6, 1.5e6, [54e6, 56e6], 54999953.920045, 1.198124965565e-7],
    ['lorentz', comps([0, 10e6], [1, 0.6]), 0, 4e6, [-1e6, 1e6], 117702.885178, 8.622994597885e-8],
  ] as const)('%s: at the SciPy maximum to 1e-7 of the width, value to 1e-10', (_name, c, sigma, gamma, [lo, hi], peak, value) => {
    // A flat top fixes its position only to about √ε of the width (f − f_max ≈ ½ f″ δx²), in SciPy too.
    const p = spectrumPeak(c, sigma, gamma, lo, hi, (lo + hi) / 2);
    expect(Math.abs(p.offsetHz - peak)).toBeLessThan(1e-7 * (sigma + gamma));
    expect(Math.abs(p.perHz / value - 1)).toBeLessThan(1e-10);
  });

  it('a symmetric pair peaks exactly at 0, whether 0 is the highest sample or the search ends a rounding away from it (was −0.2 Hz on a 32 MHz line)', () => {
    const pair = comps([-30e6, 30e6], [1, 1]);
    expect(spectrumPeak(pair, 50e6, 2e6, -5e6, 5e6, 0).offsetHz).toBe(0);
    expect(spectrumPeak(pair, 50e6, 2e6, -5e6, 3e6, -1e6).offsetHz).toBe(0);
    // One line alone, as a ¹S0 → ¹P1 line at zero field: the same.
    expect(spectrumPeak(comps([0], [1]), 0, 16e6, -8e6, 6e6, -1e6).offsetHz).toBe(0);
  });

  it('keeps the highest sample when the search finds nothing higher than rounding, and moves off 0 for a true offset of 30 Hz', () => {
    const one = comps([30], [1]);
    const p = spectrumPeak(one, 0, 16e6, -8e6, 8e6, 0);
    expect(p.offsetHz).not.toBe(0);
    expect(Math.abs(p.offsetHz - 30)).toBeLessThan(5);
  });
});

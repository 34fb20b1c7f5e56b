/** The concise `value(unc)` notation of the one quantity formatter. */
import { describe, expect, it } from 'vitest';
import { fittedText } from '../../server/src/eval/fitText';
import { fieldText, frequencyText, lengthText, trimNumber, UNCERTAINTY_DIGITS, uncertaintyVisible, withUncertainty } from '../../server/src/eval/quantityText';

describe('withUncertainty', () => {
  it.each([
    // value, uncertainty, formatter, expected
    [2563008979.3064566, 14075.2, (v: number) => frequencyText(v, 10), '2.563009(14) GHz'],
    [6834682610.9, 0.24, (v: number) => frequencyText(v, 12), '6.83468261090(24) GHz'],
    [0.000323, 2e-6, (v: number) => fieldText(v), '3.230(20) G'],
    [0.35, 0.02, (v: number) => fieldText(v), '0.350(20) T'],
    [0.35, 0.05, (v: number) => fieldText(v), '0.350(50) T'],
    [-0.50182670925, 0.0004, (v: number) => trimNumber(v, 8), '-0.50183(40)'],
    [1.234e-3, 5.6e-5, (v: number) => lengthText(v), '1.234(56) mm'],
    [1234, 250, (v: number) => trimNumber(v), '1234(250)'],
    [4.98e-11, 1.2e-12, (v: number) => trimNumber(v), '4.98(12)e-11'],
    // The printed value is rounded (3.228917 G): the digits under the uncertainty come from the value itself.
    [0.00032289169633728125, 1.1e-15, (v: number) => fieldText(v, 7), '3.228916963373(11) G'],
    // An uncertainty larger than the value sets the unit.
    [0.0934, 1.7254e-3 * 1e4, (v: number) => frequencyText(v), '0(17) Hz'],
    [0.00032, 1e-6, (v: number) => fieldText(v, 1), '3.200(10) G'],
  ])('%s ± %s → %s', (v, u, f, want) => {
    expect(withUncertainty(v, u, f)).toBe(want);
  });
  it('no uncertainty, or 0, prints the value as today (no "(0)")', () => {
    expect(withUncertainty(0.35, undefined, (v) => fieldText(v))).toBe('0.35 T');
    expect(withUncertainty(0.35, 0, (v) => fieldText(v))).toBe('0.35 T');
  });
  it('never prints NaN or Infinity', () => {
    expect(withUncertainty(Number.NaN, 1, (v) => fieldText(v))).toBe('—');
    expect(withUncertainty(1, Number.POSITIVE_INFINITY, (v) => fieldText(v))).toBe('1 T');
  });
});

describe('one rule for the digits of an uncertainty (GUM JCGM 100:2008 §7.2.6: at most two)', () => {
  it('keeps two digits whatever the leading digit (the CODATA style)', () => {
    expect(UNCERTAINTY_DIGITS).toBe(2);
    expect(withUncertainty(1.2345, 0.0056, (v) => trimNumber(v))).toBe('1.2345(56)');
    expect(withUncertainty(1.2345, 0.0012, (v) => trimNumber(v))).toBe('1.2345(12)');
  });
  it('rounding that would make a third digit keeps two: 0.00996 → (10) at the coarser place', () => {
    expect(withUncertainty(1.2346, 0.00996, (v) => trimNumber(v))).toBe('1.235(10)');
  });
  it('past 15 significant digits (double precision) gives up an uncertainty digit, not print noise', () => {
    // 2 × 3.417 341 305 452 145 GHz: the 16th digit of the double is not the published 0.
    expect(withUncertainty(6834682610.90429, 0.00009, (v) => frequencyText(v, 15))).toBe('6.83468261090429(9) GHz');
  });
  it('an uncertainty below the double\'s resolution prints the value at 15 digits and no (0)', () => {
    // Cs ground F=3, m_F=0 at 1 nT: its uncertainty (from g_J alone, quadratic in B) is ~1e-11 Hz.
    // Before: -5.17085537062499955852(0) GHz — five digits past what a double holds.
    expect(withUncertainty(-5170855370.625, 1e-11, (v) => frequencyText(v, 15))).toBe('-5.17085537062500 GHz');
    expect(withUncertainty(4021776399.375, 3e-12, (v) => frequencyText(v, 15))).toBe('4.02177639937500 GHz');
  });
  it('fit reports and hovers print the same value the same way (fittedText goes through withUncertainty)', () => {
    // Before: the fit formatter always kept two digits and the hover one digit for 5–9.
    expect(fittedText(0.00032289, 5.4e-7, 'T', 'G')).toBe(withUncertainty(0.00032289, 5.4e-7, (v) => fieldText(v)));
    expect(fittedText(0.00032289, 5.4e-7, 'T', 'G')).toBe('3.2289(54) G');
    expect(fittedText(0.35, 0.05, 'T')).toBe(withUncertainty(0.35, 0.05, (v) => fieldText(v)));
    expect(fittedText(3417341382, 68, 'Hz', 'MHz')).toBe('3417.341382(68) MHz');
    expect(fittedText(3417341382, 68, 'Hz')).toBe('3.417341382(68) GHz');
  });
});

describe('uncertaintyVisible (short labels)', () => {
  it('is true once the uncertainty reaches half the last digit printed', () => {
    // 384.2305 THz at 7 digits: last digit 100 MHz, half of it 50 MHz.
    expect(uncertaintyVisible(384230484468500, 6.2e3, 7)).toBe(false);
    expect(uncertaintyVisible(384230484468500, 4.9e7, 7)).toBe(false);
    expect(uncertaintyVisible(384230484468500, 5e7, 7)).toBe(true);
    // The sign does not matter (a line written upper level first has a negative centre).
    expect(uncertaintyVisible(-384230484468500, 5e7, 7)).toBe(true);
    // 500 nm at 7 digits: last digit 1e-4 nm. 5e-7 nm hidden, 5e-4 nm shown.
    expect(uncertaintyVisible(500, 5e-7, 7)).toBe(false);
    expect(uncertaintyVisible(500, 5e-4, 7)).toBe(true);
  });
  it('is false without an uncertainty, or for a value that is missing or zero', () => {
    expect(uncertaintyVisible(5e14, undefined, 7)).toBe(false);
    expect(uncertaintyVisible(5e14, 0, 7)).toBe(false);
    expect(uncertaintyVisible(NaN, 1, 7)).toBe(false);
    expect(uncertaintyVisible(0, 1e3, 7)).toBe(false);
  });
});

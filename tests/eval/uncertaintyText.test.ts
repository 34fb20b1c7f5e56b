/** The concise `value(unc)` notation of the one quantity formatter. */
import { describe, expect, it } from 'vitest';
import { fieldText, frequencyText, lengthText, trimNumber, withUncertainty } from '../../server/src/eval/quantityText';

describe('withUncertainty', () => {
  it.each([
    // value, uncertainty, formatter, expected
    [2563008979.3064566, 14075.2, (v: number) => frequencyText(v, 10), '2.563009(14) GHz'],
    [6834682610.9, 0.24, (v: number) => frequencyText(v, 12), '6.83468261090(24) GHz'],
    [0.000323, 2e-6, (v: number) => fieldText(v), '3.230(20) G'],
    [0.35, 0.02, (v: number) => fieldText(v), '0.350(20) T'],
    [0.35, 0.05, (v: number) => fieldText(v), '0.35(5) T'],
    [-0.50182670925, 0.0004, (v: number) => trimNumber(v, 8), '-0.5018(4)'],
    [1.234e-3, 5.6e-5, (v: number) => lengthText(v), '1.23(6) mm'],
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

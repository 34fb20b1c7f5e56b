import { describe, expect, it } from 'vitest';
import {
  curvatureText,
  fieldText,
  frequencyText,
  gradientText,
  lengthText,
  MISSING,
  percentText,
  prefixedText,
  sensitivityText,
  trimNumber,
} from '../../server/src/eval/quantityText';
import { fieldInUnit, inWrittenUnit } from '../../server/src/eval/writtenUnit';
import { csvNumber, finiteJsonText } from '../../server/src/eval/machineText';

// Expected texts are worked out by hand from the SI prefix definitions (SI Brochure, 9th ed.).
describe('trimNumber', () => {
  it.each([
    [1.5, 6, '1.5'],
    [2.5e-6, 3, '2.5e-6'],
    [1234567, 4, '1235000'],
    [6.8346826109e9, 11, '6.8346826109e9'],
    [-0, 6, '0'],
    [0, 6, '0'],
    [999.99996, 6, '1000'],
    [NaN, 6, MISSING],
    [Infinity, 6, MISSING],
    [-Infinity, 6, MISSING],
    [undefined, 6, MISSING],
    [null, 6, MISSING],
  ])('%s with %s digits → %s', (x, digits, text) => {
    expect(trimNumber(x as number, digits)).toBe(text);
  });

  it('prints a value below the noise floor as 0, and one above it as itself', () => {
    expect(trimNumber(7.837e-19, 6, { scale: 8.768e-4 })).toBe('0');
    expect(trimNumber(-7.837e-19, 6, { scale: 8.768e-4 })).toBe('0');
    expect(trimNumber(2e-12, 6, { scale: 1e-3 })).toBe('2e-12');
    expect(trimNumber(2e-10, 6, { scale: 1e-3, relative: 1e-6 })).toBe('0');
  });
});

describe('prefixedText and the derived units', () => {
  it.each([
    [2133537, 'Hz/G', 5, '2.1335 MHz/G'],
    [-335470.4, 'Hz/G', 7, '-335.4704 kHz/G'],
    [0.9343569, 'Hz/G', 7, '934.3569 mHz/G'],
    [862.7195, 'Hz/G²', 7, '862.7195 Hz/G²'],
    [5013.386, 'Hz/G²', 7, '5.013386 kHz/G²'],
    [180, 'T/m', 5, '180 T/m'],
    [0.5, 'T/m', 5, '500 mT/m'],
    [1737, 'm/s', 4, '1.737 km/s'],
    [1.669e-21, 'N', 4, '1.669e-21 N'],
    [999999.96, 'Hz', 7, '1 MHz'],
    [NaN, 'Hz/G', 7, MISSING],
    [-0, 'Hz', 7, '0 Hz'],
  ])('%s %s (%s digits) → %s', (v, unit, digits, text) => {
    expect(prefixedText(v, unit, { digits })).toBe(text);
  });

  it('sensitivities and curvatures given per tesla are shown per gauss', () => {
    // 1 G = 1e-4 T (SI Brochure, non-SI units): 2.1335 MHz/G = 2.1335e10 Hz/T.
    expect(sensitivityText(2.133537e10, 5)).toBe('2.1335 MHz/G');
    expect(curvatureText(8.627195e10, 7)).toBe('862.7195 Hz/G²');
    expect(sensitivityText(Infinity)).toBe(MISSING);
  });
});

describe('frequencies, fields, lengths', () => {
  it.each([
    [frequencyText(6.8346826109e9, 11), '6.8346826109 GHz'],
    [frequencyText(-221e3), '-221 kHz'],
    [frequencyText(NaN), MISSING],
    [frequencyText(1e-3 * 1e-9, 7, { scale: 1e9 }), '0 GHz'],
    [fieldText(0.45), '0.45 T'],
    [fieldText(3.23e-4), '3.23 G'],
    [fieldText(-0), '0 T'],
    [fieldText(Infinity), MISSING],
    [lengthText(8.768e-4), '876.8 µm'],
    [lengthText(7.837e-19, 4, { scale: 8.768e-4 }), '0 µm'],
    [lengthText(NaN), MISSING],
    [lengthText(0.08), '8 cm'],
    [gradientText(180), '180 T/m'],
    // A forced family (a trap's lines): tesla takes a prefix, never exponent form; gauss stays G, gradients G/cm (1 G/cm = 0.01 T/m).
    [fieldText(1.2345e-6, 5, undefined, 'T'), '1.2345 µT'],
    [fieldText(0.0044676, 5, undefined, 'T'), '4.4676 mT'],
    [fieldText(0.12209, 5, undefined, 'G'), '1220.9 G'],
    [fieldText(0, 5, undefined, 'G'), '0 G'],
    [gradientText(0.9597, 4, undefined, 'G'), '95.97 G/cm'],
    [gradientText(0.1527, 4, undefined, 'T'), '152.7 mT/m'],
    [gradientText(NaN, 4, undefined, 'G'), MISSING],
    [percentText(1.89e-10, 3, { scale: 1, relative: 1e-6 }), '0 %'],
    [percentText(0.8), '80 %'],
  ])('%s', (got, want) => {
    expect(got).toBe(want);
  });
});

describe('one length-unit rule (eval/lengthUnit.ts)', () => {
  it('takes the unit written, else the largest of m, cm, mm, µm, nm that keeps the largest magnitude ≥ 1', async () => {
    const { lengthUnitFor } = await import('../../server/src/eval/lengthUnit');
    const { pointText } = await import('../../server/src/eval/fieldSourceText');
    expect(lengthUnitFor(0.05)).toEqual({ symbol: 'cm', metres: 1e-2 });
    expect(lengthUnitFor(-2.5)).toEqual({ symbol: 'm', metres: 1 });
    expect(lengthUnitFor(0.001)).toEqual({ symbol: 'mm', metres: 1e-3 });
    expect(lengthUnitFor(3e-7)).toEqual({ symbol: 'nm', metres: 1e-9 });
    expect(lengthUnitFor(0)).toEqual({ symbol: 'm', metres: 1 });
    expect(lengthUnitFor(0.05, 'mm')).toEqual({ symbol: 'mm', metres: 1e-3 });
    expect(lengthUnitFor(0.05, 'um')).toEqual({ symbol: 'µm', metres: 1e-6 });
    expect(lengthUnitFor(0.05, 'G')).toEqual({ symbol: 'cm', metres: 1e-2 });
    // The same rule for one length and for a point: the largest coordinate picks the unit.
    expect(lengthText(0.09)).toBe('9 cm');
    expect(pointText([0.005, 0, 0.09])).toBe('(0.5, 0, 9) cm');
    expect(pointText([0, 0, 0])).toBe('(0, 0, 0) m');
  });
});

describe('unit echo', () => {
  it('shows a value in the unit the file wrote', () => {
    expect(fieldInUnit(0.025, { unit: 'mT' })).toBe('25 mT');
    expect(fieldInUnit(0.2, { unit: 'kG' })).toBe('2 kG');
    expect(fieldInUnit(0.025)).toBe('250 G');
    expect(inWrittenUnit(0.5, 'gradient', 'G/cm')).toBe('50 G/cm');
    expect(inWrittenUnit(80e-6, 'length', 'um')).toBe('80 µm');
    expect(inWrittenUnit(NaN, 'length', 'um')).toBeUndefined();
  });

  it('a derived field stays in the family of the unit written beside it', () => {
    expect(fieldInUnit(1.5102489e-5, { family: 'G' })).toBe('151.025 mG');
    expect(fieldInUnit(1.5102489e-5, { family: 'mT' })).toBe('15.1025 µT');
  });
});

describe('machine-readable numbers', () => {
  it('JSON leaves non-finite numbers out of objects and writes null in arrays', () => {
    expect(finiteJsonText({ a: 1, b: NaN, c: Infinity, d: [1, -Infinity] })).toBe('{"a":1,"d":[1,null]}');
  });
  it('CSV cells for missing numbers are empty', () => {
    expect([csvNumber(NaN), csvNumber(Infinity), csvNumber(undefined), csvNumber(-0), csvNumber(1.25)]).toEqual(['', '', '', '0', '1.25']);
  });
});

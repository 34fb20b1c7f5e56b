/** Figure numbers come from the one quantity formatter (eval/quantityText), set with the true minus sign. */
import { describe, expect, it } from 'vitest';
import { formatIn, formatSI, fieldDisplayUnit, fieldOnAxisText } from '../../server/src/render/units';
import { fieldMarksIn } from '../../server/src/render/fieldMarks';
import { prefixedText, trimNumber } from '../../server/src/eval/quantityText';

describe('figure number formatting', () => {
  it.each([
    [6.834682610904e9, 'Hz', '6.835 GHz'],
    [-2.1335e6, 'Hz/T', '−2.134 MHz/T'],
    [3.23e-4, 'T', '323 µT'],
    [0, 'Hz', '0 Hz'],
    [Number.NaN, 'Hz', '— Hz'],
  ])('formatSI(%d, %s) = %s', (v, unit, text) => {
    expect(formatSI(v, unit)).toBe(text);
    // The same digits as the text reports, apart from the minus sign.
    if (Number.isFinite(v)) expect(formatSI(v, unit).replace('−', '-')).toBe(prefixedText(v, unit, { digits: 4 }));
  });

  it.each([
    [4.5e-2, 'G', '450 G'],
    [-1.2346e-3, 'mT', '−1.235 mT'],
    [0.45, 'T', '0.45 T'],
  ] as const)('formatIn(%d, %s) = %s', (v, unit, text) => {
    expect(formatIn(v, fieldDisplayUnit(unit))).toBe(text);
    expect(formatIn(v, fieldDisplayUnit(unit)).replace('−', '-')).toBe(`${trimNumber(v / fieldDisplayUnit(unit).factor, 4)} ${unit}`);
  });

  it.each([
    // A gauss axis keeps the gauss family below 0.1 G: mG, as the reports write it (1 G = 1e-4 T, SI definition of the gauss).
    [5e-6, 'G', '50 mG'],
    [-1.234e-7, 'G', '−1.234 mG'],
    [3e-5, 'G', '0.3 G'],
    [2.5e-2, 'G', '250 G'],
    // A tesla axis keeps the tesla family: a prefix that suits the field.
    [5e-6, 'mT', '5 µT'],
    [6.091, 'G', '6.091 T'],
  ] as const)('fieldOnAxisText(%d T) on a %s axis = %s', (tesla, unit, text) => {
    expect(fieldOnAxisText(tesla, fieldDisplayUnit(unit))).toBe(text);
  });

  it('a crossing found at 0.05 G on a gauss axis is marked in mG, not µT', () => {
    const marks = fieldMarksIn('G', (b): b is number => b !== undefined && b >= 0 && b <= 1e-3, undefined, undefined, [{ fieldT: 5e-6, label: 'crossing' }]);
    expect(marks.map((m) => m.text)).toEqual(['crossing · 50 mG']);
  });
});

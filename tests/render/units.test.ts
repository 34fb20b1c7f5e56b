/** Figure numbers come from the one quantity formatter (eval/quantityText), set with the true minus sign. */
import { describe, expect, it } from 'vitest';
import { formatIn, formatSI, fieldDisplayUnit } from '../../server/src/render/units';
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
});

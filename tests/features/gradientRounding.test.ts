/** The advised-gradient quick fix rounds up to 3 significant digits, and leaves 3-digit values as they are. */
import { describe, expect, it } from 'vitest';
import { roundedUp } from '../../server/src/features/codeActions/resolvingGradientFix';

describe('roundedUp', () => {
  it('keeps every 3-digit value from 1e-3 to 1e2 as written, also after a unit conversion (× 100, ÷ 100)', () => {
    const wrong: string[] = [];
    for (let e = -3; e < 2; e++) {
      for (let k = 100; k < 1000; k++) {
        const text = String(Number((k * 10 ** (e - 2)).toPrecision(3)));
        const v = Number(text);
        for (const x of [v, (v * 100) / 100, (v / 100) * 100]) if (roundedUp(x) !== text) wrong.push(`${x} → ${roundedUp(x)}`);
      }
    }
    // Before: 1.11 → 1.12, 2.49 → 2.5, 4.19 → 4.2 (Math.ceil of a quotient a little over a whole number).
    expect(wrong).toEqual([]);
  });
  it('rounds a value between 3-digit steps up, never down', () => {
    expect(roundedUp(1.1101)).toBe('1.12');
    expect(roundedUp(62.51)).toBe('62.6');
    expect(roundedUp(0.0009991)).toBe('0.001');
  });
});

/**
 * Digits a difference holds: ulp(x) = 2^(floor(log2|x|) − 52) for IEEE 754 binary64, so
 * ulp(1) = 2^-52 and ulp(6.8e9) = 2^(32 − 52) = 2^-20; the digits kept reach the quantum's decade.
 */
import { describe, expect, it } from 'vitest';
import { heldDigits, ulpOf } from '../../server/src/eval/csvDigits/heldDigits';

describe('ulpOf', () => {
  it('is 2^-52 at 1, 2^-20 at 6.8e9, 0 at 0', () => {
    expect(ulpOf(1)).toBe(2 ** -52);
    expect(ulpOf(-1.5)).toBe(2 ** -52);
    expect(ulpOf(6.8e9)).toBe(2 ** -20);
    expect(ulpOf(0)).toBe(0);
  });
});

describe('heldDigits', () => {
  it('keeps the digits down to the decade of the quantum', () => {
    expect(heldDigits(-0.165640265464783, 9.5e-10)).toBe(-0.1656402655);
    expect(heldDigits(123.456789, 0.01)).toBe(123.46);
  });
  it('keeps one digit when the quantum is larger than the value, and all when it is tiny', () => {
    expect(heldDigits(0.004, 0.5)).toBe(0.004);
    expect(heldDigits(1 / 3, 1e-20)).toBe(1 / 3);
  });
  it('leaves 0 and a zero quantum alone', () => {
    expect(heldDigits(0, 1)).toBe(0);
    expect(heldDigits(0.123456789, 0)).toBe(0.123456789);
  });
});

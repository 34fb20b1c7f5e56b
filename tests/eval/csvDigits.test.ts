/**
 * The CSV number form: 15 significant digits as Number.prototype.toPrecision(15) rounds them
 * (ECMA-262 §21.1.3.5: the nearer decimal, the larger on a tie), trailing zeros dropped, laid out
 * as ECMA-262 Number::toString lays out digits (plain from 1e-6 up to below 1e21). For doubles
 * in the normal range the oracle is String(Number(x.toPrecision(15))): a decimal of at most 15
 * digits is the shortest that reads back as the double nearest to it (doubles are at most 2^-52
 * apart relatively, 15-digit decimals at least 10^-15), so Number::toString writes exactly those
 * digits. Subnormals and the top of the range, where that oracle fails, have written expectations.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { fifteenDigitsText } from '../../server/src/eval/csvDigits/fifteenDigitsText';
import { csvNumber } from '../../server/src/eval/machineText';

const RUNS = Number(process.env['FUZZ_RUNS'] ?? 2000);
const MIN_NORMAL = 2.2250738585072014e-308;
/** The oracle for |x| from the smallest normal double up to where the 15-digit rounding overflows. */
const oracle = (x: number): string => String(Number(x.toPrecision(15)));

const bitsView = new DataView(new ArrayBuffer(8));
const fromBits = (hi: number, lo: number): number => {
  bitsView.setUint32(0, hi);
  bitsView.setUint32(4, lo);
  return bitsView.getFloat64(0);
};
const nextUp = (x: number): number => {
  bitsView.setFloat64(0, x);
  bitsView.setBigUint64(0, bitsView.getBigUint64(0) + 1n);
  return bitsView.getFloat64(0);
};
const nextDown = (x: number): number => {
  bitsView.setFloat64(0, x);
  bitsView.setBigUint64(0, bitsView.getBigUint64(0) - 1n);
  return bitsView.getFloat64(0);
};

describe('CSV numbers: 15 significant digits', () => {
  it('writes worked values as toPrecision(15) rounds them, in String(x) layout (hand-checked)', () => {
    const cases: [number, string][] = [
      [0.1 + 0.2, '0.3'], // binary noise of the sum is gone
      [-0.05893148244853466, '-0.0589314824485347'],
      [446799677123456.7, '446799677123457'], // an absolute frequency in Hz, to the hertz
      [123456789012345680000, '123456789012346000000'],
      [2 ** 53, '9007199254740990'],
      [1e21, '1e+21'],
      [9.999999999999995e20, '999999999999999000000'],
      [1e-7, '1e-7'],
      [1.5e-7, '1.5e-7'],
      [0.000001, '0.000001'],
      [9.2740100657e-24, '9.2740100657e-24'],
      [123456789012345.5, '123456789012346'], // an exact tie rounds up, as toPrecision does
      [-123456789012345.5, '-123456789012346'],
      [0.1234567890123455, '0.123456789012345'], // its double lies below the written tie
      [9.999999999999999, '10'],
      [-0, '0'],
      [Number.MAX_VALUE, '1.79769313486232e+308'],
      [-Number.MAX_VALUE, '-1.79769313486232e+308'],
      [Number.MIN_VALUE, '4.94065645841247e-324'],
      [MIN_NORMAL, '2.2250738585072e-308'],
      [2.225073858507201e-308, '2.2250738585072e-308'], // the largest subnormal
    ];
    for (const [x, text] of cases) {
      expect(csvNumber(x), String(x)).toBe(text);
      expect(fifteenDigitsText(x), String(x)).toBe(text);
    }
  });

  it('is not String(Number(x.toPrecision(15))) everywhere: that one-liner loses subnormal digits and overflows at the top', () => {
    // A subnormal has fewer than 15 significant bits' worth of digits, so the 15-digit decimal reads
    // back as a double whose shortest form is shorter; near MAX_VALUE the rounded decimal reads back as Infinity.
    const cases: [number, string, string][] = [
      [Number.MIN_VALUE, '5e-324', '4.94065645841247e-324'],
      [1e-310, '1e-310', '9.99999999999997e-311'],
      [Number.MAX_VALUE, 'Infinity', '1.79769313486232e+308'],
    ];
    for (const [x, oneLiner, written] of cases) {
      expect(oracle(x)).toBe(oneLiner);
      expect(fifteenDigitsText(x)).toBe(written);
      expect(csvNumber(x)).toBe(written);
    }
  });

  it('matches toPrecision(15) on random doubles over the whole exponent range', () => {
    fc.assert(
      fc.property(fc.double({ noNaN: true, noDefaultInfinity: true }), (x) => {
        const a = Math.abs(x);
        const expected = a >= MIN_NORMAL && a <= 1.797693134862315e308 ? oracle(x) : fifteenDigitsText(x);
        expect(csvNumber(x)).toBe(expected);
      }),
      { numRuns: RUNS },
    );
    fc.assert(
      fc.property(fc.integer({ min: 0x00100000, max: 0x7fefffff }), fc.integer({ min: 0, max: 0xffffffff }), fc.boolean(), (hi, lo, negative) => {
        const x = fromBits(hi, lo) * (negative ? -1 : 1);
        if (Math.abs(x) <= 1.797693134862315e308) expect(csvNumber(x)).toBe(oracle(x));
      }),
      { numRuns: RUNS },
    );
  });

  it('matches toPrecision(15) on subnormals (own derivation from its digits)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 0x000fffff }), fc.integer({ min: 1, max: 0xffffffff }), (hi, lo) => {
        const x = fromBits(hi, lo);
        const [mantissa, exponent] = x.toPrecision(15).split('e') as [string, string];
        const digits = mantissa.replace('.', '').replace(/0+$/, '');
        expect(csvNumber(x)).toBe(`${digits[0]}${digits.length > 1 ? '.' + digits.slice(1) : ''}e${exponent}`);
      }),
      { numRuns: RUNS },
    );
  });

  it('rounds near a half exactly: 16th digit 5, and a few doubles either side', () => {
    fc.assert(
      fc.property(fc.bigInt({ min: 10n ** 14n, max: 10n ** 15n - 1n }), fc.integer({ min: -315, max: 290 }), fc.integer({ min: -3, max: 3 }), (digits, exponent, step) => {
        let x = Number(`${digits}5e${exponent}`);
        for (let s = 0; s < Math.abs(step); s++) x = step > 0 ? nextUp(x) : nextDown(x);
        expect(csvNumber(x)).toBe(oracle(x));
        expect(csvNumber(-x)).toBe(oracle(-x));
      }),
      { numRuns: RUNS },
    );
  });

  it('writes every power of ten, its neighbours and 9.99999999999999…5 × 10^k as toPrecision(15) does', () => {
    for (let k = -307; k <= 307; k++) {
      for (const x of [Number(`1e${k}`), Number(`9.99999999999999e${k}`), Number(`9.999999999999995e${k}`), Number(`9.9999999999999949e${k}`)]) {
        for (const y of [nextDown(x), x, nextUp(x)]) expect(csvNumber(y), String(y)).toBe(oracle(y));
      }
    }
  });

  it('writes numbers with few digits without trailing zeros or binary noise', () => {
    fc.assert(
      fc.property(fc.integer({ min: -999999, max: 999999 }), fc.integer({ min: -30, max: 30 }), (m, k) => {
        const x = Number(`${m}e${k}`);
        expect(csvNumber(x)).toBe(String(x)); // ≤ 6 digits: the shortest form is the 15-digit one
      }),
      { numRuns: RUNS },
    );
    expect([0.1, 0.2, 0.3, 0.7].map((step) => csvNumber(step * 3))).toEqual(['0.3', '0.6', '0.9', '2.1']);
  });
});

/**
 * Unit conversion without binary noise: a written number and a unit's exact SI factor (a short
 * decimal such as 1e-4 for G or 6.62607015e-34 for h) are multiplied as decimals, and the result
 * becomes a double once, the nearest one. `3 G` is then 3e-4 T, not 3.0000000000000003e-4, and
 * `3e-30 J` read as an energy stays 3e-30, not 3.0000000000000003e-30. Values that are not exact decimals (a
 * division by h) are carried to 30 digits before the one rounding, past what a double holds.
 */

/** m × 10^e, exactly. */
export interface Decimal {
  readonly m: bigint;
  readonly e: number;
}

/** A conversion factor num / den, each an exact decimal, with the nearest double for the quick path. */
export interface ExactFactor {
  readonly num: Decimal;
  readonly den: Decimal;
  readonly approx: number;
  /** Significant digits of num, for the quick path of convertExactly. */
  readonly numDigits: number;
}

export const ONE: Decimal = { m: 1n, e: 0 };

export function exactFactor(num: Decimal, den: Decimal = ONE): ExactFactor {
  return { num, den, approx: toNumber(num, den), numDigits: digitCount(num.m) };
}

export const UNIT_FACTOR: ExactFactor = exactFactor(ONE);

const SHORTEST = /^(-?)(\d+)(?:\.(\d+))?(?:e([+-]?\d+))?$/;

/**
 * The decimal a double stands for: its shortest round-trip text (ECMAScript Number::toString), so
 * 0.1 is one tenth and 6.62607015e-34 is h as the SI defines it.
 */
export function decimalOf(x: number): Decimal {
  const m = SHORTEST.exec(String(x));
  if (!m) throw new Error(`internal error: ${x} is not a finite number`);
  const [, sign = '', whole = '', fraction = '', exp = '0'] = m;
  const digits = BigInt(`${sign}${whole}${fraction}`);
  return { m: digits, e: Number(exp) - fraction.length };
}

export function times(a: Decimal, b: Decimal): Decimal {
  return { m: a.m * b.m, e: a.e + b.e };
}

export function power(a: Decimal, p: number): Decimal {
  let out = ONE;
  for (let i = 0; i < p; i++) out = times(out, a);
  return out;
}

/** a + b, exactly (the offset of a temperature scale). */
export function plus(a: Decimal, b: Decimal): Decimal {
  const e = Math.min(a.e, b.e);
  return { m: a.m * 10n ** BigInt(a.e - e) + b.m * 10n ** BigInt(b.e - e), e };
}

export function factorTimes(f: ExactFactor, num: Decimal, den: Decimal = ONE): ExactFactor {
  return exactFactor(times(f.num, num), times(f.den, den));
}

export function inverse(f: ExactFactor): ExactFactor {
  return exactFactor(f.den, f.num);
}

/** Digits carried past a double's 17 before an inexact quotient is rounded once. */
const QUOTIENT_DIGITS = 30;

function digitCount(m: bigint): number {
  return (m < 0n ? -m : m).toString().length;
}

/** num / den as the nearest double (exact decimals are rounded once, by the number reader). */
export function toNumber(num: Decimal, den: Decimal = ONE): number {
  if (den.m === 1n) return Number(`${num.m}e${num.e - den.e}`);
  const shift = Math.max(0, QUOTIENT_DIGITS - digitCount(num.m) + digitCount(den.m));
  const q = (num.m * 10n ** BigInt(shift)) / den.m;
  return Number(`${q}e${num.e - den.e - shift}`);
}

/**
 * Significant digits of a double's shortest text (from the first to the last non-zero digit,
 * before any exponent). Counted by hand: regular expressions here cost more than a whole reading.
 */
function significantDigits(x: number): number {
  const text = String(x);
  let first = -1;
  let last = -1;
  let dot = -1;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c === 101 /* e */) break;
    if (c === 46 /* . */) dot = i;
    else if (c > 48 && c <= 57) {
      if (first < 0) first = i;
      last = i;
    }
  }
  if (first < 0) return 0;
  return last - first + 1 - (dot > first && dot < last ? 1 : 0);
}

/** Digits every double keeps: any decimal of 15 significant digits survives a round trip (IEEE 754 binary64). */
const DOUBLE_DIGITS = 15;

/** value × factor, converted as decimals and rounded once. */
export function convertExactly(value: number, f: ExactFactor): number {
  if (f.approx === 1 && f.num.m === f.den.m && f.num.e === f.den.e) return value;
  const quick = value * f.approx;
  if (value === 0 || !Number.isFinite(quick)) return quick + 0;
  // The quick path: with a power of ten below, the exact product has at most the digits of the
  // value and of the factor; when those are 15 or fewer and the double product (within an ulp or
  // two of it) prints with 15 or fewer, it is that exact product, as no other decimal that short
  // lies within a few ulps.
  if (f.den.m === 1n && f.numDigits + significantDigits(value) <= DOUBLE_DIGITS && significantDigits(quick) <= DOUBLE_DIGITS) return quick;
  return toNumber(times(decimalOf(value), f.num), f.den) + 0;
}

/**
 * Numbers as the format writes them: `401.75`, `-3.06`, `1.2e-3`, `+2`, exact fractions `3/2`,
 * and the uncertainty notation `0.35(2)` (digits in parentheses apply to the last digits shown,
 * so 0.35(2) = 0.35 ± 0.02 and 1.2345(67)e-3 = (1.2345 ± 0.0067)·10⁻³). `12.3(1.2)` (uncertainty
 * written with its own decimal point) means 12.3 ± 1.2.
 */
import type { ParsedNumber } from './ast';

/**
 * sign, mantissa, optional (uncertainty), optional exponent — anchored at the start only. The
 * minus sign U+2212 (what papers and typesetting print, so what a pasted value holds) is a minus.
 */
const DECIMAL_PREFIX = /^([+\-\u2212]?)(\d+(?:\.\d*)?|\.\d+)(?:\((\d+(?:\.\d+)?)\))?(?:[eE]([+\-\u2212]?\d+))?/;
const FRACTION = /^([+\-\u2212]?)(\d+)\/(\d+)$/;

/** `-` for either minus sign, so that Number() reads it. */
function asciiMinus(text: string): string {
  return text.replace('\u2212', '-');
}

export type NumberReading =
  | { ok: true; number: ParsedNumber }
  /** Shaped like a number but unusable (division by zero, out of range). */
  | { ok: false; reason: string };

function gcd(a: number, b: number): number {
  while (b) [a, b] = [b, a % b];
  return a;
}

function decimalsOf(mantissa: string): number {
  const dot = mantissa.indexOf('.');
  return dot < 0 ? 0 : mantissa.length - dot - 1;
}

/** The smallest number held with all its digits (IEEE 754 double); below it digits are lost, and near 1e-324 the number becomes 0. */
const SMALLEST_FULL = 2.2250738585072014e-308;
export const TOO_SMALL = 'is too small to represent (numbers below 2.2e-308 lose their digits or become 0): write 0 or check the exponent';

/** A value that is not zero as written but below the smallest full number (`1e-320`, `1e-400`). */
export function isTooSmall(value: number, writtenNonZero: boolean): boolean {
  return writtenNonZero && Math.abs(value) < SMALLEST_FULL;
}

function fromDecimalMatch(m: RegExpExecArray): NumberReading {
  const [, rawSign = '', mantissa = '', unc, rawExp] = m;
  const sign = asciiMinus(rawSign);
  const exp = rawExp === undefined ? undefined : asciiMinus(rawExp);
  const value = Number(`${sign}${mantissa}${exp !== undefined ? `e${exp}` : ''}`) + 0; // +0 turns -0 into 0
  if (!Number.isFinite(value)) return { ok: false, reason: 'is too large to represent (numbers end near 1.8e308): check the exponent' };
  if (isTooSmall(value, /[1-9]/.test(mantissa))) return { ok: false, reason: TOO_SMALL };
  const number: ParsedNumber = { value };
  if (unc !== undefined) {
    const power = exp !== undefined ? Number(exp) : 0;
    const uncertainty = unc.includes('.')
      ? Number(`${unc}e${power}`)
      : Number(`${unc}e${power - decimalsOf(mantissa)}`);
    if (!Number.isFinite(uncertainty)) return { ok: false, reason: 'has an uncertainty too large to represent' };
    number.uncertainty = uncertainty;
  } else if (exp === undefined && !mantissa.includes('.') && Number.isSafeInteger(value)) {
    number.fraction = { num: value, den: 1 };
  }
  return { ok: true, number };
}

/**
 * Reads a whole string as a number. Returns undefined when the text is not shaped like a
 * number at all (then it is a word, or a number glued to a unit).
 */
export function readNumber(text: string): NumberReading | undefined {
  const f = FRACTION.exec(text);
  if (f) {
    const [, sign = '', numText = '', denText = ''] = f;
    const num = Number(numText);
    const den = Number(denText);
    if (den === 0) return { ok: false, reason: 'divides by zero' };
    if (!Number.isSafeInteger(num) || !Number.isSafeInteger(den)) return { ok: false, reason: 'is too large to be exact' };
    const g = gcd(num, den) || 1;
    const n = (sign === '' || sign === '+' ? num : -num) / g + 0;
    const d = den / g;
    return { ok: true, number: { value: n / d, fraction: { num: n, den: d } } };
  }
  const m = DECIMAL_PREFIX.exec(text);
  if (!m || m[0].length !== text.length) return undefined;
  return fromDecimalMatch(m);
}

/**
 * The longest number at the start of `text` (no fractions), e.g. `720` in `720K`.
 * `length` is how many characters it took.
 */
export function readNumberPrefix(text: string): { reading: NumberReading; length: number } | undefined {
  const m = DECIMAL_PREFIX.exec(text);
  if (!m) return undefined;
  return { reading: fromDecimalMatch(m), length: m[0].length };
}

/** True when the text starts like a number (optional sign, then a digit or `.digit`). */
export function startsLikeNumber(text: string): boolean {
  return /^[+\-\u2212]?(\d|\.\d)/.test(text);
}

/**
 * A finite number written as ASCII bytes, exactly as fifteenDigitsText writes it, without making
 * a string: the CSV writer puts a whole table through here (docs/speed.md, "CSV writing").
 *
 * |x| · 10^(14−e), for x in [10^e, 10^(e+1)), is formed as a double m plus its exact rest
 * (Dekker's product with a two-double power of ten), so the 15-digit integer it rounds to is
 * known for certain unless the value lies within 1e-9 of a half; there, and outside
 * 1e-280 ≤ |x| ≤ 1e280, the digits come from toPrecision itself (fifteenDigitsText).
 */
import { fifteenDigitsText } from './fifteenDigitsText';
import { makePower, POWER_OFFSET, powerHi, powerHiHigh, powerHiLow, powerLo, SPLITTER } from './tenPowers';

/** The most bytes one number takes: "-1.23456789012345e-300". */
export const MAX_NUMBER_BYTES = 22;

const float = new Float64Array(1);
const words = new Uint32Array(float.buffer);
/** Index of the word holding sign and exponent: 1 on little-endian machines. */
const HIGH_WORD = new Uint8Array(new Uint16Array([1]).buffer)[0] === 1 ? 1 : 0;
const LOG10_2 = 0.3010299956639812;
/** How close to a half the scaled value may come before the fast path gives way. */
const TIE_MARGIN = 1e-9;

/** "00" … "99" as byte pairs. */
const PAIRS = new Uint8Array(200);
for (let i = 0; i < 100; i++) {
  PAIRS[2 * i] = 48 + Math.floor(i / 10);
  PAIRS[2 * i + 1] = 48 + (i % 10);
}
/** The 15 digits of the number being written. */
const DIGITS = new Uint8Array(16);

/** Writes x (finite) at out[p…], returns the position after it. out must have MAX_NUMBER_BYTES free. */
export function writeFifteenDigits(out: Uint8Array, p: number, x: number): number {
  if (x === 0) {
    out[p] = 48;
    return p + 1;
  }
  const a = x < 0 ? -x : x;
  if (!(a >= 1e-280 && a <= 1e280)) return writeText(out, p, fifteenDigitsText(x));
  float[0] = a;
  let e = Math.floor(((words[HIGH_WORD]! >>> 20) - 1023) * LOG10_2);
  const next = powerHi[e + 1 + POWER_OFFSET]!;
  if (next !== next) makePower(e + 1);
  if (a >= powerHi[e + 1 + POWER_OFFSET]!) e++;
  let r = 0;
  for (let tries = 0; ; tries++) {
    if (tries === 3) return writeText(out, p, fifteenDigitsText(x));
    const i = 14 - e + POWER_OFFSET;
    if (powerHi[i] !== powerHi[i]) makePower(14 - e);
    const m = a * powerHi[i]!;
    const c = SPLITTER * a;
    const aHigh = c - (c - a);
    const aLow = a - aHigh;
    const hiHigh = powerHiHigh[i]!;
    const hiLow = powerHiLow[i]!;
    const whole = Math.floor(m);
    // m − whole is exact; then the exact rest of a · hi, then a · lo.
    const fraction = m - whole + (aHigh * hiHigh - m + aHigh * hiLow + aLow * hiHigh + aLow * hiLow + a * powerLo[i]!);
    if (fraction > 0.5 - TIE_MARGIN && fraction < 0.5 + TIE_MARGIN) return writeText(out, p, fifteenDigitsText(x));
    r = whole + Math.floor(fraction + 0.5);
    if (r >= 1e15) e++;
    else if (r < 1e14) e--;
    else break;
  }
  if (x < 0) out[p++] = 45;
  const nd = digitsOf(r);
  const n = e + 1; // value = 0.d1…d15 × 10^n
  if (n > 0 && n <= 21) {
    if (nd <= n) {
      for (let j = 0; j < nd; j++) out[p++] = DIGITS[j]!;
      for (let j = nd; j < n; j++) out[p++] = 48;
    } else {
      for (let j = 0; j < n; j++) out[p++] = DIGITS[j]!;
      out[p++] = 46;
      for (let j = n; j < nd; j++) out[p++] = DIGITS[j]!;
    }
    return p;
  }
  if (n <= 0 && n > -6) {
    out[p++] = 48;
    out[p++] = 46;
    for (let j = n; j < 0; j++) out[p++] = 48;
    for (let j = 0; j < nd; j++) out[p++] = DIGITS[j]!;
    return p;
  }
  out[p++] = DIGITS[0]!;
  if (nd > 1) {
    out[p++] = 46;
    for (let j = 1; j < nd; j++) out[p++] = DIGITS[j]!;
  }
  out[p++] = 101;
  let exponent = e;
  if (exponent < 0) {
    out[p++] = 45;
    exponent = -exponent;
  } else out[p++] = 43;
  if (exponent >= 100) {
    const h = Math.floor(exponent / 100);
    out[p++] = 48 + h;
    exponent -= 100 * h;
    out[p++] = PAIRS[2 * exponent]!;
    out[p++] = PAIRS[2 * exponent + 1]!;
  } else if (exponent >= 10) {
    out[p++] = PAIRS[2 * exponent]!;
    out[p++] = PAIRS[2 * exponent + 1]!;
  } else out[p++] = 48 + exponent;
  return p;
}

/** The 15 digits of r (10^14 ≤ r < 10^15) into DIGITS, as two Smi halves; returns how many are left without trailing zeros. */
function digitsOf(r: number): number {
  const high = Math.floor(r / 1e8); // 7 digits; exact, r < 2^53
  const low = r - high * 1e8; // 8 digits
  const h1 = (high / 10000) | 0;
  const h0 = high - h1 * 10000;
  const top = (h1 / 100) | 0;
  DIGITS[0] = 48 + top;
  const mid = h1 - top * 100;
  DIGITS[1] = PAIRS[2 * mid]!;
  DIGITS[2] = PAIRS[2 * mid + 1]!;
  fourDigits(h0, 3);
  const l1 = (low / 10000) | 0;
  fourDigits(l1, 7);
  fourDigits(low - l1 * 10000, 11);
  let nd = 15;
  while (DIGITS[nd - 1] === 48) nd--;
  return nd;
}

function fourDigits(v: number, at: number): void {
  const h = (v / 100) | 0;
  const l = v - h * 100;
  DIGITS[at] = PAIRS[2 * h]!;
  DIGITS[at + 1] = PAIRS[2 * h + 1]!;
  DIGITS[at + 2] = PAIRS[2 * l]!;
  DIGITS[at + 3] = PAIRS[2 * l + 1]!;
}

function writeText(out: Uint8Array, p: number, s: string): number {
  for (let i = 0; i < s.length; i++) out[p++] = s.charCodeAt(i);
  return p;
}

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

/** The most bytes written for one number: "-0.00000" and all 15 digits (the text is at most 22). */
export const MAX_NUMBER_BYTES = 23;

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
    // e was one too small, or the value rounds up to 10^(e+1): again with e + 1. r = 10^14 is
    // right even from just below 10^e: only a double within an ulp of 10^e gets there.
    if (r >= 1e15) e++;
    else if (r < 1e14) e--;
    else break;
  }
  if (x < 0) out[p++] = 45;
  // Two int32 halves (exact, as r < 2^53), so all digit arithmetic below is on small integers.
  const high = Math.floor(r / 1e8) | 0; // the first 7 digits
  const low = (r - high * 1e8) | 0; // the last 8
  const nd = significantDigits(high, low);
  const n = e + 1; // value = 0.d1…d15 × 10^n
  if (n <= 0 && n > -6) {
    out[p++] = 48;
    out[p++] = 46;
    for (let j = n; j < 0; j++) out[p++] = 48;
    putDigits(out, p, high, low);
    return p + nd;
  }
  if (n > 0 && n <= 21) {
    if (nd <= n) {
      putDigits(out, p, high, low);
      p += nd;
      for (let j = nd; j < n; j++) out[p++] = 48;
      return p;
    }
    // d1…dn . dn+1…: digits one place on, the first n moved back over the gap
    putDigits(out, p + 1, high, low);
    for (let j = 0; j < n; j++) out[p + j] = out[p + j + 1]!;
    out[p + n] = 46;
    return p + nd + 1;
  }
  putDigits(out, p + 1, high, low);
  out[p] = out[p + 1]!;
  if (nd > 1) {
    out[p + 1] = 46;
    p += nd + 1;
  } else p += 1;
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

/** How many of the 15 digits are left without trailing zeros (high: 7 digits, low: 8). */
function significantDigits(high: number, low: number): number {
  let nd = 15;
  let v = low;
  if (v === 0) {
    nd = 7;
    v = high;
  }
  while (v % 10 === 0) {
    v = (v / 10) | 0;
    nd--;
  }
  return nd;
}

/** All 15 digits at out[p…p+15), two at a time. */
function putDigits(out: Uint8Array, p: number, high: number, low: number): void {
  const h1 = (high / 10000) | 0;
  const top = (h1 / 100) | 0;
  out[p] = 48 + top;
  pair(out, p + 1, h1 - top * 100);
  four(out, p + 3, high - h1 * 10000);
  const l1 = (low / 10000) | 0;
  four(out, p + 7, l1);
  four(out, p + 11, low - l1 * 10000);
}

function four(out: Uint8Array, p: number, v: number): void {
  const h = (v / 100) | 0;
  pair(out, p, h);
  pair(out, p + 2, v - h * 100);
}

function pair(out: Uint8Array, p: number, v: number): void {
  out[p] = PAIRS[2 * v]!;
  out[p + 1] = PAIRS[2 * v + 1]!;
}

function writeText(out: Uint8Array, p: number, s: string): number {
  for (let i = 0; i < s.length; i++) out[p++] = s.charCodeAt(i);
  return p;
}

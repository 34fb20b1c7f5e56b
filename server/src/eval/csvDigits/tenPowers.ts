/**
 * 10^k for −290 ≤ k ≤ 300 as an unevaluated sum hi + lo: hi the double nearest to 10^k, lo the
 * rest to double precision (so hi + lo is 10^k to about 2^-106, relative). hi is also kept in two
 * 26-bit halves (Veltkamp's split), so that x · hi can be formed exactly as a sum of two doubles
 * (Dekker's product). Entries are made exactly, with BigInt, the first time they are asked for.
 */
export const MIN_POWER = -290;
export const MAX_POWER = 300;
const OFFSET = -MIN_POWER;
const SIZE = MAX_POWER - MIN_POWER + 1;

/** Indexed by k + POWER_OFFSET; NaN in powerHi until made (makePower). */
export const POWER_OFFSET = OFFSET;
export const powerHi = new Float64Array(SIZE).fill(NaN);
export const powerLo = new Float64Array(SIZE);
export const powerHiHigh = new Float64Array(SIZE);
export const powerHiLow = new Float64Array(SIZE);

/** 2^27 + 1: Veltkamp's splitter for 53-bit doubles. */
export const SPLITTER = 134217729;

const bits = new DataView(new ArrayBuffer(8));

/** Makes the entry for 10^k (MIN_POWER ≤ k ≤ MAX_POWER); callers check powerHi for NaN first. */
export function makePower(k: number): void {
  const i = k + OFFSET;
  const hi = Number(`1e${k}`);
  let lo: number;
  if (k >= 0) {
    lo = Number(10n ** BigInt(k) - BigInt(hi));
  } else {
    // hi = M · 2^E exactly; 10^k − hi = (2^−E − M · 10^−k) / (10^−k · 2^−E).
    bits.setFloat64(0, hi);
    const word = bits.getBigUint64(0);
    const E = Number((word >> 52n) & 0x7ffn) - 1075;
    const M = (word & 0xfffffffffffffn) | 0x10000000000000n;
    const tens = 10n ** BigInt(-k);
    lo = (Number((1n << BigInt(-E)) - M * tens) / Number(tens)) * 2 ** E;
  }
  const c = SPLITTER * hi;
  const high = c - (c - hi);
  powerHi[i] = hi;
  powerLo[i] = lo;
  powerHiHigh[i] = high;
  powerHiLow[i] = hi - high;
}

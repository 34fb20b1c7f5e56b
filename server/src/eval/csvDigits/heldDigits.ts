/**
 * A difference of two nearly equal doubles holds fewer digits than a CSV cell's 15: measured − model
 * for a 6.8e9 Hz resonance is good to about one ulp of 6.8e9 Hz (2^-20 Hz ≈ 1e-6 Hz), so a residual
 * of −165.6 Hz has about 9 significant digits, and the rest is round-off (docs/csv.md).
 */

/** One unit in the last place of a double of magnitude |x| (IEEE 754 binary64: 52 fraction bits). */
export function ulpOf(x: number): number {
  const a = Math.abs(x);
  if (!(a > 0) || !Number.isFinite(a)) return 0;
  return 2 ** (Math.floor(Math.log2(a)) - 52);
}

/**
 * `x` rounded to the significant digits it holds when its absolute precision is `quantum` (same
 * unit): the digits down to the decade of the quantum, 1 at least and 15 at most; `x` itself when
 * the quantum is 0 or `x` is 0.
 */
export function heldDigits(x: number, quantum: number): number {
  if (x === 0 || !Number.isFinite(x) || !(quantum > 0) || !Number.isFinite(quantum)) return x;
  const digits = Math.floor(Math.log10(Math.abs(x))) - Math.floor(Math.log10(quantum)) + 1;
  if (digits >= 15) return x;
  return Number(x.toPrecision(Math.max(1, digits)));
}

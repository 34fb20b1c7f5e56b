/**
 * Units of round-off a computed value may carry relative to the scale of its kind: a value within
 * this many ε of that scale is zero (or equal) in theory, written with its arithmetic's noise
 * (common practice: a few dozen ε covers the sums and differences of one evaluation).
 */
export const ROUND_OFF_ULPS = 64;

/** `a` and `b` equal up to round-off relative to `scale`. */
export function equalWithinRoundOff(a: number, b: number, scale: number): boolean {
  return Math.abs(a - b) <= ROUND_OFF_ULPS * Number.EPSILON * Math.abs(scale);
}

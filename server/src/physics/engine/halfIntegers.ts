/**
 * Small helpers for quantum numbers stored as twice their value.
 */

/** j(j+1) for j = two/2. */
export function jj1(two: number): number {
  return (two * (two + 2)) / 4;
}

/**
 * Coefficient of the raising operator: <j, m+1| j_+ |j, m> = sqrt(j(j+1) − m(m+1)),
 * with j = twoJ/2, m = twoM/2.
 */
export function raiseCoef(twoJ: number, twoM: number): number {
  const v = (twoJ * (twoJ + 2) - twoM * (twoM + 2)) / 4;
  return v > 0 ? Math.sqrt(v) : 0;
}

/** Text of a value stored as twice itself: 3 -> "3/2", -2 -> "-1", 0 -> "0". */
export function halfText(two: number, signed = false): string {
  const sign = two < 0 ? '-' : signed && two > 0 ? '+' : '';
  const a = Math.abs(two);
  return sign + (a % 2 === 0 ? String(a / 2) : `${a}/2`);
}

/** All twoM from −twoJ to +twoJ in steps of 2. */
export function projections(twoJ: number): number[] {
  const out: number[] = [];
  for (let m = -twoJ; m <= twoJ; m += 2) out.push(m);
  return out;
}

/** Allowed twice-values of a coupled momentum |a − b| … a + b. */
export function couplings(twoA: number, twoB: number): number[] {
  const out: number[] = [];
  for (let t = Math.abs(twoA - twoB); t <= twoA + twoB; t += 2) out.push(t);
  return out;
}

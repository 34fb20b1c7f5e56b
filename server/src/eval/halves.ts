/** Formatting of quantum numbers stored as twice their value. */

/** 3 → "3/2", 4 → "2", -1 → "-1/2". */
export function halfText(twice: number): string {
  return twice % 2 === 0 ? String(twice / 2) : `${twice}/2`;
}

/** m written with an explicit sign, as in level labels: +3/2, 0, -1/2. */
export function signedHalfText(twice: number): string {
  if (twice === 0) return '0';
  return (twice > 0 ? '+' : '') + halfText(twice);
}

/** All 2m from -2j to 2j in steps of 2. */
export function projections(twoJ: number): number[] {
  const out: number[] = [];
  for (let m = -twoJ; m <= twoJ; m += 2) out.push(m);
  return out;
}

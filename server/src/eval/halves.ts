/** Formatting of quantum numbers stored as twice their value. */

/** 3 → "3/2", 4 → "2", -1 → "-1/2". */
export function halfText(twice: number): string {
  return twice % 2 === 0 ? String(twice / 2) : `${twice}/2`;
}

/** m written with an explicit sign, as in level labels: +3/2, 0, -1/2. */
export function signedHalfText(twice: number): string {
  const known = Number.isInteger(twice) && Math.abs(twice) <= KEPT ? signedTexts[twice + KEPT] : undefined;
  return known ?? signedText(twice);
}

function signedText(twice: number): string {
  if (twice === 0) return '0';
  return (twice > 0 ? '+' : '') + halfText(twice);
}

// A large file labels hundreds of thousands of sublevels with the same few m texts: one string
// each, made once, instead of a new string for every label (less garbage, less memory held).
const KEPT = 64;
const signedTexts = Array.from({ length: 2 * KEPT + 1 }, (_, i) => signedText(i - KEPT));

/** All 2m from -2j to 2j in steps of 2. */
export function projections(twoJ: number): number[] {
  const out: number[] = [];
  for (let m = -twoJ; m <= twoJ; m += 2) out.push(m);
  return out;
}

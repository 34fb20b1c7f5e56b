/**
 * Angular-momentum coupling coefficients: Wigner 3j and 6j symbols and Clebsch–Gordan
 * coefficients (Condon–Shortley phase convention).
 *
 * Every argument is TWICE the quantum number (twoJ = 2j, twoM = 2m), so half-integers are
 * exact integers. Arguments outside the physical domain (broken triangle, |m| > j, m-sum not
 * zero, j + m not integer) give 0, the standard convention. Non-integer or non-finite
 * arguments are a programming error and give NaN (never a throw).
 *
 * Method: the Racah single-sum formulas. A fast double-precision evaluation is used when all
 * factorial arguments are small and the alternating sum shows little cancellation; otherwise
 * the sum is done exactly with BigInt rationals and only the final square root is rounded,
 * so results are good to a few ulp for any size of j.
 */

/** (a, b, c) can couple: |a − b| ≤ c ≤ a + b and a + b + c is an integer. */
export function isTriangle(twoA: number, twoB: number, twoC: number): boolean {
  if (!allNonNegativeIntegers([twoA, twoB, twoC])) return false;
  if ((twoA + twoB + twoC) % 2 !== 0) return false;
  return twoC >= Math.abs(twoA - twoB) && twoC <= twoA + twoB;
}

/**
 * Wigner 3j symbol (j1 j2 j3; m1 m2 m3).
 */
export function wigner3j(
  twoJ1: number,
  twoJ2: number,
  twoJ3: number,
  twoM1: number,
  twoM2: number,
  twoM3: number,
): number {
  const whole = Number.isInteger(twoJ1) && Number.isInteger(twoJ2) && Number.isInteger(twoJ3);
  if (!whole || !Number.isInteger(twoM1) || !Number.isInteger(twoM2) || !Number.isInteger(twoM3)) return NaN;
  if (twoM1 + twoM2 + twoM3 !== 0) return 0;
  if (!isTriangle(twoJ1, twoJ2, twoJ3)) return 0;
  if (!isProjection(twoJ1, twoM1) || !isProjection(twoJ2, twoM2) || !isProjection(twoJ3, twoM3)) return 0;
  // Selection rule: all m = 0 and j1 + j2 + j3 odd gives exactly zero.
  if (twoM1 === 0 && twoM2 === 0 && ((twoJ1 + twoJ2 + twoJ3) / 2) % 2 === 1) return 0;

  const key = key3j(twoJ1, twoJ2, twoJ3, twoM1, twoM2);
  const cached = cache3j.get(key);
  if (cached !== undefined) return cached;

  // Integers (all exact since the checks above passed).
  const j1pj2mj3 = (twoJ1 + twoJ2 - twoJ3) / 2;
  const j1mj2pj3 = (twoJ1 - twoJ2 + twoJ3) / 2;
  const mj1pj2pj3 = (-twoJ1 + twoJ2 + twoJ3) / 2;
  const jsum1 = (twoJ1 + twoJ2 + twoJ3) / 2 + 1;
  const j1pm1 = (twoJ1 + twoM1) / 2;
  const j1mm1 = (twoJ1 - twoM1) / 2;
  const j2pm2 = (twoJ2 + twoM2) / 2;
  const j2mm2 = (twoJ2 - twoM2) / 2;
  const j3pm3 = (twoJ3 + twoM3) / 2;
  const j3mm3 = (twoJ3 - twoM3) / 2;
  // Denominator shifts in the Racah sum: k!, (j3−j2+m1+k)!, (j3−j1−m2+k)!, (j1+j2−j3−k)!, (j1−m1−k)!, (j2+m2−k)!
  const a1 = (twoJ3 - twoJ2 + twoM1) / 2;
  const a2 = (twoJ3 - twoJ1 - twoM2) / 2;
  const kMin = Math.max(0, -a1, -a2);
  const kMax = Math.min(j1pj2mj3, j1mm1, j2pm2);

  const sqrtNum = [j1pj2mj3, j1mj2pj3, mj1pj2pj3, j1pm1, j1mm1, j2pm2, j2mm2, j3pm3, j3mm3];
  const sqrtDen = [jsum1];
  const terms: RacahTerm[] = [];
  for (let k = kMin; k <= kMax; k++) {
    terms.push({ sign: k % 2 === 0 ? 1 : -1, num: [], den: [k, a1 + k, a2 + k, j1pj2mj3 - k, j1mm1 - k, j2pm2 - k] });
  }
  // Overall phase (−1)^(j1 − j2 − m3); the exponent is an integer here.
  const phaseExp = (twoJ1 - twoJ2 - twoM3) / 2;
  const phase = ((phaseExp % 2) + 2) % 2 === 0 ? 1 : -1;
  const value = noNegativeZero(phase * racahSum(sqrtNum, sqrtDen, terms));
  remember(cache3j, key, value);
  return value;
}

/**
 * Clebsch–Gordan coefficient ⟨j1 m1 j2 m2 | J M⟩ = (−1)^(j1−j2+M) √(2J+1) (j1 j2 J; m1 m2 −M).
 */
export function clebschGordan(
  twoJ1: number,
  twoM1: number,
  twoJ2: number,
  twoM2: number,
  twoJ: number,
  twoM: number,
): number {
  const w = wigner3j(twoJ1, twoJ2, twoJ, twoM1, twoM2, -twoM);
  if (w === 0 || Number.isNaN(w)) return w;
  const phaseExp = (twoJ1 - twoJ2 + twoM) / 2;
  const phase = ((phaseExp % 2) + 2) % 2 === 0 ? 1 : -1;
  return noNegativeZero(phase * Math.sqrt(twoJ + 1) * w);
}

/**
 * Wigner 6j symbol {j1 j2 j3; j4 j5 j6}.
 */
export function wigner6j(
  twoJ1: number,
  twoJ2: number,
  twoJ3: number,
  twoJ4: number,
  twoJ5: number,
  twoJ6: number,
): number {
  const args = [twoJ1, twoJ2, twoJ3, twoJ4, twoJ5, twoJ6];
  if (!args.every(Number.isInteger)) return NaN;
  const triads: [number, number, number][] = [
    [twoJ1, twoJ2, twoJ3],
    [twoJ1, twoJ5, twoJ6],
    [twoJ4, twoJ2, twoJ6],
    [twoJ4, twoJ5, twoJ3],
  ];
  if (!triads.every(([a, b, c]) => isTriangle(a, b, c))) return 0;

  const key = args.join(',');
  const cached = cache6j.get(key);
  if (cached !== undefined) return cached;

  // Triangle coefficients Δ(abc) = (a+b−c)!(a−b+c)!(−a+b+c)!/(a+b+c+1)!
  const sqrtNum: number[] = [];
  const sqrtDen: number[] = [];
  for (const [a, b, c] of triads) {
    sqrtNum.push((a + b - c) / 2, (a - b + c) / 2, (-a + b + c) / 2);
    sqrtDen.push((a + b + c) / 2 + 1);
  }
  const alpha = triads.map(([a, b, c]) => (a + b + c) / 2);
  const beta = [
    (twoJ1 + twoJ2 + twoJ4 + twoJ5) / 2,
    (twoJ2 + twoJ3 + twoJ5 + twoJ6) / 2,
    (twoJ3 + twoJ1 + twoJ6 + twoJ4) / 2,
  ];
  const tMin = Math.max(...alpha);
  const tMax = Math.min(...beta);
  const terms: RacahTerm[] = [];
  for (let t = tMin; t <= tMax; t++) {
    terms.push({
      sign: t % 2 === 0 ? 1 : -1,
      num: [t + 1],
      den: [...alpha.map((a) => t - a), ...beta.map((b) => b - t)],
    });
  }
  const value = noNegativeZero(racahSum(sqrtNum, sqrtDen, terms));
  remember(cache6j, key, value);
  return value;
}

// ---------------------------------------------------------------------------------------
// Shared evaluation of  sqrt(Π sqrtNum! / Π sqrtDen!) · Σ_k sign_k Π num_k! / Π den_k!
// ---------------------------------------------------------------------------------------

interface RacahTerm {
  sign: 1 | -1;
  num: number[];
  den: number[];
}

/** Largest factorial argument for the double path (40! ≈ 8e47; six of them still fit). */
const DOUBLE_PATH_MAX_ARG = 40;
/** Accept the double result when Σ|t|/|Σt| (the cancellation factor) is below this. */
const DOUBLE_PATH_MAX_CANCELLATION = 64;

function racahSum(sqrtNum: number[], sqrtDen: number[], terms: RacahTerm[]): number {
  if (terms.length === 0) return 0;
  const maxArg = Math.max(...sqrtNum, ...sqrtDen, ...terms.flatMap((t) => [...t.num, ...t.den]));
  if (maxArg <= DOUBLE_PATH_MAX_ARG) {
    let sum = 0;
    let absSum = 0;
    for (const t of terms) {
      const v = productOfFactorials(t.num) / productOfFactorials(t.den);
      sum += t.sign * v;
      absSum += v;
    }
    if (sum !== 0 && absSum / Math.abs(sum) <= DOUBLE_PATH_MAX_CANCELLATION) {
      return Math.sqrt(productOfFactorials(sqrtNum) / productOfFactorials(sqrtDen)) * sum;
    }
  }
  return racahSumExact(sqrtNum, sqrtDen, terms);
}

/** Exact evaluation: value² = (N/D)·(P/Q)² formed as one BigInt ratio, rounded once. */
function racahSumExact(sqrtNum: number[], sqrtDen: number[], terms: RacahTerm[]): number {
  let p = 0n;
  let q = 1n;
  for (const t of terms) {
    const tn = bigProductOfFactorials(t.num) * (t.sign === 1 ? 1n : -1n);
    const td = bigProductOfFactorials(t.den);
    // p/q + tn/td, reduced
    p = p * td + tn * q;
    q = q * td;
    const g = bigGcd(p < 0n ? -p : p, q);
    if (g > 1n) {
      p /= g;
      q /= g;
    }
  }
  if (p === 0n) return 0;
  const sign = p < 0n ? -1 : 1;
  const absP = p < 0n ? -p : p;
  const num = bigProductOfFactorials(sqrtNum) * absP * absP;
  const den = bigProductOfFactorials(sqrtDen) * q * q;
  return sign * Math.sqrt(bigRatioToNumber(num, den));
}

// ---------------------------------------------------------------------------------------
// Factorials and BigInt helpers
// ---------------------------------------------------------------------------------------

const doubleFactorials: number[] = [1];
function factorial(n: number): number {
  for (let k = doubleFactorials.length; k <= n; k++) doubleFactorials.push(doubleFactorials[k - 1] * k);
  return doubleFactorials[n];
}
function productOfFactorials(args: number[]): number {
  let p = 1;
  for (const a of args) p *= factorial(a);
  return p;
}

const bigFactorials: bigint[] = [1n];
function bigFactorial(n: number): bigint {
  for (let k = bigFactorials.length; k <= n; k++) bigFactorials.push(bigFactorials[k - 1] * BigInt(k));
  return bigFactorials[n];
}
function bigProductOfFactorials(args: number[]): bigint {
  let p = 1n;
  for (const a of args) p *= bigFactorial(a);
  return p;
}

function bigGcd(a: bigint, b: bigint): bigint {
  while (b !== 0n) {
    const r = a % b;
    a = b;
    b = r;
  }
  return a;
}

function bitLength(x: bigint): number {
  return x === 0n ? 0 : x.toString(2).length;
}

/** num/den for positive BigInts of any size, to about one ulp. */
function bigRatioToNumber(num: bigint, den: bigint): number {
  // Scale so the integer quotient carries ~80 significant bits, then undo the scale.
  const shift = bitLength(den) - bitLength(num) + 80;
  const quotient = shift >= 0 ? (num << BigInt(shift)) / den : num / (den << BigInt(-shift));
  // Apply 2^−shift in two halves so neither factor underflows or overflows on its own.
  const half = Math.trunc(shift / 2);
  return Number(quotient) * Math.pow(2, -half) * Math.pow(2, half - shift);
}

// ---------------------------------------------------------------------------------------
// Small helpers and memo caches (coefficients repeat heavily when building Hamiltonians)
// ---------------------------------------------------------------------------------------

/** Exact zeros come out as +0 so callers can compare with === 0 and print "0". */
function noNegativeZero(x: number): number {
  return x === 0 ? 0 : x;
}

function allNonNegativeIntegers(xs: number[]): boolean {
  return xs.every((x) => Number.isInteger(x) && x >= 0);
}

/** m is a valid projection of j: |m| ≤ j and j − m an integer. */
function isProjection(twoJ: number, twoM: number): boolean {
  return Math.abs(twoM) <= twoJ && (twoJ - twoM) % 2 === 0;
}

const CACHE_LIMIT = 200_000;
const cache3j = new Map<number | string, number>();
const cache6j = new Map<string, number>();

/**
 * The 3j cache key. m3 = −m1 − m2 once the checks have passed, so five arguments name the
 * symbol; when every 2j is below 128 they pack into one integer below 2^37 (exact in a
 * double), which is much cheaper than joining the arguments into a string (the line
 * components ask for the same few symbols hundreds of thousands of times in a large file).
 */
function key3j(twoJ1: number, twoJ2: number, twoJ3: number, twoM1: number, twoM2: number): number | string {
  if (twoJ1 < 128 && twoJ2 < 128 && twoJ3 < 128) return (((twoJ1 * 128 + twoJ2) * 128 + twoJ3) * 256 + twoM1 + 128) * 256 + twoM2 + 128;
  return `${twoJ1},${twoJ2},${twoJ3},${twoM1},${twoM2}`;
}

function remember<K>(cache: Map<K, number>, key: K, value: number): void {
  if (cache.size >= CACHE_LIMIT) cache.clear();
  cache.set(key, value);
}

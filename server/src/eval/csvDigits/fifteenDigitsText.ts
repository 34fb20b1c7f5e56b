/**
 * The definition of a CSV number: 15 significant digits, the most a double carries from decimal
 * and back, rounded as Number.prototype.toPrecision(15) rounds (ECMA-262: the nearer decimal, the
 * larger on a tie), trailing zeros dropped, and laid out like Number::toString lays out its digits
 * (plain from 1e-6 up to below 1e21, else d.ddde±n). Zero of either sign is "0".
 * The fast byte writer (fifteenDigitsWriter.ts) is held to this and falls back to it.
 *
 * Not String(Number(x.toPrecision(15))): that equals this for normal doubles up to
 * 1.797693134862315e308, but the writer hands it subnormals and the top of the range too, where
 * the 15-digit decimal reads back as another double (5e-324 for Number.MIN_VALUE, whose 15 digits
 * are 4.94065645841247e-324) or as Infinity (Number.MAX_VALUE). tests/eval/csvDigits.test.ts.
 */
export function fifteenDigitsText(x: number): string {
  if (x === 0) return '0';
  const { digits, pointAt } = fifteenDigits(Math.abs(x));
  return (x < 0 ? '-' : '') + layOut(digits, pointAt);
}

/** The significant digits of toPrecision(15) without trailing zeros, and n with value = 0.digits × 10^n. */
function fifteenDigits(a: number): { digits: string; pointAt: number } {
  const s = a.toPrecision(15);
  const e = s.indexOf('e');
  if (e >= 0) return { digits: trimZeros(s[0]! + s.slice(2, e)), pointAt: Number(s.slice(e + 1)) + 1 };
  const dot = s.indexOf('.');
  const whole = dot < 0 ? s : s.slice(0, dot);
  const all = dot < 0 ? s : whole + s.slice(dot + 1);
  let lead = 0;
  while (all[lead] === '0') lead++;
  return { digits: trimZeros(all.slice(lead)), pointAt: whole.length - lead };
}

function trimZeros(digits: string): string {
  let end = digits.length;
  while (end > 1 && digits[end - 1] === '0') end--;
  return digits.slice(0, end);
}

/** ECMA-262 Number::toString's layout of the digits d1…dk with value 0.d1…dk × 10^n. */
function layOut(digits: string, n: number): string {
  const k = digits.length;
  if (k <= n && n <= 21) return digits + '0'.repeat(n - k);
  if (0 < n && n <= 21) return `${digits.slice(0, n)}.${digits.slice(n)}`;
  if (-6 < n && n <= 0) return `0.${'0'.repeat(-n)}${digits}`;
  const exponent = n - 1;
  return `${digits[0]}${k > 1 ? '.' + digits.slice(1) : ''}e${exponent < 0 ? '-' : '+'}${Math.abs(exponent)}`;
}

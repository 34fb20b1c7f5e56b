/** Human-readable numbers with units, for tables, hovers and inlay hints. */

const FREQ_UNITS: [number, string][] = [
  [1e12, 'THz'],
  [1e9, 'GHz'],
  [1e6, 'MHz'],
  [1e3, 'kHz'],
  [1, 'Hz'],
];

/** A frequency with a unit chosen so the number is between 1 and 1000; `digits` significant digits. */
export function frequencyText(hz: number, digits = 7): string {
  if (!Number.isFinite(hz)) return String(hz);
  if (hz === 0) return '0 Hz';
  const a = Math.abs(hz);
  const [scale, unit] = FREQ_UNITS.find(([s]) => a >= s) ?? [1, 'Hz'];
  return `${trimNumber(hz / scale, digits)} ${unit}`;
}

/** A flux density in T, mT or µT, or G when asked. */
export function fieldText(tesla: number, digits = 6): string {
  const a = Math.abs(tesla);
  if (a === 0) return '0 T';
  if (a >= 0.1) return `${trimNumber(tesla, digits)} T`;
  if (a >= 1e-4) return `${trimNumber(tesla * 1e4, digits)} G`;
  return `${trimNumber(tesla * 1e4 * 1e3, digits)} mG`;
}

export function lengthText(m: number, digits = 4): string {
  const a = Math.abs(m);
  if (a === 0) return '0 m';
  if (a >= 1) return `${trimNumber(m, digits)} m`;
  if (a >= 1e-2) return `${trimNumber(m * 100, digits)} cm`;
  if (a >= 1e-3) return `${trimNumber(m * 1e3, digits)} mm`;
  if (a >= 1e-6) return `${trimNumber(m * 1e6, digits)} µm`;
  return `${trimNumber(m * 1e9, digits)} nm`;
}

/** `digits` significant digits without trailing zeros; exponent form for very large or small numbers. */
export function trimNumber(x: number, digits = 6): string {
  if (!Number.isFinite(x)) return String(x);
  if (x === 0) return '0';
  const a = Math.abs(x);
  if (a >= 1e9 || a < 1e-5) return x.toExponential(Math.max(0, digits - 1)).replace(/\.?0+e/, 'e');
  const s = x.toPrecision(digits);
  return s.includes('.') && !s.includes('e') ? s.replace(/\.?0+$/, '') : s;
}

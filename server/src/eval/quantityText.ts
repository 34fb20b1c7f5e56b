/**
 * The one formatter for numbers with units: text reports, hovers, inlay hints and diagrams all
 * print quantities through here, so a value reads the same everywhere. It never prints NaN or
 * Infinity (a missing value is MISSING), never "-0", and prints values below the computation's
 * own precision as 0 when the caller says what that precision is.
 */
import { lengthUnitFor } from './lengthUnit';

/** How a value that is not there (NaN, ±Infinity, undefined) is written in text. */
export const MISSING = '—';

/** What makes a value noise: below `relative` × `scale` in magnitude it prints as 0. */
export interface NoiseFloor {
  /** The size of the numbers this value sits among (a peak spacing, a slit width, a level's splitting). */
  scale: number;
  /** The computation's relative precision; default 1e-9 (double precision after a few thousand operations). */
  relative?: number;
}

export interface QuantityStyle {
  /** Significant digits. */
  digits?: number;
  noise?: NoiseFloor;
}

export const DEFAULT_RELATIVE_PRECISION = 1e-9;

/** The absolute floor below which a value is noise, or 0 when no floor applies. */
export function noiseLimit(noise: NoiseFloor | undefined): number {
  if (!noise || !Number.isFinite(noise.scale)) return 0;
  return Math.abs(noise.scale) * (noise.relative ?? DEFAULT_RELATIVE_PRECISION);
}

/** The value with noise and negative zero removed; undefined when it is not a finite number. */
export function cleanValue(x: number | null | undefined, noise?: NoiseFloor): number | undefined {
  if (x === null || x === undefined || !Number.isFinite(x)) return undefined;
  if (x === 0 || Math.abs(x) < noiseLimit(noise)) return 0;
  return x;
}

/** `digits` significant digits without trailing zeros; exponent form for very large or small numbers. */
export function trimNumber(x: number | null | undefined, digits = 6, noise?: NoiseFloor): string {
  const v = cleanValue(x, noise);
  if (v === undefined) return MISSING;
  if (v === 0) return '0';
  const a = Math.abs(v);
  if (a >= 1e9 || a < 1e-5) return v.toExponential(Math.max(0, digits - 1)).replace(/\.?0+e/, 'e').replace('e+', 'e');
  const s = v.toPrecision(digits);
  if (s.includes('e')) return String(Number(s));
  return s.includes('.') ? s.replace(/\.?0+$/, '') : s;
}

/** SI prefixes by power of ten. */
const PREFIX: Readonly<Record<number, string>> = { 12: 'T', 9: 'G', 6: 'M', 3: 'k', 0: '', [-3]: 'm', [-6]: 'µ', [-9]: 'n' };

/**
 * The prefixes each unit may take, largest first, and the unit it prefixes. A derived unit is
 * prefixed on its first factor (Hz/G → MHz/G). Units not listed are printed unprefixed.
 */
const PREFIXES_OF: Readonly<Record<string, readonly number[]>> = {
  Hz: [12, 9, 6, 3, 0, -3, -6],
  'Hz/G': [9, 6, 3, 0, -3, -6],
  'Hz/T': [12, 9, 6, 3, 0, -3],
  'Hz/G²': [6, 3, 0, -3, -6],
  'Hz/T²': [12, 9, 6, 3, 0, -3],
  m: [0, -3, -6, -9],
  'm/s': [3, 0, -3],
  'T/m': [0, -3],
  T: [0, -3, -6, -9],
  N: [],
  'J/T': [],
};

/**
 * A value in `unit` with the SI prefix that puts the number between 1 and 1000 (2133537 Hz/G →
 * "2.133537 MHz/G"). `unit` is the unit the value is given in, without prefix.
 */
export function prefixedText(value: number | null | undefined, unit: string, style: QuantityStyle = {}): string {
  const digits = style.digits ?? 6;
  const v = cleanValue(value, style.noise);
  if (v === undefined) return MISSING;
  const powers = PREFIXES_OF[unit] ?? [];
  if (powers.length === 0) return `${trimNumber(v, digits)} ${unit}`;
  const sized = v === 0 ? Math.abs(style.noise?.scale ?? 1) || 1 : Math.abs(v);
  let i = powers.findIndex((p) => sized >= 10 ** p);
  if (i < 0) i = powers.length - 1;
  // Rounding can carry to 1000 (999.99996 kHz → "1000 kHz"): then take the next prefix up.
  if (i > 0 && Math.abs(Number((v / 10 ** powers[i]!).toPrecision(digits))) >= 1000) i--;
  const p = powers[i]!;
  return `${trimNumber(v === 0 ? 0 : v / 10 ** p, digits)} ${PREFIX[p]}${unit}`;
}

/** A frequency with a unit chosen so the number is between 1 and 1000; `digits` significant digits. */
export function frequencyText(hz: number | null | undefined, digits = 7, noise?: NoiseFloor): string {
  return prefixedText(hz, 'Hz', { digits, noise });
}

/** A field sensitivity df/dB given in Hz/T, shown per gauss with a prefix (2.1335 MHz/G). */
export function sensitivityText(hzPerT: number | null | undefined, digits = 7, noise?: NoiseFloor): string {
  return prefixedText(hzPerT === null || hzPerT === undefined ? hzPerT : hzPerT * 1e-4, 'Hz/G', { digits, noise: noise && { ...noise, scale: noise.scale * 1e-4 } });
}

/** A field curvature d²f/dB² given in Hz/T², shown per gauss squared with a prefix. */
export function curvatureText(hzPerT2: number | null | undefined, digits = 7, noise?: NoiseFloor): string {
  return prefixedText(hzPerT2 === null || hzPerT2 === undefined ? hzPerT2 : hzPerT2 * 1e-8, 'Hz/G²', { digits, noise: noise && { ...noise, scale: noise.scale * 1e-8 } });
}

/**
 * The one gauss/tesla switch (the lab habit: bias fields in gauss, magnet fields in tesla): a field
 * read in the gauss family reads in tesla from here on (fields, reports, figure axes).
 */
export const GAUSS_TESLA_SWITCH_T = 0.1;

/** A field's unit family: gauss (G, with G/cm gradients) or tesla (T with a prefix, T/m). */
export type FieldFamily = 'G' | 'T';

/**
 * A flux density in T, or G / mG below GAUSS_TESLA_SWITCH_T (the lab habit for bias fields).
 * `unit` forces a family for values read beside others: 'G' in gauss (0 reads "0 G"), 'T' in
 * tesla with the prefix that suits (µT, mT, never 1.2e-6 T).
 */
export function fieldText(tesla: number | null | undefined, digits = 6, noise?: NoiseFloor, unit?: FieldFamily): string {
  const v = cleanValue(tesla, noise);
  if (v === undefined) return MISSING;
  if (unit === 'G') return `${trimNumber(v * 1e4, digits)} G`;
  if (unit === 'T') return prefixedText(v, 'T', { digits, noise });
  const a = Math.abs(v);
  if (a === 0) return '0 T';
  if (a >= GAUSS_TESLA_SWITCH_T) return `${trimNumber(v, digits)} T`;
  if (a >= 1e-4) return `${trimNumber(v * 1e4, digits)} G`;
  return `${trimNumber(v * 1e4 * 1e3, digits)} mG`;
}

/** A length in m, cm, mm, µm or nm (the one rule of lengthUnit.ts); 0 with a noise scale takes the scale's unit. */
export function lengthText(m: number | null | undefined, digits = 4, noise?: NoiseFloor): string {
  const v = cleanValue(m, noise);
  if (v === undefined) return MISSING;
  const u = lengthUnitFor(v === 0 ? Math.abs(noise?.scale ?? 0) : v);
  return `${trimNumber(v / u.metres, digits)} ${u.symbol}`;
}

/** A field gradient in T/m (or mT/m when small); `unit` 'G' gives the lab's G/cm (beside gauss fields). */
export function gradientText(tPerM: number | null | undefined, digits = 5, noise?: NoiseFloor, unit?: FieldFamily): string {
  if (unit === 'G') {
    const v = cleanValue(tPerM, noise);
    return v === undefined ? MISSING : `${trimNumber(v * 100, digits)} G/cm`;
  }
  return prefixedText(tPerM, 'T/m', { digits, noise });
}

/** A speed in m/s. */
export function speedText(mPerS: number | null | undefined, digits = 4): string {
  const v = cleanValue(mPerS);
  return v === undefined ? MISSING : `${trimNumber(v, digits)} m/s`;
}

/** A fraction as per cent. */
export function percentText(fraction: number | null | undefined, digits = 3, noise?: NoiseFloor): string {
  const v = cleanValue(fraction, noise);
  return v === undefined ? MISSING : `${trimNumber(v * 100, digits)} %`;
}

/**
 * How many significant digits an uncertainty keeps: always two. The GUM (JCGM 100:2008, §7.2.6)
 * asks for "at most two significant digits", and the CODATA adjustments always quote two, so a
 * printed constant reads like the published one. A value that would need more than 15 significant
 * digits (past double precision) keeps one uncertainty digit instead: 6.83468261090429(9) GHz.
 */
export const UNCERTAINTY_DIGITS = 2;

/** Significant digits a double carries reliably (IEEE 754 binary64: 15). */
const MAX_DOUBLE_DIGITS = 15;

/**
 * A value with its standard uncertainty in concise notation, `2.563009(14) GHz`: the value as
 * `format` prints it (same unit, same prefix, so units as the user wrote them), rounded to the
 * last of the uncertainty's UNCERTAINTY_DIGITS significant digits. This is the one formatter for
 * `value(uncertainty)` (text reports, hovers, inlay hints, fit reports). Without an uncertainty
 * (or with 0) it is `format(value)`, so results with no uncertain input read exactly as before.
 * An uncertainty too small to show within a double's 15 significant digits gives the value at
 * those 15 digits without brackets (its neighbours in a table keep their precision).
 */
export function withUncertainty(value: number | null | undefined, unc: number | null | undefined, format: (v: number) => string): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return MISSING;
  const plain = format(value);
  if (unc === null || unc === undefined || !(unc > 0) || !Number.isFinite(unc)) return plain;
  // The unit (and prefix) come from the larger of value and uncertainty: 0.9(17) Hz/G, not 934(17254) mHz/G.
  const ref = unc > Math.abs(value) ? unc : value;
  const printed = unc > Math.abs(value) ? format(unc) : plain;
  const m = /^(-?\d+(?:\.\d+)?)(?:e(-?\d+))?(.*)$/.exec(printed);
  const shown = m ? Number(m[1]) : 0;
  if (!m || shown === 0) return `${plain} ± ${format(unc)}`;
  const exponent = m[2] !== undefined ? Number(m[2]) : 0;
  const scale = unitScale(ref / (shown * 10 ** exponent), m[1]!.replace(/^-?0*\.?0*/, '').replace('.', '').length);
  const uShown = unc / Math.abs(scale) / 10 ** exponent;
  let decimals = Math.min(20, Math.max(0, UNCERTAINTY_DIGITS - 1 - Math.floor(Math.log10(uShown))));
  // Rounding can add a digit (9.96 → "100" at one decimal): then keep one decimal fewer.
  if (decimals > 0 && Math.round(uShown * 10 ** decimals) >= 10 ** UNCERTAINTY_DIGITS) decimals--;
  // A double holds 15 significant digits: a value needing more gives up an uncertainty digit rather than print noise.
  const number = value / scale / 10 ** exponent;
  const whole = Math.max(1, Math.floor(Math.log10(Math.abs(number))) + 1);
  while (decimals > 0 && whole + decimals > MAX_DOUBLE_DIGITS && Math.round(uShown * 10 ** (decimals - 1)) >= 1) decimals--;
  // An uncertainty below what the double resolves (an m_F = 0 level's 1e-20 GHz at 1 nT): the value
  // at the double's 15 digits and no "(0)" — the digits past them would be noise, not a result.
  if (whole + decimals > MAX_DOUBLE_DIGITS) decimals = Math.max(0, MAX_DOUBLE_DIGITS - whole);
  const uDigits = Math.round(uShown * 10 ** decimals);
  const v = number.toFixed(decimals).replace(/^-(0\.?0*)$/, '$1');
  const tail = `${m[2] !== undefined ? `e${m[2]}` : ''}${m[3]}`;
  return uDigits === 0 ? `${v}${tail}` : `${v}(${uDigits})${tail}`;
}

/**
 * For short labels (inlay hints): whether `unc` reaches half the last of `digits` significant
 * digits of `value`, i.e. would change a printed digit. A line's hint asks it of its frequency and
 * of its wavelength and shows the uncertainty on both when either needs it, so the two agree.
 */
export function uncertaintyVisible(value: number, unc: number | undefined, digits: number): boolean {
  if (!Number.isFinite(value) || value === 0 || unc === undefined || !(unc > 0)) return false;
  return unc >= 0.5 * 10 ** (Math.floor(Math.log10(Math.abs(value))) + 1 - digits);
}

/**
 * The factor between a value and the number printed for it: a power of ten (an SI prefix, G for
 * T) unless the unit is not decimal (inch); `ratio` carries the printed number's rounding.
 */
function unitScale(ratio: number, printedDigits: number): number {
  const pow = 10 ** Math.round(Math.log10(Math.abs(ratio)));
  if (Math.abs(ratio / pow - 1) <= 10 ** (1 - Math.max(1, printedDigits))) return pow;
  return Number(ratio.toPrecision(Math.max(3, printedDigits - 2)));
}

/**
 * An axis whose numbers sit far from zero compared with their spread (a whole term at 446.8 THz
 * drawn over 10 GHz) would need 6–7 digit tick labels, which run into the axis title. Such an
 * axis shows the offset from a round value instead, and says so in its title:
 * "E/h − 446.8 THz (GHz)", with ticks 0 … 10.
 */
import { prefixedText } from '../eval/quantityText';
import { engineeringUnit, figureMinus, type DisplayUnit } from './units';

/** Tick labels longer than this many significant digits are hard to read and to fit: offset instead. */
export const MAX_TICK_DIGITS = 4;

export interface AxisOffset {
  /** Subtracted from every value before its tick is labelled (0: no offset). */
  offset: number;
  unit: DisplayUnit;
  /** The quantity's name with the offset written out, e.g. "E/h − 446.8 THz". */
  name: string;
}

/**
 * The display of values in [lo, hi] (SI `base` unit) on an axis with about `ticks` ticks, offset
 * when tick labels would need more than `maxDigits` significant digits.
 */
export function axisOffset(lo: number, hi: number, ticks: number, name: string, base: string, maxDigits = MAX_TICK_DIGITS): AxisOffset {
  const maxAbs = Math.max(Math.abs(lo), Math.abs(hi));
  const span = hi - lo;
  const plain = { offset: 0, unit: engineeringUnit(maxAbs, base), name };
  if (!(span > 0) || !Number.isFinite(span) || !(maxAbs > 0)) return plain;
  const step = span / Math.max(1, ticks);
  const digits = Math.floor(Math.log10(maxAbs)) - Math.floor(Math.log10(step)) + 1;
  if (digits <= maxDigits) return plain;
  // A round value at the decade of the spread, so the offset itself reads with few digits.
  const decade = 10 ** Math.floor(Math.log10(span));
  const offset = Math.round((lo + hi) / 2 / decade) * decade;
  if (offset === 0) return plain;
  const shown = figureMinus(prefixedText(Math.abs(offset), base, { digits: Math.max(1, Math.floor(Math.log10(Math.abs(offset))) - Math.floor(Math.log10(decade)) + 1) }));
  return { offset, unit: engineeringUnit(Math.max(Math.abs(lo - offset), Math.abs(hi - offset)), base), name: `${name} ${offset > 0 ? '−' : '+'} ${shown}` };
}

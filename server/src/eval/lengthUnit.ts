/**
 * The one rule for the unit of a length or a set of lengths (a point's coordinates, a table's
 * positions): the unit the user wrote, where there is one (a quantity echoes in the unit the user
 * wrote), else the largest of m, cm, mm, µm, nm in which the largest magnitude is at least 1.
 * lengthText, pointText and the field command's tables all choose through here.
 */
import { convertSI } from '../format/units';
import { displayUnit } from './unitSpelling';

export interface LengthUnit {
  symbol: string;
  /** Metres per unit: a length in m divided by this is the number printed. */
  metres: number;
}

const BY_SIZE: readonly LengthUnit[] = [
  { symbol: 'm', metres: 1 },
  { symbol: 'cm', metres: 1e-2 },
  { symbol: 'mm', metres: 1e-3 },
  { symbol: 'µm', metres: 1e-6 },
  { symbol: 'nm', metres: 1e-9 },
];

/** The unit for lengths whose largest magnitude is `largestM` (0 or not finite: m). */
export function lengthUnitFor(largestM: number, written?: string): LengthUnit {
  if (written !== undefined) {
    const perMetre = convertSI(1, 'length', written);
    if (perMetre !== undefined && Number.isFinite(perMetre) && perMetre > 0) return { symbol: displayUnit(written), metres: 1 / perMetre };
  }
  const a = Math.abs(largestM);
  if (!(a > 0) || !Number.isFinite(a)) return BY_SIZE[0]!;
  return BY_SIZE.find((u) => a >= u.metres) ?? BY_SIZE[BY_SIZE.length - 1]!;
}

/**
 * Display units for axes and read-outs: SI values are divided by a power of 1000 so tick
 * labels stay short ("6.8" on a GHz axis instead of "6 834 682 610").
 */
import { format } from 'd3-format';
import { fieldText, prefixedText, trimNumber } from '../eval/quantityText';
import { FIELD_UNIT_TESLA, type FieldUnit } from './fieldUnits';

export interface DisplayUnit {
  /** SI value ÷ factor = displayed number. */
  factor: number;
  symbol: string;
  /** Set on a log axis over many decades: each tick carries its own prefixed unit (`5 µT`, `100 mT`), this base unit; factor is 1. */
  perTick?: string;
}

const PREFIXES: readonly [number, string][] = [
  [1e12, 'T'], [1e9, 'G'], [1e6, 'M'], [1e3, 'k'], [1, ''], [1e-3, 'm'], [1e-6, 'µ'], [1e-9, 'n'],
];

/** The engineering unit (power of 1000) that puts `maxAbs` between 1 and 1000. */
export function engineeringUnit(maxAbs: number, base: string): DisplayUnit {
  if (!(maxAbs > 0) || !Number.isFinite(maxAbs)) return { factor: 1, symbol: base };
  for (const [factor, prefix] of PREFIXES) {
    if (maxAbs >= factor * 0.9995) return { factor, symbol: prefix + base };
  }
  const [factor, prefix] = PREFIXES[PREFIXES.length - 1];
  return { factor, symbol: prefix + base };
}

/** A frequency unit: the caller's choice when given (named if it is a power of 1000), else from the data. */
export function frequencyUnit(maxAbsHz: number, givenHz?: number): DisplayUnit {
  if (givenHz !== undefined && Number.isFinite(givenHz) && givenHz > 0) {
    const named = PREFIXES.find(([f]) => Math.abs(f / givenHz - 1) < 1e-9);
    if (named) return { factor: named[0], symbol: named[1] + 'Hz' };
    return { factor: givenHz, symbol: `${format('~g')(givenHz)} Hz` };
  }
  return engineeringUnit(maxAbsHz, 'Hz');
}

export function fieldDisplayUnit(unit: FieldUnit): DisplayUnit {
  return { factor: FIELD_UNIT_TESLA[unit], symbol: unit };
}

/** Figures set numbers with the true minus sign (U+2212); the numbers themselves come from the one formatter. */
export function figureMinus(text: string): string {
  return text.replace(/(^|[\s(])-(?=\d)/g, '$1−');
}

/** A value with an SI prefix and unit for titles and read-outs: 6.835e9, 'Hz' → "6.835 GHz". */
export function formatSI(value: number, unit: string, digits = 4): string {
  if (!Number.isFinite(value)) return `— ${unit}`;
  return figureMinus(prefixedText(value, unit, { digits }));
}

/**
 * A field in the axis unit when it reads 0.1–1000 there, else in tesla with the prefix that suits it
 * (6.091 T, not 60910 G; 322.9 µT, not 0.0003229 T). A small field on a gauss axis stays in the gauss
 * family, in mG as the reports write it (50 mG, not 5 µT beside G ticks).
 */
export function fieldOnAxisText(fieldT: number, unit: DisplayUnit): string {
  const inUnit = Math.abs(fieldT) / unit.factor;
  if ((inUnit >= 0.1 && inUnit < 1000) || fieldT === 0) return formatIn(fieldT, unit);
  if (unit.symbol === 'G' && inUnit < 0.1) return figureMinus(fieldText(fieldT, 4));
  return formatSI(fieldT, 'T');
}

/** A value in a fixed display unit with 4 significant figures: 0.45 T, 4500 G. */
export function formatIn(value: number, unit: DisplayUnit): string {
  if (!Number.isFinite(value)) return `— ${unit.symbol}`;
  if (unit.perTick !== undefined) return formatSI(value, unit.perTick);
  return `${figureMinus(trimNumber(value / unit.factor, 4))} ${unit.symbol}`;
}

/**
 * The unit echo: a quantity the user wrote is shown back in the unit they wrote (`25 mT` stays
 * `25 mT`, not `250 G`); a quantity derived from it (a resonance field in a range written in mT)
 * stays in the same unit family with a fitting prefix.
 */
import { convertSI, type Dimension } from '../format/units';
import { fieldText, frequencyText, MISSING, prefixedText, trimNumber, withUncertainty } from './quantityText';
import { displayUnit } from './unitSpelling';

export { displayUnit } from './unitSpelling';

/** `si` shown in `unit` (as written in the file), or undefined when the unit cannot express it. */
export function inWrittenUnit(si: number | null | undefined, dimension: Dimension, unit: string | undefined, digits = 7): string | undefined {
  if (unit === undefined || si === null || si === undefined || !Number.isFinite(si)) return undefined;
  const value = convertSI(si, dimension, unit);
  if (value === undefined || !Number.isFinite(value)) return undefined;
  return `${trimNumber(value, digits)} ${displayUnit(unit)}`;
}

/**
 * A constant with its uncertainty, in the unit the file wrote it in when it did (`B = -0.221 MHz`,
 * not `-221 kHz`), else with the prefix that suits it; `digits` significant digits without an uncertainty.
 */
export function sourcedFrequencyText(c: { value: number; uncertainty?: number; written_unit?: string }, digits: number): string {
  return withUncertainty(c.value, c.uncertainty, (v) => inWrittenUnit(v, 'frequency-like', c.written_unit, digits) ?? frequencyText(v, digits));
}

/** Significant digits of the spin–orbit constant ζ, in the report and the hover alike. */
export const ZETA_DIGITS = 8;

/** True for the gauss family (G, mG, kG, gauss); the tesla family otherwise. */
export function isGaussUnit(unit: string): boolean {
  return /^(?:[mkuµμ]?G|(?:milli|kilo|micro)?gauss)$/.test(unit);
}

/**
 * A field the user wrote (`unit` given): in that unit. A derived field (`family` given): in the
 * family of the unit the user wrote for the related setting, with a prefix. Neither: fieldText.
 */
export function fieldInUnit(tesla: number | null | undefined, opts: { unit?: string; family?: string; digits?: number } = {}): string {
  const digits = opts.digits ?? 6;
  if (tesla === null || tesla === undefined || !Number.isFinite(tesla)) return MISSING;
  const echoed = inWrittenUnit(tesla, 'flux-density', opts.unit, digits);
  if (echoed) return echoed;
  if (opts.family && !isGaussUnit(opts.family)) return prefixedText(tesla, 'T', { digits });
  return fieldText(tesla, digits);
}

/**
 * A magnet's field as the report's magnets table writes it, and the beam's strong-magnet caution
 * quotes it: in the unit the file wrote, with its uncertainty when it has one (`0.4500(50) T`).
 */
export function magnetFieldText(tesla: number, uncertainty: number | undefined, unit: string | undefined): string {
  return withUncertainty(tesla, uncertainty, (v) => fieldInUnit(v, unit !== undefined ? { unit } : {}));
}

/** The unit the file wrote for a working field (a `field` block or a magnet's `field`), if any. */
export function workingFieldUnit(
  r: { fields: { name: string; field_unit?: string }[]; magnets: { name: string; field_unit?: string }[] },
  source: { kind: 'field' | 'magnet'; name: string },
): string | undefined {
  const list = source.kind === 'field' ? r.fields : r.magnets;
  return list.find((x) => x.name === source.name)?.field_unit;
}

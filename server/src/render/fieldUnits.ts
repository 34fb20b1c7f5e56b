/**
 * The one list of units a field is displayed in: figure axes, the panel's unit control, the
 * CLI's `render --unit` and `field --unit`. No imports, so the panel page can bundle it.
 */

/** Display order: gauss, then the tesla family from the lab's mT down to a magnetometer's nT, then T. */
export const FIELD_UNITS = ['G', 'mT', 'µT', 'nT', 'T'] as const;
export type FieldUnit = (typeof FIELD_UNITS)[number];

/** Tesla per unit. */
export const FIELD_UNIT_TESLA: Readonly<Record<FieldUnit, number>> = { G: 1e-4, mT: 1e-3, 'µT': 1e-6, nT: 1e-9, T: 1 };

/** What a command line accepts: the display units, `uT` for µT where µ is hard to type, and the Greek μT many keyboards give. */
export const FIELD_UNIT_CHOICES = ['G', 'mT', 'uT', 'µT', 'μT', 'nT', 'T'] as const;

export function isFieldUnit(v: unknown): v is FieldUnit {
  return typeof v === 'string' && (FIELD_UNITS as readonly string[]).includes(v);
}

/** A command-line choice as its display unit (uT and the Greek μT read µT); undefined if it is none. */
export function fieldUnitOf(choice: string): FieldUnit | undefined {
  const unit = choice === 'uT' || choice === 'μT' ? 'µT' : choice;
  return isFieldUnit(unit) ? unit : undefined;
}

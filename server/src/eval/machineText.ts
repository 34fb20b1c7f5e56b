/**
 * Numbers in the machine-readable outputs (JSON, CSV) never appear as NaN or Infinity.
 * JSON.stringify would turn them into null without a word (and break the schema); here a
 * non-finite number in an object is left out, as the schema's optional fields expect, and in an
 * array it is written as null (the position matters there). A CSV cell for it is empty.
 */
export function finiteJsonText(value: unknown, space?: number): string {
  return JSON.stringify(value, (_key, v: unknown) => (typeof v === 'number' && !Number.isFinite(v) ? undefined : v), space);
}

/** A number as a CSV cell: full precision, empty when the value is missing, never "-0". */
export function csvNumber(x: number | null | undefined): string {
  if (x === null || x === undefined || !Number.isFinite(x)) return '';
  return x === 0 ? '0' : String(x);
}

/**
 * Numbers in the machine-readable outputs (JSON, CSV) never appear as NaN or Infinity.
 * JSON.stringify would turn them into null without a word (and break the schema); here a
 * non-finite number in an object is left out, as the schema's optional fields expect, and in an
 * array it is written as null (the position matters there). A CSV cell for it is empty.
 */
import { numberRowsBytes, numberRowsText, numberText } from './csvDigits/numberTableText';

export function finiteJsonText(value: unknown, space?: number): string {
  return JSON.stringify(value, (_key, v: unknown) => (typeof v === 'number' && !Number.isFinite(v) ? undefined : v), space);
}

/**
 * A number as a CSV cell: 15 significant digits (as toPrecision(15) rounds, trailing zeros
 * dropped, laid out like String(x): csvDigits/fifteenDigitsText.ts), empty when the value is
 * missing, never "-0". 15 digits survive decimal → double → decimal, and drop binary noise such
 * as 0.30000000000000004 (docs/csv.md).
 */
export function csvNumber(x: number | null | undefined): string {
  if (x === null || x === undefined || !Number.isFinite(x)) return '';
  return x === 0 ? '0' : numberText(x);
}

/** The one round-off tolerance (physics/roundOff.ts), relative to the largest value of a column here. */
export { ROUND_OFF_ULPS } from '../physics/roundOff';

/** A row of numbers as one CSV line, cell for cell what csvNumber writes. */
export function csvNumberRow(row: readonly (number | null | undefined)[]): string {
  return numberRowsText([row]);
}

/**
 * Rows of numbers as CSV lines joined by newlines (no newline after the last), cell for cell
 * what csvNumber writes, in one pass of a byte writer over the whole table (docs/speed.md).
 */
export function csvNumberRows(rows: readonly (readonly (number | null | undefined)[])[]): string {
  return numberRowsText(rows);
}

/**
 * csvNumberRows' text as ASCII bytes, handed to `put` a chunk at a time (a view of a reused
 * buffer, to be consumed before `put` returns): a file writer never needs the table as one string.
 */
export function csvNumberRowsBytes(rows: readonly (readonly (number | null | undefined)[])[], put: (chunk: Uint8Array) => void): void {
  numberRowsBytes(rows, put);
}

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

/** A row of numbers as one CSV line, cell for cell what csvNumber writes. */
export function csvNumberRow(row: readonly (number | null | undefined)[]): string {
  return allFinite(row) ? JSON.stringify(row).slice(1, -1) : row.map(csvNumber).join(',');
}

/**
 * Rows of numbers as CSV lines joined by newlines (no newline after the last), cell for cell
 * what csvNumber writes. A table of finite numbers is formatted by one JSON.stringify call: it
 * writes each number as String(x) does (both are ECMA-262 Number::toString, and -0 comes out as
 * "0"), and in one native call it costs a fraction of one String() per cell (docs/speed.md).
 * A table with a missing or non-finite value goes row by row, those rows cell by cell.
 */
export function csvNumberRows(rows: readonly (readonly (number | null | undefined)[])[]): string {
  // A regular expression, because V8 replaces with one about ten times faster than replaceAll('],[', …) here.
  if (rows.length > 0 && rows.every((r) => r.length > 0 && allFinite(r))) return JSON.stringify(rows).slice(2, -2).replace(/\],\[/g, '\n');
  return rows.map(csvNumberRow).join('\n');
}

function allFinite(row: readonly (number | null | undefined)[]): row is readonly number[] {
  for (let i = 0; i < row.length; i++) {
    const x = row[i];
    if (typeof x !== 'number' || !Number.isFinite(x)) return false;
  }
  return true;
}

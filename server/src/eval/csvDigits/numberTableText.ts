/**
 * Numbers and tables of numbers as CSV text (fifteenDigitsText's form), written as bytes into one
 * reused buffer and turned into text a chunk at a time. A chunk stays below V8's large-object
 * size, so no fresh memory is mapped for it; the table comes back as those chunks joined, or
 * as the chunks' bytes for a file writer (numberRowsBytes).
 */
import { MAX_NUMBER_BYTES, writeFifteenDigits } from './fifteenDigitsWriter';

const CHUNK = 32 * 1024;
const bytes = new Uint8Array(CHUNK + 2 * MAX_NUMBER_BYTES);

/** bytes[0…end) as text: Buffer's latin1 decoding where there is one (Node), else TextDecoder. */
const decode: (end: number) => string = (() => {
  if (typeof Buffer === 'function') {
    const view = Buffer.from(bytes.buffer, bytes.byteOffset, bytes.length);
    return (end: number) => view.toString('latin1', 0, end);
  }
  const decoder = new TextDecoder();
  return (end: number) => decoder.decode(bytes.subarray(0, end));
})();

/** One finite number. */
export function numberText(x: number): string {
  return decode(writeFifteenDigits(bytes, 0, x));
}

/** Rows joined by newlines (none after the last), cells by commas; a missing or non-finite cell is empty. */
export function numberRowsText(rows: readonly (readonly (number | null | undefined)[])[]): string {
  let text = '';
  const end = writeRows(rows, (p) => {
    text += decode(p);
  });
  return text + decode(end);
}

/**
 * The same table as ASCII bytes, handed to `put` a chunk at a time and never made into text (a
 * file writer takes them as they are). A chunk is a view of the reused buffer: `put` must be done
 * with it before it returns.
 */
export function numberRowsBytes(rows: readonly (readonly (number | null | undefined)[])[], put: (chunk: Uint8Array) => void): void {
  const end = writeRows(rows, (p) => put(bytes.subarray(0, p)));
  if (end > 0) put(bytes.subarray(0, end));
}

/** Writes the rows into `bytes`, calling `flush(end)` whenever a chunk is full; returns the end of the last one. */
function writeRows(rows: readonly (readonly (number | null | undefined)[])[], flush: (end: number) => void): number {
  let p = 0;
  for (let i = 0; i < rows.length; i++) {
    if (i > 0) bytes[p++] = 10;
    if (p > CHUNK) {
      flush(p);
      p = 0;
    }
    const row = rows[i]!;
    for (let j = 0; j < row.length; j++) {
      if (j > 0) bytes[p++] = 44;
      const x = row[j];
      if (typeof x === 'number' && x - x === 0) p = writeFifteenDigits(bytes, p, x);
      if (p > CHUNK) {
        flush(p);
        p = 0;
      }
    }
  }
  return p;
}

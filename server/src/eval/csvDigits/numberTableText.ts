/**
 * Numbers and tables of numbers as CSV text (fifteenDigitsText's form), written as bytes into one
 * reused buffer and turned into text a chunk at a time. A chunk stays below V8's large-object
 * size, so no fresh memory is mapped for it; the table comes back as those chunks joined.
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
  let p = 0;
  for (let i = 0; i < rows.length; i++) {
    if (i > 0) bytes[p++] = 10;
    if (p > CHUNK) {
      text += decode(p);
      p = 0;
    }
    const row = rows[i]!;
    for (let j = 0; j < row.length; j++) {
      if (j > 0) bytes[p++] = 44;
      const x = row[j];
      if (typeof x === 'number' && x - x === 0) p = writeFifteenDigits(bytes, p, x);
      if (p > CHUNK) {
        text += decode(p);
        p = 0;
      }
    }
  }
  return text + decode(p);
}

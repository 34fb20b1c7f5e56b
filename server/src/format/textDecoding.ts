/**
 * Setup files are UTF-8. Bytes that are not valid UTF-8 are decoded as U+FFFD, so the rest of the
 * file is still read, and the first invalid sequence is reported with its line and column.
 */
import type { Problem } from './ast';
import { makeProblem } from './codes';
import { computeLineStarts } from './positions';

const strict = new TextDecoder('utf-8', { fatal: true });
const lenient = new TextDecoder('utf-8');

/** Offset of the first byte that does not start a valid UTF-8 sequence (RFC 3629), or -1. */
export function firstInvalidUtf8(bytes: Uint8Array): number {
  const n = bytes.length;
  let i = 0;
  while (i < n) {
    const b = bytes[i]!;
    if (b < 0x80) {
      i++;
      continue;
    }
    let need: number;
    let lo = 0x80;
    let hi = 0xbf;
    if (b >= 0xc2 && b <= 0xdf) need = 1;
    else if (b === 0xe0) (need = 2), (lo = 0xa0);
    else if (b === 0xed) (need = 2), (hi = 0x9f); // no UTF-16 surrogates
    else if (b >= 0xe1 && b <= 0xef) need = 2;
    else if (b === 0xf0) (need = 3), (lo = 0x90);
    else if (b === 0xf4) (need = 3), (hi = 0x8f); // nothing above U+10FFFF
    else if (b >= 0xf1 && b <= 0xf3) need = 3;
    else return i;
    if (i + need >= n) return i;
    const second = bytes[i + 1]!;
    if (second < lo || second > hi) return i;
    for (let k = 2; k <= need; k++) {
      const c = bytes[i + k]!;
      if (c < 0x80 || c > 0xbf) return i;
    }
    i += need + 1;
  }
  return -1;
}

/** The text of a setup file's bytes (a leading BOM dropped, as editors do) and an encoding problem, if any. */
export function decodeSetupBytes(bytes: Uint8Array): { text: string; problems: Problem[] } {
  try {
    return { text: strict.decode(bytes), problems: [] };
  } catch {
    const text = lenient.decode(bytes);
    const at = firstInvalidUtf8(bytes);
    // The valid prefix decodes to exactly the text before the first replacement character.
    const before = lenient.decode(bytes.subarray(0, Math.max(at, 0)));
    const starts = computeLineStarts(before);
    const line = starts.length - 1;
    const character = before.length - starts[line]!;
    const byte = bytes[at] ?? 0;
    const message = `the file is not valid UTF-8: byte 0x${byte.toString(16).padStart(2, '0')} at byte offset ${at} cannot be read and is shown as \uFFFD (and so is any later invalid byte); save the file as UTF-8`;
    return { text, problems: [makeProblem('text-invalid-encoding', message, { start: { line, character }, end: { line, character: character + 1 } })] };
  }
}

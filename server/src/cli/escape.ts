/**
 * Terminal-safe text. A setup file can hold any character, and names and values from it reach
 * the terminal in reports, check lines and error messages: an escape sequence there could erase
 * lines or recolour the screen, and a bidi control could make a line read differently than it
 * is. Every text the CLI prints or writes passes through `escapeControls`; JSON goes through
 * `jsonText`, whose escapes keep it valid JSON.
 */
import { finiteJsonText } from '../eval/machineText';
import { INVISIBLE_CLASS } from '../format/controlCharacters';

/** The characters the parser reports as invisible, and CR (a bare CR returns the cursor to the line's start). */
const UNSAFE = new RegExp(`[${INVISIBLE_CLASS}\\r]`, 'g');

function hex(code: number, width: number): string {
  return code.toString(16).padStart(width, '0');
}

/** `\x1b` for a byte-sized control, `\u202e` for the others: visible, and short. */
export function escapeControls(text: string): string {
  return text.replace(UNSAFE, (c) => {
    const code = c.charCodeAt(0);
    return code <= 0xff ? `\\x${hex(code, 2)}` : `\\u${hex(code, 4)}`;
  });
}

/**
 * JSON text with every unsafe character as a `\uXXXX` escape. JSON.stringify already escapes
 * C0 controls; C1, DEL and bidi marks can only occur inside strings, where `\u` escapes mean
 * the same character, so the document is unchanged for a JSON reader.
 */
export function jsonText(value: unknown, indent: number = 2): string {
  return finiteJsonText(value, indent).replace(UNSAFE, (c) => `\\u${hex(c.charCodeAt(0), 4)}`);
}

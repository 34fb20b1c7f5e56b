/**
 * Characters that cannot be seen in an editor but act on a terminal or on how a line displays:
 * NUL, the other control characters (tab and line breaks excepted), and bidirectional controls.
 * Each line that has them gets one problem at the first one, so a binary file does not flood
 * the Problems view; past MAX_REPORTED_LINES lines the last problem says how many more lines have them.
 */
import type { Problem } from './ast';
import { makeProblem } from './codes';

const NUL = 1;
const CONTROL = 2;
const BIDI = 3;
const CODES = ['', 'text-nul-character', 'text-control-character', 'text-bidi-control'] as const;

/**
 * Invisible characters that act on a terminal or on display order, as a regular-expression class
 * body: C0 controls except tab, LF and CR; DEL and C1; U+2028/U+2029; the bidi controls. The CLI
 * escapes the same set (and CR) in what it prints.
 */
export const INVISIBLE_CLASS = '\\u0000-\\u0008\\u000b\\u000c\\u000e-\\u001f\\u007f-\\u009f\\u2028\\u2029\\u061c\\u200e\\u200f\\u202a-\\u202e\\u2066-\\u2069';

/** The same set as kindOf, for finding the first one fast. */
const SUSPECT = new RegExp(`[${INVISIBLE_CLASS}]`, 'g');

/** 0 for an ordinary character, else the kind; a plain loop, since a binary file can hold millions of them. */
function kindOf(c: number): number {
  if (c < 0x20) return c === 0 ? NUL : c === 9 || c === 10 || c === 13 ? 0 : CONTROL;
  if (c < 0x7f) return 0;
  if (c <= 0x9f) return CONTROL;
  if (c < 0x61c) return 0;
  if (c === 0x61c || c === 0x200e || c === 0x200f || (c >= 0x202a && c <= 0x202e) || (c >= 0x2066 && c <= 0x2069)) return BIDI;
  return c === 0x2028 || c === 0x2029 ? CONTROL : 0;
}

/** Lines that get problems of their own (up to three each, one per kind); later lines are counted. */
export const MAX_REPORTED_LINES = 100;

type Code = (typeof CODES)[1 | 2 | 3];

function describe(code: Code, ch: string, count: number): string {
  const u = `U+${ch.charCodeAt(0).toString(16).toUpperCase().padStart(4, '0')}`;
  const more = count > 1 ? ` (${count} such characters on this line)` : '';
  switch (code) {
    case 'text-nul-character':
      return `a NUL character${more}: the file looks binary or damaged; delete it`;
    case 'text-bidi-control':
      return `an invisible bidirectional control character ${u}${more}: the line may display in a different order than it is read; delete it`;
    default:
      return `an invisible control character ${u}${more}, e.g. part of a terminal escape code; delete it`;
  }
}

export function controlCharacterProblems(text: string, lineStarts: readonly number[]): Problem[] {
  const all: { code: Code; line: number; character: number; ch: string; count: number }[] = [];
  let line = 0;
  let listedLines = 0;
  let moreLines = 0;
  // The regular expression skips clean text quickly; a line with a hit is then read character by character.
  SUSPECT.lastIndex = 0;
  for (let m = SUSPECT.exec(text); m; m = SUSPECT.exec(text)) {
    while (line + 1 < lineStarts.length && lineStarts[line + 1]! <= m.index) line++;
    const lineEnd = line + 1 < lineStarts.length ? lineStarts[line + 1]! : text.length;
    SUSPECT.lastIndex = lineEnd;
    if (listedLines >= MAX_REPORTED_LINES) {
      moreLines++;
      continue;
    }
    listedLines++;
    const onLine: ({ count: number } | undefined)[] = [];
    for (let i = m.index; i < lineEnd; i++) {
      const kind = kindOf(text.charCodeAt(i));
      if (kind === 0) continue;
      const f = onLine[kind];
      if (f) f.count++;
      else {
        const entry = { code: CODES[kind as 1 | 2 | 3], line, character: i - lineStarts[line]!, ch: text[i]!, count: 1 };
        onLine[kind] = entry;
        all.push(entry);
      }
    }
  }
  const unlisted = moreLines > 0 ? `; ${moreLines} more lines have invisible characters and are not listed` : '';
  return all.map((f, i) =>
    makeProblem(f.code, describe(f.code, f.ch, f.count) + (i === all.length - 1 ? unlisted : ''), { start: { line: f.line, character: f.character }, end: { line: f.line, character: f.character + 1 } }),
  );
}

/**
 * Characters that cannot be seen in an editor but act on a terminal or on how a line displays:
 * NUL, the other control characters (tab and line breaks excepted), and bidirectional controls.
 * Each line that has them gets one problem at the first one, so a binary file does not flood
 * the Problems view; past MAX_REPORTED lines the last problem says how many more there are.
 */
import type { Problem } from './ast';
import { makeProblem } from './codes';

const SUSPECT = /[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f-\u009f\u2028\u2029\u061c\u200e\u200f\u202a-\u202e\u2066-\u2069]/g;
const BIDI = /[\u061c\u200e\u200f\u202a-\u202e\u2066-\u2069]/;

/** Lines with such characters that get a problem of their own. */
export const MAX_REPORTED = 100;

type Code = 'text-nul-character' | 'text-control-character' | 'text-bidi-control';

function codeOf(ch: string): Code {
  if (ch === '\u0000') return 'text-nul-character';
  return BIDI.test(ch) ? 'text-bidi-control' : 'text-control-character';
}

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
  const found = new Map<string, { code: Code; line: number; character: number; ch: string; count: number }>();
  let line = 0;
  SUSPECT.lastIndex = 0;
  for (let m = SUSPECT.exec(text); m; m = SUSPECT.exec(text)) {
    while (line + 1 < lineStarts.length && lineStarts[line + 1]! <= m.index) line++;
    const code = codeOf(m[0]);
    const key = `${line}:${code}`;
    const f = found.get(key);
    if (f) f.count++;
    else found.set(key, { code, line, character: m.index - lineStarts[line]!, ch: m[0], count: 1 });
  }
  const all = [...found.values()];
  const problems = all.slice(0, MAX_REPORTED).map((f) =>
    makeProblem(f.code, describe(f.code, f.ch, f.count), { start: { line: f.line, character: f.character }, end: { line: f.line, character: f.character + 1 } }),
  );
  if (all.length > MAX_REPORTED) {
    const last = problems[problems.length - 1]!;
    last.message += `; ${all.length - MAX_REPORTED} more lines have invisible characters and are not listed`;
  }
  return problems;
}

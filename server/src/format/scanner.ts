/**
 * Splits a document into lines and each line into tokens, in a plain left-to-right pass: `#`
 * starts a comment, `=`, `:`, `,` and the arrow (`->` or `→`) are single tokens, a token that
 * starts with `"` is a quoted string up to the next `"` on the line (the path of a `use`
 * statement; it may hold blanks and `#`), and every other run of non-blank characters is an
 * "atom" (a word, number, quantity, unit or term symbol; later stages decide which).
 */
import { computeLineStarts } from './positions';
import { LINES_PER_STOP_CHECK, stopEvery, type StopCheck } from './stopCheck';

export type TokenKind = 'atom' | 'equals' | 'colon' | 'comma' | 'arrow' | 'string';

/**
 * A token; offsets are absolute (into the whole document), end exclusive. A `string` token's
 * text includes its quotes; one without a closing quote runs to the comment or the line's end.
 */
export interface Token {
  kind: TokenKind;
  text: string;
  start: number;
  end: number;
}

export interface ScannedLine {
  line: number;
  /** Offset of the line's first character. */
  start: number;
  /** Offset just past the line's last character (line break excluded). */
  end: number;
  tokens: Token[];
  /** The comment from `#` to the end of the line, if any. */
  comment?: { text: string; start: number; end: number };
}

export interface ScannedText {
  lineStarts: number[];
  lines: ScannedLine[];
}

const ARROW_UNICODE = '\u2192'; // →

function isBlank(code: number): boolean {
  // Space, tab and the other characters JavaScript's \s covers (NBSP, BOM, Unicode spaces).
  if (code === 32 || code === 9) return true;
  if (code < 128) return code === 11 || code === 12;
  return /\s/.test(String.fromCharCode(code));
}

function singleTokenKind(ch: string): TokenKind | undefined {
  switch (ch) {
    case '=':
      return 'equals';
    case ':':
      return 'colon';
    case ',':
      return 'comma';
    case ARROW_UNICODE:
      return 'arrow';
    default:
      return undefined;
  }
}

function startsArrow(text: string, i: number): boolean {
  return text.charCodeAt(i) === 45 /* - */ && text.charCodeAt(i + 1) === 62; /* > */
}

/** End (exclusive) of the quoted string that starts at `i`. */
function stringEnd(text: string, i: number, end: number): number {
  const close = text.indexOf('"', i + 1);
  if (close >= 0 && close < end) return close + 1;
  // Unterminated: up to a comment or the line's end, without trailing blanks.
  const hash = text.indexOf('#', i + 1);
  let stop = hash >= 0 && hash < end ? hash : end;
  while (stop > i + 1 && isBlank(text.charCodeAt(stop - 1))) stop--;
  return stop;
}

/** Tokens of text[start, end), which must not contain a line break. */
export function scanLine(text: string, line: number, start: number, end: number): ScannedLine {
  const tokens: Token[] = [];
  const result: ScannedLine = { line, start, end, tokens };
  let i = start;
  while (i < end) {
    const code = text.charCodeAt(i);
    if (isBlank(code)) {
      i++;
      continue;
    }
    const ch = text[i]!;
    if (ch === '#') {
      result.comment = { text: text.slice(i, end), start: i, end };
      break;
    }
    if (startsArrow(text, i)) {
      tokens.push({ kind: 'arrow', text: '->', start: i, end: i + 2 });
      i += 2;
      continue;
    }
    if (ch === '"') {
      const stop = stringEnd(text, i, end);
      tokens.push({ kind: 'string', text: text.slice(i, stop), start: i, end: stop });
      i = stop;
      continue;
    }
    const single = singleTokenKind(ch);
    if (single) {
      tokens.push({ kind: single, text: ch, start: i, end: i + 1 });
      i++;
      continue;
    }
    const atomStart = i;
    while (i < end) {
      const c = text.charCodeAt(i);
      if (isBlank(c) || text[i] === '#' || singleTokenKind(text[i]!) || startsArrow(text, i)) break;
      i++;
    }
    tokens.push({ kind: 'atom', text: text.slice(atomStart, i), start: atomStart, end: i });
  }
  return result;
}

/**
 * Lines [from, to) of a text whose line starts are known, scanned (the incremental parser reads a
 * few). `stop` is asked every LINES_PER_STOP_CHECK lines (format/stopCheck.ts).
 */
export function scanLines(text: string, lineStarts: readonly number[], from: number, to: number, stop?: StopCheck): ScannedLine[] {
  const lines: ScannedLine[] = [];
  for (let n = from; n < to; n++) {
    stopEvery(stop, n - from, LINES_PER_STOP_CHECK);
    const start = lineStarts[n]!;
    let end = n + 1 < lineStarts.length ? lineStarts[n + 1]! : text.length;
    if (end > start && text.charCodeAt(end - 1) === 10) end--;
    if (end > start && text.charCodeAt(end - 1) === 13) end--;
    lines.push(scanLine(text, n, start, end));
  }
  return lines;
}

/** Every line of the text, scanned. */
export function scanText(text: string, stop?: StopCheck): ScannedText {
  const lineStarts = computeLineStarts(text);
  return { lineStarts, lines: scanLines(text, lineStarts, 0, lineStarts.length, stop) };
}

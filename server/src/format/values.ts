/**
 * A setting's value: tokens → comma-separated groups of parts (numbers, quantities, words).
 * A quantity is a number with a unit glued on (`720K`) or in the next word (`0.45 T`). A word
 * after a number that is not a unit stays a word (`oven 720 K`, `50 um apart 40 cm`).
 */
import type { ParsedNumber, Problem, Range, Spanned, ValuePart } from './ast';
import { makeProblem } from './codes';
import { readNumber, readNumberPrefix } from './numbers';
import type { Token } from './scanner';
import { VALUE_WORDS } from './schema';
import { isUnitText, looksLikeMisspeltUnit } from './units';

/** Turns absolute offsets on one line into spans. */
export interface LineSpans {
  text: string;
  line: number;
  lineStart: number;
}

export function spanOf(ls: LineSpans, start: number, end: number): Spanned {
  return { text: ls.text.slice(start, end), range: rangeOn(ls, start, end) };
}

export function rangeOn(ls: LineSpans, start: number, end: number): Range {
  return {
    start: { line: ls.line, character: start - ls.lineStart },
    end: { line: ls.line, character: end - ls.lineStart },
  };
}

type Classified =
  | { kind: 'number'; number: ParsedNumber }
  | { kind: 'quantity'; number: ParsedNumber; unitStart: number }
  | { kind: 'word'; unreadable?: true };

/** Words a program prints for a number it could not make; never a value here. */
const NOT_A_NUMBER = /^[+\-\u2212]?(nan|inf|infinity|∞)$/i;

/** What one atom is on its own; reports numbers that cannot be used. */
function classifyAtom(atom: Token, next: Token | undefined, ls: LineSpans, problems: Problem[]): Classified {
  const whole = readNumber(atom.text);
  if (whole) {
    if (whole.ok) return { kind: 'number', number: whole.number };
    problems.push(makeProblem('syntax-bad-number', `the number ${clip(atom.text)} ${whole.reason}`, rangeOn(ls, atom.start, atom.end)));
    return { kind: 'word', unreadable: true };
  }
  const prefix = readNumberPrefix(atom.text);
  if (prefix && isUnitText(atom.text.slice(prefix.length))) {
    if (prefix.reading.ok) return { kind: 'quantity', number: prefix.reading.number, unitStart: atom.start + prefix.length };
    problems.push(makeProblem('syntax-bad-number', `the number in ${clip(atom.text)} ${prefix.reading.reason}`, rangeOn(ls, atom.start, atom.end)));
    return { kind: 'word', unreadable: true };
  }
  // Only before a unit: a lone `inf` may be a name the file gives something.
  if (NOT_A_NUMBER.test(atom.text) && next && isUnitAfterNumber(next.text)) {
    problems.push(makeProblem('syntax-bad-number', `'${clip(atom.text)}' is not a number: write the value in digits, e.g. 0.45 or 1.2e-3`, rangeOn(ls, atom.start, atom.end)));
    return { kind: 'word', unreadable: true };
  }
  return { kind: 'word' };
}

function isUnitAfterNumber(word: string): boolean {
  if (VALUE_WORDS.includes(word)) return false;
  return isUnitText(word) || looksLikeMisspeltUnit(word);
}

/**
 * The word of an item written as a number and a word stands where the unit goes (`8 Tt`, `5 mn`):
 * read as the quantity's unit, so the unknown unit is said with what the setting needs, in every
 * setting alike. Read apart it gave "needs a unit" with a fix that put one before the word.
 * A value word (`0.5 exact`) stays a word: that is a missing unit.
 */
function endsAsUnit(next: Token | undefined, numberAndWord: boolean): boolean {
  if (!next) return false;
  if (isUnitAfterNumber(next.text)) return true;
  return numberAndWord && !VALUE_WORDS.includes(next.text) && /^[\p{L}µ°%]/u.test(next.text);
}

/** Parts of one comma-free run of atoms (an atom's text is the document's text at its span, so it is used as is). */
function readGroup(atoms: Token[], ls: LineSpans, problems: Problem[]): ValuePart[] {
  const parts: ValuePart[] = [];
  for (let i = 0; i < atoms.length; i++) {
    const atom = atoms[i]!;
    const next = atoms[i + 1];
    const c = classifyAtom(atom, next, ls, problems);
    if (c.kind === 'quantity') {
      parts.push({ kind: 'quantity', number: c.number, unit: spanOf(ls, c.unitStart, atom.end), text: atom.text, range: rangeOn(ls, atom.start, atom.end) });
      continue;
    }
    if (c.kind === 'word' && c.unreadable) {
      // The unit after an unusable number belongs to it: one value, not a value and a stray unit.
      const gluedUnit = readNumber(atom.text) === undefined && !NOT_A_NUMBER.test(atom.text);
      const withUnit = next !== undefined && !gluedUnit && isUnitAfterNumber(next.text);
      const end = withUnit ? next.end : atom.end;
      if (withUnit) i++;
      parts.push({ kind: 'word', unreadable: true, ...spanOf(ls, atom.start, end) });
      continue;
    }
    if (c.kind === 'word') {
      parts.push({ kind: 'word', text: atom.text, range: rangeOn(ls, atom.start, atom.end) });
      continue;
    }
    if (next && endsAsUnit(next, i === 0 && atoms.length === 2)) {
      parts.push({ kind: 'quantity', number: c.number, unit: spanOf(ls, next.start, next.end), ...spanOf(ls, atom.start, next.end) });
      i++;
      continue;
    }
    parts.push({ kind: 'number', number: c.number, text: atom.text, range: rangeOn(ls, atom.start, atom.end) });
  }
  return parts;
}

/**
 * Every part of a value, its comma-separated items one after another: what `groups.flat()` gives
 * (a new array), without the generic flattening builtin, which costs ten times as much per setting
 * and is read for every setting of a file.
 */
export function allParts(groups: readonly (readonly ValuePart[])[]): ValuePart[] {
  if (groups.length === 1) return groups[0]!.slice();
  const out: ValuePart[] = [];
  for (const g of groups) for (const p of g) out.push(p);
  return out;
}

/**
 * Groups of parts from the value's tokens. Tokens that cannot be in a value (`=`, `:`, `->`)
 * are reported and left out; an empty item between commas is reported.
 */
export function readValueGroups(tokens: Token[], ls: LineSpans, problems: Problem[]): ValuePart[][] {
  if (tokens.length === 0) return [];
  const groups: ValuePart[][] = [];
  let atoms: Token[] = [];
  let itemStart = tokens[0]!.start;
  let reportedComma = -1;
  const closeItem = (end: number, commaAfter: boolean): void => {
    if (atoms.length === 0) {
      if (commaAfter) reportedComma = end;
      const where = commaAfter ? rangeOn(ls, end, end + 1) : rangeOn(ls, itemStart - 1, itemStart);
      problems.push(makeProblem('syntax-empty-item', 'empty item in a comma-separated list', where));
    } else {
      groups.push(readGroup(atoms, ls, problems));
    }
    atoms = [];
  };
  for (const t of tokens) {
    // A quoted string has no meaning in a value; it is read as one word, as it was before quoting existed.
    if (t.kind === 'atom' || t.kind === 'string') atoms.push(t);
    else if (t.kind === 'comma') {
      closeItem(t.start, true);
      itemStart = t.end;
    } else {
      problems.push(makeProblem('syntax-unexpected-text', `unexpected '${t.text}' in a value`, rangeOn(ls, t.start, t.end)));
    }
  }
  const last = tokens[tokens.length - 1]!;
  if (last.kind === 'comma') {
    // Not twice for the same comma (`80 um,,`).
    if (reportedComma !== last.start) problems.push(makeProblem('syntax-empty-item', 'the list ends with a comma', rangeOn(ls, last.start, last.end)));
  } else if (atoms.length > 0 || groups.length > 0) {
    closeItem(last.end, false);
  }
  return groups;
}

function clip(text: string): string {
  return text.length > 40 ? `${text.slice(0, 37)}…` : text;
}

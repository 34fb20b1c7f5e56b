/**
 * Term symbols in the trade notation ^(2S+1)L_J, with an optional odd-parity mark.
 *
 * Accepted spellings (all parse to the same thing):
 *   2P3/2   ²P₃/₂   2P°3/2   2Po3/2   2P_{3/2}   ^2P_3/2   ^{2}P_{3/2}   2P3/2°   2P (no J)
 * J is written as a whole number or as a fraction n/2 (ASCII or subscript digits, with '/',
 * '⁄' or '∕'); decimals are refused with a fix-it suggestion.
 *
 * Parsing never throws. Problems come back as TextIssue values whose start/end are UTF-16
 * offsets into the text that was passed in, so an editor can underline exactly the bad part.
 * The returned term is non-null exactly when no issue of severity 'error' was found.
 */
import { listWords } from './listWords';

export type Parity = 'even' | 'odd';

export interface TermSymbol {
  /** 2S + 1 */
  multiplicity: number;
  /** 2S */
  twoS: number;
  /** orbital angular momentum L */
  L: number;
  /** 2J, or null when the text gives no J */
  twoJ: number | null;
  /** 'odd' when the text carries a parity mark, otherwise null (unstated) */
  parityMark: Parity | null;
  /** the term as written (surrounding whitespace removed) */
  text: string;
}

export interface TextIssue {
  /** stable machine-readable code, e.g. 'term-j-out-of-range' */
  code: string;
  /** plain-words message for the user */
  message: string;
  /** UTF-16 offset of the first character of the problem */
  start: number;
  /** UTF-16 offset one past the last character of the problem */
  end: number;
  /** replacement texts for the [start, end) range, best first */
  suggestions?: string[];
  severity: 'error' | 'warning';
}

/** What formatTermSymbol needs; a full TermSymbol fits. */
export interface TermLike {
  twoS: number;
  L: number;
  twoJ: number | null;
  parityMark?: Parity | null;
}

export type NotationStyle = 'ascii' | 'unicode';

// ---------------------------------------------------------------------------------------
// Orbital letters
// ---------------------------------------------------------------------------------------

/** S P D F, then alphabetical from G skipping J and the already-used P and S. */
const ORBITAL_LETTERS = 'SPDFGHIKLMNOQRTUVWXYZ';

/** Letter for L (0 → 'S'). Beyond the lettered range (L > 20) returns '[L]'. */
export function orbitalLetter(L: number): string {
  if (Number.isInteger(L) && L >= 0 && L < ORBITAL_LETTERS.length) return ORBITAL_LETTERS[L];
  return `[${L}]`;
}

/** L for a capital orbital letter, or null if the letter is not in the sequence. */
export function letterToL(letter: string): number | null {
  if (letter.length !== 1) return null;
  const i = ORBITAL_LETTERS.indexOf(letter);
  return i >= 0 ? i : null;
}

// ---------------------------------------------------------------------------------------
// Formatting
// ---------------------------------------------------------------------------------------

const SUPERSCRIPT_DIGITS = '⁰¹²³⁴⁵⁶⁷⁸⁹';
const SUBSCRIPT_DIGITS = '₀₁₂₃₄₅₆₇₈₉';

export function toSuperscript(digits: string): string {
  return digits.replace(/[0-9]/g, (d) => SUPERSCRIPT_DIGITS[Number(d)]);
}
export function toSubscript(digits: string): string {
  return digits.replace(/[0-9]/g, (d) => SUBSCRIPT_DIGITS[Number(d)]);
}

/** A twice-value as text: 3 → '3/2', 4 → '2', −1 → '-1/2'. */
export function formatHalfInteger(two: number): string {
  return two % 2 === 0 ? String(two / 2) : `${two}/2`;
}

/** J as written in a term symbol: '3/2' (ascii) or '₃/₂' (unicode). */
export function formatJ(twoJ: number, style: NotationStyle = 'ascii'): string {
  const ascii = formatHalfInteger(twoJ);
  return style === 'unicode' ? toSubscript(ascii) : ascii;
}

/**
 * '2P3/2', '2Po3/2' (ascii, 'o' marks odd parity) or '²P₃/₂', '²P°₃/₂' (unicode).
 * A term without J is written without it ('2P').
 */
export function formatTermSymbol(t: TermLike, style: NotationStyle): string {
  const mult = String(t.twoS + 1);
  const odd = t.parityMark === 'odd';
  const j = t.twoJ === null ? '' : formatJ(t.twoJ, style);
  if (style === 'unicode') return `${toSuperscript(mult)}${orbitalLetter(t.L)}${odd ? '°' : ''}${j}`;
  return `${mult}${orbitalLetter(t.L)}${odd ? 'o' : ''}${j}`;
}

/** Term label without J, e.g. '3P' (used in lists of allowed terms). */
export function formatTermLabel(twoS: number, L: number): string {
  return `${twoS + 1}${orbitalLetter(L)}`;
}

/** twoJ values |L − S| … L + S for the given 2S and L (ascending). */
export function allowedJ(twoS: number, L: number): number[] {
  if (!Number.isInteger(twoS) || !Number.isInteger(L) || twoS < 0 || L < 0) return [];
  const out: number[] = [];
  for (let twoJ = Math.abs(2 * L - twoS); twoJ <= 2 * L + twoS; twoJ += 2) out.push(twoJ);
  return out;
}

/** Build a TermSymbol from numbers; its text is the ascii spelling. */
export function makeTermSymbol(twoS: number, L: number, twoJ: number | null, parityMark: Parity | null = null): TermSymbol {
  const t = { twoS, L, twoJ, parityMark };
  return { multiplicity: twoS + 1, ...t, text: formatTermSymbol(t, 'ascii') };
}

// ---------------------------------------------------------------------------------------
// Parsing
// ---------------------------------------------------------------------------------------

/** Largest multiplicity accepted (S = 49); keeps lists in messages short and numbers sane. */
const MAX_MULTIPLICITY = 99;

const PARITY_MARKS = '°º˚ᵒo*';
const SLASHES = '/⁄∕';
/** Molecular (Λ) letters someone might type by habit, mapped to the atomic letter. */
const MOLECULAR_LETTERS: Record<string, string> = { Σ: 'S', Π: 'P', Δ: 'D', Φ: 'F', Γ: 'G' };

/** Extra detail the level-designation parser needs (offsets of the parts). */
export interface TermParseDetail {
  /** [start, end) of the whole term in the caller's text */
  start: number;
  end: number;
  /** [start, end) of the parity mark, when present */
  parityRange: [number, number] | null;
  /** [start, end) of J, when present */
  jRange: [number, number] | null;
  /** the spelling style the user chose, so fixes can match it */
  style: NotationStyle;
}

export function parseTermSymbol(text: string): { term: TermSymbol | null; issues: TextIssue[] } {
  const { term, issues } = parseTermSymbolAt(text, 0);
  return { term, issues };
}

/**
 * Parse a term symbol that sits at `base` in some larger text; offsets in issues and detail
 * are in that larger text.
 */
export function parseTermSymbolAt(
  text: string,
  base: number,
): { term: TermSymbol | null; issues: TextIssue[]; detail: TermParseDetail | null } {
  const issues: TextIssue[] = [];
  const lead = text.length - text.trimStart().length;
  const body = text.trim();
  const at = (i: number): number => base + lead + i; // body index → caller offset
  const fail = (code: string, message: string, s: number, e: number, suggestions?: string[]) => {
    issues.push(issue(code, message, at(s), at(e), 'error', suggestions));
    return { term: null, issues, detail: null };
  };

  if (body.length === 0) {
    return fail('term-malformed', 'Expected a term symbol such as 2P3/2.', 0, 0);
  }
  // Fix-its are spelled with super/subscript digits only if the user typed some.
  const unicodeUsed = /[⁰¹²³⁴⁵⁶⁷⁸⁹₀₁₂₃₄₅₆₇₈₉]/.test(body);
  const style: NotationStyle = unicodeUsed ? 'unicode' : 'ascii';

  let i = 0;
  // 1. multiplicity: optional '^', then digits, superscript digits, or {digits}
  if (body[i] === '^') i++;
  const multStart = i;
  let multDigits = '';
  if (body[i] === '{') {
    const close = body.indexOf('}', i);
    if (close < 0) return fail('term-malformed', "The '{' before the multiplicity is never closed.", i, body.length);
    multDigits = body.slice(i + 1, close);
    if (!/^[0-9]+$/.test(multDigits)) {
      return fail('term-malformed', 'The multiplicity 2S+1 must be a whole number.', i, close + 1);
    }
    i = close + 1;
  } else {
    while (i < body.length && isDigitAny(body[i]) && !isSubscriptDigit(body[i])) {
      multDigits += digitValue(body[i]);
      i++;
    }
  }
  const multEnd = i;
  if (multDigits.length === 0) {
    const firstIsLetter = /\p{L}/u.test(body[i] ?? '');
    return fail(
      'term-malformed',
      firstIsLetter
        ? 'A term symbol starts with its multiplicity 2S+1, e.g. 2P3/2.'
        : 'Expected a term symbol such as 2P3/2: multiplicity 2S+1, an orbital letter, then J.',
      multStart,
      Math.min(body.length, Math.max(multStart + 1, i)),
    );
  }
  const multiplicity = Number(multDigits);

  // 2. orbital letter
  if (i >= body.length) {
    return fail('term-malformed', 'Expected an orbital letter (S, P, D, F, …) after the multiplicity.', 0, body.length);
  }
  const letterPos = i;
  const letter = body[i];
  i++;
  let L = letterToL(letter);
  if (L === null) {
    const upper = letter.toUpperCase();
    const Lupper = letterToL(upper);
    if (letter !== upper && Lupper !== null) {
      issues.push(
        issue(
          'term-lowercase-letter',
          `Term letters are capitals: lower-case ${letter} is for a single electron. Read as ${upper} (L = ${Lupper}).`,
          at(letterPos),
          at(letterPos + 1),
          'warning',
          [upper],
        ),
      );
      L = Lupper;
    } else if (upper === 'J') {
      return fail(
        'term-bad-letter',
        'J is not an orbital letter: the sequence skips it (… H = 5, I = 6, K = 7 …). Did you mean K or I?',
        letterPos,
        letterPos + 1,
        ['K', 'I'],
      );
    } else if (MOLECULAR_LETTERS[letter]) {
      const fix = MOLECULAR_LETTERS[letter];
      return fail(
        'term-bad-letter',
        `${letter} labels a molecular state; atomic terms use ${fix} for the same angular momentum.`,
        letterPos,
        letterPos + 1,
        [fix],
      );
    } else if (/\p{L}/u.test(letter)) {
      return fail(
        'term-bad-letter',
        `${letter} is not an orbital letter. Letters run S, P, D, F, G, H, I, K, L, M, N, O, Q, R, T, U, V … for L = 0, 1, 2, …`,
        letterPos,
        letterPos + 1,
      );
    } else {
      return fail('term-malformed', 'Expected an orbital letter (S, P, D, F, …) after the multiplicity.', letterPos, letterPos + 1);
    }
  }

  // 3. parity mark right after the letter
  let parityRange: [number, number] | null = null;
  if (i < body.length && PARITY_MARKS.includes(body[i])) {
    parityRange = [i, i + 1];
    i++;
  }

  // 4. J: optional '_', optional braces, then digits [slash digits], or '½'
  let twoJ: number | null = null;
  let jRange: [number, number] | null = null;
  let underscore = false;
  if (body[i] === '_') {
    underscore = true;
    i++;
  }
  let braced = false;
  if (body[i] === '{') {
    braced = true;
    i++;
  }
  const jStart = i;
  if (i < body.length && (isDigitAny(body[i]) || body[i] === '½')) {
    const parsed = readJ(body, i);
    i = parsed.end;
    jRange = [jStart, parsed.end];
    if (parsed.kind === 'decimal') {
      const half = Math.round(parsed.value * 2);
      const exact = Math.abs(parsed.value * 2 - half) < 1e-9 && half >= 0;
      return fail(
        'term-j-decimal',
        exact
          ? `Write J as a fraction, not a decimal: ${formatJ(half, style)}.`
          : 'Write J as a whole number or a half-integer fraction such as 3/2.',
        jStart,
        parsed.end,
        exact ? [formatJ(half, style)] : undefined,
      );
    }
    if (parsed.kind === 'bad') {
      return fail('term-malformed', parsed.message, jStart, parsed.end);
    }
    if (parsed.twoJ === null) {
      return fail(
        'term-j-not-half-integer',
        `J = ${body.slice(jStart, parsed.end)} is not a whole number or a half-integer.`,
        jStart,
        parsed.end,
      );
    }
    twoJ = parsed.twoJ;
    if (parsed.unusual) {
      issues.push(
        issue(
          'term-j-unusual-fraction',
          `J is usually written ${formatJ(twoJ, style)}.`,
          at(jStart),
          at(parsed.end),
          'warning',
          [formatJ(twoJ, style)],
        ),
      );
    }
  } else if (underscore || braced) {
    return fail('term-malformed', 'Expected J (e.g. 3/2) here.', Math.max(0, jStart - 1), Math.min(body.length, jStart + 1));
  }
  if (braced) {
    if (body[i] !== '}') return fail('term-malformed', "Expected '}' to close J.", i, Math.min(body.length, i + 1));
    i++;
  }

  // 5. parity mark after J (some write 2P3/2°)
  if (parityRange === null && twoJ !== null && i < body.length && PARITY_MARKS.includes(body[i])) {
    parityRange = [i, i + 1];
    i++;
  }

  // 6. nothing may follow
  if (i < body.length) {
    return fail('term-malformed', `Unexpected "${body.slice(i)}" after the term symbol.`, i, body.length);
  }

  // ---- validation ----
  const multRange: [number, number] = [multStart, multEnd];
  if (multiplicity < 1) {
    return fail('term-bad-multiplicity', 'The multiplicity 2S+1 is at least 1.', ...multRange, ['1']);
  }
  if (multiplicity > MAX_MULTIPLICITY) {
    return fail('term-bad-multiplicity', `A multiplicity of ${multiplicity} is far beyond any atom (at most ${MAX_MULTIPLICITY} here).`, ...multRange);
  }
  const twoS = multiplicity - 1;
  if (twoJ !== null && jRange) {
    const allowed = allowedJ(twoS, L);
    const allowedText = allowed.map((j) => formatJ(j, 'ascii'));
    const allowedFixes = allowed.map((j) => formatJ(j, style));
    const label = formatTermLabel(twoS, L);
    if ((twoJ - twoS) % 2 !== 0) {
      const sText = formatHalfInteger(twoS);
      const kind = twoS % 2 === 0 ? 'a whole number' : 'a half-integer';
      issues.push(
        issue(
          'term-j-parity-of-spin',
          `Multiplicity ${multiplicity} means S = ${sText}, so J must be ${kind}. For ${label}, J can be ${listWords(allowedText)}.`,
          at(jRange[0]),
          at(jRange[1]),
          'error',
          allowedFixes,
        ),
      );
    } else if (!allowed.includes(twoJ)) {
      issues.push(
        issue(
          'term-j-out-of-range',
          `J = ${formatJ(twoJ)} is impossible for ${label} (S = ${formatHalfInteger(twoS)}, L = ${L}): J runs from |L − S| to L + S, so ${listWords(allowedText)}.`,
          at(jRange[0]),
          at(jRange[1]),
          'error',
          allowedFixes,
        ),
      );
    }
  }

  const hasError = issues.some((x) => x.severity === 'error');
  const term: TermSymbol | null = hasError
    ? null
    : { multiplicity, twoS, L, twoJ, parityMark: parityRange ? 'odd' : null, text: body };
  const detail: TermParseDetail = {
    start: at(0),
    end: at(body.length),
    parityRange: parityRange ? [at(parityRange[0]), at(parityRange[1])] : null,
    jRange: jRange ? [at(jRange[0]), at(jRange[1])] : null,
    style,
  };
  return { term, issues, detail };
}

// ---------------------------------------------------------------------------------------
// Helpers
// ---------------------------------------------------------------------------------------

type JRead =
  | { kind: 'ok'; end: number; twoJ: number | null; unusual: boolean }
  | { kind: 'decimal'; end: number; value: number }
  | { kind: 'bad'; end: number; message: string };

/** Read J starting at i: 'n', 'n/m', '½', or a decimal (reported). */
function readJ(s: string, i: number): JRead {
  if (s[i] === '½') return { kind: 'ok', end: i + 1, twoJ: 1, unusual: false };
  let num = '';
  while (i < s.length && isDigitAny(s[i])) num += digitValue(s[i++]);
  if ((s[i] === '.' || s[i] === ',') && isDigitAny(s[i + 1] ?? '')) {
    let frac = '';
    i++;
    while (i < s.length && isDigitAny(s[i])) frac += digitValue(s[i++]);
    return { kind: 'decimal', end: i, value: Number(`${num}.${frac}`) };
  }
  if (i < s.length && SLASHES.includes(s[i])) {
    let den = '';
    i++;
    while (i < s.length && isDigitAny(s[i])) den += digitValue(s[i++]);
    if (den.length === 0) return { kind: 'bad', end: i, message: "Expected a denominator after '/' in J (e.g. 3/2)." };
    const n = Number(num);
    const d = Number(den);
    if (d === 0) return { kind: 'bad', end: i, message: 'J has a zero denominator.' };
    if ((2 * n) % d !== 0) return { kind: 'ok', end: i, twoJ: null, unusual: false };
    // canonical: n/2 with n odd; anything else (4/2, 3/1, 6/4) is exact but unusual
    return { kind: 'ok', end: i, twoJ: (2 * n) / d, unusual: !(d === 2 && n % 2 === 1) };
  }
  return { kind: 'ok', end: i, twoJ: 2 * Number(num), unusual: false };
}

function isSubscriptDigit(c: string): boolean {
  return SUBSCRIPT_DIGITS.includes(c);
}
function isDigitAny(c: string): boolean {
  return (c >= '0' && c <= '9') || (c.length === 1 && (SUPERSCRIPT_DIGITS.includes(c) || SUBSCRIPT_DIGITS.includes(c)));
}
/** '7', '⁷' or '₇' → '7' */
function digitValue(c: string): string {
  if (c >= '0' && c <= '9') return c;
  const sup = SUPERSCRIPT_DIGITS.indexOf(c);
  if (sup >= 0) return String(sup);
  return String(SUBSCRIPT_DIGITS.indexOf(c));
}

/** Superscript/subscript/ASCII digit helpers shared with the configuration parser. */
export const digitChars = { isDigitAny, isSubscriptDigit, digitValue, SUPERSCRIPT_DIGITS };

export function issue(
  code: string,
  message: string,
  start: number,
  end: number,
  severity: 'error' | 'warning' = 'error',
  suggestions?: string[],
): TextIssue {
  const out: TextIssue = { code, message, start, end, severity };
  if (suggestions && suggestions.length > 0) out.suggestions = suggestions;
  return out;
}

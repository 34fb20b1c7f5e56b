/**
 * Electron configurations ('1s2 2s2 2p6 3s', '[Ne] 3s', '4f7 6s2', '2s.2p', '1s²2s²2p⁶')
 * and level designations (an optional configuration followed by a term symbol:
 * '3p 2P°3/2', '4f7 6s2 8S7/2', '2P3/2').
 *
 * Subshells are separated by spaces or dots; the occupancy follows the letter as ASCII
 * digits (optionally after '^') or superscript digits, and defaults to 1. Subshells may run
 * together when that is unambiguous: '6s6p' is 6s 6p (one digit between two letters can only be
 * the next n); '1s22s' is an error whose fix is the one split that fits, '1s2 2s'. A noble-gas core in
 * brackets may come first. Offsets in issues and subshells are UTF-16 offsets into the text
 * passed in. Nothing here throws; the configuration is non-null exactly when no issue of
 * severity 'error' was found.
 */
import { LSTerm, subshellCapacity, termsOfConfiguration } from './lsTerms';
import {
  allowedJ,
  digitChars,
  formatJ,
  formatTermLabel,
  issue,
  letterToL,
  orbitalLetter,
  Parity,
  NotationStyle,
  parseTermSymbolAt,
  TermParseDetail,
  TermSymbol,
  TextIssue,
  toSuperscript,
} from './termSymbol';

export interface Subshell {
  n: number;
  l: number;
  occupancy: number;
  /** [start, end) of this subshell's text */
  start: number;
  end: number;
}

export interface Configuration {
  /** subshells as written (the core's subshells are not listed here; see coreSubshells) */
  subshells: Subshell[];
  /** noble-gas core symbol such as 'Ne', or null */
  core: string | null;
  parity: Parity;
  /** the configuration as written, surrounding whitespace removed */
  text: string;
}

/** Closed subshells of each noble-gas core, as n-l-occupancy triples (from memory; standard). */
const CORE_SHELLS: Record<string, [number, number, number][]> = {
  He: [[1, 0, 2]],
  Ne: [[1, 0, 2], [2, 0, 2], [2, 1, 6]],
  Ar: [[1, 0, 2], [2, 0, 2], [2, 1, 6], [3, 0, 2], [3, 1, 6]],
  Kr: [[1, 0, 2], [2, 0, 2], [2, 1, 6], [3, 0, 2], [3, 1, 6], [3, 2, 10], [4, 0, 2], [4, 1, 6]],
  Xe: [
    [1, 0, 2], [2, 0, 2], [2, 1, 6], [3, 0, 2], [3, 1, 6], [3, 2, 10], [4, 0, 2], [4, 1, 6],
    [4, 2, 10], [5, 0, 2], [5, 1, 6],
  ],
  Rn: [
    [1, 0, 2], [2, 0, 2], [2, 1, 6], [3, 0, 2], [3, 1, 6], [3, 2, 10], [4, 0, 2], [4, 1, 6],
    [4, 2, 10], [5, 0, 2], [5, 1, 6], [4, 3, 14], [5, 2, 10], [6, 0, 2], [6, 1, 6],
  ],
};

export const NOBLE_GAS_CORES = Object.keys(CORE_SHELLS);

/** The closed subshells inside a core ('Ne' → 1s2 2s2 2p6); [] for an unknown name. */
export function coreSubshells(core: string): { n: number; l: number; occupancy: number }[] {
  return (CORE_SHELLS[core] ?? []).map(([n, l, occupancy]) => ({ n, l, occupancy }));
}

/** Parity (−1)^(Σ l over all electrons); closed subshells and cores are even. */
export function configurationParity(c: Pick<Configuration, 'subshells'>): Parity {
  const sum = c.subshells.reduce((s, x) => s + x.l * x.occupancy, 0);
  return sum % 2 === 0 ? 'even' : 'odd';
}

/** Subshells that are neither empty nor full. */
export function openSubshells(c: Configuration): Subshell[] {
  return c.subshells.filter((s) => s.occupancy > 0 && s.occupancy < subshellCapacity(s.l));
}

/** '1s2 2s2 2p6 3s' (ascii) or '1s² 2s² 2p⁶ 3s' (unicode); a core is written first. */
export function formatConfiguration(c: Configuration, style: 'ascii' | 'unicode' = 'ascii'): string {
  const parts = c.core ? [`[${c.core}]`] : [];
  for (const s of c.subshells) {
    const occ = s.occupancy === 1 ? '' : String(s.occupancy);
    parts.push(`${s.n}${orbitalLetter(s.l).toLowerCase()}${style === 'unicode' ? toSuperscript(occ) : occ}`);
  }
  return parts.join(' ');
}

export function parseConfiguration(text: string): { configuration: Configuration | null; issues: TextIssue[] } {
  return parseConfigurationAt(text, 0);
}

/** Parse a configuration that sits at `base` in a larger text (offsets are in that text). */
export function parseConfigurationAt(
  text: string,
  base: number,
): { configuration: Configuration | null; issues: TextIssue[] } {
  const issues: TextIssue[] = [];
  const subshells: Subshell[] = [];
  let core: string | null = null;
  let coreEnd = -1;
  let needSeparator = false;
  let sawSubshell = false;
  let i = 0;
  const bail = (message: string, s: number, e: number) => {
    issues.push(issue('config-malformed', message, base + s, base + e));
    return { configuration: null, issues };
  };

  while (i < text.length) {
    const c = text[i];
    if (/\s/.test(c) || c === '.') {
      needSeparator = false;
      i++;
      continue;
    }
    if (needSeparator) {
      return bail("Put a space or '.' between subshells (e.g. 2s2 2p).", i, tokenEnd(text, i));
    }
    if (c === '[') {
      const close = text.indexOf(']', i);
      if (close < 0) return bail("The '[' of the core is never closed.", i, text.length);
      if (coreEnd >= 0 || sawSubshell) {
        return bail('A noble-gas core such as [Ne] can only come first.', i, close + 1);
      }
      const name = text.slice(i + 1, close).trim();
      const known = NOBLE_GAS_CORES.find((k) => k === name);
      if (known) {
        core = known;
      } else {
        const caseFix = NOBLE_GAS_CORES.find((k) => k.toLowerCase() === name.toLowerCase());
        issues.push(
          issue(
            'config-unknown-core',
            caseFix
              ? `Unknown core [${name}]; did you mean [${caseFix}]?`
              : `Unknown core [${name}]. Known cores: ${NOBLE_GAS_CORES.map((k) => `[${k}]`).join(' ')}.`,
            base + i,
            base + close + 1,
            'error',
            caseFix ? [`[${caseFix}]`] : NOBLE_GAS_CORES.map((k) => `[${k}]`),
          ),
        );
      }
      coreEnd = close + 1;
      i = close + 1;
      continue;
    }
    if (c >= '0' && c <= '9') {
      const start = i;
      let nText = '';
      while (i < text.length && text[i] >= '0' && text[i] <= '9') nText += text[i++];
      const letterPos = i;
      const letter = text[i] ?? '';
      if (!/\p{L}/u.test(letter)) {
        return bail(`Expected an orbital letter (s, p, d, f, …) after ${nText}.`, start, Math.min(text.length, i + 1));
      }
      i++;
      let l = letterToL(letter.toUpperCase());
      if (letter.toUpperCase() === 'J' || l === null) {
        issues.push(
          issue(
            'config-bad-letter',
            letter.toUpperCase() === 'J'
              ? 'j is not an orbital letter: the sequence skips it (… h, i, k …).'
              : `${letter} is not an orbital letter. Letters run s, p, d, f, g, h, i, k, … for l = 0, 1, 2, …`,
            base + letterPos,
            base + letterPos + 1,
          ),
        );
        l = -1;
      } else if (letter !== letter.toLowerCase()) {
        issues.push(
          issue(
            'config-uppercase-letter',
            `Subshell letters are lower case in a configuration: ${letter.toLowerCase()}.`,
            base + letterPos,
            base + letterPos + 1,
            'warning',
            [letter.toLowerCase()],
          ),
        );
      }
      // occupancy
      if (text[i] === '^') i++;
      const occStart = i;
      let occText = '';
      // all ASCII or all superscript: in '1s²2s²' the '2' after '²' starts the next subshell
      const superscript = isSuperscriptDigit(text[i] ?? '');
      const isOccDigit = superscript ? isSuperscriptDigit : isAsciiDigit;
      while (i < text.length && isOccDigit(text[i])) occText += digitChars.digitValue(text[i++]);
      let occEnd = i;
      let glued = false;
      const n = Number(nText);
      if (!superscript && occText.length > 0 && text[occStart - 1] !== '^' && /\p{L}/u.test(text[i] ?? '')) {
        // Digits glued to a following letter start the next subshell, at least in part ('6s6p').
        const split = runTogetherSplit(occText, letterToL(letter.toUpperCase()) ?? -1, letterToL((text[i] ?? '').toUpperCase()) ?? -1);
        if (occText.length > 1) {
          const whole = text.slice(start, i + 1);
          const fixes = split.map((k) => `${whole.slice(0, occStart - start + k)} ${whole.slice(occStart - start + k)}`);
          if (fixes.length !== 1) {
            return bail(`'${whole}' runs two subshells together; put a space or '.' between them (e.g. 1s2 2s).`, start, i + 1);
          }
          issues.push(issue('config-malformed', `'${whole}' runs two subshells together; put a space between them: ${fixes[0]}.`, base + start, base + i + 1, 'error', fixes));
        }
        // One digit can only be the next n (occupancy 1 implied); several are read as the one split that fits.
        const keep = occText.length > 1 && split.length === 1 ? split[0]! : 0;
        occText = occText.slice(0, keep);
        i = occStart + keep;
        occEnd = i;
        glued = true;
      }
      const occupancy = occText.length > 0 ? Number(occText) : 1;
      needSeparator = !superscript && !glued;
      sawSubshell = true;
      if (l < 0) continue;

      const shell: Subshell = { n, l, occupancy, start: base + start, end: base + occEnd };
      const name = `${n}${orbitalLetter(l).toLowerCase()}`;
      if (l >= n) {
        const allowedLetters = Array.from({ length: Math.max(0, n) }, (_, k) => orbitalLetter(k).toLowerCase());
        issues.push(
          issue(
            'config-l-not-below-n',
            n < 1
              ? 'The principal quantum number n starts at 1.'
              : `${name} does not exist: l must be less than n (for n = ${n}: ${allowedLetters.join(', ')}).`,
            base + start,
            base + letterPos + 1,
          ),
        );
      }
      const cap = subshellCapacity(l);
      if (occupancy > cap) {
        issues.push(
          issue(
            'config-occupancy-too-large',
            `${name} holds at most ${cap} electrons (4l+2 with l = ${l}), not ${occupancy}.`,
            base + occStart,
            base + occEnd,
            'error',
            [String(cap)],
          ),
        );
      } else if (occupancy === 0) {
        issues.push(issue('config-empty-subshell', `${name}0 holds no electrons; it can be left out.`, base + start, base + occEnd, 'warning'));
      }
      if (subshells.some((s) => s.n === n && s.l === l)) {
        issues.push(issue('config-duplicate-subshell', `${name} appears twice; give its electrons once (e.g. ${name}2).`, base + start, base + occEnd));
      } else if (core && coreSubshells(core).some((s) => s.n === n && s.l === l)) {
        issues.push(issue('config-subshell-in-core', `${name} is already full inside the [${core}] core.`, base + start, base + occEnd));
      }
      subshells.push(shell);
      continue;
    }
    return bail(`Unexpected "${c}" in the electron configuration.`, i, i + 1);
  }

  if (!sawSubshell && coreEnd < 0) {
    return bail('Expected an electron configuration such as 1s2 2s2 2p.', 0, text.length);
  }
  const hasError = issues.some((x) => x.severity === 'error');
  if (hasError) return { configuration: null, issues };
  return {
    configuration: { subshells, core, parity: configurationParity({ subshells }), text: text.trim() },
    issues,
  };
}

// ---------------------------------------------------------------------------------------
// Level designation: [configuration] term
// ---------------------------------------------------------------------------------------

/** Longest list of allowed terms spelled out in a message. */
const MAX_TERMS_IN_MESSAGE = 16;

/**
 * Parse '3p 2P°3/2', '4f7 6s2 8S7/2' or a bare term '2P3/2', and cross-check the parts:
 * a parity mark against the configuration's parity ('term-parity-mismatch'), and the term
 * against the terms the configuration allows ('term-not-in-configuration').
 * The configuration and term are returned as parsed on their own; cross-check issues are
 * reported but do not null them. A missing parity mark on an odd configuration is accepted.
 */
export function parseLevelDesignation(text: string): {
  configuration: Configuration | null;
  term: TermSymbol | null;
  issues: TextIssue[];
} {
  const issues: TextIssue[] = [];
  const tokens = [...text.matchAll(/\S+/g)].map((m) => ({ text: m[0], start: m.index ?? 0 }));
  if (tokens.length === 0) {
    issues.push(issue('level-empty', 'Expected a level such as 3p 2P°3/2 or 2P3/2.', 0, text.length));
    return { configuration: null, term: null, issues };
  }
  const last = tokens[tokens.length - 1];
  const termToken = looksLikeTerm(last.text) ? last : null;
  const configText = termToken ? text.slice(0, termToken.start) : text;

  let configuration: Configuration | null = null;
  if (configText.trim().length > 0) {
    const parsed = parseConfigurationAt(configText, 0);
    configuration = parsed.configuration;
    issues.push(...parsed.issues);
  }

  let term: TermSymbol | null = null;
  if (termToken) {
    const parsed = parseTermSymbolAt(termToken.text, termToken.start);
    term = parsed.term;
    issues.push(...parsed.issues);
    if (term && configuration && parsed.detail) {
      issues.push(...crossCheck(configuration, term, termToken.text.trim(), parsed.detail));
    }
  } else {
    const fixes = configuration
      ? termSuggestions(termsOfConfiguration(configuration), null, configuration.parity === 'odd' ? '°' : null, 'ascii')
      : [];
    issues.push(
      issue(
        'level-missing-term',
        'A level needs a term symbol after the configuration, e.g. 3p 2P°3/2.',
        last.start,
        last.start + last.text.length,
        'error',
        fixes.map((f) => `${last.text} ${f}`),
      ),
    );
  }
  return { configuration, term, issues };
}

function crossCheck(c: Configuration, t: TermSymbol, termText: string, d: TermParseDetail): TextIssue[] {
  const out: TextIssue[] = [];
  if (t.parityMark === 'odd' && c.parity === 'even' && d.parityRange) {
    out.push(
      issue(
        'term-parity-mismatch',
        `${c.text} has even parity (the sum of l over its electrons is even), but the term is marked odd.`,
        d.parityRange[0],
        d.parityRange[1],
        'error',
        [''],
      ),
    );
  }
  const allowed = termsOfConfiguration(c);
  if (!allowed.some((a) => a.twoS === t.twoS && a.L === t.L)) {
    const labels = allowed.map((a) => formatTermLabel(a.twoS, a.L) + (a.count > 1 ? ` (×${a.count})` : ''));
    const shown = labels.slice(0, MAX_TERMS_IN_MESSAGE).join(', ') + (labels.length > MAX_TERMS_IN_MESSAGE ? `, … (${labels.length} terms)` : '');
    // keep the user's own parity mark character ('°', 'o', '*') in the fixes
    const mark = d.parityRange ? termText[d.parityRange[0] - d.start] : null;
    out.push(
      issue(
        'term-not-in-configuration',
        `${formatTermLabel(t.twoS, t.L)} cannot arise from ${c.text}. Allowed terms: ${shown}.`,
        d.start,
        d.end,
        'error',
        termSuggestions(allowed, t.twoJ, mark, d.style),
      ),
    );
  }
  return out;
}

/**
 * Fix-its: the allowed terms that can have the user's J, with that J; if none can, every
 * allowed level. Spelled in the user's style with their parity mark (or none).
 */
function termSuggestions(allowed: LSTerm[], twoJ: number | null, mark: string | null, style: NotationStyle): string[] {
  const out: string[] = [];
  const keepJ = twoJ !== null && allowed.some((a) => allowedJ(a.twoS, a.L).includes(twoJ));
  for (const a of allowed) {
    const js = allowedJ(a.twoS, a.L);
    const pick = keepJ ? js.filter((j) => j === twoJ) : js;
    for (const j of pick) {
      const mult = String(a.twoS + 1);
      out.push(`${style === 'unicode' ? toSuperscript(mult) : mult}${orbitalLetter(a.L)}${mark ?? ''}${formatJ(j, style)}`);
    }
  }
  return out.slice(0, 24);
}

/** Does the last word of a level look like a term symbol rather than a subshell? */
function looksLikeTerm(word: string): boolean {
  // Capital (or molecular) letter after an optional multiplicity: 2P3/2, ²P₃/₂, ^2P, P3/2 …
  if (/^\^?(\{\d+\}|\d+|[⁰¹²³⁴⁵⁶⁷⁸⁹]+)?[A-ZΣΠΔΦΓ]/u.test(word)) return true;
  // Lower-case letter but clearly a term: has a fractional J, '_' or a parity mark: 2p3/2, 2p°1/2
  return /^\^?\d+[a-z]([°º˚ᵒ*]|_|.*[/⁄∕])/u.test(word);
}

// ---------------------------------------------------------------------------------------
// Small helpers
// ---------------------------------------------------------------------------------------

function isAsciiDigit(c: string): boolean {
  return c >= '0' && c <= '9';
}
function isSuperscriptDigit(c: string): boolean {
  return digitChars.SUPERSCRIPT_DIGITS.includes(c);
}
/**
 * Where a digit run glued between two subshell letters can be split into an occupancy and the
 * next n ('22' in '1s22s' → 1: '1s2 2s'): the occupancy fits the first subshell, n has no
 * leading zero and exceeds the second subshell's l.
 */
function runTogetherSplit(digits: string, l1: number, l2: number): number[] {
  const out: number[] = [];
  for (let k = 1; k < digits.length; k++) {
    const occ = Number(digits.slice(0, k));
    const nText = digits.slice(k);
    if (nText.startsWith('0') || occ < 1 || (l1 >= 0 && occ > subshellCapacity(l1))) continue;
    if (l2 >= 0 && Number(nText) <= l2) continue;
    out.push(k);
  }
  return out;
}

/** End of the current word (for underlining a run-together token). */
function tokenEnd(text: string, i: number): number {
  let j = i;
  while (j < text.length && !/\s/.test(text[j]) && text[j] !== '.') j++;
  return Math.max(j, i + 1);
}

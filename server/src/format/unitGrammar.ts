/**
 * Sublevel's own unit grammar and unit-name table (no mathjs here).
 *
 *   unit  := ["1/"] term (op term)*          op: `*`, `·`, `⋅` or `/` (left to right)
 *   term  := name [power]
 *   power := "^" int | "^(" int ")" | "-" digits | superscript digits (`cm⁻¹`)
 *   name  := letters, `_`, `%`, `°`, `℃`; or `a0` / `a₀` (the Bohr radius)
 *
 * A name is a symbol with an optional SI prefix (`mT`, `µm`, `GHz`), a long name with an optional
 * long prefix (`millitesla`), or one of the special names below. `G` alone is the gauss; as a
 * prefix (`GHz`) it is giga, which is unambiguous because a prefix never stands alone.
 */

export interface UnitTerm {
  /** The name as written. */
  name: string;
  power: number;
  /** Offsets of the name within the unit text. */
  start: number;
  end: number;
}

export type UnitSyntax = { ok: true; terms: UnitTerm[] } | { ok: false; message: string; start: number; end: number };

const NAME_CHAR = /[\p{L}_%°\u2103]/u;
const SUPERSCRIPT_DIGITS = '⁰¹²³⁴⁵⁶⁷⁸⁹';

function isDigit(ch: string | undefined): boolean {
  return ch !== undefined && ch >= '0' && ch <= '9';
}

/** Reads an integer at text[i]; returns [value, next index] or undefined. */
function readInt(text: string, i: number, allowPlus: boolean): [number, number] | undefined {
  let j = i;
  let sign = 1;
  if (text[j] === '-' || (allowPlus && text[j] === '+')) {
    sign = text[j] === '-' ? -1 : 1;
    j++;
  }
  const from = j;
  while (isDigit(text[j])) j++;
  if (j === from || j - from > 3) return undefined;
  return [sign * Number(text.slice(from, j)), j];
}

function readSuperscript(text: string, i: number): [number, number] | undefined {
  let j = i;
  let sign = 1;
  if (text[j] === '⁻' || text[j] === '⁺') {
    sign = text[j] === '⁻' ? -1 : 1;
    j++;
  }
  let digits = '';
  while (j < text.length && SUPERSCRIPT_DIGITS.includes(text[j]!)) digits += SUPERSCRIPT_DIGITS.indexOf(text[j++]!);
  if (digits === '' || digits.length > 3) return undefined;
  return [sign * Number(digits), j];
}

function readPower(text: string, i: number): [number, number] | { error: string } | undefined {
  const ch = text[i];
  if (ch === '^') {
    const paren = text[i + 1] === '(';
    const r = readInt(text, i + (paren ? 2 : 1), true);
    if (!r) return { error: "'^' must be followed by a whole number, as in cm^-1" };
    if (paren) {
      if (text[r[1]] !== ')') return { error: "missing ')' after the power" };
      return [r[0], r[1] + 1];
    }
    return r;
  }
  if (ch === '-' && isDigit(text[i + 1])) return readInt(text, i, false);
  if (ch !== undefined && (ch === '⁻' || ch === '⁺' || SUPERSCRIPT_DIGITS.includes(ch))) {
    return readSuperscript(text, i) ?? { error: 'a superscript sign must be followed by superscript digits' };
  }
  return undefined;
}

/** Splits unit text into named terms with powers; never throws. */
export function parseUnitSyntax(text: string): UnitSyntax {
  if (text.length === 0) return { ok: false, message: 'empty unit', start: 0, end: 0 };
  let i = 0;
  let sign = 1;
  if (text.startsWith('1/')) {
    sign = -1;
    i = 2;
  }
  const terms: UnitTerm[] = [];
  for (;;) {
    const start = i;
    while (i < text.length && NAME_CHAR.test(text[i]!)) i++;
    // The Bohr radius a0 (a₀) is the one name with a digit in it.
    if (i === start + 1 && text[start] === 'a' && (text[i] === '0' || text[i] === '₀')) i++;
    if (i === start) {
      const what = i < text.length ? `'${text[i]}'` : 'the end';
      return { ok: false, message: `expected a unit name, found ${what}`, start: i, end: Math.min(text.length, i + 1) };
    }
    const name = text.slice(start, i);
    const end = i;
    let power = 1;
    const p = readPower(text, i);
    if (p && 'error' in p) return { ok: false, message: p.error, start: i, end: text.length };
    if (p) {
      [power, i] = p;
      if (power === 0) return { ok: false, message: 'a power of 0 makes no sense in a unit', start: end, end: i };
    }
    terms.push({ name, power: sign * power, start, end });
    if (i >= text.length) return { ok: true, terms };
    const op = text[i]!;
    if (op === '/') sign = -1;
    else if (op === '*' || op === '·' || op === '⋅') sign = 1;
    else return { ok: false, message: `unexpected '${op}' in a unit`, start: i, end: i + 1 };
    i++;
    if (i >= text.length) return { ok: false, message: `a unit cannot end with '${op}'`, start: i - 1, end: i };
  }
}

/** Special names: no prefixes. Values are the names used with the unit library. */
export const SPECIAL_NAMES: Readonly<Record<string, string>> = {
  u: 'u',
  Da: 'Da',
  muN: 'muN',
  'μN': 'muN', // Greek small mu
  'µN': 'muN', // micro sign: in this format μN always means the nuclear magneton
  muB: 'muB',
  'μB': 'muB',
  'µB': 'muB',
  '%': 'percent',
  degC: 'degC',
  '°C': 'degC',
  '\u2103': 'degC', // ℃
  'Ω': 'ohm',
  a0: 'a0',
  'a₀': 'a0',
  bohr: 'a0',
};

/** Symbols that take SI prefixes. `G` is the gauss. */
export const SYMBOLS: Readonly<Record<string, string>> = {
  m: 'm',
  g: 'g',
  s: 's',
  A: 'A',
  K: 'K',
  mol: 'mol',
  Hz: 'Hz',
  N: 'N',
  Pa: 'Pa',
  J: 'J',
  W: 'W',
  C: 'C',
  V: 'V',
  T: 'T',
  G: 'G',
  eV: 'eV',
  Wb: 'Wb',
  rad: 'rad',
  ohm: 'ohm',
  'Ω': 'ohm',
};

/** Long names that take long prefixes (`millitesla`, `kilogauss`). */
export const LONG_NAMES: Readonly<Record<string, string>> = {
  meter: 'meter',
  metre: 'meter',
  second: 'second',
  gram: 'gram',
  kelvin: 'kelvin',
  hertz: 'hertz',
  tesla: 'tesla',
  gauss: 'gauss',
  joule: 'joule',
  electronvolt: 'electronvolt',
  volt: 'volt',
  ampere: 'ampere',
  newton: 'newton',
  watt: 'watt',
};

const SHORT_PREFIXES: Readonly<Record<string, string>> = {
  Q: 'Q', R: 'R', Y: 'Y', Z: 'Z', E: 'E', P: 'P', T: 'T', G: 'G', M: 'M', k: 'k', h: 'h', da: 'da',
  d: 'd', c: 'c', m: 'm', u: 'u', 'µ': 'u', 'μ': 'u', n: 'n', p: 'p', f: 'f', a: 'a', z: 'z', y: 'y', r: 'r', q: 'q',
};

const LONG_PREFIXES: readonly string[] = [
  'exa', 'peta', 'tera', 'giga', 'mega', 'kilo', 'hecto', 'deca', 'deci', 'centi', 'milli', 'micro', 'nano', 'pico', 'femto', 'atto',
];

const SYMBOLS_LONGEST_FIRST = Object.keys(SYMBOLS).sort((a, b) => b.length - a.length);
const LONG_NAMES_LONGEST_FIRST = Object.keys(LONG_NAMES).sort((a, b) => b.length - a.length);

/**
 * The unit library's name for a unit name as written (`µm` → `um`, `%` → `percent`),
 * or undefined when the name is not in the table.
 */
export function canonicalUnitName(name: string): string | undefined {
  const direct = SPECIAL_NAMES[name] ?? SYMBOLS[name] ?? LONG_NAMES[name];
  if (direct) return direct;
  for (const base of SYMBOLS_LONGEST_FIRST) {
    if (name.length > base.length && name.endsWith(base)) {
      const prefix = SHORT_PREFIXES[name.slice(0, name.length - base.length)];
      if (prefix) return prefix + SYMBOLS[base]!;
    }
  }
  for (const base of LONG_NAMES_LONGEST_FIRST) {
    if (name.length > base.length && name.endsWith(base)) {
      const prefix = name.slice(0, name.length - base.length);
      if (LONG_PREFIXES.includes(prefix)) return prefix + LONG_NAMES[base]!;
    }
  }
  return undefined;
}

/** Every name canonicalUnitName can return: the names the unit table (unitTable.ts) is generated for. */
export function canonicalUnitNames(): string[] {
  const names = new Set<string>(Object.values(SPECIAL_NAMES));
  for (const symbol of new Set(Object.values(SYMBOLS))) {
    names.add(symbol);
    for (const prefix of new Set(Object.values(SHORT_PREFIXES))) names.add(prefix + symbol);
  }
  for (const long of new Set(Object.values(LONG_NAMES))) {
    names.add(long);
    for (const prefix of LONG_PREFIXES) names.add(prefix + long);
  }
  return [...names].sort();
}

/** Units with an offset (only allowed alone, with power 1). */
export function isOffsetUnit(canonical: string): boolean {
  return canonical === 'degC';
}

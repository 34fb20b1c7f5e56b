/**
 * Quantities: unit text is split by Sublevel's own grammar (unitGrammar.ts), each name is looked
 * up in our table, and the size and dimension of each name come from a table generated from
 * mathjs (unitTable.ts, read by unitLookup.ts). Document text is never handed to mathjs.
 *
 * Frequency-like values (level energies, hyperfine constants) are returned in Hz:
 * f = E/h for energies and f = c·σ for wave numbers, with the exact SI values of h and c.
 */
import type { Problem, Range, ValuePart } from './ast';
import { makeProblem } from './codes';
import { didYouMeanText, suggestNames } from './didYouMean';
import { isTooSmall, readNumberPrefix, TOO_SMALL } from './numbers';
import { canonicalUnitName, isOffsetUnit, parseUnitSyntax } from './unitGrammar';
import { BASE_DIMENSION_COUNT, unitEntry } from './unitLookup';
import { OFFSET_SCALES } from './unitTable';
import { convertExactly, decimalOf, exactFactor, ONE, factorTimes, inverse, plus, power, times, toNumber, UNIT_FACTOR, type Decimal, type ExactFactor } from './exactDecimal';
import { PLANCK_H, SPEED_OF_LIGHT } from '../physics/constants';
import { listWords } from '../physics/listWords';

export type Dimension =
  | 'flux-density'
  | 'gradient'
  | 'length'
  | 'temperature'
  | 'speed'
  | 'frequency-like' /* Hz, 1/m, J, eV */
  | 'mass'
  | 'moment'
  | 'dimensionless'
  | 'time'
  | 'area'
  | 'current'
  | 'magnetisation';

export interface QuantityReading {
  /** The value in SI units (Hz for frequency-like, J/T for moments, a plain fraction for %). */
  si?: number;
  /** The `0.35(2)` uncertainty converted to the same SI unit. */
  siUncertainty?: number;
  problem?: Problem;
}

// Sublevel's changes to mathjs' unit table (the gauss, u, muB, …) are in unitDefinitions.ts.

/** A unit reduced to an SI factor and a dimension vector (mathjs' base dimensions). */
interface UnitValue {
  /** The SI size of one of the unit as exact decimals (exactDecimal.ts), so conversion adds no noise. */
  exact: ExactFactor;
  dims: number[];
  /** Set for an offset unit standing alone (degC). */
  offsetUnit?: string;
}

type UnitEvaluation =
  | { ok: true; value: UnitValue }
  | { ok: false; code: 'unit-unknown' | 'unit-malformed'; message: string; start: number; end: number; suggestions?: string[] };

const MAX_POWER = 12;
const cache = new Map<string, UnitEvaluation>();
const CACHE_LIMIT = 1000;

function knownCanonical(name: string): string | undefined {
  const canonical = canonicalUnitName(name);
  return canonical !== undefined && unitEntry(canonical) !== undefined ? canonical : undefined;
}

/** True when the whole text is a unit Sublevel reads, e.g. `T/m`, `cm^-1`, `%`. */
export function isUnitText(text: string): boolean {
  return evaluateUnit(text).ok;
}

function evaluateUncached(text: string): UnitEvaluation {
  const syntax = parseUnitSyntax(text);
  if (!syntax.ok) return { ok: false, code: 'unit-malformed', message: syntax.message, start: syntax.start, end: syntax.end };
  const dims = new Array<number>(BASE_DIMENSION_COUNT).fill(0);
  let exact = UNIT_FACTOR;
  for (const term of syntax.terms) {
    const canonical = knownCanonical(term.name);
    if (canonical === undefined) {
      const suggestions = suggestUnitNames(term.name);
      return {
        ok: false,
        code: 'unit-unknown',
        message: `unknown unit '${clip(term.name)}'${didYouMeanText(suggestions)}`,
        start: term.start,
        end: term.end,
        suggestions,
      };
    }
    if (Math.abs(term.power) > MAX_POWER) {
      return { ok: false, code: 'unit-malformed', message: `the power ${term.power} is too large`, start: term.start, end: text.length };
    }
    if (isOffsetUnit(canonical)) {
      if (syntax.terms.length !== 1 || term.power !== 1) {
        return { ok: false, code: 'unit-malformed', message: `${term.name} cannot be combined with other units or powers; use K`, start: term.start, end: term.end };
      }
      return { ok: true, value: { exact: UNIT_FACTOR, dims: [...unitEntry(canonical)!.dims], offsetUnit: canonical } };
    }
    const one = unitEntry(canonical)!;
    const size = power(exactSize(canonical), Math.abs(term.power));
    exact = term.power > 0 ? factorTimes(exact, size) : factorTimes(exact, ONE, size);
    one.dims.forEach((d, i) => (dims[i] = (dims[i] ?? 0) + d * term.power));
  }
  return { ok: true, value: { exact, dims } };
}

/** Powers of ten of the SI prefixes, short and long (SI brochure). */
const PREFIX_EXPONENTS: Readonly<Record<string, number>> = {
  Q: 30, R: 27, Y: 24, Z: 21, E: 18, P: 15, T: 12, G: 9, M: 6, k: 3, h: 2, da: 1, d: -1, c: -2, m: -3, u: -6, n: -9, p: -12, f: -15, a: -18, z: -21, y: -24, r: -27, q: -30,
  exa: 18, peta: 15, tera: 12, giga: 9, mega: 6, kilo: 3, hecto: 2, deca: 1, deci: -1, centi: -2, milli: -3, micro: -6, nano: -9, pico: -12, femto: -15, atto: -18,
};

/**
 * One of a named unit in SI as an exact decimal: its base unit's size shifted by the prefix's
 * power of ten. The table's own size is a double product (mG = 1.0000000000000001e-7).
 */
function exactSize(canonical: string): Decimal {
  const entry = unitEntry(canonical)!;
  const exponent = PREFIX_EXPONENTS[entry.prefixName];
  const base = unitEntry(entry.unitName);
  if (entry.prefixName === '' || exponent === undefined || base === undefined) return decimalOf(entry.size);
  return times(decimalOf(base.size), { m: 1n, e: exponent });
}

function evaluateUnit(text: string): UnitEvaluation {
  let hit = cache.get(text);
  if (!hit) {
    hit = evaluateUncached(text);
    if (cache.size >= CACHE_LIMIT) cache.clear();
    cache.set(text, hit);
  }
  return hit;
}

/** Long names of the SI prefixes, for saying how a prefixed unit was read (SI brochure). */
const PREFIX_NAMES: Readonly<Record<string, string>> = {
  P: 'peta', T: 'tera', G: 'giga', M: 'mega', k: 'kilo', h: 'hecto', da: 'deca', d: 'deci', c: 'centi',
  m: 'milli', u: 'micro', n: 'nano', p: 'pico', f: 'femto',
};
/** Plural words for the base units a prefix can surprise on (`Gs`, `ms` meant as gauss, …). */
const UNIT_WORDS: Readonly<Record<string, string>> = {
  s: 'seconds', m: 'metres', g: 'grams', T: 'tesla', G: 'gauss', Hz: 'hertz', K: 'kelvin', J: 'joules', eV: 'electronvolts',
  A: 'amperes', N: 'newtons', W: 'watts', V: 'volts', Pa: 'pascals', C: 'coulombs', L: 'litres', l: 'litres', mol: 'moles', rad: 'radians',
};

/** 'gigaseconds, a time' for `Gs`: how a one-name unit with a prefix was read; undefined otherwise. */
function prefixedReading(text: string, value: UnitValue): string | undefined {
  const canonical = knownCanonical(text);
  if (canonical === undefined) return undefined;
  const entry = unitEntry(canonical)!;
  const prefix = PREFIX_NAMES[entry.prefixName];
  const word = UNIT_WORDS[entry.unitName];
  if (!prefix || !word) return undefined;
  const kind = (Object.keys(DIMENSIONS) as Dimension[]).find((d) => d !== 'dimensionless' && ACCEPTED_DIMS[d].some((ref) => sameDims(ref, value.dims)));
  const label = kind ? DIMENSIONS[kind].label : undefined;
  return `${prefix}${word}${label ? `, ${/^[aeiou]/.test(label) ? 'an' : 'a'} ${label}` : ''}`;
}

/**
 * The units to offer instead of one of the wrong dimension, nearest to what was written first:
 * `Gs` → G, a field unit for a gradient → the same unit per length (`T` → T/m). `preferred` is set
 * when one is clearly nearest (the written text starts with it, or it starts with the written text).
 */
function unitsNearest(written: string, expected: Dimension, value: UnitValue): { units: string[]; preferred?: string } {
  const units = [...DIMENSIONS[expected].examples];
  if (expected === 'gradient' && ACCEPTED_DIMS['flux-density'].some((ref) => sameDims(ref, value.dims))) {
    const perLength = `${written}/${/G$|gauss$/.test(written) ? 'cm' : 'm'}`;
    if (evaluateUnit(perLength).ok && !units.includes(perLength)) units.unshift(perLength);
  }
  const near = (u: string): boolean => written.startsWith(u) || u.startsWith(written) || written.toLowerCase() === u.toLowerCase();
  const nearest = units.filter(near).sort((a, b) => Math.abs(a.length - written.length) - Math.abs(b.length - written.length));
  const best = nearest[0];
  const tie = nearest[1] !== undefined && best !== undefined && Math.abs(nearest[1].length - written.length) === Math.abs(best.length - written.length);
  if (!best || tie) return { units };
  return { units: [best, ...units.filter((u) => u !== best)], preferred: best };
}

/** Dimension vector of a unit from our table; for building the reference list below. */
function dimsOf(text: string): number[] {
  const e = evaluateUnit(text);
  if (!e.ok) throw new Error(`internal unit table error: ${text}`);
  return e.value.dims;
}

function sameDims(a: number[], b: number[]): boolean {
  // A plain loop: every conversion and every number written back in its unit asks this.
  if (a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return false;
  return true;
}

/** How a frequency-like unit converts to Hz. */
type FrequencyBase = 'Hz' | 'per-m' | 'J';

interface DimensionInfo {
  label: string;
  examples: string[];
  /** Reference units with the right dimension. */
  accepts: string[];
}

const DIMENSIONS: Record<Dimension, DimensionInfo> = {
  'flux-density': { label: 'flux density', examples: ['T', 'mT', 'G'], accepts: ['T'] },
  gradient: { label: 'gradient', examples: ['T/m', 'G/cm'], accepts: ['T/m'] },
  length: { label: 'length', examples: ['m', 'cm', 'mm', 'um'], accepts: ['m'] },
  temperature: { label: 'temperature', examples: ['K', 'degC'], accepts: ['K'] },
  speed: { label: 'speed', examples: ['m/s', 'km/s'], accepts: ['m/s'] },
  'frequency-like': { label: 'frequency', examples: ['MHz', 'GHz', 'cm^-1', 'eV'], accepts: ['Hz', '1/m', 'J'] },
  mass: { label: 'mass', examples: ['u', 'Da', 'kg'], accepts: ['kg'] },
  moment: { label: 'magnetic moment', examples: ['muN', 'muB', 'J/T'], accepts: ['J/T'] },
  dimensionless: { label: 'fraction', examples: ['%'], accepts: ['%'] },
  time: { label: 'time', examples: ['s', 'ms', 'us'], accepts: ['s'] },
  area: { label: 'area', examples: ['a0^2', 'nm^2', 'pm^2'], accepts: ['m^2'] },
  current: { label: 'current', examples: ['A', 'mA', 'kA'], accepts: ['A'] },
  magnetisation: { label: 'magnetisation', examples: ['A/m', 'kA/m'], accepts: ['A/m'] },
};

const ACCEPTED_DIMS: Record<Dimension, number[][]> = Object.fromEntries(
  (Object.keys(DIMENSIONS) as Dimension[]).map((d) => [d, DIMENSIONS[d].accepts.map(dimsOf)]),
) as Record<Dimension, number[][]>;

const FREQUENCY_BASES: [FrequencyBase, number[]][] = [
  ['Hz', dimsOf('Hz')],
  ['per-m', dimsOf('1/m')],
  ['J', dimsOf('J')],
];

/** Unit names offered for completion and used for "did you mean", likeliest first. */
const COMMON_UNITS: readonly string[] = [
  'T', 'mT', 'uT', 'G', 'mG', 'kG', 'T/m', 'G/cm', 'T/cm', 'mT/m',
  'm', 'cm', 'mm', 'um', 'nm', 'km',
  'K', 'mK', 'uK', 'nK', 'degC',
  'm/s', 'km/s',
  'Hz', 'kHz', 'MHz', 'GHz', 'THz', 'cm^-1', '1/cm', 'eV', 'meV', 'ueV', 'J',
  'u', 'Da', 'kg', 'g',
  'muN', 'muB', 'J/T',
  '%',
  's', 'ms', 'us', 'ns',
  'a0^2',
  'A', 'mA', 'kA', 'A/m', 'kA/m',
  'tesla', 'gauss', 'kelvin', 'meter', 'metre', 'second', 'hertz', 'joule',
];
const SINGLE_NAMES = COMMON_UNITS.filter((u) => /^[\p{L}%]+$/u.test(u));

export function unitNames(): string[] {
  return [...COMMON_UNITS];
}

export function dimensionExamples(d: Dimension): string[] {
  return [...DIMENSIONS[d].examples];
}

/** Known unit names close to a misspelt one (`Mhz` → `MHz`). */
export function suggestUnitNames(name: string): string[] {
  return suggestNames(name, SINGLE_NAMES);
}

/**
 * True when a word standing after a number is probably a misspelt unit rather than a word
 * of the value (so `401.75 Mhz` is read as a quantity whose unit is then reported as unknown).
 */
export function looksLikeMisspeltUnit(word: string): boolean {
  if (word.length > 16) return false;
  // A degree sign before a letter (`°K`, `°F`) is a temperature unit typed another way.
  if (/^°\p{L}$/u.test(word)) return true;
  const syntax = parseUnitSyntax(word);
  // A broken compound such as `T//m` or `cm^` is still meant as a unit.
  if (!syntax.ok) return /^[\p{L}%°][\p{L}\d_%°·*/^⁻⁺⁰-⁹+-]*$/u.test(word) && /[/^*·]/.test(word);
  if (syntax.terms.length > 1 || word.includes('^') || word.startsWith('1/')) return true;
  const lower = word.toLowerCase();
  if (SINGLE_NAMES.some((u) => u.toLowerCase() === lower)) return true;
  return word.length >= 3 && suggestUnitNames(word).some((u) => Math.abs(u.length - word.length) <= 1);
}

function clip(text: string): string {
  return text.length > 40 ? `${text.slice(0, 37)}…` : text;
}

/** A range inside a one-line span, by offsets into its text. */
function subRange(range: Range, start: number, end: number): Range {
  return {
    start: { line: range.start.line, character: range.start.character + start },
    end: { line: range.start.line, character: range.start.character + end },
  };
}

const SPEED_OF_LIGHT_EXACT = decimalOf(SPEED_OF_LIGHT);
const PLANCK_H_EXACT = decimalOf(PLANCK_H);

/**
 * The exact factor from a unit to SI for the expected dimension (Hz for frequency-like: f = c·σ,
 * f = E/h), undefined for a unit of another dimension or an offset unit.
 */
function siFactor(unit: UnitValue, d: Dimension): ExactFactor | undefined {
  if (unit.offsetUnit || !ACCEPTED_DIMS[d].some((ref) => sameDims(ref, unit.dims))) return undefined;
  if (d !== 'frequency-like') return unit.exact;
  const base = FREQUENCY_BASES.find(([, dims]) => sameDims(dims, unit.dims))?.[0];
  if (base === 'per-m') return factorTimes(unit.exact, SPEED_OF_LIGHT_EXACT);
  if (base === 'J') return factorTimes(unit.exact, ONE, PLANCK_H_EXACT);
  return unit.exact;
}

/** A temperature scale's size and the kelvins of its zero (degC: 1 and 273.15), as exact decimals. */
function offsetScale(name: string): { size: Decimal; zero: Decimal } {
  const scale = OFFSET_SCALES[name];
  if (!scale) throw new Error(`internal unit table error: no offset scale ${name}`);
  const [unitSize, prefix, offset] = scale;
  return { size: times(decimalOf(unitSize), decimalOf(prefix)), zero: decimalOf(offset) };
}

/**
 * SI value of `value` written in a unit, times an exact constant `scale` (k_B to read a temperature
 * as an energy), converted once without noise; undefined for a unit of another dimension.
 */
function toSI(value: number, unit: UnitValue, d: Dimension, scale = 1): number | undefined {
  if (unit.offsetUnit) {
    if (d !== 'temperature') return undefined;
    const { size, zero } = offsetScale(unit.offsetUnit);
    return toNumber(times(times(plus(decimalOf(value), zero), size), decimalOf(scale)));
  }
  const f = siFactor(unit, d);
  if (f === undefined) return undefined;
  return convertExactly(value, scale === 1 ? f : factorTimes(f, decimalOf(scale)));
}

/**
 * What a frequency-like unit writes: a frequency (Hz, MHz), a wavenumber (cm^-1) or an energy (eV, J);
 * undefined for a unit of another dimension. Lets a message or a fix name each unit's own kind.
 */
export function frequencyKindOf(unitText: string): 'frequency' | 'wavenumber' | 'energy' | undefined {
  const e = evaluateUnit(unitText);
  if (!e.ok || e.value.offsetUnit) return undefined;
  const base = FREQUENCY_BASES.find(([, dims]) => sameDims(dims, e.value.dims))?.[0];
  return base === 'Hz' ? 'frequency' : base === 'per-m' ? 'wavenumber' : base === 'J' ? 'energy' : undefined;
}

/** Unit names (completion's list) whose dimension is the one expected. */
function unitNamesOf(expected: Dimension): string[] {
  return COMMON_UNITS.filter((name) => {
    const e = evaluateUnit(name);
    return e.ok && toSI(1, e.value, expected) !== undefined;
  });
}

/**
 * "Did you mean" names of the dimension the setting needs only: `8 CM` for a field once offered
 * `cm`, a fix that made a length of a field. With none left the message says what the setting takes.
 */
function fittingSuggestions(e: Extract<UnitEvaluation, { ok: false }>, unitText: string, expected: Dimension, label: string, examples: string): { message: string; suggestions: string[] } {
  const all = [...(e.suggestions ?? [])];
  if (e.code !== 'unit-unknown') return { message: e.message, suggestions: all };
  const fitsWhole = (name: string): boolean => {
    const whole = evaluateUnit(unitText.slice(0, e.start) + name + unitText.slice(e.end));
    return whole.ok && (expected === 'dimensionless' ? whole.value.dims.every((d) => d === 0) : toSI(1, whole.value, expected) !== undefined);
  };
  const fits = all.filter(fitsWhole);
  if (fits.length > 0 && fits.length === all.length) return { message: e.message, suggestions: all };
  const name = unitText.slice(e.start, e.end);
  // Nothing close among all units: look among those of the needed dimension only (`Tesla` → `tesla`).
  // `°K` is K with a degree sign the SI does not write.
  const withoutDegree = name.startsWith('°') ? [name.slice(1)].filter(fitsWhole) : [];
  const near = fits.length > 0 ? fits : withoutDegree.length > 0 ? withoutDegree : suggestNames(name, [...new Set([...DIMENSIONS[expected].examples, ...unitNamesOf(expected)])]).filter(fitsWhole);
  const message = near.length > 0 ? `unknown unit '${clip(name)}'${didYouMeanText(near)}` : `unknown unit '${clip(name)}': ${label} needs ${examples}`;
  return { message, suggestions: near };
}

/**
 * Reads one value part as a quantity of the expected dimension, in SI.
 * `what` names the setting in messages (default: the dimension, e.g. "gradient"). `scale` is an
 * exact constant the SI value is multiplied by in the same exact conversion (k_B or h to read a
 * trap's cut straight into joules), so no second rounding adds noise.
 */
export function readQuantity(part: ValuePart, expected: Dimension, what?: string, scale = 1): QuantityReading {
  const info = DIMENSIONS[expected];
  const label = what ?? info.label;
  const examples = listWords(info.examples);
  if (part.kind === 'number') {
    if (expected === 'dimensionless') {
      return { si: part.number.value, ...(part.number.uncertainty !== undefined ? { siUncertainty: part.number.uncertainty } : {}) };
    }
    return {
      problem: makeProblem('unit-missing', `${label} needs a unit such as ${examples}`, part.range, {
        data: { suggestions: info.examples.map((u) => `${part.text} ${u}`) },
      }),
    };
  }
  if (part.kind === 'word') {
    // Its number was reported where it was read; a second problem would say the same.
    if (part.unreadable) return {};
    const prefix = readNumberPrefix(part.text);
    if (prefix && prefix.reading.ok && prefix.length < part.text.length) {
      // A number glued to something that is not a unit we know, e.g. `401.75Mhz`.
      const unitText = part.text.slice(prefix.length);
      const e = evaluateUnit(unitText);
      if (!e.ok) {
        const f = fittingSuggestions(e, unitText, expected, label, examples);
        return {
          problem: makeProblem(e.code, f.message, subRange(part.range, prefix.length + e.start, prefix.length + e.end), {
            data: { suggestions: f.suggestions },
          }),
        };
      }
    }
    return {
      problem: makeProblem('unit-not-a-quantity', `${label} needs a number with a unit such as ${examples}, got '${clip(part.text)}'`, part.range),
    };
  }
  const e = evaluateUnit(part.unit.text);
  if (!e.ok) {
    const f = fittingSuggestions(e, part.unit.text, expected, label, examples);
    return {
      problem: makeProblem(e.code, f.message, subRange(part.unit.range, e.start, e.end), {
        data: { suggestions: f.suggestions },
      }),
    };
  }
  if (expected === 'dimensionless' && part.unit.text !== '%') {
    return {
      problem: makeProblem('unit-wrong-dimension', `${label} needs a plain number or %, got ${clip(part.unit.text)}`, part.unit.range),
    };
  }
  const si = toSI(part.number.value, e.value, expected, scale);
  if (si === undefined) {
    const readAs = prefixedReading(part.unit.text, e.value);
    const fixes = unitsNearest(part.unit.text, expected, e.value);
    return {
      problem: makeProblem('unit-wrong-dimension', `${label} needs ${examples}, got ${clip(part.unit.text)}${readAs ? ` (read as ${readAs})` : ''}`, part.unit.range, {
        data: { suggestions: fixes.units, ...(fixes.preferred ? { preferred: fixes.preferred } : {}) },
      }),
    };
  }
  if (!Number.isFinite(si)) {
    return { problem: makeProblem('syntax-bad-number', `${clip(part.text)} is too large to represent`, part.range) };
  }
  if (isTooSmall(si, part.number.value !== 0)) {
    return { problem: makeProblem('syntax-bad-number', `${clip(part.text)} ${TOO_SMALL}`, part.range) };
  }
  const reading: QuantityReading = { si };
  if (part.number.uncertainty !== undefined) {
    // Offset units (degC) only shift, so the uncertainty scales by their size; others scale linearly.
    const f = e.value.offsetUnit ? exactFactor(offsetScale(e.value.offsetUnit).size) : siFactor(e.value, expected)!;
    reading.siUncertainty = Math.abs(convertExactly(part.number.uncertainty, factorTimes(f, decimalOf(scale))));
  }
  return reading;
}

/**
 * The conversion of numbers written in `unitText` (a data file's column) to SI, made once and
 * applied to every cell without noise; undefined when the unit is unknown or of another dimension.
 */
export function converterToSI(d: Dimension, unitText: string): ((value: number) => number) | undefined {
  const e = evaluateUnit(unitText);
  if (!e.ok) return undefined;
  const unit = e.value;
  if (unit.offsetUnit) return d === 'temperature' ? (v) => toSI(v, unit, d)! : undefined;
  const f = siFactor(unit, d);
  return f === undefined ? undefined : (v) => convertExactly(v, f);
}

/**
 * Converts an SI value (Hz for frequency-like, K for temperature, a fraction for dimensionless)
 * into another unit for display, e.g. convertSI(0.18, 'gradient', 'G/cm') = 18.
 * Undefined when the unit is unknown or of another dimension.
 */
export function convertSI(valueSI: number, d: Dimension, unitText: string): number | undefined {
  if (d === 'dimensionless' && unitText === '') return valueSI;
  const e = evaluateUnit(unitText);
  if (!e.ok) return undefined;
  if (e.value.offsetUnit) {
    if (d !== 'temperature') return undefined;
    const { size, zero } = offsetScale(e.value.offsetUnit);
    if (!Number.isFinite(valueSI)) return valueSI;
    return toNumber(plus(decimalOf(valueSI), { m: -zero.m, e: zero.e }), size);
  }
  const f = siFactor(e.value, d);
  if (f === undefined || f.num.m === 0n) return undefined;
  return convertExactly(valueSI, inverse(f));
}

/**
 * Name lookup for built-in species: forgiving about case, spaces, hyphens, underscores and
 * superscript digits, so 'Rb87', '87Rb', 'Rb-87', '⁸⁷Rb' and 'rubidium 87' all match.
 */
import { BUILTIN_SPECIES } from './table';
import type { BuiltinLevel, BuiltinSpecies } from './types';

const SUPERSCRIPT_DIGITS: Readonly<Record<string, string>> = {
  '⁰': '0', '¹': '1', '²': '2', '³': '3', '⁴': '4', '⁵': '5', '⁶': '6', '⁷': '7', '⁸': '8', '⁹': '9',
};

/** Canonical key for matching: lower case, ASCII digits, no separators. */
export function normalizeSpeciesName(name: string): string {
  return name
    .normalize('NFC')
    .replace(/[⁰¹²³⁴⁵⁶⁷⁸⁹]/g, (d) => SUPERSCRIPT_DIGITS[d] ?? d)
    .toLowerCase()
    .replace(/[\s\-_]+/g, '');
}

const ELEMENT_NAMES: Readonly<Record<string, readonly string[]>> = {
  H: ['hydrogen'], He: ['helium'], Li: ['lithium'], Na: ['sodium'], K: ['potassium'], Ca: ['calcium'],
  Cr: ['chromium'], Rb: ['rubidium'], Sr: ['strontium'], Cs: ['cesium', 'caesium'], Yb: ['ytterbium'],
};

/** Every accepted spelling of one species: id, listed aliases, and symbol/name with mass number both ways. */
export function speciesSpellings(s: BuiltinSpecies): string[] {
  const forms = [s.id, ...s.aliases, `${s.element}${s.massNumber}`, `${s.massNumber}${s.element}`];
  for (const name of ELEMENT_NAMES[s.element] ?? []) forms.push(`${name}${s.massNumber}`, `${s.massNumber}${name}`);
  return [...new Set(forms)];
}

function matchKeys(s: BuiltinSpecies): string[] {
  return speciesSpellings(s).map(normalizeSpeciesName);
}

const INDEX: ReadonlyMap<string, BuiltinSpecies> = (() => {
  const map = new Map<string, BuiltinSpecies>();
  for (const s of BUILTIN_SPECIES) {
    for (const key of matchKeys(s)) if (!map.has(key)) map.set(key, s);
  }
  return map;
})();

/** Finds a built-in species by id or alias; undefined when nothing matches. */
export function findSpecies(name: string): BuiltinSpecies | undefined {
  if (typeof name !== 'string') return undefined;
  const key = normalizeSpeciesName(name);
  return key === '' ? undefined : INDEX.get(key);
}

/** Canonical ids followed by the listed aliases, for completion lists and did-you-mean. */
export function speciesNames(): string[] {
  const names = BUILTIN_SPECIES.map((s) => s.id);
  for (const s of BUILTIN_SPECIES) for (const a of s.aliases) if (!names.includes(a)) names.push(a);
  return names;
}

/** Every accepted spelling (normalized) with the canonical id it names, for did-you-mean. */
export function normalizedSpellings(): [spelling: string, id: string][] {
  return [...INDEX].map(([form, s]) => [form, s.id]);
}

/** A level of a species by its key ('ground', 'P3/2', …), case-insensitive. */
export function findBuiltinLevel(species: BuiltinSpecies, key: string): BuiltinLevel | undefined {
  const wanted = key.trim().toLowerCase();
  return species.levels.find((l) => l.key.toLowerCase() === wanted);
}

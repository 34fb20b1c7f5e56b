/** Name lookup for the built-in species table: the spellings users type in setup files. */
import { describe, expect, it } from 'vitest';
import {
  BUILTIN_SPECIES,
  findBuiltinLevel,
  findSpecies,
  normalizeSpeciesName,
  speciesNames,
} from '../../server/src/physics/species';

describe('findSpecies', () => {
  it.each(['Rb87', '87Rb', 'Rb-87', '⁸⁷Rb', 'rubidium-87', 'RUBIDIUM 87', 'rb_87', ' 87rb '])('finds Rb87 from %j', (name) => {
    expect(findSpecies(name)?.id).toBe('Rb87');
  });

  it.each([
    ['hydrogen', 'H'],
    ['1H', 'H'],
    ['deuterium', 'D'],
    ['²H', 'D'],
    ['He*', 'He4'],
    ['metastable helium', 'He4'],
    ['³He', 'He3'],
    ['caesium', 'Cs133'],
    ['Cs', 'Cs133'],
    ['sodium', 'Na23'],
    ['6Li', 'Li6'],
    ['lithium 7', 'Li7'],
    ['40K', 'K40'],
    ['52Cr', 'Cr52'],
    ['strontium-87', 'Sr87'],
    ['¹⁷¹Yb', 'Yb171'],
    ['Ca-40', 'Ca40'],
  ])('maps %j to %s', (name, id) => {
    expect(findSpecies(name)?.id).toBe(id);
  });

  it('returns undefined for unknown or empty names instead of throwing', () => {
    expect(findSpecies('Rb86')).toBeUndefined();
    expect(findSpecies('Rb')).toBeUndefined(); // ambiguous element without mass number
    expect(findSpecies('')).toBeUndefined();
    expect(findSpecies('   ')).toBeUndefined();
    expect(findSpecies('K')).toBeUndefined();
  });

  it('never lets two species share a spelling', () => {
    const owner = new Map<string, string>();
    for (const s of BUILTIN_SPECIES) {
      for (const name of [s.id, ...s.aliases]) {
        const key = normalizeSpeciesName(name);
        const prior = owner.get(key);
        expect(prior === undefined || prior === s.id, `${name} claimed by ${prior} and ${s.id}`).toBe(true);
        owner.set(key, s.id);
        expect(findSpecies(name)?.id).toBe(s.id);
      }
    }
  });
});

describe('speciesNames', () => {
  it('lists every canonical id first, then aliases, without duplicates', () => {
    const names = speciesNames();
    const ids = BUILTIN_SPECIES.map((s) => s.id);
    expect(names.slice(0, ids.length)).toEqual(ids);
    expect(names).toContain('⁸⁷Rb');
    expect(new Set(names).size).toBe(names.length);
  });
});

describe('findBuiltinLevel', () => {
  it('finds levels by key, case-insensitively', () => {
    const rb = findSpecies('Rb87');
    expect(rb).toBeDefined();
    if (!rb) return;
    expect(findBuiltinLevel(rb, 'p3/2')?.designation).toBe('5p 2P°3/2');
    expect(findBuiltinLevel(rb, 'Ground')?.designation).toBe('5s 2S1/2');
    expect(findBuiltinLevel(rb, 'D7')).toBeUndefined();
  });
});

import type { CompletionItem } from 'vscode-languageserver-types';
import { describe, expect, it } from 'vitest';
import { completion } from '../../server/src/features/completion';
import { BLOCK_WORDS, LEVEL_KEYS } from '../../server/src/format/schema';
import { BUILTIN_SPECIES } from '../../server/src/physics/species';
import { applyEdits, atCursor } from './helpers';

interface Case {
  name: string;
  text: string;
  has?: string[];
  hasNot?: string[];
  /** Exact label list, when the whole list matters. */
  exactly?: string[];
}

const CASES: Case[] = [
  { name: 'block words and `use` at the top of a file', text: '|', exactly: [...BLOCK_WORDS, 'use'] },
  { name: 'magnet keys inside a magnet', text: 'magnet m\n  |', has: ['field', 'gradient', 'length', 'species', 'beam'], hasNot: ['A', 'mass'] },
  { name: 'species keys and `level` in a species', text: 'species Na23\n  |', has: ['mass', 'I', 'g_I', 'mu_I', 'level'], hasNot: ['A'] },
  { name: 'level keys once a level is above', text: 'species Na23\n  level g: 3s 2S1/2\n  |', has: ['A', 'B', 'C', 'g_J', 'energy', 'level'] },
  { name: 'beam keys', text: 'beam b\n  so|', has: ['species', 'level', 'source', 'slits', 'magnet', 'drift', 'detector'] },
  { name: 'built-in species after `species`', text: 'species R|', has: ['Rb87', 'Rb85', 'Na23', 'Cs133'] },
  { name: 'built-in species under their canonical names only', text: 'species |', has: ['H', 'D', 'Rb87', 'Yb174'], hasNot: ['H-1', '¹H', 'protium', 'rubidium-87', '87Rb'] },
  { name: '`field` once inside a magnet (as its key)', text: 'magnet m\n  |', has: ['field', 'gradient', 'magnet', 'beam'] },
  { name: 'the level after `->` is not the one before it', text: 'species Na23\n  level g: 3s 2S1/2\n  level e: 3p 2P°3/2\nline D1: e -> |', exactly: ['g'] },
  { name: 'flux-density units after a field value', text: 'field f = 3.2 |', has: ['T', 'mT', 'G'], hasNot: ['T/m', 'cm', 'MHz'] },
  { name: 'gradient units after a gradient', text: 'magnet m\n  gradient = 180 |', has: ['T/m', 'G/cm'], hasNot: ['T', 'm'] },
  { name: 'length units after a length', text: 'magnet m\n  length = 8 c|', has: ['cm', 'mm', 'um', 'm'], hasNot: ['T'] },
  { name: 'frequency-like units after A', text: 'species Na23\n  level g: 3s 2S1/2  A = 885.8 |', has: ['MHz', 'GHz', 'cm^-1', 'eV'], hasNot: ['T'] },
  { name: 'temperature units after an oven', text: 'beam b\n  source = oven 720 |', has: ['K', 'degC'], hasNot: ['m/s'] },
  { name: 'speed units after a jet', text: 'beam b\n  source = jet 1500 |', has: ['m/s', 'km/s'], hasNot: ['K'] },
  { name: 'source kinds', text: 'beam b\n  source = |', exactly: ['oven', 'jet', 'speed'] },
  { name: '`spread` after a jet speed', text: 'beam b\n  source = jet 1500 m/s |', exactly: ['spread'] },
  { name: '`apart` after two slit widths', text: 'beam b\n  slits = 80 um, 50 um |', exactly: ['apart'] },
  { name: 'g_s choices', text: 'settings\n  g_s = |', exactly: ['exact', '2'] },
  { name: 'reduced_mass choices', text: 'settings\n  reduced_mass = |', exactly: ['on', 'off'] },
  { name: 'coil keys inside a coil', text: 'coil q\n  |', has: ['radius', 'turns', 'current', 'centre', 'axis', 'spacing', 'sense', 'conductor'], hasNot: ['magnetisation'] },
  { name: 'current units after a coil current', text: 'coil q\n  current = 15 |', has: ['A', 'mA', 'kA'], hasNot: ['T', 'm'] },
  { name: 'length units after a point', text: 'wire w\n  through = 0, 2, 0 |', has: ['mm', 'cm', 'm'], hasNot: ['A'] },
  { name: 'coil axis directions', text: 'coil q\n  axis = |', exactly: ['x', 'y', 'z', '-x', '-y', '-z'] },
  { name: 'coil pair senses', text: 'coil q\n  sense = |', exactly: ['same', 'opposite'] },
  // Values that name another block or take a fixed word had no completion (found in an audit of half-written files).
  { name: 'level names for a trap and for data', text: 'species Na23\n  level g: 3s 2S1/2\ntrap t\n  level = |', exactly: ['g'] },
  { name: 'line names for a slower', text: 'species Na23\n  level g: 3s 2S1/2\n  level e: 3p 2P°3/2\nline D2: g -> e\nslower s\n  line = |', exactly: ['D2'] },
  { name: 'source names not yet listed, after a comma', text: 'coil a\ncoil b\nwire w\ntrap t\n  sources = a, |', exactly: ['b', 'w'] },
  { name: 'no source name straight after one', text: 'coil a\ncoil b\nmagnet m\n  sources = a |', exactly: [] },
  { name: 'data blocks and parameters of a fit', text: 'data d1\ndata d2\nfit f\n  data = |', exactly: ['d1', 'd2'] },
  { name: 'fit parameters', text: 'fit f\n  free = field, |', has: ['g_J', 'A', 'gradient', 'source_scale'], hasNot: ['field'] },
  { name: 'slower designs', text: 'slower s\n  design = |', exactly: ['decreasing', 'increasing', 'spin_flip'] },
  { name: 'gravity directions and off', text: 'trap t\n  gravity = |', exactly: ['-z', 'x', 'y', 'z', '-x', '-y', 'off'] },
  { name: 'data kinds', text: 'data d\n  kind = |', exactly: ['resonance', 'interval', 'profile'] },
  // Rb87 ground: I = 3/2, J = 1/2, so F = 1, 2 (angular momentum addition, textbook).
  {
    name: 'the sublevels of a resonance level for its pair',
    text: 'species Rb87\n  level g: 5s 2S1/2\nresonance r\n  level = g\n  lower = |',
    exactly: ['1 +1', '1 0', '1 -1', '2 +2', '2 +1', '2 0', '2 -1', '2 -2'],
  },
  { name: 'no sublevels without the resonance level', text: 'resonance r\n  upper = |', exactly: [] },
  { name: '`along` after a magnetisation', text: 'slab s\n  magnetisation = 1.2 T |', exactly: ['along'] },
  { name: 'directions after `along`', text: 'slab s\n  magnetisation = 1.2 T along |', exactly: ['x', 'y', 'z', '-x', '-y', '-z'] },
  { name: 'spectrum directions', text: 'line L: a -> b\n  spectrum = |', exactly: ['along', 'across'] },
  { name: 'spectrum analysers', text: 'line L: a -> b\n  light = |', exactly: ['all', 'pi', 'sigma', 'sigma+', 'sigma-'] },
  { name: 'a beam for the Doppler width', text: 'beam hot\nline L: a -> b\n  doppler = beam |', exactly: ['hot'] },
  {
    name: 'level names in a line',
    text: 'species Na23\n  level g: 3s 2S1/2\n  level e: 3p 2P°3/2\nline D2: |',
    exactly: ['g', 'e'],
  },
  {
    name: 'level names after the arrow stay in the species of the first level, without the first level',
    text: 'species Na23\n  level g: 3s 2S1/2\n  level e: 3p 2P°3/2\nspecies K39\n  level k: 4s 2S1/2\nline D2: g -> |',
    exactly: ['e'],
  },
  {
    name: 'a level name used by two species is offered qualified',
    text: 'species Na23\n  level g: 3s 2S1/2\nspecies K39\n  level g: 4s 2S1/2\nline x: |',
    exactly: ['Na23.g', 'K39.g'],
  },
  { name: 'magnets in a beam', text: 'magnet a\nmagnet b\nbeam x\n  magnet = |', exactly: ['a', 'b'] },
  { name: 'species in a beam', text: 'species Na23\nbeam x\n  species = |', exactly: ['Na23'] },
  {
    name: 'levels of the beam species',
    text: 'species Na23\n  level g: 3s 2S1/2\nspecies K39\n  level k: 4s 2S1/2\nbeam x\n  species = K39\n  level = |',
    exactly: ['k'],
  },
  {
    name: 'built-in levels of the species after the colon',
    text: 'species Rb87\n  level g: |',
    has: ['5s 2S1/2', '5p 2P°1/2', '5p 2P°3/2'],
  },
  {
    // Terms of p² (Pauli): ¹S, ³P, ¹D (textbook, e.g. any atomic physics text on LS coupling);
    // levels ³P₀,₁,₂, ¹D₂, ¹S₀. Parity of p²: even (no mark).
    name: 'terms the configuration allows: p²',
    text: 'species Demo\n  level x: 2p2 |',
    exactly: ['1S0', '1D2', '3P0', '3P1', '3P2'],
  },
  {
    // One p electron: ²P₁/₂, ²P₃/₂, odd parity.
    name: 'terms of an odd configuration carry the parity mark',
    text: 'species Demo\n  level x: 3p |',
    exactly: ['2P°1/2', '2P°3/2'],
  },
  {
    // Terms of d³ include ²D twice (textbook Pauli table): listed once per J with "occurs 2×".
    name: 'a partly typed term is replaced',
    text: 'species Demo\n  level x: 3d3 4F|',
    has: ['4F3/2', '4F9/2', '2D3/2'],
  },
  { name: 'level keys after a complete term', text: 'species Na23\n  level g: 3s 2S1/2 |', exactly: [...LEVEL_KEYS] },
  { name: 'nothing in a comment', text: 'species Na23  # |', exactly: [] },
  { name: 'nothing for a name the user chooses', text: 'magnet |', exactly: [] },
];

function labels(items: CompletionItem[]): string[] {
  return items.map((i) => i.label);
}

describe('completion', () => {
  for (const c of CASES) {
    it(c.name, () => {
      const { analysis, position } = atCursor(c.text);
      const got = labels(completion(analysis, position));
      if (c.exactly) expect(got).toEqual(c.exactly);
      for (const l of c.has ?? []) expect(got).toContain(l);
      for (const l of c.hasNot ?? []) expect(got).not.toContain(l);
    });
  }

  it('lists each built-in species once, canonical name first, with mass, I and ground level as detail', () => {
    const { analysis, position } = atCursor('species |');
    const items = completion(analysis, position);
    expect(items.map((i) => i.label)).toEqual(BUILTIN_SPECIES.map((s) => s.id));
    const rb87 = items.find((i) => i.label === 'Rb87')!;
    // Rb-87: atomic mass 86.909180 u (atomic mass evaluation, from memory), I = 3/2, ground 5s ²S₁/₂.
    expect(rb87.detail).toMatch(/^86\.90918\d* u · I = 3\/2 · ground 5s 2S1\/2$/);
    // The other spellings only feed the filter.
    expect(rb87.filterText).toContain('rubidium-87');
    expect(rb87.filterText).toContain('87Rb');
    expect(items.find((i) => i.label === 'H')!.filterText).toContain('protium');
  });

  it('offers `field` once in a magnet block', () => {
    const { analysis, position } = atCursor('magnet m\n  |');
    const fields = completion(analysis, position).filter((i) => i.label === 'field');
    expect(fields).toHaveLength(1);
    expect(fields[0]!.detail).toBe('magnet setting');
  });

  it("marks the Hund's-rules ground level of the configuration", () => {
    // Hund's rules, p² less than half full: ³P₀ is the ground level (textbook; e.g. carbon 2p² ³P₀).
    const { analysis, position } = atCursor('species Demo\n  level x: 2p2 |');
    const ground = completion(analysis, position).find((i) => i.preselect);
    expect(ground?.label).toBe('3P0');
    expect(ground?.detail).toContain("ground level by Hund's rules");
  });

  it('inserts a setting with its `=` and replaces the word being typed', () => {
    const { text, analysis, position } = atCursor('magnet m\n  gra|');
    const item = completion(analysis, position).find((i) => i.label === 'gradient')!;
    const edit = item.textEdit as { range: import('vscode-languageserver-types').Range; newText: string };
    expect(applyEdits(text, [edit])).toBe('magnet m\n  gradient = ');
  });

  it('completes a unit glued to its number without touching the number', () => {
    const { text, analysis, position } = atCursor('magnet m\n  length = 8c|');
    const item = completion(analysis, position).find((i) => i.label === 'cm')!;
    const edit = item.textEdit as { range: import('vscode-languageserver-types').Range; newText: string };
    expect(applyEdits(text, [edit])).toBe('magnet m\n  length = 8cm');
  });

  it('gives the g_J fraction of each offered term', () => {
    // Landé with g_s = 2: ²P₃/₂ → 4/3, ²P₁/₂ → 2/3 (textbook).
    const { analysis, position } = atCursor('species Demo\n  level x: 3p |');
    const details = completion(analysis, position).map((i) => i.detail);
    expect(details[0]).toContain('g_J = 2/3');
    expect(details[1]).toContain('g_J = 4/3');
  });
});

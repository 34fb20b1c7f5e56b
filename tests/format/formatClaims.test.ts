/**
 * What docs/format.md promises, tried on small setups (invented for the test): each sentence's
 * finding is raised where the page says; and every diagnostic code the user docs name exists in the
 * rule catalogue (the one list SARIF, check and the editor share).
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { ruleCatalogue } from '../../server/src/cli/sarif/ruleCatalogue';
import { analyze } from '../../server/src/eval/analyze';

const codesOf = (text: string): string[] => analyze(text).problems.map((p) => p.code);
const NA = 'species Na23\n  level ground: 3s 2S1/2\n  level upper: 3p 2P°3/2\n';

describe('docs/format.md, sentence by sentence', () => {
  it.each([
    ['a decimal comma where one value goes', 'field b = 3,2 G\n', 'value-decimal-comma'],
    ['a list of numbers with one unit where one value goes', 'field b = 3, 2 G\n', 'value-list-one-unit'],
    ['a blank where the / of a unit goes', 'magnet m\n  field = 1 T\n  gradient = 180 T m\n  length = 8 cm\n', 'unit-wrong-dimension'],
    ['a number below the smallest double', 'field b = 1e-320 T\n', 'syntax-bad-number'],
    ['a number the unit takes below the smallest double', 'field b = 1e-305 nT\n', 'syntax-bad-number'],
    ['a field beyond 1e5 T', 'field b = 2e5 T\n', 'field-beyond-physical'],
    ['a length beyond 1 km', 'magnet m\n  field = 1 T\n  gradient = 1 T/m\n  length = 2 km\n', 'value-beyond-apparatus'],
    ['a run of subshells such as 1s22s', 'species He4\n  level m: 1s22s 3S1\n', 'config-malformed'],
    ['a blank inside a term symbol', 'species Na23\n  level g: 3s 2S 1/2\n', 'term-blank-inside'],
    ['an arrow typed otherwise', `${NA}line D2: ground => upper\n`, 'syntax-missing-arrow'],
    ['a whole term that lists only some J in E_J', 'species Li7\n  level p: 2p 2P°  E_J = 1/2 0 GHz\n', 'term-fine-missing'],
    ['a whole term with both zeta and E_J', 'species Li7\n  level p: 2p 2P°  zeta = 6.7 GHz  E_J = 1/2 0 GHz, 3/2 10 GHz\n', 'term-fine-twice'],
    ['A_J on a J level', 'species Li7\n  level p: 2p 2P°3/2  A_J = 3/2 -3 MHz\n', 'per-level-needs-term'],
    ['r2 of zero', 'species Li7\n  level p: 2p 2P°  zeta = 6.7 GHz  r2 = 0 a0^2\n', 'r2-not-positive'],
    ['r2 on a J level', 'species Li7\n  level p: 2p 2P°3/2  r2 = 27 a0^2\n', 'r2-needs-term'],
    ['sources and numbers on one magnet', 'wire w\n  current = 1 A\n  through = 0, 0, 1 cm\n  direction = x\n\nmagnet m\n  sources = w\n  field = 1 T\n  length = 1 cm\n', 'magnet-sources-and-numbers'],
    ['a coil current of zero', 'coil c\n  radius = 1 cm\n  turns = 1\n  current = 0 A\n', 'source-current-zero'],
    ['a current above 10 kA', 'coil c\n  radius = 1 cm\n  turns = 1\n  current = 20 kA\n', 'source-current-absurd'],
    ['μ0·M above 2.5 T', 'slab s\n  size = 1, 1, 1 cm\n  magnetisation = 3 T along y\n', 'source-magnetisation-high'],
    ['a zero direction', 'wire w\n  current = 1 A\n  through = 0, 0, 1 cm\n  direction = 0, 0, 0\n', 'direction-zero'],
    ['sense without spacing', 'coil c\n  radius = 1 cm\n  turns = 1\n  current = 1 A\n  sense = opposite\n', 'source-sense-without-spacing'],
    ['a return on the wire itself', 'wire w\n  current = 1 A\n  through = 0, 0, 1 cm\n  direction = x\n  return = 1 cm, 0, 1 cm\n', 'source-return-on-wire'],
    ['two equal loops in one place', 'coil a\n  radius = 1 cm\n  turns = 1\n  current = 1 A\n\ncoil b\n  radius = 1 cm\n  turns = 1\n  current = 1 A\n', 'source-overlap'],
    ['a spectrum setting on a line without spectrum', `${NA}line D2: ground -> upper\n  doppler = 300 K\n`, 'spectrum-setting-unused'],
    ['a beam whose species is not its level\'s', `${NA}species K39\n  level g: 4s 2S1/2\nmagnet m\n  field = 0.1 T\n  gradient = 10 T/m\n  length = 5 cm\nbeam b\n  species = K39\n  level = Na23.ground\n  source = oven 500 K\n  slits = 20 um, 20 um apart 50 cm\n  magnet = m\n  drift = 50 cm\n`, 'beam-level-of-other-species'],
    ['a population entry naming an F the level lacks', `${NA}magnet m\n  field = 0.1 T\n  gradient = 10 T/m\n  length = 5 cm\nbeam b\n  level = ground\n  source = oven 500 K\n  slits = 20 um, 20 um apart 50 cm\n  magnet = m\n  drift = 50 cm\n  populations = 5 1\n`, 'beam-population-unmatched'],
    ['a population entry earlier ones cover', `${NA}magnet m\n  field = 0.1 T\n  gradient = 10 T/m\n  length = 5 cm\nbeam b\n  level = ground\n  source = oven 500 K\n  slits = 20 um, 20 um apart 50 cm\n  magnet = m\n  drift = 50 cm\n  populations = 1 1 1, 1 1 2\n`, 'beam-population-twice'],
  ])('%s', (_what, text, code) => {
    expect(codesOf(text)).toContain(code);
  });

  it.each([
    ['the minus sign U+2212', `species Na23\n  level g: 3s 2S1/2  A = −885.8 MHz\n`],
    ['subshells that run together when each holds one electron', 'species Sr88\n  level p: 5s5p 3P°1\n'],
    ['a dot between subshells', 'species He4\n  level m: 1s.2s 3S1\n'],
    ['the letter o as parity mark', `species Na23\n  level g: 3s 2S1/2\n  level u: 3p 2Po3/2\nline D2: g -> u\n`],
    ['the arrow →', `${NA}line D2: ground → upper\n`],
    ['the built-in name written 87Rb, Rb-87 or ⁸⁷Rb', 'species 87Rb\n  level g: 5s 2S1/2\nspecies Rb-85\n  level h: 5s 2S1/2\nspecies ⁶Li\n  level k: 2s 2S1/2\n'],
    ['units as the units paragraph writes them', 'field a = 3 kilogauss\nfield b = 0.3 millitesla\nspecies X\n  mass = 7 Da\n  I = 3/2\n  mu_I = 3.2 µN\n  level g: 2S1/2  A = 0.0134 cm⁻¹\n  level h: 2P°1/2  A = 0.0134 1/cm  energy = 14000 cm-1\n'],
  ])('is accepted: %s', (_what, text) => {
    expect(analyze(text).problems.filter((p) => p.severity === 'error').map((p) => `${p.code}: ${p.message}`)).toEqual([]);
  });

  it('a word read as a unit that Sublevel does not know is said as such', () => {
    for (const value of ['5 mn', '2 Amp']) {
      const p = analyze(`field b = ${value}\n`).problems.find((x) => x.severity === 'error');
      expect(p?.code, value).toBe('unit-unknown');
      expect(p?.message, value).toContain(`unknown unit '${value.split(' ')[1]}'`);
    }
  });

  it('the messages say the fix the page describes: the run of subshells read one way, the arrow to write', () => {
    const messages = analyze(`species He4\n  level m: 1s22s 3S1\n${NA}line D2: ground => upper\n`).problems.map((p) => p.message);
    expect(messages).toContain("'1s22s' runs two subshells together; put a space between them: 1s2 2s.");
    expect(messages).toContain("'=>' is not the arrow: write '->' between the levels.");
  });
});

describe('the diagnostic codes the user docs name', () => {
  // Hyphenated words in backticks that are not codes: a unit, library names, a fit status, a transition kind.
  const NOT_CODES = new Set(['cm-1', 'ml-levenberg-marquardt', 'ml-matrix', 'not-converged', 'two-photon']);
  const PAGES = ['README.md', 'docs/format.md', 'docs/fields.md', 'docs/beam.md', 'docs/fit.md', 'docs/spectra.md', 'docs/slower.md', 'docs/traps.md', 'docs/transitions.md', 'docs/uncertainty.md', 'docs/engine.md', 'docs/reliability.md', 'docs/ci.md', 'docs/csv.md'];
  const ids = new Set(ruleCatalogue().map((r) => r.id));

  it.each(PAGES)('%s names only codes that exist', (page) => {
    const named = [...readFileSync(page, 'utf8').matchAll(/`([a-z][a-z0-9]*(?:-[a-z0-9]+)+)`/g)].map((m) => m[1]!).filter((c) => !NOT_CODES.has(c));
    expect(named.filter((c) => !ids.has(c))).toEqual([]);
  });
});

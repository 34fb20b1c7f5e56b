import type { CodeAction } from 'vscode-languageserver-types';
import { describe, expect, it } from 'vitest';
import { readdirSync, readFileSync } from 'fs';
import { codeActions } from '../../server/src/features/codeActions';
import { significantDigits } from '../../server/src/features/codeActions/convertUnit';
import { locate } from '../../server/src/features/shared/locate';
import { dimensionOfUnit } from '../../server/src/features/shared/units';
import { analyzeFast } from '../../server/src/service/fastAnalysis';
import { readQuantity } from '../../server/src/format/units';
import { diagnostics } from '../../server/src/features/diagnostics';
import { applyEdits, editsOf, analysisOf, URI } from './helpers';
import { magnetAndBeam, speciesX } from '../fixtures/ovenBeam';

interface Case {
  name: string;
  text: string;
  code: string;
  titles: string[];
  /** Title of the fix to apply, and the text after it. */
  apply?: { title: string; result: string };
  /** Title of the one fix marked preferred (null: none is). */
  preferred?: string | null;
}

function fixesFor(text: string, code: string): CodeAction[] {
  const analysis = analysisOf(text);
  const diags = diagnostics(analysis, URI).filter((d) => d.code === code);
  expect(diags.length, `a '${code}' diagnostic in ${JSON.stringify(text)}`).toBeGreaterThan(0);
  return codeActions(analysis, URI, { range: diags[0]!.range, diagnostics: diags.slice(0, 1), only: ['quickfix'] });
}

const CASES: Case[] = [
  {
    // J runs from |L − S| to L + S (textbook): for ²P, J = 1/2 or 3/2.
    name: 'impossible J: the allowed J values',
    text: 'species Na23\n  level upper: 3p 2P°5/2  # comment stays\n',
    code: 'term-j-out-of-range',
    titles: ['Change J to 1/2', 'Change J to 3/2'],
    apply: { title: 'Change J to 3/2', result: 'species Na23\n  level upper: 3p 2P°3/2  # comment stays\n' },
  },
  {
    name: 'J of the wrong kind for the multiplicity',
    text: 'species Na23\n  level other: 3P3/2\n',
    code: 'term-j-parity-of-spin',
    titles: ['Change J to 0', 'Change J to 1', 'Change J to 2'],
    apply: { title: 'Change J to 2', result: 'species Na23\n  level other: 3P2\n' },
  },
  {
    name: 'a term symbol with no J: add one it allows',
    text: 'species Demo\n  mass = 40 u\n  level x: 2P\n',
    code: 'level-needs-j',
    titles: ['Add J = 1/2', 'Add J = 3/2'],
    apply: { title: 'Add J = 1/2', result: 'species Demo\n  mass = 40 u\n  level x: 2P1/2\n' },
  },
  {
    name: 'a misspelt level name: did you mean',
    text: 'species Na23\n  level ground: 3s 2S1/2\n  level upper: 3p 2P°3/2\nline D2: ground -> uper\n',
    code: 'name-unknown',
    titles: ["Change to 'upper'"],
    apply: { title: "Change to 'upper'", result: 'species Na23\n  level ground: 3s 2S1/2\n  level upper: 3p 2P°3/2\nline D2: ground -> upper\n' },
  },
  {
    name: 'a misspelt block word',
    text: 'magent spare\n',
    code: 'syntax-unknown-statement',
    titles: ["Change to 'magnet'"],
    apply: { title: "Change to 'magnet'", result: 'magnet spare\n' },
  },
  {
    name: 'a misspelt key',
    text: 'magnet m\n  gradiant = 180 T/m\n',
    code: 'syntax-unknown-key',
    titles: ["Change to 'gradient'"],
    apply: { title: "Change to 'gradient'", result: 'magnet m\n  gradient = 180 T/m\n' },
  },
  {
    name: 'a misspelt unit',
    text: 'species Na23\n  level g: 3s 2S1/2  A = 885.8 Mhz\n',
    code: 'unit-unknown',
    titles: ["Change to 'MHz'"],
    apply: { title: "Change to 'MHz'", result: 'species Na23\n  level g: 3s 2S1/2  A = 885.8 MHz\n' },
  },
  {
    name: 'a unit of the wrong dimension',
    text: 'magnet m\n  gradient = 50 T\n',
    code: 'unit-wrong-dimension',
    titles: ['Change the unit to T/m', 'Change the unit to G/cm'],
    apply: { title: 'Change the unit to T/m', result: 'magnet m\n  gradient = 50 T/m\n' },
    preferred: 'Change the unit to T/m',
  },
  {
    // SI prefixes: G = giga, so `Gs` is 1e9 s; the gauss it was meant as comes first.
    name: "'Gs' is read as gigaseconds: the gauss is the preferred fix",
    text: 'field bias = 3.2 Gs\n',
    code: 'unit-wrong-dimension',
    titles: ['Change the unit to G', 'Change the unit to T', 'Change the unit to mT'],
    apply: { title: 'Change the unit to G', result: 'field bias = 3.2 G\n' },
    preferred: 'Change the unit to G',
  },
  {
    name: 'a field unit for a gradient: the same unit per length is nearest',
    text: 'magnet m\n  gradient = 180 mT\n',
    code: 'unit-wrong-dimension',
    titles: ['Change the unit to mT/m', 'Change the unit to T/m', 'Change the unit to G/cm'],
    apply: { title: 'Change the unit to mT/m', result: 'magnet m\n  gradient = 180 mT/m\n' },
    preferred: 'Change the unit to mT/m',
  },
  {
    name: 'a unit far from every right one: no fix is preferred',
    text: 'magnet m\n  gradient = 180 K\n',
    code: 'unit-wrong-dimension',
    titles: ['Change the unit to T/m', 'Change the unit to G/cm'],
    preferred: null,
  },
  {
    name: 'a misspelt key whose one suggestion is already set: offered, not preferred (it would duplicate it)',
    text: 'magnet m\n  field = 1 T\n  gradient = 10 T/m\n  length = 5 cm\n  lenght = 6 cm\n',
    code: 'syntax-unknown-key',
    titles: ["Change to 'length'"],
    preferred: null,
  },
  {
    name: 'a misspelt species: the canonical name, preferred (not the long alias)',
    text: 'species Rubidum87\n  level g: 5s 2S1/2\n',
    code: 'species-needs-mass',
    titles: ['Use the built-in species Rb87', 'Use the built-in species Rb85'],
    apply: { title: 'Use the built-in species Rb87', result: 'species Rb87\n  level g: 5s 2S1/2\n' },
    preferred: 'Use the built-in species Rb87',
  },
  {
    name: 'subshells run together with an occupancy: the split that fits',
    text: 'species Na23\n  level g: 1s22s 2S1/2\n',
    code: 'config-malformed',
    titles: ["Write '1s2 2s'"],
    apply: { title: "Write '1s2 2s'", result: 'species Na23\n  level g: 1s2 2s 2S1/2\n' },
    preferred: "Write '1s2 2s'",
  },
  {
    // 6s2 6p gives only 2P°, so capping the occupancy would trade this error for
    // term-not-in-configuration: the fix is offered but not preferred.
    name: 'an occupancy cap that would break the term is not preferred',
    text: 'species Yb174\n  level meta: 6s7 6p 3P°1\n',
    code: 'config-occupancy-too-large',
    titles: ["Replace with '2'"],
    preferred: null,
  },
  {
    name: 'a quadrupole constant that cannot act on J = 1/2, on the level line',
    text: 'species Na23\n  level ground: 3s 2S1/2  B = 2 MHz          # a note\n',
    code: 'quadrupole-cannot-act',
    titles: ['Remove B (it cannot act here)'],
    apply: { title: 'Remove B (it cannot act here)', result: 'species Na23\n  level ground: 3s 2S1/2          # a note\n' },
  },
  {
    name: 'a quadrupole constant on its own line: the line goes',
    text: 'species Na23\n  level ground: 3s 2S1/2\n    B = 2 MHz\nfield f = 1 G\n',
    code: 'quadrupole-cannot-act',
    titles: ['Remove B (it cannot act here)'],
    apply: { title: 'Remove B (it cannot act here)', result: 'species Na23\n  level ground: 3s 2S1/2\nfield f = 1 G\n' },
  },
  {
    name: 'an octupole constant that cannot act (I = 3/2 but J = 1/2)',
    text: 'species Na23\n  level ground: 3s 2S1/2  A = 885 MHz  C = 1 kHz\n',
    code: 'octupole-cannot-act',
    titles: ['Remove C (it cannot act here)'],
    apply: { title: 'Remove C (it cannot act here)', result: 'species Na23\n  level ground: 3s 2S1/2  A = 885 MHz\n' },
  },
  {
    name: 'a hyperfine constant without a nucleus',
    text: 'species Demo\n  mass = 40 u\n  level g: 2S1/2\n  A = 3 MHz  # no spin\n',
    code: 'hyperfine-without-nucleus',
    titles: ['Remove A (it cannot act here)'],
    apply: { title: 'Remove A (it cannot act here)', result: 'species Demo\n  mass = 40 u\n  level g: 2S1/2\n  # no spin\n' },
  },
  {
    name: 'zeta on a level that has a J: remove it (any problem naming a setting to remove)',
    text: 'species Li7\n  level p: 2p 2P°3/2  zeta = 6.7 GHz\n',
    code: 'zeta-needs-term',
    titles: ['Remove zeta'],
    apply: { title: 'Remove zeta', result: 'species Li7\n  level p: 2p 2P°3/2\n' },
  },
  {
    name: 'a colon written for `=`',
    text: 'magnet m\n  gradient: 180 T/m\n',
    code: 'syntax-missing-equals',
    titles: ["Write '=' instead of ':'"],
    apply: { title: "Write '=' instead of ':'", result: 'magnet m\n  gradient= 180 T/m\n' },
  },
  {
    name: 'a setting without `=`',
    text: 'magnet m\n  gradient 180 T/m\n',
    code: 'syntax-missing-equals',
    titles: ["Add '=' after the key"],
    apply: { title: "Add '=' after the key", result: 'magnet m\n  gradient = 180 T/m\n' },
  },
  {
    name: 'a field header without `=`',
    text: 'field bias 3.2 G\n',
    code: 'syntax-missing-equals',
    titles: ["Add '=' before the value"],
    apply: { title: "Add '=' before the value", result: 'field bias = 3.2 G\n' },
  },
  {
    name: 'a level without its colon',
    text: 'species Na23\n  level ground 3s 2S1/2\n',
    code: 'syntax-missing-colon',
    titles: ["Add ':' after the name"],
    apply: { title: "Add ':' after the name", result: 'species Na23\n  level ground: 3s 2S1/2\n' },
  },
  {
    name: 'a line without its arrow',
    text: 'species Na23\n  level g: 3s 2S1/2\n  level e: 3p 2P°3/2\nline D2: g e\n',
    code: 'syntax-missing-arrow',
    titles: ["Add '->' between the levels"],
    apply: { title: "Add '->' between the levels", result: 'species Na23\n  level g: 3s 2S1/2\n  level e: 3p 2P°3/2\nline D2: g -> e\n' },
  },
  {
    name: 'a setting with more than it uses',
    text: 'magnet m\n  length = 8 cm 9 cm   # x\n',
    code: 'value-extra',
    titles: ['Remove the unused rest of the value'],
    apply: { title: 'Remove the unused rest of the value', result: 'magnet m\n  length = 8 cm   # x\n' },
  },
  {
    name: 'a word not allowed for a setting',
    text: 'settings\n  g_s = exakt\n',
    code: 'value-not-allowed',
    titles: ["Replace with 'exact'", "Replace with '2'"],
    apply: { title: "Replace with 'exact'", result: 'settings\n  g_s = exact\n' },
  },
  {
    name: 'a species by hand that looks like a built-in one',
    text: 'species Rb78\n',
    code: 'species-needs-mass',
    titles: ['Use the built-in species Rb87'],
    apply: { title: 'Use the built-in species Rb87', result: 'species Rb87\n' },
  },
  {
    name: 'a number without a unit',
    text: 'magnet m\n  length = 8\n',
    code: 'unit-missing',
    titles: ['Add a unit: 8 m', 'Add a unit: 8 cm', 'Add a unit: 8 mm', 'Add a unit: 8 um'],
    apply: { title: 'Add a unit: 8 cm', result: 'magnet m\n  length = 8 cm\n' },
  },
];

describe('quick fixes', () => {
  for (const c of CASES) {
    it(c.name, () => {
      const fixes = fixesFor(c.text, c.code);
      expect(fixes.map((f) => f.title)).toEqual(c.titles);
      for (const f of fixes) expect(f.diagnostics?.[0]?.code).toBe(c.code);
      if (c.apply) {
        const fix = fixes.find((f) => f.title === c.apply!.title)!;
        expect(applyEdits(c.text, editsOf(fix.edit))).toBe(c.apply.result);
      }
      if (c.preferred !== undefined) {
        expect(fixes.filter((f) => f.isPreferred).map((f) => f.title)).toEqual(c.preferred === null ? [] : [c.preferred]);
      }
    });
  }

  it('marks a single fix as preferred', () => {
    expect(fixesFor('magnet m\n  gradiant = 180 T/m\n', 'syntax-unknown-key')[0]!.isPreferred).toBe(true);
    expect(fixesFor('species Na23\n  level upper: 3p 2P°5/2\n', 'term-j-out-of-range')[0]!.isPreferred).toBeUndefined();
  });

  it('uses the analysis data when the client dropped Diagnostic.data', () => {
    const text = 'magnet m\n  gradiant = 180 T/m\n';
    const analysis = analysisOf(text);
    const d = { ...diagnostics(analysis, URI).find((x) => x.code === 'syntax-unknown-key')! };
    delete d.data;
    const fixes = codeActions(analysis, URI, { range: d.range, diagnostics: [d] });
    expect(fixes.map((f) => f.title)).toContain("Change to 'gradient'");
  });

  it('ignores diagnostics of other tools and stale ones', () => {
    const analysis = analysisOf('magnet m\n  gradiant = 180 T/m\n');
    const d = diagnostics(analysis, URI).find((x) => x.code === 'syntax-unknown-key')!;
    expect(codeActions(analysis, URI, { range: d.range, diagnostics: [{ ...d, source: 'other' }], only: ['quickfix'] })).toEqual([]);
    const moved = { ...d, range: { start: { line: 0, character: 0 }, end: { line: 0, character: 1 } } };
    expect(codeActions(analysis, URI, { range: moved.range, diagnostics: [moved], only: ['quickfix'] })).toEqual([]);
  });
});

describe('convert-unit refactoring', () => {
  function conversions(text: string, line: number, character: number): { title: string; result: string }[] {
    const analysis = analysisOf(text);
    const at = { line, character };
    return codeActions(analysis, URI, { range: { start: at, end: at }, diagnostics: [], only: ['refactor'] }).map((a) => ({
      title: a.title,
      result: applyEdits(text, editsOf(a.edit)),
    }));
  }

  it('rewrites a flux density in other units (1 G = 1e-4 T exactly)', () => {
    const got = conversions('magnet m\n  field = 0.45 T  # x\n', 1, 12);
    expect(got.map((g) => g.result.split('\n')[1])).toEqual([
      '  field = 450 mT  # x',
      '  field = 450000 uT  # x',
      '  field = 4500 G  # x',
      '  field = 4500000 mG  # x',
    ]);
    expect(got[2]!.title).toBe('Convert to G: 4500 G');
  });

  it('keeps every written digit when the factor is not a power of ten', () => {
    // 1 cm^-1 ↔ 29.9792458 GHz (exact SI c): 401.752043 MHz → 0.0134011… cm^-1, which converts back to 401.752043 MHz.
    const got = conversions('species Li7\n  level g: 2s 2S1/2  A = 401.752043 MHz\n', 1, 27);
    const wave = got.find((g) => g.title.startsWith('Convert to cm⁻¹'))!;
    const written = Number(/A = (\S+) cm\^-1/.exec(wave.result)![1]);
    expect(written * 29.9792458e9).toBeCloseTo(401.752043e6, 0);
    expect(got.find((g) => g.title.startsWith('Convert to GHz'))!.result).toContain('A = 0.401752043 GHz');
  });

  it('converts temperatures with their offset (0 °C = 273.15 K)', () => {
    const got = conversions('beam b\n  source = oven 720 K\n', 1, 17);
    expect(got.map((g) => g.result.split('\n')[1])).toEqual(['  source = oven 446.85 degC']);
  });

  it('keeps a glued unit glued', () => {
    const got = conversions('beam b\n  drift = 35cm\n', 1, 12);
    expect(got.map((g) => g.result.split('\n')[1])).toContain('  drift = 0.35m');
  });

  it('offers no conversion of a unit the setting cannot take (it would keep the wrong kind)', () => {
    expect(conversions('field bias = 3.2 Gs\n', 0, 15)).toEqual([]);
    expect(conversions('magnet m\n  gradient = 180 T\n', 1, 16)).toEqual([]);
    expect(conversions('magnet m\n  gradient = 180 T/m\n', 1, 16).map((g) => g.title)).toEqual(['Convert to G/cm: 18000 G/cm']);
  });

  it('offers nothing for numbers with an uncertainty or without a unit', () => {
    expect(conversions('magnet m\n  field = 0.35(2) T\n', 1, 12)).toEqual([]);
    expect(conversions('species X\n  g_I = 0.5\n', 1, 10)).toEqual([]);
  });
});

describe('convert-unit refactoring on every quantity of the example files', () => {
  it('gives text that reads back as the same value, to the precision written', () => {
    let checked = 0;
    for (const f of readdirSync('examples').filter((x) => x.endsWith('.sublevel'))) {
      const text = readFileSync(`examples/${f}`, 'utf8');
      const analysis = analysisOf(text);
      const parts = analysis.doc.blocks.flatMap((b) => [...(b.headerSetting ? [b.headerSetting] : []), ...b.settings, ...b.levels.flatMap((l) => l.settings)]).flatMap((s) => s.groups.flat());
      for (const part of parts) {
        if (part.kind !== 'quantity' || part.number.uncertainty !== undefined) continue;
        const d = dimensionOfUnit(part.unit.text);
        if (!d) continue;
        const before = readQuantity(part, d).si!;
        const actions = codeActions(analysis, URI, { range: { start: part.range.start, end: part.range.start }, diagnostics: [], only: ['refactor'] });
        for (const a of actions) {
          const edit = editsOf(a.edit)[0]!;
          const t = locate(analyzeFast(applyEdits(text, [edit])).doc, part.range.start);
          const written = t?.kind === 'value' ? t.part : undefined;
          expect(written?.kind, `${part.text} → ${edit.newText}`).toBe('quantity');
          const after = readQuantity(written!, d).si!;
          const digits = significantDigits(part.text.slice(0, part.text.length - part.unit.text.length).trim());
          expect(Math.abs(after - before), `${part.text} → ${edit.newText}`).toBeLessThanOrEqual(Math.abs(before) * 10 ** (1 - digits) + 1e-9 * Math.abs(before));
          checked++;
        }
      }
    }
    expect(checked).toBeGreaterThan(20);
  });
});

describe('quick fix: the gradient the beam advice found', () => {
  // Invented oven beam (tests/fixtures/ovenBeam.ts): a J = 1 level whose three peaks overlap at 0.5 T/m.
  const unresolved = (gradient: string): string => speciesX('52 u', '3S1') + magnetAndBeam(gradient);
  const gradientLine = (text: string): string => text.split('\n').find((l) => l.trimStart().startsWith('gradient'))!;

  function applyOnly(text: string, code: string): { title: string; after: string } {
    const fixes = fixesFor(text, code);
    expect(fixes.map((f) => f.title)).toHaveLength(1);
    return { title: fixes[0]!.title, after: applyEdits(text, editsOf(fixes[0]!.edit)) };
  }

  it('beam-unresolved: only the number changes (unit, spacing, comment kept), rounded up, and the file then resolves', () => {
    const text = unresolved('0.5 T/m   # from the supplier');
    const g = analysisOf(text).problems.find((p) => p.code === 'beam-unresolved')!.data!.resolvingGradientTPerM as number;
    const { title, after } = applyOnly(text, 'beam-unresolved');
    const line = gradientLine(after);
    const m = /^  gradient = ([\d.]+) T\/m   # from the supplier$/.exec(line)!;
    expect(m, line).not.toBeNull();
    const written = Number(m[1]);
    // 3 significant digits, never below the gradient the search found (the resolving_advice test pins it near 3.16 T/m).
    expect(written).toBeGreaterThanOrEqual(g);
    expect(written / g).toBeLessThan(1.01);
    expect(title).toBe(`Set the gradient of magnet 'm' to ${m[1]} T/m (resolves the peaks)`);
    // Every other line is untouched.
    expect(after.split('\n').filter((l) => l !== line)).toEqual(text.split('\n').filter((l) => l !== gradientLine(text)));
    expect(analysisOf(after).result!.beams[0]!.all_resolved).toBe(true);
  });

  it('the user’s unit and sign stay: −50 G/cm is rewritten in G/cm with its minus', () => {
    const text = unresolved('-50 G/cm');
    const { after } = applyOnly(text, 'beam-unresolved');
    const m = /^  gradient = -([\d.]+) G\/cm$/.exec(gradientLine(after))!;
    expect(m).not.toBeNull();
    // 3.16 T/m = 316 G/cm (SI: 1 G = 1e-4 T, 1 cm = 1e-2 m).
    expect(Number(m[1])).toBeGreaterThan(300);
    expect(Number(m[1])).toBeLessThan(330);
    expect(analysisOf(after).result!.beams[0]!.all_resolved).toBe(true);
  });

  it('beam-one-peak (at the beam name): the fix edits the magnet’s gradient and splits the peak into resolved ones', () => {
    const text = unresolved('0.1 T/m');
    // The diagnostic sits at the beam's name and names the gradient line its fix edits.
    const d = diagnostics(analysisOf(text), URI).find((x) => x.code === 'beam-one-peak')!;
    expect(d.relatedInformation!.map((r) => [r.location.range.start.line, r.message])).toEqual([[text.split('\n').indexOf('  gradient = 0.1 T/m'), "magnet 'm' sets the gradient here"]]);
    const { after } = applyOnly(text, 'beam-one-peak');
    expect(gradientLine(after)).toMatch(/^  gradient = 3\.1\d T\/m$/);
    const b = analysisOf(after).result!.beams[0]!;
    expect(b.peaks.length).toBeGreaterThan(1);
    expect(b.all_resolved).toBe(true);
  });

  it('no fix where it could not keep the line as written: a gradient with an uncertainty', () => {
    const text = unresolved('0.50(2) T/m');
    const analysis = analysisOf(text);
    const d = diagnostics(analysis, URI).filter((x) => x.code === 'beam-unresolved');
    expect(d).toHaveLength(1);
    expect(codeActions(analysis, URI, { range: d[0]!.range, diagnostics: d, only: ['quickfix'] })).toEqual([]);
  });
});

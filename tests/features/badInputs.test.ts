/**
 * Half-written and mistyped setups as a user types them (invented numbers): each mistake gets
 * one diagnostic at its own text, in plain words, and only quick fixes that fix it.
 */
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { cli } from '../cli/runCli';
import { codeActions } from '../../server/src/features/codeActions';
import { diagnostics } from '../../server/src/features/diagnostics';
import { analysisOf, applyEdits, editsOf, URI } from './helpers';
import { NEWER_BLOCKS } from './newerBlockMistakes';

interface Case {
  name: string;
  text: string;
  /** Errors and warnings (notes left out): `line:col-col code [the text it covers]`, 1-based. */
  findings: string[];
  /** Every quick fix offered for the findings: `code: title → the changed line`. */
  fixes?: string[];
  /** Words the messages must hold. */
  says?: string[];
  /** Count notes (information) among the findings too. */
  notes?: boolean;
}

const CASES: Case[] = [
  {
    name: 'a number too large, with its unit apart or glued: one error each, and no fix that drops the unit',
    text: 'field huge = 1e400 T\nfield glued = 1e400T\nmagnet m\n  field = 1/0 T\n  gradient = 10 T/m\n  length = 5 cm\n',
    findings: ['1:14-19 syntax-bad-number [1e400]', '2:15-21 syntax-bad-number [1e400T]', '4:11-14 syntax-bad-number [1/0]'],
    fixes: [],
    says: ['too large to represent', 'check the exponent', 'divides by zero'],
  },
  {
    name: 'NaN and inf where a number goes: one error each',
    text: 'field a = NaN T\nfield b = -inf G\n',
    findings: ['1:11-14 syntax-bad-number [NaN]', '2:11-15 syntax-bad-number [-inf]'],
    fixes: [],
    says: ["'NaN' is not a number", 'write the value in digits'],
  },
  {
    name: 'the U+2212 minus of a pasted value reads as a minus',
    text: 'species Na23\n  level p: 3p 2P°3/2  A = \u221218.53 MHz\nfield bias = \u22123.2 G\n',
    findings: [],
  },
  {
    // Term symbols are written without blanks (²ˢ⁺¹L_J, textbook notation). Read apart, `2P` was taken
    // for a subshell, with three errors and a fix that lower-cased the term's letter.
    name: 'a term symbol typed with a blank inside: one warning, read as meant, and the fix that joins it',
    text: 'species Na23\n  level a: 3p 2P 3/2\n  level b: 3p 2P°3 /2  # kept\n  level c: 2 S1/2\n',
    findings: ['2:15-21 term-blank-inside [2P 3/2]', '3:15-22 term-blank-inside [2P°3 /2]', '4:12-18 term-blank-inside [2 S1/2]'],
    fixes: [
      "term-blank-inside: Replace with '2P3/2' →   level a: 3p 2P3/2",
      "term-blank-inside: Replace with '2P°3/2' →   level b: 3p 2P°3/2  # kept",
      "term-blank-inside: Replace with '2S1/2' →   level c: 2S1/2",
    ],
    says: ['read as 2P3/2'],
  },
  {
    // K39 ground: I = 3/2, J = 1/2, so F = 1, 2 (angular momentum addition, textbook); |m_F| ≤ F.
    name: 'populations that name a sublevel the level lacks are said, not dropped; a wrong entry says what is wrong',
    text: [
      'species K39',
      '  level ground: 4s 2S1/2',
      'magnet m',
      '  field = 0.1 T',
      '  gradient = 100 T/m',
      '  length = 5 cm',
      'beam b',
      '  level = ground',
      '  source = oven 400 K',
      '  slits = 80 um, 50 um apart 40 cm',
      '  magnet = m',
      '  drift = 50 cm',
      '  detector = 10 um',
      '  populations = 3 0 1, 2 1 1, 1 1',
      'beam c',
      '  level = ground',
      '  source = oven 400 K',
      '  slits = 80 um, 50 um apart 40 cm',
      '  magnet = m',
      '  drift = 50 cm',
      '  detector = 10 um',
      '  populations = 2 1 1, 2 5 1',
      '',
    ].join('\n'),
    findings: ['14:17-22 beam-population-unmatched [3 0 1]', '22:24-29 beam-populations-malformed [2 5 1]'],
    says: ["beam 'b': level ground has no F = 3, m_F = 0 (it has F = 1, 2), so this population is not used", 'm_F runs from -F to F, so from -2 to 2 for F = 2'],
  },
  {
    name: 'a beam source with a value out of range: said at the value, and no template that overwrites it',
    text: 'beam b\n  source = oven -300 K\nbeam c\n  source = jet 1500 m/s spread 200 %\nbeam d\n  source = furnace 400 K\n',
    findings: [
      "1:6-7 beam-incomplete [b]",
      '2:17-23 beam-source-malformed [-300 K]',
      "3:6-7 beam-incomplete [c]",
      '4:32-37 beam-source-malformed [200 %]',
      "5:6-7 beam-incomplete [d]",
      '6:12-25 beam-source-malformed [furnace 400 K]',
    ],
    fixes: [
      'beam-source-malformed: Write source = oven 450 K →   source = oven 450 K',
      'beam-source-malformed: Write source = jet 1500 m/s spread 10 % →   source = jet 1500 m/s spread 10 %',
      'beam-source-malformed: Write source = speed 800 m/s →   source = speed 800 m/s',
    ],
    says: ['an oven temperature must be above absolute zero, got -300 K', "unknown source 'furnace'"],
  },
  {
    name: 'a fit naming data or a parameter that do not exist: that name is the error, not a missing one',
    text: 'fit f: nope -> field\nfit g: nope -> mass\nfit h\n',
    findings: [
      "1:8-12 name-unknown [nope]",
      "2:8-12 name-unknown [nope]",
      "2:16-20 fit-parameter-unknown [mass]",
      "3:5-6 fit-incomplete [h]",
      "3:5-6 fit-incomplete [h]",
    ],
  },
  {
    // 3p gives only ²P (one p electron, textbook); ²Q would need L = 12.
    name: 'a J that the term allows but the configuration cannot make is not offered as a fix',
    text: 'species Na23\n  level a: 3p 2Q3/2\n  level b: 3p 2P5/2\n',
    findings: ['2:17-20 term-j-out-of-range [3/2]', '3:17-20 term-j-out-of-range [5/2]'],
    fixes: ['term-j-out-of-range: Change J to 1/2 →   level b: 3p 2P1/2', 'term-j-out-of-range: Change J to 3/2 →   level b: 3p 2P3/2'],
  },
  {
    name: 'a misspelt unit gets "did you mean" only among units of the dimension the setting needs',
    text: 'field b = 8 CM\nmagnet m\n  field = 1 mt\n  gradient = 1 T/m\n  length = 8 CM\n',
    findings: ['1:13-15 unit-unknown [CM]', '3:13-15 unit-unknown [mt]', '5:14-16 unit-unknown [CM]'],
    fixes: ["unit-unknown: Change to 'mT' →   field = 1 mT", "unit-unknown: Change to 'cm' →   length = 8 cm"],
    says: ["unknown unit 'CM': flux density needs T, mT or G"],
  },
  {
    // `8 Tt` was "needs a unit" with a fix giving `8 T Tt`, and an unused `Tt` with a fix deleting it.
    name: 'an unknown word where the unit goes is an unknown unit, with what the setting needs',
    text: 'field c = 8 Tt\nfield d = 8 Tesla\nspecies Demo\n  mass = 23 amu\n',
    findings: ['1:13-15 unit-unknown [Tt]', '2:13-18 unit-unknown [Tesla]', '4:13-16 unit-unknown [amu]'],
    fixes: ["unit-unknown: Change to 'tesla' → field d = 8 tesla"],
    says: ["unknown unit 'Tt': flux density needs T, mT or G", "unknown unit 'amu': mass needs u, Da or kg"],
  },
  {
    name: 'a bad spectrum direction does not hide the mistakes of the other spectrum settings',
    text: 'species Rb87\n  level g: 5s 2S1/2\n  level p: 5p 2P°3/2\nline D2: g -> p\n  spectrum = sideways\n  light = red\n  doppler = -3 K\n',
    findings: ['5:14-22 value-not-allowed [sideways]', '6:11-14 value-not-allowed [red]', '7:13-17 value-out-of-range [-3 K]'],
  },
  {
    name: 'an unusable number inside a vector, a magnetisation or a populations entry is said once, at the number',
    text: [
      'slab pole',
      '  size          = 10, 20, 1e400 mm',
      '  centre        = 0, 0, -8 cm',
      '  magnetisation = 1e400 T along y',
      'beam b',
      '  populations = 2 1e400 1, 1 1',
      '',
    ].join('\n'),
    findings: ['2:27-32 syntax-bad-number [1e400]', '4:19-24 syntax-bad-number [1e400]', '5:6-7 beam-incomplete [b]', '6:19-24 syntax-bad-number [1e400]'],
  },
  {
    name: 'an unusable number where a word goes (spectrum = 1e400 T) is said once',
    text: 'species Rb87\n  level ground: 5s 2S1/2\n  level p: 5p 2P°3/2\nline D2: ground -> p\n  spectrum = 1e400 T\n',
    findings: ['5:14-19 syntax-bad-number [1e400]'],
  },
  {
    name: 'a value word where the unit goes (0.5 exact) is a missing unit, not an unknown one',
    text: 'species Rb87\n  level ground: 5s 2S1/2\nfield bias = 0.5 exact\n',
    findings: ['3:14-17 unit-missing [0.5]', '3:18-23 value-extra [exact]'],
  },
  {
    // Both 3s and 4s are even (parity (-1)^Σl, textbook): the fault is the pair of levels, not the line's name.
    name: 'a line between levels of one parity, or written upper level first, marks its two levels',
    text: 'species Na23\n  level g: 3s 2S1/2\n  level s4: 4s 2S1/2\n  level p: 3p 2P°3/2\nline S: g -> s4\nline D2: p -> g\n',
    findings: ['5:9-16 line-parity-unchanged [g -> s4]', '5:9-16 line-l-zero-zero [g -> s4]', '6:10-16 line-written-as-emission [p -> g]'],
    notes: true,
  },
  {
    name: 'a built-in species named without its block, or spelt otherwise than its block: says which and offers the block name',
    text: 'beam b\n  species = K39\n  level = ground\nspecies Rb87\n  level g: 5s 2S1/2\nfield f = 1 G\n  species = 87Rb\n',
    findings: ['1:6-7 beam-incomplete [b]', '2:13-16 name-unknown [K39]', '7:13-17 name-unknown [87Rb]'],
    fixes: ["name-unknown: Change to 'Rb87' →   species = Rb87"],
    says: ["K39 is built in, but a file uses a species only through its own block; add `species K39`", "did you mean 'Rb87'? A species is named as its block names it"],
  },
  {
    // Review: the did-you-mean and the built-in sentence ran together as "…'K40'?: K41 is built in".
    name: 'a built-in species without its block, close to another block name: the suggestion and the sentence read apart',
    text: 'species K40\n  level g: 4s 2S1/2\nfield f = 1 G\n  species = K41\n',
    findings: ['4:13-16 name-unknown [K41]'],
    says: ["no species named 'K41' — did you mean 'K40'? K41 is built in, but a file uses a species only through its own block"],
  },
  {
    // Review: a number followed by a word is read as a quantity; the message quotes only the word.
    name: 'a populations entry with a word for its weight quotes the word',
    text: 'beam b\n  populations = 1 0.5, 2 abc\n',
    findings: ['1:6-7 beam-incomplete [b]', '2:24-29 beam-populations-malformed [2 abc]'],
    says: ["'abc' is not a number"],
  },
  {
    name: 'a resonance with one side of its pair unreadable says so at that side; a side not written says which',
    text: 'species Rb87\n  level g: 5s 2S1/2\nresonance r\n  level = g\n  lower = 2 x\n  upper = 1 1\nresonance s\n  level = g\n  upper = 1 1\n',
    findings: ['5:13-14 resonance-sublevel-malformed [x]', '7:11-12 resonance-incomplete [s]'],
    says: ["'x' is not a number: write lower = <F> <m_F>", "resonance 's' gives its upper sublevel but not its lower one; add lower = <F> <m_F>"],
  },
  {
    name: 'every wrong populations entry is said, each at its own entry',
    text: 'beam b\n  populations = 2 5 1, 1 1, 2 x 1, 3 0 -1, 1 2 1 1\n',
    findings: [
      '1:6-7 beam-incomplete [b]',
      '2:17-22 beam-populations-malformed [2 5 1]',
      '2:29-34 beam-populations-malformed [2 x 1]',
      '2:36-42 beam-populations-malformed [3 0 -1]',
      '2:44-51 beam-populations-malformed [1 2 1 1]',
    ],
    says: ["'x' is not a number", 'a weight cannot be negative, got -1', 'an entry has 2 or 3 numbers, this one has 4'],
  },
  {
    name: 'a use path without its closing quote, or without quotes: one error, with the fix that quotes it',
    text: 'use "shared/alkali.sublevel\nuse shared/other.sublevel\n',
    findings: ['1:5-28 syntax-use-path ["shared/alkali.sublevel]', '2:5-26 syntax-use-path [shared/other.sublevel]'],
    fixes: ['syntax-use-path: Write "shared/alkali.sublevel" → use "shared/alkali.sublevel"', 'syntax-use-path: Write "shared/other.sublevel" → use "shared/other.sublevel"'],
  },
  {
    // 2P has J = 1/2, 3/2 only (S = 1/2, L = 1; textbook): after the join, 5/2 is a second, real mistake.
    name: 'a term with a parity mark and a blank inside is joined; a J it cannot have is then said at the J',
    text: 'species Na23\n  level p: 3p 2P° 3/2\n  level q: 3p 2P° 5/2\n',
    findings: ['2:15-22 term-blank-inside [2P° 3/2]', '3:15-22 term-blank-inside [2P° 5/2]', '3:19-22 term-j-out-of-range [5/2]'],
    fixes: [
      "term-blank-inside: Replace with '2P°3/2' →   level p: 3p 2P°3/2",
      "term-blank-inside: Replace with '2P°5/2' →   level q: 3p 2P°5/2",
      'term-j-out-of-range: Change J to 1/2 →   level q: 3p 2P° 1/2',
      'term-j-out-of-range: Change J to 3/2 →   level q: 3p 2P° 3/2',
    ],
  },
  {
    name: 'an unknown unit in a vector or a field source is said as in any other setting; a stray word after a plain number is left over',
    text: 'slab pole\n  size          = 10, 20, 5 mn\n  centre        = 0, 0, -8 cm\n  magnetisation = 1.2 T along y\ncoil c\n  radius  = 3 cn\n  turns   = 40 x\n  current = 2 Amp\n',
    findings: ['2:29-31 unit-unknown [mn]', '6:15-17 unit-unknown [cn]', '7:16-17 value-extra [x]', '8:15-18 unit-unknown [Amp]'],
    fixes: ['value-extra: Remove the unused rest of the value →   turns   = 40'],
    says: ["unknown unit 'mn': length needs m, cm, mm or um", "unknown unit 'Amp': current needs A, mA or kA", "turns takes one plain number (number of turns, e.g. 120); 'x' is not used"],
  },
  {
    name: 'a decimal comma where one value goes: one error at the number, and the fix that writes the point',
    text: 'field b = 3,2 G\nmagnet m\n  field = 0,45 T\n  gradient = 180 T/m\n  length = 8 cm\nspecies Na23\n  level g: 3s 2S1/2 A = 885,8 MHz\n',
    findings: ['1:11-14 value-decimal-comma [3,2]', '3:11-15 value-decimal-comma [0,45]', '7:25-30 value-decimal-comma [885,8]'],
    fixes: [
      "value-decimal-comma: Replace with '3.2' → field b = 3.2 G",
      "value-decimal-comma: Replace with '0.45' →   field = 0.45 T",
      "value-decimal-comma: Replace with '885.8' →   level g: 3s 2S1/2 A = 885.8 MHz",
    ],
    says: ["'3,2' has a decimal comma; a comma separates list items, so write 3.2"],
  },
  {
    name: 'an arrow typed otherwise (=>, -->, an em dash, a blank inside) is one error at it, with the fix that writes ->',
    text: 'species Rb87\n  level g: 5s 2S1/2\n  level p: 5p 2P°3/2\nline A: g => p\nline B: g --> p\nline C: g \u2014> p\nline D: g - > p\nline E: g \u2192 p\n',
    findings: ['4:11-13 syntax-missing-arrow [=>]', '5:11-14 syntax-missing-arrow [-->]', '6:11-13 syntax-missing-arrow [\u2014>]', '7:11-14 syntax-missing-arrow [- >]'],
    fixes: ["syntax-missing-arrow: Write '->' → line A: g -> p", "syntax-missing-arrow: Write '->' → line B: g -> p", "syntax-missing-arrow: Write '->' → line C: g -> p", "syntax-missing-arrow: Write '->' → line D: g -> p"],
    says: ["'=>' is not the arrow: write '->' between the levels"],
  },
  {
    name: 'a degree sign before K is an unknown unit with the fix that drops it, not a missing unit',
    text: 'species Rb87\n  level g: 5s 2S1/2\nbeam b\n  level = g\n  source = oven 400 °K\n  slits = 80 um, 50 um apart 40 cm\n  drift = 50 cm\n  detector = 10 um\n',
    findings: ["3:6-7 beam-incomplete [b]", '5:21-23 unit-unknown [°K]'],
    fixes: ["unit-unknown: Change to 'K' →   source = oven 400 K"],
  },
  {
    // Before: a wrong dimension on `T` and an unused `m`, whose two fixes together wrote `180 T/m m`.
    name: 'a unit typed with a blank where its slash goes (180 T m) is one error, with the one fix that writes T/m',
    text: 'magnet m\n  field = 0.45 T\n  gradient = 180 T m\n  length = 8 cm\nmagnet n\n  field = 4.5 kG\n  gradient = 18 kG cm\n  length = 8 cm\n',
    findings: ['3:18-21 unit-wrong-dimension [T m]', '7:17-22 unit-wrong-dimension [kG cm]'],
    fixes: ['unit-wrong-dimension: Change the unit to T/m →   gradient = 180 T/m', 'unit-wrong-dimension: Change the unit to kG/cm →   gradient = 18 kG/cm'],
    says: ["gradient needs T/m or G/cm, got 'T m' (a blank multiplies units): write T/m"],
  },
  {
    // docs/format.md: one unit at the end is shared only by the three numbers of a point or size.
    name: 'a list of numbers with one unit where one value goes (3, 2 G) is one error that says so, with no fix that drops a number',
    text: 'field b = 3, 2 G\nmagnet m\n  field = 0.4, 0.5 T\n  gradient = 180 T/m\n  length = 8 cm\n',
    findings: ['1:11-17 value-list-one-unit [3, 2 G]', '3:11-21 value-list-one-unit [0.4, 0.5 T]'],
    fixes: [],
    says: ["'3, 2 G' is a list of 2 numbers, and one unit at the end is shared only by the three numbers of a point or size"],
  },
  {
    name: 'an unused list item goes with its comma',
    text: 'coil c\n  radius  = 3 cm\n  turns   = 40, 5  # kept\n  current = 2 A\n',
    findings: ['3:17-18 value-extra [5]'],
    fixes: ['value-extra: Remove the unused rest of the value →   turns   = 40  # kept'],
  },
  {
    // 2P has J = 1/2, 3/2 only (S = 1/2, L = 1; textbook).
    name: 'a term with blanks inside its J (2P 5 /2, 2 S 1/2) is joined whole; a J the term cannot have is then said at the J as written',
    text: 'species Na23\n  level a: 3p 2P 3 /2\n  level b: 3p 2P 5 /2\n  level c: 2 S 1/2\n',
    findings: ['2:15-22 term-blank-inside [2P 3 /2]', '3:15-22 term-blank-inside [2P 5 /2]', '3:18-22 term-j-out-of-range [5 /2]', '4:12-19 term-blank-inside [2 S 1/2]'],
    fixes: [
      "term-blank-inside: Replace with '2P3/2' →   level a: 3p 2P3/2",
      "term-blank-inside: Replace with '2P5/2' →   level b: 3p 2P5/2",
      'term-j-out-of-range: Change J to 1/2 →   level b: 3p 2P 1/2',
      'term-j-out-of-range: Change J to 3/2 →   level b: 3p 2P 3/2',
      "term-blank-inside: Replace with '2S1/2' →   level c: 2S1/2",
    ],
    says: ['read as 2P5/2'],
  },
];


function describeFindings(text: string, notes = false): { findings: string[]; fixes: string[]; messages: string[] } {
  const lines = text.split(/\r\n|\r|\n/);
  const analysis = analysisOf(text);
  const ds = diagnostics(analysis, URI).filter((d) => d.severity !== undefined && d.severity <= (notes ? 3 : 2));
  const fixes: string[] = [];
  for (const d of ds) {
    for (const a of codeActions(analysis, URI, { range: d.range, diagnostics: [d], only: ['quickfix'] })) {
      const after = applyEdits(text, editsOf(a.edit)).split(/\r\n|\r|\n/);
      fixes.push(`${String(d.code)}: ${a.title} → ${after[d.range.start.line]}`);
    }
  }
  const findings = ds.map((d) => {
    const { start, end } = d.range;
    const covered = start.line === end.line ? lines[start.line]!.slice(start.character, end.character) : '…';
    return `${start.line + 1}:${start.character + 1}-${end.character + 1} ${String(d.code)} [${covered}]`;
  });
  return { findings, fixes, messages: ds.map((d) => (typeof d.message === 'string' ? d.message : d.message.value)) };
}

describe('bad inputs', () => {
  for (const c of [...CASES, ...NEWER_BLOCKS] as Case[]) {
    it(c.name, () => {
      const got = describeFindings(c.text, c.notes);
      expect(got.findings).toEqual(c.findings);
      if (c.fixes) expect(got.fixes).toEqual(c.fixes);
      for (const words of c.says ?? []) expect(got.messages.join('\n')).toContain(words);
    });
  }
});

describe('the beam weights the newer blocks\' populations give', () => {
  for (const c of NEWER_BLOCKS.filter((c) => c.beamPopulations)) {
    it(c.name, () => {
      const subs = analysisOf(c.text).result!.beams[0]!.sublevels;
      const got = Object.fromEntries(subs.map((s) => [s.label, s.population]));
      expect(Object.keys(got).sort()).toEqual(Object.keys(c.beamPopulations!).sort());
      for (const [label, weight] of Object.entries(c.beamPopulations!)) expect(got[label], label).toBeCloseTo(weight, 12);
    });
  }
});

describe('the newer blocks\' mistakes on the command line', () => {
  const dir = mkdtempSync(path.join(tmpdir(), 'sublevel-bad-inputs-'));
  afterAll(() => rmSync(dir, { recursive: true, force: true }));
  NEWER_BLOCKS.forEach((c, i) => {
    it(`check, eval text, JSON and SARIF carry every finding, with no NaN or Infinity: ${c.name}`, () => {
      const file = path.join(dir, `case${i}.sublevel`);
      writeFileSync(file, c.text);
      const check = cli('check', file).out;
      const outputs = { text: cli('eval', file).out, json: cli('eval', file, '--format', 'json').out, sarif: cli('check', file, '--format', 'sarif').out };
      for (const finding of c.findings) {
        const [at, code] = finding.split(' ') as [string, string];
        const line = at.split(':')[0]!;
        const column = at.split(':')[1]!.split('-')[0]!;
        expect(check, finding).toContain(`:${line}:${column} `);
        expect(check, finding).toContain(code);
        for (const [kind, out] of Object.entries(outputs)) expect(out, `${kind}: ${finding}`).toContain(code);
      }
      const sarif = JSON.parse(outputs.sarif) as { runs: { results: { ruleId: string }[] }[] };
      expect(sarif.runs[0]!.results.map((r) => r.ruleId)).toEqual(expect.arrayContaining(c.findings.map((f) => f.split(' ')[1])));
      for (const out of [check, ...Object.values(outputs)]) expect(out).not.toMatch(/\bNaN\b|Infinity/);
    });
  });
});

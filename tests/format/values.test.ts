/**
 * Values: how a setting's text splits into groups of numbers, quantities and words, and what
 * numbers the parts carry (fractions, uncertainties).
 */
import { describe, expect, it } from 'vitest';
import type { ValuePart } from '../../server/src/format/ast';
import { parseSetup } from '../../server/src/format/parser';
import { formatRange } from '../../server/src/format/positions';
import { partSummary, problemSummary } from './summary';

/** Parses `value` as the value of a beam's `source` (a key that takes any value). */
function valueOf(value: string): { parts: string[][]; doc: ReturnType<typeof parseSetup> } {
  const doc = parseSetup(`beam\n  source = ${value}`);
  const s = doc.blocks[0]!.settings[0]!;
  return { parts: s.groups.map((g) => g.map(partSummary)), doc };
}

function onlyPart(value: string): ValuePart {
  const doc = parseSetup(`beam\n  source = ${value}`);
  expect(doc.problems).toEqual([]);
  const groups = doc.blocks[0]!.settings[0]!.groups;
  expect(groups.length).toBe(1);
  expect(groups[0]!.length).toBe(1);
  return groups[0]![0]!;
}

describe('value parts', () => {
  const table: [string, string[][]][] = [
    ['401.75', [['n:401.75']]],
    ['-3.06', [['n:-3.06']]],
    ['1.2e-3', [['n:1.2e-3']]],
    ['+2', [['n:+2']]],
    ['3/2', [['n:3/2']]],
    ['-1/2', [['n:-1/2']]],
    ['0.35(2)', [['n:0.35(2)']]],
    ['0.45 T', [['q:0.45|T']]],
    ['0.35(2) T', [['q:0.35(2)|T']]],
    ['720K', [['q:720|K']]],
    ['80um', [['q:80|um']]],
    ['3.2G', [['q:3.2|G']]],
    ['180 T/m', [['q:180|T/m']]],
    ['18 G/cm', [['q:18|G/cm']]],
    ['14.9 cm^-1', [['q:14.9|cm^-1']]],
    ['14.9 1/cm', [['q:14.9|1/cm']]],
    ['14.9 cm-1', [['q:14.9|cm-1']]],
    ['14.9 cm⁻¹', [['q:14.9|cm⁻¹']]],
    ['1500 m/s', [['q:1500|m/s']]],
    ['8 %', [['q:8|%']]],
    ['8%', [['q:8|%']]],
    ['80 µm', [['q:80|µm']]],
    ['80 μm', [['q:80|μm']]],
    ['2.75 μN', [['q:2.75|μN']]],
    ['25 degC', [['q:25|degC']]],
    ['1.2345(67)e-3 eV', [['q:1.2345(67)e-3|eV']]],
    // a number followed by a word that is not a unit stays a number and a word
    ['oven 720 K', [['w:oven', 'q:720|K']]],
    ['jet 1500 m/s spread 8 %', [['w:jet', 'q:1500|m/s', 'w:spread', 'q:8|%']]],
    ['80 um, 50 um apart 40 cm', [['q:80|um'], ['q:50|um', 'w:apart', 'q:40|cm']]],
    ['2 apart', [['n:2', 'w:apart']]],
    ['oven 3 ground', [['w:oven', 'n:3', 'w:ground']]],
    // an item of just a number and a word: the word stands where the unit goes, so the unit reader says it is unknown
    ['3 ground', [['q:3|ground']]],
    ['10, 5 mn', [['n:10'], ['q:5|mn']]],
    // names that start with digits are words, not quantities with odd units
    ['87Rb', [['w:87Rb']]],
    ['23Na', [['w:23Na']]],
    ['2S1/2', [['w:2S1/2']]],
    ['1s2.2s', [['w:1s2.2s']]],
    // a misspelt unit after a space still makes a quantity, so the unit reader can say "did you mean"
    ['401.75 Mhz', [['q:401.75|Mhz']]],
    ['401.75 mhz', [['q:401.75|mhz']]],
    ['3 Gauss', [['q:3|Gauss']]],
    // glued to an unknown unit: a word (the unit reader still explains it)
    ['401.75Mhz', [['w:401.75Mhz']]],
    // the minus sign U+2212 that a value copied from a paper holds is a minus (Unicode standard, U+2212 MINUS SIGN)
    ['\u221218.53 MHz', [['q:\u221218.53|MHz']]],
    ['\u22121/2', [['n:\u22121/2']]],
    ['1e\u22122 T/m', [['q:1e\u22122|T/m']]],
  ];
  for (const [value, parts] of table) {
    it(`${value} → ${JSON.stringify(parts)}`, () => {
      const { parts: got, doc } = valueOf(value);
      expect(problemSummary(doc)).toEqual([]);
      expect(got).toEqual(parts);
    });
  }
});

describe('numbers in parts', () => {
  it('decimals and exponents', () => {
    const p = onlyPart('1.2e-3');
    expect(p.kind === 'number' && p.number).toEqual({ value: 0.0012 });
  });

  it('integers get an exact fraction n/1, with or without a sign', () => {
    const a = onlyPart('+2');
    const b = onlyPart('-7');
    expect(a.kind === 'number' && a.number).toEqual({ value: 2, fraction: { num: 2, den: 1 } });
    expect(b.kind === 'number' && b.number).toEqual({ value: -7, fraction: { num: -7, den: 1 } });
  });

  it('fractions are exact and reduced', () => {
    const a = onlyPart('3/2');
    const b = onlyPart('-1/2');
    const c = onlyPart('6/4');
    expect(a.kind === 'number' && a.number).toEqual({ value: 1.5, fraction: { num: 3, den: 2 } });
    expect(b.kind === 'number' && b.number).toEqual({ value: -0.5, fraction: { num: -1, den: 2 } });
    expect(c.kind === 'number' && c.number).toEqual({ value: 1.5, fraction: { num: 3, den: 2 } });
  });

  it('uncertainty digits apply to the last digits written', () => {
    const a = onlyPart('0.35(2)');
    expect(a.kind === 'number' && a.number.value).toBe(0.35);
    expect(a.kind === 'number' && a.number.uncertainty).toBeCloseTo(0.02, 15);
    expect(a.kind === 'number' && a.number.fraction).toBeUndefined();
    const b = onlyPart('1.2345(67)e-3 T');
    expect(b.kind).toBe('quantity');
    if (b.kind === 'quantity') {
      expect(b.number.value).toBeCloseTo(1.2345e-3, 18);
      expect(b.number.uncertainty).toBeCloseTo(6.7e-6, 18);
    }
    const c = onlyPart('12.3(1.2)');
    expect(c.kind === 'number' && c.number.uncertainty).toBeCloseTo(1.2, 14);
    const d = onlyPart('350(12)');
    expect(d.kind === 'number' && d.number.uncertainty).toBe(12);
  });

  it('a quantity carries the unit span and the whole span', () => {
    const doc = parseSetup('beam\n  drift = 35   cm');
    const p = doc.blocks[0]!.settings[0]!.groups[0]![0]!;
    expect(p.kind).toBe('quantity');
    if (p.kind !== 'quantity') return;
    expect(p.text).toBe('35   cm');
    expect(formatRange(p.range)).toBe('1:10-1:17');
    expect(p.unit.text).toBe('cm');
    expect(formatRange(p.unit.range)).toBe('1:15-1:17');
  });

  it('numbers that cannot be used are reported and kept as words, with the unit after them', () => {
    // The unit belongs to the bad number: a separate word `K` read as an unused extra value once
    // offered a quick fix that deleted the unit and left the bad number.
    const { parts, doc } = valueOf('1/0, 1e999, 2e999 K');
    expect(parts).toEqual([['w:1/0'], ['w:1e999'], ['w:2e999 K']]);
    expect(problemSummary(doc)).toEqual(['syntax-bad-number 1:11-1:14', 'syntax-bad-number 1:16-1:21', 'syntax-bad-number 1:23-1:28']);
  });

  it('NaN and inf before a unit are bad numbers; alone they stay words (a name may be inf)', () => {
    const a = valueOf('NaN T, -inf mT');
    expect(a.parts).toEqual([['w:NaN T'], ['w:-inf mT']]);
    expect(problemSummary(a.doc)).toEqual(['syntax-bad-number 1:11-1:14', 'syntax-bad-number 1:18-1:22']);
    const b = valueOf('inf');
    expect(b.parts).toEqual([['w:inf']]);
    expect(problemSummary(b.doc)).toEqual([]);
  });

  it('the U+2212 minus gives the same number as the ASCII one', () => {
    const a = onlyPart('\u22123.06');
    const b = onlyPart('\u22121/2');
    expect(a.kind === 'number' && a.number).toEqual({ value: -3.06 });
    expect(b.kind === 'number' && b.number).toEqual({ value: -0.5, fraction: { num: -1, den: 2 } });
  });
});

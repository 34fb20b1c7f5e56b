/**
 * Small modules of the format layer: positions, numbers, edit distance and suggestions,
 * the unit grammar, and the problem-code registry.
 */
import { describe, expect, it } from 'vitest';
import { RULES } from '../../server/src/format/codes';
import { editDistance, suggestNames } from '../../server/src/format/didYouMean';
import { readNumber, readNumberPrefix } from '../../server/src/format/numbers';
import { parseSetup } from '../../server/src/format/parser';
import {
  comparePositions,
  computeLineStarts,
  lineEndOffset,
  lineText,
  offsetToPosition,
  positionToOffset,
  rangeContains,
} from '../../server/src/format/positions';
import { canonicalUnitName, parseUnitSyntax } from '../../server/src/format/unitGrammar';

describe('positions', () => {
  const text = 'ab\r\ncd\nef\rg';
  const index = { text, lineStarts: computeLineStarts(text) };

  it('line starts after \\r\\n, \\n and a lone \\r', () => {
    expect(index.lineStarts).toEqual([0, 4, 7, 10]);
    expect(computeLineStarts('')).toEqual([0]);
    expect(computeLineStarts('x\n')).toEqual([0, 2]);
  });

  it('offset ↔ position round trip, with clamping', () => {
    for (let o = 0; o <= text.length; o++) {
      const p = offsetToPosition(index, o);
      if (text[o - 1] === '\r' && text[o] === '\n') continue; // between \r and \n: no position of its own
      expect(positionToOffset(index, p)).toBe(o);
    }
    expect(offsetToPosition(index, 5)).toEqual({ line: 1, character: 1 });
    expect(offsetToPosition(index, -3)).toEqual({ line: 0, character: 0 });
    expect(offsetToPosition(index, 99)).toEqual({ line: 3, character: 1 });
    expect(positionToOffset(index, { line: 0, character: 50 })).toBe(2); // clamped before \r\n
    expect(positionToOffset(index, { line: 9, character: 0 })).toBe(text.length);
  });

  it('line text and line ends exclude the line break', () => {
    expect([0, 1, 2, 3].map((l) => lineText(index, l))).toEqual(['ab', 'cd', 'ef', 'g']);
    expect(lineEndOffset(index, 0)).toBe(2);
    expect(lineText(index, 7)).toBe('');
  });

  it('comparing positions and containment', () => {
    const r = { start: { line: 1, character: 2 }, end: { line: 1, character: 5 } };
    expect(rangeContains(r, { line: 1, character: 5 })).toBe(true);
    expect(rangeContains(r, { line: 1, character: 6 })).toBe(false);
    expect(comparePositions({ line: 0, character: 9 }, { line: 1, character: 0 })).toBeLessThan(0);
  });
});

describe('numbers', () => {
  it('whole-string numbers', () => {
    expect(readNumber('401.75')).toEqual({ ok: true, number: { value: 401.75 } });
    expect(readNumber('.5')).toEqual({ ok: true, number: { value: 0.5 } });
    expect(readNumber('-0')).toEqual({ ok: true, number: { value: 0, fraction: { num: 0, den: 1 } } });
    expect(readNumber('7/2')).toEqual({ ok: true, number: { value: 3.5, fraction: { num: 7, den: 2 } } });
    expect(readNumber('1/0')).toEqual({ ok: false, reason: 'divides by zero' });
    expect(readNumber('1e400')?.ok).toBe(false);
    expect(readNumber('abc')).toBeUndefined();
    expect(readNumber('3/2/1')).toBeUndefined();
    expect(readNumber('0.35(2')).toBeUndefined();
    expect(readNumber('1.5e')).toBeUndefined();
  });

  it('a number prefix stops where a unit starts', () => {
    expect(readNumberPrefix('720K')?.length).toBe(3);
    expect(readNumberPrefix('1e3m')?.length).toBe(3);
    expect(readNumberPrefix('2eV')?.length).toBe(1);
    expect(readNumberPrefix('5e-3T')?.length).toBe(4);
    expect(readNumberPrefix('K720')).toBeUndefined();
  });
});

describe('edit distance and suggestions', () => {
  it('counts insertions, deletions, substitutions and neighbour swaps as one edit each', () => {
    expect(editDistance('magent', 'magnet')).toBe(1);
    expect(editDistance('gradiant', 'gradient')).toBe(1);
    expect(editDistance('kitten', 'sitting')).toBe(3); // textbook example (Levenshtein): 3
    expect(editDistance('', 'abc')).toBe(3);
    expect(editDistance('abcdef', 'uvwxyz', 2)).toBe(3); // stops past the limit
  });

  it('suggests close names, case-only matches first and alone', () => {
    expect(suggestNames('magent', ['species', 'field', 'magnet', 'beam', 'line', 'settings'])).toEqual(['magnet']);
    expect(suggestNames('Mhz', ['Hz', 'kHz', 'MHz', 'GHz'])).toEqual(['MHz']);
    expect(suggestNames('a', ['A', 'B', 'C'])).toEqual(['A']);
    expect(suggestNames('x', ['A', 'B'])).toEqual([]);
    expect(suggestNames('magnet', ['magnet'])).toEqual([]);
    expect(suggestNames('z'.repeat(100000), ['magnet'])).toEqual([]);
  });
});

describe('unit grammar', () => {
  it('terms and powers', () => {
    const terms = (t: string): string[] => {
      const r = parseUnitSyntax(t);
      return r.ok ? r.terms.map((x) => `${x.name}^${x.power}`) : [`error: ${r.message}`];
    };
    expect(terms('T/m')).toEqual(['T^1', 'm^-1']);
    expect(terms('cm^-1')).toEqual(['cm^-1']);
    expect(terms('1/cm')).toEqual(['cm^-1']);
    expect(terms('kg*m/s^2')).toEqual(['kg^1', 'm^1', 's^-2']);
    expect(terms('m/s/s')).toEqual(['m^1', 's^-1', 's^-1']);
    expect(terms('m²')).toEqual(['m^2']);
    expect(terms('cm^(-1)')).toEqual(['cm^-1']);
    expect(terms('T//m')[0]).toMatch(/^error/);
    expect(terms('m^0')[0]).toMatch(/^error/);
    expect(terms('')[0]).toMatch(/^error/);
  });

  it('names: prefixes, the gauss, micro spellings, special names', () => {
    expect(canonicalUnitName('G')).toBe('G');
    expect(canonicalUnitName('mG')).toBe('mG');
    expect(canonicalUnitName('GHz')).toBe('GHz');
    expect(canonicalUnitName('µm')).toBe('um');
    expect(canonicalUnitName('μm')).toBe('um');
    expect(canonicalUnitName('μN')).toBe('muN');
    expect(canonicalUnitName('%')).toBe('percent');
    expect(canonicalUnitName('millitesla')).toBe('millitesla');
    expect(canonicalUnitName('metre')).toBe('meter');
    expect(canonicalUnitName('Mhz')).toBeUndefined();
    expect(canonicalUnitName('Rb')).toBeUndefined();
    expect(canonicalUnitName('mu')).toBeUndefined();
  });
});

describe('problem codes', () => {
  it('every code the parser and unit reader report is registered with a severity and stage', () => {
    for (const [code, rule] of Object.entries(RULES)) {
      expect(code).toMatch(/^[a-z]+(-[a-z]+)+$/);
      expect(['syntax', 'unit', 'model', 'physics']).toContain(rule.stage);
      expect(rule.summary.length).toBeGreaterThan(10);
    }
    const doc = parseSetup('x = 1\nmagent m\nmagnet m\n  gradiant = 1\n  field 1 T\n  field = 2 T\n  length = 1/0\nlevel a: b c');
    for (const p of doc.problems) expect(RULES[p.code], p.code).toBeDefined();
    expect(new Set(doc.problems.map((p) => p.code)).size).toBeGreaterThanOrEqual(5);
  });
});

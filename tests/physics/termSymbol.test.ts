import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  allowedJ,
  formatTermSymbol,
  letterToL,
  orbitalLetter,
  parseTermSymbol,
  TextIssue,
} from '../../server/src/physics/termSymbol';

describe('orbital letters (standard spectroscopic sequence, from memory)', () => {
  it('runs S P D F G H I K L M N O Q R T U V, skipping J and the reused P and S', () => {
    expect(Array.from({ length: 17 }, (_, L) => orbitalLetter(L)).join('')).toBe('SPDFGHIKLMNOQRTUV');
  });
  it('letterToL inverts orbitalLetter and rejects J and non-letters', () => {
    for (let L = 0; L <= 20; L++) expect(letterToL(orbitalLetter(L))).toBe(L);
    expect(letterToL('J')).toBeNull();
    expect(letterToL('E')).toBeNull();
    expect(letterToL('p')).toBeNull();
    expect(letterToL('PP')).toBeNull();
  });
  it('has a visible fallback beyond the lettered range', () => {
    expect(orbitalLetter(21)).toBe('[21]');
  });
});

describe('allowedJ', () => {
  it('gives |L−S| … L+S in twice-units', () => {
    expect(allowedJ(1, 1)).toEqual([1, 3]); // 2P: 1/2, 3/2
    expect(allowedJ(2, 1)).toEqual([0, 2, 4]); // 3P: 0, 1, 2
    expect(allowedJ(4, 2)).toEqual([0, 2, 4, 6, 8]); // 5D: 0..4
    expect(allowedJ(3, 0)).toEqual([3]); // 4S: 3/2
    expect(allowedJ(7, 0)).toEqual([7]); // 8S: 7/2
    expect(allowedJ(5, 1)).toEqual([3, 5, 7]); // 6P: 3/2..7/2 (L < S)
  });
  it('always has min(2S+1, 2L+1) values (property)', () => {
    fc.assert(
      fc.property(fc.nat(20), fc.nat(20), (twoS, L) => allowedJ(twoS, L).length === Math.min(twoS + 1, 2 * L + 1)),
    );
  });
});

describe('parseTermSymbol: accepted forms', () => {
  const cases: [string, number, number, number | null, 'odd' | null][] = [
    // text, twoS, L, twoJ, parity
    ['2P3/2', 1, 1, 3, null],
    ['²P₃/₂', 1, 1, 3, null],
    ['2P°3/2', 1, 1, 3, 'odd'],
    ['²P°₃/₂', 1, 1, 3, 'odd'],
    ['2Po3/2', 1, 1, 3, 'odd'],
    ['2P_{3/2}', 1, 1, 3, null],
    ['^2P_3/2', 1, 1, 3, null],
    ['^{2}P_{3/2}', 1, 1, 3, null],
    ['2P3/2°', 1, 1, 3, 'odd'],
    ['2P₃⁄₂', 1, 1, 3, null],
    ['2S½', 1, 0, 1, null],
    ['3P0', 2, 1, 0, null],
    ['5D4', 4, 2, 8, null],
    ['8S7/2', 7, 0, 7, null],
    ['2S1/2', 1, 0, 1, null],
    ['6S5/2', 5, 0, 5, null],
    ['2P', 1, 1, null, null],
    ['4S°', 3, 0, null, 'odd'],
    ['9D°2', 8, 2, 4, 'odd'],
    ['5I4', 4, 6, 8, null],
    ['3H6', 2, 5, 12, null],
    ['4I°15/2', 3, 6, 15, 'odd'],
    ['5L°6', 4, 8, 12, 'odd'],
    ['1S0', 0, 0, 0, null],
  ];
  for (const [text, twoS, L, twoJ, parity] of cases) {
    it(JSON.stringify(text), () => {
      const { term, issues } = parseTermSymbol(text);
      expect(issues).toEqual([]);
      expect(term).not.toBeNull();
      expect(term).toMatchObject({ twoS, L, twoJ, parityMark: parity, multiplicity: twoS + 1, text });
    });
  }
  it('trims surrounding whitespace and keeps the written text', () => {
    const { term } = parseTermSymbol('  2P3/2 ');
    expect(term?.text).toBe('2P3/2');
  });
});

/** The single issue of a parse, checked for code, range and severity. */
function onlyIssue(text: string): TextIssue {
  const { issues } = parseTermSymbol(text);
  expect(issues, text).toHaveLength(1);
  return issues[0];
}

describe('parseTermSymbol: each bad form gives its code at the exact range', () => {
  it('J outside |L−S|..L+S lists the allowed J and offers them', () => {
    const x = onlyIssue('2P5/2');
    expect(x).toMatchObject({ code: 'term-j-out-of-range', start: 2, end: 5, severity: 'error' });
    expect(x.suggestions).toEqual(['1/2', '3/2']);
    expect(x.message).toContain('1/2 or 3/2');
    expect(parseTermSymbol('2P5/2').term).toBeNull();
  });
  it('J out of range: 3P3 and 5D5', () => {
    expect(onlyIssue('3P3')).toMatchObject({ code: 'term-j-out-of-range', start: 2, end: 3 });
    expect(onlyIssue('3P3').suggestions).toEqual(['0', '1', '2']);
    expect(onlyIssue('5D5')).toMatchObject({ code: 'term-j-out-of-range', start: 2, end: 3 });
  });
  it('suggestions follow the user\'s unicode spelling', () => {
    const x = onlyIssue('²P₅/₂');
    expect(x).toMatchObject({ code: 'term-j-out-of-range', start: 2, end: 5 });
    expect(x.suggestions).toEqual(['₁/₂', '₃/₂']);
  });
  it('offsets count leading whitespace', () => {
    expect(onlyIssue('  2P5/2')).toMatchObject({ code: 'term-j-out-of-range', start: 4, end: 7 });
  });
  it('integer J with even multiplicity (half-integer spin) and vice versa', () => {
    const a = onlyIssue('2P1');
    expect(a).toMatchObject({ code: 'term-j-parity-of-spin', start: 2, end: 3 });
    expect(a.message).toContain('half-integer');
    expect(a.suggestions).toEqual(['1/2', '3/2']);
    const b = onlyIssue('3P1/2');
    expect(b).toMatchObject({ code: 'term-j-parity-of-spin', start: 2, end: 5 });
    expect(b.message).toContain('whole number');
    expect(b.suggestions).toEqual(['0', '1', '2']);
  });
  it('letter J is skipped in the sequence: did you mean K or I', () => {
    const x = onlyIssue('3J2');
    expect(x).toMatchObject({ code: 'term-bad-letter', start: 1, end: 2 });
    expect(x.suggestions).toEqual(['K', 'I']);
  });
  it('unknown letter', () => {
    expect(onlyIssue('3E1')).toMatchObject({ code: 'term-bad-letter', start: 1, end: 2 });
    expect(onlyIssue('3E1').suggestions).toBeUndefined();
  });
  it('molecular letter suggests the atomic one', () => {
    expect(onlyIssue('2Σ1/2')).toMatchObject({ code: 'term-bad-letter', start: 1, end: 2, suggestions: ['S'] });
  });
  it('multiplicity below 1', () => {
    expect(onlyIssue('0S0')).toMatchObject({ code: 'term-bad-multiplicity', start: 0, end: 1 });
    expect(onlyIssue('^{0}P1')).toMatchObject({ code: 'term-bad-multiplicity', start: 1, end: 4 });
  });
  it('malformed text', () => {
    expect(onlyIssue('2P3/2x')).toMatchObject({ code: 'term-malformed', start: 5, end: 6 });
    expect(onlyIssue('')).toMatchObject({ code: 'term-malformed', start: 0, end: 0 });
    expect(onlyIssue('P3/2')).toMatchObject({ code: 'term-malformed', start: 0, end: 1 });
    expect(onlyIssue('2')).toMatchObject({ code: 'term-malformed' });
    expect(onlyIssue('2P_')).toMatchObject({ code: 'term-malformed' });
    expect(onlyIssue('2P3/')).toMatchObject({ code: 'term-malformed', start: 2, end: 4 });
    expect(onlyIssue('2P{3/2')).toMatchObject({ code: 'term-malformed' });
  });
  it('decimal J is refused with the fraction as a fix', () => {
    expect(onlyIssue('2P1.5')).toMatchObject({ code: 'term-j-decimal', start: 2, end: 5, suggestions: ['3/2'] });
    expect(onlyIssue('3P2.0')).toMatchObject({ code: 'term-j-decimal', suggestions: ['2'] });
  });
  it('J that is not a multiple of 1/2', () => {
    expect(onlyIssue('2P3/4')).toMatchObject({ code: 'term-j-not-half-integer', start: 2, end: 5 });
  });
  it('unusual but exact fraction is a warning and still parses', () => {
    const r = parseTermSymbol('3P4/2');
    expect(r.issues).toMatchObject([{ code: 'term-j-unusual-fraction', severity: 'warning', suggestions: ['2'] }]);
    expect(r.term?.twoJ).toBe(4);
  });
  it('lower-case letter is a warning and still parses', () => {
    const r = parseTermSymbol('2p3/2');
    expect(r.issues).toMatchObject([{ code: 'term-lowercase-letter', start: 1, end: 2, severity: 'warning', suggestions: ['P'] }]);
    expect(r.term).toMatchObject({ twoS: 1, L: 1, twoJ: 3 });
  });
  it('never throws on arbitrary text (property)', () => {
    fc.assert(
      fc.property(fc.string({ maxLength: 12 }), (s) => {
        const r = parseTermSymbol(s);
        const errors = r.issues.filter((x) => x.severity === 'error');
        for (const x of r.issues) if (x.start < 0 || x.end > s.length || x.start > x.end) return false;
        return (r.term === null) === errors.length > 0;
      }),
      { numRuns: 500 },
    );
  });
});

describe('formatTermSymbol', () => {
  it('ascii and unicode spellings', () => {
    expect(formatTermSymbol({ twoS: 1, L: 1, twoJ: 3, parityMark: null }, 'ascii')).toBe('2P3/2');
    expect(formatTermSymbol({ twoS: 1, L: 1, twoJ: 3, parityMark: null }, 'unicode')).toBe('²P₃/₂');
    expect(formatTermSymbol({ twoS: 1, L: 1, twoJ: 3, parityMark: 'odd' }, 'ascii')).toBe('2Po3/2');
    expect(formatTermSymbol({ twoS: 1, L: 1, twoJ: 3, parityMark: 'odd' }, 'unicode')).toBe('²P°₃/₂');
    expect(formatTermSymbol({ twoS: 7, L: 0, twoJ: 7 }, 'unicode')).toBe('⁸S₇/₂');
    expect(formatTermSymbol({ twoS: 10, L: 3, twoJ: 10 }, 'unicode')).toBe('¹¹F₅');
    expect(formatTermSymbol({ twoS: 2, L: 1, twoJ: null }, 'ascii')).toBe('3P');
  });
  it('round-trips through the parser (property)', () => {
    fc.assert(
      fc.property(fc.nat(12), fc.nat(12), fc.nat(30), fc.boolean(), fc.boolean(), (twoS, L, k, odd, uni) => {
        const js = allowedJ(twoS, L);
        const twoJ = js[k % js.length];
        const t = { twoS, L, twoJ, parityMark: odd ? ('odd' as const) : null };
        const { term } = parseTermSymbol(formatTermSymbol(t, uni ? 'unicode' : 'ascii'));
        return term !== null && term.twoS === twoS && term.L === L && term.twoJ === twoJ && term.parityMark === t.parityMark;
      }),
      { numRuns: 300 },
    );
  });
});

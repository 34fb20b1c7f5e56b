import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  configurationParity,
  coreSubshells,
  formatConfiguration,
  parseConfiguration,
  parseLevelDesignation,
} from '../../server/src/physics/configuration';
import type { TextIssue } from '../../server/src/physics/termSymbol';

describe('parseConfiguration: accepted forms', () => {
  it('2p', () => {
    const { configuration: c, issues } = parseConfiguration('2p');
    expect(issues).toEqual([]);
    expect(c).toMatchObject({ core: null, parity: 'odd', text: '2p' });
    expect(c?.subshells).toEqual([{ n: 2, l: 1, occupancy: 1, start: 0, end: 2 }]);
  });
  it('4f7 6s2 (odd: 7 f electrons)', () => {
    const { configuration: c, issues } = parseConfiguration('4f7 6s2');
    expect(issues).toEqual([]);
    expect(c?.subshells).toEqual([
      { n: 4, l: 3, occupancy: 7, start: 0, end: 3 },
      { n: 6, l: 0, occupancy: 2, start: 4, end: 7 },
    ]);
    expect(c?.parity).toBe('odd');
  });
  it('1s2 2s2 2p6 3s (even)', () => {
    const { configuration: c } = parseConfiguration('1s2 2s2 2p6 3s');
    expect(c?.subshells.map((s) => [s.n, s.l, s.occupancy])).toEqual([[1, 0, 2], [2, 0, 2], [2, 1, 6], [3, 0, 1]]);
    expect(c?.parity).toBe('even');
  });
  it('[Ne] 3s with the core kept by name', () => {
    const { configuration: c, issues } = parseConfiguration('[Ne] 3s');
    expect(issues).toEqual([]);
    expect(c?.core).toBe('Ne');
    expect(c?.subshells).toEqual([{ n: 3, l: 0, occupancy: 1, start: 5, end: 7 }]);
    expect(coreSubshells('Ne').map((s) => s.occupancy).reduce((a, b) => a + b)).toBe(10);
  });
  it('3d6 4s2 (even), 2s.2p (odd, dot-separated), [Ar]3d5 4s', () => {
    expect(parseConfiguration('3d6 4s2').configuration?.parity).toBe('even');
    const dot = parseConfiguration('2s.2p').configuration;
    expect(dot?.subshells.map((s) => [s.n, s.l, s.start, s.end])).toEqual([[2, 0, 0, 2], [2, 1, 3, 5]]);
    expect(dot?.parity).toBe('odd');
    expect(parseConfiguration('[Ar]3d5 4s').configuration?.subshells).toHaveLength(2);
  });
  it('superscript occupancies may run together; ^ before digits is allowed', () => {
    const c = parseConfiguration('1s²2s²2p⁶').configuration;
    expect(c?.subshells.map((s) => [s.n, s.l, s.occupancy])).toEqual([[1, 0, 2], [2, 0, 2], [2, 1, 6]]);
    expect(parseConfiguration('2p^5').configuration?.subshells[0].occupancy).toBe(5);
  });
  it('core counts of electrons (from memory: He 2, Ne 10, Ar 18, Kr 36, Xe 54, Rn 86)', () => {
    const total = (k: string) => coreSubshells(k).reduce((a, s) => a + s.occupancy, 0);
    expect(['He', 'Ne', 'Ar', 'Kr', 'Xe', 'Rn'].map(total)).toEqual([2, 10, 18, 36, 54, 86]);
  });
  it('formats back', () => {
    const c = parseConfiguration('[Xe] 4f7 5d 6s2').configuration!;
    expect(formatConfiguration(c)).toBe('[Xe] 4f7 5d 6s2');
    expect(formatConfiguration(c, 'unicode')).toBe('[Xe] 4f⁷ 5d 6s²');
  });
  it('parity is (−1)^(Σ l) over electrons', () => {
    expect(configurationParity({ subshells: [{ n: 2, l: 1, occupancy: 2, start: 0, end: 0 }] })).toBe('even');
    expect(configurationParity({ subshells: [{ n: 2, l: 1, occupancy: 3, start: 0, end: 0 }] })).toBe('odd');
    expect(parseConfiguration('4f7 5d 6s2').configuration?.parity).toBe('odd');
  });
});

function onlyIssue(text: string): TextIssue {
  const { issues } = parseConfiguration(text);
  expect(issues, text).toHaveLength(1);
  return issues[0];
}

describe('parseConfiguration: run-together subshells', () => {
  // One digit between two subshell letters can only be the next n ('6s6p' = 6s 6p, occupancy 1
  // implied): read as an occupancy it would leave the next subshell without n.
  it.each([
    ['6s6p', [[6, 0, 1], [6, 1, 1]], 'odd'],
    ['1s2s', [[1, 0, 1], [2, 0, 1]], 'even'],
    ['4f14 6s6p', [[4, 3, 14], [6, 0, 1], [6, 1, 1]], 'odd'],
    ['3d9s', [[3, 2, 1], [9, 0, 1]], 'even'],
  ] as const)('%s is accepted', (text, shells, parity) => {
    const r = parseConfiguration(text);
    expect(r.issues).toEqual([]);
    expect(r.configuration?.subshells.map((s) => [s.n, s.l, s.occupancy])).toEqual(shells);
    expect(r.configuration?.parity).toBe(parity);
  });
  it('subshell offsets of a run-together form', () => {
    expect(parseConfiguration('6s6p').configuration?.subshells.map((s) => [s.start, s.end])).toEqual([[0, 2], [2, 4]]);
  });
  // Several digits are ambiguous in principle; the one split whose occupancy fits (≤ 4l+2) and
  // whose n exceeds the next l is offered as the fix, and the parse goes on as if it were written.
  it.each([
    ['1s22s', '1s2 2s', 0, 5],
    ['2p63s', '2p6 3s', 0, 5],
    ['3d104s', '3d10 4s', 0, 6],
  ])('%s is an error with the fix %s', (text, fix, start, end) => {
    const r = parseConfiguration(text);
    expect(r.issues).toEqual([expect.objectContaining({ code: 'config-malformed', start, end, suggestions: [fix] })]);
    expect(r.issues[0]!.message).toContain(fix);
  });
  it('several run-together pairs each get their own fix', () => {
    const r = parseConfiguration('1s22s22p6');
    expect(r.issues.map((x) => x.suggestions)).toEqual([['1s2 2s'], ['2s2 2p']]);
  });
  it('with no split that fits, no fix is guessed', () => {
    // '2s99s': 9 and 99 exceed the 2 electrons of an s subshell.
    const r = parseConfiguration('2s99s');
    expect(r.issues).toEqual([expect.objectContaining({ code: 'config-malformed', start: 0, end: 5 })]);
    expect(r.issues[0]!.suggestions).toBeUndefined();
  });
});

describe('parseConfiguration: bad forms', () => {
  it('occupancy above 4l+2', () => {
    expect(onlyIssue('2p7')).toMatchObject({ code: 'config-occupancy-too-large', start: 2, end: 3, suggestions: ['6'] });
    expect(onlyIssue('1s2 3d11')).toMatchObject({ code: 'config-occupancy-too-large', start: 6, end: 8 });
    expect(parseConfiguration('2p7').configuration).toBeNull();
  });
  it('l not below n', () => {
    const x = onlyIssue('2d');
    expect(x).toMatchObject({ code: 'config-l-not-below-n', start: 0, end: 2 });
    expect(x.message).toContain('s, p');
    expect(onlyIssue('1s2 1p')).toMatchObject({ code: 'config-l-not-below-n', start: 4, end: 6 });
    expect(onlyIssue('0s')).toMatchObject({ code: 'config-l-not-below-n' });
  });
  it('unknown core, with a case fix when it is only the case', () => {
    expect(onlyIssue('[Xx] 3s')).toMatchObject({ code: 'config-unknown-core', start: 0, end: 4 });
    expect(onlyIssue('[ne] 3s')).toMatchObject({ code: 'config-unknown-core', suggestions: ['[Ne]'] });
  });
  it('malformed', () => {
    expect(onlyIssue('2sp')).toMatchObject({ code: 'config-malformed', start: 2, end: 3 });
    expect(onlyIssue('')).toMatchObject({ code: 'config-malformed' });
    expect(onlyIssue('2p#')).toMatchObject({ code: 'config-malformed', start: 2, end: 3 });
    expect(onlyIssue('3s [Ne]')).toMatchObject({ code: 'config-malformed', start: 3, end: 7 });
    expect(onlyIssue('[Ne 3s')).toMatchObject({ code: 'config-malformed' });
    const twoCores = parseConfiguration('[Xx] [Ne] 3s').issues.map((x) => x.code);
    expect(twoCores).toEqual(['config-unknown-core', 'config-malformed']);
    expect(onlyIssue('2 p')).toMatchObject({ code: 'config-malformed', start: 0, end: 2 });
  });
  it('bad letter, duplicate subshell, subshell inside the core', () => {
    expect(onlyIssue('3j2')).toMatchObject({ code: 'config-bad-letter', start: 1, end: 2 });
    expect(onlyIssue('2s 2s')).toMatchObject({ code: 'config-duplicate-subshell', start: 3, end: 5 });
    expect(onlyIssue('[Ne] 2p')).toMatchObject({ code: 'config-subshell-in-core', start: 5, end: 7 });
  });
  it('warnings: upper-case letter, empty subshell', () => {
    const up = parseConfiguration('2P6');
    expect(up.issues).toMatchObject([{ code: 'config-uppercase-letter', severity: 'warning', start: 1, end: 2 }]);
    expect(up.configuration).not.toBeNull();
    expect(onlyIssue('2p0 3s')).toMatchObject({ code: 'config-empty-subshell', severity: 'warning' });
  });
  it('never throws, offsets stay inside the text (property)', () => {
    fc.assert(
      fc.property(fc.stringMatching(/^[0-9spdfgj \.\[\]NeAr²⁶^]{0,14}$/), (s) => {
        const r = parseConfiguration(s);
        const errs = r.issues.filter((x) => x.severity === 'error').length;
        return r.issues.every((x) => x.start >= 0 && x.end <= s.length && x.start <= x.end) && (r.configuration === null) === errs > 0;
      }),
      { numRuns: 500 },
    );
  });
});

describe('parseLevelDesignation', () => {
  it('configuration + term, and a bare term', () => {
    const a = parseLevelDesignation('3p 2P°3/2');
    expect(a.issues).toEqual([]);
    expect(a.configuration?.parity).toBe('odd');
    expect(a.term).toMatchObject({ twoS: 1, L: 1, twoJ: 3, parityMark: 'odd' });
    const b = parseLevelDesignation('4f7 6s2 8S7/2');
    expect(b.issues).toEqual([]);
    expect(b.term).toMatchObject({ twoS: 7, L: 0, twoJ: 7 });
    const c = parseLevelDesignation('2P3/2');
    expect(c.issues).toEqual([]);
    expect(c.configuration).toBeNull();
    expect(c.term?.twoJ).toBe(3);
    expect(parseLevelDesignation('[Xe] 4f7 5d 6s2 9D°2').issues).toEqual([]);
    expect(parseLevelDesignation('2s.2p 3P°1').issues).toEqual([]);
    expect(parseLevelDesignation('1s2 1S0').issues).toEqual([]);
    expect(parseLevelDesignation('2s 2S1/2').issues).toEqual([]);
  });
  it('term offsets are in the whole text', () => {
    const r = parseLevelDesignation('3p 2P5/2');
    expect(r.issues).toMatchObject([{ code: 'term-j-out-of-range', start: 5, end: 8 }]);
  });
  it('configuration offsets are in the whole text', () => {
    const r = parseLevelDesignation('2p7 2P3/2');
    expect(r.issues).toMatchObject([{ code: 'config-occupancy-too-large', start: 2, end: 3 }]);
  });
  it('term not allowed by the configuration lists the allowed terms', () => {
    const r = parseLevelDesignation('2p2 2P3/2');
    expect(r.issues).toHaveLength(1);
    const x = r.issues[0];
    expect(x).toMatchObject({ code: 'term-not-in-configuration', start: 4, end: 9, severity: 'error' });
    expect(x.message).toContain('1S, 1D, 3P');
    // no allowed term has J = 3/2, so every allowed level is offered
    expect(x.suggestions).toEqual(['1S0', '1D2', '3P0', '3P1', '3P2']);
  });
  it('suggestions keep the user\'s J when possible, and their parity mark', () => {
    const x = parseLevelDesignation('3p 4P°5/2').issues[0];
    expect(x.code).toBe('term-not-in-configuration');
    expect(x.suggestions).toEqual(['2P°1/2', '2P°3/2']);
    const z = parseLevelDesignation('3p ⁴P°₅/₂').issues[0];
    expect(z.suggestions).toEqual(['²P°₁/₂', '²P°₃/₂']);
    const y = parseLevelDesignation('3d2 3D2').issues[0];
    expect(y).toMatchObject({ code: 'term-not-in-configuration' });
    expect(y.suggestions).toEqual(['1D2', '3P2', '3F2']);
  });
  it('closed subshells contribute 1S only', () => {
    expect(parseLevelDesignation('1s2 3S1').issues).toMatchObject([{ code: 'term-not-in-configuration' }]);
    expect(parseLevelDesignation('[Ne] 1S0').issues).toEqual([]);
  });
  it('d3 allows 2D (twice) and the message says so', () => {
    const x = parseLevelDesignation('3d3 6S5/2').issues[0];
    expect(x.message).toContain('2D (×2)');
  });
  it('a parity mark against an even configuration', () => {
    const r = parseLevelDesignation('2p2 3P°2');
    expect(r.issues).toMatchObject([{ code: 'term-parity-mismatch', start: 6, end: 7, suggestions: [''] }]);
  });
  it('no mark on an odd configuration is accepted (common shorthand)', () => {
    expect(parseLevelDesignation('2p 2P3/2').issues).toEqual([]);
  });
  it('missing term', () => {
    const r = parseLevelDesignation('3p');
    expect(r.issues).toMatchObject([{ code: 'level-missing-term', start: 0, end: 2 }]);
    expect(r.issues[0].suggestions).toEqual(['3p 2P°1/2', '3p 2P°3/2']);
    expect(parseLevelDesignation('   ').issues).toMatchObject([{ code: 'level-empty' }]);
  });
  it('a lower-case term letter after a configuration is still read as the term', () => {
    const r = parseLevelDesignation('3p 2p3/2');
    expect(r.issues).toMatchObject([{ code: 'term-lowercase-letter', start: 4, end: 5, severity: 'warning' }]);
    expect(r.term?.twoJ).toBe(3);
  });
});

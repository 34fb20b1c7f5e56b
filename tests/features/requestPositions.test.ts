/**
 * Positions and ranges as clients send them (fractions, negatives, past the end, null for NaN,
 * reversed ranges) are made sound in one place, and every position- or range-taking call of the
 * language service answers as for the sound position, or empty for nonsense, without throwing or
 * logging. (Invented setups.)
 */
import { describe, expect, it } from 'vitest';
import { computeLineStarts } from '../../server/src/format/positions';
import { LanguageService } from '../../server/src/service/languageService';
import { requestPosition, requestRange } from '../../server/src/service/requestPositions';

// Line 1 is 24 characters long, line 2 is 'field bias = 5 G' with a CRLF, line 3 is empty (after the last break).
const TEXT = 'species Li7\n  level upper: 2p 2P°3/2\nfield bias = 5 G\r\n';
const INDEX = { text: TEXT, lineStarts: computeLineStarts(TEXT) };

describe('a position as the client sent it', () => {
  const cases: [string, unknown, unknown][] = [
    ['a sound one, as it is', { line: 1, character: 4 }, { line: 1, character: 4 }],
    ['fractions, floored', { line: 1.5, character: 4.99 }, { line: 1, character: 4 }],
    ['negatives, as 0', { line: -3, character: -1 }, { line: 0, character: 0 }],
    ['a character past its line end, at that end (before the CRLF)', { line: 2, character: 40 }, { line: 2, character: 16 }],
    ['a line past the end, at the end of the text', { line: 99, character: 0 }, { line: 3, character: 0 }],
    ['1e12 in both, at the end of the text', { line: 1e12, character: 1e12 }, { line: 3, character: 0 }],
    ['Infinity (JSON 1e999), at the end of the text', { line: Infinity, character: 2 }, { line: 3, character: 0 }],
    ['null (what JSON makes of NaN): nonsense', { line: null, character: 2 }, undefined],
    ['NaN: nonsense', { line: 0, character: NaN }, undefined],
    ['a string: nonsense', { line: '1', character: 2 }, undefined],
    ['missing: nonsense', undefined, undefined],
    ['a character missing: nonsense', { line: 1 }, undefined],
  ];
  for (const [name, given, expected] of cases) it(name, () => expect(requestPosition(INDEX, given)).toEqual(expected));
});

describe('a range as the client sent it', () => {
  it('is clamped at both ends, fractions floored', () => {
    expect(requestRange(INDEX, { start: { line: 0.7, character: 2.2 }, end: { line: 7, character: 0 } })).toEqual({
      start: { line: 0, character: 2 },
      end: { line: 3, character: 0 },
    });
  });
  it('is nonsense with its end before its start (on one line or across lines)', () => {
    expect(requestRange(INDEX, { start: { line: 1, character: 5 }, end: { line: 1, character: 4 } })).toBeUndefined();
    expect(requestRange(INDEX, { start: { line: 2, character: 0 }, end: { line: 1, character: 9 } })).toBeUndefined();
  });
  it('is judged for order before clamping: 0:50 to 0:20 is reversed though both clamp to the line end', () => {
    expect(requestRange(INDEX, { start: { line: 0, character: 50 }, end: { line: 0, character: 20 } })).toBeUndefined();
  });
  it('is nonsense with either end missing or null', () => {
    expect(requestRange(INDEX, { start: { line: 0, character: 0 } })).toBeUndefined();
    expect(requestRange(INDEX, { start: { line: 0, character: 0 }, end: { line: null, character: 0 } })).toBeUndefined();
    expect(requestRange(INDEX, null)).toBeUndefined();
  });
});

describe('the language service on hostile positions', () => {
  const logged: string[] = [];
  const svc = new LanguageService((m) => logged.push(m));
  const doc = { uri: 'file:///hostile.sublevel', version: 1, getText: () => TEXT };
  const NONSENSE = [{ line: null, character: 0 }, { line: 1 }, null, { line: 'x', character: 1 }] as never[];
  const REVERSED = { start: { line: 2, character: 0 }, end: { line: 0, character: 0 } };
  const FAR = { line: 2 ** 31 - 1, character: 2 ** 31 - 1 };

  it('answers a fractional position as the whole one (hover on the level name)', async () => {
    const sound = await svc.hover(doc, { line: 1, character: 9 });
    expect(JSON.stringify(sound)).toContain('upper');
    expect(await svc.hover(doc, { line: 1.9, character: 9.5 })).toEqual(sound);
    expect(svc.definition(doc, { line: 1.5, character: 9.5 })).toEqual(svc.definition(doc, { line: 1, character: 9 }));
  });

  it('answers nonsense positions with the empty answer of each request', async () => {
    for (const p of NONSENSE) {
      expect(await svc.hover(doc, p)).toBeNull();
      expect(svc.completion(doc, p)).toEqual([]);
      expect(svc.definition(doc, p)).toBeNull();
      expect(svc.references(doc, p, true)).toEqual([]);
      expect(svc.prepareRename(doc, p)).toBeNull();
      expect(svc.rename(doc, p, 'renamed')).toBeNull();
    }
  });

  it('answers nonsense and reversed ranges with nothing, and whole-document requests as before', async () => {
    for (const r of [...NONSENSE.map((p) => ({ start: p, end: p })), REVERSED, null] as never[]) {
      expect(svc.formatting(doc, r)).toEqual([]);
      expect(svc.semanticTokens(doc, r)).toEqual({ data: [] });
      expect(await svc.inlayHints(doc, r)).toEqual([]);
      expect(svc.codeActions(doc, { range: r, diagnostics: [] })).toEqual([]);
    }
    expect(svc.semanticTokens(doc).data.length).toBeGreaterThan(0);
  });

  it('clamps a range far past the end to the document: range formatting of 1.5–2^31 is that of lines 1 to the end', () => {
    const untidy = { uri: 'file:///untidy.sublevel', version: 1, getText: () => 'magnet m\n field=1 T\n length=8 cm\n' };
    const sound = svc.formatting(untidy, { start: { line: 1, character: 0 }, end: { line: 3, character: 0 } });
    expect(sound.map((e) => e.newText)).toEqual(['  ', ' ', ' ', '  ', ' ', ' ']);
    expect(svc.formatting(untidy, { start: { line: 1.5, character: 0.5 }, end: FAR })).toEqual(sound);
    // Before, the feature floored the lines itself; negative and reversed went through unchecked.
    expect(svc.formatting(untidy, { start: { line: -4, character: -1 }, end: { line: 1, character: 2 } }).map((e) => e.range.start.line)).toEqual([1, 1, 1]);
  });

  it('keeps a client diagnostic with a nonsense range out of the code actions, and still fixes the sound ones', () => {
    const typo = { uri: 'file:///typo.sublevel', version: 1, getText: () => 'speciess Li7\n' };
    const [d] = svc.diagnostics(typo).items;
    const fixes = svc.codeActions(typo, { range: d!.range, diagnostics: [d!] });
    expect(fixes.length).toBeGreaterThan(0);
    const broken = { ...d!, range: { start: { line: null, character: 0 }, end: d!.range.end } } as never;
    expect(svc.codeActions(typo, { range: d!.range, diagnostics: [broken] })).toEqual(svc.codeActions(typo, { range: d!.range, diagnostics: [] }));
    expect(svc.codeActions(typo, { range: d!.range, diagnostics: null as never })).toEqual(svc.codeActions(typo, { range: d!.range, diagnostics: [] }));
  });

  it('takes the diagram’s cursor line by the same rule: 2.5 as 2 (the upper level’s), NaN as no line', async () => {
    const two = { uri: 'file:///two.sublevel', version: 1, getText: () => 'species Li7\n  level ground: 2s 2S1/2\n  level upper: 2p 2P°3/2\nfield bias = 5 G\n' };
    const at = (line: number | undefined) => svc.diagram(two, { view: 'levels', theme: 'panel', ...(line === undefined ? {} : { line }) });
    const upper = await at(2);
    expect(JSON.stringify(upper)).toContain('Li7 upper: 2p ²P°₃/₂ — sublevel energies');
    expect(await at(2.5)).toEqual(upper);
    const none = await at(undefined);
    expect(JSON.stringify(none)).toContain('Li7 ground: 2s ²S₁/₂ — sublevel energies');
    expect(await at(NaN)).toEqual(none);
  });

  it('logged no failure on any of it', () => expect(logged).toEqual([]));
});

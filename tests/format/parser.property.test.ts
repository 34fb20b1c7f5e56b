/**
 * Property tests: the parser never throws, on any string, and everything it returns is
 * consistent with the text (ranges inside the document, spans equal to the text they cover).
 * Set FUZZ_RUNS to raise the number of cases (default 300 per property).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { Range, SetupDocument, Spanned, ValuePart } from '../../server/src/format/ast';
import { parseSetup } from '../../server/src/format/parser';
import { comparePositions, computeLineStarts, lineEndOffset, positionToOffset } from '../../server/src/format/positions';
import { readQuantity, type Dimension } from '../../server/src/format/units';

const RUNS = Number(process.env.FUZZ_RUNS ?? '') || 300;
/** Per-test time limit that grows with the number of runs. */
const TIME_LIMIT = Math.max(60_000, RUNS * 50);

const VALID = `# demo setup
species Li7                       # built-in data
  level ground: 2s 2S1/2  A = 401.75 MHz
  level upper:  2p 2P3/2  A = -3.06 MHz  B = -0.22 MHz
    g_J = 1.3341(2)
  mass = 7.016 u
species Xq
  mass = 86.9 u
  I = 3/2
  mu_I = 2.75 muN
  level g: [Kr] 5s ²S₁/₂ energy = 0 cm^-1

field bias = 3.2 G
magnet selector
  field    = 0.45 T
  gradient = 18 G/cm
  length   = 8 cm
beam b
  species = Li7
  level = ground
  source   = jet 1500 m/s spread 8 %
  slits    = 80 um, 50 um  apart 40 cm
  magnet = selector
  drift    = 35 cm
  detector = 25 µm
line D2: Li7.ground -> upper
settings
  g_s = exact
  reduced_mass = on
`;

/** Characters that matter to the scanner and parser, plus some awkward ones. */
const SPECIAL = ['=', ':', ',', '#', '-', '>', '→', '/', '^', '(', ')', '.', ' ', '\t', '\n', '\r', '\r\n', '\uFEFF', 'µ', '°', '%', 'e', '0', '9', '\uD800', '𝔛'];
const WORDS = ['species', 'field', 'magnet', 'beam', 'line', 'settings', 'level', 'A', 'B', 'mass', 'I', 'gradient', 'G', 'T/m', 'cm^-1', '3/2', '1/0', '0.35(2)'];

type Edit = { kind: 'insert'; at: number; text: string } | { kind: 'delete'; at: number; length: number } | { kind: 'dupLine'; line: number } | { kind: 'dropLine'; line: number } | { kind: 'swapLines'; a: number; b: number };

const editArb: fc.Arbitrary<Edit> = fc.oneof(
  fc.record({ kind: fc.constant('insert' as const), at: fc.nat(), text: fc.oneof(fc.constantFrom(...SPECIAL, ...WORDS), fc.string({ maxLength: 4 })) }),
  fc.record({ kind: fc.constant('delete' as const), at: fc.nat(), length: fc.integer({ min: 1, max: 12 }) }),
  fc.record({ kind: fc.constant('dupLine' as const), line: fc.nat() }),
  fc.record({ kind: fc.constant('dropLine' as const), line: fc.nat() }),
  fc.record({ kind: fc.constant('swapLines' as const), a: fc.nat(), b: fc.nat() }),
);

function applyEdit(text: string, e: Edit): string {
  switch (e.kind) {
    case 'insert': {
      const at = e.at % (text.length + 1);
      return text.slice(0, at) + e.text + text.slice(at);
    }
    case 'delete': {
      const at = e.at % (text.length + 1);
      return text.slice(0, at) + text.slice(at + e.length);
    }
    default: {
      const ls = text.split('\n');
      const n = ls.length;
      if (e.kind === 'dupLine') ls.splice(e.line % n, 0, ls[e.line % n]!);
      else if (e.kind === 'dropLine') ls.splice(e.line % n, 1);
      else [ls[e.a % n], ls[e.b % n]] = [ls[e.b % n]!, ls[e.a % n]!];
      return ls.join('\n');
    }
  }
}

/** A plain assertion: `expect` is too slow for the thousands of checks per document. */
function check(ok: boolean, what: string): void {
  if (!ok) throw new Error(`invariant broken: ${what}`);
}

function checkRange(doc: SetupDocument, r: Range, what: string): void {
  for (const p of [r.start, r.end]) {
    check(p.line >= 0 && p.line < doc.lineStarts.length, `${what}: line ${p.line} outside the document`);
    check(p.character >= 0 && doc.lineStarts[p.line]! + p.character <= lineEndOffset(doc, p.line), `${what}: character ${p.character} outside line ${p.line}`);
  }
  check(comparePositions(r.start, r.end) <= 0, `${what}: range ends before it starts`);
}

function checkSpan(doc: SetupDocument, s: Spanned, what: string): void {
  checkRange(doc, s.range, what);
  const covered = doc.text.slice(positionToOffset(doc, s.range.start), positionToOffset(doc, s.range.end));
  check(covered === s.text, `${what}: span text ${JSON.stringify(s.text)} differs from the text it covers ${JSON.stringify(covered)}`);
}

function within(outer: Range, inner: Range): boolean {
  return comparePositions(outer.start, inner.start) <= 0 && comparePositions(inner.end, outer.end) <= 0;
}

/** Every invariant the rest of the program relies on. */
function checkDocument(text: string): void {
  const doc = parseSetup(text);
  check(doc.text === text, 'text kept');
  check(JSON.stringify(doc.lineStarts) === JSON.stringify(computeLineStarts(text)), 'line starts');
  for (const p of doc.problems) {
    check(p.code !== 'syntax-internal-error', `internal error: ${p.message}`);
    checkRange(doc, p.range, `problem ${p.code}`);
    check(p.message.length > 0, 'problem message');
    for (const r of p.related ?? []) checkRange(doc, r.range, 'related');
  }
  for (const c of doc.comments) {
    checkSpan(doc, c, 'comment');
    check(c.text.startsWith('#'), 'comment starts with #');
  }
  const dims: Dimension[] = ['gradient', 'frequency-like', 'dimensionless', 'temperature'];
  const checkPart = (part: ValuePart): void => {
    checkSpan(doc, part, `part ${part.kind}`);
    if (part.kind === 'quantity') checkSpan(doc, part.unit, 'unit');
    // the unit reader never throws either, and its problem ranges are inside the document
    for (const d of dims) {
      const q = readQuantity(part, d);
      if (q.problem) checkRange(doc, q.problem.range, 'unit problem');
      else if (part.kind === 'word' && part.unreadable) check(doc.problems.some((p) => p.range.start.line === part.range.start.line), 'an unusable number was reported where it was read');
      else check(typeof q.si === 'number', 'unit reader gives a value or a problem');
    }
  };
  const checkSetting = (s: NonNullable<SetupDocument['blocks'][number]['headerSetting']>, outer: Range): void => {
    checkSpan(doc, s.key, 'key');
    checkSpan(doc, s.valueText, 'value');
    checkRange(doc, s.range, 'setting');
    check(within(outer, s.range), 'setting within its block');
    for (const g of s.groups) {
      check(g.length > 0, 'no empty groups');
      g.forEach(checkPart);
    }
  };
  let previousEnd = { line: -1, character: 0 };
  for (const b of doc.blocks) {
    checkSpan(doc, b.keyword, 'keyword');
    if (b.name) checkSpan(doc, b.name, 'name');
    checkRange(doc, b.range, 'block');
    check(within(b.range, b.headerRange), 'header within block');
    check(comparePositions(previousEnd, b.range.start) < 0, 'blocks in order, not overlapping');
    previousEnd = b.range.end;
    if (b.headerSetting) checkSetting(b.headerSetting, b.headerRange);
    for (const s of b.settings) checkSetting(s, b.range);
    for (const l of b.levels) {
      checkRange(doc, l.range, 'level');
      check(within(b.range, l.range), 'level within block');
      if (l.name) checkSpan(doc, l.name, 'level name');
      if (l.designation) checkSpan(doc, l.designation, 'designation');
      for (const s of l.settings) checkSetting(s, l.range);
    }
    for (const ref of [b.link?.from, b.link?.to]) {
      if (!ref) continue;
      checkSpan(doc, ref.name, 'ref name');
      if (ref.qualifier) checkSpan(doc, ref.qualifier, 'ref qualifier');
      check(ref.text === (ref.qualifier ? `${ref.qualifier.text}.${ref.name.text}` : ref.name.text), 'reference text');
    }
  }
  // Parsing is a pure function of the text.
  expect(parseSetup(text)).toEqual(doc);
}

describe('parser properties', () => {
  it('the valid sample has no problems (the base the mutations start from)', () => {
    expect(parseSetup(VALID).problems).toEqual([]);
    checkDocument(VALID);
  });

  it('never throws on random strings', () => {
    fc.assert(fc.property(fc.string({ maxLength: 200 }), (s) => checkDocument(s)), { numRuns: RUNS });
  }, TIME_LIMIT);

  it('never throws on random Unicode, lone surrogates included', () => {
    fc.assert(fc.property(fc.string({ unit: 'binary', maxLength: 200 }), (s) => checkDocument(s)), { numRuns: RUNS });
  }, TIME_LIMIT);

  it('never throws on strings built from the format\u2019s own pieces', () => {
    const piece = fc.constantFrom(...SPECIAL, ...WORDS, ' ', ' ', '\n');
    fc.assert(fc.property(fc.array(piece, { maxLength: 80 }), (pieces) => checkDocument(pieces.join(''))), { numRuns: RUNS });
  }, TIME_LIMIT);

  it('an unusable number before a unit (1/0 T, found by the mutation property) passes the invariants', () => {
    checkDocument('species Rb87\n  level ground: 5s 2S1/2\nfield bias = 1/0 T\nfield b2 = 1e400 G\n');
  });

  it('never throws on mutated copies of a valid document', () => {
    fc.assert(
      fc.property(fc.array(editArb, { minLength: 1, maxLength: 8 }), (edits) => checkDocument(edits.reduce(applyEdit, VALID))),
      { numRuns: RUNS },
    );
  }, TIME_LIMIT);

  it('recovery: a junk line between good lines leaves the good lines as they were', () => {
    const base = VALID.split('\n');
    fc.assert(
      fc.property(fc.integer({ min: 2, max: base.length - 1 }), fc.constantFrom('@@@', 'zzzz 3', ') (', '= 3 T', 'fooo = 3', '::'), (at, junk) => {
        const withJunk = [...base.slice(0, at), junk, ...base.slice(at)].join('\n');
        const before = parseSetup(VALID);
        const after = parseSetup(withJunk);
        const keys = (d: SetupDocument): string[] =>
          d.blocks.flatMap((b) => [b.kind, b.name?.text ?? '', ...b.settings.map((s) => s.key.text + s.valueText.text), ...b.levels.map((l) => `${l.name?.text}:${l.designation?.text}:${l.settings.length}`)]);
        expect(keys(after)).toEqual(keys(before));
        expect(after.problems.length).toBeGreaterThan(0);
        expect(after.problems.every((p) => p.range.start.line === at)).toBe(true);
      }),
      { numRuns: Math.min(RUNS, 100) },
    );
  }, TIME_LIMIT);
});

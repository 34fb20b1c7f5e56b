/**
 * Property tests: no feature crashes or hangs on any text at any position; formatting only
 * changes whitespace, keeps every comment and value, and is idempotent; a quick fix only
 * touches the line(s) of its diagnostic. Case counts are bounded here; FUZZ_RUNS raises them.
 */
import fc from 'fast-check';
import { readdirSync, readFileSync } from 'fs';
import type { Position, Range } from 'vscode-languageserver-types';
import { describe, expect, it } from 'vitest';
import { analyze, type Analysis } from '../../server/src/eval/analyze';
import { codeActions } from '../../server/src/features/codeActions';
import { completion } from '../../server/src/features/completion';
import { definition } from '../../server/src/features/definition';
import { diagnostics } from '../../server/src/features/diagnostics';
import { documentSymbols } from '../../server/src/features/documentSymbols';
import { foldingRanges } from '../../server/src/features/foldingRanges';
import { formatting } from '../../server/src/features/formatting';
import { hover } from '../../server/src/features/hover';
import { inlayHints } from '../../server/src/features/inlayHints';
import { references } from '../../server/src/features/references';
import { prepareRename, rename } from '../../server/src/features/rename';
import { semanticTokens } from '../../server/src/features/semanticTokens';
import { computeLineStarts, positionToOffset } from '../../server/src/format/positions';
import { scanText } from '../../server/src/format/scanner';
import { analyzeFast } from '../../server/src/service/fastAnalysis';
import { applyEdits, editsOf, URI } from './helpers';
import { mutatedText } from '../mutatedExamples';
import { NEWER_BLOCKS } from './newerBlockMistakes';

const RUNS = Number(process.env.FUZZ_RUNS ?? 60);
/** A feature call on a small document taking this long means something loops. */
const HANG_MS = 5000;

const EXAMPLES = readdirSync('examples')
  .filter((f) => f.endsWith('.sublevel'))
  .map((f) => readFileSync(`examples/${f}`, 'utf8'));

/** Pieces a typing user puts together, right or wrong. */
const PIECES = [
  'species', 'level', 'field', 'magnet', 'beam', 'line', 'settings', 'Na23', 'Rb87', 'Li7', 'Cs133', 'Demo',
  'ground', 'upper', 'sel', ':', '=', '->', ',', '#', '# note', 'A', 'B', 'C', 'g_J', 'zeta', 'energy', 'mass', 'I', 'g_I', 'mu_I',
  'gradient', 'length', 'source', 'slits', 'drift', 'detector', 'oven', 'jet', 'speed', 'spread', 'apart', 'g_s', 'reduced_mass',
  '3s', '3p', '2p2', '4f7', '[Ne]', '2S1/2', '2P°3/2', '²P₃/₂', '3P2', '2P5/2', '2P', '6H°15/2', '0.45', '-3.06', '1/2', '3/2',
  '1e-3', '0.35(2)', 'T', 'G', 'mT', 'T/m', 'G/cm', 'cm', 'um', 'MHz', 'GHz', 'cm^-1', 'K', 'degC', 'm/s', '%', 'u', 'muN', 'Mhz',
  '720K', '8cm', 'exact', 'on', '\t', '  ', '\n', '\n  ', '\r\n', '→', '°', 'é', '\u00a0', '|', '*', '[x](y)', 'use', '"shared/a b.sublevel"', '"', '"x.sublevel',
  // Mistakes from the session-7 audit: the U+2212 minus, unusable numbers before a unit, a term split by a blank, populations.
  '\u22123.2', '1e\u22122', '1e400', '1e400T', 'NaN', '-inf', '1/0', '2P 3/2', '2P°3 /2', 'populations', '3 0 1', '2 5 1',
  'trap', 'slower', 'fit', 'data', 'sources', 'free', 'design', 'gravity',
  // Session 9: the leftovers and the newer blocks' mistakes.
  '180 T m', 'T m', '3, 2 G', '40, 5', '2P 5 /2', '2 S 1/2', '1e-320', '1e-305 nT', '1e308 m', '5 km', 'coil', 'radius', 'turns',
  'current', 'point', 'kind', 'profile', '14 -1200 um', '-1200 um', 'at', '1 1 1, 1 1 2', 'g_J, g_J', 'start', 'cut', 'region',
  'capture', 'final', 'lifetime', 'linewidth', 'doppler', 'instrument', 'lower', 'upper', '1 0',
];

const pieced = fc.array(fc.constantFrom(...PIECES), { maxLength: 60 }).map((parts) => parts.join(' '));

const mutated = mutatedText([...EXAMPLES, ...NEWER_BLOCKS.map((c) => c.text)], 6);

const mistakesEdited = mutatedText([readFileSync('examples/mistakes.sublevel', 'utf8')], 2);

/**
 * The same texts with every line ended by any style (LF, CRLF, lone CR) and blank or
 * spaces-only lines put in: a lone CR before a spaces-only line once made formatting merge lines.
 */
const LINE_ENDS = ['\n', '\r\n', '\r'];
const BLANKS = ['', ' ', '   ', '\t', ' \t '];
const anyLineEnds = fc
  .tuple(fc.oneof(pieced, mutated), fc.array(fc.nat(), { minLength: 1, maxLength: 64 }))
  .map(([text, seeds]) => {
    const lines = text.split(/\r\n|\r|\n/).flatMap((l, i) => (seeds[i % seeds.length]! % 3 === 0 ? [l, BLANKS[seeds[i % seeds.length]! % BLANKS.length]!] : [l]));
    return lines.map((l, i) => l + (i < lines.length - 1 ? LINE_ENDS[(seeds[(i * 7) % seeds.length]! >> 2) % 3]! : '')).join('');
  });

const anyText = fc.oneof(pieced, mutated, anyLineEnds, fc.string({ unit: 'binary', maxLength: 300 }));

/** Positions to probe: some at random (also past line ends), the start and the end. */
function positions(text: string, seeds: number[]): Position[] {
  const lines = text.split(/\r\n|\r|\n/);
  const out: Position[] = [{ line: 0, character: 0 }, { line: lines.length - 1, character: lines[lines.length - 1]!.length }];
  for (const s of seeds) {
    const line = s % (lines.length + 1);
    out.push({ line, character: (s >> 4) % ((lines[line]?.length ?? 0) + 3) });
  }
  return out;
}

function rangeInside(inner: Range, outer: Range): boolean {
  const le = (a: Position, b: Position): boolean => a.line < b.line || (a.line === b.line && a.character <= b.character);
  return le(outer.start, inner.start) && le(inner.end, outer.end);
}

function everyFeature(a: Analysis, pos: Position): void {
  const at: Range = { start: pos, end: pos };
  hover(a, pos);
  completion(a, pos);
  definition(a, URI, pos);
  references(a, URI, pos, true);
  prepareRename(a, pos);
  const r = rename(a, URI, pos, 'renamed');
  if (r && 'changes' in r) applyEdits(a.doc.text, editsOf(r));
  const actions = codeActions(a, URI, { range: at, diagnostics: diagnostics(a, URI).filter((d) => d.range.start.line === pos.line) });
  for (const action of actions) applyEdits(a.doc.text, editsOf(action.edit));
  semanticTokens(a, { start: { line: pos.line, character: 0 }, end: { line: pos.line + 2, character: 0 } });
  inlayHints(a, { start: { line: Math.max(0, pos.line - 2), character: 0 }, end: { line: pos.line + 2, character: 0 } });
  formatting(a, at);
}

describe('no feature crashes or hangs', () => {
  it('on random and mutated documents at any position', () => {
    fc.assert(
      fc.property(anyText, fc.array(fc.nat(), { minLength: 3, maxLength: 8 }), (text, seeds) => {
        const started = Date.now();
        const a = analyze(text);
        for (const pos of positions(text, seeds)) everyFeature(a, pos);
        const symbols = documentSymbols(a);
        for (const s of symbols) expect(rangeInside(s.selectionRange, s.range)).toBe(true);
        for (const f of foldingRanges(a)) expect(f.endLine).toBeGreaterThan(f.startLine);
        const { data } = semanticTokens(a);
        expect(data.length % 5).toBe(0);
        // Decoded tokens are in order, do not overlap and stay inside their line.
        const lines = text.split(/\r\n|\r|\n/);
        let line = 0;
        let end = 0;
        let start = 0;
        for (let i = 0; i < data.length; i += 5) {
          const [dl, dc, len] = [data[i]!, data[i + 1]!, data[i + 2]!];
          if (dl > 0) end = 0;
          line += dl;
          start = dl > 0 ? dc : start + dc;
          expect(len).toBeGreaterThan(0);
          expect(start).toBeGreaterThanOrEqual(end);
          expect(start + len).toBeLessThanOrEqual(lines[line]!.length);
          end = start + len;
        }
        inlayHints(a, { start: { line: 0, character: 0 }, end: { line: 1e6, character: 0 } });
        expect(Date.now() - started).toBeLessThan(HANG_MS);
      }),
      { numRuns: RUNS },
    );
  });
});

/**
 * The format's own tokens, in order, each comment whole (without trailing blanks): what
 * formatting must keep exactly. (`a=1` and `a = 1` have the same tokens.)
 */
function words(text: string): string[] {
  return scanText(text).lines.flatMap((l) => [...l.tokens.map((t) => t.text), ...(l.comment ? [l.comment.text.trimEnd()] : [])]);
}

describe('formatting', () => {
  it('changes only whitespace, keeps every comment and value, and is idempotent', () => {
    fc.assert(
      fc.property(anyText, (text) => {
        const edits = formatting(analyzeFast(text));
        const index = { text, lineStarts: computeLineStarts(text) };
        for (const e of edits) {
          const old = text.slice(positionToOffset(index, e.range.start), positionToOffset(index, e.range.end));
          expect(old.trim(), 'an edit replaces only blanks').toBe('');
          expect(e.newText.trim(), 'an edit writes only blanks').toBe('');
          expect(e.range.start.line, 'edits stay on one line').toBe(e.range.end.line);
        }
        const once = applyEdits(text, edits);
        expect(words(once)).toEqual(words(text));
        expect(once.split(/\r\n|\r|\n/).length).toBe(text.split(/\r\n|\r|\n/).length);
        expect(formatting(analyzeFast(once))).toEqual([]);
      }),
      { numRuns: RUNS * 4 },
    );
  });

  it('is idempotent on every example file', () => {
    for (const text of EXAMPLES) {
      const once = applyEdits(text, formatting(analyzeFast(text)));
      expect(words(once)).toEqual(words(text));
      expect(formatting(analyzeFast(once))).toEqual([]);
    }
  });
});

describe('quick fixes', () => {
  it('never touch text outside their diagnostic’s lines', () => {
    let checked = 0;
    fc.assert(
      // The file of planted mistakes, lightly edited, keeps most of its fixable mistakes: one case in
      // three starts there, so the fixes are reached however many clean examples the folder holds.
      fc.property(fc.oneof(pieced, mutated, mistakesEdited), (text) => {
        const a = analyze(text);
        const lineStarts = computeLineStarts(text);
        const index = { text, lineStarts };
        for (const d of diagnostics(a, URI)) {
          // The diagnostic's own lines, and those of a related range it names in this file (a beam's
          // `beam-one-peak` names the magnet's gradient line, where its fix writes the advised gradient).
          const ranges = [d.range, ...(d.relatedInformation ?? []).filter((r) => r.location.uri === URI).map((r) => r.location.range)];
          const spans = ranges.map((r) => [lineStarts[r.start.line] ?? text.length, lineStarts[r.end.line + 1] ?? text.length] as const);
          for (const action of codeActions(a, URI, { range: d.range, diagnostics: [d], only: ['quickfix'] })) {
            const edits = editsOf(action.edit);
            expect(edits.length).toBeGreaterThan(0);
            for (const e of edits) {
              const [start, end] = [positionToOffset(index, e.range.start), positionToOffset(index, e.range.end)];
              expect(spans.some(([from, to]) => start >= from && end <= to), `edit at ${start}-${end} outside the diagnostic's lines`).toBe(true);
            }
            checked++;
          }
        }
      }),
      { numRuns: RUNS },
    );
    // The generators must reach the fixes, or this property says nothing.
    expect(checked).toBeGreaterThan(RUNS / 2);
  });
});

/**
 * What the user wrote survives the editor's own edits: range formatting changes only blanks on the
 * lines of its range and keeps every word and comment in order; a quick fix or rewrite keeps
 * every comment of the file, in order; a rename changes only the words at its ranges, each naming
 * the renamed thing. FUZZ_RUNS raises the counts.
 */
import fc from 'fast-check';
import { readdirSync, readFileSync } from 'fs';
import type { Position, Range } from 'vscode-languageserver-types';
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { codeActions } from '../../server/src/features/codeActions';
import { definition } from '../../server/src/features/definition';
import { diagnostics } from '../../server/src/features/diagnostics';
import { formatting } from '../../server/src/features/formatting';
import { prepareRename, rename } from '../../server/src/features/rename';
import { computeLineStarts, positionToOffset } from '../../server/src/format/positions';
import { scanText } from '../../server/src/format/scanner';
import { analyzeFast } from '../../server/src/service/fastAnalysis';
import { mutatedText } from '../mutatedExamples';
import { applyEdits, editsOf, URI } from './helpers';
import { NEWER_BLOCKS } from './newerBlockMistakes';

const RUNS = Number(process.env.FUZZ_RUNS ?? '') || 60;
/** Grows with the case count (a loaded 2-core machine takes up to ~0.3 s a case). */
const TIME_LIMIT = Math.max(600_000, RUNS * 1000);
const EXAMPLES = readdirSync('examples')
  .filter((f) => f.endsWith('.sublevel'))
  .map((f) => readFileSync(`examples/${f}`, 'utf8'));
const texts = mutatedText([...EXAMPLES, ...NEWER_BLOCKS.map((c) => c.text)], 6);

const words = (text: string): string[] => scanText(text).lines.flatMap((l) => [...l.tokens.map((t) => t.text), ...(l.comment ? [l.comment.text.trimEnd()] : [])]);
/** Every comment in file order, each marked as alone on its line or following the line's words. */
const comments = (text: string): string[] =>
  scanText(text).lines.flatMap((l) => (l.comment ? [`${l.tokens.length === 0 ? 'alone' : 'after words'}: ${l.comment.text.trim()}`] : []));

describe('range formatting', () => {
  it('changes only blanks on the lines of its range and keeps every word in order', () => {
    fc.assert(
      fc.property(texts, fc.nat(), fc.nat(8), (text, from, span) => {
        const lines = computeLineStarts(text).length;
        const start = from % lines;
        const range: Range = { start: { line: start, character: 0 }, end: { line: start + span, character: 0 } };
        const edits = formatting(analyzeFast(text), range);
        const index = { text, lineStarts: computeLineStarts(text) };
        for (const e of edits) {
          expect(e.range.start.line).toBeGreaterThanOrEqual(range.start.line);
          expect(e.range.end.line).toBeLessThanOrEqual(range.end.line);
          expect(text.slice(positionToOffset(index, e.range.start), positionToOffset(index, e.range.end)).trim()).toBe('');
          expect(e.newText.trim()).toBe('');
        }
        const once = applyEdits(text, edits);
        expect(words(once)).toEqual(words(text));
      }),
      { numRuns: RUNS },
    );
   }, TIME_LIMIT);
});

describe('quick fixes and rewrites', () => {
  it('keep every comment of the file, in order and where it stood', () => {
    let applied = 0;
    fc.assert(
      fc.property(texts, (text) => {
        const a = analyze(text);
        const before = comments(text);
        for (const d of diagnostics(a, URI)) {
          for (const action of codeActions(a, URI, { range: d.range, diagnostics: [d] })) {
            const after = applyEdits(text, editsOf(action.edit));
            expect(comments(after), `${action.title} for ${d.code}`).toEqual(before);
            applied++;
          }
        }
      }),
      { numRuns: RUNS },
    );
    expect(applied).toBeGreaterThan(RUNS);
  }, TIME_LIMIT);
});

/**
 * Two species with levels of the same names, named bare and qualified: a rename that follows the
 * spelling instead of the declaration shows here. An invented scenario; the numbers do not matter.
 */
const SAME_NAMES = [
  'species Na23',
  '  level ground: 3s 2S1/2',
  '  level upper: 3p 2P°3/2',
  '',
  'species K39',
  '  level ground: 4s 2S1/2',
  '  level upper: 4p 2P°3/2',
  '',
  'field bias = 2 G',
  '',
  'line first: Na23.ground -> upper',
  'line second: K39.ground -> K39.upper',
  '',
  'beam probe',
  '  species = K39',
  '  level   = K39.ground',
  '  source  = oven 400 K',
  '',
].join('\n');

/** Where a rename may start: every atom, and every part of a dotted one (`Na23.ground`). */
function namePositions(text: string): Position[] {
  return scanText(text).lines.flatMap((l) =>
    l.tokens
      .filter((t) => t.kind === 'atom')
      .flatMap((t) => [0, ...[...t.text.matchAll(/\./g)].map((m) => m.index + 1)].map((at) => ({ line: l.line, character: t.start - l.start + at }))),
  );
}

describe('rename', () => {
  it('changes only the words at the ranges it returns, each to the new name, all naming the same thing', () => {
    let renamed = 0;
    fc.assert(
      fc.property(fc.oneof(texts, mutatedText([SAME_NAMES], 3)), (text) => {
        const fast = analyzeFast(text);
        const full = analyze(text);
        const index = { text, lineStarts: computeLineStarts(text) };
        const before = scanText(text).lines.flatMap((l) => [...l.tokens, ...(l.comment ? [l.comment] : [])]);
        for (const pos of namePositions(text)) {
          const prep = prepareRename(fast, pos);
          if (!prep || 'error' in prep) continue;
          const r = rename(full, URI, pos, 'renamedX');
          if (!r || 'error' in r) continue;
          const edits = editsOf(r);
          const target = definition(fast, URI, pos);
          expect(target).not.toBeNull();
          const spans = edits.map((e) => ({ start: positionToOffset(index, e.range.start), end: positionToOffset(index, e.range.end), e }));
          for (const { start, end, e } of spans) {
            // The old name becomes the new one, where go-to-definition finds the same declaration:
            // a same-spelled name of another species stays as it was.
            const where = `${prep.placeholder} at ${e.range.start.line}:${e.range.start.character}`;
            expect(text.slice(start, end), where).toBe(prep.placeholder);
            expect(e.newText, where).toBe('renamedX');
            expect(definition(fast, URI, e.range.start), where).toEqual(target);
          }
          // By position: each word of the text, with the returned ranges inside it replaced, is the
          // word at its place after the rename; every range lies inside one word.
          let inside = 0;
          const expected = before.map((w) => {
            let word = w.text;
            for (const s of spans.filter((x) => x.start >= w.start && x.end <= w.end).sort((a, b) => b.start - a.start)) {
              word = word.slice(0, s.start - w.start) + 'renamedX' + word.slice(s.end - w.start);
              inside++;
            }
            return word.trimEnd();
          });
          expect(inside).toBe(spans.length);
          const after = applyEdits(text, edits);
          expect(words(after)).toEqual(expected);
          renamed++;
        }
      }),
      { numRuns: RUNS },
    );
    // The generator must reach renames, or this property says nothing.
    expect(renamed).toBeGreaterThan(RUNS);
  }, TIME_LIMIT);
});

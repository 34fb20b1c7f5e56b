/**
 * Property test: the language service, which parses each new version incrementally from the
 * last, gives exactly the diagnostics and tree-derived features (outline, folding, semantic
 * tokens) that a service seeing the text for the first time gives, after every edit of random
 * edit sequences on the examples and a generated big setup; and the position-dependent answers
 * (hover and inlay hints on the parse and model, definition, references, the quick fixes of the
 * diagnostics) at words spread over the file and around the edit, where moved blocks show it
 * when a position was not moved with them. FUZZ_RUNS raises the case count.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { hover } from '../../server/src/features/hover';
import { inlayHints } from '../../server/src/features/inlayHints';
import { inProcessEvaluator } from '../../server/src/service/evaluator';
import { LanguageService } from '../../server/src/service/languageService';
import { DEFAULT_SETTINGS } from '../../server/src/service/settings';
import { applyTextEdit, editSequence, type TextEdit } from '../editSequences';
import { URI } from './helpers';

const RUNS = Number(process.env.FUZZ_RUNS ?? '') || 60;
const TIME_LIMIT = Math.max(300_000, RUNS * 5000); // generous: a loaded 2-core machine runs it 5–10× slower

/** A word's position on a few lines: the first, the last, spread between, and around the edit. */
function probes(text: string, edit?: TextEdit): { line: number; character: number }[] {
  const lines = text.split(/\r\n|\r|\n/);
  const at = edit ? text.slice(0, edit.at % (text.length + 1)).split(/\r\n|\r|\n/).length - 1 : 0;
  const picked = [0, at - 1, at, at + 1, at + 3, Math.floor(lines.length / 3), Math.floor((2 * lines.length) / 3), lines.length - 1];
  const out: { line: number; character: number }[] = [];
  for (const line of picked) {
    const words = [...(lines[line] ?? '').matchAll(/[^\s=:#,]+/g)];
    for (const w of words.slice(0, 2)) out.push({ line, character: (w.index ?? 0) + 1 });
  }
  return out;
}

function features(svc: LanguageService, version: number, text: string, edit?: TextEdit) {
  const doc = { uri: URI, version, getText: () => text };
  const diagnostics = svc.diagnostics(doc).items;
  const analysis = svc.analysis(doc);
  const at = probes(text, edit);
  const whole = { start: { line: 0, character: 0 }, end: { line: analysis.doc.lineStarts.length, character: 0 } };
  return {
    diagnostics,
    symbols: svc.documentSymbols(doc),
    folding: svc.foldingRanges(doc),
    tokens: svc.semanticTokens(doc),
    hovers: at.map((p) => hover(analysis, p, DEFAULT_SETTINGS.hover)),
    hints: inlayHints(analysis, whole),
    definitions: at.map((p) => svc.definition(doc, p)),
    references: at.map((p) => svc.references(doc, p, true)),
    fixes: diagnostics.slice(0, 8).map((d) => svc.codeActions(doc, { range: d.range, diagnostics: [d] })),
  };
}

describe('incremental language service', () => {
  it('answers as a fresh service does after every edit', { timeout: TIME_LIMIT }, () => {
    fc.assert(
      fc.property(editSequence, ([seed, edits]) => {
        const kept = new LanguageService(() => undefined, inProcessEvaluator());
        let text = seed;
        features(kept, 1, text);
        edits.forEach((e, k) => {
          text = applyTextEdit(text, e);
          const fresh = new LanguageService(() => undefined, inProcessEvaluator());
          expect(features(kept, 2 + k, text, e)).toStrictEqual(features(fresh, 2 + k, text, e));
        });
      }),
      { numRuns: RUNS },
    );
  });
});

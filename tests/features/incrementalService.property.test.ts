/**
 * Property test: the language service, which parses each new version incrementally from the
 * last, gives exactly the diagnostics and tree-derived features (outline, folding, semantic
 * tokens) that a service seeing the text for the first time gives, after every edit of random
 * edit sequences on the examples and a generated big setup. FUZZ_RUNS raises the case count.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { inProcessEvaluator } from '../../server/src/service/evaluator';
import { LanguageService } from '../../server/src/service/languageService';
import { applyTextEdit, editSequence } from '../editSequences';
import { URI } from './helpers';

const RUNS = Number(process.env.FUZZ_RUNS ?? '') || 60;
const TIME_LIMIT = Math.max(300_000, RUNS * 5000); // generous: a loaded 2-core machine runs it 5–10× slower

function features(svc: LanguageService, version: number, text: string) {
  const doc = { uri: URI, version, getText: () => text };
  return {
    diagnostics: svc.diagnostics(doc).items,
    symbols: svc.documentSymbols(doc),
    folding: svc.foldingRanges(doc),
    tokens: svc.semanticTokens(doc),
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
          expect(features(kept, 2 + k, text)).toStrictEqual(features(fresh, 2 + k, text));
        });
      }),
      { numRuns: RUNS },
    );
  });
});

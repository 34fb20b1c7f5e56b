import fc from 'fast-check';
import { readFileSync } from 'fs';
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { NEWER_BLOCKS } from '../features/newerBlockMistakes';
import { mutatedText } from '../mutatedExamples';

const RUNS = Number(process.env.FUZZ_RUNS ?? 200);
const seeds = ['lithium-beam', 'rubidium-bias', 'handmade-species', 'mistakes'].map((f) => readFileSync(`examples/${f}.sublevel`, 'utf8'));

// The newer blocks' mistakes too, so their neighbourhoods are fuzzed.
const mutated = mutatedText([...seeds, ...NEWER_BLOCKS.map((c) => c.text)], 8);

describe('the whole pipeline never throws', () => {
  it('on mutated example files', () => {
    fc.assert(
      fc.property(mutated, (text) => {
        const a = analyze(text);
        expect(a.problems.filter((p) => p.code === 'internal-error')).toEqual([]);
        for (const p of a.problems) {
          expect(p.range.start.line).toBeGreaterThanOrEqual(0);
          expect(p.message.length).toBeGreaterThan(0);
        }
      }),
      { numRuns: RUNS },
    );
  });

  it('on arbitrary unicode text', () => {
    fc.assert(
      fc.property(fc.string({ unit: 'binary', maxLength: 400 }), (text) => {
        expect(analyze(text).problems.filter((p) => p.code === 'internal-error')).toEqual([]);
      }),
      { numRuns: RUNS },
    );
  });
});

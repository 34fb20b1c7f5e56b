/**
 * Property test: the incremental parser gives exactly the document a full parse gives, after
 * every edit of random edit sequences on the examples and on a generated big setup (block
 * headers made and broken, lines joined and split, every line-break style). Set FUZZ_RUNS to
 * raise the number of cases.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseIncrementally, type IncrementalParse } from '../../server/src/format/incrementalParse';
import { parseSetup } from '../../server/src/format/parser';
import { generateSetup } from '../../bench/generatedSetup';
import { applyTextEdit, editSequence } from '../editSequences';

const RUNS = Number(process.env.FUZZ_RUNS ?? '') || 150;
const TIME_LIMIT = Math.max(300_000, RUNS * 2000); // generous: a loaded 2-core machine runs it 5–10× slower

describe('incremental parse', () => {
  it('gives the full parse after every edit of a random sequence', { timeout: TIME_LIMIT }, () => {
    fc.assert(
      fc.property(editSequence, ([seed, edits]) => {
        let text = seed;
        let parse: IncrementalParse = parseIncrementally(text);
        expect(parse.doc).toStrictEqual(parseSetup(text));
        for (const e of edits) {
          text = applyTextEdit(text, e);
          parse = parseIncrementally(text, parse);
          expect(parse.doc).toStrictEqual(parseSetup(text));
        }
      }),
      { numRuns: RUNS },
    );
  });

  it('reuses the untouched blocks: an edit inside one block leaves the others as they were', () => {
    const text = generateSetup(400);
    const before = parseIncrementally(text);
    const at = text.indexOf('mass = ', text.length / 2);
    const after = parseIncrementally(`${text.slice(0, at)}mass = 9${text.slice(at + 'mass = 4'.length)}`, before);
    const changed = after.doc.blocks.filter((b, i) => b !== before.doc.blocks[i]);
    expect(changed.map((b) => b.kind)).toEqual(['species']);
    expect(after.doc.blocks).toHaveLength(before.doc.blocks.length);
  });

  it('moves the blocks below an inserted line down by one, with their ranges', () => {
    const text = 'species A\n  mass = 7 u\nfield f = 3 G\nmagnet m\n  field = 0.4 T\n';
    const before = parseIncrementally(text);
    const after = parseIncrementally(`\n${text}`, before);
    expect(after.doc.blocks.map((b) => `${b.kind} ${b.range.start.line}-${b.range.end.line}`)).toEqual(['species 1-2', 'field 3-3', 'magnet 4-5']);
    expect(after.doc).toStrictEqual(parseSetup(`\n${text}`));
  });
});

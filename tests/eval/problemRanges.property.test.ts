/**
 * Every finding of the whole pipeline (parse, model and evaluation) is at a range inside the
 * document, its start not after its end, its related places too, and its message is plain words:
 * no NaN, Infinity, undefined or an object printed as "[object Object]". FUZZ_RUNS raises the count.
 */
import fc from 'fast-check';
import { readdirSync, readFileSync } from 'fs';
import { describe, expect, it } from 'vitest';
import type { Range } from '../../server/src/format/ast';
import { analyze } from '../../server/src/eval/analyze';
import { computeLineStarts, lineEndOffset } from '../../server/src/format/positions';
import { NEWER_BLOCKS } from '../features/newerBlockMistakes';
import { mutatedText } from '../mutatedExamples';

const RUNS = Number(process.env.FUZZ_RUNS ?? '') || 60;
/** Grows with the case count (a loaded 2-core machine takes up to ~0.3 s a case). */
const TIME_LIMIT = Math.max(600_000, RUNS * 1000);
const EXAMPLES = readdirSync('examples')
  .filter((f) => f.endsWith('.sublevel'))
  .map((f) => readFileSync(`examples/${f}`, 'utf8'));

/** Why the range is not a range of `text`, or undefined when it is one. */
function outside(text: string, r: Range): string | undefined {
  const starts = computeLineStarts(text);
  const doc = { text, lineStarts: starts };
  for (const p of [r.start, r.end]) {
    if (!(p.line >= 0 && p.line < starts.length)) return `line ${p.line} of ${starts.length}`;
    const width = lineEndOffset(doc, p.line) - starts[p.line]!;
    if (!(p.character >= 0 && p.character <= width)) return `character ${p.character} of ${width} on line ${p.line}`;
  }
  if (r.start.line > r.end.line || (r.start.line === r.end.line && r.start.character > r.end.character)) return 'start after end';
  return undefined;
}

/** Words a message holds only by a slip, unless the user wrote them (a message may quote the text). */
const UNCLEAR = /NaN|Infinity|undefined|\[object |\bnull\b/g;
const slips = (message: string, text: string): string[] => (message.match(UNCLEAR) ?? []).filter((w) => !text.includes(w));

describe('every finding is at a range of the document, in plain words', () => {
  it('on mutated examples and the newer blocks\' mistakes', () => {
    fc.assert(
      fc.property(mutatedText([...EXAMPLES, ...NEWER_BLOCKS.map((c) => c.text)], 6), (text) => {
        for (const p of analyze(text).problems) {
          expect(outside(text, p.range), `${p.code} at ${JSON.stringify(p.range)}`).toBeUndefined();
          for (const r of p.related ?? []) if (!r.uri) expect(outside(text, r.range), `${p.code}: related ${r.message}`).toBeUndefined();
          expect(slips(p.message, text), `${p.code}: ${p.message}`).toEqual([]);
          expect(p.message.trim().length, p.code).toBeGreaterThan(0);
        }
      }),
      { numRuns: RUNS },
    );
  }, TIME_LIMIT);
});

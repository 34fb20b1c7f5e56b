/**
 * Lines inserted or removed above a block move it in place (same node, same model entry): its
 * diagnostics, including the ranges a model builder made itself (a part of a level's
 * designation), must land where a fresh analysis puts them.
 */
import { describe, expect, it } from 'vitest';
import { analyzeFast, analyzeFastAfter } from '../../server/src/service/fastAnalysis';

// The second level's term is misspelt: the model reports a sub-range of its designation.
const TOP = 'field f = 3 G\n';
const HEAD = `${TOP}# notes\n# more notes\n\n`;
const TEXT = [HEAD + 'species A', '  mass = 7 u', '  level g: 5s 2S1/2', '  level x: 5s 2Q1/2', 'magnet m', '  field = 0.4 T', ''].join('\n');

const where = (problems: { code: string; range: { start: { line: number; character: number }; end: { line: number; character: number } } }[]) =>
  problems.map((p) => `${p.code} ${p.range.start.line}:${p.range.start.character}-${p.range.end.line}:${p.range.end.character}`);

describe('blocks moved by lines inserted above them', () => {
  it('keep their node and model entry, and their problems move with them', () => {
    const first = analyzeFastAfter(TEXT);
    const designationProblems = first.analysis.problems.filter((p) => p.range.start.line === 7 && p.range.start.character > 12);
    expect(designationProblems.length).toBeGreaterThan(0); // a sub-range the builder made
    let state = first.state;
    let text = TEXT;
    for (const inserted of ['\n', '# a comment\n\n', '']) {
      text = `${TOP}${inserted}${text.slice(TOP.length)}`;
      const before = state!.parse.doc.blocks[1];
      const next = analyzeFastAfter(text, undefined, state);
      expect(next.state!.parse.doc.blocks[1]).toBe(before);
      expect(where(next.analysis.problems)).toEqual(where(analyzeFast(text).problems));
      state = next.state;
    }
    // And back up: lines removed above.
    const shorter = TOP + text.slice(text.indexOf('# notes'));
    const back = analyzeFastAfter(shorter, undefined, state);
    expect(where(back.analysis.problems)).toEqual(where(analyzeFast(shorter).problems));
    expect(where(back.analysis.problems)).toEqual(where(first.analysis.problems));
  });
});

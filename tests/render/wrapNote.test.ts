/**
 * A figure's note broken into lines no wider than the space given, measured as the layout measures
 * text (estimateTextWidth: 6.3 units a glyph at size 11); both live in render/frame.ts.
 */
import { describe, expect, it } from 'vitest';
import { CHAR_WIDTH_11, estimateTextWidth, wrapNote } from '../../server/src/render/frame';

describe('wrapNote', () => {
  it('breaks at spaces so every line fits, a comma staying with its word', () => {
    const lines = wrapNote('aaaa bbbb, cccc dddd', 10 * CHAR_WIDTH_11);
    expect(lines).toEqual(['aaaa bbbb,', 'cccc dddd']);
    for (const l of lines) expect(estimateTextWidth(l)).toBeLessThanOrEqual(10 * CHAR_WIDTH_11);
  });

  it('a word wider than the space stands on its own line; an empty note has no line', () => {
    expect(wrapNote('ab abcdefghijkl cd', 5 * CHAR_WIDTH_11)).toEqual(['ab', 'abcdefghijkl', 'cd']);
    expect(wrapNote('', 100)).toEqual([]);
  });
});

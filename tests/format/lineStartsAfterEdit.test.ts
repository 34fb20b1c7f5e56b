/**
 * The line starts of an edited text, from those of the text before and a scan of the changed
 * part only, are those a full scan gives, for every line-break style and edits that split a
 * `\r\n` or join a `\r` and a `\n`.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { computeLineStarts, lineStartsAfterEdit } from '../../server/src/format/positions';

const piece = fc.constantFrom('a', 'bc', '\r', '\n', '\r\n', '');
const text = fc.array(piece, { maxLength: 12 }).map((p) => p.join(''));

function commonEnds(a: string, b: string): { prefix: number; suffix: number } {
  const min = Math.min(a.length, b.length);
  let prefix = 0;
  while (prefix < min && a[prefix] === b[prefix]) prefix++;
  let suffix = 0;
  while (suffix < min - prefix && a[a.length - 1 - suffix] === b[b.length - 1 - suffix]) suffix++;
  return { prefix, suffix };
}

describe('line starts after an edit', () => {
  it('equal a full scan of the new text', () => {
    fc.assert(
      fc.property(text, fc.nat(), fc.nat(3), text, (before, at, remove, insert) => {
        const from = at % (before.length + 1);
        const after = before.slice(0, from) + insert + before.slice(from + remove);
        const { prefix, suffix } = commonEnds(before, after);
        expect(lineStartsAfterEdit(computeLineStarts(before), before.length, after, prefix, suffix)).toEqual(computeLineStarts(after));
      }),
      { numRuns: 2000 },
    );
  });

  it('splitting a \\r\\n pair makes one more line; joining them one fewer', () => {
    expect(lineStartsAfterEdit([0, 3], 4, 'a\rx\nb', 2, 2)).toEqual([0, 2, 4]);
    expect(lineStartsAfterEdit([0, 2, 4], 5, 'a\r\nb', 2, 2)).toEqual([0, 3]);
  });
});

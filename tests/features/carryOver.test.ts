import { describe, expect, it } from 'vitest';
import type { Problem } from '../../server/src/format/ast';
import { carryOver, splitLines } from '../../server/src/service/carryOver';

function onLine(line: number, code = 'zeeman-not-linear'): Problem {
  return { code, severity: 'info', message: 'm', range: { start: { line, character: 2 }, end: { line, character: 5 } } };
}

describe('carrying evaluation problems over to a new version', () => {
  const before = splitLines('a\nb\nc\nd\ne');

  it('keeps lines above the change, shifts lines below it, drops changed lines', () => {
    const after = splitLines('a\nb\nX\nY\nd\ne'); // line 2 'c' replaced by two lines
    const moved = carryOver(before, after, [onLine(0), onLine(2), onLine(3), onLine(4)]);
    expect(moved.map((p) => p.range.start.line)).toEqual([0, 4, 5]);
  });

  it('keeps everything when nothing changed', () => {
    expect(carryOver(before, before, [onLine(1), onLine(4)]).map((p) => p.range.start.line)).toEqual([1, 4]);
  });

  it('moves related places along and drops those on changed lines', () => {
    const p: Problem = { ...onLine(4), related: [{ message: 'r', range: onLine(0).range }, { message: 'gone', range: onLine(2).range }] };
    const [moved] = carryOver(before, splitLines('a\nb\nchanged\nd\ne'), [p]);
    expect(moved!.related).toEqual([{ message: 'r', range: onLine(0).range }]);
  });

  it('splits lines the way positions count them', () => {
    expect(splitLines('a\r\nb\rc\nd')).toEqual(['a', 'b', 'c', 'd']);
  });
});

/**
 * Parsing at the speed of a keystroke: the document is kept as runs of lines ("segments") that
 * each begin where the parser's state does not depend on what came before (the first line, a
 * block header, a `use`; see `startsFreshState`). After an edit only the segments that the
 * changed lines touch are read again; the others are reused as they are, and those after the
 * change are moved down or up by the change in line count in place (`linePositions.ts`), so
 * their nodes keep their identity and the model's block memo finds them. Every segment is read
 * by the one parser (`parseLines`), so the result is the document `parseSetup` gives for the
 * same text (a property test checks this).
 * Nothing here knows the block kinds: a block word added to the schema needs no change.
 */
import type { Position, SetupDocument } from './ast';
import { collectPositions, moveLines } from './linePositions';
import { assembleDocument, parseLines, parseSetup, startsFreshState, type ParsedLines } from './parser';
import { computeLineStarts, lineStartsAfterEdit, offsetToPosition } from './positions';
import { scanLines } from './scanner';
import { EvaluationStopped, LINES_PER_STOP_CHECK, stopIfAsked, type StopCheck } from './stopCheck';

interface Segment {
  /** The segment's first line, in the document it was read for. */
  firstLine: number;
  lineCount: number;
  part: ParsedLines;
  /** Every position in `part`, gathered the first time the segment moves (a keystroke that keeps the line count walks nothing). */
  positions?: Position[];
}

/** A parsed text and what the next parse needs to reuse it. */
export interface IncrementalParse {
  readonly doc: SetupDocument;
  readonly segments: readonly Segment[];
}

/** Reads lines [from, to) of the text as segments; `stop` is asked every LINES_PER_STOP_CHECK lines or so. */
function readSegments(text: string, lineStarts: readonly number[], from: number, to: number, stop?: StopCheck): Segment[] {
  const lines = scanLines(text, lineStarts, from, to, stop);
  const out: Segment[] = [];
  let start = 0;
  let asked = 0;
  for (let i = 1; i <= lines.length; i++) {
    if (i < lines.length && !startsFreshState(lines[i]!)) continue;
    if (stop && i - asked >= LINES_PER_STOP_CHECK) {
      stopIfAsked(stop);
      asked = i;
    }
    out.push({ firstLine: from + start, lineCount: i - start, part: parseLines(text, lines.slice(start, i)) });
    start = i;
  }
  return out;
}

/**
 * The segment moved by `delta` lines: its own nodes, their positions changed in place (the
 * previous version's tree is not read again once a newer one exists). One with problems is read
 * again: their messages may name line numbers.
 */
function moved(segment: Segment, delta: number, text: string, lineStarts: readonly number[]): Segment[] {
  if (delta === 0) return [segment];
  const firstLine = segment.firstLine + delta;
  if (segment.part.problems.length > 0) return readSegments(text, lineStarts, firstLine, firstLine + segment.lineCount);
  const { part } = segment;
  const positions = segment.positions ?? collectPositions([part.blocks, part.uses, part.comments, part.problems]);
  moveLines(positions, delta);
  return [{ firstLine, lineCount: segment.lineCount, part, positions }];
}

/** Index of the segment holding `line` (segments are sorted and cover every line). */
function segmentAt(segments: readonly Segment[], line: number): number {
  let lo = 0;
  let hi = segments.length - 1;
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if (segments[mid]!.firstLine <= line) lo = mid;
    else hi = mid - 1;
  }
  return lo;
}

function fromScratch(text: string, stop?: StopCheck): IncrementalParse {
  const lineStarts = computeLineStarts(text);
  const segments = readSegments(text, lineStarts, 0, lineStarts.length, stop);
  return { doc: assembleDocument(text, lineStarts, segments.map((s) => s.part)), segments };
}

/** Parses whose nodes a later parse has moved: their positions are no longer theirs, so they are not reused again. */
const spent = new WeakSet<IncrementalParse>();

/**
 * Parses `text`, reusing what `previous` (the parse of an earlier version of the same document)
 * read for the lines the edit did not touch. When the line count changes, the nodes below the
 * change move in place, so `previous.doc` then shows the new line numbers there: read the newest
 * parse only (a parse reused once this way is read whole if it is passed again). Never throws (but `EvaluationStopped`, below): on
 * an unexpected failure the text is parsed whole by `parseSetup`, which reports it.
 * `stop` (the evaluation worker's): asked while lines are read, before anything of `previous`
 * moves, so a parse given up throws `EvaluationStopped` and leaves `previous` as it was.
 */
export function parseIncrementally(text: string, previous?: IncrementalParse, stop?: StopCheck): IncrementalParse {
  try {
    if (!previous || previous.segments.length === 0 || spent.has(previous)) return fromScratch(text, stop);
    return reuse(text, previous, stop);
  } catch (e) {
    if (e instanceof EvaluationStopped) throw e;
    return { doc: parseSetup(text), segments: [] };
  }
}

function reuse(text: string, previous: IncrementalParse, stop?: StopCheck): IncrementalParse {
  const before = previous.doc;
  const old = before.text;
  if (old === text) return previous;
  const min = Math.min(old.length, text.length);
  let prefix = 0;
  while (prefix < min && old.charCodeAt(prefix) === text.charCodeAt(prefix)) prefix++;
  let suffix = 0;
  while (suffix < min - prefix && old.charCodeAt(old.length - 1 - suffix) === text.charCodeAt(text.length - 1 - suffix)) suffix++;

  const lineStarts = lineStartsAfterEdit(before.lineStarts, old.length, text, prefix, suffix);
  const delta = lineStarts.length - before.lineStarts.length;
  // The old lines the change touches (lines before the first keep their text; one line of
  // margin after the last, for a line break that joins or splits lines), widened to whole
  // segments. When the first touched line starts a segment, the segment before it is read again
  // too: the line may no longer start one, and then it continues that segment.
  const firstTouched = offsetToPosition(before, prefix).line;
  const lastTouched = Math.min(before.lineStarts.length - 1, offsetToPosition(before, old.length - suffix).line + 1);
  const segments = previous.segments;
  let first = segmentAt(segments, firstTouched);
  if (first > 0 && segments[first]!.firstLine === firstTouched) first--;
  const last = segmentAt(segments, lastTouched);
  const from = segments[first]!.firstLine;
  const endOld = segments[last]!.firstLine + segments[last]!.lineCount;
  const to = endOld + delta;
  if (to < from) return fromScratch(text, stop);

  const out: Segment[] = segments.slice(0, first);
  for (const s of readSegments(text, lineStarts, from, to, stop)) out.push(s);
  if (delta !== 0) spent.add(previous);
  for (let i = last + 1; i < segments.length; i++) for (const s of moved(segments[i]!, delta, text, lineStarts)) out.push(s);
  return { doc: assembleDocument(text, lineStarts, out.map((s) => s.part)), segments: out };
}

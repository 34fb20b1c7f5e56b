/**
 * The reference for the text a server holds after `didChange`: each change applied to a plain
 * string, with offsets from a text document made afresh from that string (so no line table kept
 * across edits), by the text library's own rules (vscode-languageserver-textdocument: a line past
 * the end is the end, a character past its line's end is that end, an end before the start
 * swaps with it) after the rule every request follows: fractions floored, negatives as 0, a
 * missing or non-numeric coordinate is nonsense and that change is left out. Written apart from
 * server/src/documentSync.ts on purpose.
 */
import fc from 'fast-check';
import { TextDocument } from 'vscode-languageserver-textdocument';

type Pos = { line: number; character: number };

function coordinate(v: unknown): number | undefined {
  return typeof v === 'number' && !Number.isNaN(v) ? Math.min(2 ** 31 - 1, Math.max(0, Math.floor(v))) : undefined;
}

function pos(p: unknown): Pos | undefined {
  if (typeof p !== 'object' || p === null) return undefined;
  const line = coordinate((p as Pos).line);
  const character = coordinate((p as Pos).character);
  return line === undefined || character === undefined ? undefined : { line, character };
}

export function referenceText(text: string, changes: readonly unknown[]): string {
  let out = text;
  for (const c of changes) {
    if (typeof c !== 'object' || c === null || typeof (c as { text?: unknown }).text !== 'string') continue;
    const { text: inserted, range } = c as { text: string; range?: { start?: unknown; end?: unknown } };
    if (range === undefined) {
      out = inserted;
      continue;
    }
    let start = pos(range?.start);
    let end = pos(range?.end);
    if (!start || !end) continue;
    if (end.line < start.line || (end.line === start.line && end.character < start.character)) [start, end] = [end, start];
    const fresh = TextDocument.create('file:///reference', 'sublevel', 0, out);
    out = out.slice(0, fresh.offsetAt(start)) + inserted + out.slice(fresh.offsetAt(end));
  }
  return out;
}

/** A coordinate as a hostile client may send it: in range, past the end, fractional, negative, huge, or null (NaN in JSON). */
export const hostileCoordinate = (upTo: number): fc.Arbitrary<number | null> =>
  fc.oneof(
    { weight: 6, arbitrary: fc.nat({ max: upTo }) },
    { weight: 1, arbitrary: fc.integer({ min: upTo + 1, max: upTo + 5 }) },
    { weight: 1, arbitrary: fc.nat({ max: upTo }).map((n) => n + 0.5) },
    { weight: 1, arbitrary: fc.integer({ min: -5, max: -1 }) },
    { weight: 1, arbitrary: fc.constantFrom(1e12, 2 ** 31 - 1) },
    { weight: 1, arbitrary: fc.constant(null) },
  );

/** Changes as a hostile client may send them: incremental with any such range (reversed and overlapping ones come by chance), or the whole text. */
type HostilePosition = { line: number | null; character: number | null };
export interface HostileChange {
  range?: { start: HostilePosition; end: HostilePosition };
  text: string;
}

export const hostileChange = (lines: number, characters: number): fc.Arbitrary<HostileChange> =>
  fc.oneof(
    {
      weight: 8,
      arbitrary: fc.record({
        range: fc.record({
          start: fc.record({ line: hostileCoordinate(lines), character: hostileCoordinate(characters) }),
          end: fc.record({ line: hostileCoordinate(lines), character: hostileCoordinate(characters) }),
        }),
        text: fc.oneof(fc.constantFrom('', '\n', '\r\n', '\r', 'x', ' G\n', 'level a: 2s 2S1/2\n  '), fc.string({ maxLength: 12 })),
      }),
    },
    { weight: 1, arbitrary: fc.record({ text: fc.constantFrom('', 'field f = 1 G\r\n', 'a\rb\r\nc\n') }) },
  );

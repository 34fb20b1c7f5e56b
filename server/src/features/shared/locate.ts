/**
 * What lies at a position in the syntax tree: a block word, a name, a level's designation,
 * a setting key or value part, a line's level reference, or a comment. Blocks are found by
 * binary search on their lines, so a lookup in a long file stays cheap.
 */
import type { BlockNode, CommentNode, LevelNode, NameRef, Position, SettingNode, SetupDocument, UseNode, ValuePart } from '../../format/ast';
import { rangeContains } from '../../format/positions';

export type Target =
  | { kind: 'block-keyword'; block: BlockNode }
  | { kind: 'block-name'; block: BlockNode }
  | { kind: 'level-keyword'; block: BlockNode; level: LevelNode }
  | { kind: 'level-name'; block: BlockNode; level: LevelNode }
  | { kind: 'designation'; block: BlockNode; level: LevelNode }
  | { kind: 'key'; block: BlockNode; level?: LevelNode; setting: SettingNode }
  | { kind: 'value'; block: BlockNode; level?: LevelNode; setting: SettingNode; part?: ValuePart }
  | { kind: 'link'; block: BlockNode; ref: NameRef }
  | { kind: 'comment'; comment: CommentNode };

/** Index of the last item whose start line is ≤ line, or -1. Items must be sorted by line. */
export function lastStartingAtOrBefore<T>(items: readonly T[], line: number, startLine: (t: T) => number): number {
  let lo = 0;
  let hi = items.length - 1;
  let found = -1;
  while (lo <= hi) {
    const mid = (lo + hi) >> 1;
    if (startLine(items[mid]!) <= line) {
      found = mid;
      lo = mid + 1;
    } else hi = mid - 1;
  }
  return found;
}

/** The block whose header is the last one at or before `line` (the block a new line there would join). */
export function blockBefore(doc: SetupDocument, line: number): BlockNode | undefined {
  const i = lastStartingAtOrBefore(doc.blocks, line, (b) => b.headerRange.start.line);
  return i >= 0 ? doc.blocks[i] : undefined;
}

/** The block whose statements span `pos`, if any. */
export function blockAt(doc: SetupDocument, pos: Position): BlockNode | undefined {
  const b = blockBefore(doc, pos.line);
  return b && b.range.end.line >= pos.line ? b : undefined;
}

export function commentAt(doc: SetupDocument, pos: Position): CommentNode | undefined {
  const i = lastStartingAtOrBefore(doc.comments, pos.line, (c) => c.range.start.line);
  const c = i >= 0 ? doc.comments[i] : undefined;
  return c && rangeContains(c.range, pos) ? c : undefined;
}

function inSetting(block: BlockNode, level: LevelNode | undefined, s: SettingNode, pos: Position): Target | undefined {
  if (!rangeContains(s.range, pos)) return undefined;
  if (rangeContains(s.key.range, pos)) return { kind: 'key', block, ...(level ? { level } : {}), setting: s };
  const part = s.groups.flat().find((p) => rangeContains(p.range, pos));
  return { kind: 'value', block, ...(level ? { level } : {}), setting: s, ...(part ? { part } : {}) };
}

function inLevel(block: BlockNode, level: LevelNode, pos: Position): Target | undefined {
  if (!rangeContains(level.range, pos)) return undefined;
  if (rangeContains(level.keyword.range, pos)) return { kind: 'level-keyword', block, level };
  if (level.name && rangeContains(level.name.range, pos)) return { kind: 'level-name', block, level };
  if (level.designation && rangeContains(level.designation.range, pos)) return { kind: 'designation', block, level };
  for (const s of level.settings) {
    const t = inSetting(block, level, s, pos);
    if (t) return t;
  }
  return undefined;
}

/** The most specific thing at `pos`, or undefined on blank space. */
export function locate(doc: SetupDocument, pos: Position): Target | undefined {
  const comment = commentAt(doc, pos);
  if (comment && comment.range.start.character < pos.character) return { kind: 'comment', comment };
  const block = blockAt(doc, pos);
  if (!block) return comment ? { kind: 'comment', comment } : undefined;
  if (rangeContains(block.keyword.range, pos)) return { kind: 'block-keyword', block };
  if (block.name && rangeContains(block.name.range, pos)) return { kind: 'block-name', block };
  if (block.headerSetting) {
    const t = inSetting(block, undefined, block.headerSetting, pos);
    if (t && t.kind === 'value') return t;
  }
  for (const ref of [block.link?.from, block.link?.to]) {
    if (ref && rangeContains(ref.range, pos)) return { kind: 'link', block, ref };
  }
  for (const s of block.settings) {
    const t = inSetting(block, undefined, s, pos);
    if (t) return t;
  }
  for (const level of block.levels) {
    const t = inLevel(block, level, pos);
    if (t) return t;
  }
  return comment ? { kind: 'comment', comment } : undefined;
}

/** The `use` statement on `pos`, if any (they are few: a plain scan). */
export function useAt(doc: SetupDocument, pos: Position): UseNode | undefined {
  return doc.uses.find((u) => rangeContains(u.range, pos));
}

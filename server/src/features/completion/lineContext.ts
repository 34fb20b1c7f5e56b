/**
 * Where the cursor is, as completion needs it: the tokens of the line before the cursor, the
 * word being typed (and the range it replaces), and the block the line belongs to.
 */
import type { Position, Range } from 'vscode-languageserver-types';
import type { BlockNode, SetupDocument } from '../../format/ast';
import { lineText } from '../../format/positions';
import { scanLine, type Token } from '../../format/scanner';
import { blockBefore } from '../shared/locate';

export interface LineContext {
  doc: SetupDocument;
  position: Position;
  /** Line text up to the cursor. */
  prefix: string;
  /** Tokens before the word being typed (offsets into the line). */
  before: Token[];
  /** The word being typed, if the cursor touches one. */
  typing?: Token;
  /** What a completion replaces: the word being typed, or an empty range at the cursor. */
  replace: Range;
  /** The block a statement on this line belongs to (the last header above the line, unless a `use` line came after it). */
  enclosing?: BlockNode;
  /** True when the cursor is inside a comment. */
  inComment: boolean;
}

export function lineContext(doc: SetupDocument, position: Position): LineContext {
  const line = lineText(doc, position.line);
  const prefix = line.slice(0, Math.max(0, Math.min(position.character, line.length)));
  const scanned = scanLine(prefix, position.line, 0, prefix.length);
  const tokens = scanned.tokens;
  const last = tokens[tokens.length - 1];
  const typing = last && last.kind === 'atom' && last.end === prefix.length ? last : undefined;
  const before = typing ? tokens.slice(0, -1) : tokens;
  const start = typing ? typing.start : prefix.length;
  const above = position.line > 0 ? blockBefore(doc, position.line - 1) : undefined;
  // A `use` line between the header and the cursor has ended that block.
  const enclosing = above && !doc.uses.some((u) => u.range.start.line > above.headerRange.start.line && u.range.start.line < position.line) ? above : undefined;
  return {
    doc,
    position,
    prefix,
    before,
    ...(typing ? { typing } : {}),
    replace: { start: { line: position.line, character: start }, end: { line: position.line, character: prefix.length } },
    ...(enclosing ? { enclosing } : {}),
    inComment: scanned.comment !== undefined,
  };
}

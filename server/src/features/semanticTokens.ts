/**
 * Semantic tokens: block words and value words, names by what they name (declarations marked,
 * built-in species marked as library), setting keys, numbers, units, term designations,
 * operators and comments, the `use` keyword and its quoted path. A range request encodes only the lines it asks for.
 */
import type { Range, SemanticTokens } from 'vscode-languageserver-types';
import type { Analysis } from '../eval/analyze';
import type { BlockNode, SettingNode, SetupDocument, Spanned, ValuePart } from '../format/ast';
import { lineText } from '../format/positions';
import { VALUE_WORDS } from '../format/schema';
import type { NameUse, SetupModel } from '../model/types';
import { findSpecies } from '../physics/species';
import { MODIFIERS, TYPES, type Modifier, type TokenType } from './semanticTokensLegend';
import { namesOnLine } from './shared/names';

interface Tok {
  line: number;
  start: number;
  length: number;
  type: number;
  mods: number;
}

const NAME_TYPE: Record<NameUse['kind'], TokenType> = {
  species: 'namespace',
  level: 'enumMember',
  field: 'variable',
  magnet: 'variable',
  beam: 'variable',
  line: 'variable',
  resonance: 'variable',
  data: 'variable',
  fit: 'variable',
  source: 'variable',
};

class Collector {
  readonly toks: Tok[] = [];

  add(range: Range, type: TokenType, mods: Modifier[] = []): void {
    if (range.start.line !== range.end.line) return;
    const length = range.end.character - range.start.character;
    if (length <= 0) return;
    const m = mods.reduce((acc, x) => acc | (1 << MODIFIERS.indexOf(x)), 0);
    this.toks.push({ line: range.start.line, start: range.start.character, length, type: TYPES.indexOf(type), mods: m });
  }

  span(s: Spanned | undefined, type: TokenType, mods: Modifier[] = []): void {
    if (s) this.add(s.range, type, mods);
  }
}

function partTokens(c: Collector, model: SetupModel | undefined, part: ValuePart): void {
  if (part.kind === 'number') return c.add(part.range, 'number');
  if (part.kind === 'quantity') {
    const unitStart = part.unit.range.start.character;
    const numberText = part.text.slice(0, unitStart - part.range.start.character).trimEnd();
    c.add({ start: part.range.start, end: { line: part.range.start.line, character: part.range.start.character + numberText.length } }, 'number');
    c.add(part.unit.range, 'type');
    return;
  }
  const line = part.range.start.line;
  const uses = model
    ? namesOnLine(model, line).filter((u) => u.range.start.character >= part.range.start.character && u.range.end.character <= part.range.end.character)
    : [];
  if (uses.length > 0) for (const u of uses) c.add(u.range, NAME_TYPE[u.kind]);
  else if (VALUE_WORDS.includes(part.text)) c.add(part.range, 'keyword');
}

function settingTokens(c: Collector, model: SetupModel | undefined, s: SettingNode, keyType: TokenType | null): void {
  if (keyType) c.span(s.key, keyType);
  if (s.equals) c.add(s.equals, 'operator');
  for (const part of s.groups.flat()) partTokens(c, model, part);
}

function blockTokens(c: Collector, model: SetupModel | undefined, b: BlockNode): void {
  c.span(b.keyword, 'keyword');
  if (b.name) {
    if (b.kind === 'species') c.span(b.name, 'namespace', findSpecies(b.name.text) ? ['declaration', 'defaultLibrary'] : ['declaration']);
    else c.span(b.name, 'variable', ['declaration']);
  }
  if (b.headerSetting) settingTokens(c, model, b.headerSetting, null);
  if (b.link) {
    for (const ref of [b.link.from, b.link.to]) {
      if (!ref) continue;
      c.span(ref.qualifier, 'namespace');
      c.span(ref.name, 'enumMember');
    }
    if (b.link.arrow) c.add(b.link.arrow, 'operator');
  }
  for (const s of b.settings) settingTokens(c, model, s, 'property');
  for (const l of b.levels) {
    c.span(l.keyword, 'keyword');
    c.span(l.name, 'enumMember', ['declaration']);
    c.span(l.designation, 'string');
    for (const s of l.settings) settingTokens(c, model, s, 'property');
  }
}

/** A `use` path's range widened over the quotes around it. */
function withQuotes(doc: SetupDocument, r: Range): Range {
  const line = lineText(doc, r.start.line);
  const start = line[r.start.character - 1] === '"' ? r.start.character - 1 : r.start.character;
  const end = line[r.end.character] === '"' ? r.end.character + 1 : r.end.character;
  return { start: { line: r.start.line, character: start }, end: { line: r.end.line, character: end } };
}

function encode(toks: Tok[]): SemanticTokens {
  toks.sort((a, b) => a.line - b.line || a.start - b.start);
  const data: number[] = [];
  let line = 0;
  let start = 0;
  let lastEnd = -1;
  let lastLine = -1;
  for (const t of toks) {
    if (t.line === lastLine && t.start < lastEnd) continue; // overlapping: keep the first
    data.push(t.line - line, t.line === line ? t.start - start : t.start, t.length, t.type, t.mods);
    line = t.line;
    start = t.start;
    lastLine = t.line;
    lastEnd = t.start + t.length;
  }
  return { data };
}

export function semanticTokens(analysis: Analysis, range?: Range): SemanticTokens {
  const c = new Collector();
  const from = range?.start.line ?? 0;
  const to = range?.end.line ?? Number.MAX_SAFE_INTEGER;
  for (const b of analysis.doc.blocks) {
    if (b.range.end.line < from || b.range.start.line > to) continue;
    blockTokens(c, analysis.model, b);
  }
  for (const u of analysis.doc.uses) {
    if (u.range.end.line < from || u.range.start.line > to) continue;
    c.span(u.keyword, 'keyword');
    if (u.path) c.add(withQuotes(analysis.doc, u.path.range), 'string');
  }
  for (const cm of analysis.doc.comments) c.add(cm.range, 'comment');
  return encode(c.toks.filter((t) => t.line >= from && t.line <= to));
}

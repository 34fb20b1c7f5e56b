/**
 * The recovering, line-oriented parser: text → syntax tree + problems. Each line is one
 * statement; a line that cannot be read is reported and skipped and the next line is read as
 * usual. See docs/format.md for the format.
 */
import type { BlockKind, BlockNode, LevelNode, NameRef, Position, Problem, SettingNode, SetupDocument, Spanned, UseNode } from './ast';
import { makeProblem } from './codes';
import { controlCharacterProblems } from './controlCharacters';
import { didYouMeanText, suggestNames } from './didYouMean';
import { startsLikeNumber } from './numbers';
import { computeLineStarts } from './positions';
import { scanText, type ScannedLine, type Token } from './scanner';
import { EvaluationStopped, LINES_PER_STOP_CHECK, stopEvery, type StopCheck } from './stopCheck';
import { BLOCK_KEYS, BLOCK_WORDS, blocksWithKey, isBlockWord, LEVEL_KEYS, LEVEL_WORD, REPEATABLE_KEYS, USE_WORD } from './schema';
import { rangeOn, readValueGroups, spanOf, type LineSpans } from './values';

/**
 * Parses a whole document. Never throws, but for `EvaluationStopped` when a `stop` check is given
 * and says stop (asked every LINES_PER_STOP_CHECK lines, while scanning and while reading).
 */
export function parseSetup(text: string, stop?: StopCheck): SetupDocument {
  try {
    const scanned = scanText(text, stop);
    return assembleDocument(text, scanned.lineStarts, [new SetupParser(text).run(scanned.lines, stop)]);
  } catch (e) {
    if (e instanceof EvaluationStopped) throw e;
    // Defensive only: the property tests check this path is never taken.
    const at = { line: 0, character: 0 };
    return {
      text,
      lineStarts: computeLineStarts(text),
      blocks: [],
      uses: [],
      comments: [],
      problems: [makeProblem('syntax-internal-error', `the parser failed on this text: ${String(e)}`, { start: at, end: at })],
    };
  }
}

/** What reading a run of lines gives: its nodes and its problems in reading order (not sorted). */
export interface ParsedLines {
  blocks: BlockNode[];
  uses: UseNode[];
  comments: SetupDocument['comments'];
  problems: Problem[];
}

/**
 * Reads scanned lines of `text` (line numbers and offsets are those of the whole text) starting
 * from the parser's initial state. The incremental parser calls it on runs that begin at the
 * document's first line or at a line that `startsFreshState` accepts.
 */
export function parseLines(text: string, lines: readonly ScannedLine[]): ParsedLines {
  return new SetupParser(text).run(lines);
}

/**
 * True when reading this line leaves the parser in a state that does not depend on the lines
 * before it: a block header or a `use` statement (a block word or `use` not followed by `=` or `:`;
 * after `:` it may be a key of the enclosing block). The same test as `readLine`'s, made without state.
 */
export function startsFreshState(line: ScannedLine): boolean {
  const [t0, t1] = line.tokens;
  if (t0?.kind !== 'atom' || t1?.kind === 'equals' || t1?.kind === 'colon') return false;
  return isBlockWord(t0.text) || t0.text === USE_WORD;
}

/** The document from the runs of lines read in order: their nodes joined, control characters checked, problems sorted. */
export function assembleDocument(text: string, lineStarts: number[], parts: readonly ParsedLines[]): SetupDocument {
  const blocks: BlockNode[] = [];
  const uses: UseNode[] = [];
  const comments: SetupDocument['comments'] = [];
  const found: Problem[] = [];
  for (const part of parts) {
    for (const b of part.blocks) blocks.push(b);
    for (const u of part.uses) uses.push(u);
    for (const c of part.comments) comments.push(c);
    for (const p of part.problems) found.push(p);
  }
  for (const p of controlCharacterProblems(text, lineStarts)) found.push(p);
  const problems = found
    .map((p, i) => ({ p, i }))
    .sort((a, b) => a.p.range.start.line - b.p.range.start.line || a.p.range.start.character - b.p.range.start.character || a.i - b.i)
    .map((x) => x.p);
  return { text, lineStarts, blocks, uses, comments, problems };
}

/** Indexes of tokens that start a setting: a word directly followed by `=`. */
function settingStarts(tokens: Token[]): number[] {
  const starts: number[] = [];
  for (let i = 0; i + 1 < tokens.length; i++) {
    if (tokens[i]!.kind === 'atom' && tokens[i + 1]!.kind === 'equals') starts.push(i);
  }
  return starts;
}

function clip(text: string): string {
  return text.length > 40 ? `${text.slice(0, 37)}…` : text;
}

function isLater(a: Position, b: Position): boolean {
  return a.line > b.line || (a.line === b.line && a.character > b.character);
}

/** A setting with the problems found in its value, reported only if the setting is kept. */
interface PendingSetting {
  node: SettingNode;
  valueProblems: Problem[];
}

class SetupParser {
  private readonly blocks: BlockNode[] = [];
  private readonly uses: UseNode[] = [];
  private readonly comments: SetupDocument['comments'] = [];
  private readonly problems: Problem[] = [];
  private current: BlockNode | undefined;
  private level: LevelNode | undefined;
  /** After a misspelt block header: the lines up to the next block belong to nothing. */
  private orphan = false;
  /** After a misspelt `level` line: level settings up to the next level are skipped. */
  private levelOrphan = false;
  private readonly seen = new Map<BlockNode | LevelNode, Map<string, SettingNode>>();
  private ls: LineSpans = { text: '', line: 0, lineStart: 0 };

  constructor(private readonly text: string) {}

  run(lines: readonly ScannedLine[], stop?: StopCheck): ParsedLines {
    for (let i = 0; i < lines.length; i++) {
      stopEvery(stop, i, LINES_PER_STOP_CHECK);
      this.readLine(lines[i]!);
    }
    return { blocks: this.blocks, uses: this.uses, comments: this.comments, problems: this.problems };
  }

  // ---- lines -------------------------------------------------------------------------------

  private readLine(line: ScannedLine): void {
    this.ls = { text: this.text, line: line.line, lineStart: line.start };
    const { tokens } = line;
    if (line.comment) {
      const { start, end, text } = line.comment;
      this.comments.push({ text, range: rangeOn(this.ls, start, end), ownLine: tokens.length === 0 });
    }
    if (tokens.length === 0) return;
    const [t0, t1] = tokens as [Token, Token | undefined];
    const word = t0.kind === 'atom' ? t0.text : '';
    const followedBySetting = t1?.kind === 'equals' || (t1?.kind === 'colon' && this.keyAllowedHere(word));
    if (isBlockWord(word) && !followedBySetting) {
      this.openBlock(word, tokens);
      return;
    }
    if (word === USE_WORD && !followedBySetting) {
      this.readUse(tokens);
      return;
    }
    if (word === LEVEL_WORD && !followedBySetting) this.readLevel(tokens);
    else this.readSettingsLine(tokens);
    if (this.current) this.extend(this.current, tokens[tokens.length - 1]!.end);
  }

  private extend(node: { range: { end: Position } }, endOffset: number): void {
    const end = rangeOn(this.ls, endOffset, endOffset).end;
    if (isLater(end, node.range.end)) node.range.end = end;
  }

  private span(t: Token): Spanned {
    return spanOf(this.ls, t.start, t.end);
  }

  private report(code: string, message: string, start: number, end: number, extra?: Partial<Problem>): void {
    this.problems.push(makeProblem(code, message, rangeOn(this.ls, start, end), extra));
  }

  private unexpected(tokens: Token[], message: string): void {
    if (tokens.length === 0) return;
    const start = tokens[0]!.start;
    const end = tokens[tokens.length - 1]!.end;
    this.report('syntax-unexpected-text', `${message}: '${clip(this.text.slice(start, end))}' is ignored`, start, end);
  }

  // ---- block headers -----------------------------------------------------------------------

  private openBlock(kind: BlockKind, tokens: Token[]): void {
    const t0 = tokens[0]!;
    const headerRange = rangeOn(this.ls, t0.start, tokens[tokens.length - 1]!.end);
    const block: BlockNode = {
      kind,
      keyword: this.span(t0),
      settings: [],
      levels: [],
      headerRange,
      range: { start: headerRange.start, end: headerRange.end },
    };
    this.blocks.push(block);
    this.current = block;
    this.level = undefined;
    this.orphan = false;
    this.levelOrphan = false;
    let rest = tokens.slice(1);
    if (kind === 'field') return this.readFieldHeader(block, t0, rest);
    if (kind === 'line' || kind === 'fit') return this.readLineHeader(block, rest);
    if (kind !== 'settings' && rest[0]?.kind === 'atom') {
      block.name = this.span(rest[0]);
      rest = rest.slice(1);
    }
    if (rest.length === 0) return;
    const why =
      settingStarts(rest).length > 0
        ? `put settings on their own lines below the \`${kind}\` header`
        : kind === 'settings'
          ? '`settings` takes no name'
          : `a \`${kind}\` header is only \`${kind} <name>\``;
    this.unexpected(rest, why);
  }

  /** `field <name> = <value>`; the setting's key is the field's name (or the keyword if it has none). */
  private readFieldHeader(block: BlockNode, keyword: Token, tokens: Token[]): void {
    let rest = tokens;
    let key = keyword;
    if (rest[0]?.kind === 'atom') {
      key = rest[0];
      block.name = this.span(key);
      rest = rest.slice(1);
    }
    if (rest.length === 0) return; // no value: the model says what is missing
    let equals: Token | undefined;
    if (rest[0]!.kind === 'equals') {
      equals = rest[0];
      rest = rest.slice(1);
    } else {
      this.report('syntax-missing-equals', "missing '=' before the field's value", rest[0]!.start, rest[0]!.end);
    }
    const next = settingStarts(rest)[0] ?? rest.length;
    this.unexpected(rest.slice(next), 'a field takes a single value');
    const pending = this.makeSetting(key, equals, rest.slice(0, next));
    block.headerSetting = pending.node;
    this.problems.push(...pending.valueProblems);
  }

  /** `line <name>: <from> -> <to>` */
  private readLineHeader(block: BlockNode, tokens: Token[]): void {
    let rest = tokens;
    const nameLooksLikeFrom = rest[1]?.kind === 'arrow' && !rest.some((t) => t.kind === 'colon');
    if (rest[0]?.kind === 'atom' && !nameLooksLikeFrom) {
      block.name = this.span(rest[0]);
      rest = rest.slice(1);
    }
    if (rest[0]?.kind === 'colon') rest = rest.slice(1);
    else if (rest.length > 0 && block.name) {
      this.report('syntax-missing-colon', `missing ':' after the line's name '${clip(block.name.text)}'`, rest[0]!.start, rest[0]!.end);
    }
    const link: NonNullable<BlockNode['link']> = {};
    const fromToken = rest[0]?.kind === 'atom' ? rest[0] : undefined;
    if (fromToken) {
      link.from = this.nameRef(fromToken);
      rest = rest.slice(1);
    }
    if (rest[0]?.kind === 'arrow') {
      link.arrow = rangeOn(this.ls, rest[0].start, rest[0].end);
      rest = rest.slice(1);
    } else if (fromToken) {
      // `=>`, `-->`, `—>`: meant as the arrow, so said as a wrong arrow, not as a line without levels.
      const taken = lookalikeArrow(rest);
      if (taken > 0) {
        const start = rest[0]!.start;
        const end = rest[taken - 1]!.end;
        this.report('syntax-missing-arrow', `'${clip(this.ls.text.slice(start, end))}' is not the arrow: write '->' between the levels`, start, end);
        link.arrow = rangeOn(this.ls, start, end);
        rest = rest.slice(taken);
      }
    }
    if (rest[0]?.kind === 'atom') {
      const to = rest[0];
      link.to = this.nameRef(to);
      rest = rest.slice(1);
      if (!link.arrow && fromToken) {
        // The range is the gap where the arrow belongs.
        this.report('syntax-missing-arrow', `missing '->' between '${clip(fromToken.text)}' and '${clip(to.text)}'`, fromToken.end, to.start);
      }
    }
    if (block.kind === 'fit' && !link.from && !link.arrow && !link.to) {
      this.unexpected(rest, 'a `fit` header is `fit <name>` or, in one line, `fit <name>: <data> -> <parameter>`');
      return;
    }
    block.link = link;
    this.unexpected(rest, block.kind === 'fit' ? 'a one-line fit is written `fit <name>: <data> -> <parameter>`' : 'a line is written `line <name>: <lower level> -> <upper level>`');
  }

  /** `ground` or `Na23.ground` */
  private nameRef(t: Token): NameRef {
    const dot = t.text.indexOf('.');
    const ref: NameRef = { name: this.span(t), range: rangeOn(this.ls, t.start, t.end), text: t.text };
    if (dot > 0 && dot < t.text.length - 1) {
      ref.qualifier = spanOf(this.ls, t.start, t.start + dot);
      ref.name = spanOf(this.ls, t.start + dot + 1, t.end);
    }
    return ref;
  }

  // ---- use ---------------------------------------------------------------------------------

  /** `use "<path>"`: a top-level statement, so it ends the block before it. */
  private readUse(tokens: Token[]): void {
    const kw = tokens[0]!;
    this.current = undefined;
    this.level = undefined;
    this.orphan = false;
    this.levelOrphan = false;
    const node: UseNode = { kind: 'use', keyword: this.span(kw), range: rangeOn(this.ls, kw.start, tokens[tokens.length - 1]!.end) };
    this.uses.push(node);
    const how = 'write `use "folder/file.sublevel"`, with the path in double quotes';
    const p = tokens[1];
    if (!p || (p.kind !== 'string' && p.kind !== 'atom')) {
      const at = p ?? kw;
      this.report('syntax-use-path', `\`use\` needs the path of a setup file: ${how}`, at.start, at.end);
      this.unexpected(tokens.slice(2), 'a `use` statement takes one path');
      return;
    }
    if (p.kind === 'atom') {
      this.report('syntax-use-path', `put the path in double quotes: use "${clip(p.text)}"`, p.start, p.end, { data: { suggestions: [`"${p.text}"`] } });
      node.path = this.span(p);
      node.quotesWrong = true;
    } else {
      const closed = p.text.length >= 2 && p.text.endsWith('"');
      const innerEnd = closed ? p.end - 1 : p.end;
      if (!closed) {
        this.report('syntax-use-path', `the path has no closing quote: ${how}`, p.start, p.end, { data: { suggestions: [`${p.text}"`] } });
        node.quotesWrong = true;
      }
      if (innerEnd > p.start + 1) node.path = spanOf(this.ls, p.start + 1, innerEnd);
      else if (closed) this.report('syntax-use-path', `the path is empty: ${how}`, p.start, p.end);
    }
    this.unexpected(tokens.slice(2), 'a `use` statement takes one path');
  }

  // ---- levels ------------------------------------------------------------------------------

  /** `level <name>: <designation> [settings]` */
  private readLevel(tokens: Token[]): void {
    if (this.orphan) return;
    const kw = tokens[0]!;
    const block = this.current;
    if (!block || block.kind !== 'species') {
      const where = block ? `a \`${block.kind}\` block` : 'any block';
      this.report('syntax-level-outside-species', `a \`level\` belongs in a \`species\` block, not in ${where}`, kw.start, kw.end);
      return;
    }
    const rest = tokens.slice(1);
    const starts = settingStarts(rest);
    let head = rest.slice(0, starts[0] ?? rest.length);
    const level: LevelNode = {
      kind: 'level',
      keyword: this.span(kw),
      settings: [],
      range: rangeOn(this.ls, kw.start, tokens[tokens.length - 1]!.end),
    };
    if (head[0]?.kind === 'atom') {
      level.name = this.span(head[0]);
      head = head.slice(1);
    }
    const hasColon = head[0]?.kind === 'colon';
    if (hasColon) head = head.slice(1);
    if (head.length > 0) {
      const first = head[0]!;
      level.designation = spanOf(this.ls, first.start, head[head.length - 1]!.end);
      if (!hasColon && level.name) {
        this.report('syntax-missing-colon', `missing ':' between the level name '${clip(level.name.text)}' and its term`, first.start, first.end);
      }
    }
    block.levels.push(level);
    this.level = level;
    this.levelOrphan = false;
    this.readSettings(rest, starts, level);
  }

  // ---- settings ----------------------------------------------------------------------------

  /** Keys the current block (and its last level) take. */
  private keyAllowedHere(key: string): boolean {
    const block = this.current;
    if (!block || this.orphan) return false;
    if (BLOCK_KEYS[block.kind].includes(key)) return true;
    return block.kind === 'species' && this.level !== undefined && LEVEL_KEYS.includes(key);
  }

  /** Words a line may start with here; `use` only when a quoted path follows, as it would in a misspelt `use` line. */
  private statementCandidates(beforeString: boolean): string[] {
    const keys = this.current ? [...BLOCK_KEYS[this.current.kind], ...(this.current.kind === 'species' ? LEVEL_KEYS : [])] : [];
    return [...(beforeString ? [USE_WORD] : []), ...BLOCK_WORDS, LEVEL_WORD, ...keys];
  }

  private readSettingsLine(tokens: Token[]): void {
    if (this.orphan) return;
    const starts = settingStarts(tokens);
    const first = starts[0] ?? tokens.length;
    if (first > 0) {
      const head = tokens.slice(0, first);
      const t0 = head[0]!;
      if (t0.kind === 'atom' && this.keyAllowedHere(t0.text)) {
        this.readSettingWithoutEquals(head);
      } else if (t0.kind === 'atom') {
        const suggestions = suggestNames(t0.text, this.statementCandidates(tokens[1]?.kind === 'string'));
        const meantKeyword = suggestions.some((s) => isBlockWord(s) || s === LEVEL_WORD);
        if (starts.length === 0 || meantKeyword) {
          this.unknownStatement(t0, tokens, suggestions);
          return;
        }
        this.unexpected(head, `unexpected text before '${clip(tokens[first]!.text)} ='`);
      } else if (starts.length === 0 && t0.kind === 'equals') {
        this.unexpected(tokens, "'=' needs a setting name before it");
        return;
      } else {
        this.unexpected(head, 'a line starts with a block word, `level` or a setting `key = value`');
      }
    }
    this.readSettings(tokens, starts, undefined);
  }

  /** `gradient 180 T/m` or `gradient: 180 T/m` in a block that takes `gradient`. */
  private readSettingWithoutEquals(head: Token[]): void {
    const key = head[0]!;
    const colon = head[1]?.kind === 'colon' ? head[1] : undefined;
    if (colon) {
      this.report('syntax-missing-equals', `write '=' between '${clip(key.text)}' and its value, not ':'`, colon.start, colon.end, {
        data: { replacement: '=' },
      });
    } else {
      this.report('syntax-missing-equals', `missing '=' after '${clip(key.text)}'`, key.start, key.end);
    }
    this.place(this.makeSetting(key, undefined, head.slice(colon ? 2 : 1)), undefined);
  }

  private unknownStatement(word: Token, tokens: Token[], suggestions: string[]): void {
    const hint =
      suggestions.length > 0
        ? didYouMeanText(suggestions)
        : ` — a line starts with a block word (${BLOCK_WORDS.join(', ')}), \`level\`, \`use\`, or a setting \`key = value\``;
    this.report('syntax-unknown-statement', `unknown statement '${clip(word.text)}'${hint}`, word.start, word.end, {
      data: { suggestions },
    });
    const next = tokens[1];
    const looksLikeHeader = !next || next.kind === 'colon' || (next.kind === 'atom' && !startsLikeNumber(next.text));
    const best = suggestions[0];
    if (best !== undefined && isBlockWord(best) && looksLikeHeader) {
      // A misspelt header: what follows belongs to a block we cannot open; do not pin it on the previous one.
      this.current = undefined;
      this.level = undefined;
      this.orphan = true;
    } else if (best === LEVEL_WORD && this.current?.kind === 'species') {
      this.level = undefined;
      this.levelOrphan = true;
    }
  }

  /** Reads the `key = value` settings starting at `starts` and files each one. */
  private readSettings(tokens: Token[], starts: number[], inlineLevel: LevelNode | undefined): void {
    starts.forEach((s, k) => {
      const end = starts[k + 1] ?? tokens.length;
      this.place(this.makeSetting(tokens[s]!, tokens[s + 1], tokens.slice(s + 2, end)), inlineLevel);
    });
  }

  private makeSetting(key: Token, equals: Token | undefined, value: Token[]): PendingSetting {
    const valueProblems: Problem[] = [];
    const groups = readValueGroups(value, this.ls, valueProblems);
    const valueStart = value[0]?.start ?? equals?.end ?? key.end;
    const valueEnd = value[value.length - 1]?.end ?? valueStart;
    const node: SettingNode = {
      kind: 'setting',
      key: this.span(key),
      groups,
      valueText: spanOf(this.ls, valueStart, valueEnd),
      range: rangeOn(this.ls, key.start, Math.max(valueEnd, equals?.end ?? 0, key.end)),
    };
    if (equals) node.equals = rangeOn(this.ls, equals.start, equals.end);
    return { node, valueProblems };
  }

  /** Files a setting under the level or block it belongs to, or reports why it cannot be. */
  private place(pending: PendingSetting, inlineLevel: LevelNode | undefined): void {
    const { node } = pending;
    const key = node.key.text;
    const block = this.current;
    if (!block) {
      const homes = blocksWithKey(key);
      const home = homes.length > 0 ? ` — it belongs in a ${homes.map((h) => `\`${h}\``).join(' or ')} block` : '';
      const fieldHint = key === 'field' ? ' (a named field is written `field <name> = <value>`)' : '';
      this.report('syntax-outside-block', `'${clip(key)}' is outside any block${home}${fieldHint}`, ...this.keyOffsets(node));
      return;
    }
    let target: BlockNode | LevelNode = block;
    let allowed = BLOCK_KEYS[block.kind];
    let where: string = block.kind;
    if (inlineLevel) {
      target = inlineLevel;
      allowed = LEVEL_KEYS;
      where = 'level';
    } else if (block.kind === 'species' && LEVEL_KEYS.includes(key)) {
      if (this.levelOrphan) return;
      if (!this.level) {
        this.report('syntax-unknown-key', `'${key}' belongs to a level: write it on a \`level <name>: <term>\` line or after one`, ...this.keyOffsets(node));
        return;
      }
      target = this.level;
      allowed = LEVEL_KEYS;
      where = 'level';
    }
    if (!allowed.includes(key)) {
      this.reportUnknownKey(node, block.kind, where, allowed, inlineLevel !== undefined);
      return;
    }
    let keys = this.seen.get(target);
    if (!keys) this.seen.set(target, (keys = new Map()));
    const first = keys.get(key);
    if (first && !REPEATABLE_KEYS.includes(key)) {
      this.report('syntax-duplicate-setting', `'${key}' is already set on line ${first.range.start.line + 1}; this value is ignored`, ...this.keyOffsets(node), {
        related: [{ message: `'${key}' is first set here`, range: first.range }],
      });
      return;
    }
    keys.set(key, node);
    target.settings.push(node);
    this.problems.push(...pending.valueProblems);
    if (target !== block) this.extend(target, this.ls.lineStart + node.range.end.character);
  }

  private reportUnknownKey(node: SettingNode, kind: BlockKind, where: string, allowed: readonly string[], inline: boolean): void {
    const key = node.key.text;
    const offsets = this.keyOffsets(node);
    if (allowed.length === 0) {
      const hint = kind === 'field' ? ' (its value goes on the header line: `field <name> = <value>`)' : '';
      this.report('syntax-unknown-key', `a \`${kind}\` block takes no settings; '${clip(key)}' is ignored${hint}`, ...offsets);
      return;
    }
    if (inline && BLOCK_KEYS.species.includes(key)) {
      this.report('syntax-unknown-key', `'${key}' is a species setting: put it on its own line`, ...offsets);
      return;
    }
    const candidates = kind === 'species' && !inline ? [...allowed, ...LEVEL_KEYS] : [...allowed];
    const suggestions = suggestNames(key, candidates);
    const place = where === 'level' ? 'a level' : `a \`${kind}\` block`;
    this.report(
      'syntax-unknown-key',
      `'${clip(key)}' is not a key of ${place}${didYouMeanText(suggestions)} (it takes ${allowed.join(', ')})`,
      ...offsets,
      { data: { suggestions } },
    );
  }

  private keyOffsets(node: SettingNode): [number, number] {
    return [this.ls.lineStart + node.key.range.start.character, this.ls.lineStart + node.key.range.end.character];
  }
}

/** Arrows typed otherwise (`=>`, `-->`, `—>`, `- >`): how many tokens at the start of `rest` make one, 0 when none. */
function lookalikeArrow(rest: readonly Token[]): number {
  const [a, b] = rest;
  if (!a) return 0;
  if (a.kind === 'atom' && /^(?:=+>|-{2,}>|[—–−]+>|>)$/.test(a.text)) return 1;
  const firstHalf = a.kind === 'equals' || (a.kind === 'atom' && /^[-—–−=]+$/.test(a.text));
  if (firstHalf && b?.kind === 'atom' && b.text === '>') return 2;
  // `-->` scans as `-` and `->`.
  return a.kind === 'atom' && /^[-—–−]+$/.test(a.text) && b?.kind === 'arrow' && a.end === b.start ? 2 : 0;
}

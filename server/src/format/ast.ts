/**
 * Syntax tree of a `.sublevel` document. The parser always returns one of these,
 * however broken the text is; problems go to `SetupDocument.problems`.
 * Positions are LSP-style: 0-based line, UTF-16 character offsets.
 */

export interface Position {
  line: number;
  character: number;
}

export interface Range {
  start: Position;
  end: Position;
}

/** A piece of source text with its place. */
export interface Spanned {
  text: string;
  range: Range;
}

/** A number as written. `fraction` is set for exact forms such as `3/2` or `-1/2` or plain integers. */
export interface ParsedNumber {
  value: number;
  fraction?: { num: number; den: number };
  /** Standard uncertainty from the `0.35(2)` notation, in the same units as value. */
  uncertainty?: number;
}

/** One item of a setting's value. A `quantity` is a number with a unit (glued or space-separated). */
export type ValuePart =
  | ({ kind: 'number'; number: ParsedNumber } & Spanned)
  | ({ kind: 'quantity'; number: ParsedNumber; unit: Spanned } & Spanned)
  /** `unreadable`: a number that cannot be used (`1e400 T`), already reported where it was read. */
  | ({ kind: 'word'; unreadable?: true } & Spanned);

/** `key = value`. `groups` are the comma-separated pieces of the value, each a sequence of parts. */
export interface SettingNode {
  kind: 'setting';
  key: Spanned;
  /** Range of the `=` sign, absent when it is missing (a problem is reported). */
  equals?: Range;
  groups: ValuePart[][];
  /** Raw value text (from after `=` to the end of the value, trimmed). */
  valueText: Spanned;
  range: Range;
}

/** A reference to a named thing: `ground`, or `Na23.ground` (qualifier + name). */
export interface NameRef {
  qualifier?: Spanned;
  name: Spanned;
  range: Range;
  text: string;
}

/** `level <name>: [configuration] <term> [settings...]` */
export interface LevelNode {
  kind: 'level';
  keyword: Spanned;
  name?: Spanned;
  /** Everything between the colon and the first inline setting: configuration and term symbol. */
  designation?: Spanned;
  settings: SettingNode[];
  /** Whole statement, including continuation setting lines that belong to it. */
  range: Range;
}

export type BlockKind = 'species' | 'field' | 'magnet' | 'beam' | 'line' | 'resonance' | 'settings' | 'data' | 'fit' | 'coil' | 'solenoid' | 'wire' | 'slab' | 'slower' | 'trap';

export interface BlockNode {
  kind: BlockKind;
  keyword: Spanned;
  name?: Spanned;
  /** For `field <name> = <value>`: the value written on the header line. */
  headerSetting?: SettingNode;
  /** For `line <name>: <from> -> <to>` (and the one-line `fit <name>: <data> -> <parameter>`). */
  link?: { from?: NameRef; arrow?: Range; to?: NameRef };
  settings: SettingNode[];
  levels: LevelNode[];
  /** The header line only. */
  headerRange: Range;
  /** From the header to the end of the block's last statement. */
  range: Range;
}

/**
 * `use "<relative path>"`: the species of another setup file are available here by name.
 * Top level only; the line ends the block before it.
 */
export interface UseNode {
  kind: 'use';
  keyword: Spanned;
  /** The path as written, without its quotes; the range covers the text between them. Absent when none is written. */
  path?: Spanned;
  /** The path was written without quotes or without its closing one (reported by the parser). */
  quotesWrong?: true;
  /** The whole statement. */
  range: Range;
}

export interface CommentNode extends Spanned {
  /** True when the comment is the only thing on its line. */
  ownLine: boolean;
}

export type ProblemSeverity = 'error' | 'warning' | 'info' | 'hint';

/** A problem found while reading the text. The same shape is used by every later stage. */
export interface Problem {
  /** Stable id, e.g. `syntax-unknown-statement`; quick fixes switch on it. See codes.ts. */
  code: string;
  severity: ProblemSeverity;
  message: string;
  range: Range;
  /** Other places involved; `uri` is set when the place is in another file (a used file). */
  related?: { message: string; range: Range; uri?: string }[];
  /** Data a quick fix needs, e.g. replacement suggestions. */
  data?: { suggestions?: string[]; [key: string]: unknown };
}

export interface SetupDocument {
  text: string;
  /** Offsets of the start of each line, for position <-> offset conversion. */
  lineStarts: number[];
  blocks: BlockNode[];
  /** The `use` statements, in order. */
  uses: UseNode[];
  comments: CommentNode[];
  problems: Problem[];
}

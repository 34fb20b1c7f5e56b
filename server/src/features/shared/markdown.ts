/** Markdown helpers for hovers. Every piece of user text goes through `md` before it is shown. */

/** Characters CommonMark lets us escape with a backslash, plus `&` (entities) and `<`/`>` (HTML). */
const SPECIAL = /[\\`*_{}[\]()#+\-.!|<>~&$:"'=^]/g;

/** User text made inert: it renders as written and cannot open links, code, HTML or tables. */
export function md(text: string): string {
  return text.replace(SPECIAL, (c) => `\\${c}`).replace(/\r?\n|\r/g, ' ');
}

/** A Markdown table; cells must already be escaped. */
export function mdTable(header: readonly string[], rows: readonly (readonly string[])[]): string {
  const line = (cells: readonly string[]): string => `| ${cells.join(' | ')} |`;
  return [line(header), line(header.map(() => '---')), ...rows.map(line)].join('\n');
}

/** A bold title line. */
export function mdTitle(text: string): string {
  return `**${text}**`;
}

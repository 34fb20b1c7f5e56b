/**
 * Items as a sentence lists them. A text helper in the lowest layer, so term-symbol messages,
 * unit messages and the command line's choice lists all say a list the same way.
 */

/** 'a', 'a or b', 'a, b or c' */
export function listWords(items: readonly string[]): string {
  if (items.length <= 1) return items.join('');
  return `${items.slice(0, -1).join(', ')} or ${items[items.length - 1]}`;
}

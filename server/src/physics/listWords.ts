/**
 * Items as a sentence lists them. A text helper in the lowest layer, so term-symbol messages,
 * unit messages and the command line's choice lists all say a list the same way.
 */

/** 'a', 'a or b', 'a, b or c' (or with 'and': 'a, b and c') */
export function listWords(items: readonly string[], conjunction: 'or' | 'and' = 'or'): string {
  if (items.length <= 1) return items.join('');
  return `${items.slice(0, -1).join(', ')} ${conjunction} ${items[items.length - 1]}`;
}

/** Completion item builders: keywords, setting keys, units, species, names and term symbols. */
import { type CompletionItem, CompletionItemKind, InsertTextFormat, type Range } from 'vscode-languageserver-types';
import type { Dimension } from '../../format/units';
import { unitNames } from '../../format/units';
import { dimensionOfUnit } from '../shared/units';

export function item(label: string, kind: CompletionItemKind, replace: Range, opts: { insert?: string; detail?: string; order?: number; snippet?: boolean; preselect?: boolean } = {}): CompletionItem {
  const newText = opts.insert ?? label;
  return {
    label,
    kind,
    textEdit: { range: replace, newText },
    ...(opts.detail ? { detail: opts.detail } : {}),
    ...(opts.order !== undefined ? { sortText: String(opts.order).padStart(4, '0') } : {}),
    ...(opts.snippet ? { insertTextFormat: InsertTextFormat.Snippet } : {}),
    ...(opts.preselect ? { preselect: true } : {}),
  };
}

/** Units of one dimension, in the order the unit table lists them (likeliest first). */
export function unitsOf(d: Dimension): string[] {
  if (d === 'dimensionless') return ['%'];
  return unitNames().filter((u) => dimensionOfUnit(u) === d);
}

export function unitItems(d: Dimension, replace: Range): CompletionItem[] {
  return unitsOf(d).map((u, i) => item(u, CompletionItemKind.Unit, replace, { order: i }));
}

export function wordItems(words: readonly string[], replace: Range, detail?: string): CompletionItem[] {
  return words.map((w, i) => item(w, CompletionItemKind.Value, replace, { order: i, ...(detail ? { detail } : {}) }));
}

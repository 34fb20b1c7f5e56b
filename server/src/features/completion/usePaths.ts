/**
 * Completion of the path in `use "…|`: the setup files in the folder typed so far, relative
 * to the document's own folder. The folder listing comes from the caller (features do no I/O).
 */
import { type CompletionItem, CompletionItemKind } from 'vscode-languageserver-types';
import { baseName, folderOf, locationKey, resolveLocation } from '../../model/locations';
import { USE_WORD } from '../../format/schema';
import { item } from './items';
import type { LineContext } from './lineContext';

export interface FolderLister {
  /** The document's own location. */
  uri: string;
  listFolder(location: string): readonly string[] | undefined;
}

const SETUP_EXTENSION = '.sublevel';

/** Items for a `use` path being typed; undefined when the cursor is not in one. */
export function usePathCompletions(c: LineContext, folder: FolderLister | undefined): CompletionItem[] | undefined {
  const [keyword, path, ...rest] = c.before;
  if (!keyword || keyword.kind !== 'atom' || keyword.text !== USE_WORD || !path || path.kind !== 'string' || rest.length > 0) return undefined;
  // Only while the quote is open up to the cursor.
  if (path.end !== c.prefix.length || (path.text.length >= 2 && path.text.endsWith('"'))) return undefined;
  if (!folder) return [];
  const typed = path.text.slice(1).replace(/\\/g, '/');
  const slash = typed.lastIndexOf('/');
  const dir = typed.slice(0, slash + 1);
  const probe = resolveLocation(folder.uri, `${dir}probe${SETUP_EXTENSION}`);
  const where = probe !== undefined ? folderOf(probe) : undefined;
  const names = where !== undefined ? folder.listFolder(where) : undefined;
  if (!names) return [];
  const self = baseName(folder.uri);
  const sameFolder = where !== undefined && locationKey(where) === locationKey(folderOf(folder.uri) ?? '');
  const start = { line: c.position.line, character: path.start + 1 + slash + 1 };
  const replace = { start, end: c.replace.end };
  return names
    .filter((n) => n.endsWith(SETUP_EXTENSION) && !(sameFolder && n === self))
    .sort()
    .map((n, i) => item(n, CompletionItemKind.File, replace, { detail: `${dir}${n}`, order: i }));
}

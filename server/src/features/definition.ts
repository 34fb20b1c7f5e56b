/**
 * Go to definition: from a reference (or a declaration) to the place that declares the name,
 * in this file or in a used file; from a `use` path to the file it names.
 */
import type { Location, Position } from 'vscode-languageserver-types';
import type { Analysis } from '../eval/analyze';
import { isUri } from '../model/locations';
import { useAt } from './shared/locate';
import { declarationOf, nameAt } from './shared/names';

const FILE_START = { start: { line: 0, character: 0 }, end: { line: 0, character: 0 } };

export function definition(analysis: Analysis, uri: string, pos: Position): Location | null {
  const model = analysis.model;
  if (!model) return null;
  const statement = useAt(analysis.doc, pos);
  if (statement) {
    const used = model.uses.find((u) => u.node === statement);
    return used?.loaded && used.location !== undefined && isUri(used.location) ? { uri: used.location, range: FILE_START } : null;
  }
  const use = nameAt(model, pos);
  const decl = use && declarationOf(use);
  return decl ? { uri: decl.uri ?? uri, range: decl.range } : null;
}

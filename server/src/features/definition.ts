/** Go to definition: from a reference (or a declaration) to the place that declares the name. */
import type { Location, Position } from 'vscode-languageserver-types';
import type { Analysis } from '../eval/analyze';
import { declarationOf, nameAt } from './shared/names';

export function definition(analysis: Analysis, uri: string, pos: Position): Location | null {
  if (!analysis.model) return null;
  const use = nameAt(analysis.model, pos);
  const decl = use && declarationOf(use);
  return decl ? { uri, range: decl.range } : null;
}

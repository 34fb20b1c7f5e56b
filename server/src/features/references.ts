/** Find references: every place that names the same species, level, field, magnet, beam or line. */
import type { Location, Position } from 'vscode-languageserver-types';
import type { Analysis } from '../eval/analyze';
import { nameAt, usesOfSameThing } from './shared/names';

export function references(analysis: Analysis, uri: string, pos: Position, includeDeclaration: boolean): Location[] {
  if (!analysis.model) return [];
  const use = nameAt(analysis.model, pos);
  if (!use) return [];
  return usesOfSameThing(analysis.model, use)
    .filter((u) => includeDeclaration || !u.isDeclaration)
    .sort((a, b) => a.range.start.line - b.range.start.line || a.range.start.character - b.range.start.character)
    .map((u) => ({ uri, range: u.range }));
}

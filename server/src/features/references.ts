/**
 * Find references: every place that names the same species, level, field, magnet, beam or
 * line. A species or level from a used file is declared there: its declaration is listed with
 * that file's URI, the references with this one's.
 */
import type { Location, Position } from 'vscode-languageserver-types';
import type { Analysis } from '../eval/analyze';
import { declarationOf, nameAt, usesOfSameThing } from './shared/names';

export function references(analysis: Analysis, uri: string, pos: Position, includeDeclaration: boolean): Location[] {
  if (!analysis.model) return [];
  const use = nameAt(analysis.model, pos);
  if (!use) return [];
  const decl = declarationOf(use);
  const elsewhere = includeDeclaration && decl?.uri !== undefined ? [{ uri: decl.uri, range: decl.range }] : [];
  const here = usesOfSameThing(analysis.model, use)
    .filter((u) => includeDeclaration || !u.isDeclaration)
    .sort((a, b) => a.range.start.line - b.range.start.line || a.range.start.character - b.range.start.character)
    .map((u) => ({ uri, range: u.range }));
  return [...elsewhere, ...here];
}

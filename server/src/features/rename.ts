/**
 * Rename a species, level, field, magnet, beam or line everywhere it is named. Refused, with
 * the reason, where the result would change the physics or not read back the same: a
 * built-in species name (its data would come or go), a name another thing of the same kind
 * already has, text that is not a single name, or a name declared in a used file.
 */
import type { Position, Range, WorkspaceEdit } from 'vscode-languageserver-types';
import type { Analysis } from '../eval/analyze';
import { BLOCK_WORDS, LEVEL_WORD } from '../format/schema';
import type { NameUse, SetupModel } from '../model/types';
import { findSpecies } from '../physics/species';
import { declaredAt } from './shared/modelLookup';
import { declarationOf, nameAt, usesOfSameThing } from './shared/names';

export type RenameRefusal = { error: string };

/** A name is one word that does not start like a number and holds none of the format's punctuation. */
const NAME = /^[\p{L}_][^\s#=:,.\u2192]*$/u;

function renamable(model: SetupModel, pos: Position): { use: NameUse; decl: NonNullable<ReturnType<typeof declarationOf>> } | RenameRefusal | null {
  const use = nameAt(model, pos);
  if (!use) return null;
  const decl = declarationOf(use);
  if (!decl) return { error: `'${use.name}' does not name anything defined in this file, so there is nothing to rename` };
  if (decl.uri !== undefined) {
    const from = declaredAt(model, decl.kind, decl.range, decl.uri);
    const where = from?.kind === 'species' ? from.item.origin?.path : from?.kind === 'level' ? from.item.species.origin?.path : undefined;
    return { error: `'${decl.name}' is declared in ${where ?? 'another file'}: rename it there` };
  }
  if (decl.kind === 'species' && findSpecies(decl.name)) {
    return { error: `'${decl.name}' is a built-in species: renaming it would drop its built-in data` };
  }
  return { use, decl };
}

export function prepareRename(analysis: Analysis, pos: Position): { range: Range; placeholder: string } | RenameRefusal | null {
  if (!analysis.model) return null;
  const r = renamable(analysis.model, pos);
  if (!r || 'error' in r) return r;
  return { range: r.use.range, placeholder: r.use.name };
}

function clash(model: SetupModel, decl: NonNullable<ReturnType<typeof declarationOf>>, newName: string): string | undefined {
  const d = declaredAt(model, decl.kind, decl.range);
  if (decl.kind === 'level' && d?.kind === 'level') {
    if (d.item.species.levels.some((l) => l !== d.item && l.name === newName)) return `${d.item.species.name} already has a level named '${newName}'`;
    return undefined;
  }
  const taken =
    model.names.some((u) => u.isDeclaration && u.kind === decl.kind && u.name === newName) ||
    (decl.kind === 'species' && model.species.some((s) => s.origin !== undefined && s.name === newName));
  return taken ? `there is already a ${decl.kind} named '${newName}'` : undefined;
}

export function rename(analysis: Analysis, uri: string, pos: Position, newName: string): WorkspaceEdit | RenameRefusal | null {
  const model = analysis.model;
  if (!model) return null;
  const r = renamable(model, pos);
  if (!r || 'error' in r) return r;
  if (!NAME.test(newName) || newName.includes('->')) {
    return { error: `'${newName}' is not a valid name: use one word that starts with a letter, without spaces, '.', ':', '=', ',' or '#'` };
  }
  if ((BLOCK_WORDS as readonly string[]).includes(newName) || newName === LEVEL_WORD) return { error: `'${newName}' is a keyword of the format` };
  if (r.decl.kind === 'species' && findSpecies(newName)) {
    return { error: `'${newName}' is a built-in species name: renaming to it would load built-in data` };
  }
  if (newName === r.decl.name) return { changes: { [uri]: [] } };
  const taken = clash(model, r.decl, newName);
  if (taken) return { error: taken };
  const edits = usesOfSameThing(model, r.use).map((u) => ({ range: u.range, newText: newName }));
  return { changes: { [uri]: edits } };
}

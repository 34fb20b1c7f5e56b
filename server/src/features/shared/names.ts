/**
 * The model's list of name uses (declarations and references), indexed by line, for
 * go-to-definition, references, rename, semantic tokens and hovers on references.
 */
import type { Position, Range } from '../../format/ast';
import { rangeContains } from '../../format/positions';
import type { NameUse, SetupModel } from '../../model/types';

const byLineCache = new WeakMap<SetupModel, Map<number, NameUse[]>>();

function byLine(model: SetupModel): Map<number, NameUse[]> {
  let index = byLineCache.get(model);
  if (!index) {
    index = new Map();
    for (const use of model.names) {
      const line = use.range.start.line;
      const list = index.get(line);
      if (list) list.push(use);
      else index.set(line, [use]);
    }
    byLineCache.set(model, index);
  }
  return index;
}

export function namesOnLine(model: SetupModel, line: number): readonly NameUse[] {
  return byLine(model).get(line) ?? [];
}

export function nameAt(model: SetupModel, pos: Position): NameUse | undefined {
  return namesOnLine(model, pos.line).find((u) => rangeContains(u.range, pos));
}

export function sameRange(a: Range, b: Range): boolean {
  return (
    a.start.line === b.start.line && a.start.character === b.start.character && a.end.line === b.end.line && a.end.character === b.end.character
  );
}

/** Is `inner` inside `outer` (ends included)? */
export function containsRange(outer: Range, inner: Range): boolean {
  const le = (a: Range['start'], b: Range['start']): boolean => a.line < b.line || (a.line === b.line && a.character <= b.character);
  return le(outer.start, inner.start) && le(inner.end, outer.end);
}

/**
 * The declaration a use stands for: itself when it is one, its target when it resolved, else
 * undefined. `uri` is set when the declaration is in another file (through `use`).
 */
export function declarationOf(use: NameUse): { kind: NameUse['kind']; name: string; range: Range; uri?: string } | undefined {
  if (use.isDeclaration) return { kind: use.kind, name: use.name, range: use.range };
  return use.target;
}

/** Every use (declaration included) that stands for the same declaration as `use`. */
export function usesOfSameThing(model: SetupModel, use: NameUse): NameUse[] {
  const decl = declarationOf(use);
  if (!decl) return [];
  return model.names.filter((u) => {
    const d = declarationOf(u);
    return d !== undefined && d.kind === decl.kind && d.uri === decl.uri && sameRange(d.range, decl.range);
  });
}

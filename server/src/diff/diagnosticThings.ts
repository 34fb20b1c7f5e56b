/**
 * Which thing a diagnostic belongs to: the level, or else the block, whose text holds its start.
 * Diagnostics are compared by code and thing, not by line, so moving a block is not a change.
 */
import type { Position, Range, SetupDocument } from '../format/ast';
import type { DiagnosticResult } from '../eval/resultTypes';
import type { ThingKind } from './diffTypes';

export interface ThingRef {
  kind: ThingKind;
  name: string;
}

function inside(p: Position, r: Range): boolean {
  const afterStart = p.line > r.start.line || (p.line === r.start.line && p.character >= r.start.character);
  const beforeEnd = p.line < r.end.line || (p.line === r.end.line && p.character <= r.end.character);
  return afterStart && beforeEnd;
}

/** `termNames`: `species.level` names that are whole terms (written without J) rather than levels. */
export function thingOf(d: DiagnosticResult, doc: SetupDocument | undefined, termNames: ReadonlySet<string>): ThingRef {
  const at: Position = { line: d.line - 1, character: d.column - 1 };
  for (const b of doc?.blocks ?? []) {
    if (!inside(at, b.range)) continue;
    const blockName = b.name?.text ?? '';
    for (const l of b.levels) {
      if (!inside(at, l.range)) continue;
      const name = `${blockName}.${l.name?.text ?? ''}`;
      return { kind: termNames.has(name) ? 'term' : 'level', name };
    }
    return { kind: b.kind, name: blockName };
  }
  return { kind: 'file', name: '' };
}

/** The diagnostics of `a` that `b` does not have, matched by code and thing, each match used once. */
export function unmatched(a: readonly (DiagnosticResult & ThingRef)[], b: readonly (DiagnosticResult & ThingRef)[]): (DiagnosticResult & ThingRef)[] {
  const key = (d: DiagnosticResult & ThingRef): string => `${d.code}\u0000${d.kind}\u0000${d.name}`;
  const left = new Map<string, number>();
  for (const d of b) left.set(key(d), (left.get(key(d)) ?? 0) + 1);
  return a.filter((d) => {
    const n = left.get(key(d)) ?? 0;
    if (n > 0) left.set(key(d), n - 1);
    return n === 0;
  });
}

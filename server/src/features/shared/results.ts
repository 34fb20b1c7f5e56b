/** Lookups from the model to the evaluation result (by species and level name). */
import type { EvaluationResult, FieldPointResult, LevelResult, TermResult } from '../../eval/resultTypes';

const levelIndex = new WeakMap<Pick<EvaluationResult, 'levels'>, Map<string, LevelResult>>();

function key(species: string, level: string): string {
  return `${species}\u0000${level}`;
}

export function levelResult(result: Pick<EvaluationResult, 'levels'> | undefined, species: string, level: string): LevelResult | undefined {
  if (!result) return undefined;
  let index = levelIndex.get(result);
  if (!index) {
    index = new Map(result.levels.map((l) => [key(l.species, l.level), l]));
    levelIndex.set(result, index);
  }
  return index.get(key(species, level));
}

/** What a sublevel table needs of one level (or whole term) at one field. */
export type SublevelsAtField = Pick<FieldPointResult, 'source' | 'field_T' | 'exact' | 'regime'> & { linear?: FieldPointResult['linear'] };

/** A level's (or whole term's) sublevels at one working field (a `field` block or a magnet). */
export function levelAtField(level: LevelResult | TermResult, source: { kind: 'field' | 'magnet'; name: string }): SublevelsAtField | undefined {
  const points: SublevelsAtField[] = level.at_fields;
  return points.find((f) => f.source.kind === source.kind && f.source.name === source.name);
}

const termIndex = new WeakMap<EvaluationResult, Map<string, TermResult>>();

/** The fine-structure result of a level written as a whole term (no J, with zeta). */
export function termResult(result: EvaluationResult | undefined, species: string, level: string): TermResult | undefined {
  if (!result) return undefined;
  let index = termIndex.get(result);
  if (!index) {
    index = new Map((result.terms ?? []).map((t) => [key(t.species, t.level), t]));
    termIndex.set(result, index);
  }
  return index.get(key(species, level));
}

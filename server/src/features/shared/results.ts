/** Lookups from the model to the evaluation result (by species and level name). */
import type { EvaluationResult, FieldPointResult, LevelResult } from '../../eval/resultTypes';

const levelIndex = new WeakMap<EvaluationResult, Map<string, LevelResult>>();

function key(species: string, level: string): string {
  return `${species}\u0000${level}`;
}

export function levelResult(result: EvaluationResult | undefined, species: string, level: string): LevelResult | undefined {
  if (!result) return undefined;
  let index = levelIndex.get(result);
  if (!index) {
    index = new Map(result.levels.map((l) => [key(l.species, l.level), l]));
    levelIndex.set(result, index);
  }
  return index.get(key(species, level));
}

/** A level's sublevels at one working field (a `field` block or a magnet). */
export function levelAtField(level: LevelResult, source: { kind: 'field' | 'magnet'; name: string }): FieldPointResult | undefined {
  return level.at_fields.find((f) => f.source.kind === source.kind && f.source.name === source.name);
}

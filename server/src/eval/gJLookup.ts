/** The g_J each evaluated level uses (measured or Landé), looked up from the model's level. */
import type { LevelModel } from '../model/types';
import type { LevelResult } from './resultTypes';

export type GJLookup = (level: LevelModel) => number | undefined;

export function gJLookup(levels: readonly LevelResult[]): GJLookup {
  const byName = new Map(levels.map((l) => [`${l.species}.${l.level}`, l.g_J.used]));
  return (l) => byName.get(`${l.species.name}.${l.name}`);
}

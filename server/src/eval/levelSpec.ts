/** The engine's description of a level, built from the model with the g-factors actually used. */
import type { HyperfineLevelSpec } from '../physics/engine';
import type { LevelModel } from '../model/types';

/**
 * A J level with its nucleus. Hyperfine constants that cannot act are left out (the model has
 * already said so).
 */
export function hyperfineSpec(level: LevelModel, gJ: number): HyperfineLevelSpec | undefined {
  const twoJ = level.term?.twoJ;
  if (!level.valid || twoJ === null || twoJ === undefined) return undefined;
  // Without hyperfine constants the nucleus is a spectator: leave it out, so the level is its J sublevels.
  const hasHyperfine = level.A !== undefined || level.B !== undefined || level.C !== undefined;
  const twoI = hasHyperfine ? level.species.twoI.value : 0;
  const spec: HyperfineLevelSpec = {
    kind: 'hyperfine',
    twoJ,
    twoI,
    gJ,
    gI: twoI > 0 ? level.species.gI.value : 0,
    A: twoI > 0 ? level.A?.value ?? 0 : 0,
  };
  if (twoI >= 2 && twoJ >= 2 && level.B) spec.B = level.B.value;
  if (twoI >= 3 && twoJ >= 3 && level.C) spec.C = level.C.value;
  return spec;
}

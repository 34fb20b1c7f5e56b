/** The engine's description of a level, built from the model with the g-factors actually used. */
import { ELECTRON_GS } from '../physics/constants';
import type { FineTermSpec, HyperfineLevelSpec, LevelSpec } from '../physics/engine';
import { orbitalGFactor } from '../physics/gFactors';
import type { LevelModel, SettingsModel } from '../model/types';

/**
 * A J level with its nucleus. Hyperfine constants that cannot act are left out (the model has
 * already said so).
 */
export function hyperfineSpec(level: LevelModel, gJ: number): HyperfineLevelSpec | undefined {
  const twoJ = level.term?.twoJ;
  if (!level.valid || twoJ === null || twoJ === undefined) return undefined;
  // The nucleus stays even without hyperfine constants: its g_I I_z term splits the level (J = 0 odd isotopes).
  const twoI = level.species.twoI.value;
  const spec: HyperfineLevelSpec = {
    kind: 'hyperfine',
    twoJ,
    twoI,
    gJ,
    gI: twoI > 0 ? level.species.gI.value : 0,
    // A cannot act at J = 0 (the model says so): leave it out like B and C below.
    A: twoI > 0 && twoJ > 0 ? level.A?.value ?? 0 : 0,
  };
  if (twoI >= 2 && twoJ >= 2 && level.B) spec.B = level.B.value;
  if (twoI >= 3 && twoJ >= 3 && level.C) spec.C = level.C.value;
  return spec;
}

/** A whole LS term with its spin–orbit constant ζ: the engine's fine-structure mode. */
export function fineSpec(level: LevelModel, settings: SettingsModel): FineTermSpec | undefined {
  const term = level.term;
  if (level.kind !== 'term' || !level.valid || !term || !level.zeta) return undefined;
  return {
    kind: 'fine',
    twoS: term.twoS,
    L: term.L,
    zeta: level.zeta.value,
    gS: settings.gS === 2 ? 2 : ELECTRON_GS,
    gL: settings.reducedMass && level.species.massKg ? orbitalGFactor(level.species.massKg.value) : 1,
  };
}

/** The engine spec for any usable level: a J level (with the g_J in use) or a term. */
export function engineSpec(level: LevelModel, gJ: number | undefined, settings: SettingsModel): LevelSpec | undefined {
  if (level.kind === 'term') return fineSpec(level, settings);
  return gJ !== undefined ? hyperfineSpec(level, gJ) : undefined;
}

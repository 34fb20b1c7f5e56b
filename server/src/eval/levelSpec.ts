/** The engine's description of a level, built from the model with the g-factors actually used. */
import { ELECTRON_GS } from '../physics/constants';
import type { FineTermSpec, HyperfineLevelSpec, LevelSpec, WholeTermSpec } from '../physics/engine';
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

/** g_S and g_L as the settings ask (CODATA |g_e| or 2; g_L with the reduced-mass correction or 1). */
function electronGFactors(level: LevelModel, settings: SettingsModel): { gS: number; gL: number } {
  return {
    gS: settings.gS === 2 ? 2 : ELECTRON_GS,
    gL: settings.reducedMass && level.species.massKg ? orbitalGFactor(level.species.massKg.value) : 1,
  };
}

/** A whole LS term with its spin–orbit constant ζ and no hyperfine data: the engine's fine-structure mode. */
export function fineSpec(level: LevelModel, settings: SettingsModel): FineTermSpec | undefined {
  const term = level.term;
  if (level.kind !== 'term' || !level.valid || !term || !level.zeta) return undefined;
  return { kind: 'fine', twoS: term.twoS, L: term.L, zeta: level.zeta.value, ...electronGFactors(level, settings) };
}

/**
 * A whole term given with J-level hyperfine constants (A_J, B_J) or J-level energies (E_J): the
 * whole-term mode (also with ζ alone when ⟨r²⟩ asks for the diamagnetic term). Without hyperfine
 * constants the nucleus is left out, as in the fine mode.
 */
export function wholeTermSpec(level: LevelModel, settings: SettingsModel): WholeTermSpec | undefined {
  const term = level.term;
  if (level.kind !== 'term' || !level.valid || !term) return undefined;
  const twoI = level.species.twoI.value;
  const hyperfine = twoI > 0 && (level.levelA !== undefined || level.levelB !== undefined);
  // ⟨r²⟩ needs the whole-term mode (the fine mode has no diamagnetic term).
  if (!hyperfine && !level.levelEnergies && !level.r2) return undefined;
  const fine = level.levelEnergies
    ? { levelEnergies: level.levelEnergies.map((e) => ({ twoJ: e.twoJ, energyHz: e.value })) }
    : { zeta: level.zeta?.value ?? 0 };
  return {
    kind: 'term',
    twoS: term.twoS,
    L: term.L,
    twoI: hyperfine ? twoI : 0,
    gI: hyperfine ? level.species.gI.value : 0,
    ...electronGFactors(level, settings),
    ...fine,
    ...(hyperfine && level.levelA ? { levelA: level.levelA.map((a) => ({ twoJ: a.twoJ, A: a.value })) } : {}),
    ...(hyperfine && level.levelB ? { levelB: level.levelB.map((b) => ({ twoJ: b.twoJ, B: b.value })) } : {}),
    ...(level.r2 ? { r2M2: level.r2.value } : {}),
  };
}

/** The engine spec of a whole term: the whole-term mode when it has J-level data, else the fine mode. */
export function termSpec(level: LevelModel, settings: SettingsModel): WholeTermSpec | FineTermSpec | undefined {
  return wholeTermSpec(level, settings) ?? fineSpec(level, settings);
}

/** The engine spec for any usable level: a J level (with the g_J in use) or a term. */
export function engineSpec(level: LevelModel, gJ: number | undefined, settings: SettingsModel): LevelSpec | undefined {
  if (level.kind === 'term') return termSpec(level, settings);
  return gJ !== undefined ? hyperfineSpec(level, gJ) : undefined;
}

/**
 * Level specs for the transitions tests, built from the built-in species table (each value
 * carries its published source there) or from exact LS-coupling Landé factors.
 */
import type { HyperfineLevelSpec } from '../../server/src/physics/engine';
import { landeGJ } from '../../server/src/physics/gFactors';
import { findBuiltinLevel, findSpecies } from '../../server/src/physics/species';

/** A hyperfine spec of a built-in level (A, B, C, g_J from the level, I and g_I from the species). */
export function builtinSpec(speciesId: string, key: string): HyperfineLevelSpec {
  const s = findSpecies(speciesId);
  const l = s ? findBuiltinLevel(s, key) : undefined;
  if (!s || !l || !l.A || !l.gJ || !s.gI) throw new Error(`${speciesId} ${key} is missing data`);
  return {
    kind: 'hyperfine',
    twoJ: Number(l.designation.match(/(\d+)\/2$/)?.[1] ?? NaN),
    twoI: s.twoI.value,
    gJ: l.gJ.value,
    gI: s.gI.value,
    A: l.A.value,
    B: l.B?.value ?? 0,
    C: l.C?.value ?? 0,
  };
}

/** Level energy above the ground level, Hz (species table). */
export function builtinEnergyHz(speciesId: string, key: string): number {
  const s = findSpecies(speciesId);
  const e = s ? findBuiltinLevel(s, key)?.energyHz?.value : undefined;
  if (e === undefined) throw new Error(`${speciesId} ${key} has no energy`);
  return e;
}

/** A level without nucleus or hyperfine structure, g_J from LS coupling with g_S = 2, g_L = 1 exactly. */
export function bareLevel(twoS: number, L: number, twoJ: number): HyperfineLevelSpec {
  return { kind: 'hyperfine', twoJ, twoI: 0, gJ: landeGJ(twoS, L, twoJ, { gS: 2, gL: 1 }), gI: 0, A: 0 };
}

export const TESLA_PER_GAUSS = 1e-4;

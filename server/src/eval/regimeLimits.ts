/**
 * The two regime limits of a level at a field (`linear_limit_T`, `strong_limit_T`), searched when
 * first read (eval/lazyFields.ts). The verdict needs only part of the search (physics/engine/regime.ts);
 * the limits were getters, which the worker's packing read, so it ran every search of a large
 * file for the editor that reads a few (a hover, a regime note). Now unread limits travel as a
 * recipe (the level's engine spec and the field, one object both limits share) and are searched
 * where they are read. In the process that judged the regime the search reuses that judgement
 * (same model, same numbers); elsewhere the first limit read judges it once for both.
 */
import { regime, type LevelSpec, type RegimeResult } from '../physics/engine';
import { defineLazyField } from './lazyFields';
import type { RegimeResultJson } from './resultTypes';

/** Where a level's regime is judged: its engine spec and the field. One object for both limits, so it is searched once. */
export interface RegimePoint {
  spec: LevelSpec;
  fieldT: number;
}

export interface RegimeLimitRecipe {
  kind: 'linear-limit' | 'strong-limit';
  /** Shared by the two recipes of a level at a field (and still shared after the worker's packing: service/packedValue.ts). */
  at: RegimePoint;
}

/** Regimes judged or searched in this process, by point: both limits of a point come from one judgement. */
const judged = new WeakMap<RegimePoint, RegimeResult>();

/** Puts both limits on `json` in place (its keys keep their order), each searched when first read. */
export function defineRegimeLimits(json: RegimeResultJson, r: RegimeResult, spec: LevelSpec, fieldT: number): void {
  const at: RegimePoint = { spec, fieldT };
  judged.set(at, r);
  for (const kind of ['linear-limit', 'strong-limit'] as const) {
    defineLazyField(json, kind === 'linear-limit' ? 'linear_limit_T' : 'strong_limit_T', { kind, at }, buildRegimeLimit);
  }
}

/** The limit a recipe stands for, in tesla (null when there is none). */
export function buildRegimeLimit(recipe: RegimeLimitRecipe): number | null {
  let r = judged.get(recipe.at);
  if (!r) {
    r = regime(recipe.at.spec, recipe.at.fieldT);
    judged.set(recipe.at, r);
  }
  const t = recipe.kind === 'linear-limit' ? r.linearLimitT : r.strongLimitT;
  return Number.isFinite(t) ? t : null;
}

/**
 * The two regime limits of a level at a field (`linear_limit_T`, `strong_limit_T`), searched when
 * first read (eval/lazyFields.ts). The verdict needs only part of the search (physics/engine/regime.ts);
 * the limits were getters, which the worker's packing read, so it ran every search of a large
 * file for the editor that reads a few (a hover, a regime note). Now unread limits travel as a
 * recipe (the level's engine spec and the field) and are searched where they are read. In the
 * process that judged the regime the search reuses that judgement (same model, same numbers).
 */
import { regime, type LevelSpec, type RegimeResult } from '../physics/engine';
import { defineLazyField } from './lazyFields';
import type { RegimeResultJson } from './resultTypes';

export interface RegimeLimitRecipe {
  kind: 'linear-limit' | 'strong-limit';
  spec: LevelSpec;
  fieldT: number;
}

/** The regimes judged in this process, by recipe: their limit searches share the judgement's model and memo. */
const judged = new WeakMap<RegimeLimitRecipe, RegimeResult>();

/** Puts both limits on `json` in place (its keys keep their order), each searched when first read. */
export function defineRegimeLimits(json: RegimeResultJson, r: RegimeResult, spec: LevelSpec, fieldT: number): void {
  for (const kind of ['linear-limit', 'strong-limit'] as const) {
    const recipe: RegimeLimitRecipe = { kind, spec, fieldT };
    judged.set(recipe, r);
    defineLazyField(json, kind === 'linear-limit' ? 'linear_limit_T' : 'strong_limit_T', recipe, buildRegimeLimit);
  }
}

/** The limit a recipe stands for, in tesla (null when there is none). */
export function buildRegimeLimit(recipe: RegimeLimitRecipe): number | null {
  const r = judged.get(recipe) ?? regime(recipe.spec, recipe.fieldT);
  const t = recipe.kind === 'linear-limit' ? r.linearLimitT : r.strongLimitT;
  return Number.isFinite(t) ? t : null;
}

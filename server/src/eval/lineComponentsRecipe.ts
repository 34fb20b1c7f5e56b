/**
 * A J-level line's components at one working field (`components` of a line's field point), built
 * when first read, like a level's tables (eval/levelTables.ts). The evaluation checks every line
 * at every field (selection rules, the sum rule over the exact eigenvectors) but a large file's
 * editor reads few components: building, holding and handing over all of them was most of the
 * line work and more than half of what the worker packed. The recipe is plain data (both levels'
 * engine specs, the field, the level energies), so unread components travel to the editor as it.
 */
import type { HyperfineLevelSpec } from '../physics/engine';
import { electricDipoleLine } from '../physics/transitions';
import { solvedAtField } from './exactAtField';
import { defineLazyField } from './lazyFields';
import { lineComponentRows } from './lineComponents';
import type { LineComponentResult } from './resultTypes';

export interface ComponentsRecipe {
  kind: 'components';
  lower: HyperfineLevelSpec;
  upper: HyperfineLevelSpec;
  fieldT: number;
  /** Both level energies (Hz) when the line has a centre, else empty. */
  energies: { lowerEnergyHz?: number; upperEnergyHz?: number };
}

/** Puts `components` on the point (after the keys it has), built when first read. */
export function defineLineComponents(point: object, recipe: ComponentsRecipe): void {
  defineLazyField(point, 'components', recipe, buildLineComponents);
}

/** The rows the recipe stands for, as `electricDipoleLine` gives them (the levels' solves reused where remembered). */
export function buildLineComponents(r: ComponentsRecipe): LineComponentResult[] {
  return lineComponentRows(electricDipoleLine(r.lower, r.upper, r.fieldT, { ...r.energies, solve: solvedAtField }).components);
}

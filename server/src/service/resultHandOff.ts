/**
 * How the evaluation worker hands its result to the editor's thread: packed (service/packedValue.ts)
 * instead of a structured clone. The sublevel tables of levels and the components of lines, most
 * of the result, are unpacked when first read, and tables, line components and regime limits still
 * unread in the worker travel as their recipes (eval/levelTables.ts, eval/lineComponentsRecipe.ts,
 * eval/regimeLimits.ts). The problems travel as they are.
 */
import type { EvaluationResult } from '../eval/resultTypes';
import { defineLazyField } from '../eval/lazyFields';
import { buildLevelTable, type ExactRecipe, type LinearRecipe } from '../eval/levelTables';
import { buildLineComponents, type ComponentsRecipe } from '../eval/lineComponentsRecipe';
import { buildRegimeLimit, type RegimeLimitRecipe } from '../eval/regimeLimits';
import { packValue, unpackValue, type PackedValue } from './packedValue';

/** Arrays under these keys are unpacked when first read. */
const DEFERRED_KEYS: ReadonlySet<string> = new Set(['linear', 'exact', 'components']);

/** The packed result, or undefined when it holds something that cannot be packed (then it goes as it is). */
export function packResult(result: EvaluationResult): PackedValue | undefined {
  try {
    return packValue(result, DEFERRED_KEYS);
  } catch {
    return undefined;
  }
}

export function unpackResult(packed: PackedValue): EvaluationResult {
  return unpackValue(packed, (o, key, recipe) => defineLazyField(o, key, recipe as Recipe, buildFromRecipe)) as EvaluationResult;
}

type Recipe = LinearRecipe | ExactRecipe | ComponentsRecipe | RegimeLimitRecipe;

/** Every kind of recipe the evaluation leaves unread (eval/levelTables.ts, lineComponentsRecipe.ts, regimeLimits.ts). */
function buildFromRecipe(r: Recipe): unknown {
  if (r.kind === 'components') return buildLineComponents(r);
  if (r.kind === 'linear' || r.kind === 'exact') return buildLevelTable(r);
  return buildRegimeLimit(r);
}

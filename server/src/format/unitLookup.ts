/**
 * Unit names looked up in the generated table (unitTable.ts): SI size, dimensions, base unit and
 * prefix, exactly as mathjs gives them, without loading mathjs (docs/speed.md).
 */
import { BASE_DIMENSIONS, DIMENSION_VECTORS, OFFSET_SCALES, UNIT_TABLE } from './unitTable';

export const BASE_DIMENSION_COUNT = BASE_DIMENSIONS.length;

export interface UnitEntry {
  /** The SI value of one of the unit (for an offset unit, of one degree above its zero). */
  size: number;
  dims: readonly number[];
  /** mathjs' base unit and prefix names, e.g. `s` and `G` for `Gs`. */
  unitName: string;
  prefixName: string;
}

/** The table's entry for a canonical name (unitGrammar.ts), or undefined when it is not a unit. */
export function unitEntry(canonical: string): UnitEntry | undefined {
  if (!Object.prototype.hasOwnProperty.call(UNIT_TABLE, canonical)) return undefined;
  const [size, dims, unitName, prefixName] = UNIT_TABLE[canonical]!;
  return { size, dims: DIMENSION_VECTORS[dims]!, unitName, prefixName };
}

/**
 * `value` on the scale `from` expressed on the scale `to` (degC and K), with mathjs' arithmetic
 * step for step (Unit.to, _normalize, _denormalize), so results match it bit for bit.
 */
export function convertScale(value: number, from: string, to: string): number {
  const a = OFFSET_SCALES[from];
  const b = OFFSET_SCALES[to];
  if (!a || !b) throw new Error(`internal unit table error: no offset scale ${a ? to : from}`);
  const [unitA, prefixA, offsetA] = a;
  const [unitB, prefixB, offsetB] = b;
  let si = value * Math.pow(unitA * prefixA, 1);
  if (offsetA !== offsetB) si = si + (unitA * offsetA - unitB * offsetB);
  return si / Math.pow(unitB * prefixB, 1);
}

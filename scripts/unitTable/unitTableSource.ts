/**
 * Generates server/src/format/unitTable.ts from mathjs (the pinned dependency, the full
 * `create(all)` instance) with Sublevel's own changes applied: for every name the unit grammar can
 * produce, the SI size, dimensions, base unit and prefix that mathjs gives it. The CLI and the
 * server then read units without loading mathjs at all (docs/speed.md). Deterministic: the same
 * mathjs and definitions give the same text, which tests/format/unitTable.test.ts compares with the
 * committed file; `node scripts/unitTable/write.mjs` (also run by esbuild.mjs) rewrites it.
 */
import { all, create } from 'mathjs';
import { UNIT_ADDITIONS, UNIT_OVERRIDES } from '../../server/src/format/unitDefinitions';
import { canonicalUnitNames, isOffsetUnit } from '../../server/src/format/unitGrammar';

export const UNIT_TABLE_FILE = 'server/src/format/unitTable.ts';

interface MathUnitPart {
  unit: { name: string; value: number; offset: number; dimensions: number[] };
  prefix: { name: string; value: number };
}

/** The full mathjs instance with Sublevel's changes to its unit table. */
export function sublevelMath(): ReturnType<typeof create> {
  const math = create(all);
  math.createUnit(UNIT_OVERRIDES, { override: true });
  math.createUnit(UNIT_ADDITIONS);
  return math;
}

/** The text of unitTable.ts. */
export function unitTableSource(): string {
  const math = sublevelMath();
  const dimensionRows: string[] = [];
  const dimensionIndex = (dims: number[]): number => {
    const key = `[${dims.join(', ')}]`;
    let k = dimensionRows.indexOf(key);
    if (k < 0) k = dimensionRows.push(key) - 1;
    return k;
  };
  const rows: string[] = [];
  const conversions: string[] = [];
  const partOf = (name: string): MathUnitPart => (math.unit(name) as unknown as { units: MathUnitPart[] }).units[0]!;
  for (const name of canonicalUnitNames()) {
    if (!math.Unit.isValuelessUnit(name)) continue;
    const part = partOf(name);
    const size = math.unit(1, name).value as unknown as number;
    rows.push(`  ${JSON.stringify(name)}: [${size}, ${dimensionIndex(part.unit.dimensions)}, ${JSON.stringify(part.unit.name)}, ${JSON.stringify(part.prefix.name)}],`);
    if (isOffsetUnit(name) || name === 'K') {
      conversions.push(`  ${JSON.stringify(name)}: [${part.unit.value}, ${part.prefix.value}, ${part.unit.offset}],`);
    }
  }
  const version = (math as unknown as { version: string }).version;
  return `/**
 * Generated from mathjs ${version} by scripts/unitTable/unitTableSource.ts; do not edit (esbuild.mjs
 * or \`node scripts/unitTable/write.mjs\` rewrites it, and tests/format/unitTable.test.ts fails
 * when it is out of date). Every name the unit grammar can produce that mathjs knows, with
 * Sublevel's changes (unitDefinitions.ts) applied.
 */

/** mathjs' base dimensions, in the order of every dimension vector below. */
export const BASE_DIMENSIONS: readonly string[] = ${JSON.stringify(math.Unit.BASE_DIMENSIONS)};

/** The distinct dimension vectors of the units below. */
export const DIMENSION_VECTORS: readonly (readonly number[])[] = [
${dimensionRows.map((r) => `  ${r},`).join('\n')}
];

/** Name → [SI size of one of it, index into DIMENSION_VECTORS, mathjs' base unit, prefix]. */
export const UNIT_TABLE: Readonly<Record<string, readonly [number, number, string, string]>> = {
${rows.join('\n')}
};

/** For conversions between offset scales and kelvin: name → [unit value, prefix value, offset]. */
export const OFFSET_SCALES: Readonly<Record<string, readonly [number, number, number]>> = {
${conversions.join('\n')}
};
`;
}

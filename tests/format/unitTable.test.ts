/**
 * The generated unit table (server/src/format/unitTable.ts) against the full mathjs instance it
 * was generated from (`create(all)` of mathjs 15.2.0, the pinned dependency, with Sublevel's
 * changes applied): every name the grammar can produce has the same verdict on whether it is a
 * unit, the same SI size, dimensions and prefix, and offset temperatures convert bit for bit as
 * before. The committed table must be what the generator writes today.
 */
import { readFileSync } from 'fs';
import path from 'path';
import { all, create } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { UNIT_TABLE_FILE, unitTableSource } from '../../scripts/unitTable/unitTableSource';
import { UNIT_ADDITIONS, UNIT_OVERRIDES } from '../../server/src/format/unitDefinitions';
import { canonicalUnitName, canonicalUnitNames } from '../../server/src/format/unitGrammar';
import { BASE_DIMENSION_COUNT, convertScale, unitEntry } from '../../server/src/format/unitLookup';
import { convertSI } from '../../server/src/format/units';
import { BASE_DIMENSIONS } from '../../server/src/format/unitTable';

/** The full instance, with the same changes to the unit table that the generator makes. */
const full = create(all);
full.createUnit(UNIT_OVERRIDES, { override: true });
full.createUnit(UNIT_ADDITIONS);

const SYMBOLS = ['m', 'g', 's', 'A', 'K', 'mol', 'Hz', 'N', 'Pa', 'J', 'W', 'C', 'V', 'T', 'G', 'eV', 'Wb', 'rad', 'ohm'];
const SHORT = ['', 'Q', 'R', 'Y', 'Z', 'E', 'P', 'T', 'G', 'M', 'k', 'h', 'da', 'd', 'c', 'm', 'u', 'n', 'p', 'f', 'a', 'z', 'y', 'r', 'q'];
const LONG_NAMES = ['meter', 'second', 'gram', 'kelvin', 'hertz', 'tesla', 'gauss', 'joule', 'electronvolt', 'volt', 'ampere', 'newton', 'watt'];
const LONG = ['', 'exa', 'peta', 'tera', 'giga', 'mega', 'kilo', 'hecto', 'deca', 'deci', 'centi', 'milli', 'micro', 'nano', 'pico', 'femto', 'atto'];
const SPECIAL = ['u', 'Da', 'muN', 'muB', 'percent', 'degC', 'cm', 'um', 'kg', 'xyz', 'Gs', 'mgauss', 'µm', '°C', 'a0', 'bohr', 'metre', 'Ω'];

const WRITTEN = [...SHORT.flatMap((p) => SYMBOLS.map((s) => p + s)), ...LONG.flatMap((p) => LONG_NAMES.map((n) => p + n)), ...SPECIAL];

describe('generated unit table', () => {
  it('is what the generator writes from today’s mathjs and definitions', () => {
    const committed = readFileSync(path.resolve(__dirname, '../..', UNIT_TABLE_FILE), 'utf8');
    expect(committed === unitTableSource(), 'run `node scripts/unitTable/write.mjs`').toBe(true);
  });

  it(`agrees with create(all) on all ${WRITTEN.length} written names and every canonical name`, () => {
    let units = 0;
    const names = [...new Set([...WRITTEN, ...canonicalUnitNames()])];
    for (const written of names) {
      const canonical = canonicalUnitName(written);
      const known = canonical !== undefined && full.Unit.isValuelessUnit(canonical);
      const entry = canonical === undefined ? undefined : unitEntry(canonical);
      expect(entry !== undefined, written).toBe(known);
      if (!entry) continue;
      units++;
      const ref = full.unit(1, canonical!);
      expect(entry.size, written).toBe(ref.value);
      expect([...entry.dims], written).toEqual([...ref.dimensions]);
      const parts = full.unit(canonical!).units[0]!;
      expect([entry.unitName, entry.prefixName], written).toEqual([parts.unit.name, (parts.prefix as unknown as { name: string }).name]);
    }
    // Nearly every name is a unit; `xyz` and the like are the ones that are not.
    expect(units).toBeGreaterThan(700);
  });

  it('has the same base dimensions', () => {
    expect(BASE_DIMENSIONS).toEqual(full.Unit.BASE_DIMENSIONS);
    expect(BASE_DIMENSION_COUNT).toBe(9);
  });

  it('converts offset temperatures exactly as mathjs does', () => {
    for (const c of [-273.15, -40, 0, 21.5, 100, 1234.5678, 1e-300, 0.1 + 0.2]) {
      expect(convertScale(c, 'degC', 'K')).toBe(full.unit(c, 'degC').toNumber('K'));
      expect(convertScale(c + 273.15, 'K', 'degC')).toBe(full.unit(c + 273.15, 'K').toNumber('degC'));
    }
    // 20 °C = 293.15 K by the definition of the Celsius scale (SI brochure).
    expect(convertSI(293.15, 'temperature', 'degC')).toBeCloseTo(20, 12);
  });

  it('gives SI sizes that match the definitions (SI brochure; CGS gauss)', () => {
    expect(unitEntry('mT')!.size).toBeCloseTo(1e-3, 18);
    expect(unitEntry('G')!.size).toBe(1e-4);
    expect(unitEntry('eV')!.size).toBe(1.602176634e-19); // exact elementary charge × 1 V (SI 2019)
    expect(unitEntry('xyz')).toBeUndefined();
  });
});

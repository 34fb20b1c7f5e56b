/**
 * The units-only Unit class (plain-number arithmetic, no typed-functions) against the full
 * mathjs instance it replaces (`create(all)` of mathjs 15.2.0, the pinned dependency): every
 * name the grammar can produce has the same SI size, the same dimensions and the same verdict on
 * whether it is a unit, and the readings of whole quantities are unchanged bit for bit.
 */
import { all, create } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { convertSI, UNIT_ADDITIONS, UNIT_OVERRIDES } from '../../server/src/format/units';
import { UnitMath } from '../../server/src/format/unitMath';

/** The full instance, with the same changes to the unit table that units.ts makes to the Unit class alone. */
const full = create(all);
full.createUnit(UNIT_OVERRIDES, { override: true });
full.createUnit(UNIT_ADDITIONS);

const SYMBOLS = ['m', 'g', 's', 'A', 'K', 'mol', 'Hz', 'N', 'Pa', 'J', 'W', 'C', 'V', 'T', 'G', 'eV', 'Wb', 'rad', 'ohm'];
const SHORT = ['', 'Q', 'R', 'Y', 'Z', 'E', 'P', 'T', 'G', 'M', 'k', 'h', 'da', 'd', 'c', 'm', 'u', 'n', 'p', 'f', 'a', 'z', 'y', 'r', 'q'];
const LONG_NAMES = ['meter', 'second', 'gram', 'kelvin', 'hertz', 'tesla', 'gauss', 'joule', 'electronvolt', 'volt', 'ampere', 'newton', 'watt'];
const LONG = ['', 'exa', 'peta', 'tera', 'giga', 'mega', 'kilo', 'hecto', 'deca', 'deci', 'centi', 'milli', 'micro', 'nano', 'pico', 'femto', 'atto'];
const SPECIAL = ['u', 'Da', 'muN', 'muB', 'percent', 'degC', 'cm', 'um', 'kg', 'xyz', 'Gs', 'mgauss'];

const NAMES = [...SHORT.flatMap((p) => SYMBOLS.map((s) => p + s)), ...LONG.flatMap((p) => LONG_NAMES.map((n) => p + n)), ...SPECIAL];

describe('units-only Unit class', () => {
  it(`agrees with create(all) on all ${NAMES.length} names the grammar can produce`, () => {
    let units = 0;
    for (const name of NAMES) {
      const known = full.Unit.isValuelessUnit(name);
      expect(UnitMath.isValuelessUnit(name), name).toBe(known);
      if (!known) continue;
      units++;
      const a = new UnitMath(1, name);
      const b = full.unit(1, name);
      expect(a.value, name).toBe(b.value);
      expect([...a.dimensions], name).toEqual([...b.dimensions]);
      const parts = new UnitMath(null, name).units[0]!;
      const ref = full.unit(name).units[0]!;
      expect([parts.unit.name, (parts.prefix as unknown as { name: string }).name], name).toEqual([ref.unit.name, (ref.prefix as unknown as { name: string }).name]);
    }
    // Nearly every name is a unit; `xyz` and the like are the ones that are not.
    expect(units).toBeGreaterThan(500);
  });

  it('has the same base dimensions', () => {
    expect(UnitMath.BASE_DIMENSIONS).toEqual(full.Unit.BASE_DIMENSIONS);
  });

  it('converts offset temperatures exactly as before', () => {
    for (const c of [-273.15, -40, 0, 21.5, 100, 1234.5678]) {
      expect(new UnitMath(c, 'degC').toNumber('K')).toBe(full.unit(c, 'degC').toNumber('K'));
      expect(new UnitMath(c + 273.15, 'K').toNumber('degC')).toBe(full.unit(c + 273.15, 'K').toNumber('degC'));
    }
    // 20 °C = 293.15 K by the definition of the Celsius scale (SI brochure).
    expect(convertSI(293.15, 'temperature', 'degC')).toBeCloseTo(20, 12);
  });
});

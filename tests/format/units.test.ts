/**
 * The unit reader against published values. Sources are named beside each check; the
 * SciPy figures were read from scipy.constants 1.17.1 (CODATA 2022) with
 * `python3 -c "import scipy.constants as C; print(C.physical_constants[...])"`.
 */
import { describe, expect, it } from 'vitest';
import type { ValuePart } from '../../server/src/format/ast';
import { parseSetup } from '../../server/src/format/parser';
import { formatRange } from '../../server/src/format/positions';
import { convertSI, dimensionExamples, readQuantity, unitNames, type Dimension } from '../../server/src/format/units';

/** The single part of `value`, parsed as a beam's `source` value. */
function part(value: string): ValuePart {
  const doc = parseSetup(`beam\n  source = ${value}`);
  const p = doc.blocks[0]?.settings[0]?.groups[0]?.[0];
  if (!p) throw new Error(`no part in ${value}`);
  return p;
}

function si(value: string, d: Dimension): number {
  const r = readQuantity(part(value), d);
  if (r.problem) throw new Error(r.problem.message);
  return r.si!;
}

/** |a/b − 1| ≤ tol */
function expectRel(actual: number, expected: number, tol: number): void {
  expect(Math.abs(actual / expected - 1)).toBeLessThanOrEqual(tol);
}

// Exact SI defining constants (SI Brochure, 9th ed., 2019).
const C_EXACT = 299792458;
const H_EXACT = 6.62607015e-34;
const E_EXACT = 1.602176634e-19;

describe('readQuantity: values', () => {
  it('gauss: 1 G = 1e-4 T; mG, kG; G is not giga on its own (SI Brochure 8th ed. Table 9, from memory)', () => {
    expectRel(si('1 G', 'flux-density'), 1e-4, 1e-15);
    expectRel(si('3.2G', 'flux-density'), 3.2e-4, 1e-15);
    expectRel(si('250 mG', 'flux-density'), 2.5e-5, 1e-15);
    expectRel(si('2 kG', 'flux-density'), 0.2, 1e-15);
    expectRel(si('1 gauss', 'flux-density'), 1e-4, 1e-15);
    expectRel(si('0.45 T', 'flux-density'), 0.45, 1e-15);
    expectRel(si('12 mT', 'flux-density'), 0.012, 1e-15);
    // with a prefix role G is giga: 1 GHz = 1e9 Hz (SI prefix)
    expectRel(si('1 GHz', 'frequency-like'), 1e9, 1e-15);
  });

  it('gradients: 180 T/m; 18 G/cm = 0.18 T/m (unit definitions)', () => {
    expectRel(si('180 T/m', 'gradient'), 180, 1e-15);
    expectRel(si('18 G/cm', 'gradient'), 0.18, 1e-14);
    expectRel(si('5 mT/mm', 'gradient'), 5, 1e-14);
  });

  it('wave numbers convert with f = c·σ, c exact: 14.9 cm^-1 = 446 690 762 420 Hz', () => {
    // scipy 1.17.1: physical_constants['inverse meter-hertz relationship'] = 299792458.0 Hz (exact)
    const expected = 14.9 * 100 * C_EXACT; // = 4.4669076242e11 (scipy: 446690762420.0)
    expectRel(si('14.9 cm^-1', 'frequency-like'), 446690762420, 1e-15);
    expectRel(si('14.9 1/cm', 'frequency-like'), expected, 1e-15);
    expectRel(si('14.9 cm-1', 'frequency-like'), expected, 1e-15);
    expectRel(si('14.9 cm⁻¹', 'frequency-like'), expected, 1e-15);
    expectRel(si('1490 m^-1', 'frequency-like'), expected, 1e-15);
  });

  it('energies convert with f = E/h, e and h exact: 1 eV = 241 798 924 208 491.8 Hz', () => {
    // scipy 1.17.1: physical_constants['electron volt-hertz relationship'] = 241798924208491.8 Hz (exact)
    expectRel(si('1 eV', 'frequency-like'), 241798924208491.8, 1e-15);
    expectRel(si('1 eV', 'frequency-like'), E_EXACT / H_EXACT, 1e-15);
    expectRel(si('2 meV', 'frequency-like'), (2e-3 * E_EXACT) / H_EXACT, 1e-15);
    expectRel(si('1e-24 J', 'frequency-like'), 1e-24 / H_EXACT, 1e-15);
    expectRel(si('401.75 MHz', 'frequency-like'), 401.75e6, 1e-15);
  });

  it('atomic mass unit: 1 u = 1 Da = 1.660 539 068 92e-27 kg (CODATA 2022)', () => {
    // scipy 1.17.1: physical_constants['atomic mass constant'] = 1.66053906892e-27 kg
    expectRel(si('1 u', 'mass'), 1.66053906892e-27, 1e-15);
    expectRel(si('1 Da', 'mass'), 1.66053906892e-27, 1e-15);
    expectRel(si('86.909180531 u', 'mass'), 86.909180531 * 1.66053906892e-27, 1e-15);
    expectRel(si('3 g', 'mass'), 3e-3, 1e-15);
  });

  it('magnetons: 1 muN = 5.050 783 7393e-27 J/T, 1 muB = 9.274 010 0657e-24 J/T (CODATA 2022)', () => {
    // scipy 1.17.1: physical_constants['nuclear magneton'], ['Bohr magneton']
    expectRel(si('1 muN', 'moment'), 5.0507837393e-27, 1e-15);
    expectRel(si('1 μN', 'moment'), 5.0507837393e-27, 1e-15);
    expectRel(si('1 µN', 'moment'), 5.0507837393e-27, 1e-15);
    expectRel(si('-2 muB', 'moment'), -2 * 9.2740100657e-24, 1e-15);
    expectRel(si('1e-26 J/T', 'moment'), 1e-26, 1e-15);
  });

  it('temperatures: 720 K, 720K; 25 degC = 298.15 K (scipy.constants.zero_Celsius = 273.15)', () => {
    expect(si('720 K', 'temperature')).toBe(720);
    expect(si('720K', 'temperature')).toBe(720);
    expectRel(si('25 degC', 'temperature'), 298.15, 1e-15);
    expectRel(si('25 °C', 'temperature'), 298.15, 1e-15);
  });

  it('lengths, micrometre spellings, speeds and times', () => {
    expectRel(si('80 um', 'length'), 80e-6, 1e-15);
    expectRel(si('80um', 'length'), 80e-6, 1e-15);
    expectRel(si('80 µm', 'length'), 80e-6, 1e-15); // U+00B5 micro sign
    expectRel(si('80 μm', 'length'), 80e-6, 1e-15); // U+03BC Greek mu
    expectRel(si('8 cm', 'length'), 0.08, 1e-15);
    expectRel(si('1500 m/s', 'speed'), 1500, 1e-15);
    expectRel(si('1.2 km/s', 'speed'), 1200, 1e-15);
    expectRel(si('3 ms', 'time'), 3e-3, 1e-15);
  });

  it('dimensionless: a bare number, or % (8 % = 0.08)', () => {
    expectRel(si('8 %', 'dimensionless'), 0.08, 1e-15);
    expectRel(si('8%', 'dimensionless'), 0.08, 1e-15);
    expect(si('0.08', 'dimensionless')).toBe(0.08);
  });

  it('uncertainties are converted with the value: 0.35(2) T → 0.35 ± 0.02 T; 25.0(5) degC → ±0.5 K', () => {
    const r = readQuantity(part('0.35(2) T'), 'flux-density');
    expect(r.si).toBe(0.35);
    expect(r.siUncertainty).toBeCloseTo(0.02, 15);
    const g = readQuantity(part('3.20(5) G'), 'flux-density');
    expectRel(g.siUncertainty!, 5e-6, 1e-12);
    const t = readQuantity(part('25.0(5) degC'), 'temperature');
    expectRel(t.si!, 298.15, 1e-15);
    expect(t.siUncertainty).toBeCloseTo(0.5, 12);
    const w = readQuantity(part('1.000(3) cm^-1'), 'frequency-like');
    expectRel(w.siUncertainty!, 0.003 * 100 * C_EXACT, 1e-12);
  });
});

describe('readQuantity: problems in plain words', () => {
  function problem(value: string, d: Dimension): [string, string, string] {
    const r = readQuantity(part(value), d);
    expect(r.si).toBeUndefined();
    return [r.problem!.code, r.problem!.message, formatRange(r.problem!.range)];
  }

  it('a bare number where a unit is needed', () => {
    expect(problem('180', 'gradient')).toEqual(['unit-missing', 'gradient needs a unit such as T/m or G/cm.', '1:11-1:14']);
    expect(readQuantity(part('180'), 'gradient').problem?.data?.suggestions).toEqual(['180 T/m', '180 G/cm']);
  });

  it('the wrong dimension names what was expected and what was got', () => {
    expect(problem('180 T', 'gradient')).toEqual(['unit-wrong-dimension', 'gradient needs T/m or G/cm, got T.', '1:15-1:16']);
    expect(problem('3 m', 'flux-density')[1]).toBe('flux density needs T, mT or G, got m.');
    expect(problem('8 m', 'dimensionless')[0]).toBe('unit-wrong-dimension');
    expect(problem('3 degC', 'length')[0]).toBe('unit-wrong-dimension');
    const named = readQuantity(part('2 T'), 'length', 'drift');
    expect(named.problem?.message).toBe('drift needs m, cm, mm or um, got T.');
  });

  it('unknown unit names get "did you mean", with the range of the name', () => {
    expect(problem('401.75 Mhz', 'frequency-like')).toEqual(['unit-unknown', "unknown unit 'Mhz' — did you mean 'MHz'?", '1:18-1:21']);
    expect(readQuantity(part('401.75 Mhz'), 'frequency-like').problem?.data?.suggestions).toEqual(['MHz']);
    // glued: the unit part of the word is pointed at
    expect(problem('401.75Mhz', 'frequency-like')).toEqual(['unit-unknown', "unknown unit 'Mhz' — did you mean 'MHz'?", '1:17-1:20']);
    expect(problem('3 G/xm', 'gradient')[0]).toBe('unit-unknown');
    expect(problem('3 G/xm', 'gradient')[2]).toBe('1:15-1:17');
  });

  it('malformed units', () => {
    expect(problem('3 T//m', 'gradient')[0]).toBe('unit-malformed');
    expect(problem('3 cm^', 'frequency-like')[0]).toBe('unit-malformed');
    expect(problem('3 degC/m', 'gradient')[0]).toBe('unit-malformed');
  });

  it('a word where a quantity is needed', () => {
    expect(problem('oven', 'temperature')).toEqual([
      'unit-not-a-quantity',
      "temperature needs a number with a unit such as K or degC, got 'oven'.",
      '1:11-1:15',
    ]);
  });
});

describe('convertSI, dimensionExamples, unitNames', () => {
  it('converts SI values back for display', () => {
    expectRel(convertSI(0.18, 'gradient', 'G/cm')!, 18, 1e-14);
    expectRel(convertSI(1e-4, 'flux-density', 'G')!, 1, 1e-15);
    expectRel(convertSI(446690762420, 'frequency-like', 'cm^-1')!, 14.9, 1e-15);
    expectRel(convertSI(E_EXACT / H_EXACT, 'frequency-like', 'eV')!, 1, 1e-15);
    expectRel(convertSI(401.75e6, 'frequency-like', 'MHz')!, 401.75, 1e-15);
    expectRel(convertSI(298.15, 'temperature', 'degC')!, 25, 1e-13);
    expectRel(convertSI(0.08, 'dimensionless', '%')!, 8, 1e-15);
    expect(convertSI(0.08, 'dimensionless', '')).toBe(0.08);
    expect(convertSI(1, 'gradient', 'T')).toBeUndefined();
    expect(convertSI(1, 'gradient', 'Q/x')).toBeUndefined();
  });

  it('examples and completion names are all units the reader accepts', () => {
    const dims: Dimension[] = ['flux-density', 'gradient', 'length', 'temperature', 'speed', 'frequency-like', 'mass', 'moment', 'dimensionless', 'time'];
    for (const d of dims) {
      for (const u of dimensionExamples(d)) {
        const r = readQuantity(part(`2 ${u}`), d);
        expect(r.problem, `${u} as ${d}`).toBeUndefined();
      }
    }
    const names = unitNames();
    expect(names).toContain('G/cm');
    expect(names).toContain('muN');
    for (const u of names) expect(part(`1 ${u}`).kind, u).toBe('quantity');
  });
});

describe('readQuantity: areas for ⟨r²⟩', () => {
  it('a0^2, a₀², bohr^2 are the Bohr radius squared (CODATA 2022: a₀ = 5.291 772 105 44e-11 m); nm^2 and pm^2 too', () => {
    const a0 = 5.29177210544e-11;
    expectRel(si('27.1 a0^2', 'area'), 27.1 * a0 * a0, 1e-15);
    expectRel(si('27.1 a₀²', 'area'), 27.1 * a0 * a0, 1e-15);
    expectRel(si('27.1 bohr^2', 'area'), 27.1 * a0 * a0, 1e-15);
    expectRel(si('0.0759 nm^2', 'area'), 0.0759e-18, 1e-14);
    expectRel(si('7590 pm^2', 'area'), 7590e-24, 1e-14);
  });

  it('a length alone is not an area; a digit after any other name is still malformed', () => {
    expect(readQuantity(part('27 a0'), 'area').problem?.code).toBe('unit-wrong-dimension');
    expect(readQuantity(part('27 b0^2'), 'area').problem).toBeDefined();
  });
});

import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import * as K from '../../server/src/physics/constants';

interface CodataEntry {
  key: string;
  value: number;
  unit: string;
  uncertainty: number;
}
// tests/reference/codata.json is written by scripts/reference/codata.py from scipy.constants
// (SciPy 1.17 = CODATA 2022 adjustment).
const codata = JSON.parse(readFileSync(join(__dirname, '..', 'reference', 'codata.json'), 'utf8')) as {
  scipy_version: string;
  constants: Record<string, CodataEntry>;
};
const ref = codata.constants;

/** Relative difference. */
function rel(a: number, b: number): number {
  return Math.abs(a / b - 1);
}

describe('constants.ts vs scipy.constants (CODATA 2022, tests/reference/codata.json)', () => {
  it('reference file was made by SciPy 1.17 (CODATA 2022)', () => {
    expect(codata.scipy_version.startsWith('1.17')).toBe(true);
  });

  // Stored values: must agree to the last printed digit (double round-trip).
  const stored: [keyof typeof K, string][] = [
    ['PLANCK_H', 'PLANCK_H'],
    ['ELEMENTARY_CHARGE', 'ELEMENTARY_CHARGE'],
    ['BOLTZMANN_K', 'BOLTZMANN_K'],
    ['AVOGADRO', 'AVOGADRO'],
    ['SPEED_OF_LIGHT', 'SPEED_OF_LIGHT'],
    ['CAESIUM_HYPERFINE_HZ', 'CAESIUM_HYPERFINE_HZ'],
    ['BOHR_MAGNETON', 'BOHR_MAGNETON'],
    ['NUCLEAR_MAGNETON', 'NUCLEAR_MAGNETON'],
    ['ELECTRON_G', 'ELECTRON_G'],
    ['ELECTRON_MASS', 'ELECTRON_MASS'],
    ['PROTON_MASS', 'PROTON_MASS'],
    ['BOHR_RADIUS', 'BOHR_RADIUS'],
    ['ATOMIC_MASS_UNIT', 'ATOMIC_MASS_UNIT'],
    ['ELECTRON_MASS_U', 'ELECTRON_MASS_U'],
    ['ELECTRON_PROTON_MASS_RATIO', 'ELECTRON_PROTON_MASS_RATIO'],
    ['VACUUM_PERMEABILITY', 'VACUUM_PERMEABILITY'],
  ];
  for (const [ours, theirs] of stored) {
    it(`${ours} equals scipy "${ref[theirs].key}" exactly`, () => {
      expect(K[ours]).toBe(ref[theirs].value);
    });
  }

  it('HBAR = h/2π agrees with scipy "reduced Planck constant" to 1 ulp', () => {
    expect(rel(K.HBAR, ref.HBAR.value)).toBeLessThan(3e-16);
  });

  it('ELECTRON_GS is |g_e|', () => {
    expect(K.ELECTRON_GS).toBe(-ref.ELECTRON_G.value);
    expect(K.ELECTRON_GS).toBeGreaterThan(2);
  });

  it('derived μ_B/h and μ_N/h agree with the CODATA listed values within their uncertainty', () => {
    // CODATA 2022: μ_B/h = 13 996 244 917.1(4.4) Hz/T ; μ_N/h = 7.622 593 2188(24) MHz/T
    const muB = ref.BOHR_MAGNETON_HZ_PER_T;
    expect(Math.abs(K.BOHR_MAGNETON_HZ_PER_T - muB.value)).toBeLessThan(muB.uncertainty);
    const muN = ref.NUCLEAR_MAGNETON_MHZ_PER_T;
    expect(Math.abs(K.NUCLEAR_MAGNETON_HZ_PER_T / 1e6 - muN.value)).toBeLessThan(muN.uncertainty);
  });

  it('every exported number in constants.ts is covered by a check here', () => {
    const numeric = Object.entries(K).filter(([, v]) => typeof v === 'number').map(([k]) => k);
    const covered = new Set<string>([
      ...stored.map(([k]) => k),
      'HBAR',
      'ELECTRON_GS',
      'BOHR_MAGNETON_HZ_PER_T',
      'NUCLEAR_MAGNETON_HZ_PER_T',
    ]);
    expect(numeric.filter((k) => !covered.has(k))).toEqual([]);
  });
});

describe('SI defining constants are exact (SI Brochure, 9th edition, 2019)', () => {
  it('h, e, k_B, N_A, c, Δν_Cs', () => {
    expect(K.PLANCK_H).toBe(6.62607015e-34);
    expect(K.ELEMENTARY_CHARGE).toBe(1.602176634e-19);
    expect(K.BOLTZMANN_K).toBe(1.380649e-23);
    expect(K.AVOGADRO).toBe(6.02214076e23);
    expect(K.SPEED_OF_LIGHT).toBe(299792458);
    expect(K.CAESIUM_HYPERFINE_HZ).toBe(9192631770);
  });
  it('exact constants carry zero uncertainty in CODATA', () => {
    for (const k of ['PLANCK_H', 'ELEMENTARY_CHARGE', 'BOLTZMANN_K', 'AVOGADRO', 'SPEED_OF_LIGHT', 'CAESIUM_HYPERFINE_HZ']) {
      expect(ref[k].uncertainty).toBe(0);
    }
  });
});

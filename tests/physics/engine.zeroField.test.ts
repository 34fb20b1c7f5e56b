import { describe, expect, it } from 'vitest';
import { CAESIUM_HYPERFINE_HZ } from '../../server/src/physics/constants';
import { hyperfineZeroFieldHz, solveLevel } from '../../server/src/physics/engine';
import type { HyperfineLevelSpec } from '../../server/src/physics/engine';
import { CS133_6P32, CS133_6S, H_1S, RB87_5S } from './engine.fixtures';

/** Distinct zero-field energies (ascending) and the 2F of each, from the matrix engine. */
function zeroFieldLevels(spec: HyperfineLevelSpec): { twoF: number; energyHz: number; count: number }[] {
  const { states, issues } = solveLevel(spec, 0);
  expect(issues.filter((i) => i.severity === 'error')).toEqual([]);
  const byF = new Map<number, number[]>();
  for (const s of states) {
    if (s.low.scheme !== 'F') throw new Error('hyperfine state without F label');
    byF.set(s.low.twoF, [...(byF.get(s.low.twoF) ?? []), s.energyHz]);
  }
  return [...byF.entries()]
    .map(([twoF, es]) => ({ twoF, energyHz: es.reduce((a, b) => a + b, 0) / es.length, count: es.length }))
    .sort((a, b) => a.energyHz - b.energyHz);
}

describe('zero-field hyperfine splittings from the matrix', () => {
  it('133Cs 6S1/2 splits by 9 192 631 770 Hz (SI definition of the second)', () => {
    const [lower, upper] = zeroFieldLevels(CS133_6S);
    expect([lower.twoF, upper.twoF]).toEqual([6, 8]);
    expect([lower.count, upper.count]).toEqual([7, 9]);
    // Exact definition; A = 2 298 157 942.5 Hz is exactly Δν_Cs/4, so only round-off remains.
    expect(Math.abs(upper.energyHz - lower.energyHz - CAESIUM_HYPERFINE_HZ)).toBeLessThan(1e-5);
  });

  it('87Rb 5S1/2 splits by 6 834 682 610.904 Hz (published, rubidium-87 D-line data compilation)', () => {
    const [lower, upper] = zeroFieldLevels(RB87_5S);
    expect([lower.twoF, upper.twoF]).toEqual([2, 4]);
    expect(Math.abs(upper.energyHz - lower.energyHz - 6834682610.904)).toBeLessThan(1e-5);
  });

  it('1H 1S1/2 splits by 1 420 405 751.768 Hz (published measurement)', () => {
    const [lower, upper] = zeroFieldLevels(H_1S);
    expect([lower.twoF, upper.twoF, lower.count, upper.count]).toEqual([0, 2, 1, 3]);
    expect(Math.abs(upper.energyHz - lower.energyHz - 1420405751.768)).toBeLessThan(1e-5);
  });

  it('each zero-field state stays degenerate across its 2F+1 sublevels', () => {
    const { states } = solveLevel(CS133_6P32, 0);
    for (const s of states) {
      if (s.low.scheme !== 'F') continue;
      const e = hyperfineZeroFieldHz(3, 7, s.low.twoF, CS133_6P32.A, CS133_6P32.B);
      expect(Math.abs(s.energyHz - e)).toBeLessThan(1e-6);
    }
  });
});

describe('Landé interval rule (textbook: E(F) − E(F−1) = A F for a pure dipole coupling)', () => {
  const dipoleOnly: HyperfineLevelSpec = { ...CS133_6P32, B: 0 };
  it('Cs 6P3/2 with A only: intervals 3A, 4A, 5A', () => {
    const levels = zeroFieldLevels(dipoleOnly);
    expect(levels.map((l) => l.twoF)).toEqual([4, 6, 8, 10]);
    for (let k = 1; k < levels.length; k++) {
      const F = levels[k].twoF / 2;
      expect(Math.abs(levels[k].energyHz - levels[k - 1].energyHz - dipoleOnly.A * F)).toBeLessThan(1e-6);
    }
  });

  it('an inverted level (A < 0) puts the largest F lowest with the same intervals', () => {
    const inverted: HyperfineLevelSpec = { kind: 'hyperfine', twoJ: 3, twoI: 3, gJ: 1.334, gI: 0, A: -3.06e6 };
    const levels = zeroFieldLevels(inverted);
    expect(levels.map((l) => l.twoF)).toEqual([6, 4, 2, 0]);
    for (let k = 1; k < levels.length; k++) {
      const Fupper = levels[k - 1].twoF / 2; // the larger F of the pair
      expect(Math.abs(levels[k].energyHz - levels[k - 1].energyHz - -inverted.A * Fupper)).toBeLessThan(1e-7);
    }
  });
});

describe('quadrupole and octupole operators against the closed (Casimir-type) form', () => {
  it('Cs 6P3/2 with A, B and C: matrix eigenvalues equal the closed form for every F', () => {
    const withC: HyperfineLevelSpec = { ...CS133_6P32, C: 0.56e3 };
    for (const lvl of zeroFieldLevels(withC)) {
      const closed = hyperfineZeroFieldHz(3, 7, lvl.twoF, withC.A, withC.B, withC.C);
      expect(Math.abs(lvl.energyHz - closed)).toBeLessThan(1e-6);
    }
  });

  it('a large octupole term (C comparable to A) still matches the closed form', () => {
    const spec: HyperfineLevelSpec = { kind: 'hyperfine', twoJ: 5, twoI: 9, gJ: 1.2, gI: 0.0003, A: 10e6, B: 4e6, C: 3e6 };
    const levels = zeroFieldLevels(spec);
    expect(levels.length).toBe(6);
    for (const lvl of levels) {
      expect(lvl.count).toBe(lvl.twoF + 1);
      const closed = hyperfineZeroFieldHz(5, 9, lvl.twoF, spec.A, spec.B, spec.C);
      expect(Math.abs(lvl.energyHz - closed)).toBeLessThan(1e-5);
    }
  });

  it('Cs 6P3/2 intervals with A, B, C reproduce the measured intervals', () => {
    // Measured intervals F'=5–4 251.0916(20), 4–3 201.2871(11), 3–2 151.2247(16) MHz
    // (caesium D-line data compilation; from memory). Tolerance = the quoted uncertainty.
    const withC: HyperfineLevelSpec = { ...CS133_6P32, C: 0.56e3 };
    const e = new Map(zeroFieldLevels(withC).map((l) => [l.twoF / 2, l.energyHz]));
    const interval = (f: number): number => ((e.get(f) as number) - (e.get(f - 1) as number)) / 1e6;
    expect(Math.abs(interval(5) - 251.0916)).toBeLessThan(0.002);
    expect(Math.abs(interval(4) - 201.2871)).toBeLessThan(0.0011);
    expect(Math.abs(interval(3) - 151.2247)).toBeLessThan(0.0016);
  });
});

/**
 * Slower physics against the outside world: a_max, lengths, the ideal profile and one atom's
 * flight against scripts/reference/slower.py (SciPy solve_ivp DOP853 and brentq, CODATA 2022
 * constants from scipy.constants) in tests/reference/slower.json; the Zeeman rate of the
 * stretched pair against its closed form μ_B/h (g_u J_u − g_l J_l); the built-in D2 lines against
 * the data compilations the species table cites.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { BOHR_MAGNETON_HZ_PER_T, SPEED_OF_LIGHT } from '../../server/src/physics/constants';
import type { HyperfineLevelSpec } from '../../server/src/physics/engine';
import { findBuiltinLevel, findSpecies } from '../../server/src/physics/species';
import { ATOMIC_MASS_UNIT } from '../../server/src/physics/constants';
import {
  checkDesign,
  drivenPair,
  idealField,
  idealProfile,
  maxDeceleration,
  rateSpread,
  simulateAtom,
  type AxisField,
  type IdealProfile,
  type SlowerDesign,
  type SlowerTransition,
} from '../../server/src/physics/slower';

interface Atom { wavelength_m: number; lifetime_s: number; mass_kg: number; g_lower: number; J_lower: number; g_upper: number; J_upper: number }
interface Case {
  name: string;
  input: { atom: Atom; v0: number; vf: number; eta: number; s0: number; design: SlowerDesign; bias_T?: number; step?: { z_m: number; width_m: number; size_T: number } };
  a_max_m_per_s2: number;
  length_m: number;
  stop_length_m: number;
  rate_Hz_per_T: number;
  delta_B_T: number;
  bias_T: number;
  detuning_Hz: number;
  field_samples: { z_m: number; B_T: number }[];
  flight: { final_m_per_s: number; time_s: number; stopped_at_m?: number };
  drop_at_m?: number | null;
}
const REF = JSON.parse(readFileSync(new URL('../reference/slower.json', import.meta.url), 'utf8')) as { cases: Case[] };

function setUp(c: Case): { t: SlowerTransition; p: IdealProfile } {
  const a = c.input.atom;
  const t: SlowerTransition = { wavelengthM: a.wavelength_m, lifetimeS: a.lifetime_s, massKg: a.mass_kg, rateHzPerT: c.rate_Hz_per_T };
  const { profile, issues } = idealProfile(t, {
    captureMPerS: c.input.v0,
    finalMPerS: c.input.vf,
    safety: c.input.eta,
    design: c.input.design,
    saturation: c.input.s0,
    ...(c.input.bias_T !== undefined ? { biasT: c.input.bias_T } : {}),
  });
  expect(issues.filter((i) => i.severity === 'error')).toEqual([]);
  return { t, p: profile! };
}

/** The reference's field: the ideal profile with, for one case, a tanh step subtracted. */
function fieldOf(c: Case, p: IdealProfile): AxisField {
  const step = c.input.step;
  return (z) => {
    const ideal = idealField(p, z);
    if (!step) return ideal;
    const x = (z - step.z_m) / step.width_m;
    return { BT: ideal.BT - step.size_T * 0.5 * (1 + Math.tanh(x)), dBdzTPerM: ideal.dBdzTPerM - (step.size_T * 0.5) / step.width_m / Math.cosh(x) ** 2 };
  };
}

describe('ideal profile against scripts/reference/slower.py (SciPy, CODATA 2022)', () => {
  for (const c of REF.cases) {
    it(`${c.name}: a_max, lengths, ΔB, bias, detuning, B(z)`, () => {
      const { t, p } = setUp(c);
      expect(maxDeceleration(t.wavelengthM, t.lifetimeS, t.massKg)).toBeCloseTo(c.a_max_m_per_s2, 6);
      expect(Math.abs(p.maxDecelerationMPerS2 / c.a_max_m_per_s2 - 1)).toBeLessThan(1e-12);
      expect(Math.abs(p.lengthM / c.length_m - 1)).toBeLessThan(1e-12);
      expect(Math.abs(p.stopLengthM / c.stop_length_m - 1)).toBeLessThan(1e-12);
      expect(Math.abs(p.deltaBT / c.delta_B_T - 1)).toBeLessThan(1e-12);
      expect(p.biasT).toBeCloseTo(c.bias_T, 12);
      expect(p.detuningHz).toBeCloseTo(c.detuning_Hz, 3);
      if (!c.input.step) for (const s of c.field_samples) expect(idealField(p, s.z_m).BT).toBeCloseTo(s.B_T, 12);
    });
  }

  it('sodium-like worked example: η = 0.5 from 1000 m/s gives a slower about a metre long (Foot, "Atomic Physics" §9.3, from memory: ~1 m, a_max ~ 10⁶ m/s²)', () => {
    const c = REF.cases.find((x) => x.name === 'sodium decreasing')!;
    const { p } = setUp(c);
    expect(p.maxDecelerationMPerS2).toBeGreaterThan(8.5e5);
    expect(p.maxDecelerationMPerS2).toBeLessThan(9.5e5);
    expect(p.lengthM).toBeGreaterThan(1.0);
    expect(p.lengthM).toBeLessThan(1.2);
    // ΔB = h v0/(λ μ_B): 1000 m/s / 589 nm = 1.70 GHz over 1.4 MHz/G ≈ 1210 G.
    expect(p.deltaBT * 1e4).toBeCloseTo(1212.5, 0);
    // Default decreasing design: zero field at the exit, the laser red by vf/λ = 30/589e-9 Hz ≈ 50.9 MHz.
    expect(p.exitFieldT).toBeCloseTo(0, 15);
    expect(p.detuningHz).toBeCloseTo(-30 / c.input.atom.wavelength_m, 1);
  });

  it('spin-flip default: equal and opposite fields at the two ends, and a zero crossing inside', () => {
    const { p } = setUp(REF.cases.find((x) => x.name === 'sodium spin flip')!);
    expect(p.entryFieldT + p.exitFieldT).toBeCloseTo(0, 14);
    expect(p.zeroCrossingM).toBeGreaterThan(0);
    expect(p.zeroCrossingM).toBeLessThan(p.lengthM);
    expect(idealField(p, p.zeroCrossingM!).BT).toBeCloseTo(0, 12);
  });

  it('increasing default: zero field at the entrance, |B| grows along the slower', () => {
    const { p } = setUp(REF.cases.find((x) => x.name === 'rubidium increasing')!);
    expect(p.entryFieldT).toBe(0);
    expect(idealField(p, p.lengthM / 2).BT).toBeGreaterThan(0);
    expect(p.exitFieldT).toBeGreaterThan(idealField(p, p.lengthM / 2).BT);
  });
});

describe('one atom through the field against SciPy solve_ivp (DOP853, rtol 1e-12)', () => {
  for (const c of REF.cases) {
    it(`${c.name}: final speed and time of flight`, () => {
      const { t, p } = setUp(c);
      const { result, issues } = simulateAtom({
        field: fieldOf(c, p),
        shiftHzPerT: p.sign * Math.abs(t.rateHzPerT),
        detuningHz: p.detuningHz,
        wavelengthM: t.wavelengthM,
        lifetimeS: t.lifetimeS,
        maxDecelerationMPerS2: p.maxDecelerationMPerS2,
        saturation: c.input.s0,
        startSpeedMPerS: c.input.v0,
        endM: p.lengthM,
      });
      expect(issues).toEqual([]);
      expect(Math.abs(result!.finalMPerS - c.flight.final_m_per_s)).toBeLessThan(1e-5 * c.input.v0);
      expect(Math.abs(result!.timeS / c.flight.time_s - 1)).toBeLessThan(1e-6);
      expect(result!.path.length).toBeGreaterThan(10);
      expect(result!.path.length).toBeLessThanOrEqual(401);
    });
  }
});

describe('design check', () => {
  it('the ideal profile needs exactly η a_max everywhere and drops nobody', () => {
    const c = REF.cases[0]!;
    const { t, p } = setUp(c);
    const check = checkDesign({ profile: p, field: (z) => idealField(p, z), shiftHzPerT: p.sign * Math.abs(t.rateHzPerT), wavelengthM: t.wavelengthM, saturation: c.input.s0 });
    expect(check.dropAtM).toBeUndefined();
    expect(check.worstOverDesign).toBeCloseTo(1, 9);
    for (const s of check.samples) expect(s.neededMPerS2 / p.designDecelerationMPerS2).toBeCloseTo(1, 9);
    expect(check.samples[0]!.resonantMPerS).toBeCloseTo(c.input.v0, 6);
    expect(check.samples.at(-1)!.resonantMPerS).toBeCloseTo(c.input.vf, 6);
  });

  it('a steep step in the field drops the atoms where SciPy brentq finds the need passing a_max s0/(1+s0)', () => {
    const c = REF.cases.find((x) => x.input.step)!;
    const { t, p } = setUp(c);
    const check = checkDesign({ profile: p, field: fieldOf(c, p), shiftHzPerT: p.sign * Math.abs(t.rateHzPerT), wavelengthM: t.wavelengthM, saturation: c.input.s0, points: 2001 });
    const grid = p.lengthM / 2000;
    expect(check.dropAtM).toBeGreaterThanOrEqual(c.drop_at_m!);
    expect(check.dropAtM! - c.drop_at_m!).toBeLessThanOrEqual(grid);
    expect(check.worstOverDesign).toBeGreaterThan(1 / c.input.eta);
    // The flight agrees: the atom leaves the resonance and coasts out fast.
    expect(c.flight.final_m_per_s).toBeGreaterThan(500);
  });
});

describe('the driven pair from the exact engine', () => {
  const na = findSpecies('Na23')!;
  const spec = (key: string): HyperfineLevelSpec => {
    const l = findBuiltinLevel(na, key)!;
    const twoJ = key === 'P3/2' ? 3 : 1;
    return { kind: 'hyperfine', twoJ, twoI: 3, gJ: l.gJ!.value, gI: na.gI!.value, A: l.A!.value, ...(l.B ? { B: l.B.value } : {}) };
  };

  it('Na D2 stretched pair: rate μ_B/h (g_u·3/2 − g_l·1/2) at every field (closed form for stretched states)', () => {
    const fields = [1e-7, 0.01, 0.05, 0.12, -0.06];
    const { pair, issues } = drivenPair(spec('ground'), spec('P3/2'), 'top', fields);
    expect(issues).toEqual([]);
    expect(pair!.cycling).toBe(true);
    expect(pair!.lowerLabel).toContain('F=2');
    expect(pair!.upperLabel).toContain('F=3');
    const closed = BOHR_MAGNETON_HZ_PER_T * (1.3342 * 1.5 - 2.002296 * 0.5);
    for (const r of pair!.ratesHzPerT) expect(Math.abs(r / closed - 1)).toBeLessThan(1e-9);
    expect(rateSpread(pair!)).toBeLessThan(1e-9);
    const bottom = drivenPair(spec('ground'), spec('P3/2'), 'bottom', fields).pair!;
    for (const r of bottom.ratesHzPerT) expect(Math.abs(r / -closed - 1)).toBeLessThan(1e-9);
  });

  it('Na D1 does not cycle: the stretched ground sublevel is dark, and the pair one step in has a field-dependent rate', () => {
    const { pair, issues } = drivenPair(spec('ground'), spec('P1/2'), 'top', [1e-7, 0.05]);
    expect(issues.map((i) => i.code)).toEqual(['slower-not-cycling']);
    expect(issues[0]!.message).toContain('F=2, m_F=+2');
    expect(pair!.cycling).toBe(false);
    expect(rateSpread(pair!)).toBeGreaterThan(1e-3);
  });
});

describe('bad requests are values, never NaN', () => {
  const t: SlowerTransition = { wavelengthM: 589e-9, lifetimeS: 16e-9, massKg: 23 * ATOMIC_MASS_UNIT, rateHzPerT: BOHR_MAGNETON_HZ_PER_T };
  const base = { captureMPerS: 800, finalMPerS: 20, safety: 0.5, design: 'decreasing' as const, saturation: 2 };
  it.each([
    [{ finalMPerS: 900 }, 'slower-bad-speeds'],
    [{ finalMPerS: 800 }, 'slower-bad-speeds'],
    [{ safety: 0 }, 'slower-bad-safety'],
    [{ safety: 1.2 }, 'slower-bad-safety'],
    [{ saturation: 0 }, 'slower-bad-saturation'],
  ])('%o → %s', (change, code) => {
    const r = idealProfile(t, { ...base, ...change });
    expect(r.profile).toBeUndefined();
    expect(r.issues.map((i) => i.code)).toEqual([code]);
  });
  it('no Zeeman shift', () => {
    expect(idealProfile({ ...t, rateHzPerT: 0 }, base).issues.map((i) => i.code)).toEqual(['slower-no-zeeman-shift']);
  });
  it('a bias that makes a decreasing profile cross zero gets a note', () => {
    const r = idealProfile(t, { ...base, biasT: -0.05 });
    expect(r.issues.map((i) => i.code)).toEqual(['slower-design-mismatch']);
  });
});

describe('built-in data of the usual slower lines (each value with its source in the species table)', () => {
  it.each([
    ['Na23', 589.158, 16.2492],
    ['K39', 766.701, 26.37],
    ['Rb87', 780.241, 26.2348],
    ['Cs133', 852.347, 30.473],
    ['Li7', 670.961, 27.102],
  ])('%s P3/2: energy gives λ ≈ %s nm, lifetime %s ns', (id, nm, ns) => {
    const s = findSpecies(id)!;
    const p = findBuiltinLevel(s, 'P3/2')!;
    expect(p.energyHz!.source).not.toBe('');
    expect(p.lifetimeS!.source).not.toBe('');
    // Wavelengths and lifetimes as printed in the compilations (Steck Na/Rb/Cs; Tiecke K; Li: public D-line tables), to 1e-3 nm.
    expect((SPEED_OF_LIGHT / p.energyHz!.value) * 1e9).toBeCloseTo(nm, 2);
    expect(p.lifetimeS!.value * 1e9).toBeCloseTo(ns, 2);
  });
});

/**
 * The z samples of a slower's design check: the uniform grid is kept and points are added where a
 * field bends, so a curve drawn through the samples strays at most about 1e-3 ΔB from the field
 * itself. Checked against the closed forms: the ideal B(z) = B_bias + ΔB √(1 − z/L0) and a coil-like
 * design that falls at the exit as a tanh (both written out here, not read from the module).
 */
import { describe, expect, it } from 'vitest';
import { BOHR_MAGNETON_HZ_PER_T } from '../../server/src/physics/constants';
import { checkDesign, idealField, idealProfile, idealSpeed, type AxisField } from '../../server/src/physics/slower';
import { checkGrid } from '../../server/src/physics/slower/zGrid';

// An invented sodium-like slower (line and lifetime from memory), stopping short of its √ end: vf = 15 m/s of 700 m/s.
const t = { wavelengthM: 589.158e-9, lifetimeS: 16.25e-9, massKg: 3.8175e-26, rateHzPerT: BOHR_MAGNETON_HZ_PER_T };
const p = idealProfile(t, { captureMPerS: 700, finalMPerS: 15, safety: 0.5, design: 'decreasing', saturation: 3, biasT: 0.005 }).profile!;
const common = { profile: p, shiftHzPerT: p.sign * t.rateHzPerT, wavelengthM: t.wavelengthM, saturation: 3 };
const ideal = (z: number): number => p.biasT + p.deltaBT * Math.sqrt(Math.max(0, 1 - z / p.stopLengthM));
// The ideal field, cut off by a fall 1 cm wide centred 3 cm before the exit (a short last coil).
const fallAt = p.lengthM - 0.03;
const coilLike = (z: number): number => ideal(z) * 0.5 * (1 - Math.tanh((z - fallAt) / 0.01));
const asField = (f: (z: number) => number): AxisField => (z) => ({ BT: f(z), dBdzTPerM: (f(z + 1e-7) - f(z - 1e-7)) / 2e-7 });

/** The largest gap between f at an interval's midpoint and the chord through its ends, over ΔB. */
function stray(zs: number[], f: (z: number) => number): number {
  let worst = 0;
  for (let k = 0; k + 1 < zs.length; k++) worst = Math.max(worst, Math.abs(f((zs[k]! + zs[k + 1]!) / 2) - (f(zs[k]!) + f(zs[k + 1]!)) / 2));
  return worst / p.deltaBT;
}
const uniform = Array.from({ length: 101 }, (_, i) => (p.lengthM * i) / 100);

describe('the design check samples densely where a field bends', () => {
  it('on the ideal field: every uniform point kept, no chord off by more than 1e-3 ΔB (the 101 uniform points alone: more than 3e-3)', () => {
    const zs = checkDesign({ ...common, field: asField(ideal), points: 101 }).samples.map((s) => s.zM);
    for (const z of uniform) expect(zs).toContain(z);
    expect(zs.length).toBeGreaterThan(101);
    expect(stray(uniform, ideal)).toBeGreaterThan(3e-3);
    expect(stray(zs, ideal)).toBeLessThanOrEqual(1e-3);
    // Ascending, from the entrance to the exit.
    for (let k = 1; k < zs.length; k++) expect(zs[k]!).toBeGreaterThan(zs[k - 1]!);
    expect(zs.at(-1)).toBe(p.lengthM);
  });

  it("on a coil-like field falling 1 cm wide at the exit: the fall is followed to 1e-3 ΔB (the uniform points alone: more than 3e-3)", () => {
    const check = checkDesign({ ...common, field: asField(coilLike), points: 101 });
    const zs = check.samples.map((s) => s.zM);
    expect(stray(uniform, coilLike)).toBeGreaterThan(3e-3);
    expect(stray(zs, coilLike)).toBeLessThanOrEqual(1.5e-3);
    // The ideal column is the ideal field at the same points, the field column the design's.
    for (const s of check.samples) {
      expect(s.idealT).toBeCloseTo(ideal(s.zM), 12);
      expect(s.fieldT).toBeCloseTo(coilLike(s.zM), 12);
    }
    // The fall asks for far more than the light gives: the atoms are dropped on it, before the exit.
    expect(check.dropAtM).toBeGreaterThan(fallAt - 0.05);
    expect(check.dropAtM).toBeLessThan(p.lengthM);
  });

  it('a smooth field adds few points: a constant field adds none', () => {
    const flat = checkDesign({ ...common, field: asField(() => 0.01), points: 101 });
    // The ideal field still bends, so points are added for it alone; never more than 64 per interval.
    expect(flat.samples.length).toBeLessThan(101 * 64);
    const n = checkDesign({ ...common, field: asField(ideal), points: 101 }).samples.length;
    expect(flat.samples.length).toBe(n);
  });
});

describe('the ideal check computes each point once, from the profile', () => {
  it('checkGrid without a separate ideal field evaluates the field once per point and takes it as the ideal', () => {
    const counted = (count: { n: number }): AxisField => (z) => {
      count.n++;
      return idealField(p, z);
    };
    const once = { n: 0 };
    const grid = checkGrid(counted(once), undefined, p.lengthM, 100, 1e-3 * p.deltaBT);
    for (const g of grid) expect(g.idealT).toBe(g.at.BT);
    // With the ideal given separately every point (kept or tried) solves the profile twice; the same points and fields come out.
    const field = { n: 0 };
    const idealCalls = { n: 0 };
    const twice = checkGrid(counted(field), (z) => counted(idealCalls)(z).BT, p.lengthM, 100, 1e-3 * p.deltaBT);
    expect(grid).toEqual(twice);
    expect(once.n).toBe(field.n);
    expect(idealCalls.n).toBe(field.n);
    expect(once.n).toBeGreaterThanOrEqual(grid.length);
  });

  it('the ideal check: resonant speeds v0 √(1 − z/L0) (closed form above), the capture and final speeds exactly at the ends', () => {
    const check = checkDesign({ ...common, points: 101 });
    const samples = check.samples;
    expect(samples[0]!.resonantMPerS).toBe(700);
    expect(samples[samples.length - 1]!.resonantMPerS).toBe(15);
    for (const x of samples) {
      expect(x.idealT).toBeCloseTo(ideal(x.zM), 12);
      expect(x.resonantMPerS / (700 * Math.sqrt(Math.max(0, 1 - x.zM / p.stopLengthM))) - 1).toBeCloseTo(0, 9);
      expect(idealSpeed(p, x.zM)).toBe(x.resonantMPerS);
    }
    // The design deceleration everywhere (the profile's definition), as the coil check would compute it on the ideal field.
    const viaField = checkDesign({ ...common, field: (z) => idealField(p, z), points: 101 });
    expect(viaField.samples.map((x) => x.zM)).toEqual(samples.map((x) => x.zM));
    for (let i = 0; i < samples.length; i++) expect(samples[i]!.neededMPerS2 / viaField.samples[i]!.neededMPerS2 - 1).toBeCloseTo(0, 9);
  });

  it('over 44 capture speeds the last sample is the exit itself: exit field 0 and the final speed as written (8 % of lengths fell one ulp short)', () => {
    for (let capture = 300; capture < 740; capture += 10) {
      const dec = idealProfile(t, { captureMPerS: capture, finalMPerS: 45, safety: 0.5, design: 'decreasing', saturation: 3 }).profile!;
      const samples = checkDesign({ profile: dec, shiftHzPerT: dec.sign * t.rateHzPerT, wavelengthM: t.wavelengthM, saturation: 3, points: 101 }).samples;
      const last = samples[samples.length - 1]!;
      expect(last.zM, `capture ${capture}`).toBe(dec.lengthM);
      expect(last.idealT, `capture ${capture}`).toBe(0);
      expect(last.resonantMPerS, `capture ${capture}`).toBe(45);
    }
  });

  it('the field at the exit is the profile\u2019s exit field exactly: 0 for the decreasing design at its default bias', () => {
    const dec = idealProfile(t, { captureMPerS: 500, finalMPerS: 30, safety: 0.5, design: 'decreasing', saturation: 3 }).profile!;
    expect(idealField(dec, dec.lengthM).BT).toBe(0);
    expect(idealField(dec, dec.lengthM + 1).BT).toBe(0);
    const flip = idealProfile(t, { captureMPerS: 950, finalMPerS: 30, safety: 0.55, design: 'spin_flip', saturation: 2.5 }).profile!;
    expect(idealField(flip, flip.lengthM).BT).toBe(flip.exitFieldT);
    expect(idealField(flip, 0).BT).toBe(flip.entryFieldT);
  });
});


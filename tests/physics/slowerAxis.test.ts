/**
 * The coils' field along a slower axis, against the textbook on-axis field of a finite solenoid,
 * B(z) = (μ0 N I / 2L) [(z + L/2)/√(R² + (z + L/2)²) − (z − L/2)/√(R² + (z − L/2)²)]
 * (D. J. Griffiths, "Introduction to Electrodynamics", 4th ed., problem 5.11, from memory), and its
 * derivative; and a coil design made of solenoid sections checked against the ideal profile.
 */
import { describe, expect, it } from 'vitest';
import { BOHR_MAGNETON_HZ_PER_T, VACUUM_PERMEABILITY } from '../../server/src/physics/constants';
import { sumField, type FieldSourceSpec } from '../../server/src/physics/fields';
import { axisField, checkDesign, idealField, idealProfile, simulateAtom, transverseFraction } from '../../server/src/physics/slower';

const R = 0.02;
const L = 0.3;
const NI = 5000;

function textbook(z: number): { B: number; dB: number } {
  const k = (VACUUM_PERMEABILITY * NI) / (2 * L);
  const f = (u: number): number => u / Math.sqrt(R * R + u * u);
  const df = (u: number): number => (R * R) / Math.pow(R * R + u * u, 1.5);
  return { B: k * (f(z + L / 2) - f(z - L / 2)), dB: k * (df(z + L / 2) - df(z - L / 2)) };
}

describe('axis field of sources', () => {
  // A solenoid along x centred at x = 0.5 m; the slower starts at x = 0.2 m and runs along +x.
  const parts: FieldSourceSpec[] = [{ kind: 'solenoid', centre: [0.5, 0, 0], axis: [1, 0, 0], radiusM: R, lengthM: L, ampereTurns: NI }];
  const along = axisField(sumField(parts), { start: [0.2, 0, 0], direction: [1, 0, 0] });

  it('matches the textbook solenoid on its axis, field and derivative, to 1e-9 relative', () => {
    for (const z of [0, 0.1, 0.25, 0.3, 0.33, 0.45, 0.6]) {
      const t = textbook(z + 0.2 - 0.5);
      const a = along(z);
      expect(Math.abs(a.BT - t.B)).toBeLessThan(1e-9 * Math.abs(textbook(0).B));
      expect(Math.abs(a.dBdzTPerM - t.dB)).toBeLessThan(1e-8 * Math.abs(textbook(0.15).dB) + 1e-12);
    }
  });

  it('flying the other way flips the sign of the component and keeps the derivative along the flight', () => {
    const back = axisField(sumField(parts), { start: [0.8, 0, 0], direction: [-1, 0, 0] });
    expect(back(0.3).BT).toBeCloseTo(-textbook(0).B, 12);
    // z = 0.1 is x = 0.7, 0.2 m past the centre: d(−B_x)/dz along −x = dB_x/dx there.
    expect(back(0.1).dBdzTPerM).toBeCloseTo(textbook(0.2).dB, 9);
  });

  it('has no transverse part on the axis of a coaxial solenoid', () => {
    expect(transverseFraction(sumField(parts), { start: [0.2, 0, 0], direction: [1, 0, 0] }, [0, 0.1, 0.3], 0.01)).toBeLessThan(1e-12);
  });
});

describe('a coil design of solenoid sections against the ideal profile (invented sodium-like slower)', () => {
  const t = { wavelengthM: 589.158e-9, lifetimeS: 16.25e-9, massKg: 3.8175e-26, rateHzPerT: BOHR_MAGNETON_HZ_PER_T };
  const p = idealProfile(t, { captureMPerS: 700, finalMPerS: 30, safety: 0.5, design: 'decreasing', saturation: 3, biasT: 0.005 }).profile!;
  /** Sections of a long-solenoid approximation, N I = B·l/μ0 at each section's centre, from 5 cm before the entrance (the ideal held at its entrance value there). */
  const sections = (n: number, scale: number): FieldSourceSpec[] =>
    Array.from({ length: n }, (_, k) => {
      const l = (p.lengthM + 0.05) / n;
      const zc = -0.05 + (k + 0.5) * l;
      return { kind: 'solenoid', centre: [0, 0, zc], axis: [0, 0, 1], radiusM: 0.015, lengthM: l, ampereTurns: (scale * idealField(p, zc).BT * l) / VACUUM_PERMEABILITY };
    });
  const common = { shiftHzPerT: p.sign * t.rateHzPerT, wavelengthM: t.wavelengthM, saturation: 3 };

  it('a fine design 3 % above the long-solenoid estimate catches the capture speed, follows the ideal and slows the atom', () => {
    const field = axisField(sumField(sections(40, 1.03)), { start: [0, 0, 0], direction: [0, 0, 1] });
    const check = checkDesign({ ...common, profile: p, field, points: 401 });
    expect(check.dropAtM).toBeUndefined();
    expect(check.samples[0]!.resonantMPerS).toBeGreaterThan(700);
    // The middle of the uniform grid (points are added between uniform ones where the field bends).
    const mid = check.samples.find((x) => x.zM === (p.lengthM * 200) / 400)!;
    expect(Math.abs(mid.fieldT / mid.idealT - 1)).toBeLessThan(0.04);
    const run = simulateAtom({ ...common, field, detuningHz: p.detuningHz, lifetimeS: t.lifetimeS, maxDecelerationMPerS2: p.maxDecelerationMPerS2, startSpeedMPerS: 700, endM: p.lengthM }).result!;
    expect(run.finalMPerS).toBeGreaterThan(20);
    expect(run.finalMPerS).toBeLessThan(35);
    expect(check.captureMPerS).toBeGreaterThan(700);
  });

  it('a design 15 % too weak asks for too steep a fall and drops the atoms early', () => {
    const field = axisField(sumField(sections(40, 0.85)), { start: [0, 0, 0], direction: [0, 0, 1] });
    const check = checkDesign({ ...common, profile: p, field, points: 401 });
    const run = simulateAtom({ ...common, field, detuningHz: p.detuningHz, lifetimeS: t.lifetimeS, maxDecelerationMPerS2: p.maxDecelerationMPerS2, startSpeedMPerS: 700, endM: p.lengthM }).result!;
    // Too weak at the entrance: the 700 m/s atoms are above the resonance there and are never caught.
    expect(run.finalMPerS).toBeGreaterThan(600);
    expect(check.samples[0]!.resonantMPerS).toBeLessThan(650);
    expect(check.captureMPerS).toBeLessThan(650);
  });
});

import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  formatFraction,
  hyperfineGF,
  landeGJ,
  landeGJFraction,
  nuclearGFromMoment,
  orbitalGFactor,
} from '../../server/src/physics/gFactors';
import { ATOMIC_MASS_UNIT, BOHR_MAGNETON_HZ_PER_T, ELECTRON_GS } from '../../server/src/physics/constants';
import { allowedJ } from '../../server/src/physics/termSymbol';
import { codataReference } from './codataReference';

describe('Landé g_J with g_s = 2 exactly: textbook values as fractions', () => {
  // Standard textbook values (from memory), term → [2S, L, 2J, fraction]
  const cases: [string, number, number, number, string][] = [
    ['2P1/2', 1, 1, 1, '2/3'],
    ['2P3/2', 1, 1, 3, '4/3'],
    ['2D3/2', 1, 2, 3, '4/5'],
    ['2D5/2', 1, 2, 5, '6/5'],
    ['4S3/2', 3, 0, 3, '2'],
    ['5D4', 4, 2, 8, '3/2'],
    ['7D1', 6, 2, 2, '3'],
    ['2S1/2', 1, 0, 1, '2'],
    ['3P1', 2, 1, 2, '3/2'],
    ['3P2', 2, 1, 4, '3/2'],
    ['1P1', 0, 1, 2, '1'],
    ['4D1/2', 3, 2, 1, '0'],
    ['6F1/2', 5, 3, 1, '-2/3'],
    ['8S7/2', 7, 0, 7, '2'],
    ['3P0', 2, 1, 0, '0'],
  ];
  for (const [label, twoS, L, twoJ, frac] of cases) {
    it(`${label} = ${frac}`, () => {
      expect(formatFraction(landeGJFraction(twoS, L, twoJ))).toBe(frac);
      const f = landeGJFraction(twoS, L, twoJ);
      expect(landeGJ(twoS, L, twoJ, { gS: 2, gL: 1 })).toBeCloseTo(f.num / f.den, 14);
    });
  }
  it('fractions are reduced with a positive denominator (property)', () => {
    fc.assert(
      fc.property(fc.nat(10), fc.nat(10), fc.nat(20), (twoS, L, k) => {
        const js = allowedJ(twoS, L).filter((j) => j > 0);
        if (js.length === 0) return true;
        const f = landeGJFraction(twoS, L, js[k % js.length]);
        const g = (a: number, b: number): number => (b === 0 ? Math.abs(a) : g(b, a % b));
        return f.den > 0 && g(f.num, f.den) === 1;
      }),
    );
  });
  it('trace sum rule over a term (property)', () => {
    // Tr[(g_L L_z + g_S S_z) J_z] is the same in the coupled and uncoupled bases, and within
    // each J the projection theorem makes the diagonal elements g_J M:
    //   Σ_J g_J Σ_M M² = Σ_{M_L, M_S} (g_L M_L + g_S M_S)(M_L + M_S),   Σ_M M² = J(J+1)(2J+1)/3.
    fc.assert(
      fc.property(fc.nat(8), fc.nat(6), (twoS, L) => {
        let lhs = 0;
        for (const twoJ of allowedJ(twoS, L)) {
          const J = twoJ / 2;
          lhs += landeGJ(twoS, L, twoJ, { gS: 2, gL: 1 }) * ((J * (J + 1) * (2 * J + 1)) / 3);
        }
        let rhs = 0;
        for (let ML = -L; ML <= L; ML++) for (let tMS = -twoS; tMS <= twoS; tMS += 2) rhs += (ML + tMS) * (ML + tMS / 2);
        return Math.abs(lhs - rhs) < 1e-9 * Math.max(1, Math.abs(rhs));
      }),
    );
  });
});

describe('g_J with the exact electron g (CODATA) and the reduced-mass g_L', () => {
  it('2S1/2 equals |g_e| from scipy.constants (CODATA 2022)', () => {
    expect(landeGJ(1, 0, 1)).toBe(-codataReference.constants.ELECTRON_G.value);
    expect(landeGJ(1, 0, 1)).toBe(ELECTRON_GS);
  });

  it('orbital g-factors of the alkalis match the D-line data compilations (Steck; from memory)', () => {
    // atomic masses in u (from memory of the same compilations): 23Na, 87Rb, 133Cs
    // Tolerance 1e-8: the listed 8 decimals, and atomic vs nuclear mass in m_e/M differ by
    // Z(m_e/M)² ≈ 6e-9 for Na.
    expect(Math.abs(orbitalGFactor(22.9897692807 * ATOMIC_MASS_UNIT) - 0.99997613)).toBeLessThan(1e-8);
    expect(Math.abs(orbitalGFactor(86.909180527 * ATOMIC_MASS_UNIT) - 0.99999369)).toBeLessThan(1e-8);
    expect(Math.abs(orbitalGFactor(132.905451933 * ATOMIC_MASS_UNIT) - 0.99999587)).toBeLessThan(1e-8);
    expect(orbitalGFactor()).toBe(1);
    expect(orbitalGFactor(0)).toBeNaN();
    expect(orbitalGFactor(-1)).toBeNaN();
  });

  // Measured g_J of alkali levels. LS coupling with exact g_s and reduced-mass g_L leaves out
  // relativistic, diamagnetic and core-polarisation corrections of order 1e-4 … 1e-3, so the
  // tolerance is 1e-3 plus twice the quoted measurement uncertainty (common practice).
  // Values: D. A. Steck, "Sodium / Rubidium 87 / Cesium D Line Data" (from memory), except
  // Cs 6P3/2 1.33408749(52), read via the search tool from "Precision measurement of the
  // excited state Landé g-factor and diamagnetic shift of the cesium D2 line".
  const measured: [string, number, number, number, number, number, number][] = [
    // label, mass (u), 2S, L, 2J, g_J measured, 1σ
    ['Na 3S1/2', 22.9897692807, 1, 0, 1, 2.0022960, 1.4e-6],
    ['Na 3P1/2', 22.9897692807, 1, 1, 1, 0.66581, 1.2e-4],
    ['Na 3P3/2', 22.9897692807, 1, 1, 3, 1.3342, 2e-4],
    ['Rb87 5S1/2', 86.909180527, 1, 0, 1, 2.00233113, 2e-8],
    ['Rb87 5P3/2', 86.909180527, 1, 1, 3, 1.3362, 1.3e-3],
    ['Cs 6S1/2', 132.905451933, 1, 0, 1, 2.00254032, 2e-8],
    ['Cs 6P1/2', 132.905451933, 1, 1, 1, 0.6659, 9e-5],
    ['Cs 6P3/2 (Steck)', 132.905451933, 1, 1, 3, 1.334, 2e-4],
    ['Cs 6P3/2 (2024 measurement)', 132.905451933, 1, 1, 3, 1.33408749, 5.2e-7],
  ];
  for (const [label, massU, twoS, L, twoJ, g, sigma] of measured) {
    it(`${label}: LS value within 1e-3 + 2σ of measured ${g}`, () => {
      const gL = orbitalGFactor(massU * ATOMIC_MASS_UNIT);
      const ls = landeGJ(twoS, L, twoJ, { gL });
      expect(Math.abs(ls - g)).toBeLessThan(1e-3 + 2 * sigma);
    });
  }
  it('LS coupling cannot reach the precise Cs 6P3/2 value (the paper reports a many-σ discrepancy)', () => {
    const gL = orbitalGFactor(132.905451933 * ATOMIC_MASS_UNIT);
    expect(Math.abs(landeGJ(1, 1, 3, { gL }) - 1.33408749)).toBeGreaterThan(10 * 5.2e-7);
  });
});

describe('nuclear g-factor convention', () => {
  it('proton: g_I = −2 μ_p/μ_B, from CODATA μ_p/μ_N (scipy.constants)', () => {
    const muPinN = codataReference.extra.PROTON_MOMENT_IN_MU_N.value;
    const muPinB = codataReference.extra.PROTON_MOMENT_IN_MU_B.value;
    const gI = nuclearGFromMoment(muPinN, 1);
    expect(gI).toBeLessThan(0); // positive moment → negative g_I in this convention
    expect(Math.abs(gI / (-2 * muPinB) - 1)).toBeLessThan(1e-9); // CODATA relative uncertainty ~3e-10
  });
  it('I = 0 has no moment', () => {
    expect(nuclearGFromMoment(0, 0)).toBe(0);
  });
  it('bare-moment g_I of 87Rb and 133Cs vs the compilations\' g_I (which include diamagnetic shielding)', () => {
    // μ(87Rb) = +2.751818 μ_N, I = 3/2; μ(133Cs) = +2.582025 μ_N, I = 7/2 (from memory).
    // Steck lists g_I(87Rb) = −0.0009951414 and g_I(133Cs) = −0.00039885395 (from memory); the
    // compilations' values include the atom's diamagnetic shielding (0.4 % for Rb, 0.7 % for Cs),
    // which the bare conversion leaves out, so the tolerance is 1 %.
    const rb = nuclearGFromMoment(2.751818, 3);
    const cs = nuclearGFromMoment(2.582025, 7);
    expect(Math.abs(rb / -0.0009951414 - 1)).toBeLessThan(0.01);
    expect(Math.abs(cs / -0.00039885395 - 1)).toBeLessThan(0.01);
    expect(rb).toBeLessThan(-0.0009951414); // shielding only reduces |g_I|
  });
});

describe('hyperfine g_F (projection theorem with both terms)', () => {
  const gJ = 2.00233113; // 87Rb 5S1/2 (Steck, from memory)
  const gI = -0.0009951414; // 87Rb (Steck, from memory)
  it('87Rb ground F = 2 and F = 1 are ≈ ±1/2 and split by ≈ ±0.70 MHz/G (Steck, from memory)', () => {
    const g2 = hyperfineGF(gJ, gI, 1, 3, 4);
    const g1 = hyperfineGF(gJ, gI, 1, 3, 2);
    // The compilation lists g_F ≈ +1/2 and −1/2; g_I and the QED part of g_J move them by ~2e-3.
    expect(Math.abs(g2 - 0.5)).toBeLessThan(2e-3);
    expect(Math.abs(g1 + 0.5)).toBeLessThan(3e-3);
    expect(g2).toBeLessThan(0.5); // g_I < 0 pulls the upper level below 1/2
    expect(g1).toBeLessThan(-0.5);
    // μ_B g_F / h in MHz per gauss (1 G = 1e-4 T)
    expect((g2 * BOHR_MAGNETON_HZ_PER_T * 1e-4) / 1e6).toBeCloseTo(0.7, 2);
    expect((g1 * BOHR_MAGNETON_HZ_PER_T * 1e-4) / 1e6).toBeCloseTo(-0.7, 2);
  });
  it('J = 1/2 closed forms: g_F(I±1/2) = (±g_J + (2I+1±1) g_I)/(2I+1) (textbook, from memory)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 15 }), fc.double({ min: -0.01, max: 0.01, noNaN: true }), (twoI, g) => {
        const up = hyperfineGF(gJ, g, 1, twoI, twoI + 1);
        const down = hyperfineGF(gJ, g, 1, twoI, twoI - 1);
        const twoIp1 = twoI + 1;
        const okUp = Math.abs(up - (gJ + twoI * g) / twoIp1) < 1e-12;
        const okDown = twoI - 1 === 0 ? down === 0 : Math.abs(down - (-gJ + (twoI + 2) * g) / twoIp1) < 1e-12;
        return okUp && okDown;
      }),
    );
  });
  it('stretched state: g_F = (g_J J + g_I I)/(I + J) for F = I + J (property)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 12 }), fc.integer({ min: 0, max: 12 }), fc.double({ min: -3, max: 3, noNaN: true }), fc.double({ min: -0.01, max: 0.01, noNaN: true }), (twoJ, twoI, gj, gi) => {
        if (twoJ + twoI === 0) return true;
        const expected = (gj * twoJ + gi * twoI) / (twoJ + twoI);
        return Math.abs(hyperfineGF(gj, gi, twoJ, twoI, twoJ + twoI) - expected) < 1e-12;
      }),
    );
  });
  it('F = 0 has no moment', () => {
    expect(hyperfineGF(gJ, gI, 1, 1, 0)).toBe(0);
  });
});

import { describe, expect, it } from 'vitest';
import { BOHR_MAGNETON_HZ_PER_T, ELECTRON_GS } from '../../server/src/physics/constants';
import {
  hyperfineZeroFieldHz,
  landeGF,
  landeGJ,
  levelCoefficients,
  solveLevel,
  sweepLevel,
  termLevelConstants,
  type FineTermSpec,
  type HyperfineLevelSpec,
  type WholeTermSpec,
} from '../../server/src/physics/engine';
import { LI7_2P, LI7_FINE_STRUCTURE_HZ, RB87_5P, reference } from './engine.wholeTerm.fixtures';

const MU = BOHR_MAGNETON_HZ_PER_T;
const energies = (spec: WholeTermSpec | FineTermSpec | HyperfineLevelSpec, b: number): number[] => {
  const r = solveLevel(spec, b);
  expect(r.issues.filter((i) => i.severity === 'error')).toEqual([]);
  return r.states.map((s) => s.energyHz);
};
const maxAbs = (xs: number[]): number => xs.reduce((m, x) => Math.max(m, Math.abs(x)), 0);

describe('whole term: J-level coefficients of the dipole parts', () => {
  it('one p electron: A_J = a l(l+1)/(j(j+1)) with a_L = a_SD = a (textbook) and contact <S·J>/J(J+1)', () => {
    const c = levelCoefficients(2, 1, 3);
    const j12 = c.find((x) => x.twoJ === 1)!;
    const j32 = c.find((x) => x.twoJ === 3)!;
    expect(j12.orbital + j12.spinDipolar).toBeCloseTo(2 / (3 / 4), 13);
    expect(j32.orbital + j32.spinDipolar).toBeCloseTo(2 / (15 / 4), 13);
    expect(j12.contact).toBeCloseTo(-1 / 3, 13);
    expect(j32.contact).toBeCloseTo(1 / 3, 13);
    // <L·J>/J(J+1) (projection theorem, textbook) for the orbital part alone.
    expect(j12.orbital).toBeCloseTo(4 / 3, 13);
    expect(j32.orbital).toBeCloseTo(2 / 3, 13);
  });

  it('a 3P term (He-like 2³P, I = 1/2): orbital and contact parts follow <L·J>/J(J+1), <S·J>/J(J+1) (textbook)', () => {
    for (const c of levelCoefficients(2, 2, 1)) {
      const jj = (c.twoJ / 2) * (c.twoJ / 2 + 1);
      expect(c.orbital).toBeCloseTo((jj + 2 - 2) / (2 * jj), 13);
      expect(c.contact).toBeCloseTo((jj + 2 - 2) / (2 * jj), 13);
    }
  });

  it('the reference script\'s ⁷Li J-level energies are the built-in pair: 2P3/2 − 2P1/2 = 10 053.154 MHz', () => {
    // 2009 critical review of the lithium fine structure, abstract (docs/species-data.md): 10 053.154 ± 0.040 MHz.
    expect(LI7_FINE_STRUCTURE_HZ).toBe(10053.154e6);
    expect(reference.cases.Li7_2P.energies['3']).toBe(LI7_FINE_STRUCTURE_HZ);
  });

  it('coefficients and radial parameters equal the NumPy/SymPy construction (tests/reference/engine_whole_term.json)', () => {
    for (const [name, spec] of [['Li7_2P', LI7_2P], ['Rb87_5P', RB87_5P]] as const) {
      const ref = reference.cases[name];
      for (const c of levelCoefficients(2, 1, spec.twoI)) {
        const r = ref.coefficients[String(c.twoJ) as '1' | '3'];
        expect(Math.abs(c.orbital - r.orbital)).toBeLessThan(1e-12);
        expect(Math.abs(c.spinDipolar - r.spinDipolar)).toBeLessThan(1e-12);
        expect(Math.abs(c.contact - r.contact)).toBeLessThan(1e-12);
      }
      const k = termLevelConstants(spec).constants!;
      expect(k.source).toBe('level-constants, a_L = a_SD');
      expect(Math.abs(k.radial.orbital - ref.radial.orbital)).toBeLessThan(1e-6);
      expect(Math.abs(k.radial.contact - ref.radial.contact)).toBeLessThan(1e-6);
      expect(Math.abs(k.quadrupoleL - ref.radial.quadrupole)).toBeLessThan(1e-6);
      // The implied J-level constants give back the inputs.
      for (const a of spec.levelA!) expect(Math.abs(k.levels.find((l) => l.twoJ === a.twoJ)!.A - a.A)).toBeLessThan(1e-6);
      expect(Math.abs(k.levels.find((l) => l.twoJ === 3)!.B - spec.levelB![0].B)).toBeLessThan(1e-6);
    }
  });
});

describe('whole term: energies against an independent NumPy construction (0–1 T)', () => {
  for (const [name, spec] of [['Li7_2P', LI7_2P], ['Rb87_5P', RB87_5P]] as const) {
    it(`${name}: every eigenvalue within 1e-9 of the largest energy (NumPy eigvalsh of the full matrix)`, () => {
      const ref = reference.cases[name];
      ref.fields_T.forEach((b, p) => {
        const got = energies(spec, b);
        const want = ref.energies_Hz[p];
        expect(got.length).toBe(want.length);
        const scale = maxAbs(want);
        const miss = maxAbs(got.map((e, k) => e - want[k]));
        // measured: ≤ 3e-3 Hz (Rb, 7 THz scale), ≤ 3e-6 Hz (Li); the bound is 1e-9 of the scale.
        expect(miss).toBeLessThan(1e-9 * scale);
      });
    });
  }
});

/** The single-J engine's spec for level twoJ of a term, with the J-level constants it implies. */
function singleLevel(spec: WholeTermSpec, twoJ: number): HyperfineLevelSpec {
  const k = termLevelConstants(spec).constants!.levels.find((l) => l.twoJ === twoJ)!;
  return { kind: 'hyperfine', twoJ, twoI: spec.twoI, gJ: landeGJ(spec.L, spec.twoS, twoJ, spec.gL, spec.gS), gI: spec.gI, A: k.A, B: k.B };
}

describe('whole term: limits', () => {
  it('fine structure → ∞: each J level equals the single-J engine to 1e-9 (Richardson in 1/Δ, exact identity)', () => {
    // Couplings between J levels shift energies by O(1/Δ); two separations remove that term.
    const at = (delta: number, b: number): number[] => {
      const spec: WholeTermSpec = { ...RB87_5P, levelEnergies: [{ twoJ: 1, energyHz: 0 }, { twoJ: 3, energyHz: delta }] };
      return energies(spec, b);
    };
    for (const b of [0, 1e-3, 0.01]) {
      const d = 1e14;
      const e1 = at(d, b);
      const e2 = at(2 * d, b);
      const lower = e1.slice(0, 8).map((e, k) => 2 * e2[k] - e);
      const upper = e1.slice(8).map((e, k) => 2 * (e2[k + 8] - 2 * d) - (e - d));
      const want1 = energies(singleLevel(RB87_5P, 1), b);
      const want3 = energies(singleLevel(RB87_5P, 3), b);
      const scale = maxAbs([...want1, ...want3]);
      expect(maxAbs(lower.map((e, k) => e - want1[k]))).toBeLessThan(1e-9 * scale);
      expect(maxAbs(upper.map((e, k) => e - want3[k]))).toBeLessThan(1e-9 * scale);
    }
  });

  it('hyperfine → 0: the ζ-term engine with the nucleus (exact identity)', () => {
    const noHf: WholeTermSpec = { kind: 'term', twoS: 1, L: 1, twoI: 3, gL: 1, gS: ELECTRON_GS, gI: -0.0011822136, zeta: 6.7e9, radial: { orbital: 0, spinDipolar: 0, contact: 0 } };
    const fine: FineTermSpec = { kind: 'fine', twoS: 1, L: 1, twoI: 3, gL: 1, gS: ELECTRON_GS, gI: -0.0011822136, zeta: 6.7e9 };
    for (const b of [0, 0.01, 0.3, 1]) {
      const a = energies(noHf, b);
      const f = energies(fine, b);
      expect(maxAbs(a.map((e, k) => e - f[k]))).toBeLessThan(1e-9 * maxAbs(f) + 1e-9);
    }
  });

  it('very high field: the analytic uncoupled energies, with a miss that falls as 1/B (strong-field expansion)', () => {
    const zeta = (2 / 3) * LI7_FINE_STRUCTURE_HZ;
    const r = termLevelConstants(LI7_2P).constants!;
    const spec: WholeTermSpec = { ...LI7_2P, levelEnergies: undefined, zeta };
    // E = ζ m_L m_S + a_L m_L m_I + a_C m_S m_I − a_SD (2/5)(3m_L² − 2) m_S m_I
    //   + b_L [3m_I² − I(I+1)][3m_L² − L(L+1)]/[4I(2I−1)L(2L−1)] + μ_B B (g_L m_L + g_S m_S + g_I m_I)
    const analytic = (mL: number, mS: number, mI: number, b: number): number =>
      zeta * mL * mS + r.radial.orbital * mL * mI + r.radial.contact * mS * mI - r.radial.spinDipolar * 0.4 * (3 * mL * mL - 2) * mS * mI
      + (r.quadrupoleL * (3 * mI * mI - 15 / 4) * (3 * mL * mL - 2)) / (4 * 1.5 * 2 * 1 * 1)
      + MU * b * (spec.gL * mL + spec.gS * mS + spec.gI * mI);
    const miss = (b: number): number => {
      const { states } = solveLevel(spec, b);
      let worst = 0;
      for (const s of states) {
        if (s.high.scheme !== 'mL,mS') throw new Error('expected |m_L, m_S, m_I>');
        worst = Math.max(worst, Math.abs(s.energyHz - analytic(s.high.twoML / 2, s.high.twoMS / 2, s.high.twoMI! / 2, b)));
      }
      return worst;
    };
    const m100 = miss(100);
    const m1000 = miss(1000);
    expect(m100).toBeLessThan(0.02 * zeta);
    expect(m100 / m1000).toBeGreaterThan(9);
    expect(m100 / m1000).toBeLessThan(11);
  });

  it('the trace of every m block is invariant: Σ E(B) − Σ E(0) = B Σ_i z_i (exact identity)', () => {
    for (const b of [0.01, 0.3, 1]) {
      const at0 = solveLevel(RB87_5P, 0).states;
      const atB = solveLevel(RB87_5P, b).states;
      for (let twoM = -6; twoM <= 6; twoM += 2) {
        const sum = (xs: typeof at0): number => xs.filter((s) => s.twoM === twoM).reduce((t, s) => t + s.energyHz, 0);
        const basis = atB.find((s) => s.twoM === twoM)!.basis;
        let z = 0;
        for (const l of basis) if (l.scheme === 'mL,mS') z += (MU * (l.twoML + ELECTRON_GS * l.twoMS + RB87_5P.gI * l.twoMI!)) / 2;
        expect(Math.abs(sum(atB) - sum(at0) - b * z)).toBeLessThan(1e-12 * 8 * 7.2e12);
      }
    }
  });
});

describe('whole term: labels at both ends', () => {
  it('⁸⁷Rb 5P at 1 µT: |J, F, m_F> with moment −g_F m_F μ_B (g_F from g_J, g_I; textbook)', () => {
    const { states } = solveLevel(RB87_5P, 1e-6);
    expect(states.length).toBe(24);
    const seen = new Set<string>();
    for (const s of states) {
      if (s.low.scheme !== 'F' || s.low.twoJ === undefined) throw new Error('expected |J, F, m_F>');
      seen.add(s.low.text);
      const gJ = landeGJ(1, 1, s.low.twoJ, 1, ELECTRON_GS);
      const gF = landeGF(s.low.twoF, s.low.twoJ, 3, gJ, RB87_5P.gI);
      expect(Math.abs(s.momentBohr + (gF * s.low.twoMF) / 2)).toBeLessThan(2e-3);
    }
    expect(seen.size).toBe(24);
    // 5P1/2 has A > 0 (F = 1 lowest) and g_F(F = 1) < 0, so m_F = +1 lies lowest.
    expect(states[0].low.text).toBe('J=1/2, F=1, m_F=+1');
    expect(states[23].low.text).toBe('J=3/2, F=3, m_F=+3');
  });

  it('zero field: each F of each J at E_J + the Casimir energy of its A_J, B_J (to second order in the J-mixing)', () => {
    const { states } = solveLevel(RB87_5P, 0);
    const k = termLevelConstants(RB87_5P).constants!;
    for (const s of states) {
      if (s.low.scheme !== 'F' || s.low.twoJ === undefined) throw new Error('expected |J, F, m_F>');
      const lv = k.levels.find((l) => l.twoJ === s.low.twoJ)!;
      const first = lv.energyHz + hyperfineZeroFieldHz(s.low.twoJ!, 3, s.low.twoF, lv.A, lv.B, 0);
      // second-order J-mixing ~ a²/Δ ≈ (1.5e8)²/7e12 ≈ 3 kHz
      expect(Math.abs(s.energyHz - first)).toBeLessThan(2e4);
    }
  });

  it('⁷Li 2P at 3 T: |m_L, m_S, m_I> labels carry > 95 % of the state and all 24 are distinct', () => {
    const { states } = solveLevel(LI7_2P, 3);
    const seen = new Set(states.map((s) => s.high.text));
    expect(seen.size).toBe(24);
    for (const s of states) {
      if (s.high.scheme !== 'mL,mS') throw new Error('expected |m_L, m_S, m_I>');
      const k = s.basis.findIndex((l) => l.text === s.high.text);
      expect(s.vector[k] ** 2).toBeGreaterThan(0.95);
    }
  });
});

describe('whole term: ⁷Li 2P fine-structure crossings', () => {
  it('|m_J = −3/2> meets the lower |m_J = +1/2> branch where the ²P closed form says (textbook), split by the hyperfine structure', () => {
    // ²P without hyperfine, b = μ_B B: the stretched |m_L = −1, m_S = −1/2> has E = ζ/2 − (g_L + g_S/2) b; the
    // m_J = +1/2 pair |0, +1/2>, |1, −1/2> is the 2 × 2 matrix [[g_S b/2, ζ/√2], [ζ/√2, −ζ/2 + (g_L − g_S/2) b]].
    const zeta = (2 / 3) * LI7_FINE_STRUCTURE_HZ;
    const gS = ELECTRON_GS;
    const stretched = (b: number): number => zeta / 2 - (1 + gS / 2) * MU * b;
    const lowerHalf = (b: number): number => {
      const a = (gS / 2) * MU * b;
      const d = -zeta / 2 + (1 - gS / 2) * MU * b;
      return (a + d) / 2 - Math.sqrt(((a - d) / 2) ** 2 + zeta * zeta / 2);
    };
    let lo = 0.1;
    let hi = 1;
    for (let i = 0; i < 100; i++) {
      const mid = (lo + hi) / 2;
      if (stretched(mid) - lowerHalf(mid) > 0) lo = mid;
      else hi = mid;
    }
    const bCross = (lo + hi) / 2;
    // With the 7Li D-line interval 10.052 GHz (alkali data compilation) the closed form gives 0.3191 T.
    expect(bCross).toBeGreaterThan(0.319);
    expect(bCross).toBeLessThan(0.3193);
    const sweep = sweepLevel({ ...LI7_2P, levelEnergies: undefined, zeta }, 0.25, 0.4, 301);
    // With the hyperfine structure each m_I sublevel of the two branches meets the others of other total m
    // within the hyperfine scale of the closed-form field (A/μ_B ≈ 3 mT); pairs of one total m anticross.
    const near = sweep.crossings.filter((c) => Math.abs(c.fieldT - bCross) < 3e-3);
    // measured: 14 crossings between 0.3180 and 0.3203 T
    expect(near.length).toBeGreaterThanOrEqual(12);
    const lowJ = (i: number): number | undefined => { const l = sweep.states[i].low; return l.scheme === 'F' ? l.twoJ : undefined; };
    expect(near.some((c) => lowJ(c.stateA) !== lowJ(c.stateB))).toBe(true);
  });
});

describe('whole term: bad input in plain words', () => {
  const base = { kind: 'term', twoS: 1, L: 1, twoI: 3, gL: 1, gS: 2, gI: 0, zeta: 1e9 } as const;
  it.each([
    [{ ...base }, 'term-no-hyperfine'],
    [{ ...base, levelA: [{ twoJ: 3, A: 1e6 }] }, 'term-hyperfine-underdetermined'],
    [{ ...base, levelA: [{ twoJ: 5, A: 1e6 }] }, 'term-bad-level'],
    [{ ...base, zeta: undefined, levelEnergies: [{ twoJ: 1, energyHz: 0 }] , levelA: [{ twoJ: 1, A: 1e6 }, { twoJ: 3, A: 1e5 }] }, 'term-fine-missing'],
    [{ ...base, levelEnergies: [{ twoJ: 1, energyHz: 0 }, { twoJ: 3, energyHz: 1 }] }, 'term-fine-both'],
    [{ ...base, L: 10, twoS: 6, twoI: 40, radial: { orbital: 1, spinDipolar: 1, contact: 1 } }, 'basis-too-large'],
  ] as [WholeTermSpec, string][])('%o → %s', (spec, code) => {
    const r = solveLevel(spec, 0.1);
    expect(r.states).toEqual([]);
    const err = r.issues.find((i) => i.severity === 'error')!;
    expect(err.code).toBe(code);
    expect(err.message.length).toBeGreaterThan(30);
  });

  it('without a nucleus the J-level energies alone make a fine-structure term (|J, m_J> labels), hyperfine data ignored with a warning', () => {
    const r = solveLevel({ ...base, zeta: undefined, twoI: 0, levelEnergies: [{ twoJ: 1, energyHz: 0 }, { twoJ: 3, energyHz: 1.5e9 }], levelA: [{ twoJ: 1, A: 1e6 }, { twoJ: 3, A: 1e5 }] }, 0);
    expect(r.issues.map((i) => i.code)).toEqual(['no-nucleus']);
    expect(r.states.map((s) => s.low.text)).toEqual(['J=1/2, m_J=-1/2', 'J=1/2, m_J=+1/2', 'J=3/2, m_J=-3/2', 'J=3/2, m_J=-1/2', 'J=3/2, m_J=+1/2', 'J=3/2, m_J=+3/2']);
    // E_J as given (exact identity): ζ = 1 GHz gives the same levels by the interval rule.
    expect(r.states[5].energyHz - r.states[0].energyHz).toBeCloseTo(1.5e9, 3);
  });

  it('the basis cap is stated in the message', () => {
    const r = solveLevel({ ...base, L: 10, twoS: 6, twoI: 40, radial: { orbital: 1, spinDipolar: 1, contact: 1 } }, 0);
    expect(r.issues[0].message).toContain('4096');
  });
});

describe('whole term: hostile specs never throw', () => {
  it.each([
    [{ levelA: [null] }],
    [{ levelA: 'x' }],
    [{ levelEnergies: [{ twoJ: 1 }] , zeta: undefined }],
    [{ radial: null }],
    [{ twoI: -1 }],
    [{ gI: Number.NaN }],
  ])('%o gives an error issue', (patch) => {
    const spec = { ...RB87_5P, ...patch } as unknown as WholeTermSpec;
    const r = solveLevel(spec, 0.1);
    expect(r.states).toEqual([]);
    expect(r.issues.some((i) => i.severity === 'error')).toBe(true);
  });
});

/**
 * Electric-dipole Zeeman components: textbook patterns, effective Landé factors, the sum
 * rule and the B → −B mirror as invariants, and the strong-field (Paschen–Back) grouping.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { BOHR_MAGNETON_HZ_PER_T } from '../../server/src/physics/constants';
import type { HyperfineLevelSpec } from '../../server/src/physics/engine';
import {
  acrossFieldWeight,
  alongFieldWeight,
  effectiveLandeFactor,
  electricDipoleLine,
  emissionWeight,
  landeFromComponents,
  stickSpectrum,
} from '../../server/src/physics/transitions';
import type { DipoleComponent } from '../../server/src/physics/transitions';
import { bareLevel, builtinEnergyHz, builtinSpec } from './transitions.fixtures';

const NA_3S = bareLevel(1, 0, 1);
const NA_3P12 = bareLevel(1, 1, 1);
const NA_3P32 = bareLevel(1, 1, 3);
const RB_5S = builtinSpec('Rb87', 'ground');
const RB_5P32 = builtinSpec('Rb87', 'P3/2');

/** Offsets in units of μ_B B/h with strengths, sorted by offset. */
function pattern(components: DipoleComponent[], fieldT: number): { x: number; s: number; p: string }[] {
  return components.map((c) => ({ x: c.offsetHz / (BOHR_MAGNETON_HZ_PER_T * fieldT), s: c.strength, p: c.polarization }));
}

describe('sodium D lines with I = 0 (textbook anomalous Zeeman pattern, g_s = 2 exactly)', () => {
  it('D1 (3s 2S1/2 – 3p 2P1/2): π at ±2/3 and σ at ±4/3 μ_B B/h; σ twice as strong as π (squared 3j symbols)', () => {
    const r = electricDipoleLine(NA_3S, NA_3P12, 0.5);
    expect(r.issues).toEqual([]);
    const got = pattern(r.components, 0.5);
    const want = [
      { x: -4 / 3, s: 2 / 3, p: 'σ−' },
      { x: -2 / 3, s: 1 / 3, p: 'π' },
      { x: 2 / 3, s: 1 / 3, p: 'π' },
      { x: 4 / 3, s: 2 / 3, p: 'σ+' },
    ];
    expect(got.length).toBe(4);
    got.forEach((g, i) => {
      expect(g.p).toBe(want[i].p);
      expect(g.x).toBeCloseTo(want[i].x, 12);
      expect(g.s).toBeCloseTo(want[i].s, 14);
    });
  });

  it('D2 (3s 2S1/2 – 3p 2P3/2): π at ±1/3, σ at ±1 and ±5/3 with strengths 2 : 3 : 1 (in thirds: 2/3, 1, 1/3)', () => {
    const r = electricDipoleLine(NA_3S, NA_3P32, 0.5);
    const got = pattern(r.components, 0.5);
    const want = [
      { x: -5 / 3, s: 1 / 3, p: 'σ−' },
      { x: -1, s: 1, p: 'σ−' },
      { x: -1 / 3, s: 2 / 3, p: 'π' },
      { x: 1 / 3, s: 2 / 3, p: 'π' },
      { x: 1, s: 1, p: 'σ+' },
      { x: 5 / 3, s: 1 / 3, p: 'σ+' },
    ];
    expect(got.length).toBe(6);
    got.forEach((g, i) => {
      expect(g.p).toBe(want[i].p);
      expect(g.x).toBeCloseTo(want[i].x, 12);
      expect(g.s).toBeCloseTo(want[i].s, 14);
    });
  });

  it('intensities along and across the field follow the dipole pattern (π absent along B; σ half across B)', () => {
    const r = electricDipoleLine(NA_3S, NA_3P32, 0.5);
    for (const c of r.components) {
      expect(c.alongField).toBeCloseTo(c.strength * (c.polarization === 'π' ? 0 : 1), 15);
      expect(c.acrossField).toBeCloseTo(c.strength * (c.polarization === 'π' ? 1 : 0.5), 15);
    }
    // Across the field the D2 pattern reads σ 1/6 : 1/2 : π 2/3 : 2/3 : σ 1/2 : 1/6 (1 : 3 : 4 : 4 : 3 : 1).
    expect(r.components.map((c) => c.acrossField * 6)).toEqual(
      [1, 3, 4, 4, 3, 1].map((v) => expect.closeTo(v, 12) as unknown as number),
    );
  });
});

describe('effective Landé factors', () => {
  it('D1 4/3 and D2 7/6 from the formula and from the σ centroids (I = 0)', () => {
    const d1 = electricDipoleLine(NA_3S, NA_3P12, 0.2);
    const d2 = electricDipoleLine(NA_3S, NA_3P32, 0.2);
    expect(d1.gEff?.formula).toBeCloseTo(4 / 3, 14);
    expect(d1.gEff?.fromCentroid).toBeCloseTo(4 / 3, 12);
    expect(d2.gEff?.formula).toBeCloseTo(7 / 6, 14);
    expect(d2.gEff?.fromCentroid).toBeCloseTo(7 / 6, 12);
  });

  // Fe I lines (values from memory; widely used magnetically sensitive lines), levels in LS coupling with g_S = 2:
  it('Fe I 525.02 nm, a 5D0 → z 7D°1: g_eff = 3', () => {
    const lower = bareLevel(4, 2, 0);
    const upper = bareLevel(6, 2, 2);
    expect(effectiveLandeFactor({ twoJ: 0, gJ: lower.gJ }, { twoJ: 2, gJ: upper.gJ })).toBeCloseTo(3, 14);
    const r = electricDipoleLine(lower, upper, 0.3);
    expect(r.gEff?.fromCentroid).toBeCloseTo(3, 12);
    expect(r.components.map((c) => c.polarization)).toEqual(['σ−', 'π', 'σ+']);
  });

  it('Fe I 630.25 nm, a 5P1 → z 5D°0: g_eff = 2.5', () => {
    const lower = bareLevel(4, 1, 2);
    const upper = bareLevel(4, 2, 0);
    expect(effectiveLandeFactor({ twoJ: 2, gJ: lower.gJ }, { twoJ: 0, gJ: upper.gJ })).toBeCloseTo(2.5, 14);
    const r = electricDipoleLine(lower, upper, 0.3);
    expect(r.gEff?.fromCentroid).toBeCloseTo(2.5, 12);
    // One upper sublevel (J = 0) decays equally into the three lower ones (3j: 1/3 each).
    expect(r.components.map((c) => c.strength)).toEqual([1, 1, 1].map((v) => expect.closeTo(v / 3, 14) as unknown as number));
  });

  it('with hyperfine structure (87Rb D2) the centroid still gives the formula, at weak and strong field', () => {
    for (const b of [0, 1e-4, 0.01, 1, 5]) {
      const r = electricDipoleLine(RB_5S, RB_5P32, b);
      const want = 0.5 * (RB_5P32.gJ + RB_5S.gJ) + 0.25 * (RB_5P32.gJ - RB_5S.gJ) * (15 / 4 - 3 / 4);
      expect(r.gEff?.formula).toBeCloseTo(want, 14);
      expect(Math.abs((r.gEff?.fromCentroid ?? 0) - want)).toBeLessThan(1e-8);
      if (b !== 0) expect(Math.abs((landeFromComponents(r.components, b) ?? 0) - want)).toBeLessThan(1e-8);
    }
  });

  it('returns NaN rather than throwing on bad input', () => {
    expect(effectiveLandeFactor({ twoJ: -1, gJ: 1 }, { twoJ: 1, gJ: 1 })).toBeNaN();
    expect(effectiveLandeFactor({ twoJ: 1, gJ: Number.NaN }, { twoJ: 1, gJ: 1 })).toBeNaN();
  });
});

describe('invariants', () => {
  const levels: [string, HyperfineLevelSpec, HyperfineLevelSpec][] = [
    ['87Rb D2', RB_5S, RB_5P32],
    ['133Cs D2', builtinSpec('Cs133', 'ground'), builtinSpec('Cs133', 'P3/2')],
    ['23Na D1', builtinSpec('Na23', 'ground'), builtinSpec('Na23', 'P1/2')],
    // An own test level J = 2 → J' = 1 with I = 5/2 and quadrupole terms on both sides (ΔJ = −1 branch).
    [
      'J=2 → 1, I=5/2',
      { kind: 'hyperfine', twoJ: 4, twoI: 5, gJ: 1.5, gI: -4e-4, A: 250e6, B: 40e6 },
      { kind: 'hyperfine', twoJ: 2, twoI: 5, gJ: 0.5, gI: -4e-4, A: -120e6, B: -15e6 },
    ],
  ];

  it('every upper sublevel decays with total strength 1, at any field (exact sum rule)', () => {
    for (const [, lower, upper] of levels) {
      fc.assert(
        fc.property(fc.double({ min: -5, max: 5, noNaN: true }), (b) => {
          const r = electricDipoleLine(lower, upper, b, { dropBelow: 0 });
          expect(r.sumRuleDeviation).toBeLessThan(1e-12);
          const perUpper = new Map<number, number>();
          for (const c of r.components) perUpper.set(c.upper.index, (perUpper.get(c.upper.index) ?? 0) + c.strength);
          expect(perUpper.size).toBe((upper.twoJ + 1) * (upper.twoI + 1));
          for (const s of perUpper.values()) expect(Math.abs(s - 1)).toBeLessThan(1e-12);
        }),
        { numRuns: 12, seed: 4242 },
      );
    }
  });

  it('σ+ at −B is the σ− pattern at +B (offsets and strengths), π mirrors itself', () => {
    for (const [, lower, upper] of levels) {
      for (const b of [2e-4, 0.03, 2]) {
        const plus = electricDipoleLine(lower, upper, b).components;
        const minus = electricDipoleLine(lower, upper, -b).components;
        const pick = (cs: DipoleComponent[], p: string): [number, number][] =>
          cs.filter((c) => c.polarization === p).map((c) => [c.offsetHz, c.strength] as [number, number]).sort((x, y) => x[0] - y[0]);
        for (const [a, z] of [['σ+', 'σ−'], ['σ−', 'σ+'], ['π', 'π']]) {
          const u = pick(minus, a);
          const v = pick(plus, z);
          expect(u.length).toBe(v.length);
          u.forEach(([f, s], i) => {
            expect(Math.abs(f - v[i][0])).toBeLessThan(1e-3 + 1e-12 * Math.abs(f));
            expect(Math.abs(s - v[i][1])).toBeLessThan(1e-10);
          });
        }
      }
    }
  });
});

describe('87Rb D2 against published hyperfine shifts and in the strong-field limit', () => {
  it('absolute frequencies: F=2 → F′=3 lies at the line centre + 193.7408 MHz − 2563.0060 MHz (D-line data compilation, from memory)', () => {
    const r = electricDipoleLine(RB_5S, RB_5P32, 0, {
      lowerEnergyHz: builtinEnergyHz('Rb87', 'ground'),
      upperEnergyHz: builtinEnergyHz('Rb87', 'P3/2'),
    });
    expect(r.lineCentreHz).toBe(384.2304844685e12);
    const cycling = r.components.find((c) => c.lower.low.scheme === 'F' && c.lower.low.twoF === 4 && c.upper.low.scheme === 'F' && c.upper.low.twoF === 6);
    expect(cycling).toBeDefined();
    // Quoted uncertainty of the excited-state shift: 4.6 kHz.
    expect(Math.abs((cycling?.offsetHz ?? 0) - (193.7408e6 - 2563.005979e6))).toBeLessThan(10e3);
    expect(Math.abs((cycling?.absoluteHz ?? 0) - (384.2304844685e12 + 193.7408e6 - 2563.005979e6))).toBeLessThan(10e3);
  });

  it('at 5 T the components group by Δm_J with m_I conserved (Paschen–Back)', () => {
    const b = 5;
    const r = electricDipoleLine(RB_5S, RB_5P32, b);
    const mu = BOHR_MAGNETON_HZ_PER_T * b;
    // Strong-field energies (textbook): A m_J m_I + B-term + μ_B B (g_J m_J + g_I m_I).
    const strong = (s: HyperfineLevelSpec, twoMJ: number, twoMI: number): number => {
      const J = s.twoJ / 2;
      const I = s.twoI / 2;
      const mJ = twoMJ / 2;
      const mI = twoMI / 2;
      const quad = s.B ? (s.B * (3 * mI * mI - I * (I + 1)) * (3 * mJ * mJ - J * (J + 1))) / (4 * I * (2 * I - 1) * J * (2 * J - 1)) : 0;
      return s.A * mJ * mI + quad + mu * (s.gJ * mJ + s.gI * mI);
    };
    let total = 0;
    let conserving = 0;
    const groups = new Map<string, { n: number; s: number }>();
    for (const c of r.components) {
      total += c.strength;
      const lo = c.lower.high;
      const up = c.upper.high;
      if (lo.scheme !== 'mJ,mI' || up.scheme !== 'mJ,mI') throw new Error('hyperfine labels expected');
      if (lo.twoMI !== up.twoMI) continue;
      conserving += c.strength;
      // Second-order corrections are ≲ A_ground²/(g_J μ_B B) ≈ 0.1 GHz; the Δm_J groups are ≥ 20 GHz apart.
      expect(Math.abs(c.offsetHz - (strong(RB_5P32, up.twoMJ, up.twoMI) - strong(RB_5S, lo.twoMJ, lo.twoMI)))).toBeLessThan(2e8);
      const key = `${lo.twoMJ}→${up.twoMJ}`;
      const g = groups.get(key) ?? { n: 0, s: 0 };
      groups.set(key, { n: g.n + 1, s: g.s + c.strength });
    }
    expect(conserving / total).toBeGreaterThan(0.995);
    // Six Δm_J groups, each of 2I + 1 = 4 m_I components with the I = 0 strengths (3j pattern of J = 1/2 → 3/2).
    const want: Record<string, number> = { '1→3': 1, '1→1': 2 / 3, '1→-1': 1 / 3, '-1→1': 1 / 3, '-1→-1': 2 / 3, '-1→-3': 1 };
    expect([...groups.keys()].sort()).toEqual(Object.keys(want).sort());
    for (const [k, g] of groups) {
      expect(g.n).toBe(4);
      expect(Math.abs(g.s / 4 - want[k])).toBeLessThan(5e-3);
    }
  });
});

describe('stick spectrum and dipole emission pattern', () => {
  it('rows carry offsets, strengths, polarisation and labels of either kind', () => {
    const r = electricDipoleLine(NA_3S, NA_3P32, 0.1);
    const low = stickSpectrum(r.components);
    const high = stickSpectrum(r.components, 'high');
    expect(low.length).toBe(6);
    expect(low[0]).toEqual({
      offsetHz: r.components[0].offsetHz,
      strength: r.components[0].strength,
      polarization: 'σ−',
      lowerLabel: 'J=1/2, m_J=+1/2',
      upperLabel: 'J=3/2, m_J=-1/2',
      alongField: r.components[0].alongField,
      acrossField: r.components[0].acrossField,
    });
    expect(high[0].lowerLabel).toBe('m_J=+1/2'); // no nucleus: J labels, no m_I
  });

  it('π ∝ sin²θ and σ ∝ (1+cos²θ)/2 both integrate to 8π/3 over the sphere (textbook dipole pattern)', () => {
    const n = 20000;
    for (const p of ['π', 'σ+'] as const) {
      let sum = 0;
      for (let i = 0; i < n; i++) {
        const th = ((i + 0.5) * Math.PI) / n;
        sum += emissionWeight(p, th) * Math.sin(th) * (Math.PI / n) * 2 * Math.PI;
      }
      expect(sum).toBeCloseTo((8 * Math.PI) / 3, 6);
      expect(alongFieldWeight(p)).toBeCloseTo(emissionWeight(p, 0), 15);
      expect(acrossFieldWeight(p)).toBeCloseTo(emissionWeight(p, Math.PI / 2), 15);
    }
  });
});

describe('bad input comes back as issues', () => {
  it('ΔJ = 2, J = 0 ↔ 0, different nuclei, mixed J kinds, a fine-mode level', () => {
    const code = (r: ReturnType<typeof electricDipoleLine>): string[] => r.issues.map((i) => i.code);
    expect(code(electricDipoleLine(NA_3S, bareLevel(1, 2, 5), 0.1))).toEqual(['line-delta-j']);
    expect(code(electricDipoleLine(bareLevel(0, 0, 0), bareLevel(2, 1, 0), 0.1))).toEqual(['line-j-zero-zero']);
    expect(code(electricDipoleLine(RB_5S, NA_3P32, 0.1))).toEqual(['line-nucleus-mismatch']);
    expect(code(electricDipoleLine(NA_3S, bareLevel(2, 1, 2), 0.1))).toEqual(['line-j-mixed']);
    const fine = { kind: 'fine', twoS: 1, L: 1, zeta: 1e9, gL: 1, gS: 2 } as unknown as HyperfineLevelSpec;
    const r = electricDipoleLine(NA_3S, fine, 0.1);
    expect(code(r)).toEqual(['line-level-kind']);
    expect(r.components).toEqual([]);
    const nan = electricDipoleLine(NA_3S, NA_3P32, Number.NaN);
    expect(nan.components).toEqual([]);
    expect(nan.issues.some((i) => i.severity === 'error' && i.code === 'bad-field')).toBe(true);
  });

  it('an upper level given below the lower one is warned about, not refused', () => {
    const r = electricDipoleLine(NA_3S, NA_3P32, 0.1, { lowerEnergyHz: 5e14, upperEnergyHz: 1e14 });
    expect(r.issues.map((i) => i.code)).toEqual(['line-upper-below-lower']);
    expect(r.components.length).toBe(6);
    expect(r.lineCentreHz).toBe(-4e14);
  });

  it('term data given with the line adds the selection-rule findings', () => {
    const r = electricDipoleLine(NA_3S, NA_3P32, 0.1, {
      terms: { lower: { twoS: 1, L: 0, twoJ: 1, configuration: '3s' }, upper: { twoS: 1, L: 1, twoJ: 3, configuration: '3p' } },
    });
    expect(r.issues).toEqual([]);
    const bad = electricDipoleLine(NA_3S, NA_3P32, 0.1, {
      terms: { lower: { twoS: 1, L: 0, twoJ: 1, configuration: '3s' }, upper: { twoS: 1, L: 1, twoJ: 3, configuration: '4s' } },
    });
    expect(bad.issues.map((i) => i.code)).toContain('line-parity-unchanged');
  });
});

/**
 * Magnetic-dipole (RF/microwave) transitions inside one level: frequencies and field
 * derivatives, field-insensitive points, resonance fields, and their outside checks.
 */
import { describe, expect, it } from 'vitest';
import { BOHR_MAGNETON_HZ_PER_T } from '../../server/src/physics/constants';
import type { HyperfineLevelSpec, LevelSpec } from '../../server/src/physics/engine';
import { fieldInsensitivePoints, magneticTransitions, resonanceFields } from '../../server/src/physics/transitions';
import type { MagneticTransition } from '../../server/src/physics/transitions';
import { builtinSpec, TESLA_PER_GAUSS } from './transitions.fixtures';

const RB_5S = builtinSpec('Rb87', 'ground');
/** A free electron as a J = 1/2 level without nucleus; g = 2.0023 (common practice for the resonance rule of thumb). */
const ELECTRON: HyperfineLevelSpec = { kind: 'hyperfine', twoJ: 1, twoI: 0, gJ: 2.0023, gI: 0, A: 0 };

function between(ts: MagneticTransition[], a: [number, number], b: [number, number]): MagneticTransition {
  const is = (l: MagneticTransition['lower']['low'], [f, m]: [number, number]): boolean => l.scheme === 'F' && l.twoF === f && l.twoMF === m;
  const t = ts.find((x) => (is(x.lower.low, a) && is(x.upper.low, b)) || (is(x.lower.low, b) && is(x.upper.low, a)));
  if (!t) throw new Error(`no transition ${a} ↔ ${b}`);
  return t;
}

describe('free-electron spin resonance', () => {
  it('at 9.5 GHz the resonance lies near 0.339 T for g = 2.0023 (common practice), exactly at h f/(g μ_B) to 1e-12', () => {
    const r = resonanceFields(ELECTRON, 9.5e9, { fromT: 0, toT: 1 });
    expect(r.resonances.length).toBe(1);
    const b = r.resonances[0].fieldT;
    expect(Math.abs(b - 0.339)).toBeLessThan(1e-3);
    expect(Math.abs(b / (9.5e9 / (2.0023 * BOHR_MAGNETON_HZ_PER_T)) - 1)).toBeLessThan(1e-12);
    const t = r.resonances[0].transition;
    expect(t.kind).toBe('σ+');
    expect(Math.abs(t.frequencyHz / 9.5e9 - 1)).toBeLessThan(1e-12);
  });

  it('both signs of the field resonate; the σ label follows which state is on top', () => {
    const r = resonanceFields(ELECTRON, 9.5e9, { fromT: -1, toT: 1, points: 101 });
    expect(r.resonances.map((x) => x.transition.kind)).toEqual(['σ−', 'σ+']);
    expect(r.resonances[0].fieldT).toBeCloseTo(-r.resonances[1].fieldT, 13);
  });

  it('df/dB = g μ_B/h, no curvature, and Ω/2π = g μ_B b/(2h) for a linear drive b (textbook spin-1/2 resonance)', () => {
    const [t] = magneticTransitions(ELECTRON, 0.3).transitions;
    expect(t.dfdB / (2.0023 * BOHR_MAGNETON_HZ_PER_T)).toBeCloseTo(1, 13);
    expect(t.d2fdB2).toBe(0);
    expect(t.strength).toBeCloseTo(2.0023 ** 2 / 2, 13);
    expect((t.rabiHzPerT ?? 0) / ((2.0023 * BOHR_MAGNETON_HZ_PER_T) / 2)).toBeCloseTo(1, 13);
  });
});

describe('87Rb 5S1/2 clock and two-photon transitions through the transition API', () => {
  it('|1,0> ↔ |2,0>: 6 834 682 610.904 Hz at B = 0 and quadratic shift 575.15 Hz/G² (D-line data compilation, 2 decimals)', () => {
    const ts = magneticTransitions(RB_5S, 0).transitions;
    const clock = between(ts, [2, 0], [4, 0]);
    expect(clock.kind).toBe('π');
    // Published measurement of the ground splitting (1e-3 Hz quoted); A is stored from it.
    expect(Math.abs(clock.frequencyHz - 6834682610.904)).toBeLessThan(1e-3);
    expect(Math.abs(clock.dfdB)).toBeLessThan(1e-3);
    expect(Math.abs((clock.d2fdB2 / 2) * TESLA_PER_GAUSS ** 2 - 575.15)).toBeLessThan(0.01);
    // <2,0| g_J J_z + g_I I_z |1,0> = (g_J − g_I)/2 up to sign (textbook, J = 1/2 states of m = 0).
    expect(clock.strength).toBeCloseTo((RB_5S.gJ - RB_5S.gI) ** 2 / 4, 12);
  });

  it('|1,−1> ↔ |2,+1> is field-insensitive at 3.228917 G (published measurement, Phys. Rev. A 66, 053616)', () => {
    const pair = { lower: { twoF: 2, twoMF: -2 }, upper: { twoF: 4, twoMF: 2 } };
    const r = fieldInsensitivePoints(RB_5S, pair, { fromT: 1e-4, toT: 1e-3, points: 37 });
    expect(r.issues).toEqual([]);
    expect(r.points.length).toBe(1);
    // The measurement quotes ±0.000003 G; g_I's quoted uncertainty moves the computed point about as much.
    expect(Math.abs(r.points[0].fieldT / TESLA_PER_GAUSS - 3.228917)).toBeLessThan(1e-5);
    // A minimum of the frequency, whose value matches the Breit–Rabi closed form (textbook):
    // E(F = I ± 1/2, m) = −ΔE/(2(2I+1)) + g_I μ_B m B ± (ΔE/2) √(1 + 4mx/(2I+1) + x²), here 2I + 1 = 4.
    expect(r.points[0].d2fdB2).toBeGreaterThan(0);
    const dE = 2 * RB_5S.A;
    const b = r.points[0].fieldT;
    const x = ((RB_5S.gJ - RB_5S.gI) * BOHR_MAGNETON_HZ_PER_T * b) / dE;
    const br = 2 * RB_5S.gI * BOHR_MAGNETON_HZ_PER_T * b + (dE / 2) * (Math.sqrt(1 + x + x * x) + Math.sqrt(1 - x + x * x));
    expect(Math.abs(r.points[0].frequencyHz - br)).toBeLessThan(1e-4);
    // Listed as a two-photon line only when asked for.
    const plain = magneticTransitions(RB_5S, r.points[0].fieldT).transitions;
    expect(plain.some((t) => t.kind === 'two-photon')).toBe(false);
    const withTwo = magneticTransitions(RB_5S, r.points[0].fieldT, { twoPhoton: true }).transitions;
    const t = between(withTwo, [2, -2], [4, 2]);
    expect(t.kind).toBe('two-photon');
    expect(t.q).toBe(2);
    expect(t.strength).toBeNull();
    expect(Math.abs(t.dfdB)).toBeLessThan(1e-3);
  });

  it('the two-photon pair resonates twice just above its minimum frequency, either side of 3.2289 G (Breit–Rabi closed form)', () => {
    const pair = { lower: { twoF: 2, twoMF: -2 }, upper: { twoF: 4, twoMF: 2 } };
    const [p0] = fieldInsensitivePoints(RB_5S, pair, { fromT: 1e-4, toT: 1e-3 }).points;
    const r = resonanceFields(RB_5S, p0.frequencyHz + 10, { fromT: 1e-4, toT: 1e-3 }, { pair });
    expect(r.resonances.map((x) => x.transition.kind)).toEqual(['two-photon', 'two-photon']);
    const [lo, hi] = r.resonances.map((x) => x.fieldT);
    expect(lo).toBeLessThan(p0.fieldT);
    expect(hi).toBeGreaterThan(p0.fieldT);
    const dE = 2 * RB_5S.A;
    const br = (b: number): number => {
      const x = ((RB_5S.gJ - RB_5S.gI) * BOHR_MAGNETON_HZ_PER_T * b) / dE;
      return 2 * RB_5S.gI * BOHR_MAGNETON_HZ_PER_T * b + (dE / 2) * (Math.sqrt(1 + x + x * x) + Math.sqrt(1 - x + x * x));
    };
    for (const b of [lo, hi]) expect(Math.abs(br(b) - (p0.frequencyHz + 10))).toBeLessThan(1e-4);
    // Near the minimum f ≈ f₀ + ½ f'' (B − B₀)²: the half-width for 10 Hz is √(20/f'').
    expect((hi - lo) / 2).toBeCloseTo(Math.sqrt(20 / p0.d2fdB2), 8);
  });

  it('the m = 0 clock pair is stationary at B = 0 and nowhere else in ±10 mT', () => {
    const pair = { lower: { twoF: 2, twoMF: 0 }, upper: { twoF: 4, twoMF: 0 } };
    const r = fieldInsensitivePoints(RB_5S, pair, { fromT: -0.01, toT: 0.01, points: 200 });
    expect(r.points.length).toBe(1);
    expect(Math.abs(r.points[0].fieldT)).toBeLessThan(1e-12);
  });

  it('resonance of the clock pair at f₀ + 1 kHz matches Breit–Rabi, f = ΔE √(1 + x²) (textbook closed form), to 1e-9', () => {
    const dE = 2 * RB_5S.A; // A(I + 1/2), the level's own zero-field splitting
    const f = dE + 1000;
    const x = Math.sqrt((f / dE) ** 2 - 1);
    const want = (x * dE) / ((RB_5S.gJ - RB_5S.gI) * BOHR_MAGNETON_HZ_PER_T);
    const pair = { lower: { twoF: 2, twoMF: 0 }, upper: { twoF: 4, twoMF: 0 } };
    const r = resonanceFields(RB_5S, f, { fromT: -1e-3, toT: 1e-3 }, { pair });
    expect(r.resonances.length).toBe(2);
    expect(Math.abs(r.resonances[1].fieldT / want - 1)).toBeLessThan(1e-9);
    expect(Math.abs(r.resonances[0].fieldT / -want - 1)).toBeLessThan(1e-9);
  });
});

describe('derivatives agree with finite differences of the exact frequencies', () => {
  it('87Rb at 0.37 T and an own fine-structure term with a nucleus', () => {
    const fine: LevelSpec = { kind: 'fine', twoS: 1, L: 1, zeta: 7e9, gL: 1, gS: 2.0023, twoI: 1, gI: -0.003 };
    for (const [spec, b] of [
      [RB_5S, 0.37],
      [fine, 0.21],
    ] as [LevelSpec, number][]) {
      const here = magneticTransitions(spec, b).transitions;
      const h = 1e-4;
      const at = (field: number): Map<string, number> => {
        const m = new Map<string, number>();
        for (const t of magneticTransitions(spec, field).transitions) m.set(`${t.lower.low.text}|${t.upper.low.text}`, t.frequencyHz);
        return m;
      };
      const plus = at(b + h);
      const minus = at(b - h);
      const mid = at(b);
      expect(here.length).toBeGreaterThan(5);
      for (const t of here) {
        const k = `${t.lower.low.text}|${t.upper.low.text}`;
        const fp = plus.get(k) as number;
        const fm = minus.get(k) as number;
        const f0 = mid.get(k) as number;
        // Central differences: error ~ h² f'''/6 plus round-off ~1e-6 Hz / h.
        expect(Math.abs((fp - fm) / (2 * h) - t.dfdB)).toBeLessThan(1e-6 * Math.abs(t.dfdB) + 1);
        expect(Math.abs((fp - 2 * f0 + fm) / (h * h) - t.d2fdB2)).toBeLessThan(1e-4 * Math.abs(t.d2fdB2) + 1e3);
      }
    }
  });
});

describe('invariants and bad input', () => {
  it('σ+ at −B mirrors σ− at +B (frequencies and strengths)', () => {
    for (const b of [1e-5, 0.02, 0.5]) {
      const plus = magneticTransitions(RB_5S, b).transitions;
      const minus = magneticTransitions(RB_5S, -b).transitions;
      for (const [a, z] of [['σ+', 'σ−'], ['σ−', 'σ+'], ['π', 'π']]) {
        const u = minus.filter((t) => t.kind === a).map((t) => [t.frequencyHz, t.strength ?? 0, t.dfdB]);
        const v = plus.filter((t) => t.kind === z).map((t) => [t.frequencyHz, t.strength ?? 0, -t.dfdB]);
        u.sort((x, y) => x[0] - y[0]);
        v.sort((x, y) => x[0] - y[0]);
        expect(u.length).toBe(v.length);
        u.forEach((row, i) => {
          expect(Math.abs(row[0] - v[i][0])).toBeLessThan(1e-4);
          expect(Math.abs(row[1] - v[i][1])).toBeLessThan(1e-10);
          expect(Math.abs(row[2] - v[i][2])).toBeLessThan(1e-3 + 1e-9 * Math.abs(row[2]));
        });
      }
    }
  });

  it('issues instead of exceptions', () => {
    const pair = { lower: { twoF: 2, twoMF: 0 }, upper: { twoF: 4, twoMF: 0 } };
    const code = (r: { issues: { code: string }[] }): string[] => r.issues.map((i) => i.code);
    expect(code(resonanceFields(RB_5S, -5, { fromT: 0, toT: 1 }))).toEqual(['resonance-bad-frequency']);
    expect(code(resonanceFields(RB_5S, 5e9, { fromT: 1, toT: 1 }))).toEqual(['scan-bad-range']);
    expect(code(resonanceFields(RB_5S, 5e9, { fromT: 0, toT: 1, points: 2 }))).toEqual(['scan-bad-points']);
    expect(code(resonanceFields(RB_5S, 1e3, { fromT: 0.5, toT: 1 }, { pair }))).toEqual(['no-resonance']);
    expect(code(fieldInsensitivePoints(RB_5S, { lower: { twoF: 2, twoMF: 0 }, upper: { twoF: 2, twoMF: 0 } }, { fromT: 0, toT: 1 }))).toEqual([
      'pair-same-state',
    ]);
    expect(code(fieldInsensitivePoints(RB_5S, { lower: { twoF: 8, twoMF: 0 }, upper: { twoF: 4, twoMF: 0 } }, { fromT: 0, toT: 1 }))).toEqual([
      'pair-not-found',
    ]);
    expect(code(fieldInsensitivePoints(RB_5S, { lower: { twoF: 2.5, twoMF: 0 }, upper: pair.upper } as never, { fromT: 0, toT: 1 }))).toEqual([
      'pair-bad-ref',
    ]);
    const bad = magneticTransitions({ kind: 'hyperfine', twoJ: -1, twoI: 0, gJ: 2, gI: 0, A: 0 }, 0.1);
    expect(bad.transitions).toEqual([]);
    expect(code(bad)).toEqual(['bad-momentum']);
  });
});

/**
 * The optional diamagnetic term of a whole term, against tests/reference/diamagnetic.json
 * (scripts/reference/diamagnetic.py: SymPy integrals of |Y_lm|² sin²θ and of hydrogenic R_nl² r⁴,
 * NumPy eigenvalues of the full uncoupled ⁷Li 2P matrix with H0 + B Z + B² D, CODATA 2022 from
 * scipy.constants).
 */
import { describe, expect, it } from 'vitest';
import { BOHR_RADIUS, ELECTRON_MASS, ELEMENTARY_CHARGE, PLANCK_H } from '../../server/src/physics/constants';
import { diamagneticHzPerT2, hydrogenicR2InBohr2, sinSquaredMean, solveLevel, sweepLevel, type WholeTermSpec } from '../../server/src/physics/engine';
import { levelDerivatives } from '../../server/src/physics/uncertainty';
import ref from '../reference/diamagnetic.json';
import { LI7_2P } from './engine.wholeTerm.fixtures';

const R2 = ref.Li7_2P.r2_bohr2 * BOHR_RADIUS ** 2;
const WITH: WholeTermSpec = { ...LI7_2P, r2M2: R2 };
const energies = (spec: WholeTermSpec, b: number): number[] => {
  const r = solveLevel(spec, b);
  expect(r.issues.filter((i) => i.severity === 'error')).toEqual([]);
  return r.states.map((s) => s.energyHz);
};
/** The state |m_L = 1, m_S = 1/2, m_I = 3/2>: alone in the block 2m = 2 + 1 + 3. */
const stretched = (spec: WholeTermSpec, b: number): number => solveLevel(spec, b).states.find((s) => s.twoM === 6)!.energyHz;

describe('diamagnetic term: the ingredients', () => {
  it('⟨l m|sin²θ|l m⟩ equals the SymPy integral of |Y_lm|² sin²θ for l = 0..4', () => {
    for (const [key, value] of Object.entries(ref.sin2)) {
      const [l, m] = key.split(',').map(Number);
      expect(Math.abs(sinSquaredMean(l!, m!) - value)).toBeLessThan(1e-15);
    }
  });

  it('hydrogenic ⟨r²⟩ equals the SymPy integral of R_nl² r⁴ (a₀², Z = 1)', () => {
    for (const [key, value] of Object.entries(ref.hydrogenic_r2_bohr2)) {
      const [n, l] = key.split(',').map(Number);
      expect(hydrogenicR2InBohr2(n!, l!)).toBe(value);
    }
    expect(hydrogenicR2InBohr2(1, 0, 2)).toBe(0.75); // 1s at Z = 2: 3a₀²/Z² (textbook)
  });

  it('e²a₀²/(8mₑh) from constants.ts equals the scipy.constants value (CODATA 2022)', () => {
    expect(BOHR_RADIUS).toBe(ref.bohr_radius_m);
    const ours = diamagneticHzPerT2(BOHR_RADIUS ** 2);
    expect(Math.abs(ours / ref.e2_a02_over_8me_h_Hz_per_T2 - 1)).toBeLessThan(1e-14);
    expect(ours).toBeCloseTo((ELEMENTARY_CHARGE ** 2 * BOHR_RADIUS ** 2) / (8 * ELECTRON_MASS * PLANCK_H), 6);
    expect(ours).toBeCloseTo(14886.34, 1);
  });
});

describe('diamagnetic term in the whole-term engine (⁷Li 2P, scenario ⟨r²⟩ = 27.1 a₀²)', () => {
  it('energies equal the NumPy eigenvalues of H0 + B Z + B² D to 1e-9 relative, 0–30 T', () => {
    ref.Li7_2P.fields_T.forEach((b, i) => {
      const ours = energies(WITH, b);
      const theirs = ref.Li7_2P.energies_with_diamagnetic_Hz[i]!;
      const scale = Math.max(...theirs.map(Math.abs));
      ours.forEach((e, k) => expect(Math.abs(e - theirs[k]!)).toBeLessThan(1e-9 * scale));
    });
  });

  it('the stretched state shifts by exactly (e²B²⟨r²⟩/8mₑh)⟨sin²θ⟩ (analytic, first order is exact here)', () => {
    ref.Li7_2P.fields_T.forEach((b, i) => {
      const shift = stretched(WITH, b) - stretched(LI7_2P, b);
      expect(Math.abs(shift - ref.Li7_2P.stretched_shift_Hz[i]!)).toBeLessThan(1e-6 * (1 + ref.Li7_2P.stretched_shift_Hz[i]!) + 1e-3);
    });
    expect(ref.Li7_2P.stretched_shift_Hz[4]).toBeCloseTo(290.46e6, -4);
  });

  it('zero-field limit: the term changes nothing at B = 0', () => {
    const a = energies(WITH, 0);
    const b = energies(LI7_2P, 0);
    a.forEach((e, k) => expect(e).toBe(b[k]));
  });

  it('is added only when ⟨r²⟩ is given: without it the energies at 30 T are the reference without the term', () => {
    const theirs = ref.Li7_2P.energies_Hz[4]!;
    const ours = energies(LI7_2P, 30);
    const scale = Math.max(...theirs.map(Math.abs));
    ours.forEach((e, k) => expect(Math.abs(e - theirs[k]!)).toBeLessThan(1e-9 * scale));
    // …and the two differ by far more than that (the test can tell them apart).
    expect(Math.abs(energies(WITH, 30)[0]! - ours[0]!)).toBeGreaterThan(1e6);
  });

  it('moments and curvatures are −h⟨Z + 2BD⟩ and the B-derivative of the energy (central differences)', () => {
    const b = 2;
    const db = 1e-4;
    const mid = solveLevel(WITH, b).states;
    const up = energies(WITH, b + db);
    const down = energies(WITH, b - db);
    mid.forEach((s, k) => {
      const slope = (up[k]! - down[k]!) / (2 * db);
      const curvature = (up[k]! - 2 * s.energyHz + down[k]!) / (db * db);
      expect(Math.abs(-s.momentJT / PLANCK_H - slope)).toBeLessThan(1e-6 * Math.abs(slope) + 10);
      expect(Math.abs(s.d2EdB2 - curvature)).toBeLessThan(1e-3 * Math.abs(curvature) + 2e4);
    });
    // The stretched state: slope Z + 2B D exactly, curvature 2D exactly.
    const top = mid.find((s) => s.twoM === 6)!;
    const d = diamagneticHzPerT2(R2) * sinSquaredMean(1, 1);
    const noDia = solveLevel(LI7_2P, b).states.find((s) => s.twoM === 6)!;
    expect(Math.abs(-top.momentJT / PLANCK_H - (-noDia.momentJT / PLANCK_H + 2 * b * d))).toBeLessThan(1e-6);
    expect(Math.abs(top.d2EdB2 - 2 * d)).toBeLessThan(1e-6);
  });

  it('a sweep with the term matches solveLevel at fields between the sweep\'s ends (energies and moments)', () => {
    // Enough points that a series route expanding H0 + B·Z alone would have to stand for fields between anchors.
    const sweep = sweepLevel(WITH, 0, 30, 401, { crossings: false, curvature: true });
    expect(sweep.issues.filter((i) => i.severity === 'error')).toEqual([]);
    for (let p = 1; p < 401; p += 37) {
      const b = sweep.fieldsT[p]!;
      const exact = solveLevel(WITH, b).states;
      const swept = sweep.states.map((s) => ({ e: s.energyHz[p]!, m: s.momentJT[p]!, c: s.d2EdB2![p]! })).sort((x, y) => x.e - y.e);
      const scale = Math.max(...exact.map((s) => Math.abs(s.energyHz)));
      exact.forEach((s, k) => {
        expect(Math.abs(swept[k]!.e - s.energyHz)).toBeLessThan(1e-9 * scale);
        expect(Math.abs(swept[k]!.m - s.momentJT)).toBeLessThan(1e-9 * Math.abs(s.momentJT) + 1e-30);
      });
    }
  });

  it('the uncertainty pass takes d²E/dB² = 2⟨D⟩ + … for the field (stretched state)', () => {
    const d = diamagneticHzPerT2(R2) * sinSquaredMean(1, 1);
    const withD = levelDerivatives(WITH, 2).states.find((s) => s.twoM === 6)!;
    const without = levelDerivatives(LI7_2P, 2).states.find((s) => s.twoM === 6)!;
    expect(Math.abs(withD.dE.field! - without.dE.field! - 4 * d)).toBeLessThan(1e-6);
    expect(Math.abs(withD.dSlope.field! - 2 * d)).toBeLessThan(1e-6);
  });

  it('rejects a ⟨r²⟩ that is zero or negative in plain words', () => {
    const r = solveLevel({ ...LI7_2P, r2M2: -1e-20 }, 1);
    expect(r.states).toEqual([]);
    expect(r.issues.map((i) => i.message).join(' ')).toContain('⟨r²⟩');
  });
});

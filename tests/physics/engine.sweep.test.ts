import { readFileSync } from 'node:fs';
import path from 'node:path';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { PLANCK_H } from '../../server/src/physics/constants';
import { engineLimits, solveLevel, sweepLevel } from '../../server/src/physics/engine';
import type { HyperfineLevelSpec } from '../../server/src/physics/engine';
import { CS133_6P32, RB87_5S } from './engine.fixtures';

interface RefCrossing {
  twoMA: number;
  rankA: number;
  twoMB: number;
  rankB: number;
  fieldT: number;
}
const ref = JSON.parse(readFileSync(path.join(__dirname, '../reference/engine_cs6p32.json'), 'utf8')) as {
  level: Omit<HyperfineLevelSpec, 'kind'>;
  crossings: RefCrossing[];
};

describe('sweepLevel', () => {
  it('agrees point by point with solveLevel (energies, moments, curvature, labels)', () => {
    const sweep = sweepLevel(CS133_6P32, -0.02, 0.3, 33, { curvature: true });
    expect(sweep.issues).toEqual([]);
    expect(sweep.fieldsT.length).toBe(33);
    expect(sweep.fieldsT[0]).toBe(-0.02);
    expect(sweep.fieldsT[32]).toBe(0.3);
    for (const p of [0, 7, 32]) {
      const single = solveLevel(CS133_6P32, sweep.fieldsT[p]).states;
      const ours = sweep.states.map((s) => ({ e: s.energyHz[p], m: s.momentJT[p], c: s.d2EdB2![p], twoM: s.twoM })).sort((a, b) => a.e - b.e);
      single.forEach((s, k) => {
        expect(Math.abs(ours[k].e - s.energyHz)).toBeLessThan(1e-6);
        expect(Math.abs(ours[k].m - s.momentJT)).toBeLessThan(1e-12 * 9.3e-24);
        expect(Math.abs(ours[k].c - s.d2EdB2)).toBeLessThanOrEqual(1e-9 * Math.abs(s.d2EdB2) + 1e-6);
      });
    }
    // labels belong to the B > 0 side (the larger |B| end) and each is used once
    expect(new Set(sweep.states.map((s) => s.low.text)).size).toBe(32);
    const end = solveLevel(CS133_6P32, 0.3).states;
    for (const s of sweep.states) {
      const match = end.find((x) => x.low.text === s.low.text)!;
      expect(match.high.text).toBe(s.high.text);
      expect(Math.abs(match.energyHz - s.energyHz[32])).toBeLessThan(1e-6);
    }
  });

  it('moments are −dE/dB: their integral over the sweep reproduces the energy change (Simpson rule)', () => {
    const sweep = sweepLevel(RB87_5S, 0, 0.2, 4001, { crossings: false });
    const h = sweep.fieldsT[1] - sweep.fieldsT[0];
    for (const s of sweep.states) {
      let sum = s.momentJT[0] + s.momentJT[4000];
      for (let p = 1; p < 4000; p++) sum += (p % 2 === 1 ? 4 : 2) * s.momentJT[p];
      const integral = (sum * h) / 3 / PLANCK_H; // ∫ μ dB / h = −ΔE/h
      const change = s.energyHz[4000] - s.energyHz[0];
      // Simpson error ~ range · h⁴ · E'''' / 180 is far below 1 mHz here; round-off ~1e-5 Hz
      expect(Math.abs(-integral - change)).toBeLessThan(1e-3);
    }
  });

  it('finds the same level crossings as the NumPy/SciPy reference (Cs 6P3/2, 0 to 1 T)', () => {
    const spec: HyperfineLevelSpec = { kind: 'hyperfine', ...ref.level };
    const sweep = sweepLevel(spec, 0, 1, 2001);
    expect(sweep.crossings.length).toBe(ref.crossings.length);
    sweep.crossings.forEach((c, k) => {
      const r = ref.crossings[k];
      expect(Math.abs(c.fieldT - r.fieldT)).toBeLessThan(1e-12 + 1e-9 * r.fieldT);
      const a = sweep.states[c.stateA];
      const b = sweep.states[c.stateB];
      expect(new Set([a.twoM, b.twoM])).toEqual(new Set([r.twoMA, r.twoMB]));
      // at the crossing the two states are degenerate in the exact engine
      const at = solveLevel(spec, c.fieldT).states;
      const ea = at.filter((s) => s.twoM === a.twoM).map((s) => s.energyHz);
      const eb = at.filter((s) => s.twoM === b.twoM).map((s) => s.energyHz);
      const gap = Math.min(...ea.flatMap((x) => eb.map((y) => Math.abs(x - y))));
      expect(gap).toBeLessThan(1e-3);
      expect(Math.abs(c.energyHz - ea.reduce((best, x) => (Math.abs(x - c.energyHz) < Math.abs(best - c.energyHz) ? x : best)))).toBeLessThan(1e-3);
    });
  });

  it('a sweep through zero reports the zero-field degeneracies as crossings at B = 0, and none from round-off at a start of 0', () => {
    const through = sweepLevel(RB87_5S, -1e-4, 1e-4, 41);
    expect(through.crossings.length).toBeGreaterThan(0);
    for (const c of through.crossings) expect(Math.abs(c.fieldT)).toBeLessThan(1e-15);
    const fromZero = sweepLevel(RB87_5S, 0, 1e-4, 41);
    expect(fromZero.crossings).toEqual([]);
  });

  it('can run downwards (from > to)', () => {
    const sweep = sweepLevel(RB87_5S, 0.5, 0, 11);
    expect(sweep.issues).toEqual([]);
    expect(sweep.fieldsT[10]).toBe(0);
    expect(sweep.states.length).toBe(8);
  });
});

describe('invalid input and caps come back as issues, never as exceptions', () => {
  const codes = (r: { issues: { code: string }[] }): string[] => r.issues.map((i) => i.code);

  it('bad point counts and an empty range', () => {
    expect(codes(sweepLevel(RB87_5S, 0, 1, 0))).toEqual(['bad-points']);
    expect(codes(sweepLevel(RB87_5S, 0, 1, -5))).toEqual(['bad-points']);
    expect(codes(sweepLevel(RB87_5S, 0, 1, 2.5))).toEqual(['bad-points']);
    expect(codes(sweepLevel(RB87_5S, 0.2, 0.2, 10))).toEqual(['empty-sweep']);
    expect(codes(sweepLevel(RB87_5S, 0, Number.NaN, 10))).toEqual(['bad-field']);
    expect(codes(solveLevel(RB87_5S, Number.POSITIVE_INFINITY))).toEqual(['bad-field']);
  });

  it('sweep and basis caps', () => {
    expect(codes(sweepLevel(RB87_5S, 0, 1, engineLimits.MAX_SWEEP_POINTS + 1))).toEqual(['sweep-too-long']);
    const big: HyperfineLevelSpec = { kind: 'hyperfine', twoJ: 15, twoI: 15, gJ: 1, gI: 0, A: 1e6 };
    expect(codes(sweepLevel(big, 0, 1, 200_000))).toEqual(['sweep-too-large']);
    const huge: HyperfineLevelSpec = { kind: 'hyperfine', twoJ: 1e9, twoI: 1e9, gJ: 1, gI: 0, A: 1e6 };
    expect(codes(solveLevel(huge, 0.1))).toEqual(['basis-too-large']);
    const wideBlock: HyperfineLevelSpec = { kind: 'hyperfine', twoJ: 300, twoI: 300, gJ: 1, gI: 0, A: 1e6 };
    expect(codes(solveLevel(wideBlock, 0.1))[0]).toMatch(/too-large/);
  });

  it('quadrupole or octupole where they cannot act: ignored with a warning, results still given', () => {
    const r = solveLevel({ ...RB87_5S, B: 1e6, C: 10 }, 0.01);
    expect(codes(r)).toEqual(['quadrupole-ignored', 'octupole-ignored']);
    expect(r.states.length).toBe(8);
    const plain = solveLevel(RB87_5S, 0.01);
    r.states.forEach((s, k) => expect(s.energyHz).toBe(plain.states[k].energyHz));
    const iHalf = solveLevel({ kind: 'hyperfine', twoJ: 3, twoI: 1, gJ: 1.33, gI: 0, A: 1e6, B: 1e5 }, 0);
    expect(codes(iHalf)).toEqual(['quadrupole-ignored']);
  });

  it('non-integer, negative or missing quantum numbers and constants', () => {
    expect(codes(solveLevel({ kind: 'hyperfine', twoJ: 1.5, twoI: 3, gJ: 2, gI: 0, A: 1 }, 0))).toEqual(['bad-momentum']);
    expect(codes(solveLevel({ kind: 'hyperfine', twoJ: -1, twoI: 3, gJ: 2, gI: 0, A: 1 }, 0))).toEqual(['bad-momentum']);
    expect(codes(solveLevel({ kind: 'hyperfine', twoJ: 1, twoI: 3, gJ: Number.NaN, gI: 0, A: 1 }, 0))).toEqual(['bad-constant']);
    expect(codes(solveLevel({ kind: 'fine', twoS: 1, L: 0.5, zeta: 1, gL: 1, gS: 2 }, 0))).toEqual(['bad-momentum']);
    expect(codes(solveLevel(null as unknown as HyperfineLevelSpec, 0))).toEqual(['bad-spec']);
    expect(codes(solveLevel({ kind: 'other' } as unknown as HyperfineLevelSpec, 0))).toEqual(['bad-spec']);
  });

  it('random specs, good or bad, never throw: either all sublevels or an error issue', () => {
    const anyNumber = fc.oneof(fc.double({ noNaN: false }), fc.integer({ min: -3, max: 12 }), fc.constant(undefined));
    fc.assert(
      fc.property(
        fc.record({ kind: fc.constantFrom('hyperfine', 'fine', 'x'), twoJ: anyNumber, twoI: anyNumber, twoS: anyNumber, L: anyNumber }),
        fc.record({ gJ: anyNumber, gI: anyNumber, A: anyNumber, B: anyNumber, C: anyNumber, zeta: anyNumber, gL: anyNumber, gS: anyNumber }),
        fc.double({ min: -50, max: 50, noNaN: true }),
        (q, k, field) => {
          const spec = { ...q, ...k } as unknown as HyperfineLevelSpec;
          const r = solveLevel(spec, field);
          const failed = r.issues.some((i) => i.severity === 'error');
          if (!failed) {
            const s0 = spec as unknown as Record<string, number>;
            const dim = q.kind === 'hyperfine' ? (s0.twoJ + 1) * (s0.twoI + 1) : (2 * s0.L + 1) * (s0.twoS + 1) * ((s0.twoI ?? 0) + 1);
            expect(r.states.length).toBe(dim);
            for (const s of r.states) expect(Number.isFinite(s.energyHz) && Number.isFinite(s.momentJT)).toBe(true);
          } else {
            expect(r.states).toEqual([]);
          }
        },
      ),
      { numRuns: 300 },
    );
  });
});

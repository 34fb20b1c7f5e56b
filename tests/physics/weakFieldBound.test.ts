/**
 * The bound that lets the regime scan skip solves (physics/engine/weakFieldBound.ts): wherever it
 * claims the linear test passes, the test as the scan computes it (exact solve against
 * E(F) + g_F m_F μ_B B) does pass, at the scan's steps and between them; it claims nothing past
 * the linear limit; and it does apply to ordinary levels at lab fields, so the scan is shorter.
 * The reference is the exact engine itself, solved at every field checked.
 */
import { describe, expect, it } from 'vitest';
import { BOHR_MAGNETON_HZ_PER_T } from '../../server/src/physics/constants';
import { buildLevelModel, regime } from '../../server/src/physics/engine';
import type { HyperfineLevelSpec, LevelSpec } from '../../server/src/physics/engine';
import { REGIME_INTERNALS } from '../../server/src/physics/engine/regime';
import { landeGJ } from '../../server/src/physics/gFactors';
import { BUILTIN_SPECIES, parseDesignation } from '../../server/src/physics/species';
import { makeWorkspace, solveBlockAt } from '../../server/src/physics/engine/blockSolver';
import type { LevelModel } from '../../server/src/physics/engine/levelModel';
import { linearProvenBetween } from '../../server/src/physics/engine/weakFieldBound';
import { CS133_6P32, GROUND_LEVELS, RB87_5S } from './engine.fixtures';
import { LI7_2P, RB87_5P } from './engine.wholeTerm.fixtures';

const FRACTION = 0.01;

/** Largest miss of the linear formula over the largest linear shift, as the regime scan computes it. */
function linearMissShare(model: LevelModel, f: number): number {
  const ws = makeWorkspace(model.largestBlock);
  let miss = 0;
  let maxSlope = 0;
  for (const block of model.blocks) {
    expect(solveBlockAt(block, f, ws)).toBe(true);
    for (let k = 0; k < block.size; k++) {
      const low = block.low[0][k]!;
      miss = Math.max(miss, Math.abs(ws.values[k]! - (low.zeroFieldHz + low.slopeHzPerT * f)));
      maxSlope = Math.max(maxSlope, Math.abs(low.slopeHzPerT));
    }
  }
  return miss / (maxSlope * f);
}

function maxSlopeOf(model: LevelModel): number {
  let s = 0;
  for (const b of model.blocks) for (const l of b.low[0]) s = Math.max(s, Math.abs(l.slopeHzPerT));
  return s;
}

/** A small deterministic generator, so a failure names its case. */
function lcg(seed: number): () => number {
  let x = seed >>> 0;
  return () => ((x = (Math.imul(x, 1664525) + 1013904223) >>> 0) / 2 ** 32);
}

function randomLevel(r: () => number): HyperfineLevelSpec {
  const twoJ = 1 + Math.floor(r() * 9);
  const twoI = 1 + Math.floor(r() * 9);
  const sign = () => (r() < 0.5 ? -1 : 1);
  return {
    kind: 'hyperfine',
    twoJ,
    twoI,
    gJ: sign() * (0.1 + 2 * r()),
    gI: sign() * 1e-3 * r(),
    A: sign() * 10 ** (6 + 4 * r()),
    B: r() < 0.5 ? 0 : sign() * 10 ** (5 + 4 * r()),
    C: r() < 0.8 ? 0 : sign() * 10 ** (2 + 3 * r()),
  };
}

/** A made-up heavy level: J = 15/2, I = 5/2, A = 650 MHz, B = 1.1 GHz (the demo file's invented numbers). */
const DEMO_LEVEL: HyperfineLevelSpec = { kind: 'hyperfine', twoJ: 15, twoI: 5, gJ: 1.3268, gI: 2.01 * 7.622593e-4 / 2.5 / 1.0011596, A: 650e6, B: 1.1e9, C: 0 };

describe('the weak-field bound', () => {
  it('wherever it holds, the computed linear test passes, at 25 fields across the range (200 random levels)', () => {
    const r = lcg(20261202);
    let proven = 0;
    for (let c = 0; c < 200; c++) {
      const spec = randomLevel(r);
      const model = buildLevelModel(spec).model!;
      const lin = regime(spec, 1e-4, FRACTION).linearLimitT;
      // The scan starts near 1e-7 of the linear limit (1e-9 of the characteristic field).
      const fLo = lin * 1e-7 * (0.5 + r());
      const fHi = lin * 10 ** (-3 * r()) * (r() < 0.2 ? 2 : 1);
      if (!linearProvenBetween(model, FRACTION, maxSlopeOf(model), fLo, fHi)) continue;
      proven++;
      expect(fHi, JSON.stringify(spec)).toBeLessThan(lin);
      for (let i = 0; i <= 24; i++) {
        const f = fLo * (fHi / fLo) ** (i / 24);
        expect(linearMissShare(model, f), `${JSON.stringify(spec)} at ${f} T`).toBeLessThanOrEqual(FRACTION);
      }
    }
    // Not vacuous: many levels are proven well below their limits (78 of these 200).
    expect(proven).toBeGreaterThan(50);
  });

  it('claims nothing at or past the linear limit', () => {
    for (const [name, spec] of [...GROUND_LEVELS, ['Cs 6P3/2', CS133_6P32] as const, ['demo', DEMO_LEVEL] as const]) {
      const model = buildLevelModel(spec).model!;
      const lin = regime(spec, 1e-4, FRACTION).linearLimitT;
      expect(linearProvenBetween(model, FRACTION, maxSlopeOf(model), lin * 1e-9, lin), name).toBe(false);
      expect(linearProvenBetween(model, FRACTION, maxSlopeOf(model), lin * 1e-9, 1.5 * lin), name).toBe(false);
    }
  });

  it('proves lab fields weak for ordinary levels: the demo level and 87Rb 5S1/2 from the scan\'s first step to 1 G', () => {
    for (const spec of [DEMO_LEVEL, RB87_5S]) {
      const model = buildLevelModel(spec).model!;
      const characteristicField = model.zeroFieldSpreadHz / (Math.abs(spec.gJ - spec.gI) * BOHR_MAGNETON_HZ_PER_T);
      expect(linearProvenBetween(model, FRACTION, maxSlopeOf(model), 1e-9 * characteristicField, 1e-4)).toBe(true);
      expect(regime(spec, 1e-4).verdict).toBe('weak field (linear)');
    }
  });

  it('is not used for other kinds of level (a fine-structure term)', () => {
    const fine = buildLevelModel({ kind: 'fine', twoS: 1, L: 1, zeta: 1e12, gL: 1, gS: 2.0023, twoI: 0, gI: 0 }).model!;
    expect(linearProvenBetween(fine, FRACTION, maxSlopeOf(fine), 1e-12, 1e-6)).toBe(false);
  });
});

/** Every built-in species' levels as hyperfine levels: published A, B, C, g_J where given, else the Landé g_J. */
function builtinLevels(): [string, HyperfineLevelSpec][] {
  const out: [string, HyperfineLevelSpec][] = [];
  for (const sp of BUILTIN_SPECIES) {
    for (const level of sp.levels) {
      const d = parseDesignation(level.designation)!;
      const twoI = sp.twoI.value;
      const spec: HyperfineLevelSpec = {
        kind: 'hyperfine',
        twoJ: d.twoJ,
        twoI,
        gJ: level.gJ?.value ?? landeGJ(d.multiplicity - 1, d.L, d.twoJ),
        gI: twoI > 0 ? sp.gI?.value ?? 0 : 0,
        A: twoI > 0 && d.twoJ > 0 ? level.A?.value ?? 0 : 0,
      };
      if (twoI >= 2 && d.twoJ >= 2 && level.B) spec.B = level.B.value;
      if (twoI >= 3 && d.twoJ >= 3 && level.C) spec.C = level.C.value;
      out.push([`${sp.id} ${level.key}`, spec]);
    }
  }
  return out;
}

/** Verdict at each field (asked first, as the evaluation does: that is where the bound acts), then both limits and x. */
function regimeAnswers(spec: LevelSpec, fieldsT: readonly number[]): unknown[] {
  return fieldsT.map((b) => {
    const r = regime(spec, b, FRACTION);
    return [r.verdict, r.linearLimitT, r.strongLimitT, r.x];
  });
}

describe('the regime scan with and without the weak-field bound', () => {
  // Lab fields from 1 nT to 10 T: the bound is tried when the verdict is asked before the limits.
  const FIELDS = [1e-9, 1e-6, 1e-4, 3e-3, 0.1, 1, 10];
  const fine = (twoS: number, L: number, zeta: number): LevelSpec => ({ kind: 'fine', twoS, L, zeta, gL: 1, gS: 2.0023, twoI: 0, gI: 0 });
  const r = lcg(20261203);
  const cases: [string, LevelSpec][] = [
    ...builtinLevels(),
    ...GROUND_LEVELS,
    ['Cs 6P3/2', CS133_6P32],
    ['demo', DEMO_LEVEL],
    // Whole terms and fine-structure terms (the bound does not apply to them: same answers by construction, checked all the same).
    ['7Li 2P whole term', LI7_2P],
    ['87Rb 5P whole term', RB87_5P],
    ['fine 2P', fine(1, 1, 1e10)],
    ['fine 3D', fine(2, 2, 3e11)],
    ...Array.from({ length: 80 }, (_, i): [string, LevelSpec] => [`invented ${i}`, randomLevel(r)]),
  ];

  it(`gives identical verdicts and limits for ${cases.length} levels (every built-in level, whole terms, invented ones)`, () => {
    let proven = 0;
    for (const [name, spec] of cases) {
      REGIME_INTERNALS.useWeakFieldBound = false;
      let without: unknown[];
      try {
        without = regimeAnswers(spec, FIELDS);
      } finally {
        REGIME_INTERNALS.useWeakFieldBound = true;
      }
      expect(regimeAnswers(spec, FIELDS), `${name}: ${JSON.stringify(spec)}`).toEqual(without);
      // Not vacuous: count the levels whose lab fields the bound proves weak from the scan's first step.
      const model = buildLevelModel(spec).model;
      if (model && spec.kind === 'hyperfine' && model.zeroFieldSpreadHz > 0) {
        const bc = model.zeroFieldSpreadHz / (Math.abs(spec.gJ - spec.gI) * BOHR_MAGNETON_HZ_PER_T);
        if (linearProvenBetween(model, FRACTION, maxSlopeOf(model), 1e-9 * bc, 1e-6)) proven++;
      }
    }
    expect(proven).toBeGreaterThan(40);
  });
});

/**
 * Against SymPy / NumPy / SciPy: tests/reference/transitions_strengths.json is written by
 * scripts/reference/transitions_strengths.py (library versions recorded in the JSON).
 * - sodium D, I = 0: exact 3j strengths (SymPy wigner_3j);
 * - 87Rb D2 at zero field: coupled-basis formula with 6j symbols (SymPy wigner_6j) — an
 *   independent route to the engine-eigenvector + uncoupled-3j calculation;
 * - 87Rb D2 at 1e-4, 0.01, 0.1, 5 T and 87Rb 5S M1 at 1e-4, 0.05, 1 T: numpy.linalg.eigh per m block;
 * - 87Rb 5S M1 at zero field: Wigner–Eckart with 6j symbols, checked in the script against
 *   explicit Clebsch–Gordan states;
 * - the |1,−1> ↔ |2,+1> field-insensitive point from the closed Breit–Rabi formula (SciPy brentq).
 */
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { BOHR_MAGNETON_HZ_PER_T } from '../../server/src/physics/constants';
import { solveLevel } from '../../server/src/physics/engine';
import type { HyperfineLevelSpec, LowFieldLabel } from '../../server/src/physics/engine';
import { electricDipoleLine, fieldInsensitivePoints, magneticTransitions } from '../../server/src/physics/transitions';
import { bareLevel } from './transitions.fixtures';

interface SodiumRow {
  twoMLower: number;
  twoMUpper: number;
  q: number;
  offsetMuB: [number, number];
  strength: [number, number];
}
interface Keyed {
  lowerTwoM: number;
  lowerRank: number;
  upperTwoM: number;
  upperRank: number;
  strength: number;
}
interface Reference {
  libraries: Record<string, string>;
  muBOverHHzPerT: number;
  sodiumD1: { components: SodiumRow[] };
  sodiumD2: { components: SodiumRow[] };
  rb87Levels: { ground: Omit<HyperfineLevelSpec, 'kind'>; upper: Omit<HyperfineLevelSpec, 'kind'> };
  rb87D2ZeroField: {
    components: { twoF: number; twoMF: number; twoFUpper: number; twoMFUpper: number; strength: number }[];
    factorsSFF: { twoF: number; twoFUpper: number; S: number }[];
  };
  rb87D2Fields: { fieldT: number; components: (Keyed & { offsetHz: number })[] }[];
  rb87GroundM1ZeroField: { twoF: number; twoMF: number; twoFUpper: number; twoMFUpper: number; strength: number }[];
  rb87GroundM1Fields: { fieldT: number; transitions: (Keyed & { frequencyHz: number; dfdB: number })[] }[];
  rb87TwoPhotonPointBreitRabiT: number;
}

const ref = JSON.parse(readFileSync(path.join(__dirname, '../reference/transitions_strengths.json'), 'utf8')) as Reference;
const GROUND: HyperfineLevelSpec = { kind: 'hyperfine', ...ref.rb87Levels.ground };
const UPPER: HyperfineLevelSpec = { kind: 'hyperfine', ...ref.rb87Levels.upper };

function fOf(l: LowFieldLabel): [number, number] {
  if (l.scheme !== 'F') throw new Error('F labels expected');
  return [l.twoF, l.twoMF];
}

/** engine index → rank among the states of the same m block (by energy), as the script keys them. */
function blockRanks(spec: HyperfineLevelSpec, fieldT: number): Map<number, number> {
  const ranks = new Map<number, number>();
  const seen = new Map<number, number>();
  for (const s of solveLevel(spec, fieldT).states) {
    const r = seen.get(s.twoM) ?? 0;
    ranks.set(s.index, r);
    seen.set(s.twoM, r + 1);
  }
  return ranks;
}

describe(`reference vectors (SymPy ${ref.libraries.sympy}, NumPy ${ref.libraries.numpy}, SciPy ${ref.libraries.scipy})`, () => {
  it('μ_B/h used by the script is the project constant (CODATA 2022)', () => {
    expect(Math.abs(ref.muBOverHHzPerT / BOHR_MAGNETON_HZ_PER_T - 1)).toBeLessThan(1e-15);
  });

  it('sodium D1 and D2 (I = 0): offsets and exact 3j strengths', () => {
    for (const [upper, rows] of [
      [bareLevel(1, 1, 1), ref.sodiumD1.components],
      [bareLevel(1, 1, 3), ref.sodiumD2.components],
    ] as const) {
      const r = electricDipoleLine(bareLevel(1, 0, 1), upper, 0.25);
      expect(r.components.length).toBe(rows.length);
      for (const row of rows) {
        const c = r.components.find((x) => x.lower.twoM === row.twoMLower && x.upper.twoM === row.twoMUpper);
        expect(c).toBeDefined();
        expect(c?.q).toBe(row.q);
        expect(c?.strength).toBeCloseTo(row.strength[0] / row.strength[1], 14);
        expect((c?.offsetHz ?? 0) / (BOHR_MAGNETON_HZ_PER_T * 0.25)).toBeCloseTo(row.offsetMuB[0] / row.offsetMuB[1], 12);
      }
    }
  });

  it('87Rb D2 at zero field: every hyperfine component equals the 6j coupled-basis value', () => {
    const r = electricDipoleLine(GROUND, UPPER, 0);
    const rows = ref.rb87D2ZeroField.components;
    expect(r.components.length).toBe(rows.length);
    let worst = 0;
    for (const c of r.components) {
      const [tf, tm] = fOf(c.lower.low);
      const [tfp, tmp] = fOf(c.upper.low);
      const row = rows.find((x) => x.twoF === tf && x.twoMF === tm && x.twoFUpper === tfp && x.twoMFUpper === tmp);
      expect(row).toBeDefined();
      worst = Math.max(worst, Math.abs(c.strength - (row?.strength ?? NaN)));
    }
    expect(worst).toBeLessThan(1e-12);
  });

  it('87Rb D2 at zero field: F-summed factors S_FF′ = (2F′+1)(2J+1){J J′ 1; F′ F I}² (1/6, 5/12, 5/12; 1/20, 1/4, 7/10 — D-line data compilation table, from memory)', () => {
    const r = electricDipoleLine(GROUND, UPPER, 0);
    // Summed over m, m′ and divided by the lower-level weight (2F+1)(2J′+1)/(2J+1) of this normalisation.
    const sums = new Map<string, number>();
    for (const c of r.components) {
      const k = `${fOf(c.lower.low)[0]}-${fOf(c.upper.low)[0]}`;
      sums.set(k, (sums.get(k) ?? 0) + c.strength);
    }
    const memory: Record<string, number> = { '2-0': 1 / 6, '2-2': 5 / 12, '2-4': 5 / 12, '4-2': 1 / 20, '4-4': 1 / 4, '4-6': 7 / 10 };
    for (const f of ref.rb87D2ZeroField.factorsSFF) {
      const k = `${f.twoF}-${f.twoFUpper}`;
      const mine = ((sums.get(k) ?? 0) * (GROUND.twoJ + 1)) / ((f.twoF + 1) * (UPPER.twoJ + 1));
      expect(mine).toBeCloseTo(f.S, 12);
      if (f.S > 0) expect(f.S).toBeCloseTo(memory[k], 12);
    }
  });

  for (const set of ref.rb87D2Fields) {
    it(`87Rb D2 at ${set.fieldT} T: offsets and strengths match NumPy block diagonalisation`, () => {
      const r = electricDipoleLine(GROUND, UPPER, set.fieldT);
      const lr = blockRanks(GROUND, set.fieldT);
      const ur = blockRanks(UPPER, set.fieldT);
      const mine = new Map(
        r.components.map((c) => [`${c.lower.twoM},${lr.get(c.lower.index)},${c.upper.twoM},${ur.get(c.upper.index)}`, c]),
      );
      const wanted = set.components.filter((x) => x.strength > 1e-10);
      expect([...mine.values()].filter((c) => c.strength > 1e-10).length).toBe(wanted.length);
      for (const w of wanted) {
        const c = mine.get(`${w.lowerTwoM},${w.lowerRank},${w.upperTwoM},${w.upperRank}`);
        expect(c).toBeDefined();
        expect(Math.abs((c?.strength ?? NaN) - w.strength)).toBeLessThan(1e-10);
        expect(Math.abs((c?.offsetHz ?? NaN) - w.offsetHz)).toBeLessThan(1e-3 + 1e-12 * Math.abs(w.offsetHz));
      }
    });
  }

  it('87Rb 5S1/2 M1 elements at zero field equal the Wigner–Eckart/6j values', () => {
    const ts = magneticTransitions(GROUND, 0).transitions;
    expect(ts.length * 2).toBe(ref.rb87GroundM1ZeroField.length);
    for (const t of ts) {
      const [a, ma] = fOf(t.lower.low);
      const [b, mb] = fOf(t.upper.low);
      const row = ref.rb87GroundM1ZeroField.find((x) => x.twoF === a && x.twoMF === ma && x.twoFUpper === b && x.twoMFUpper === mb);
      expect(row).toBeDefined();
      expect(Math.abs((t.strength ?? NaN) - (row?.strength ?? NaN))).toBeLessThan(1e-12);
    }
  });

  for (const set of ref.rb87GroundM1Fields) {
    it(`87Rb 5S1/2 M1 at ${set.fieldT} T: frequency, df/dB and strength match NumPy`, () => {
      const ts = magneticTransitions(GROUND, set.fieldT).transitions;
      const rk = blockRanks(GROUND, set.fieldT);
      expect(ts.length).toBe(set.transitions.length);
      for (const w of set.transitions) {
        const t = ts.find(
          (x) =>
            x.lower.twoM === w.lowerTwoM && rk.get(x.lower.index) === w.lowerRank && x.upper.twoM === w.upperTwoM && rk.get(x.upper.index) === w.upperRank,
        );
        expect(t).toBeDefined();
        expect(Math.abs((t?.frequencyHz ?? NaN) - w.frequencyHz)).toBeLessThan(1e-4 + 1e-12 * w.frequencyHz);
        expect(Math.abs((t?.dfdB ?? NaN) - w.dfdB)).toBeLessThan(1e-3 + 1e-9 * Math.abs(w.dfdB));
        expect(Math.abs((t?.strength ?? NaN) - w.strength)).toBeLessThan(1e-11);
      }
    });
  }

  it('the two-photon field-insensitive point agrees with the closed Breit–Rabi formula to 1e-10 relative', () => {
    const r = fieldInsensitivePoints(GROUND, { lower: { twoF: 2, twoMF: -2 }, upper: { twoF: 4, twoMF: 2 } }, { fromT: 1e-4, toT: 1e-3 });
    expect(r.points.length).toBe(1);
    expect(Math.abs(r.points[0].fieldT / ref.rb87TwoPhotonPointBreitRabiT - 1)).toBeLessThan(1e-10);
  });
});

/**
 * The one widen-the-table loop (physics/beam/trajectory/widenedTable.ts) that the beam's flights
 * and the re-flights share: fourfold widenings, twice at most; and the re-flights through it
 * against the closed form of a uniform gradient, k = μ G (L1²/2 + L1 L2)/M (docs/beam.md §1).
 */
import { describe, expect, it } from 'vitest';
import { ATOMIC_MASS_UNIT, BOHR_MAGNETON } from '../../server/src/physics/constants';
import type { HyperfineLevelSpec } from '../../server/src/physics/engine';
import { CoefficientFlyer, sublevelCurves, type SublevelCurves } from '../../server/src/physics/beam/trajectory';
import { BEYOND_TABLE, flyWideningTable } from '../../server/src/physics/beam/trajectory/widenedTable';
import { uniformGradientField } from './trajectoryFields';

const bare: HyperfineLevelSpec = { kind: 'hyperfine', twoJ: 1, twoI: 0, gJ: 2.00231930436, gI: 0, A: 0 };
const someCurves = sublevelCurves(bare, 1).curves!;

describe('flyWideningTable', () => {
  it('widens fourfold while the atoms stray beyond the table, and keeps the range that held them', () => {
    const asked: number[] = [];
    const table = (maxT: number) => (asked.push(maxT), { curves: someCurves, issues: [] });
    let tries = 0;
    const out = flyWideningTable(0.5, table, (_c: SublevelCurves) => (++tries < 3 ? BEYOND_TABLE : 'flown'));
    expect(asked).toEqual([0.5, 2, 8]);
    expect(out).toMatchObject({ kind: 'flown', value: 'flown', maxT: 8 });
  });
  it('gives up after the second widening, and says which range would have come next', () => {
    const out = flyWideningTable(1, () => ({ curves: someCurves, issues: [] }), () => BEYOND_TABLE);
    expect(out).toEqual({ kind: 'beyond', maxT: 64 });
  });
  it('takes any flown value for flown, a string "beyond" too: only the sentinel means beyond the table', () => {
    expect(flyWideningTable(1, () => ({ curves: someCurves, issues: [] }), () => 'beyond')).toMatchObject({ kind: 'flown', value: 'beyond', maxT: 1 });
    expect(typeof BEYOND_TABLE).toBe('symbol');
  });
  it('passes on why the table could not be built', () => {
    const issues = [{ severity: 'error' as const, code: 'trajectory-level-unusable', message: 'no level' }];
    expect(flyWideningTable(1, () => ({ issues }), () => 'never')).toEqual({ kind: 'no-table', issues });
  });
});

describe('re-flights with too narrow a table', () => {
  it('widen it and fly the closed-form coefficients (moments ±g_J μ_B/2), one wasted flight', () => {
    const mass = 39 * ATOMIC_MASS_UNIT;
    const L1 = 0.1, L2 = 0.5, G = 200, B0 = 0.5, v = 700;
    const labels = someCurves.labels.map((l) => l.low);
    const flyer = new CoefficientFlyer();
    // 0.2 T is below the 0.5 T on the line: the first flight strays beyond, the table grows to 0.8 T.
    const { k } = flyer.fly({ field: uniformGradientField(B0, G), centre: [0, 0, 0], magnetLengthM: L1, driftM: L2, massKg: mass, spec: bare, labels, maxFieldT: 0.2 }, v);
    const lever = L1 * L1 / 2 + L1 * L2;
    k!.forEach((ki) => expect(Math.abs(Math.abs((ki * mass) / (G * lever)) / ((bare.gJ * BOHR_MAGNETON) / 2) - 1)).toBeLessThan(1e-9));
    expect(flyer.flights).toBe(1 + labels.length);
  });
});

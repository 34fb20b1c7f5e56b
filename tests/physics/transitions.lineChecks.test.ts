/**
 * `electricDipoleLineChecks` (what the evaluation runs for every line at every field) reports what
 * `electricDipoleLine` reports — issues, sum-rule deviation, line centre, formula g_eff — without
 * building the components, which the evaluation builds when they are read (eval/lineComponentsRecipe.ts).
 */
import { describe, expect, it } from 'vitest';
import type { HyperfineLevelSpec } from '../../server/src/physics/engine';
import { electricDipoleLine, electricDipoleLineChecks } from '../../server/src/physics/transitions';
import { buildLineComponents } from '../../server/src/eval/lineComponentsRecipe';
import { lineComponentRows } from '../../server/src/eval/lineComponents';

// An nS1/2 → nP3/2 line of a nucleus with I = 3/2 (constants of the generated benchmark file, invented).
const lower: HyperfineLevelSpec = { kind: 'hyperfine', twoJ: 1, twoI: 3, gJ: 2.00231930436, gI: -0.000995, A: 3417.34e6 };
const upper: HyperfineLevelSpec = { kind: 'hyperfine', twoJ: 3, twoI: 3, gJ: 1.3341, gI: -0.000995, A: 84.72e6, B: 12.5e6 };

describe('electricDipoleLineChecks', () => {
  it.each([0, 1e-4, 0.05, 0.4, 3])('reports what electricDipoleLine reports at %s T, without components', (fieldT) => {
    const opts = { lowerEnergyHz: 0, upperEnergyHz: 384.23e12 };
    const full = electricDipoleLine(lower, upper, fieldT, opts);
    const checks = electricDipoleLineChecks(lower, upper, fieldT, opts);
    expect(checks.issues).toEqual(full.issues);
    expect(checks.sumRuleDeviation).toBe(full.sumRuleDeviation);
    expect(checks.lineCentreHz).toBe(384.23e12);
    expect(checks.gEff?.formula).toBe(full.gEff?.formula);
    expect(checks.components).toEqual([]);
    // The sum rule (file header of electricDipoleLine.ts): 1 out of every upper sublevel, 16 of them
    // (within the components dropped below 1e-12 of the strongest).
    const out = new Map<number, number>();
    for (const c of full.components) out.set(c.upper.index, (out.get(c.upper.index) ?? 0) + c.strength);
    expect(out.size).toBe(16);
    for (const s of out.values()) expect(s).toBeCloseTo(1, 10);
  });

  it('passes a ΔJ = 2 error on as electricDipoleLine does', () => {
    const d: HyperfineLevelSpec = { ...upper, twoJ: 5 };
    expect(electricDipoleLineChecks(lower, d, 0.1).issues.map((i) => i.code)).toEqual(electricDipoleLine(lower, d, 0.1).issues.map((i) => i.code));
    expect(electricDipoleLineChecks(lower, d, 0.1).issues.map((i) => i.code)).toContain('line-delta-j');
  });
});

describe('a line’s components built from their recipe', () => {
  it('are the rows of electricDipoleLine at that field, energies included', () => {
    const energies = { lowerEnergyHz: 0, upperEnergyHz: 384.23e12 };
    const rows = buildLineComponents({ kind: 'components', lower, upper, fieldT: 0.4, energies });
    expect(rows).toEqual(lineComponentRows(electricDipoleLine(lower, upper, 0.4, energies).components));
    expect(rows[0]!.absolute_Hz).toBe(384.23e12 + rows[0]!.offset_Hz);
    expect(Object.keys(rows[0]!)).toEqual(['offset_Hz', 'absolute_Hz', 'strength', 'polarization', 'lower_label', 'upper_label', 'along_field', 'across_field']);
    const bare = buildLineComponents({ kind: 'components', lower, upper, fieldT: 0.4, energies: {} });
    expect(Object.keys(bare[0]!)).not.toContain('absolute_Hz');
  });
});

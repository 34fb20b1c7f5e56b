/**
 * The evaluation entry of a field source (the physics core's field, cleaned): centre field and
 * gradient of Helmholtz and anti-Helmholtz pairs against the textbook closed forms (the probe point
 * of a coil lies on its axis, where the loops' on-axis field is exact), the winding's numbers,
 * cautions and problems.
 */
import { describe, expect, it } from 'vitest';
import type { Problem } from '../../server/src/format/ast';
import { evaluateFieldSource, probePoint, type SourceEvalInput } from '../../server/src/eval/fieldSourceEvaluation';
import { sourceHeadline, sourceLines } from '../../server/src/eval/fieldSourceText';
import type { FieldFunction, FieldSourceSpec, Mat3, Vec3 } from '../../server/src/physics/fields/types';

const MU0 = 1.25663706127e-6; // CODATA 2022 μ0 (N/A²)
const RANGE = { start: { line: 0, character: 5 }, end: { line: 0, character: 9 } };

/**
 * Loops on the z axis, at points on the z axis only: B_z = μ0 NI R² / 2(R² + z²)^{3/2}, and by
 * symmetry and ∇·B = 0, ∂B_x/∂x = ∂B_y/∂y = −½ ∂B_z/∂z (standard electromagnetism).
 */
function onAxisLoops(parts: readonly FieldSourceSpec[]): FieldFunction {
  return (p: Vec3) => {
    let bz = 0;
    let dbz = 0;
    for (const l of parts) {
      if (l.kind !== 'loop') throw new Error('loops only');
      const z = p[2] - l.centre[2];
      const r2 = l.radiusM ** 2 + z * z;
      bz += (MU0 * l.ampereTurns * l.radiusM ** 2) / (2 * r2 ** 1.5);
      dbz += (-3 * MU0 * l.ampereTurns * l.radiusM ** 2 * z) / (2 * r2 ** 2.5);
    }
    const g: Mat3 = [[-dbz / 2, 0, 0], [0, -dbz / 2, 0], [0, 0, dbz]];
    return { B: [0, 0, bz], gradient: g };
  };
}

function pair(radius: number, spacing: number, ampereTurns: number, sense: 'same' | 'opposite'): FieldSourceSpec[] {
  return [
    { kind: 'loop', centre: [0, 0, spacing / 2], axis: [0, 0, 1], radiusM: radius, ampereTurns },
    { kind: 'loop', centre: [0, 0, -spacing / 2], axis: [0, 0, 1], radiusM: radius, ampereTurns: sense === 'same' ? ampereTurns : -ampereTurns },
  ];
}

const coil = (over: Partial<SourceEvalInput>): SourceEvalInput => ({ name: 'quad', kind: 'coil', nameRange: RANGE, parts: [], ...over });

describe('a coil pair at its centre', () => {
  it('Helmholtz spacing: B = (4/5)^{3/2} μ0 N I / R (textbook electromagnetism, e.g. Griffiths, Introduction to Electrodynamics; from memory)', () => {
    const R = 0.05;
    const NI = 100 * 2;
    const r = evaluateFieldSource(coil({ parts: pair(R, R, NI, 'same'), radiusM: R, spacingM: R, sense: 'same', turns: 100, currentA: 2 }), []);
    expect(r.centre_m).toEqual([0, 0, 0]);
    expect(r.field_abs_T! / ((4 / 5) ** 1.5 * MU0 * NI / R)).toBeCloseTo(1, 12);
    // The axial derivative cancels exactly at the centre of a same-sense pair: printed as 0, not 1e-19.
    expect(r.axial_gradient_T_per_m).toBe(0);
    expect(r.pair).toEqual({ sense: 'same', spacing_m: R, spacing_over_radius: 1 });
    expect(sourceHeadline(r)).toBe('coil quad: a pair wound in the same sense, spacing 5 cm = 1 R (Helmholtz spacing)');
  });

  it('opposite sense at spacing √3 R: ∂B_z/∂z = (48√3 / 49√7) μ0 N I / R² (closed form of the on-axis field), B = 0', () => {
    const R = 0.035;
    const NI = 120 * 15;
    const d = Math.sqrt(3) * R;
    const r = evaluateFieldSource(coil({ parts: pair(R, d, NI, 'opposite'), radiusM: R, spacingM: d, sense: 'opposite' }), []);
    expect(r.field_T).toEqual([0, 0, 0]);
    expect(r.field_abs_T).toBe(0);
    const expected = ((48 * Math.sqrt(3)) / (49 * Math.sqrt(7))) * MU0 * NI / R ** 2;
    expect(Math.abs(r.axial_gradient_T_per_m!) / expected).toBeCloseTo(1, 12);
    expect(r.gradient_T_per_m![0]![0]).toBeCloseTo(-r.axial_gradient_T_per_m! / 2, 15);
    // The whole tensor is the on-axis closed form's (off-diagonal entries 0 by symmetry).
    const exact = onAxisLoops(pair(R, d, NI, 'opposite'))([0, 0, 0]).gradient;
    for (let i = 0; i < 3; i++) {
      for (let j = 0; j < 3; j++) expect(Math.abs(r.gradient_T_per_m![i]![j]! - exact[i]![j]!)).toBeLessThanOrEqual(1e-12 * expected);
    }
    expect(sourceHeadline(r)).toContain('(√3 R: the most uniform gradient)');
    const lines = sourceLines(r);
    expect(lines[0]).toBe('at the centre (0, 0, 0) m: |B| = 0 G, B = (0, 0, 0) G');
    // Positive: just above the centre the upper (positive) loop is nearer.
    expect(lines[1]).toMatch(/^axial gradient ∂B_z\/∂z = 1\.18\d+ T\/m = 118\.\d+ G\/cm$/);
  });
});

describe('the winding of a coil', () => {
  // 120 turns per coil, two coils of 3.5 cm radius: 52.779 m of 1.2 mm copper; at 15 A 13.26 A/mm², R = 0.8046 Ω, 181.0 W, 12.07 V (hand-computed).
  const input = coil({ parts: pair(0.035, 0.07, 1800, 'opposite'), radiusM: 0.035, spacingM: 0.07, sense: 'opposite', turns: 120, currentA: 15, conductorM: 1.2e-3, conductorRange: RANGE });

  it('gives wire length, resistance, current density, power and voltage', () => {
    const problems: Problem[] = [];
    const r = evaluateFieldSource(input, problems);
    expect(r.winding!.wire_length_m).toBeCloseTo(52.778757, 5);
    expect(r.winding!.resistance_ohm).toBeCloseTo(0.8045977, 6);
    expect(r.winding!.power_W).toBeCloseTo(181.03448, 4);
    expect(r.winding!.voltage_V).toBeCloseTo(12.068966, 5);
    expect(r.winding!.cooling).toBe('water');
    // The caution and the finding quote the winding line's own numbers, digit for digit.
    expect(r.cautions[0]).toMatch(/^Coil heating \(181 W at 13\.26 A\/mm², 12\.07 V\): .*water cooling/);
    expect(problems.map((p) => [p.code, p.severity])).toEqual([['coil-needs-cooling', 'info']]);
    expect(problems[0]!.message).toBe("coil 'quad' carries 13.26 A/mm² in 1.2 mm copper, 181 W: more than air-cooled windings carry continuously (about 3 A/mm², common practice); plan water cooling or a thicker conductor.");
    expect(problems[0]!.range).toBe(RANGE);
    expect(sourceLines(r)[2]).toBe('winding: 52.78 m of 1.2 mm copper, 0.8046 Ω at 20 °C; 13.26 A/mm², 181 W, 12.07 V (needs water cooling)');
  });

  it('warns when even water cooling would not do', () => {
    const problems: Problem[] = [];
    evaluateFieldSource({ ...input, conductorM: 0.5e-3 }, problems);
    expect(problems.map((p) => [p.code, p.severity])).toEqual([['coil-overheats', 'warning']]);
  });

  it('raises nothing for an air-cooled winding and has no winding without a conductor', () => {
    const problems: Problem[] = [];
    const r = evaluateFieldSource({ ...input, conductorM: 3e-3 }, problems);
    expect(r.winding!.cooling).toBe('air');
    expect(problems).toEqual([]);
    expect(evaluateFieldSource({ ...input, conductorM: undefined }, problems).winding).toBeUndefined();
  });
});

describe('the implant caution quotes the centre field as the report line prints it', () => {
  // Two 40 A wires 4 mm apart, 20 cm long: |B| midway = 2 μ0 I / 2π d · L/√(L² + d²) = 79.984 G (Biot–Savart, finite segment).
  const wires = (unit: string | undefined): SourceEvalInput => ({
    name: 'rail',
    kind: 'wire',
    nameRange: RANGE,
    parts: [
      { kind: 'wire', point: [0, 0.002, 0], direction: [1, 0, 0], currentA: 40, lengthM: 0.2 },
      { kind: 'wire', point: [0, -0.002, 0], direction: [1, 0, 0], currentA: -40, lengthM: 0.2 },
    ],
    ...(unit ? { fieldUnit: unit } : {}),
  });
  it.each([
    [undefined, '79.984 G'],
    ['mT', '7.9984 mT'],
  ])('fields written in %s: %s in both', (unit, text) => {
    const r = evaluateFieldSource(wires(unit), []);
    expect(sourceLines(r)[0]).toContain(`|B| = ${text},`);
    expect(r.cautions[0]).toContain(`(${text} at the centre)`);
  });
});

describe('where a source is probed', () => {
  it('a wire with its return: midway; a lone wire: nowhere; a block: its centre', () => {
    expect(probePoint([
      { kind: 'wire', point: [0, 0.002, 0], direction: [1, 0, 0], currentA: 4 },
      { kind: 'wire', point: [0, -0.002, 0], direction: [1, 0, 0], currentA: -4 },
    ])).toEqual([0, 0, 0]);
    expect(probePoint([{ kind: 'wire', point: [0, 1, 0], direction: [1, 0, 0], currentA: 4 }])).toBeUndefined();
    expect(probePoint([{ kind: 'slab', centre: [0, 0, 0.01], sizeM: [0.01, 0.01, 0.01], magnetisationT: [0, 0, 1] }])).toEqual([0, 0, 0.01]);
  });

  it('a source with problems has parts [] and no values, and says so', () => {
    const r = evaluateFieldSource(coil({ parts: [] }), []);
    expect(r).toEqual({ name: 'quad', kind: 'coil', parts: [], cautions: [] });
    expect(sourceLines(r)).toEqual(['not computed: the block has problems to fix (see diagnostics)']);
  });
});

describe('a magnetised block at its centre', () => {
  // A cuboid's field is even in each coordinate about its centre, so every first derivative
  // vanishes there (symmetry of the uniformly magnetised block; standard magnetostatics). The
  // closed form sums corner terms that cancel, leaving ~1e-14 T/m of rounding at some centres.
  const block = (centre: Vec3): SourceEvalInput => ({
    name: 'lower', kind: 'slab', nameRange: RANGE,
    parts: [{ kind: 'slab', centre, sizeM: [0.05, 0.02, 0.006], magnetisationT: [0, 0, 1.25] }],
  });

  it.each([[[0, 0, -0.009]], [[0, 0, 0.005]], [[0.013, -0.07, 0.031]]] as [Vec3][])('at %j the gradient is exactly 0 and no gradient line is printed', (centre) => {
    const r = evaluateFieldSource(block(centre), []);
    expect(r.gradient_T_per_m!.flat().every((g) => g === 0)).toBe(true);
    expect(sourceLines(r).some((l) => l.includes('gradient'))).toBe(false);
    // The field itself is along the magnetisation (z) only: B_x = B_y = 0 exactly.
    expect(r.field_T![0]).toBe(0);
    expect(r.field_T![1]).toBe(0);
  });
});

/**
 * The gradient's cancellation floor (eval/cleanField.ts) and the derivative along an axis made from
 * it (axialDerivative, the `axial_gradient_T_per_m` of coils and solenoids): the rounding the
 * cleaned tensor carries at the point, not a fraction of its largest entry.
 * Reference: tests/reference/block_gradient_planes.json (scripts/reference/block_gradient_planes.py:
 * the block's closed form and its mpmath.diff at 50 digits, every input the test's double, checked
 * far away against the point dipole of the same moment): a block off the origin, on its symmetry
 * planes, from 3 cm to 10 m.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { axialDerivative, CANCELLATION_FLOOR, cleanField } from '../../server/src/eval/cleanField';
import { slabFieldWithRoundOff, slabPartWithRoundOff, sumField } from '../../server/src/physics/fields';
import type { Mat3, SlabSpec, Vec3 } from '../../server/src/physics/fields/types';

interface BlockCase {
  magnetisation: 'tilted' | 'along-z';
  magnetisationT: Vec3;
  distanceM: number;
  point: Vec3;
  B: number[];
  gradient: number[][];
  alongAxes: Record<string, { axis: Vec3; value: number }>;
  dipoleRelativeDifference: number;
}
const REF: { sizeM: Vec3; centreM: Vec3; cases: BlockCase[] } = JSON.parse(readFileSync('tests/reference/block_gradient_planes.json', 'utf8'));

const block = (magnetisationT: Vec3): SlabSpec => ({ kind: 'slab', centre: REF.centreM, sizeM: REF.sizeM, magnetisationT });

function cleaned(c: BlockCase): { B: Vec3; G: Mat3; floor: { B: number; gradient: number } } {
  const s = cleanField([block(c.magnetisationT)])(c.point);
  if (!('sample' in s)) throw new Error('the point is off the block');
  return { B: s.sample.B, G: s.sample.gradient, floor: s.floor };
}

/** The bound axialDerivative zeroes within: 2·floor through the weights |a_i a_j|, and a few ε of the terms. */
function axialBound(G: Mat3, a: Vec3, floor: number): number {
  let weight = 0;
  let size = 0;
  for (let i = 0; i < 3; i++) {
    for (let j = 0; j < 3; j++) {
      weight += Math.abs(a[i]! * a[j]!);
      size += Math.abs(a[i]! * G[i]![j]! * a[j]!);
    }
  }
  return 2 * floor * weight + 4 * Number.EPSILON * size;
}

describe('a block 20 × 10 × 5 mm at (13, −70, 31) mm, on its symmetry planes from 3 cm to 10 m', () => {
  it('the reference: 12 points, symmetry zeros on each plane, and the point dipole far away', () => {
    expect(REF.cases).toHaveLength(12);
    // The dipole is the far limit: its relative difference falls as (size/distance)², size 2 cm.
    for (const c of REF.cases.filter((c) => c.distanceM >= 1)) expect(c.dipoleRelativeDifference).toBeLessThan(1e-3 / c.distanceM ** 2);
    // Mirror y → −y (tilted): B_y and the four mixed y-derivatives; odd charge in z (along z): B_x, B_y, five entries.
    const zeros = (c: BlockCase): number => [...c.B, ...c.gradient.flat()].filter((v) => v === 0).length;
    for (const c of REF.cases) expect(zeros(c)).toBe(c.magnetisation === 'tilted' ? 5 : 7);
  });

  it.each(REF.cases.map((c) => [c.magnetisation, c.distanceM, c] as const))('magnetised %s, %s m away: B and the gradient as mpmath gives them, symmetry zeros exactly 0', (_m, _d, c) => {
    const { B, G, floor } = cleaned(c);
    const got = [...B, ...G.flat()];
    const want = [...c.B, ...c.gradient.flat()];
    for (let i = 0; i < want.length; i++) {
      const bound = i < 3 ? floor.B : floor.gradient;
      if (want[i] === 0) expect(got[i]).toBe(0);
      else {
        expect(got[i]).not.toBe(0);
        expect(Math.abs(got[i]! - want[i]!)).toBeLessThanOrEqual(bound);
        // The floor stays far below what it guards: nothing real is zeroed.
        expect(bound).toBeLessThan(1e-3 * Math.abs(want[i]!));
      }
    }
  });

  it.each(REF.cases.flatMap((c) => Object.entries(c.alongAxes).map(([name, a]) => [c.magnetisation, c.distanceM, name, c, a] as const)))('magnetised %s, %s m away, along the %s axis: a·G·a as mpmath gives it, 0 where symmetry makes it 0', (_m, _d, _n, c, a) => {
    const { G, floor } = cleaned(c);
    const d = axialDerivative(G, a.axis, floor.gradient);
    if (a.value === 0) expect(d).toBe(0);
    else {
      expect(d).not.toBe(0);
      // The cleaned entries are within 2·floor of the exact ones: the same bound holds against the reference.
      expect(Math.abs(d - a.value)).toBeLessThanOrEqual(axialBound(G, a.axis, floor.gradient));
    }
  });

  it('3 cm away, along an axis where a·G·a is 8e-13 of G\'s largest entry: printed, where a fraction of that entry printed 0', () => {
    const c = REF.cases.find((c) => c.magnetisation === 'tilted' && c.distanceM === 0.03)!;
    const { axis, value } = c.alongAxes['near-null']!;
    const { G, floor } = cleaned(c);
    const largest = Math.max(...G.flat().map(Math.abs));
    // The rule before: |a·G·a| ≤ 1e-12 of the largest entry is 0.
    expect(Math.abs(value)).toBeLessThan(CANCELLATION_FLOOR * largest);
    const d = axialDerivative(G, axis, floor.gradient);
    expect(Math.abs(d - value)).toBeLessThanOrEqual(axialBound(G, axis, floor.gradient));
    // Printed: above its own bound (which is 10² to 10³ times the actual error here, 1e-16 T/m).
    expect(d).not.toBe(0);
    expect(axialBound(G, axis, floor.gradient)).toBeLessThan(Math.abs(value));
  });
});

describe('axialDerivative', () => {
  it('a zero tensor gives exactly 0 along any axis, and a diagonal one its entry along a coordinate axis', () => {
    const zero: Mat3 = [[0, 0, 0], [0, 0, 0], [0, 0, 0]];
    expect(axialDerivative(zero, [0.36, 0.48, 0.8], 0)).toBe(0);
    // An opposed pair's tensor at its centre, (−g/2, −g/2, g) (Maxwell: traceless, axisymmetric).
    const g = 1.25;
    expect(axialDerivative([[-g / 2, 0, 0], [0, -g / 2, 0], [0, 0, g]], [0, 0, 1], 1e-15)).toBe(g);
  });

  it('the same tensor turned to a tilted axis: the axial entry back to rounding, and rounding alone is 0', () => {
    // R diag(−g/2, −g/2, g) Rᵀ with the axis a as R's third column: a·G·a = g (rotation of a tensor).
    const a: Vec3 = [0.36, 0.48, 0.8];
    const g = 0.7;
    const G = [0, 1, 2].map((i) => [0, 1, 2].map((j) => -g / 2 * (i === j ? 1 : 0) + 1.5 * g * a[i]! * a[j]!)) as unknown as Mat3;
    const d = axialDerivative(G, a, 0);
    expect(Math.abs(d - g)).toBeLessThan(1e-15);
    // Along an axis perpendicular to a, the exact value is −g/2; a tensor of rounding only (within its floor) is 0.
    expect(axialDerivative(G, [0.8, 0, -0.36], 0)).toBeCloseTo(-g / 2 * (0.8 ** 2 + 0.36 ** 2) + 1.5 * g * (0.36 * 0.8 - 0.8 * 0.36) ** 2, 14);
    const noise: Mat3 = [[3e-17, -1e-17, 0], [-1e-17, 2e-17, 4e-17], [0, 4e-17, -5e-17]];
    expect(axialDerivative(noise, a, 5e-17)).toBe(0);
  });
});

describe('one evaluation of each block: the cleaned field is the plain sum where it is kept', () => {
  it('eight blocks on a ring of 3 cm (an invented magnet), 25 points inside it: every kept component is the sum\'s, bit for bit', () => {
    const blocks: SlabSpec[] = [];
    for (let k = 0; k < 8; k++) {
      const t = (k * Math.PI) / 4;
      blocks.push({ kind: 'slab', centre: [0.03 * Math.cos(t), 0.03 * Math.sin(t), 0], sizeM: [0.01, 0.01, 0.04], magnetisationT: [1.2 * Math.cos(3 * t), 1.2 * Math.sin(3 * t), 0] });
    }
    const clean = cleanField(blocks);
    const plain = sumField(blocks);
    let kept = 0;
    for (let i = 0; i < 5; i++) {
      for (let j = 0; j < 5; j++) {
        const p: Vec3 = [-0.01 + 0.005 * i, -0.01 + 0.005 * j, 0.002];
        const c = clean(p);
        if (!('sample' in c)) throw new Error('inside the ring, off every block');
        const got = [...c.sample.B, ...c.sample.gradient.flat()];
        const want = [...plain(p).B, ...plain(p).gradient.flat()];
        for (let k = 0; k < 12; k++) {
          if (got[k] === 0) expect(Math.abs(want[k]!)).toBeLessThanOrEqual(k < 3 ? c.floor.B : c.floor.gradient);
          else {
            expect(got[k]).toBe(want[k]);
            kept++;
          }
        }
      }
    }
    expect(kept).toBeGreaterThan(200);
  });
});

describe('a block in a cleaned sum says what sumField says of it', () => {
  const coil = { kind: 'loop', centre: [0, 0, 0.1], axis: [0, 0, 1], radiusM: 0.05, ampereTurns: 100 } as const;
  const magnet: SlabSpec = { kind: 'slab', centre: [0, 0, 0], sizeM: [0.02, 0.02, 0.01], magnetisationT: [0, 0, 1] };

  it('on its top face: no value, the block\'s issue with its place in the list', () => {
    const c = cleanField([coil, magnet])([0.003, -0.004, 0.005]);
    expect('onSource' in c && c.onSource.code).toBe('source-point-on-block');
    expect('onSource' in c && c.onSource.partIndex).toBe(1);
  });

  it('a block the formulas cannot use (a magnetisation that is not a number) adds nothing, as in sumField: the loop\'s field alone', () => {
    const p: Vec3 = [0.01, 0.02, 0.03];
    const c = cleanField([coil, { ...magnet, magnetisationT: [NaN, 0, 1] }])(p);
    if (!('sample' in c)) throw new Error('off the loop');
    expect(c.sample.B).toEqual(sumField([coil])(p).B);
  });

  it('a block whose round-off bound overflows (its terms squared beyond 1e308) is left out, as where its value overflows: no sum zeroed by an infinite floor', () => {
    // 1e160 T is absurd on purpose: the field and gradient stay finite, the squares of the terms do not.
    const huge: SlabSpec = { ...magnet, magnetisationT: [0, 0, 1e160] };
    const p: Vec3 = [0.01, 0.02, 0.03];
    const raw = slabFieldWithRoundOff(huge, p);
    expect(Number.isFinite(Math.hypot(...raw.sample.B, ...raw.sample.gradient.flat()))).toBe(true);
    expect(raw.roundOff.B).toBe(Infinity);
    expect(slabPartWithRoundOff(huge)(p).sample.leftOut?.map((i) => i.code)).toEqual(['source-point-on-block']);
    expect(sumField([coil, huge])(p).leftOut?.map((i) => [i.code, i.partIndex])).toEqual([['source-point-on-block', 1]]);
    const c = cleanField([coil, huge])(p);
    expect('onSource' in c && [c.onSource.code, c.onSource.partIndex]).toEqual(['source-point-on-block', 1]);
    // A block of ordinary size at the same point is kept and carries a finite rounding.
    expect(slabPartWithRoundOff(magnet)(p).sample.leftOut).toBeUndefined();
    expect(Number.isFinite(slabPartWithRoundOff(magnet)(p).roundOff.B)).toBe(true);
  });
});

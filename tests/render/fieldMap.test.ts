/**
 * The field map against analytic fields: an ideal quadrupole (|B| = G·|z| on the axis), a long
 * straight wire (μ0 I / 2π r, which has a pole on the line), and a field spanning six decades.
 */
import { describe, expect, it } from 'vitest';
import { magnitudeAxis, renderFieldMap } from '../../server/src/render/fieldMap';
import { chooseLine, fieldMapView, sourceShapes } from '../../server/src/views/fieldMapView';
import type { FieldFunction, FieldSourceSpec, Vec3 } from '../../server/src/physics/fields/types';
import { all, byClass, parseSvg, pathPoints } from './svgTree';

const ZERO3: [Vec3, Vec3, Vec3] = [[0, 0, 0], [0, 0, 0], [0, 0, 0]];
const MU0 = 4e-7 * Math.PI;

/** An ideal quadrupole with axial gradient g (T/m): B = g(−x/2, −y/2, z). */
const quadrupole = (g: number): FieldFunction => (p) => ({ B: [(-g * p[0]) / 2, (-g * p[1]) / 2, g * p[2]], gradient: ZERO3 });

/** An infinite wire along x through (0, y0, 0) carrying I; NaN on the wire itself (as a careless source would). */
const wireAlongX = (y0: number, current: number): FieldFunction => (p) => {
  const dy = p[1] - y0;
  const dz = p[2];
  const r2 = dy * dy + dz * dz;
  const k = (MU0 * current) / (2 * Math.PI * r2);
  return { B: [0, -k * dz, k * dy], gradient: ZERO3 };
};

const pair: FieldSourceSpec[] = [
  { kind: 'loop', centre: [0, 0, 0.035], axis: [0, 0, 1], radiusM: 0.035, ampereTurns: 1800 },
  { kind: 'loop', centre: [0, 0, -0.035], axis: [0, 0, 1], radiusM: 0.035, ampereTurns: -1800 },
];

describe('the field map line and the sources drawn', () => {
  it('runs along the common axis of a coil pair, both coils inside the plot', () => {
    const line = chooseLine(pair)!;
    expect(line.u).toEqual([0, 0, 1]);
    expect(line.v).toEqual([1, 0, 0]);
    expect(line.from).toBeLessThan(-0.035);
    expect(line.to).toBeGreaterThan(0.035);
    const shapes = sourceShapes(pair.slice(0, 1), line);
    // One loop seen side on: two cross-section marks at ±R, the current in opposite senses.
    expect(shapes).toEqual([
      { kind: 'dot', s: 0.035, t: 0.035, towardsReader: expect.any(Boolean) },
      { kind: 'dot', s: 0.035, t: -0.035, towardsReader: expect.any(Boolean) },
    ]);
    const [a, b] = shapes as { towardsReader: boolean }[];
    expect(a!.towardsReader).toBe(!b!.towardsReader);
    // z to the right, x up: the reader looks along −y (z × x = y points at the reader). Right-hand
    // rule about +z with positive current: at +x the current runs along +y, towards the reader.
    expect(a!.towardsReader).toBe(true);
    const other = sourceShapes(pair.slice(1), line) as { towardsReader: boolean }[];
    expect(other[0]!.towardsReader).toBe(false);
  });

  it('runs across a two-wire rail, through both wires, which are dots', () => {
    const rail: FieldSourceSpec[] = [
      { kind: 'wire', point: [0, 0.002, 0], direction: [1, 0, 0], currentA: 40 },
      { kind: 'wire', point: [0, -0.002, 0], direction: [1, 0, 0], currentA: -40 },
    ];
    const line = chooseLine(rail)!;
    expect(line.u).toEqual([0, 1, 0]);
    const shapes = sourceShapes(rail, line);
    expect(shapes.map((s) => s.kind)).toEqual(['dot', 'dot']);
    expect(shapes.map((s) => (s as { s: number }).s)).toEqual([0.002, -0.002]);
  });

  it('a block is a rectangle of its size', () => {
    const slab: FieldSourceSpec[] = [{ kind: 'slab', centre: [0, 0, 0], sizeM: [0.01, 0.02, 0.005], magnetisationT: [0, 1.2, 0] }];
    const line = chooseLine(slab)!;
    expect(line.u).toEqual([0, 1, 0]);
    const [r] = sourceShapes(slab, line);
    expect(r).toMatchObject({ kind: 'rect', s0: -0.01, s1: 0.01 });
    expect(Math.abs((r as { t1: number; t0: number }).t1 - (r as { t0: number }).t0)).toBeCloseTo(0.01, 12);
  });
});

describe('the field map figure', () => {
  it('draws |B| of a quadrupole as the V it is (linear axis), with the values at the right places', () => {
    const v = fieldMapView([{ name: 'quad', kind: 'coil', parts: pair }], quadrupole(0.3), { points: 201 })!;
    // No unit written and the axis tops out below 0.1 T: G, as the reports read it (the one rule of every field axis, render/fieldAxisUnit.ts).
    expect(v.fieldUnit).toBe('G');
    const mid = 100;
    expect(v.positionsM[mid]).toBeCloseTo(0, 12);
    expect(v.magnitudeT[mid]).toBeCloseTo(0, 12);
    expect(v.magnitudeT[200]).toBeCloseTo(0.3 * v.positionsM[200]!, 12);
    const svg = renderFieldMap(v, { kind: 'export' });
    expect(svg).not.toMatch(/NaN|Infinity/);
    const doc = parseSvg(svg);
    expect(all(doc, (n) => n.attrs['data-y-scale'] === 'linear')).toHaveLength(1);
    expect(byClass(doc, 'sl-source')).toHaveLength(1);
    expect(all(doc, (n) => n.name === 'circle' && n.attrs.r === '5')).toHaveLength(4);
  });

  it('leaves a gap where the line crosses a wire and cuts the spike, never NaN', () => {
    const rail: FieldSourceSpec[] = [{ kind: 'wire', point: [0, 0, 0], direction: [1, 0, 0], currentA: 10 }];
    const v = fieldMapView([{ name: 'rail', kind: 'wire', parts: rail }], wireAlongX(0, 10), { points: 201 })!;
    expect(Number.isNaN(v.magnitudeT[100])).toBe(true);
    const svg = renderFieldMap(v, { kind: 'export' });
    expect(svg).not.toMatch(/NaN|Infinity/);
    const doc = parseSvg(svg);
    const curve = byClass(doc, 'sl-magnitude')[0]!;
    const d = all(curve, (n) => n.name === 'path')[0]!.attrs.d!;
    // Two pieces, one each side of the wire.
    expect(pathPoints(d).filter((p) => p.move)).toHaveLength(2);
  });

  it('through the real sum: a line across a rail leaves gaps at both wires (empty CSV cells), never NaN', async () => {
    const { analyze } = await import('../../server/src/eval/analyze');
    const { fieldMapFor } = await import('../../server/src/views/fieldMapDiagram');
    // Two wires 12 mm apart: the map's line runs through both (the view's choice for wires alone),
    // from −16 to 16 mm in 400 steps of 0.08 mm, so samples 125 and 275 fall on the wires.
    const model = analyze('wire rail\n  current = 10 A\n  through = 0, 6, 0 mm\n  direction = x\n  return = 0, -6, 0 mm\n').model!;
    const a = fieldMapFor(model, { view: 'fieldmap', theme: 'export' }, { kind: 'export' });
    if (!a.ok) throw new Error(a.message);
    expect(a.svg).not.toMatch(/NaN|Infinity/);
    const rows = a.csv!.split('\n').filter((l) => /^-?\d/.test(l));
    const empty = rows.filter((l) => /,,|,$/.test(l)).map((l) => Number(l.split(',')[0]));
    expect(empty.map((m) => Math.round(m * 1e6))).toEqual([-6000, 6000]);
    const d = all(byClass(parseSvg(a.svg), 'sl-magnitude')[0]!, (n) => n.name === 'path')[0]!.attrs.d!;
    expect(pathPoints(d).filter((p) => p.move)).toHaveLength(3);
  });

  it('across a rail, where B·(along the line) is 0 by symmetry, draws the component across it: B_z = μ0 I/π a between the wires, sign turning at each (textbook superposition of two long wires)', async () => {
    const { analyze } = await import('../../server/src/eval/analyze');
    const { fieldMapFor } = await import('../../server/src/views/fieldMapDiagram');
    const { sumField } = await import('../../server/src/physics/fields');
    const model = analyze('wire rail\n  current = 10 A\n  through = 0, 6, 0 mm\n  direction = x\n  return = 0, -6, 0 mm\n').model!;
    const parts = model.sources[0]!.parts;
    const v = fieldMapView([{ name: 'rail', kind: 'wire', parts }], sumField(parts), { points: 401 })!;
    expect([v.componentName, v.componentAxis]).toEqual(['B_z', 'z']);
    const mid = 200;
    expect(v.positionsM[mid]).toBeCloseTo(0, 15);
    // Between the wires both fields point the same way: 2 × μ0 I/(2π a) with a = 6 mm.
    const between = (MU0 * 10) / (Math.PI * 0.006);
    expect(Math.abs(Math.abs(v.componentT![mid]!) / between - 1)).toBeLessThan(1e-6);
    // Outside the pair the sense is reversed; |B_z| is |B| everywhere on this line.
    expect(Math.sign(v.componentT![10]!)).toBe(-Math.sign(v.componentT![mid]!));
    for (let k = 0; k < 401; k += 40) if (Number.isFinite(v.magnitudeT[k])) expect(Math.abs(Math.abs(v.componentT![k]!) / v.magnitudeT[k]! - 1)).toBeLessThan(1e-12);
    const a = fieldMapFor(model, { view: 'fieldmap', theme: 'export' }, { kind: 'export' });
    if (!a.ok) throw new Error(a.message);
    expect(a.csv!.split('\n').find((l) => l.startsWith('y_m'))).toBe('y_m,B_abs_T,B_z_T');
    expect(a.svg).toContain('B_z (signed)');
  });

  it('along a coil pair’s axis keeps the component along the line', () => {
    const v = fieldMapView([{ name: 'quad', kind: 'coil', parts: pair }], quadrupole(0.3), { points: 201 })!;
    expect([v.componentName, v.componentAxis]).toEqual(['B_z', 'z']);
    expect(v.componentT![200]).toBeCloseTo(0.3 * v.positionsM[200]!, 12);
  });

  it('turns logarithmic when |B| spans orders of magnitude', () => {
    const values = Array.from({ length: 101 }, (_, k) => 10 ** (-6 + (6 * k) / 100));
    expect(magnitudeAxis(values)).toMatchObject({ log: true });
    expect(magnitudeAxis(values)!.domain).toEqual([1e-6, 1]);
    expect(magnitudeAxis(values, 'linear')!.log).toBe(false);
    expect(magnitudeAxis([0, 0, 0])).toEqual({ log: false, domain: [0, 1e-4], cut: false });
    expect(magnitudeAxis([NaN, NaN])).toBeUndefined();
  });

  it('draws a field spanning six decades on a log axis, zeros leaving at the bottom, no component curve', () => {
    const positionsM = Array.from({ length: 201 }, (_, k) => -0.1 + k * 0.001);
    const magnitudeT = positionsM.map((z) => (z === 0 ? 0 : Math.min(1, 1e-9 / Math.abs(z) ** 3)));
    const svg = renderFieldMap(
      { title: 'decades', alongName: 'z', acrossName: 'x', lineText: 'along z', positionsM, magnitudeT, componentT: magnitudeT, componentName: 'B_z', fieldUnit: 'T', axis: magnitudeAxis(magnitudeT), sources: [] },
      { kind: 'export' },
    );
    expect(svg).not.toMatch(/NaN|Infinity/);
    const doc = parseSvg(svg);
    expect(all(doc, (n) => n.attrs['data-y-scale'] === 'log')).toHaveLength(1);
    expect(byClass(doc, 'sl-component')).toHaveLength(0);
    expect(svg).toContain('|B|, log scale (T)');
  });

  it('a line with no values at all is an empty figure with words', () => {
    const nothing: FieldFunction = () => ({ B: [NaN, NaN, NaN], gradient: ZERO3 });
    const v = fieldMapView([{ name: 'quad', kind: 'coil', parts: pair }], nothing)!;
    expect(renderFieldMap(v, { kind: 'export' })).toContain('No field values to draw');
  });

  it('has no view without usable sources', () => {
    expect(fieldMapView([{ name: 'broken', kind: 'coil', parts: [] }], quadrupole(1))).toBeUndefined();
  });
});

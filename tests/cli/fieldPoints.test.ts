import { describe, expect, it } from 'vitest';
import { UsageError } from '../../server/src/cli/args';
import { fieldPointPlan, readCounts, readLengths, readPoint } from '../../server/src/cli/fieldPoints';

const close = (a: readonly number[], b: readonly number[]): void => {
  expect(a).toHaveLength(b.length);
  a.forEach((v, i) => expect(v).toBeCloseTo(b[i]!, 12));
};

describe('sublevel field: where to sample', () => {
  it.each([
    ['0,0,1cm', [0, 0, 0.01]],
    ['1,2,3 mm', [1e-3, 2e-3, 3e-3]],
    ['1mm,-2cm,0', [1e-3, -0.02, 0]],
    ['0, 0, 0', [0, 0, 0]],
    ['1.5e-1,0,2e1 mm', [1.5e-4, 0, 0.02]],
  ])('--at %s', (text, expected) => close(readPoint('--at', text), expected));

  it.each([
    ['1,2,3', /'1' needs a length unit/],
    ['0,0', /needs 3 comma-separated lengths/],
    ['0,0,1 T', /--at/],
    ['0,0,5 km', /outside ±1000 m/],
  ])('refuses --at %s', (text, message) => {
    expect(() => readPoint('--at', text)).toThrow(message);
  });

  it('a segment with its end points exact', () => {
    const plan = fieldPointPlan({ along: '0,0,-5cm:0,0,5cm', points: '11' });
    expect(plan.kind).toBe('line');
    expect(plan.points).toHaveLength(11);
    close(plan.points[0]!, [0, 0, -0.05]);
    close(plan.points[5]!, [0, 0, 0]);
    expect(plan.points[10]).toEqual([0, 0, 0.05]);
  });

  it('a grid in the xz plane through --at, x fastest', () => {
    const plan = fieldPointPlan({ grid: 'x=-2:2cm,z=-1cm:1cm', points: '5x3', at: '0,3mm,0' });
    expect(plan.kind).toBe('grid');
    if (plan.kind !== 'grid') return;
    expect(plan.axes).toEqual([0, 2]);
    expect(plan.points).toHaveLength(15);
    close(plan.points[0]!, [-0.02, 0.003, -0.01]);
    close(plan.points[1]!, [-0.01, 0.003, -0.01]);
    close(plan.points[14]!, [0.02, 0.003, 0.01]);
  });

  it.each([
    [{}, /say where/],
    [{ along: '0,0,0:0,0,0' }, /two different points/],
    [{ along: '0,0,0cm', points: '3' }, /joined by ':'/],
    [{ along: '0,0,0:1,0,0cm', at: '0,0,0' }, /do not go together/],
    [{ grid: 'x=-1:1cm,x=0:1cm' }, /two different axes/],
    [{ grid: 'x=1:-1cm,z=0:1cm' }, /smaller to a larger/],
    [{ grid: 'x=-1:1cm' }, /two axes/],
    [{ at: '0,0,0', points: '3' }, /--points goes with/],
    [{ along: '0,0,0:1,0,0cm', grid: 'x=0:1cm,y=0:1cm' }, /one of --along or --grid/],
  ])('refuses %o', (options, message) => {
    expect(() => fieldPointPlan(options)).toThrow(UsageError);
    expect(() => fieldPointPlan(options)).toThrow(message);
  });

  it('counts: N for a line, N or NxM for a grid, capped', () => {
    expect(readCounts(undefined, 'line')).toEqual([201, 1]);
    expect(readCounts('41', 'grid')).toEqual([41, 41]);
    expect(readCounts('20x30', 'grid')).toEqual([20, 30]);
    expect(() => readCounts('1', 'line')).toThrow(/at least 2/);
    expect(() => readCounts('3x3', 'line')).toThrow(/whole number/);
    expect(() => readCounts('1000x1000', 'grid')).toThrow(/more than the 250000/);
    expect(() => readCounts('0x10', 'grid')).toThrow(/at least 2/);
  });

  it('a range written with a unit at both ends', () => {
    close(readLengths('--grid x', '-2mm,2 mm', 2), [-0.002, 0.002]);
  });
});

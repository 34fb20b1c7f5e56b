/** Packing plain data for the worker's reply (service/packedValue.ts) and the lazily built level tables it carries as recipes. */
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { defineLazyField, unreadRecipes } from '../../server/src/eval/lazyFields';
import { packValue, unpackValue } from '../../server/src/service/packedValue';
import { packResult, unpackResult } from '../../server/src/service/resultHandOff';

const noRevive = (): void => {
  throw new Error('no recipe expected');
};

describe('packValue / unpackValue', () => {
  it('gives back numbers bit for bit, key order, undefined properties, nulls and nesting', () => {
    const v = { b: -0, a: NaN, c: [1.5e-300, -Infinity, 2 ** 53 + 2], d: { x: undefined, y: null, z: true, w: false }, e: 'text', f: [[], {}], g: 0.1 + 0.2 };
    const back = unpackValue(packValue(v, new Set()), noRevive) as typeof v;
    expect(Object.is(back.b, -0)).toBe(true);
    expect(Number.isNaN(back.a)).toBe(true);
    expect(back).toStrictEqual(v);
    expect(Object.keys(back)).toEqual(['b', 'a', 'c', 'd', 'e', 'f', 'g']);
    expect(Object.keys(back.d)).toEqual(['x', 'y', 'z', 'w']);
  });

  it('unpacks a deferred array when first read, and then it is an ordinary property', () => {
    const v = { points: [{ source: 'f', exact: [{ e: 1 }, { e: 2 }] }, { source: 'g', exact: [] }] };
    const back = unpackValue(packValue(v, new Set(['exact'])), noRevive) as typeof v;
    const point = back.points[0]!;
    expect(Object.getOwnPropertyDescriptor(point, 'exact')!.get).toBeTypeOf('function');
    expect(point.exact).toEqual([{ e: 1 }, { e: 2 }]);
    expect(Object.getOwnPropertyDescriptor(point, 'exact')!.value).toBe(point.exact);
    back.points[1]!.exact = [{ e: 3 }]; // a write before any read replaces it
    expect(back).toEqual({ points: [{ source: 'f', exact: [{ e: 1 }, { e: 2 }] }, { source: 'g', exact: [{ e: 3 }] }] });
  });

  it('keeps a key named __proto__ as a key', () => {
    const v = JSON.parse('{"__proto__": {"a": 1}, "b": 2}') as Record<string, unknown>;
    const back = unpackValue(packValue(v, new Set()), noRevive) as Record<string, unknown>;
    expect(Object.getPrototypeOf(back)).toBe(Object.prototype);
    expect(JSON.stringify(back)).toBe(JSON.stringify(v));
  });

  it('refuses what is not plain data', () => {
    expect(() => packValue({ m: new Map() }, new Set())).toThrow('cannot pack');
    expect(() => packValue({ f: () => 1 }, new Set())).toThrow('cannot pack');
  });

  it('carries an unread property as its recipe, and a recipe array shared by two objects once', () => {
    const shared = [1, 2, 3];
    const build = (r: { kind: string; xs: number[] }) => r.xs.map((x) => x * 10);
    const a = { name: 'a' };
    const b = { name: 'b' };
    defineLazyField(a, 'table', { kind: 't', xs: shared }, build);
    defineLazyField(b, 'table', { kind: 't', xs: shared }, build);
    const p = packValue([a, b], new Set());
    expect(p.numbers).toHaveLength(3);
    const revived: unknown[] = [];
    const back = unpackValue(p, (o, key, recipe) => {
      revived.push(recipe);
      defineLazyField(o, key, recipe as { kind: string; xs: number[] }, build);
    }) as { name: string; table: number[] }[];
    expect(revived).toEqual([{ kind: 't', xs: [1, 2, 3] }, { kind: 't', xs: [1, 2, 3] }]);
    expect(back[1]!.table).toEqual([10, 20, 30]);
    expect(unreadRecipes(back[1]!)?.table).toBeUndefined();
    expect(back).toEqual([{ name: 'a', table: [10, 20, 30] }, { name: 'b', table: [10, 20, 30] }]);
  });
});

describe('level tables built when first read', () => {
  // Hand-made species (invented constants, no uncertainties: the uncertainty pass reads every table it propagates into).
  const TEXT = ['species A', '  I = 3/2', '  g_I = -0.000995', '  level g: 5s 2S1/2  A = 3417.34 MHz', '  level p: 5p 2P°3/2  A = 84.72 MHz', 'species B', '  I = 0', '  level g: 3s 2S1/2', 'field f = 3 G', 'field s = 0.2 T'].join('\n');

  it('are unread after the evaluation, and the JSON and a packed copy hold the same tables', () => {
    const r = analyze(TEXT).result!;
    const point = r.levels[0]!.at_fields[1]!;
    expect(unreadRecipes(point)?.exact).toBeDefined();
    const copy = unpackResult(packResult(r)!);
    expect(unreadRecipes(copy.levels[0]!.at_fields[1]!)?.exact).toBeDefined();
    expect(JSON.stringify(copy)).toBe(JSON.stringify(r));
    expect(copy).toEqual(r);
    // Read: 8 states of the 5s level (I = 3/2) at 0.2 T, each with the linear energy of its low-field state.
    expect(point.exact).toHaveLength(8);
    expect(point.exact.every((s) => typeof s.linear_energy_Hz === 'number')).toBe(true);
    expect(point.linear.map((s) => s.label)).toEqual(copy.levels[0]!.at_fields[1]!.linear.map((s) => s.label));
  });
});

describe('a lazy field read through a prototype', () => {
  it('gives the prototype its value and keeps its recipe out of the child', () => {
    const point: Record<string, unknown> = {};
    let builds = 0;
    defineLazyField(point, 'table', [1, 2, 3], (xs) => {
      builds++;
      return xs.map((x) => 2 * x);
    });
    const child = Object.create(point) as Record<string, unknown>;
    expect(child.table).toEqual([2, 4, 6]);
    expect(point.table).toEqual([2, 4, 6]);
    expect(builds).toBe(1);
    expect(unreadRecipes(child)).toBeUndefined();
  });
});

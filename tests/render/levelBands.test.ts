/**
 * The rule that breaks the level diagram's energy axis (render/levelBands.ts), on both sides of
 * its threshold: neighbouring manifolds share a band while the gap between them is under
 * BAND_GAP_RATIO × the larger spread, and always when they meet. Invented straight-line fans.
 */
import { describe, expect, it } from 'vitest';
import { BAND_GAP_RATIO, levelBands, MAX_BANDS } from '../../server/src/render/levelBands';
import { renderLevels, type LevelCurve, type LevelsViewData } from '../../server/src/render';
import { manifoldOf } from '../../server/src/views/levelsView';
import { fLabel, jfLabel, jLabel } from '../../server/src/physics/engine/labelText';
import { all, axisMap, byClass, parseSvg, pathPoints, textOf } from './svgTree';

const FIELDS = [0, 0.5, 1];

/** A manifold of 2F+1 straight lines from `centre`, fanning out to ±spread/2 at the last field. */
function fan(name: string, twoF: number, centre: number, spread: number): (LevelCurve & { manifold: string })[] {
  return Array.from({ length: twoF + 1 }, (_, k) => {
    const m = k - twoF / 2;
    const slope = twoF > 0 ? (m / twoF) * spread : 0;
    return { id: `${name}m${k}`, lowLabel: `${name}, m_F=${m}`, highLabel: `${name} ${k}`, manifold: name, energyHz: FIELDS.map((b) => centre + slope * b) };
  });
}

/** F=1 over [−0.5, 0.5] MHz and F=2 (spread 2 MHz) starting `gapRatio` × 2 MHz above it. */
const two = (gapRatio: number): (LevelCurve & { manifold: string })[] => [...fan('F=1', 2, 0, 1e6), ...fan('F=2', 4, 0.5e6 + gapRatio * 2e6 + 1e6, 2e6)];

describe('levelBands: when the axis breaks', () => {
  it('keeps one band while the gap is under 4× the larger spread', () => {
    // F=1 spans [−0.5, 0.5] MHz, F=2 spans 2 MHz: a gap of 3.9 × 2 MHz is one band.
    const bands = levelBands(two(3.9), FIELDS.length);
    expect(bands).toHaveLength(1);
    expect(bands[0]!.names).toEqual(['F=1', 'F=2']);
  });

  it('breaks into two bands past it, low energy first, each with its curves and interval', () => {
    const bands = levelBands(two(4.1), FIELDS.length);
    expect(bands.map((b) => b.names)).toEqual([['F=1'], ['F=2']]);
    expect(bands[0]!.curves).toEqual([0, 1, 2]);
    expect(bands[1]!.curves).toEqual([3, 4, 5, 6, 7]);
    expect(bands[0]!.lo).toBe(-0.5e6);
    expect(bands[0]!.hi).toBe(0.5e6);
    // F=2 starts 4.1 × 2 MHz above 0.5 MHz and spans 2 MHz.
    expect(bands[1]!.lo).toBeCloseTo(8.7e6, 0);
    expect(bands[1]!.hi).toBeCloseTo(10.7e6, 0);
    expect(BAND_GAP_RATIO).toBe(4);
  });

  it('always joins manifolds that meet (their curves cross), however far the others lie', () => {
    // F=1 and F=2 overlap; F=3 is 100 spreads away: two bands, the crossing pair together.
    const curves = [...fan('F=1', 2, 0, 4e6), ...fan('F=2', 4, 1e6, 4e6), ...fan('F=3', 6, 500e6, 4e6)];
    expect(levelBands(curves, FIELDS.length).map((b) => b.names)).toEqual([['F=1', 'F=2'], ['F=3']]);
  });

  it('joins again when a grown band comes within reach of the next one', () => {
    // F=1 and F=2 (spread 1 MHz each, gap 3 MHz) join to a 5 MHz band; F=3 lies 15 MHz above it: 3 < 4 spreads.
    const curves = [...fan('F=1', 2, 0, 1e6), ...fan('F=2', 2, 4e6, 1e6), ...fan('F=3', 2, 19.5e6 + 0.5e6, 1e6)];
    expect(levelBands(curves, FIELDS.length)).toHaveLength(1);
  });

  it(`has at most ${MAX_BANDS} bands: the closest neighbours (gap ÷ spread) are joined first`, () => {
    // Ten manifolds (spread 1 MHz) 100 MHz apart, but F=6 only 40 MHz above F=5 and F=3 50 MHz above F=2.
    const curves = Array.from({ length: 10 }, (_, i) => fan(`F=${i}`, 2, i * 100e6 + (i === 6 ? -60e6 : 0) + (i === 3 ? -50e6 : 0), 1e6)).flat();
    const bands = levelBands(curves, FIELDS.length);
    expect(bands).toHaveLength(MAX_BANDS);
    // F=5 and F=6 first (40 spreads); their band, 41 MHz wide, then lies 99 MHz ≈ 2.4 spreads above F=4,
    // closer in its own terms than F=2 and F=3 (50 spreads): F=4 joins it.
    expect(bands.filter((b) => b.names.length > 1).map((b) => b.names)).toEqual([['F=4', 'F=5', 'F=6']]);
  });

  it('gives no bands when there is nothing to magnify or no manifold names', () => {
    // One field sample: no spread anywhere.
    expect(levelBands(two(100), 1)).toEqual([]);
    expect(levelBands(two(100).map(({ manifold: _m, ...c }) => c), FIELDS.length)).toEqual([]);
  });
});

describe('renderLevels on both sides of the rule', () => {
  // The view works the bands out once and its data carries them (views/levelsView.ts).
  const data = (gapRatio: number): LevelsViewData => ({ title: 'invented fans', fieldUnit: 'T', fieldsT: FIELDS, curves: two(gapRatio), bands: levelBands(two(gapRatio), FIELDS.length) });

  it('draws one axis at 3.9 spreads and two bands, with a note, at 4.1', () => {
    const one = parseSvg(renderLevels(data(3.9), { kind: 'export' }));
    expect(one.attrs['data-y-bands']).toBeUndefined();
    expect(one.attrs['data-y-domain']).toBeDefined();
    const broken = parseSvg(renderLevels(data(4.1), { kind: 'export' }));
    expect(broken.attrs['data-y-bands']).toBe('2');
    expect(broken.attrs['data-y-domain']).toBeUndefined();
  });

  it('draws a crossing in the band its two manifolds share, at its energy on that band’s ticks', () => {
    // F=1 and F=2 overlap (their fans cross); F=3 lies 500 MHz above: two bands.
    const curves = [...fan('F=1', 2, 0, 4e6), ...fan('F=2', 4, 1e6, 4e6), ...fan('F=3', 6, 500e6, 4e6)];
    // F=1, m_F=1 (0 → 2 MHz at 1 T) meets F=2, m_F=-1 (1 → 0 MHz) at B = 1/3 T, E = 2/3 MHz.
    const crossing = { fieldT: 1 / 3, energyHz: 2e6 / 3, curveA: 2, a: 'F=1, m_F=1', b: 'F=2, m_F=-1' };
    expect([curves[2]!.lowLabel, curves[4]!.lowLabel]).toEqual([crossing.a, crossing.b]);
    const bands = levelBands(curves, FIELDS.length);
    const svg = parseSvg(renderLevels({ title: 'crossing', fieldUnit: 'T', fieldsT: FIELDS, curves, crossings: [crossing], bands }, { kind: 'export' }));
    const drawn = byClass(svg, 'sl-band');
    expect(drawn.map((b) => b.attrs['data-label'])).toEqual(['F=3', 'F=1 + F=2']);
    const lower = drawn[1]!;
    const title = textOf(byClass(lower, 'sl-band-title')[0]!);
    expect(title).toBe('F=1 + F=2: E/h (MHz)');
    const diamond = all(svg, (n) => n.attrs['data-kind'] === 'crossing')[0]!;
    const top = pathPoints(diamond.children[1]!.attrs.d!)[0]!; // the diamond's top vertex (cx, cy − 4.5)
    expect(Math.abs(top.y + 4.5 - axisMap(lower, 'sl-axis-y')(2 / 3))).toBeLessThan(0.05);
    expect(Math.abs(top.x - axisMap(svg, 'sl-axis-x')(1 / 3))).toBeLessThan(0.05);
  });

  it('draws data without bands on one axis, and never works bands out itself', () => {
    const { bands: _b, ...plain } = data(100);
    expect(data(100).bands).toHaveLength(2);
    expect(parseSvg(renderLevels(plain, { kind: 'export' })).attrs['data-y-bands']).toBeUndefined();
  });
});

describe('manifoldOf: from the state’s quantum numbers, not its label text', () => {
  it.each([
    [fLabel(4, 2), false, 'F=2'],
    [jfLabel(3, 6, -1), false, 'J=3/2, F=3'],
    [jLabel(3, 1, null), false, 'J=3/2'],
    [jLabel(3, 1, -3), false, 'J=3/2'],
    // Without a nucleus F is J (the label reads "J=3/2, m_J=+1/2").
    [fLabel(3, 1, true), true, 'J=3/2'],
  ] as const)('%o → %s', (label, noNucleus, want) => {
    expect(manifoldOf(label, noNucleus)).toBe(want);
  });
});

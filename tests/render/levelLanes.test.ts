/**
 * What the level diagram's right label lane names, on both sides of the change of regime: the
 * uncoupled names m_J, m_I when the range ends past the change of regime (x ≥ 1) or in the strong
 * field, else the low-field names F, m_F followed along each curve; each lane's header says which
 * basis it names.
 * Setups are invented for the test (built-in Rb87 and Cs133 data; a made-up species, demo numbers).
 */
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { gJLookup } from '../../server/src/eval/gJLookup';
import { engineSpec } from '../../server/src/eval/levelSpec';
import { workingFields } from '../../server/src/eval/evaluate';
import { regime } from '../../server/src/physics/engine';
import { diagramFor } from '../../server/src/views/diagram';
import { levelsView } from '../../server/src/views/levelsView';
import { renderLevels } from '../../server/src/render';
import { all, axisMap, byClass, parseSvg, pathPoints, textOf, type Node } from './svgTree';

const RB = 'species Rb87\n  level ground: 5s 2S1/2\n';
/** Invented: I = 9/2 and a 2P3/2 level, F = 3…6, 40 sublevels. */
const FORTY = 'species Demo40\n  mass = 90 u\n  I = 9/2\n  mu_I = -1.3 muN\n  level upper: 5p 2P°3/2  A = -12 MHz  B = 3 MHz\nfield bias = 200 uT\n';
/** Invented: no nucleus, one J = 3/2 level. */
const J_ONLY = 'species Demo0\n  mass = 40 u\n  I = 0\n  level upper: 4p 2P°3/2\nfield bias = 10 mT\n';

/** The first level of a file, drawn to `toT` (default range when undefined). */
function viewOf(text: string, toT?: number) {
  const analysis = analyze(text);
  const level = analysis.model!.species[0]!.levels[0]!;
  const gJ = gJLookup(analysis.result!.levels)(level);
  const spec = engineSpec(level, gJ, analysis.model!.settings)!;
  const v = levelsView(level, gJ, analysis.model!.settings, workingFields(analysis.model!)[0], toT !== undefined ? { toT } : {})!;
  return { analysis, spec, v, svg: parseSvg(renderLevels(v.data, { kind: 'export' })) };
}

const rightTexts = (svg: Node): string[] => all(svg, (n) => n.attrs['data-kind'] === 'end-label' && n.attrs['data-side'] === 'high').map((n) => n.attrs['data-label']!);
const headOf = (svg: Node, side: string): Node => byClass(svg, 'sl-lane-head').find((n) => n.attrs['data-side'] === side)!;
const headText = (svg: Node, side: string): string => textOf(all(headOf(svg, side), (n) => n.name === 'text')[0]!);

describe('the right lane at the strong-field limit and on both sides of the change of regime (Rb87 ground)', () => {
  const { spec } = viewOf(RB, 0.01);
  // The engine's limit at its 1 % rule; the level's ΔE_hfs/((g_J − g_I) μ_B) ≈ 0.2438 T (built-in data, CODATA μ_B) is 25× below it.
  const limit = regime(spec, 1).strongLimitT;

  it('finds the limit well past the change of regime x = 1', () => {
    expect(limit).toBeGreaterThan(10 * 0.2438);
    expect(limit).toBeLessThan(100 * 0.2438);
  });

  it('a range that ends exactly at the limit reaches the strong field: m_J, m_I names, header says so', () => {
    const { v, svg } = viewOf(RB, limit);
    expect(v.data.lanes).toMatchObject({ low: 'F, m_F', high: 'm_J, m_I', ends: 'strong' });
    expect(v.data.lanes!.strongLimitT).toBeCloseTo(limit, 9);
    expect(new Set(rightTexts(svg))).toEqual(new Set(v.data.curves.map((c) => c.highLabel)));
    expect(rightTexts(svg)).toContain('m_J=+1/2, m_I=+3/2');
    expect(headText(svg, 'high')).toBe('|m_J, m_I⟩ (strong field)');
    expect(textOf(headOf(svg, 'high').children[0]!)).toContain('reaches the strong field (from 6.09');
  });

  it('one part in a thousand short of it is past the change of regime: still m_J, m_I, header says mostly', () => {
    const { v, svg } = viewOf(RB, limit * 0.999);
    expect(v.data.lanes!.ends).toBe('uncoupling');
    expect(rightTexts(svg)).toContain('m_J=+1/2, m_I=+3/2');
    expect(headText(svg, 'high')).toBe('|m_J, m_I⟩ (mostly)');
    expect(textOf(all(headOf(svg, 'high'), (n) => n.name === 'title')[0]!)).toMatch(/past the change of regime \(x = 2[45]\), short of the strong field \(from 6\.09/);
  });

  // x = 1 at ΔE_hfs/((g_J − g_I) μ_B) ≈ 0.2438 T (6.834682611 GHz, g_J 2.00233113, g_I 0.000995; CODATA μ_B; from memory).
  it('both sides of x = 1: F, m_F just below, m_J, m_I just above', () => {
    const below = viewOf(RB, 0.2438 * 0.98);
    expect(below.v.data.lanes!.ends).toBe('intermediate');
    expect(new Set(rightTexts(below.svg))).toEqual(new Set(below.v.data.curves.map((c) => c.lowLabel)));
    expect(rightTexts(below.svg)).toContain('F=2, m_F=+2');
    expect(headText(below.svg, 'high')).toBe('|F, m_F⟩ (from low field)');
    expect(headText(below.svg, 'low')).toBe('|F, m_F⟩ (low field)');
    expect(textOf(all(headOf(below.svg, 'high'), (n) => n.name === 'title')[0]!)).toContain('keeps its low-field name |F, m_F⟩');
    // The tooltip of a right-lane name does not call it a high-field name.
    const title = textOf(byClass(byClass(below.svg, 'sl-end-high')[0]!, 'sl-end-label')[0]!.children[0]!);
    expect(title).toMatch(/^Low-field name: F=/);
    const above = viewOf(RB, 0.2438 * 1.02);
    expect(above.v.data.lanes!.ends).toBe('uncoupling');
    expect(new Set(rightTexts(above.svg))).toEqual(new Set(above.v.data.curves.map((c) => c.highLabel)));
  });

  it('below the linear limit the range ends weak: low-field names on both sides', () => {
    const { v, svg } = viewOf(`${RB}field bias = 20 uT\n`);
    expect(v.data.lanes!.ends).toBe('weak');
    expect(v.data.lanes!.strongLimitT).toBeUndefined();
    expect(headText(svg, 'high')).toBe('|F, m_F⟩ (low field)');
  });
});

describe('3 G and 120 G (Rb87 ground, 0 to 240 G: intermediate)', () => {
  const analysis = analyze(`${RB}field bias = 3 G\nfield push = 120 G\n`);
  const d = diagramFor(analysis, { view: 'levels', theme: 'export' });
  if (!d.ok) throw new Error(d.message);
  const svg = parseSvg(d.svg);

  it('names the states F, m_F on the right', () => {
    expect(byClass(svg, 'sl-lane-heads')[0]!.attrs['data-ends']).toBe('intermediate');
    expect(rightTexts(svg).sort()).toEqual(['F=1, m_F=+1', 'F=1, m_F=-1', 'F=1, m_F=0', 'F=2, m_F=+1', 'F=2, m_F=+2', 'F=2, m_F=-1', 'F=2, m_F=-2', 'F=2, m_F=0']);
    expect(textOf(svg.children.find((c) => c.name === 'desc')!)).toContain('on the right by |F, m_F⟩ (from low field)');
  });

  it('puts every dot at 3 G where its band’s tick labels place the report’s energy', () => {
    const at = analysis.result!.levels[0]!.at_fields[0]!;
    expect(at.field_T).toBeCloseTo(3e-4, 12);
    const lowOf = new Map(all(svg, (n) => n.attrs['data-kind'] === 'curve').map((c) => [c.attrs['data-id'], c.attrs['data-low']]));
    const bands = byClass(svg, 'sl-band');
    expect(bands).toHaveLength(2);
    const UNIT: Record<string, number> = { Hz: 1, kHz: 1e3, MHz: 1e6, GHz: 1e9 };
    const dots = all(svg, (n) => n.attrs['data-kind'] === 'state');
    expect(dots).toHaveLength(8);
    for (const dot of dots) {
      const low = lowOf.get(dot.attrs['data-id'])!;
      const report = at.exact.find((s) => s.low_label === low)!;
      const cy = pathPoints(dot.children.find((c) => c.name === 'path')!.attrs.d!)[0]!.y;
      const band = bands.find((b) => b.attrs['data-label'] === low.split(',')[0])!;
      const title = textOf(byClass(band, 'sl-band-title')[0]!);
      const unit = UNIT[/\((\w+)\)$/.exec(title)![1]!]!;
      const yOf = axisMap(band, 'sl-axis-y');
      expect(Math.abs(cy - yOf((report.energy_Hz - Number(band.attrs['data-offset-hz'])) / unit)), low).toBeLessThan(0.05);
    }
  });
});

describe('other levels', () => {
  it('40 sublevels at 200 µT: F, m_F on the right (the range ends far below the strong field)', () => {
    const { v, svg } = viewOf(FORTY);
    expect(v.data.lanes!.ends).toBe('intermediate');
    expect(rightTexts(svg).every((t) => t.startsWith('F='))).toBe(true);
  });

  it('Cs133 6P3/2 at 30 T: the strong field, m_J, m_I on the right', () => {
    const { v, svg } = viewOf('species Cs133\n  level p32: 6p 2P°3/2\nfield magnet = 30 T\n');
    expect(v.data.lanes).toMatchObject({ low: 'F, m_F', high: 'm_J, m_I', ends: 'strong' });
    expect(rightTexts(svg).every((t) => t.startsWith('m_J='))).toBe(true);
  });

  it('a level without a nucleus names J, m_J in both headers', () => {
    const { v, svg } = viewOf(J_ONLY);
    expect(v.data.lanes).toMatchObject({ low: 'J, m_J', high: 'm_J', ends: 'weak' });
    expect(headText(svg, 'low')).toBe('|J, m_J⟩ (low field)');
    expect(rightTexts(svg)).toContain('J=3/2, m_J=+3/2');
  });

  it('a whole term names J, F, m_F and m_L, m_S, m_I', () => {
    const { v } = viewOf('species Li7\n  level p: 2p 2P°  E_J = 1/2 446.800129853 THz, 3/2 446.810183007 THz\n    A_J = 1/2 45.9365 MHz, 3/2 -3.055 MHz\nfield strong = 3 T\n');
    expect(v.data.lanes).toMatchObject({ low: 'J, F, m_F', high: 'm_L, m_S, m_I' });
  });
});

describe('data without lane information draws as before', () => {
  it('no headers, high-field names on the right', () => {
    const { v } = viewOf(RB, 0.5);
    const { lanes: _l, ...plain } = v.data;
    const svg = parseSvg(renderLevels(plain, { kind: 'export' }));
    expect(byClass(svg, 'sl-lane-head')).toHaveLength(0);
    expect(new Set(rightTexts(svg))).toEqual(new Set(v.data.curves.map((c) => c.highLabel)));
  });
});

/**
 * The sticks under a synthesized spectrum show what its curve counts: strength × the viewing
 * factor of the dipole pattern (textbook: across the field π 1, σ ½; along it σ 1, π 0; see
 * physics/lineshape/observation.ts). Before, the sticks kept the bare strengths, so π sticks
 * stood along the field where the curve has no π light.
 */
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { renderLines } from '../../server/src/render';
import { VISIBLE_FLOOR } from '../../server/src/render/lines';
import { linesView } from '../../server/src/views/linesView';
import { all, byClass, parseSvg, pathPoints, textOf } from './svgTree';

const SETUP = (view: string, light = 'all') => `species Rb87
  level ground: 5s 2S1/2
  level p32:    5p 2P°3/2
field coil = 0.6 T
line D2: ground -> p32
  spectrum = ${view}
  light    = ${light}
  doppler  = 310 K
`;

function sticks(view: string, light?: string) {
  const line = analyze(SETUP(view, light)).result!.lines[0]!;
  const at = line.at_fields[0]!;
  const svg = parseSvg(renderLines(linesView(line)!, { kind: 'export' }));
  const drawn = all(svg, (n) => n.attrs['data-kind'] === 'component');
  // Sticks under VISIBLE_FLOOR of the strongest seen are left out of the figure (and counted in its note).
  const weights = at.spectrum!.weights;
  const top = Math.max(...weights);
  const visible = (k: number): boolean => weights[k]! > 0 && weights[k]! >= VISIBLE_FLOOR * top;
  const note = byClass(svg, 'sl-faint-note')[0];
  const leftOut = note ? Number(note.attrs['data-left-out']) : 0;
  return { at, svg, drawn, visible, leftOut };
}

describe('spectrum sticks carry the viewing factor', () => {
  it('across the field: π at its strength, σ at half, as the curve counts them', () => {
    const { at, drawn, svg, visible, leftOut } = sticks('across');
    const seen = at.components.filter((_, k) => visible(k));
    expect(drawn).toHaveLength(seen.length);
    expect(leftOut).toBe(at.components.length - seen.length);
    for (const g of drawn) {
      const strength = Number(g.attrs['data-strength']);
      const factor = g.attrs['data-polarization'] === 'π' ? 1 : 0.5;
      expect(Number(g.attrs['data-observed'])).toBeCloseTo(strength * factor, 10);
    }
    expect(textOf(byClass(byClass(svg, 'sl-axis-y')[0]!, 'sl-axis-title')[0]!)).toBe('strength × viewing factor');
  });

  it('along the field: no π stick at all, σ at full strength', () => {
    const { at, drawn, visible } = sticks('along');
    const sigma = at.components.filter((c, k) => c.polarization !== 'pi' && visible(k));
    expect(at.components.some((c) => c.polarization === 'pi')).toBe(true);
    expect(drawn).toHaveLength(sigma.length);
    for (const g of drawn) {
      expect(g.attrs['data-polarization']).not.toBe('π');
      expect(Number(g.attrs['data-observed'])).toBe(Number(g.attrs['data-strength']));
    }
  });

  it('through a σ+ analyser along the field: only σ+ sticks', () => {
    const { at, drawn, visible } = sticks('along', 'sigma+');
    expect(drawn).toHaveLength(at.components.filter((c, k) => c.polarization === 'sigma+' && visible(k)).length);
  });

  it('a lone component peaks at its stick; a blend stands above its sticks (the curve in stick units)', () => {
    const { at, drawn, svg } = sticks('across');
    const fwhm = at.spectrum!.voigt_fwhm_Hz;
    const stickOf = (g: (typeof drawn)[number]) => ({ f: Number(g.attrs['data-offset-hz']), w: Number(g.attrs['data-observed']), pts: pathPoints(all(g, (n) => n.name === 'path')[0]!.attrs.d) });
    const all_ = drawn.map(stickOf);
    const curve = pathPoints(byClass(svg, 'sl-spectrum')[0]!.attrs.d);
    const curveTopNear = (x: number) => Math.min(...curve.filter((p) => Math.abs(p.x - x) <= 1.5).map((p) => p.y));
    const strong = Math.max(...all_.map((s) => s.w));
    const lone = all_.filter((s) => s.w > 0.2 * strong && all_.every((o) => o === s || Math.abs(o.f - s.f) > 2 * fwhm || o.w < 1e-3 * s.w));
    expect(lone.length).toBeGreaterThan(3);
    // Samples may straddle a top and miss it by a little; the curve never stands above a lone stick.
    for (const s of lone) {
      const gap = curveTopNear(s.pts[0]!.x) - s.pts[1]!.y;
      expect(gap).toBeGreaterThan(-0.5);
      expect(gap).toBeLessThan(0.02 * (s.pts[0]!.y - s.pts[1]!.y) + 0.5);
    }
    // The highest point of the curve is a blend, above the tallest stick.
    expect(Math.min(...curve.map((p) => p.y))).toBeLessThan(Math.min(...all_.map((s) => s.pts[1]!.y)) - 5);
  });
});

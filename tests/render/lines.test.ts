/** Geometry and styling of the line-component stick spectrum (tolerances in SVG user units). */
import { describe, expect, it } from 'vitest';
import { renderLines, type LinesViewData } from '../../server/src/render';
import { linesFixture } from './fixtures';
import { all, axisMap, parseSvg, pathPoints, textOf, type Node } from './svgTree';

const byClassName = (root: Node, cls: string): Node => all(root, (n) => n.attrs.class === cls)[0];

const TOL = 0.05;

describe('renderLines', () => {
  const data = linesFixture();
  const svg = parseSvg(renderLines(data, { kind: 'export' }));
  const xOf = axisMap(svg, 'sl-axis-x'); // MHz
  const yOf = axisMap(svg, 'sl-axis-y');
  const sticks = all(svg, (n) => n.attrs['data-kind'] === 'component');

  it('draws each component at its offset with height proportional to strength', () => {
    expect(sticks).toHaveLength(4);
    sticks.forEach((g, i) => {
      const stick = g.children.find((c) => c.name === 'path')!;
      const [foot, top] = pathPoints(stick.attrs.d);
      const c = data.components[i];
      expect(Math.abs(foot.x - xOf(c.offsetHz / 1e6))).toBeLessThan(TOL);
      expect(Math.abs(foot.y - yOf(0))).toBeLessThan(TOL);
      expect(Math.abs(top.y - yOf(c.strength))).toBeLessThan(TOL);
    });
    expect(svg.attrs['data-x-unit']).toBe('MHz');
  });

  it('tells polarisations apart by line style and marker shape, not colour alone', () => {
    const style = (pol: string) => sticks.find((g) => g.attrs['data-polarization'] === pol)!;
    expect(style('π').attrs['stroke-dasharray']).toBeUndefined();
    expect(style('σ+').attrs['stroke-dasharray']).toBe('6 3');
    expect(style('σ−').attrs['stroke-dasharray']).toBe('1.6 2.6');
    // Shape signature: the path's commands plus where it starts relative to the stick top
    // (circle: level with it, upward triangle: above, downward triangle: below).
    const capShape = (pol: string) => {
      const g = style(pol);
      const top = pathPoints(g.children.find((c) => c.name === 'path')!.attrs.d)[1];
      const cap = g.children.find((c) => c.attrs.class === 'sl-cap')!.attrs.d;
      return `${cap.replace(/[^A-Za-z]/g, '')} ${Math.sign(Math.round(Number(cap.split(',')[1].match(/^[-\d.]+/)![0]) - top.y))}`;
    };
    expect(['π', 'σ+', 'σ−'].map(capShape)).toEqual(['MaaZ 0', 'MLHZ -1', 'MLHZ 1']);
    expect(textOf(svg)).toContain('σ+ (Δm = +1)');
  });

  it('titles every component with its polarisation, offset and strength', () => {
    expect(textOf(sticks[3].children[0])).toBe('σ+ m=−1/2 → m′=1/2: Δf = +42 MHz, strength 1');
    expect(sticks[0].attrs['data-offset-hz']).toBe('-42000000');
  });

  it('respects a caller-chosen unit and skips unusable components', () => {
    const d: LinesViewData = {
      title: 'kHz',
      unitHz: 1e3,
      components: [
        { offsetHz: 1500, strength: 1, polarization: 'pi', label: 'a' },
        { offsetHz: NaN, strength: 1, polarization: 'pi', label: 'bad' },
        { offsetHz: 10, strength: 1, polarization: 'weird' as 'pi', label: 'bad' },
      ],
    };
    const s = parseSvg(renderLines(d, { kind: 'export' }));
    expect(s.attrs['data-x-unit']).toBe('kHz');
    expect(all(s, (n) => n.attrs['data-kind'] === 'component')).toHaveLength(1);
    expect(textOf(parseSvg(renderLines({ title: 'none', components: [] }, { kind: 'panel' })))).toContain('No line components to draw.');
  });

  it('is deterministic', () => {
    expect(renderLines(linesFixture(), { kind: 'panel' })).toBe(renderLines(linesFixture(), { kind: 'panel' }));
  });

  it('gives each hyperfine group its own panel at low field, offsets in Hz and in μB·B/h', () => {
    // Two groups 500 MHz apart, each with Zeeman components ±1.4 μB·B/h at B = 1e-5 T (μB·B/h ≈ 140 kHz).
    const z = 1e-5 * 1.39962449361e10; // μB/h from CODATA 2022
    const group = (centre: number) => [-1, 0, 1].map((k) => ({ offsetHz: centre + k * z, strength: k === 0 ? 1 : 0.5, polarization: (k === 0 ? 'pi' : k > 0 ? 'sigma+' : 'sigma-') as 'pi', label: `${centre}/${k}` }));
    const d: LinesViewData = { title: 'low', fieldT: 1e-5, components: [...group(-250e6), ...group(250e6), { offsetHz: 250e6 + 0.1 * z, strength: 1e-8, polarization: 'pi', label: 'weak' }] };
    const s = parseSvg(renderLines(d, { kind: 'export' }));
    expect(s.attrs['data-panels']).toBe('2');
    const panels = all(s, (n) => n.attrs['data-kind'] === 'group');
    expect(panels.map((p) => textOf(byClassName(p, 'sl-panel-heading')))).toEqual(['−250 MHz', '+250 MHz']);
    // Within a panel the sticks are resolved: neighbours ±z apart sit far more than a stick width apart.
    const xs = all(panels[0], (n) => n.attrs['data-kind'] === 'component').map((g) => pathPoints(g.children[1].attrs.d)[0].x);
    expect(xs[1] - xs[0]).toBeGreaterThan(15);
    // The top scale reads in μB·B/h: its tick "1.0" sits one z from the centre.
    const top = all(panels[0], (n) => n.attrs.class === 'sl-axis sl-axis-top')[0];
    const t1 = all(top, (n) => n.name === 'text' && n.attrs['data-tick'] === '1.0')[0];
    expect(Math.abs(Number(t1.attrs.x) - xs[2])).toBeLessThan(0.05);
    // A vanishing component gets a small cap, the strongest the largest.
    const caps = all(s, (n) => n.attrs.class === 'sl-cap').map((c) => pathPoints(c.attrs.d));
    const radius = (pts: { x: number; y: number }[]) => (Math.max(...pts.map((p) => p.x)) - Math.min(...pts.map((p) => p.x))) / 2;
    const rs = caps.map(radius);
    expect(Math.min(...rs)).toBeLessThan(2.1);
    expect(Math.max(...rs)).toBeGreaterThan(4.5);
  });

  it('keeps one axis at high field, where the groups mix', () => {
    const d: LinesViewData = { ...linesFixture(), fieldT: 1 };
    expect(parseSvg(renderLines(d, { kind: 'export' })).attrs['data-panels']).toBe('1');
  });
});

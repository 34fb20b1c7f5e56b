/**
 * Geometry of the level diagram, read back from the SVG text: positions are recovered from
 * the axis tick labels (as a reader would) and compared with the input data. Tolerances are
 * in SVG user units; coordinates are rounded to 0.01, so 0.05 covers rounding plus the
 * tick-based reconstruction.
 */
import { describe, expect, it } from 'vitest';
import { renderLevels } from '../../server/src/render';
import type { LevelsViewData } from '../../server/src/render';
import { levelsFixture } from './fixtures';
import { all, axisMap, byClass, parseSvg, pathPoints, textOf, type Node } from './svgTree';

const TOL = 0.05;
const exportTheme = { kind: 'export' } as const;
const panelTheme = { kind: 'panel' } as const;

function curveGroups(svg: Node): Node[] {
  return all(svg, (n) => n.attrs['data-kind'] === 'curve');
}

function curvePath(g: Node): { x: number; y: number }[] {
  const p = g.children.find((c) => c.name === 'path');
  if (!p) throw new Error('curve without path');
  return pathPoints(p.attrs.d);
}

describe('renderLevels geometry', () => {
  const data = levelsFixture();
  const svg = parseSvg(renderLevels(data, exportTheme));
  const xOf = axisMap(svg, 'sl-axis-x'); // display unit: mT
  const yOf = axisMap(svg, 'sl-axis-y'); // display unit: GHz

  it('draws one curve per state, with the right number of points', () => {
    const groups = curveGroups(svg);
    expect(groups.map((g) => g.attrs['data-id'])).toEqual(data.curves.map((c) => c.id));
    for (const g of groups) expect(curvePath(g)).toHaveLength(data.fieldsT.length);
  });

  it('puts the working-field rule at the x of 120 mT on the axis scale', () => {
    const marker = all(svg, (n) => n.attrs['data-kind'] === 'marker')[0];
    const rule = byClass(marker, 'sl-marker-rule')[0];
    const [top] = pathPoints(rule.attrs.d);
    expect(Math.abs(top.x - xOf(120))).toBeLessThan(TOL);
    expect(marker.attrs['data-field-t']).toBe('0.12');
    expect(textOf(marker)).toContain('bias coil · 120 mT');
  });

  it('starts and ends every curve at its sampled energies, where its leaders begin', () => {
    const lowLeaders = byClass(svg, 'sl-end-low')[0];
    const highLeaders = byClass(svg, 'sl-end-high')[0];
    data.curves.forEach((c, i) => {
      const pts = curvePath(curveGroups(svg)[i]);
      const first = pts[0];
      const last = pts[pts.length - 1];
      const n = data.fieldsT.length;
      expect(Math.abs(first.x - xOf(data.fieldsT[0] * 1e3))).toBeLessThan(TOL);
      expect(Math.abs(first.y - yOf(c.energyHz[0] / 1e9))).toBeLessThan(TOL);
      expect(Math.abs(last.x - xOf(data.fieldsT[n - 1] * 1e3))).toBeLessThan(TOL);
      expect(Math.abs(last.y - yOf(c.energyHz[n - 1] / 1e9))).toBeLessThan(TOL);
      for (const [side, end, group] of [['low', first, lowLeaders], ['high', last, highLeaders]] as const) {
        const label = group.children.find((g) => g.attrs['data-members'].split(' ').includes(c.id));
        expect(label, `${side} label of ${c.id}`).toBeDefined();
        const leader = byClass(label as Node, 'sl-leader')[0];
        const starts = pathPoints(leader.attrs.d).filter((p) => p.move);
        expect(starts.some((s) => Math.abs(s.x - end.x) < TOL && Math.abs(s.y - end.y) < TOL)).toBe(true);
      }
    });
  });

  it('labels the high-field ends with the high-field names and shares one label for degenerate low-field ends', () => {
    const high = byClass(svg, 'sl-end-high')[0].children.map((g) => g.attrs['data-label']);
    expect(new Set(high)).toEqual(new Set(data.curves.map((c) => c.highLabel)));
    // At B = 0 the five F=2 states (and the three F=1 states) coincide.
    const low = byClass(svg, 'sl-end-low')[0].children.map((g) => g.attrs['data-label']).sort();
    expect(low).toEqual(['F=1 · 3 states', 'F=2 · 5 states']);
  });

  it('keeps end labels at least one label height apart and inside the plot', () => {
    for (const side of ['sl-end-low', 'sl-end-high']) {
      const ys = all(byClass(svg, side)[0], (n) => n.name === 'text').map((t) => Number(t.attrs.y)).sort((a, b) => a - b);
      for (let i = 1; i < ys.length; i++) expect(ys[i] - ys[i - 1]).toBeGreaterThanOrEqual(13 - TOL);
    }
  });

  it('puts a dot on every curve at the working field, at the interpolated energy', () => {
    const states = all(svg, (n) => n.attrs['data-kind'] === 'state');
    expect(states).toHaveLength(data.curves.length);
    const k = Array.from(data.fieldsT).findIndex((b) => Math.abs(b - 0.12) < 1e-12); // 0.12 T is a sample (k = 48)
    expect(k).toBe(48);
    states.forEach((s, i) => {
      const e = data.curves[i].energyHz[k];
      expect(Number(s.attrs['data-energy-hz'])).toBeCloseTo(e, 0);
      const dot = pathPoints(s.children.find((c) => c.name === 'path')!.attrs.d)[0];
      // Circle path starts at the left edge: (cx − r, cy), r = 3.2.
      expect(Math.abs(dot.x + 3.2 - xOf(120))).toBeLessThan(TOL);
      expect(Math.abs(dot.y - yOf(e / 1e9))).toBeLessThan(TOL);
    });
  });

  it('colours by trend: F=2, m_F=2 rises and F=1, m_F=1 falls at 120 mT', () => {
    const byId = new Map(curveGroups(svg).map((g) => [g.attrs['data-id'], g]));
    expect(byId.get('F2m4')?.attrs['data-trend']).toBe('rising');
    expect(byId.get('F1m2')?.attrs['data-trend']).toBe('falling');
    expect(byId.get('F1m2')?.attrs['stroke-dasharray']).toBe('7 3');
    expect(byId.get('F2m4')?.attrs['stroke-dasharray']).toBeUndefined();
  });

  it('has axis domains that contain all data', () => {
    const [y0, y1] = svg.attrs['data-y-domain'].split(',').map(Number);
    const [x0, x1] = svg.attrs['data-x-domain'].split(',').map(Number);
    const energies = data.curves.flatMap((c) => Array.from(c.energyHz));
    expect(y0).toBeLessThanOrEqual(Math.min(...energies));
    expect(y1).toBeGreaterThanOrEqual(Math.max(...energies));
    expect(x0).toBeLessThanOrEqual(0);
    expect(x1).toBeGreaterThanOrEqual(0.3);
    expect(svg.attrs['data-x-unit']).toBe('mT');
    expect(textOf(byClass(svg, 'sl-axis-y')[0])).toContain('E/h (GHz)');
    expect(textOf(byClass(svg, 'sl-axis-x')[0])).toContain('B (mT)');
  });

  it('gives every data element a non-empty <title> as its first child', () => {
    const dataEls = all(svg, (n) => n.attrs['data-kind'] !== undefined);
    expect(dataEls.length).toBeGreaterThan(data.curves.length * 2);
    for (const n of dataEls) {
      expect(n.children[0]?.name).toBe('title');
      expect(textOf(n.children[0]).length).toBeGreaterThan(3);
    }
  });

  it('rounds path coordinates to at most 2 decimals', () => {
    for (const p of all(svg, (n) => n.name === 'path')) expect(p.attrs.d).not.toMatch(/\.\d{3}/);
  });

  it('marks crossings at their field and energy', () => {
    const d: LevelsViewData = {
      title: 'two lines',
      fieldUnit: 'T',
      fieldsT: [0, 1],
      curves: [
        { id: 'a', lowLabel: 'a', highLabel: 'a', energyHz: [0, 2e6] },
        { id: 'b', lowLabel: 'b', highLabel: 'b', energyHz: [2e6, 0] },
      ],
      crossings: [{ fieldT: 0.5, energyHz: 1e6, a: 'a', b: 'b' }],
    };
    const s = parseSvg(renderLevels(d, exportTheme));
    const cross = all(s, (n) => n.attrs['data-kind'] === 'crossing')[0];
    const x = axisMap(s, 'sl-axis-x');
    const y = axisMap(s, 'sl-axis-y');
    const pts = pathPoints(cross.children[1].attrs.d);
    // Diamond path starts at its top vertex (cx, cy − 4.5).
    expect(Math.abs(pts[0].x - x(0.5))).toBeLessThan(TOL);
    expect(Math.abs(pts[0].y + 4.5 - y(1))).toBeLessThan(TOL); // axis in MHz
    expect(textOf(cross.children[0])).toBe('Crossing of a and b at B = 0.5 T, E/h = 1 MHz');
  });
});

describe('renderLevels text safety, theme and determinism', () => {
  const hostile: LevelsViewData = {
    title: 'Title <b>&</b> "q"',
    fieldUnit: 'G',
    fieldsT: [0, 1e-4, 2e-4],
    curves: [
      { id: 'x"y', lowLabel: '<script>alert(1)</script>', highLabel: "it's \u0001 odd", energyHz: [0, 1e5, 2e5] },
    ],
    markerT: 1e-4,
    markerLabel: '</text><script>',
  };

  it('escapes labels and titles from user files', () => {
    const out = renderLevels(hostile, exportTheme);
    expect(out).not.toMatch(/<script/i);
    expect(out).toContain('&lt;script&gt;alert(1)&lt;/script&gt;');
    expect(out).not.toContain('\u0001');
    const svg = parseSvg(out); // still well-formed
    const curve = curveGroups(svg)[0];
    expect(curve.attrs['data-low']).toBe('<script>alert(1)</script>');
    expect(curve.attrs['data-id']).toBe('x"y');
    expect(textOf(byClass(svg, 'sl-heading')[0])).toBe('Title <b>&</b> "q"');
  });

  it('gives the same string for the same input', () => {
    expect(renderLevels(levelsFixture(), panelTheme)).toBe(renderLevels(levelsFixture(), panelTheme));
    expect(renderLevels(hostile, exportTheme)).toBe(renderLevels(hostile, exportTheme));
  });

  it('uses theme variables in the panel and fixed colours in exports', () => {
    const panel = renderLevels(levelsFixture(), panelTheme);
    const file = renderLevels(levelsFixture(), exportTheme);
    expect(panel).toMatch(/stroke="var\(--vscode-charts-red, #[0-9a-f]{6}\)"/);
    expect(file).not.toContain('var(');
    expect(file).toContain('class="sl-bg"');
    expect(panel).not.toContain('class="sl-bg"');
    // Hover copies of the curves only in the panel.
    expect(panel).toContain('<use href="#');
    expect(file).not.toContain('<use');
  });

  it('never throws on empty or broken input', () => {
    const cases: LevelsViewData[] = [
      { title: 'empty', fieldUnit: 'T', fieldsT: [], curves: [] },
      { title: 'nan', fieldUnit: 'T', fieldsT: [NaN, NaN], curves: [{ id: 'a', lowLabel: 'a', highLabel: 'a', energyHz: [NaN, NaN] }] },
      { title: 'one point', fieldUnit: 'mT', fieldsT: [0.1], curves: [{ id: 'a', lowLabel: 'a', highLabel: 'a', energyHz: [5] }], markerT: 7 },
      { title: 'short', fieldUnit: 'T', fieldsT: [0, 1, 2], curves: [{ id: 'a', lowLabel: 'a', highLabel: 'b', energyHz: [1, NaN] }] },
    ];
    for (const c of cases) {
      const svg = parseSvg(renderLevels(c, exportTheme));
      expect(svg.attrs['data-view']).toBe('levels');
    }
    expect(textOf(parseSvg(renderLevels(cases[0], exportTheme)))).toContain('No sublevel energies to draw.');
  });
});

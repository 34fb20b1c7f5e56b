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
import { paletteFor } from '../../server/src/render/palette';
import { all, axisMap, byClass, parseSvg, pathPoints, textOf, type Node } from './svgTree';

const TOL = 0.05;
const exportTheme = { kind: 'export' } as const;
const panelTheme = { kind: 'panel' } as const;

function curveGroups(svg: Node): Node[] {
  return all(svg, (n) => n.attrs['data-kind'] === 'curve');
}

/** The whole curve: its slope segments joined (neighbouring segments share their end point). */
function curvePath(g: Node): { x: number; y: number }[] {
  const segs = g.children.filter((c) => c.name === 'path' && c.attrs.class?.startsWith('sl-seg'));
  if (segs.length === 0) throw new Error('curve without path');
  return segs.flatMap((p, i) => pathPoints(p.attrs.d).slice(i === 0 ? 0 : 1));
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

  it('names every state at both ends, never merging degenerate low-field ends', () => {
    const high = byClass(svg, 'sl-end-high')[0].children.map((g) => g.attrs['data-label']);
    expect(high.sort()).toEqual(data.curves.map((c) => c.highLabel).sort());
    // At B = 0 the five F=2 states (and the three F=1 states) coincide; each still has its own name.
    const lowGroups = byClass(svg, 'sl-end-low')[0].children;
    expect(lowGroups.map((g) => g.attrs['data-label']).sort()).toEqual(data.curves.map((c) => c.lowLabel).sort());
    for (const side of ['sl-end-low', 'sl-end-high']) expect(textOf(byClass(svg, side)[0])).not.toMatch(/states| \+\d/);
    // Fanned out in the order the curves leave the common point, so leaders do not cross:
    // the F=2 names from top to bottom follow the energies a little way in.
    const labelY = (g: Node) => Number(all(g, (n) => n.name === 'text')[0].attrs.y);
    const f2 = lowGroups.filter((g) => g.attrs['data-label'].startsWith('F=2')).sort((a, b) => labelY(a) - labelY(b));
    expect(f2.map((g) => g.attrs['data-label'])).toEqual(['F=2, m_F=2', 'F=2, m_F=1', 'F=2, m_F=0', 'F=2, m_F=-1', 'F=2, m_F=-2']);
  });

  it('grows the figure for many distinct ends; 40 ends in one point (over 16 names) get one name', () => {
    const many: LevelsViewData = {
      ...data,
      curves: Array.from({ length: 40 }, (_, i) => ({ id: `s${i}`, lowLabel: `F=9, m_F=${i - 20}`, highLabel: `h${i}`, energyHz: Array.from(data.fieldsT, (b) => (i - 20) * 1e9 * b) })),
    };
    const s = parseSvg(renderLevels(many, exportTheme));
    expect(all(byClass(s, 'sl-end-low')[0], (n) => n.name === 'text').map(textOf)).toEqual(['F=9, m_F=-20…19']);
    for (const side of ['sl-end-high']) {
      const texts = all(byClass(s, side)[0], (n) => n.name === 'text');
      expect(texts).toHaveLength(40);
      const ys = texts.map((t) => Number(t.attrs.y)).sort((a, b) => a - b);
      for (let i = 1; i < ys.length; i++) expect(ys[i] - ys[i - 1]).toBeGreaterThanOrEqual(13 - TOL);
      // Inside the frame.
      expect(ys[0]).toBeGreaterThan(0);
      expect(ys[ys.length - 1]).toBeLessThan(Number(s.attrs.height));
    }
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

  it('styles by trend: F=2, m_F=2 rises all along; F=1, m_F=1 falls', () => {
    const byId = new Map(curveGroups(svg).map((g) => [g.attrs['data-id'], g]));
    const segs = (id: string) => byId.get(id)!.children.filter((c) => c.attrs.class?.startsWith('sl-seg'));
    expect(segs('F2m4').map((g) => g.attrs['data-trend'])).toEqual(['rising']);
    expect(segs('F2m4')[0].attrs['stroke-dasharray']).toBeUndefined();
    expect(segs('F1m2').map((g) => g.attrs['data-trend'])).toEqual(['falling']);
    expect(segs('F1m2')[0].attrs['stroke-dasharray']).toBe('7 3');
  });

  it('styles each stretch of a curve by its own slope, whatever the chosen field', () => {
    // E = (B − 0.5)²: falls below 0.5 T, rises above — a state that turns over.
    const fieldsT = Array.from({ length: 101 }, (_, k) => k / 100);
    const turn: LevelsViewData = { title: 'turn', fieldUnit: 'T', fieldsT, curves: [{ id: 't', lowLabel: 't', highLabel: 't', energyHz: fieldsT.map((b) => 1e12 * (b - 0.5) ** 2) }] };
    const kinds = (markerT: number) => {
      const s = parseSvg(renderLevels({ ...turn, markerT }, exportTheme));
      return curveGroups(s)[0].children.filter((c) => c.attrs.class?.startsWith('sl-seg')).map((g) => `${g.attrs['data-trend']} ${g.attrs['data-from-t']}-${g.attrs['data-to-t']} ${g.attrs.stroke}`);
    };
    const at02 = kinds(0.2);
    expect(at02.map((k) => k.split(' ')[0])).toEqual(['falling', 'rising']);
    expect(at02[0]).toMatch(/^falling 0-0\.5 /);
    expect(at02[1]).toMatch(/^rising 0\.5-1 /);
    expect(at02[0].split(' ')[2]).not.toBe(at02[1].split(' ')[2]);
    // The chosen field changes the dots, never the curve styles.
    expect(kinds(0.9)).toEqual(at02);
  });

  it('marks every named field with its own labelled rule, labels not overlapping', () => {
    const d: LevelsViewData = {
      ...data,
      fieldMarks: [
        { fieldT: 0.12, label: 'field bias coil' },
        { fieldT: 0.121, label: 'field probe' },
        { fieldT: 0.125, label: 'magnet sorter' },
        { fieldT: 2, label: 'field far' },
      ],
    };
    const s = parseSvg(renderLevels(d, exportTheme));
    const marks = all(s, (n) => n.attrs['data-kind'] === 'marker');
    expect(marks.map((m) => m.attrs['data-field-t'])).toEqual(['0.12', '0.12', '0.121', '0.125']);
    const x = axisMap(s, 'sl-axis-x');
    const boxes = marks.map((m) => {
      const t = all(m, (n) => n.name === 'text')[0];
      const w = textOf(t).length * 6.3;
      const cx = Number(t.attrs.x);
      return { a: cx - w / 2, b: cx + w / 2, y: Number(t.attrs.y) };
    });
    for (let i = 0; i < boxes.length; i++) {
      for (let j = i + 1; j < boxes.length; j++) {
        const overlap = boxes[i].y === boxes[j].y && boxes[i].a < boxes[j].b && boxes[j].a < boxes[i].b;
        expect(overlap, `labels ${i} and ${j}`).toBe(false);
      }
    }
    const rule = pathPoints(byClass(marks[3], 'sl-marker-rule')[0].attrs.d)[0];
    expect(Math.abs(rule.x - x(125))).toBeLessThan(TOL);
    // A named field outside the sweep is said in the description, not silently dropped.
    expect(textOf(byClass(s, 'sl-heading')[0].parent!.children.find((c) => c.name === 'desc')!)).toContain('outside the sweep: field far');
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
      crossings: [{ fieldT: 0.5, energyHz: 1e6, curveA: 0, a: 'a', b: 'b' }],
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
    expect(panel).toMatch(/fill="var\(--vscode-editor-foreground, #[0-9a-f]{6}\)"/);
    // Series hues are the project's own in both (they pass contrast on light and dark themes).
    expect(panel).toContain(`stroke="${paletteFor(exportTheme).rising}"`);
    expect(panel).not.toContain('charts-');
    expect(file).not.toContain('var(');
    expect(file).toContain('class="sl-bg"');
    expect(panel).not.toContain('class="sl-bg"');
    // Wide invisible hover copies of the curves only in the panel.
    expect(panel).toContain('class="sl-hit"');
    expect(file).not.toContain('sl-hit');
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

/** Geometry of the detector pattern, read back from the SVG text (tolerances in SVG user units). */
import { describe, expect, it } from 'vitest';
import { renderPattern, type PatternViewData } from '../../server/src/render';
import { patternFixture } from './fixtures';
import { all, axisMap, byClass, parseSvg, pathPoints, textOf } from './svgTree';

const TOL = 0.05;
const theme = { kind: 'export' } as const;

describe('renderPattern', () => {
  const data = patternFixture();
  const svg = parseSvg(renderPattern(data, theme));
  const xOf = axisMap(svg, 'sl-axis-x'); // mm
  const yOf0 = axisMap(svg, 'sl-axis-y'); // % of atoms per mm
  const yOf = (perM: number) => yOf0(perM / 10);

  it('sets each peak marker over its position, just above its height', () => {
    const peaks = all(svg, (n) => n.attrs['data-kind'] === 'peak');
    expect(peaks).toHaveLength(data.peaks.length);
    peaks.forEach((g, i) => {
      const mark = byClass(g, 'sl-peak-mark')[0];
      const apex = pathPoints(mark.attrs.d)[0]; // downward triangle: first point is the tip
      expect(Math.abs(apex.x - xOf(data.peaks[i].positionM * 1e3))).toBeLessThan(TOL);
      expect(apex.y).toBeLessThan(yOf(data.peaks[i].height));
      expect(apex.y).toBeGreaterThan(yOf(data.peaks[i].height) - 6);
      expect(Number(g.attrs['data-position-m'])).toBe(data.peaks[i].positionM);
      expect(g.attrs['data-members']).toBe(data.peaks[i].members.join(', '));
    });
  });

  it('draws the total through its samples and one thinner line per sublevel', () => {
    const total = all(svg, (n) => n.attrs['data-kind'] === 'total')[0];
    const line = total.children.find((c) => c.name === 'path' && c.attrs.id !== undefined)!;
    const pts = pathPoints(line.attrs.d);
    expect(pts).toHaveLength(data.positionsM.length);
    for (const k of [0, 150, 300]) {
      expect(Math.abs(pts[k].x - xOf(data.positionsM[k] * 1e3))).toBeLessThan(TOL);
      expect(Math.abs(pts[k].y - yOf(data.total[k]))).toBeLessThan(TOL);
    }
    const parts = all(svg, (n) => n.attrs['data-kind'] === 'part');
    expect(parts.map((p) => p.attrs['data-label'])).toEqual(data.parts.map((p) => p.label));
    for (const p of parts) expect(Number(p.attrs['stroke-width'])).toBeLessThan(Number(total.attrs['stroke-width']));
    // Series differ by dash as well as colour (greyscale readability).
    expect(new Set(parts.map((p) => p.attrs['stroke-dasharray'] ?? 'solid')).size).toBe(4);
  });

  it('shows the verdict in words and by data attribute', () => {
    const v = all(svg, (n) => n.attrs['data-kind'] === 'verdict')[0];
    expect(v.attrs['data-resolved']).toBe('true');
    expect(textOf(v)).toContain('RESOLVED');
    expect(textOf(v)).toContain('adjacent peaks 1.0 mm apart, 2.5 widths');
    const bad: PatternViewData = { ...data, verdict: { resolved: false, text: 'peaks overlap' } };
    expect(textOf(parseSvg(renderPattern(bad, theme)))).toContain('NOT RESOLVED');
  });

  it('labels the position axis in millimetres and contains all data', () => {
    expect(svg.attrs['data-x-unit']).toBe('mm');
    const [y0, y1] = svg.attrs['data-y-domain'].split(',').map(Number);
    expect(y0).toBeLessThanOrEqual(0);
    expect(y1).toBeGreaterThanOrEqual(Math.max(...Array.from(data.total)));
  });

  it('titles every data element, escapes labels, is deterministic', () => {
    for (const n of all(svg, (m) => m.attrs['data-kind'] !== undefined)) expect(n.children[0]?.name).toBe('title');
    const hostile = { ...data, parts: [{ ...data.parts[0], label: '<script>x</script>' }] };
    const out = renderPattern(hostile, theme);
    expect(out).not.toMatch(/<script/);
    expect(out).toContain('&lt;script&gt;x&lt;/script&gt;');
    expect(renderPattern(data, { kind: 'panel' })).toBe(renderPattern(patternFixture(), { kind: 'panel' }));
  });

  it('handles empty input without throwing', () => {
    const empty: PatternViewData = { title: 'e', positionsM: [], total: [], parts: [], peaks: [], verdict: { resolved: false, text: '' } };
    expect(textOf(parseSvg(renderPattern(empty, theme)))).toContain('No detector profile to draw.');
  });
});

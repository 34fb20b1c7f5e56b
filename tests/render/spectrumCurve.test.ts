/** The spectrum curve in the lines view: scaled to the strongest stick, thinned without losing narrow peaks. */
import { describe, expect, it } from 'vitest';
import { renderLines, type LinesViewData } from '../../server/src/render';
import { all, parseSvg, pathPoints } from './svgTree';

function view(n: number, peaks: number[]): LinesViewData {
  const offsetHz = new Float64Array(n);
  const intensity = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    offsetHz[i] = -1e9 + (2e9 * i) / (n - 1);
    // Peaks one sample wide: a thinning that kept only one sample per pixel would drop them. The
    // background (5 % of the peaks) keeps the curve present across the window, so the frame is the window.
    intensity[i] = peaks.includes(i) ? 2e-9 : 1e-10;
  }
  return {
    title: 'line test',
    components: [
      { offsetHz: -5e8, strength: 0.5, polarization: 'pi', label: 'a → b' },
      { offsetHz: 5e8, strength: 1, polarization: 'sigma+', label: 'c → d' },
    ],
    spectrum: { offsetHz, intensity, caption: 'spectrum across the field, all light' },
  };
}

describe('spectrum curve', () => {
  it('keeps one-sample peaks among 50,001 samples, at the strongest stick height, and draws at most two points per half pixel', () => {
    const svg = parseSvg(renderLines(view(50_001, [12_345, 40_000]), { kind: 'export' }));
    const path = all(svg, (n) => n.attrs.class === 'sl-spectrum')[0]!;
    const pts = pathPoints(path.attrs.d!);
    expect(pts.length).toBeLessThan(4 * 760);
    const stickTops = all(svg, (n) => n.attrs['data-kind'] === 'component').map((g) => Number(g.attrs['data-strength']));
    expect(Math.max(...stickTops)).toBe(1);
    const top = Math.min(...pts.map((p) => p.y));
    expect(pts.filter((p) => Math.abs(p.y - top) < 1e-6).length).toBe(2);
    // A curve present across the whole window is framed by the window, not by the sticks' extent.
    expect(all(svg, (n) => n.name === 'svg')[0]!.attrs['data-x-domain']).toBe('-1000000000,1000000000');
  });

  it('names the curve in the legend and draws no curve when the intensity is all zero', () => {
    const v = view(101, []);
    v.spectrum!.intensity = new Float64Array(101);
    const src = renderLines(v, { kind: 'export' });
    expect(src).toContain('spectrum across the field, all light');
    expect(all(parseSvg(src), (n) => n.attrs.class === 'sl-spectrum')).toEqual([]);
  });
});

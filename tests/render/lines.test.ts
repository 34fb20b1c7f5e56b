/** Geometry and styling of the line-component stick spectrum (tolerances in SVG user units). */
import { describe, expect, it } from 'vitest';
import { renderLines, type LinesViewData } from '../../server/src/render';
import { linesFixture } from './fixtures';
import { all, axisMap, parseSvg, pathPoints, textOf } from './svgTree';

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
});

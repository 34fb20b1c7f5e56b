/**
 * The residuals figure at a worst case: measured points from µT to T (invented numbers). On a
 * linear field axis every weak-field point would sit on top of the others at B = 0; spread over
 * decades, the field axis is logarithmic and every point stands apart, in order.
 */
import { describe, expect, it } from 'vitest';
import { renderResiduals, type ResidualsViewData } from '../../server/src/render';
import { all, parseSvg, textOf } from './svgTree';

const theme = { kind: 'export' } as const;

function data(x: number[]): ResidualsViewData {
  return {
    title: 'wide fields',
    xKind: 'field',
    x,
    measured: x.map((b) => 6.8e9 + 1.4e10 * b),
    sigma: x.map(() => 1e3),
    model: x.map((b) => 6.8e9 + 1.4e10 * b + 500),
    unit: 'Hz',
    modelLine: false,
  };
}

function pointXs(svg: string): number[] {
  const root = parseSvg(svg);
  const [a, b] = root.attrs['data-x-range']!.split(',').map(Number);
  return all(root, (n) => n.attrs['data-kind'] === 'point').map((p) => {
    const d = all(p, (n) => n.name === 'path').map((n) => n.attrs.d!).find((s) => s.startsWith('M'))!;
    const xv = Number(/^M(-?[\d.]+)/.exec(d)![1]);
    expect(xv).toBeGreaterThanOrEqual(a! - 1);
    expect(xv).toBeLessThanOrEqual(b! + 1);
    return xv;
  });
}

describe('residuals figure', () => {
  it('draws fields from 2 µT to 1 T on a log axis, every point apart', () => {
    const svg = renderResiduals(data([2e-6, 0.01, 0.02, 0.15, 1]), theme);
    const root = parseSvg(svg);
    expect(root.attrs['data-x-scale']).toBe('log');
    const xs = pointXs(svg);
    for (let i = 1; i < xs.length; i++) expect(xs[i]! - xs[i - 1]!).toBeGreaterThan(20);
    const titles = all(root, (n) => n.attrs.class === 'sl-axis-title').map((n) => textOf(n));
    expect(titles).toContain('B, log scale (T)');
    // Tick labels are plain numbers, every one of them a power of ten here.
    const ticks = all(root, (n) => n.attrs['data-tick'] !== undefined && n.parent?.attrs.class?.includes('sl-axis-x') === true).map((n) => n.attrs['data-tick']!);
    expect(ticks.length).toBeGreaterThan(3);
    for (const t of ticks) expect(Math.log10(Number(t)) % 1).toBeCloseTo(0, 9);
  });

  it('keeps a linear axis for fields within two decades, or with a point at zero field', () => {
    expect(parseSvg(renderResiduals(data([0.01, 0.02, 0.15, 0.5]), theme)).attrs['data-x-scale']).toBe('linear');
    expect(parseSvg(renderResiduals(data([0, 0.01, 1]), theme)).attrs['data-x-scale']).toBe('linear');
  });
});

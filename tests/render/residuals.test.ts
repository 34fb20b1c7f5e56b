/**
 * The residuals figure at a worst case: measured points from µT to T (invented numbers). On a
 * linear field axis every weak-field point would sit on top of the others at B = 0; spread over
 * decades, the field axis is logarithmic and every point stands apart, in order.
 */
import { describe, expect, it } from 'vitest';
import { renderResiduals, type ResidualsViewData } from '../../server/src/render';
import { all, parseSvg, textOf } from './svgTree';
import { analyze } from '../../server/src/eval/analyze';
import { residualsView } from '../../server/src/views/residualsView';
import { readFileSync } from 'node:fs';

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

function xTicks(svg: string): string[] {
  const root = parseSvg(svg);
  const axes = all(root, (n) => n.attrs.class?.includes('sl-axis-x') === true);
  return all(axes[axes.length - 1]!, (n) => n.attrs['data-tick'] !== undefined).map((n) => n.attrs['data-tick']!);
}

describe('residuals figure', () => {
  it('reads its field axis in the unit the example wrote its points in (mT), not the no-unit rule (T past 0.1 T)', () => {
    const fit = analyze(readFileSync(new URL('../../examples/fit-rubidium.sublevel', import.meta.url), 'utf8')).result!.fits!.find((f) => f.name === 'constants')!;
    expect(fit.at_written_unit).toBe('mT');
    const view = residualsView(fit)!;
    expect(view.xWrittenUnit).toBe('mT');
    const root = parseSvg(renderResiduals(view, theme));
    expect(root.attrs['data-x-unit']).toBe('mT');
    // The same points with no unit written read the reports' unit for a 150 mT top: T, each log tick with its own prefix.
    expect(parseSvg(renderResiduals({ ...view, xWrittenUnit: undefined }, theme)).attrs['data-x-unit']).toBe('T');
  });

  it('draws points that all lie at zero field on a T axis with short ticks, not nT ticks of ±100,000,000', () => {
    const svg = renderResiduals(data([0, 0, 0]), theme);
    expect(parseSvg(svg).attrs['data-x-unit']).toBe('T');
    const ticks = xTicks(svg).map((t) => Math.abs(Number(t.replace('−', '-'))));
    expect(ticks.length).toBeGreaterThan(0);
    for (const t of ticks) expect(t).toBeLessThan(1);
    expect(svg).not.toContain('100,000,000');
  });

  it('draws fields from 2 µT to 1 T on a log axis, every point apart', () => {
    const svg = renderResiduals(data([2e-6, 0.01, 0.02, 0.15, 1]), theme);
    const root = parseSvg(svg);
    expect(root.attrs['data-x-scale']).toBe('log');
    const xs = pointXs(svg);
    for (let i = 1; i < xs.length; i++) expect(xs[i]! - xs[i - 1]!).toBeGreaterThan(20);
    const titles = all(root, (n) => n.attrs.class === 'sl-axis-title').map((n) => textOf(n));
    // Six decades read in no single unit: each tick names its own prefix, the title none.
    expect(titles).toContain('B, log scale');
    const ticks = xTicks(svg);
    expect(ticks).toEqual(expect.arrayContaining(['5 µT', '10 µT', '100 µT', '1 mT', '10 mT', '100 mT', '1 T']));
  });

  it('labels every decade the points span: the 0.5 mT points of the example read on the axis', () => {
    // The fields of examples/fit-rubidium.sublevel (0.5, 20, 60, 150 mT), written in mT.
    const svg = renderResiduals({ ...data([5e-4, 0.02, 0.06, 0.15]), xWrittenUnit: 'mT' }, theme);
    const root = parseSvg(svg);
    expect(root.attrs['data-x-scale']).toBe('log');
    expect(root.attrs['data-x-unit']).toBe('mT');
    const ticks = xTicks(svg).map(Number);
    for (const decade of [-1, 0, 1, 2]) expect(ticks.some((t) => Math.floor(Math.log10(t) + 1e-9) === decade)).toBe(true);
    expect(ticks).toContain(0.5);
    // The smallest point lies right of the smallest label's decade start, so it is read against a label of its own decade.
    expect(Math.min(...ticks)).toBeLessThanOrEqual(1);
  });

  it('shows in its legend the marks it draws: a dot with an error bar, and the model as rings', () => {
    const root = parseSvg(renderResiduals(data([5e-4, 0.02, 0.06, 0.15]), theme));
    const entries = all(root, (n) => n.attrs.class === 'sl-legend-entry');
    const model = entries.find((e) => textOf(e).includes('model'))!;
    const mark = all(model, (n) => n.attrs['data-marker'] !== undefined)[0]!;
    expect(mark.attrs['data-marker']).toBe('circle open');
    expect(mark.attrs.fill).toBe('none');
    // The plot's model rings have the same stroke and no fill.
    const ring = all(root, (n) => n.parent?.attrs['data-kind'] === 'point' && n.attrs.fill === 'none')[0]!;
    expect(ring.attrs['stroke-width']).toBe(mark.attrs['stroke-width']);
    const measured = entries.find((e) => textOf(e).includes('measured'))!;
    expect(all(measured, (n) => n.name === 'path').some((n) => /^M[\d.]+,[\d.]+V/.test(n.attrs.d!))).toBe(true);
  });

  it('keeps a linear axis for fields within two decades, or with a point at zero field', () => {
    expect(parseSvg(renderResiduals(data([0.01, 0.02, 0.15, 0.5]), theme)).attrs['data-x-scale']).toBe('linear');
    expect(parseSvg(renderResiduals(data([0, 0.01, 1]), theme)).attrs['data-x-scale']).toBe('linear');
  });
});

describe('the residual panel reads as σ', () => {
  function yTicks(svg: string): number[] {
    const root = parseSvg(svg);
    const axes = all(root, (n) => n.attrs.class?.includes('sl-axis-y') === true);
    return all(axes[axes.length - 1]!, (n) => n.attrs['data-tick'] !== undefined).map((n) => Number(n.attrs['data-tick']!.replace('−', '-')));
  }
  // A profile scan whose normalised residuals reach about ±3.5 (invented numbers).
  const scan = (worst: number): ResidualsViewData => {
    const x = Array.from({ length: 41 }, (_, i) => (i - 20) * 1e-4);
    const model = x.map((p) => 100 + 1000 * Math.exp(-((p / 5e-4) ** 2)));
    const z = x.map((_, i) => (i === 7 ? worst : i === 30 ? -worst : ((i * 37) % 11) / 5 - 1));
    return { title: 'scan', xKind: 'position', x, model, sigma: model.map((m) => Math.sqrt(m)), measured: model.map((m, i) => m + z[i]! * Math.sqrt(m)), unit: 'counts', modelLine: true };
  };

  it.each([3.5, 1.2])('labels the ±2 σ bands it draws (worst residual %s σ)', (worst) => {
    const ticks = yTicks(renderResiduals(scan(worst), theme));
    expect(ticks).toEqual(expect.arrayContaining([-2, 0, 2]));
  });

  it('labels a panel that reaches 20 σ with more than one tick', () => {
    const ticks = yTicks(renderResiduals(scan(20), theme));
    expect(ticks.length).toBeGreaterThanOrEqual(3);
    expect(Math.max(...ticks)).toBeGreaterThanOrEqual(10);
  });
});

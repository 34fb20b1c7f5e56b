/**
 * Peak labels and the peak table of the detector pattern at a worst case: a tall narrow peak
 * beside broad low ones (a J = 1 beam whose m = 0 passes undeflected). Labels at heights far apart
 * do not compete for room, so every peak keeps its position in its label; the peak table stands
 * clear of the position axis's title.
 */
import { describe, expect, it } from 'vitest';
import { renderPattern, type PatternViewData } from '../../server/src/render';
import { all, byClass, parseSvg, textOf } from './svgTree';
import { readFileSync } from 'node:fs';
import { estimateTextWidth } from '../../server/src/render/frame';
import { analyze } from '../../server/src/eval/analyze';
import { diagramFor } from '../../server/src/views/diagram';

const gaussian = (x: number, mu: number, fwhm: number, h: number): number => h * Math.exp(-4 * Math.LN2 * ((x - mu) / fwhm) ** 2);

/** Invented: two broad peaks (8 mm FWHM) 1000 times lower than a narrow one, 1.6 mm either side of it. */
function tallBesideLow(): PatternViewData {
  const positionsM = Array.from({ length: 2001 }, (_, k) => -0.01 + (k / 2000) * 0.02);
  const spec = [
    { c: -1.6e-3, w: 8e-3, h: 0.8 },
    { c: 0, w: 0.05e-3, h: 800 },
    { c: 1.6e-3, w: 8e-3, h: 0.8 },
  ];
  const parts = spec.map((p, i) => ({ id: `p${i}`, label: `m_J=${i - 1}`, values: positionsM.map((x) => gaussian(x, p.c, p.w, p.h)) }));
  const total = positionsM.map((_, k) => parts.reduce((s, p) => s + p.values[k]!, 0));
  return {
    title: 'tall beside low',
    positionsM,
    total,
    parts,
    peaks: spec.map((p, i) => ({ positionM: p.c, height: p.h, fwhmM: p.w, members: [`m_J=${i - 1}`] })),
    verdict: { resolved: true, text: '3 peaks, all resolved' },
  };
}

describe('pattern labels at a tall narrow peak beside broad low ones', () => {
  const svg = parseSvg(renderPattern(tallBesideLow(), { kind: 'export' }));

  it('every peak label names its position: the low ones sit far below the tall one’s label', () => {
    const labels = byClass(svg, 'sl-peak-label').map(textOf);
    expect(labels).toEqual(['1: −1.6 mm', '2: 0 mm', '3: 1.6 mm']);
  });

  it('the peak table starts clear of the position axis title (16 units or more between baselines)', () => {
    const title = all(svg, (n) => n.attrs.class === 'sl-axis-title' && n.parent?.attrs.class?.includes('sl-axis-x') === true)[0]!;
    const firstRow = byClass(svg, 'sl-peak-table')[0]!.children[0]!;
    expect(Number(firstRow.attrs.y) - Number(title.attrs.y)).toBeGreaterThanOrEqual(16);
    // And the figure is tall enough for its last row.
    const height = Number(all(svg, (n) => n.name === 'svg')[0]!.attrs.viewBox!.split(' ')[3]);
    const rows = byClass(svg, 'sl-peak-table')[0]!.children;
    expect(Number(rows.at(-1)!.attrs.y)).toBeLessThanOrEqual(height - 4);
  });
});

describe('pattern labels of two equal peaks side by side (examples/lithium-beam.sublevel)', () => {
  it('both keep their positions (the first reaches left from its number), and the two labels do not overlap', () => {
    const d = diagramFor(analyze(readFileSync('examples/lithium-beam.sublevel', 'utf8')), { view: 'pattern', theme: 'export' });
    if (!d.ok) throw new Error(d.message);
    const labels = byClass(parseSvg(d.svg), 'sl-peak-label');
    expect(labels.map(textOf)).toEqual(['1: −0.8767 mm', '2: 0.8767 mm']);
    const extent = (n: (typeof labels)[number]): [number, number] => {
      const w = estimateTextWidth(textOf(n), 10);
      const x0 = Number(n.attrs.x);
      const anchor = n.attrs['text-anchor'];
      return anchor === 'end' ? [x0 - w, x0] : anchor === 'start' ? [x0, x0 + w] : [x0 - w / 2, x0 + w / 2];
    };
    const [a, b] = labels.map(extent) as [[number, number], [number, number]];
    expect(a[1]).toBeLessThan(b[0]);
  });
});

/**
 * The detector pattern at worst cases: a figure must show every peak the beam report counts,
 * however low and broad, and its badge, description and peak table must say the same.
 */
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { patternCsv, renderPattern, type PatternViewData } from '../../server/src/render';
import { estimateTextWidth } from '../../server/src/render/frame';
import { peakTableRows } from '../../server/src/render/pattern';
import { diagramFor } from '../../server/src/views/diagram';
import { all, byClass, parseSvg, pathPoints, textOf, type Node } from './svgTree';
import { wideSlitBeam } from '../fixtures/ovenBeam';

const theme = { kind: 'export' } as const;

function gaussian(x: number, mu: number, fwhm: number, h: number): number {
  return h * Math.exp(-4 * Math.LN2 * ((x - mu) / fwhm) ** 2);
}

/** A tall narrow undeflected peak and two deflected peaks 400 times lower and 20 times broader. */
function broadLowPeaks(): PatternViewData {
  const positionsM = Array.from({ length: 2001 }, (_, k) => -0.02 + (k / 2000) * 0.04);
  const spec = [
    { c: -6e-3, w: 4e-3, h: 5 },
    { c: 0, w: 0.2e-3, h: 2000 },
    { c: 6e-3, w: 4e-3, h: 5 },
  ];
  const parts = spec.map((p, i) => ({ id: `p${i}`, label: `m_J=${i - 1}`, values: positionsM.map((x) => gaussian(x, p.c, p.w, p.h)) }));
  const total = positionsM.map((_, k) => parts.reduce((s, p) => s + p.values[k], 0));
  return {
    title: 'broad low peaks',
    positionsM,
    total,
    parts,
    peaks: spec.map((p, i) => ({ positionM: p.c, height: p.h, fwhmM: p.w, members: [`m_J=${i - 1}`] })),
    verdict: { resolved: true, text: '3 peaks, all resolved' },
  };
}

function plotBox(svg: Node): { left: number; right: number; top: number; bottom: number } {
  const [left, right] = svg.attrs['data-x-range'].split(',').map(Number);
  const [bottom, top] = svg.attrs['data-y-range'].split(',').map(Number);
  return { left, right, top, bottom };
}

function descOf(svg: Node): string {
  return textOf(svg.children.find((c) => c.name === 'desc')!);
}

describe('pattern worst cases', () => {
  it('keeps broad low peaks in view, on a log axis, each marked and numbered', () => {
    const d = broadLowPeaks();
    const svg = parseSvg(renderPattern(d, theme));
    expect(svg.attrs['data-y-scale']).toBe('log');
    const [x0, x1] = svg.attrs['data-x-domain'].split(',').map(Number);
    // Each broad peak keeps two widths either side in view.
    expect(x0).toBeLessThanOrEqual(-6e-3 - 8e-3 + 1e-9);
    expect(x1).toBeGreaterThanOrEqual(6e-3 + 8e-3 - 1e-9);
    const box = plotBox(svg);
    const peaks = all(svg, (n) => n.attrs['data-kind'] === 'peak');
    expect(peaks.map((p) => p.attrs['data-number'])).toEqual(['1', '2', '3']);
    for (const p of peaks) {
      const tip = pathPoints(byClass(p, 'sl-peak-mark')[0].attrs.d)[0];
      expect(tip.x).toBeGreaterThanOrEqual(box.left);
      expect(tip.x).toBeLessThanOrEqual(box.right);
      expect(tip.y).toBeGreaterThanOrEqual(box.top - 12);
      expect(tip.y).toBeLessThanOrEqual(box.bottom);
      expect(textOf(byClass(p, 'sl-peak-label')[0])).toMatch(new RegExp(`^${p.attrs['data-number']}`));
    }
    // The low peaks stand well clear of the floor of the log axis: readable, not flattened.
    const low = pathPoints(byClass(peaks[0], 'sl-peak-mark')[0].attrs.d)[0];
    expect(box.bottom - low.y).toBeGreaterThan(0.3 * (box.bottom - box.top));
    // Badge, description and table agree.
    expect(descOf(svg)).toContain('3 peaks (1 at −6 mm (m_J=-1); 2 at 0 mm (m_J=0); 3 at 6 mm (m_J=1))');
    expect(textOf(byClass(svg, 'sl-peak-table')[0])).toBe('Peaks: 1 at −6 mm (m_J=-1) · 2 at 0 mm (m_J=0) · 3 at 6 mm (m_J=1)');
    expect(textOf(all(svg, (n) => n.attrs['data-kind'] === 'verdict')[0])).toContain('3 peaks');
  });

  it('uses a linear axis stating its quantity when heights are comparable', () => {
    const d = broadLowPeaks();
    d.peaks = d.peaks.map((p) => ({ ...p, height: 10 }));
    const svg = parseSvg(renderPattern(d, theme));
    expect(svg.attrs['data-y-scale']).toBe('linear');
    expect(textOf(byClass(svg, 'sl-axis-y')[0])).toContain('atoms (% of atoms per mm)');
  });

  it('exports the whole grid, untrimmed', () => {
    const d = broadLowPeaks();
    const rows = patternCsv(d).trim().split('\n');
    expect(rows).toHaveLength(2 + 2001);
    expect(rows[2].split(',')[0]).toBe('-0.02');
  });

  const J1_BEAM = wideSlitBeam('3P1', '40 T/m');

  it.each([
    ['a J = 1 beam at 40 T/m', J1_BEAM, 3],
    ['a J = 2 beam with five peaks', J1_BEAM.replace('3P1', '3P2').replace('40 T/m', '400 T/m'), 5],
  ])('draws every peak the report counts for %s (one source of numbers)', (_name, text, count) => {
    const analysis = analyze(text);
    const report = analysis.result!.beams[0]!;
    expect(report.peaks).toHaveLength(count);
    const d = diagramFor(analysis, { view: 'pattern', theme: 'export' });
    if (!d.ok) throw new Error(d.message);
    const svg = parseSvg(d.svg);
    const peaks = all(svg, (n) => n.attrs['data-kind'] === 'peak');
    expect(peaks.map((p) => Number(p.attrs['data-position-m']))).toEqual(report.peaks.map((p) => Number(p.position_m.toPrecision(12))));
    expect(svg.attrs['data-peak-count']).toBe(String(count));
    expect(descOf(svg)).toContain(`${count} peaks`);
    const [x0, x1] = svg.attrs['data-x-domain'].split(',').map(Number);
    for (const p of report.peaks) {
      expect(p.position_m).toBeGreaterThanOrEqual(x0);
      expect(p.position_m).toBeLessThanOrEqual(x1);
    }
    // The CSV holds the engine's whole grid.
    expect(d.csv.trim().split('\n').length - 2).toBeGreaterThan(peaks.length * 50);
    expect(d.csv.split('\n')[0]).toBe('# sublevel pattern: beam=b; level=Xa.ground; field=magnet sel 0.5 T');
  });

  it('wraps the peak table between state names, so a peak of many states stays inside the figure', () => {
    // One broad peak holding nine sublevels of a large-spin ground level (invented heights).
    const d = broadLowPeaks();
    const members = [...Array.from({ length: 7 }, (_, k) => `F=3, m_F=${k - 3 > 0 ? '+' : ''}${k - 3}`), 'F=4, m_F=-4', 'F=4, m_F=+4'];
    d.peaks = [{ positionM: 0, height: 2000, fwhmM: 0.2e-3, members }];
    d.verdict = { resolved: true, text: 'one peak' };
    const svg = parseSvg(renderPattern(d, theme));
    const rows = byClass(svg, 'sl-peak-table')[0].children.map((r) => textOf(r));
    expect(rows.length).toBe(2);
    const width = Number(svg.attrs.viewBox.split(' ')[2]);
    for (const r of rows) expect(16 + estimateTextWidth(r)).toBeLessThanOrEqual(width - 16);
    // Read together the rows list every state once, in order, and break only between names.
    expect(rows.join(' ').replace(/\s+/g, ' ')).toBe(`Peaks: 1 at 0 µm (${members.join(', ')})`);
    expect(rows[0]).toMatch(/,$/);
    expect(rows[1]).toMatch(/^ {4}F=/);
  });

  it('starts a new row at a peak rather than inside a short one', () => {
    const rows = peakTableRows(
      [
        { head: '1 at −6 mm', members: ['m_J=-1'] },
        { head: '2 at 0 mm', members: ['m_J=0'] },
      ],
      estimateTextWidth('Peaks: 1 at −6 mm (m_J=-1) · 2 at'),
    );
    expect(rows).toEqual(['Peaks: 1 at −6 mm (m_J=-1)', '    2 at 0 mm (m_J=0)']);
  });

  it('says how many states a lone peak holds, so "resolved" is not read as "separated"', () => {
    // Invented apparatus: a weak gradient leaves nine populated Cs sublevels in one peak.
    const text = `species Cs133
  level ground: 6s 2S1/2
magnet sel
  field    = 800 G
  gradient = 25 G/cm
  length   = 0.12 m
beam wide
  level    = ground
  source   = oven 400 K
  slits    = 0.05 mm, 30 um apart 60 cm
  magnet   = sel
  drift    = 900 mm
  detector = 20 um
  populations = 4 4 1, 4 -4 1, 3 0.02
`;
    const analysis = analyze(text);
    expect(analysis.result!.beams[0]!.peaks).toHaveLength(1);
    expect(analysis.result!.beams[0]!.peaks[0]!.members).toHaveLength(9);
    const d = diagramFor(analysis, { view: 'pattern', theme: 'export' });
    if (!d.ok) throw new Error(d.message);
    const verdict = all(parseSvg(d.svg), (n) => n.attrs['data-kind'] === 'verdict')[0]!;
    expect(verdict.attrs['data-label']).toBe('one peak: all 9 states with atoms land together');
  });
});

/**
 * Every figure at its worst cases, from the invented setups in tests/fixtures/figs-*.sublevel:
 * fields of 1 nT and 30 T, a level of 80 sublevels, broad low detector peaks next to a narrow tall
 * one, a line of 1483 components and one of a single component, clusters 47 GHz apart, 1 kHz
 * spikes 1 GHz apart, a fit from three points. Each figure must say what the report counts, keep
 * its labels inside the frame, and print no NaN.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { estimateTextWidth } from '../../server/src/render/frame';
import { diagramFor, type DiagramRequest } from '../../server/src/views/diagram';
import { all, byClass, parseSvg, textOf, type Node } from './svgTree';

const fixture = (name: string): string => readFileSync(new URL(`../fixtures/${name}.sublevel`, import.meta.url), 'utf8');

function draw(name: string, request: Omit<DiagramRequest, 'theme'>, analysis = analyze(fixture(name))): string {
  const d = diagramFor(analysis, { theme: 'export', ...request });
  if (!d.ok) throw new Error(d.message);
  expect(d.svg).not.toMatch(/NaN|Infinity/);
  return d.svg;
}

/** The font size a text is set in: its own or its nearest ancestor's, else the figures' 11 px. */
function fontSizeOf(n: Node | undefined): number {
  for (let at = n; at; at = at.parent) if (at.attrs['font-size'] !== undefined) return Number(at.attrs['font-size']);
  return 11;
}

/** Every text's estimated box lies inside the figure's viewBox. */
function expectTextsInside(svg: Node): void {
  const [, , width, height] = svg.attrs.viewBox!.split(' ').map(Number);
  const texts = all(svg, (n) => n.name === 'text' && n.attrs.x !== undefined && n.attrs.transform === undefined);
  expect(texts.length).toBeGreaterThan(5);
  for (const t of texts) {
    const x = Number(t.attrs.x);
    const w = estimateTextWidth(textOf(t));
    const left = t.attrs['text-anchor'] === 'end' ? x - w : t.attrs['text-anchor'] === 'middle' ? x - w / 2 : x;
    expect(left, textOf(t)).toBeGreaterThanOrEqual(-0.5);
    expect(left + w, textOf(t)).toBeLessThanOrEqual(width! + 0.5);
    const y = Number(t.attrs.y);
    if (!Number.isFinite(y)) continue;
    // y is the baseline: the text's top (its cap height, about 0.75 of the font size, above it) must stay inside too.
    expect(y - 0.75 * fontSizeOf(t), textOf(t)).toBeGreaterThanOrEqual(-0.5);
    expect(y, textOf(t)).toBeLessThanOrEqual(height!);
  }
}

describe('a level of 80 sublevels (J = 9/2, I = 7/2) swept to 2.5 T', () => {
  const svg = parseSvg(draw('figs-many-sublevels', { view: 'levels', toT: 2.5 }));
  const left = byClass(byClass(svg, 'sl-end-low')[0]!, 'sl-end-label');

  it('names the F values a merged zero-field label holds, not only how many states', () => {
    const merged = left.map((l) => l.attrs['data-label']!).filter((t) => t.includes('states'));
    expect(merged).toEqual(['F=3,4: 16 states', 'F=1,2: 8 states']);
    // Each merged label holds exactly the states of the F values it names: Σ (2F + 1) over them, and says so.
    for (const l of left.filter((n) => n.attrs['data-label']!.includes('states'))) {
      const label = l.attrs['data-label']!;
      const fs = /^F=([\d,]+):/.exec(label)![1]!.split(',').map(Number);
      const states = fs.reduce((sum, f) => sum + 2 * f + 1, 0);
      expect(Number(/(\d+) states/.exec(label)![1])).toBe(states);
      expect(l.attrs['data-members']!.split(' ')).toHaveLength(states);
    }
  });

  it('joins all 80 curves to a name on the left and keeps every label inside the figure', () => {
    expect(left.flatMap((l) => l.attrs['data-members']!.split(' '))).toHaveLength(80);
    expectTextsInside(svg);
  });
});

describe('fields of 1 nT and 30 T', () => {
  it.each([
    ['levels to 2 nT', 'nT', { view: 'levels', fieldName: 'tiny', toT: 2e-9 }],
    ['levels to 31 T', 'T', { view: 'levels', fieldName: 'huge', toT: 31 }],
    ['resonance over 1 nT', 'nT', { view: 'resonance', resonanceName: 'faint' }],
    ['resonance over 30 T', 'T', { view: 'resonance', resonanceName: 'strong' }],
  ] as const)('%s: the axis reads %s, labels inside, no NaN', (_name, unit, request) => {
    const svg = parseSvg(draw('figs-extreme-fields', request));
    expect(svg.attrs['data-x-unit']).toBe(unit);
    expectTextsInside(svg);
  });

  it('a field the evaluation finds reads with its own prefix on a tesla axis (322.9 µT, not 0.0003229 T)', () => {
    const svg = parseSvg(draw('figs-extreme-fields', { view: 'resonance', resonanceName: 'strong' }));
    const marks = all(svg, (n) => n.attrs['data-kind'] === 'marker').map((m) => m.attrs['data-label']);
    expect(marks).toContain('df/dB = 0 · 322.9 µT');
    expect(marks).toContain('field tiny · 1 nT');
    expect(marks).toContain('field huge · 30 T');
  });

  it.each([
    ['whisper', 'nT'],
    ['magnet', 'T'],
  ])('the field map of coil %s reads |B| in %s', (source, unit) => {
    const svg = draw('figs-extreme-fields', { view: 'fieldmap', sourceNames: [source] });
    expect(svg).toContain(`>B (${unit})<`);
    expectTextsInside(parseSvg(svg));
  });

  it.each(['tiny', 'huge'])('the line at field %s draws its components with no NaN', (field) => {
    const svg = parseSvg(draw('figs-extreme-fields', { view: 'lines', fieldName: field }));
    expect(all(svg, (n) => n.attrs['data-kind'] === 'component').length).toBeGreaterThan(0);
    expectTextsInside(svg);
  });
});

describe('spectra of 1483 components and of one', () => {
  const analysis = analyze(fixture('figs-spectra'));
  const counted = (name: string): number => analysis.result!.lines.find((l) => l.name === name)!.at_fields[0]!.components.length;

  it('the figure accounts for every component the report lists: drawn, outside the frame, or counted as too faint', () => {
    const svg = parseSvg(draw('figs-spectra', { view: 'lines', lineName: 'many' }));
    const drawn = all(svg, (n) => n.attrs['data-kind'] === 'component').length;
    const texts = all(svg, (n) => n.name === 'text' || n.name === 'tspan').map(textOf);
    const faint = Number(/^not drawn: (\d+) components/.exec(texts.find((t) => t.startsWith('not drawn: '))!)![1]);
    // The frame is where the curve is; the few components beyond it are counted, not dropped.
    const outside = Number(/^outside the frame: (\d+) components/.exec(texts.find((t) => t.startsWith('outside the frame: '))!)![1]);
    expect(counted('many')).toBeGreaterThan(100);
    expect(outside).toBeGreaterThan(0);
    expect(drawn + outside + faint).toBe(counted('many'));
    expectTextsInside(svg);
  });

  it('the line of 1483: the frame is the curve’s, not the numeric tail’s, and the sticks read on their own scale', () => {
    const svg = parseSvg(draw('figs-spectra', { view: 'lines', lineName: 'many' }));
    const window = analysis.result!.lines.find((l) => l.name === 'many')!.at_fields[0]!.spectrum!.window_Hz;
    const [f0, f1] = svg.attrs['data-x-domain']!.split(',').map(Number);
    // Before: the whole window, −11.25 to 9.62 GHz; the curve lies within about ±3.5 GHz.
    expect(f0).toBeGreaterThan(-4e9);
    expect(f1).toBeLessThan(4e9);
    expect(f1! - f0!).toBeLessThan(0.35 * (window[1] - window[0]));
    expect(svg.attrs['data-stick-scale']).toBe('own');
  });

  it.each([
    ['apart', 'strong', 6],
    ['spikes', 'weak', 3],
    ['needle', 'weak', 1],
  ])('line %s at field %s: %i segment(s), labels inside, no NaN', (lineName, fieldName, segments) => {
    const svg = parseSvg(draw('figs-spectra-apart', { view: 'lines', lineName, fieldName }));
    expect(svg.attrs['data-segments']).toBe(String(segments));
    expect(all(svg, (n) => n.attrs.class === 'sl-segment')).toHaveLength(segments);
    expectTextsInside(svg);
  });

  it('a single component: one stick under its curve, no note of overlaps or faint ones', () => {
    const svg = parseSvg(draw('figs-spectra', { view: 'lines', lineName: 'lone' }));
    expect(all(svg, (n) => n.attrs['data-kind'] === 'component')).toHaveLength(1);
    expect(all(svg, (n) => n.attrs['data-kind'] === 'spectrum')).toHaveLength(1);
    expect(all(svg, (n) => n.name === 'text').map(textOf).some((t) => /not drawn|drawn at|outside the frame|axis broken/.test(t))).toBe(false);
    // One component: the stick shares the curve's scale, and the legend says the curve peaks at it.
    expect(svg.attrs['data-stick-scale']).toBe('shared');
    expect(all(svg, (n) => n.name === 'text').map(textOf).some((t) => t.endsWith('(a lone component peaks at its stick)'))).toBe(true);
    expectTextsInside(svg);
  });
});

describe('detector patterns: 80 sublevels, and broad low peaks beside a narrow tall one', () => {
  const analysis = analyze(fixture('figs-crowded-beam'));

  it.each(['heavy', 'light'])('beam %s: one marked peak per peak the report counts, and its unresolved pairs in the badge', (beam) => {
    const report = analysis.result!.beams.find((b) => b.name === beam)!;
    const svg = parseSvg(draw('figs-crowded-beam', { view: 'pattern', beam: analysis.model!.beams.find((b) => b.name === beam) }, analysis));
    const peaks = all(svg, (n) => n.attrs['data-kind'] === 'peak');
    expect(peaks.map((p) => Number(p.attrs['data-position-m']))).toEqual(report.peaks.map((p) => Number(p.position_m.toPrecision(12))));
    const unresolved = report.pairs.filter((r) => !r.resolved).length;
    const badge = all(svg, (n) => n.name === 'text').map(textOf).find((t) => /^\d+ peaks/.test(t))!;
    expect(badge).toBe(unresolved === 0 ? `${report.peaks.length} peaks, all resolved` : `${report.peaks.length} peaks; ${unresolved} of ${report.pairs.length} neighbouring pairs not resolved`);
    expectTextsInside(svg);
  });
});

describe('a fit from three points', () => {
  it('draws the three points and their residuals, with a labelled tick in the decade of the last point', () => {
    const svg = parseSvg(draw('figs-three-point-fit', { view: 'residuals' }));
    expect(all(svg, (n) => n.attrs['data-kind'] === 'point')).toHaveLength(3);
    expect(svg.attrs['data-x-scale']).toBe('log');
    // Points at 0.5, 20 and 60 mT: the top decade is labelled at 10, 20 and 50, not left bare after 20.
    const ticks = all(svg, (n) => n.attrs['data-tick'] !== undefined).map((n) => n.attrs['data-tick']);
    expect(ticks).toEqual(expect.arrayContaining(['0.5', '1', '2', '5', '10', '20', '50']));
    expectTextsInside(svg);
  });
});

/**
 * The spectrum figure at its worst cases (tests/fixtures/figs-spectra*.sublevel, invented data):
 * the frame is where the curve stands above CURVE_FLOOR of its peak, not the report's whole
 * sample window; clusters far apart get a broken axis on one scale; sticks too short to read
 * against a blend get their own scale with the strongest at the curve's peak; a line narrower
 * than the report's sample step is drawn from finer samples. Every number the figure prints
 * is one the text report prints.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { spectrumSamples } from '../../server/src/eval/spectrumSamples';
import { textReport } from '../../server/src/cli/textReport';
import { CURVE_FLOOR, segmentLayout, spectrumFrame } from '../../server/src/render/spectrumFrame';
import { diagramFor } from '../../server/src/views/diagram';
import { renderLines, type LinesViewData } from '../../server/src/render';
import { all, byClass, parseSvg, pathPoints, textOf, type Node } from './svgTree';

const fixture = (name: string): string => readFileSync(new URL(`../fixtures/${name}.sublevel`, import.meta.url), 'utf8');

function figure(name: string, lineName: string, fieldName?: string) {
  const analysis = analyze(fixture(name));
  const d = diagramFor(analysis, { view: 'lines', theme: 'export', lineName, ...(fieldName ? { fieldName } : {}) });
  if (!d.ok) throw new Error(d.message);
  expect(d.svg).not.toMatch(/NaN|Infinity/);
  const line = analysis.result!.lines.find((l) => l.name === lineName)!;
  const at = fieldName ? line.at_fields.find((f) => f.source.name === fieldName)! : line.at_fields[0]!;
  const report = textReport(`${name}.sublevel`, analysis.result!).join('\n');
  return { svg: parseSvg(d.svg), at, report };
}

const pair = (s: string): [number, number] => s.split(',').map(Number) as [number, number];
const notes = (svg: Node): string[] => byClass(svg, 'sl-note').map(textOf);
const sticks = (n: Node): Node[] => all(n, (k) => k.attrs['data-kind'] === 'component');
const stickTop = (g: Node): number => pathPoints(all(g, (n) => n.name === 'path')[0]!.attrs.d!)[1]!.y;
const curveTop = (n: Node): number => Math.min(...byClass(n, 'sl-spectrum').flatMap((p) => pathPoints(p.attrs.d!)).map((p) => p.y));

/** The extent of the report's own samples where the curve is at least CURVE_FLOOR of its highest. */
function curveExtent(at: ReturnType<typeof figure>['at']): [number, number] {
  const s = spectrumSamples(at.spectrum!, at.components);
  const peak = Math.max(...s.intensity);
  const above = Array.from(s.offsetHz).filter((_, i) => s.intensity[i]! >= CURVE_FLOOR * peak);
  return [Math.min(...above), Math.max(...above)];
}

describe('a line of 1483 components under a 565 MHz Doppler width', () => {
  const { svg, at, report } = figure('figs-spectra', 'many');

  it('frames where the curve is: its extent plus a margin, a third of the report window (was the whole window, −11.25 to 9.62 GHz)', () => {
    const [f0, f1] = pair(svg.attrs['data-x-domain']!);
    const [c0, c1] = curveExtent(at);
    const step = (at.spectrum!.window_Hz[1] - at.spectrum!.window_Hz[0]) / (at.spectrum!.points - 1);
    expect(f0).toBeLessThanOrEqual(c0);
    expect(f1).toBeGreaterThanOrEqual(c1);
    // A margin of 6 % a side, and a sample either side of the crossing: no more.
    expect(f1 - f0).toBeLessThan((c1 - c0) * 1.12 + 4 * step);
    expect(f1 - f0).toBeLessThan(0.35 * (at.spectrum!.window_Hz[1] - at.spectrum!.window_Hz[0]));
    expect(svg.attrs['data-segments']).toBe('1');
  });

  it('draws the sticks on their own scale, the strongest at the curve’s peak, and says so', () => {
    expect(svg.attrs['data-stick-scale']).toBe('own');
    const drawn = sticks(svg);
    const strongest = drawn.reduce((a, b) => (Number(b.attrs['data-observed']) > Number(a.attrs['data-observed']) ? b : a));
    // The curve's highest sample and the strongest stick end on the same pixel row (to the sampling of the top).
    expect(Math.abs(stickTop(strongest) - curveTop(svg))).toBeLessThan(1);
    // The right-hand scale reads the stick's own value at its top.
    const [, stickMax] = pair(svg.attrs['data-stick-y-domain']!);
    const [bottom, top] = pair(svg.attrs['data-y-range']!);
    const read = (stickMax * (bottom - stickTop(strongest))) / (bottom - top);
    expect(read).toBeCloseTo(Number(strongest.attrs['data-observed']), 2);
    expect(byClass(svg, 'sl-axis-y2').map((a) => textOf(byClass(a, 'sl-axis-title')[0]!))).toEqual(['sticks: strength × viewing factor']);
    expect(all(svg, (n) => n.name === 'text').map(textOf)).toContain('sticks on the right-hand scale: the strongest drawn at the curve’s peak');
  });

  it('prints the report’s numbers: the Voigt width, the sample count and window', () => {
    const texts = all(svg, (n) => n.name === 'text').map(textOf);
    const fwhm = /Voigt FWHM ≈ ([^ ]+ [A-Za-z]+)/.exec(texts.find((t) => t.startsWith('spectrum across'))!)![1]!;
    expect(report).toContain(`Voigt FWHM ≈ ${fwhm}`);
    expect(fwhm).toBe('565.4 MHz');
    const windowNote = notes(svg).find((t) => t.startsWith('frame: '))!;
    const [, n, a, b] = /\(the report’s (\d+) samples: (\S+ \S+) to (\S+ \S+)\)$/.exec(windowNote)!;
    expect(report).toContain(`${n} samples from ${a!.replace('−', '-')} to ${b!.replace('−', '-')}`);
  });
});

describe('a line whose components sit in clusters 47 GHz apart at 5 T (1.5 GHz Doppler width)', () => {
  const { svg, at } = figure('figs-spectra-apart', 'apart', 'strong');
  const segments = byClass(svg, 'sl-segment');

  it('breaks the axis into one segment per cluster, on one frequency scale, with a mark at each break', () => {
    expect(segments).toHaveLength(6);
    const perPx = segments.map((g) => {
      const [a, b] = pair(g.attrs['data-x-domain']!);
      const [l, r] = pair(g.attrs['data-x-range']!);
      return (b - a) / (r - l);
    });
    for (const s of perPx) expect(s / perPx[0]!).toBeCloseTo(1, 2);
    expect(byClass(svg, 'sl-axis-break')).toHaveLength(5);
    expect(notes(svg)[0]).toMatch(/^axis broken where the curve is under 0\.001 × its peak: 5 gaps of [\d.–]+ GHz left out, one scale$/);
  });

  it('puts every cluster’s sticks in its own segment, each segment framing its curve, and leaves no component unaccounted', () => {
    const counted = at.components.length;
    const drawn = segments.map((g) => sticks(g).length);
    expect(drawn.every((n) => n > 0)).toBe(true);
    const faint = Number(byClass(svg, 'sl-faint-note')[0]?.attrs['data-left-out'] ?? 0);
    const outside = Number(byClass(svg, 'sl-outside-note')[0]?.attrs['data-left-out'] ?? 0);
    expect(drawn.reduce((s, n) => s + n, 0) + faint + outside).toBe(counted);
    // Each segment's curve rises from near zero at both edges to a peak inside it.
    for (const g of segments) {
      const pts = pathPoints(byClass(g, 'sl-spectrum')[0]!.attrs.d!);
      const [bottom] = pair(svg.attrs['data-y-range']!);
      expect(bottom - pts[0]!.y).toBeLessThan(2);
      expect(bottom - pts[pts.length - 1]!.y).toBeLessThan(2);
      expect(bottom - curveTop(g)).toBeGreaterThan(40);
    }
  });

  it('draws in the editor’s panel theme too, with a hit target per stick', () => {
    const d = diagramFor(analyze(fixture('figs-spectra-apart')), { view: 'lines', theme: 'panel', lineName: 'apart', fieldName: 'strong' });
    expect(d.ok).toBe(true);
    const panel = parseSvg(d.ok ? d.svg : '');
    expect(byClass(panel, 'sl-hit').length).toBe(sticks(panel).length);
    expect(byClass(panel, 'sl-segment')).toHaveLength(6);
  });

  it('the segments run from the σ− cluster near −117 GHz to the σ+ one near +117 GHz', () => {
    const [f0] = pair(segments[0]!.attrs['data-x-domain']!);
    const [, f1] = pair(segments[5]!.attrs['data-x-domain']!);
    expect(f0).toBeLessThan(-100e9);
    expect(f1).toBeGreaterThan(100e9);
  });
});

describe('a 1 kHz line with no Doppler width: three spikes 1.05 GHz apart, and one spike alone', () => {
  it('draws each spike from finer samples than the report’s 21 kHz step, so each lone spike meets its stick', () => {
    const { svg, at } = figure('figs-spectra-apart', 'spikes', 'weak');
    const segments = byClass(svg, 'sl-segment');
    expect(segments).toHaveLength(3);
    for (const g of segments) {
      const [s] = sticks(g);
      const [bottom] = pair(svg.attrs['data-y-range']!);
      // A lone component peaks at its stick: within 2 % of the stick's height.
      expect(Math.abs(curveTop(g) - stickTop(s!))).toBeLessThan(0.02 * (bottom - stickTop(s!)) + 0.5);
    }
    const step = (at.spectrum!.window_Hz[1] - at.spectrum!.window_Hz[0]) / (at.spectrum!.points - 1);
    expect(step).toBeGreaterThan(10 * at.spectrum!.voigt_fwhm_Hz);
    expect(notes(svg).find((t) => t.startsWith('curve drawn with'))).toMatch(/^curve drawn with \d+ extra samples: the report’s are 21 kHz apart, the line 1 kHz wide$/);
  });

  it('labels a spike 1.05 GHz out in kHz from a round value, not with seven-digit ticks', () => {
    const { svg } = figure('figs-spectra-apart', 'needle', 'weak');
    expect(svg.attrs['data-segments']).toBe('1');
    const axis = byClass(svg, 'sl-axis-x')[0]!;
    expect(textOf(byClass(axis, 'sl-axis-title')[0]!)).toBe('Δf − 1.05053 GHz (kHz)');
    const ticks = all(axis, (n) => n.attrs['data-tick'] !== undefined).map((n) => n.attrs['data-tick']!);
    expect(ticks.length).toBeGreaterThan(3);
    for (const t of ticks) expect(t.replace(/[−\-.]/g, '').length).toBeLessThanOrEqual(2);
    // The root describes the scale as the ticks read it, for the panel's pointer readout.
    expect(svg.attrs['data-x-name']).toBe('Δf − 1.05053 GHz');
    expect(svg.attrs['data-x-unit']).toBe('kHz');
    const [d0, d1] = pair(svg.attrs['data-x-domain']!);
    expect(d0).toBeGreaterThan(-7e3);
    expect(d1).toBeLessThan(7e3);
    // The window is only ±6 line widths: the frame is the whole window, and no note is needed.
    expect(notes(svg).some((t) => t.startsWith('frame'))).toBe(false);
  });
});

describe('spectrumFrame and segmentLayout', () => {
  it('keeps one frame when the gaps are small compared with the extent', () => {
    expect(spectrumFrame([[-10, -2], [-1, 1], [2, 10]], [-30, 30]).segments).toEqual([[-10 - 1.2, 10 + 1.2]]);
  });

  it('breaks at gaps wider than 12 % of the extent when that saves 40 % of it', () => {
    const f = spectrumFrame([[-100, -98], [-1, 1], [98, 100]], [-200, 200]);
    expect(f.segments.map((s) => s.map((v) => Math.round(v * 100) / 100))).toEqual([[-100.12, -97.88], [-1.12, 1.12], [97.88, 100.12]]);
    expect(f.gaps).toHaveLength(2);
  });

  it('never widens a frame beyond the sample window', () => {
    expect(spectrumFrame([[-5, 5]], [-5, 5]).segments).toEqual([[-5, 5]]);
  });

  it('widens a narrow segment about its centre on the common scale', () => {
    const { segments, widths } = segmentLayout([[0, 100], [1000, 1001]], 500, 10, 70, [-1000, 2000]);
    expect(widths).toEqual([420, 70].map((w) => expect.closeTo(w, 9)));
    // 420 px for 100 Hz: the second segment's 70 px hold 70/4.2 Hz about its centre.
    expect(segments[1]![1] - segments[1]![0]).toBeCloseTo(70 / 4.2, 9);
    expect((segments[1]![0] + segments[1]![1]) / 2).toBeCloseTo(1000.5, 9);
  });

  it('shifts a widened segment back inside the sample window', () => {
    const { segments, widths } = segmentLayout([[0, 100], [1000, 1001]], 500, 10, 70, [0, 1001]);
    expect(widths).toEqual([420, 70].map((w) => expect.closeTo(w, 9)));
    expect(segments[1]![1]).toBe(1001);
    expect(segments[1]![0]).toBeCloseTo(1001 - 70 / 4.2, 9);
  });

  // Five narrow clusters 12.2 apart after a wide one (invented): widened about their centres to 70 px,
  // two neighbours overlapped ([44.94, 57.36] and [57.14, 69.56]) and drew the frequencies between twice.
  const crowded: [number, number][] = [[0, 39], [51.1, 51.2], [63.3, 63.4], [75.5, 75.6], [87.7, 87.8], [99.9, 100]];

  it('merges widened segments that would meet instead of overlapping them, all inside the window and on one scale', () => {
    const frame = spectrumFrame(crowded, [-50, 200]);
    expect(frame.segments).toHaveLength(6);
    const { segments, widths, gaps } = segmentLayout(frame.segments, 676, 16, 70, [-50, 200]);
    const r = (v: number): number => Math.round(v * 1000) / 1000;
    // The middle four pair up (their gaps would have taken under 32 px), each pair spanning both frames
    // (51.094–63.406) plus 6 % of that a side; the last is widened to 70 px.
    expect(segments.slice(0, 3).map((s) => s.map(r))).toEqual([[-2.34, 41.34], [50.355, 64.145], [74.755, 88.545]]);
    expect(widths[3]).toBeCloseTo(70, 9);
    for (let i = 0; i < segments.length; i++) {
      expect(segments[i]![0]).toBeLessThan(segments[i]![1]);
      expect(segments[i]![0]).toBeGreaterThanOrEqual(-50);
      expect(segments[i]![1]).toBeLessThanOrEqual(200);
      if (i > 0) expect(segments[i]![0]).toBeGreaterThan(segments[i - 1]![1]);
    }
    const scale = widths[0]! / (segments[0]![1] - segments[0]![0]);
    segments.forEach(([a, b], i) => expect(widths[i]! / (b - a)).toBeCloseTo(scale, 9));
    expect(widths.reduce((s, w) => s + w, 0) + 16 * (segments.length - 1)).toBeCloseTo(676, 9);
    expect(gaps).toEqual(segments.slice(1).map(([a], i) => [segments[i]![1], a]));
    // Every gap left out takes at least twice the break's 16 px on the scale.
    for (const [a, b] of gaps) expect((b - a) * scale).toBeGreaterThanOrEqual(32);
  });

  it('keeps a segment narrower than 70 px inside the window when the window ends at its edge', () => {
    const frame = spectrumFrame(crowded, [-50, 100.006]);
    const { segments } = segmentLayout(frame.segments, 676, 16, 70, [-50, 100.006]);
    expect(segments[segments.length - 1]![1]).toBeLessThanOrEqual(100.006);
    for (let i = 1; i < segments.length; i++) expect(segments[i]![0]).toBeGreaterThan(segments[i - 1]![1]);
  });
});

describe('the figure over those crowded segments (invented curve and components, MHz)', () => {
  const MHz = 1e6;
  const crowded: [number, number][] = [[0, 39], [51.1, 51.2], [63.3, 63.4], [75.5, 75.6], [87.7, 87.8], [99.9, 100]];

  /** A broad bump over 0–39 MHz and a narrow peak at the centre of each other stretch, sampled every 0.01 MHz. */
  function crowdedFigure(windowMHz: [number, number], extra: number[]): { svg: Node; total: number } {
    const peaks = crowded.slice(1).map(([a, b]) => (a + b) / 2);
    const offsetHz: number[] = [];
    const intensity: number[] = [];
    for (let f = windowMHz[0]; f <= windowMHz[1] + 1e-9; f += 0.01) {
      offsetHz.push(f * MHz);
      const bump = Math.exp(-(((f - 19.5) / 5.3) ** 2) / 2);
      intensity.push(bump + peaks.reduce((t, p) => t + Math.exp(-(((f - p) / 0.015) ** 2) / 2), 0));
    }
    // Sticks: three under the bump, one on each narrow peak, one between two of them (57.25 MHz: drawn in
    // both overlapping segments before), one inside the window where the curve is absent (150 MHz),
    // one a million times weaker than the rest (not drawn), and any `extra` ones.
    const at = [10, 19.5, 30, ...peaks, 57.25, 150, ...extra];
    const components: LinesViewData['components'] = at.map((f, i) => ({ offsetHz: f * MHz, strength: 1, polarization: 'pi', label: `c${i}` }));
    components.push({ offsetHz: 20 * MHz, strength: 1e-6, polarization: 'pi', label: 'faint' });
    const d: LinesViewData = {
      title: 'crowded',
      components,
      spectrum: { offsetHz, intensity, caption: 'invented curve', stretches: crowded.map(([a, b]) => [a * MHz, b * MHz]), windowHz: [windowMHz[0] * MHz, windowMHz[1] * MHz], points: offsetHz.length },
    };
    const src = renderLines(d, { kind: 'export' });
    expect(src).not.toMatch(/NaN|Infinity/);
    return { svg: parseSvg(src), total: components.length };
  }

  const domainHz = (g: Node): [number, number] => {
    const [a, b] = pair(g.attrs['data-x-domain']!);
    const off = Number(g.attrs['data-x-offset']);
    return [a + off, b + off];
  };
  const leftOut = (svg: Node, cls: string): number => Number(byClass(svg, cls)[0]?.attrs['data-left-out'] ?? 0);

  it('draws each component once: drawn, outside the frame and too faint add up to the count', () => {
    const { svg, total } = crowdedFigure([-50, 200], []);
    const segments = byClass(svg, 'sl-segment');
    const drawn = segments.flatMap(sticks);
    expect(new Set(drawn.map((n) => n.attrs['data-label'] ?? textOf(n))).size).toBe(drawn.length);
    // 8 sticks in the frame; 150 MHz outside it (was counted 0: 57.25 MHz was drawn twice); the faint one.
    expect(drawn).toHaveLength(9);
    expect(leftOut(svg, 'sl-outside-note')).toBe(1);
    expect(byClass(svg, 'sl-beyond-note')).toHaveLength(0);
    expect(drawn.length + leftOut(svg, 'sl-outside-note') + leftOut(svg, 'sl-faint-note')).toBe(total);
  });

  it('names in its note and break marks the gaps between the segments as drawn', () => {
    const { svg } = crowdedFigure([-50, 200], []);
    const segments = byClass(svg, 'sl-segment').map(domainHz);
    expect(segments).toHaveLength(4);
    const gaps = segments.slice(1).map(([a], i) => [segments[i]![1], a] as [number, number]);
    const marks = byClass(svg, 'sl-axis-break').map((m) => pair(m.attrs['data-left-out-hz']!));
    marks.forEach((m, i) => {
      expect(m[0]).toBeLessThan(m[1]);
      expect(m[0]).toBeCloseTo(gaps[i]![0], -1);
      expect(m[1]).toBeCloseTo(gaps[i]![1], -1);
    });
    expect(marks).toHaveLength(3);
    const widths = gaps.map(([a, b]) => (b - a) / MHz);
    const note = notes(svg).find((t) => t.startsWith('axis broken'))!;
    const [, n, lo, hi] = /: (\d+) gaps of ([\d.]+)–([\d.]+) MHz left out/.exec(note)!;
    expect(Number(n)).toBe(3);
    expect(Number(lo)).toBeCloseTo(Math.min(...widths), 2);
    expect(Number(hi)).toBeCloseTo(Math.max(...widths), 1);
  });

  it('never draws past the window a component that the window note counts', () => {
    // The window ends just past the last stretch; a component at 102 MHz lies beyond it.
    const { svg, total } = crowdedFigure([-50, 100.05], [102]);
    const segments = byClass(svg, 'sl-segment');
    for (const g of segments) expect(domainHz(g)[1]).toBeLessThanOrEqual(100.05 * MHz + 1);
    const drawn = segments.flatMap(sticks).length;
    expect(leftOut(svg, 'sl-beyond-note')).toBe(2);
    expect(drawn + leftOut(svg, 'sl-outside-note') + leftOut(svg, 'sl-beyond-note') + leftOut(svg, 'sl-faint-note')).toBe(total);
  });
});

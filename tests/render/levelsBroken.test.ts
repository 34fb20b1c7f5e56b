/**
 * The level diagram at a magnetometer's fields, through the whole pipeline (file → evaluation →
 * view → SVG): manifolds far apart compared with their Zeeman fans are drawn in stacked bands, each
 * on its own offset axis. The tick labels of each band are read back (as a reader would) and
 * compared with the report's own energies; labels of 40 sublevels must not collide; a strong-field
 * figure stays as it was. Setups are invented for the test (built-in Rb87 data; a made-up species).
 */
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { diagramFor } from '../../server/src/views/diagram';
import { levelsView } from '../../server/src/views/levelsView';
import { gJLookup } from '../../server/src/eval/gJLookup';
import { workingFields } from '../../server/src/eval/evaluate';
import { renderLevels } from '../../server/src/render';
import { estimateTextWidth } from '../../server/src/render/frame';
import { all, axisMap, byClass, parseSvg, pathPoints, textOf, type Node } from './svgTree';

const RB_20UT = 'species Rb87\n  level ground: 5s 2S1/2\nfield bias = 20 uT\n';
/** Invented: I = 9/2 and a 2P3/2 level, F = 3…6, 40 sublevels. */
const FORTY = 'species Demo40\n  mass = 90 u\n  I = 9/2\n  mu_I = -1.3 muN\n  level upper: 5p 2P°3/2  A = -12 MHz  B = 3 MHz\nfield bias = 100 uT\n';
/** Invented: I = 5 and a 2S1/2 level, F = 9/2 and 11/2, 22 sublevels. */
const TWENTY_TWO = 'species Demo5\n  mass = 120 u\n  I = 5\n  mu_I = 3.1 muN\n  level ground: 6s 2S1/2  A = 900 MHz\nfield bias = 100 uT\n';

const UNIT: Record<string, number> = { Hz: 1, kHz: 1e3, MHz: 1e6, GHz: 1e9 };

function drawn(text: string, toT: number) {
  const analysis = analyze(text);
  const d = diagramFor(analysis, { view: 'levels', theme: 'export', toT });
  if (!d.ok) throw new Error(d.message);
  return { analysis, svg: parseSvg(d.svg) };
}

const bandsOf = (svg: Node): Node[] => byClass(svg, 'sl-band');
const titleOf = (band: Node): string => textOf(byClass(band, 'sl-band-title')[0]!);
const rangeOf = (band: Node): [number, number] => band.attrs['data-y-range']!.split(',').map(Number) as [number, number]; // bottom, top

/** The band a y position falls in. */
function bandAt(svg: Node, y: number): Node {
  const b = bandsOf(svg).find((n) => {
    const [bottom, top] = rangeOf(n);
    return y >= top - 0.01 && y <= bottom + 0.01;
  });
  if (!b) throw new Error(`no band at y = ${y}`);
  return b;
}

describe('Rb87 ground level to 50 µT with a 20 µT field: two bands', () => {
  const { analysis, svg } = drawn(RB_20UT, 50e-6);
  const bands = bandsOf(svg);

  it('stacks F=2 over F=1, each titled with its offset and unit, and says the axis is broken', () => {
    expect(svg.attrs['data-y-bands']).toBe('2');
    expect(bands.map((b) => b.attrs['data-label'])).toEqual(['F=2', 'F=1']);
    // The zero-field levels are +2.563 and −4.272 GHz (report); each band counts from a round value near its centre.
    expect(titleOf(bands[0]!)).toBe('F=2: E/h − 2.563 GHz (kHz)');
    expect(titleOf(bands[1]!)).toMatch(/^F=1: E\/h \+ 4\.27\d+ GHz \(kHz\)$/);
    const note = textOf(byClass(svg, 'sl-band-note')[0]!);
    expect(note).toBe('Energy axis broken into 2 bands, each on its own scale: F=2 lies 6.835 GHz above F=1 (centres of gravity at 0 µT).');
    expect(textOf(svg.children.find((c) => c.name === 'desc')!)).toContain('Energy axis broken into 2 bands');
    // Slanted marks where the axis is broken: on the lower end of the top band and the upper end of the other.
    expect(byClass(bands[0]!, 'sl-axis-break')).toHaveLength(1);
    expect(byClass(bands[1]!, 'sl-axis-break')).toHaveLength(1);
  });

  it('gives the distance of the bands as the report’s zero-field interval, whatever the field range', () => {
    // Drawn to 240 G the middles of the two fans are 6.847 GHz apart; the levels' centres of gravity at 0 G are
    // the report's interval F=1 → F=2, 6.83468 GHz.
    const wide = drawn('species Rb87\n  level ground: 5s 2S1/2\nfield probe = 120 G\n', 0.024);
    const interval = wide.analysis.result!.levels[0]!.hyperfine!.intervals[0]!.interval_Hz;
    expect(interval / 1e9).toBeCloseTo(6.834683, 6);
    expect(textOf(byClass(wide.svg, 'sl-band-note')[0]!)).toBe('Energy axis broken into 2 bands, each on its own scale: F=2 lies 6.835 GHz above F=1 (centres of gravity at 0 G).');
  });

  it('puts every dot at 20 µT where its band’s tick labels place the report’s energy', () => {
    const at = analysis.result!.levels[0]!.at_fields[0]!;
    expect(at.field_T).toBeCloseTo(20e-6, 12);
    const lowOf = new Map(all(svg, (n) => n.attrs['data-kind'] === 'curve').map((c) => [c.attrs['data-id'], c.attrs['data-low']]));
    const dots = all(svg, (n) => n.attrs['data-kind'] === 'state');
    expect(dots).toHaveLength(8);
    for (const dot of dots) {
      const low = lowOf.get(dot.attrs['data-id']);
      const report = at.exact.find((s) => s.low_label === low)!;
      const cy = pathPoints(dot.children.find((c) => c.name === 'path')!.attrs.d!)[0]!.y; // circle path starts at (cx − r, cy)
      const band = bandAt(svg, cy);
      expect(band.attrs['data-label']).toBe(low!.split(',')[0]);
      const offset = Number(band.attrs['data-offset-hz']);
      const unit = UNIT[/\((\w+)\)$/.exec(titleOf(band))![1]!]!;
      const yOf = axisMap(band, 'sl-axis-y');
      expect(Math.abs(cy - yOf((report.energy_Hz - offset) / unit)), `${low}`).toBeLessThan(0.05);
    }
  });

  it('lets each fan fill its band (on one GHz axis it spanned under a pixel)', () => {
    for (const band of bands) {
      const [bottom, top] = rangeOf(band);
      const ends = all(svg, (n) => n.attrs['data-kind'] === 'curve')
        .map((c) => pathPoints(byClass(c, 'sl-seg').at(-1)!.attrs.d!).at(-1)!.y)
        .filter((y) => y >= top && y <= bottom);
      expect(Math.max(...ends) - Math.min(...ends)).toBeGreaterThan(0.7 * (bottom - top));
    }
  });

  it('names every state once on each side, inside its own band', () => {
    for (const side of ['low', 'high']) {
      const labels = all(svg, (n) => n.attrs['data-kind'] === 'end-label' && n.attrs['data-side'] === side);
      expect(labels).toHaveLength(8);
      for (const l of labels) {
        const y = Number(all(l, (n) => n.name === 'text')[0]!.attrs.y) - 4;
        expect(bandAt(svg, y).attrs['data-label']).toBe(l.attrs['data-label']!.split(',')[0]);
      }
    }
  });
});

/** Text boxes of the end labels and band titles (estimated widths, 11-unit font: 11 tall). */
function textBoxes(svg: Node): { text: string; x0: number; x1: number; y0: number; y1: number }[] {
  const texts = [...byClass(svg, 'sl-end-label').map((g) => all(g, (n) => n.name === 'text')[0]!), ...byClass(svg, 'sl-band-title')];
  return texts.map((t) => {
    const w = estimateTextWidth(textOf(t));
    const x = Number(t.attrs.x);
    const anchor = t.attrs['text-anchor'] ?? 'start';
    const x0 = anchor === 'end' ? x - w : x;
    return { text: textOf(t), x0, x1: x0 + w, y0: Number(t.attrs.y) - 9, y1: Number(t.attrs.y) + 2 };
  });
}

describe.each([
  ['40 sublevels (F = 3…6)', FORTY, 4, 40],
  ['22 sublevels (F = 9/2 and 11/2)', TWENTY_TWO, 2, 22],
])('%s at 100 µT', (_name, text, bandCount, states) => {
  const { svg } = drawn(text, 200e-6);

  it('has a band per F, every state named on both sides', () => {
    expect(bandsOf(svg)).toHaveLength(bandCount);
    for (const side of ['low', 'high']) {
      const labels = all(svg, (n) => n.attrs['data-kind'] === 'end-label' && n.attrs['data-side'] === side);
      expect(labels).toHaveLength(states);
    }
  });

  it('keeps labels of one lane a line apart and no label or band title on another', () => {
    for (const side of ['sl-end-low', 'sl-end-high']) {
      const ys = all(byClass(svg, side)[0]!, (n) => n.name === 'text').map((t) => Number(t.attrs.y)).sort((a, b) => a - b);
      for (let i = 1; i < ys.length; i++) expect(ys[i]! - ys[i - 1]!).toBeGreaterThanOrEqual(13 - 0.01);
    }
    const boxes = textBoxes(svg);
    const overlaps: string[] = [];
    for (let i = 0; i < boxes.length; i++) {
      for (let j = i + 1; j < boxes.length; j++) {
        const a = boxes[i]!;
        const b = boxes[j]!;
        if (a.x0 < b.x1 && b.x0 < a.x1 && a.y0 < b.y1 && b.y0 < a.y1) overlaps.push(`${a.text} × ${b.text}`);
      }
    }
    expect(overlaps).toEqual([]);
  });

  it('gives every band at least two tick labels, and offsets that read as round numbers', () => {
    for (const band of bandsOf(svg)) {
      const ticks = all(band, (n) => n.attrs['data-tick'] !== undefined);
      expect(ticks.length, titleOf(band)).toBeGreaterThanOrEqual(2);
      for (const t of ticks) expect(Array.from(t.attrs['data-tick']!.replace('−', '')).length).toBeLessThanOrEqual(4);
    }
  });
});

describe('a strong-field figure is drawn as before', () => {
  it('Rb87 to 0.73 T (Paschen–Back at the top): one band, drawn in the same bytes as no bands', () => {
    const analysis = analyze('species Rb87\n  level ground: 5s 2S1/2\nfield magnet = 0.5 T\n');
    const level = analysis.model!.species[0]!.levels[0]!;
    const v = levelsView(level, gJLookup(analysis.result!.levels)(level), analysis.model!.settings, workingFields(analysis.model!)[0])!;
    // The curves cross between F manifolds (F=2, m_F=−1 meets F=1 states): one band, the single axis.
    const named = renderLevels(v.data, { kind: 'export' });
    expect(v.data.bands?.map((b) => b.names)).toEqual([['F=1', 'F=2']]);
    const { bands: _b, ...unbanded } = v.data;
    const unnamed = renderLevels(unbanded, { kind: 'export' });
    expect(named).toBe(unnamed);
    const svg = parseSvg(named);
    expect(svg.attrs['data-y-bands']).toBeUndefined();
    expect(bandsOf(svg)).toHaveLength(0);
    expect(textOf(byClass(byClass(svg, 'sl-axis-y')[0]!, 'sl-axis-title')[0]!)).toBe('E/h (GHz)');
  });
});

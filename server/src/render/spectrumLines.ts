/**
 * A line's synthesized spectrum over its sticks. The frame is where the curve is (above
 * CURVE_FLOOR of its peak), not the report's whole sample window; stretches far apart compared
 * with their widths get a broken axis on one frequency scale; sticks too short to read against a
 * blend (the strongest under a quarter of the curve's peak) get their own scale on the right, with
 * the strongest drawn at the curve's peak. The figure states each of these choices.
 */
import { scaleLinear } from 'd3-scale';
import { bottomAxis, leftAxis, rightAxis, type PlotBox, type Scale } from './axes';
import { svgDocument } from './frame';
import { legendRows, type LegendEntry } from './legend';
import { axisOffset } from './offsetAxis';
import type { Palette } from './palette';
import { CURVE_FLOOR, samplesAbove, segmentLayout, spectrumFrame, type Stretch } from './spectrumFrame';
import { spectrumPath } from './spectrumCurve';
import { faintNoteSvg, overlapNote, overlapPlaces, shownStrength, stick, type FaintNote, type StickContext } from './stick';
import { dataNum, el, px, text, titleEl } from './svgText';
import { frequencyText, trimNumber } from '../eval/quantityText';
import { figureMinus, formatIn, frequencyUnit, type DisplayUnit } from './units';
import type { LineComponent, LineSpectrumCurve, LinesViewData } from './viewData';

const WIDTH = 760;
const HEIGHT = 420;
const NOTE_ROW = 14;
/** Pixels between the segments of a broken axis, and the narrowest segment drawn. */
const BREAK_PX = 16;
const MIN_SEGMENT_PX = 70;
/** Report samples further apart than this many pixels draw a visibly cornered curve: the finer ones are drawn instead. */
const FINE_PX = 2;
/** Sticks whose strongest is under this fraction of the curve's peak get their own scale (too short to read otherwise: under ~70 px here). */
const OWN_SCALE_BELOW = 1 / 4;

export interface SpectrumFigureInput {
  pal: Palette;
  idBase: string;
  interactive: boolean;
  /** The components the figure may draw (finite, seen, above VISIBLE_FLOOR of the strongest). */
  comps: LineComponent[];
  faintNote?: FaintNote;
  /** The polarisation and marker entries; the curve's and the sticks' are added here. */
  legend: LegendEntry[];
  counts: string[];
}

interface Samples {
  offsetHz: number[];
  /** In stick units: a lone component of weight w peaks at w. */
  value: number[];
}

/** The report's samples and any finer ones, in stick units, ascending. */
function allSamples(c: LineSpectrumCurve, perStick: number, withFine: boolean): Samples {
  const pts: [number, number][] = [];
  const add = (f: ArrayLike<number>, v: ArrayLike<number>): void => {
    const n = Math.min(f.length, v.length);
    for (let i = 0; i < n; i++) if (Number.isFinite(f[i]!) && Number.isFinite(v[i]!)) pts.push([f[i]!, v[i]! * perStick]);
  };
  add(c.offsetHz, c.intensity);
  if (c.fine && withFine) add(c.fine.offsetHz, c.fine.intensity);
  pts.sort((a, b) => a[0] - b[0]);
  return { offsetHz: pts.map((p) => p[0]), value: pts.map((p) => p[1]) };
}

/** The factor from intensity per Hz to stick units: 1/unitPeak, else the one that puts the highest sample at the strongest stick. */
function perStickOf(c: LineSpectrumCurve, strongest: number): number {
  if (c.unitPeak !== undefined && c.unitPeak > 0 && Number.isFinite(c.unitPeak)) return 1 / c.unitPeak;
  let peak = 0;
  for (let i = 0; i < c.intensity.length; i++) if (Number.isFinite(c.intensity[i]!) && c.intensity[i]! > peak) peak = c.intensity[i]!;
  return peak > 0 ? strongest / peak : 0;
}

function sliceSamples(s: Samples, [a, b]: Stretch): { offsetHz: number[]; intensity: number[] } {
  const offsetHz: number[] = [];
  const intensity: number[] = [];
  s.offsetHz.forEach((f, i) => {
    if (f >= a && f <= b) {
      offsetHz.push(f);
      intensity.push(s.value[i]!);
    }
  });
  return { offsetHz, intensity };
}

/** "41.2 GHz" or "41.2–43.0 GHz" for the widths of the gaps left out. */
function gapWidths(gaps: Stretch[]): string {
  const w = gaps.map(([a, b]) => b - a);
  const lo = Math.min(...w);
  const hi = Math.max(...w);
  if (hi - lo <= 0.005 * hi) return frequencyText(hi, 3);
  const unit = frequencyUnit(hi);
  return `${trimNumber(lo / unit.factor, 3)}–${trimNumber(hi / unit.factor, 3)} ${unit.symbol}`;
}

export function renderSpectrumLines(d: LinesViewData, curve: LineSpectrumCurve, input: SpectrumFigureInput): string {
  const { pal, idBase, interactive, comps, faintNote, counts } = input;
  const strongest = Math.max(0, ...comps.map(shownStrength));
  const perStick = perStickOf(curve, strongest);
  const samples = allSamples(curve, perStick, true);
  const curveTop = Math.max(0, ...samples.value);
  const floorFraction = curve.floor ?? CURVE_FLOOR;
  const window: Stretch = curve.windowHz ?? [samples.offsetHz[0] ?? 0, samples.offsetHz[samples.offsetHz.length - 1] ?? 0];
  const stretches = curve.stretches ?? samplesAbove(samples.offsetHz, samples.value, floorFraction * curveTop);
  const frame = spectrumFrame(stretches, window);
  const ownScale = curveTop > 0 && strongest < OWN_SCALE_BELOW * curveTop;

  const legend = [...input.legend];
  legend.push({ label: ownScale ? curve.caption : `${curve.caption} (a lone component peaks at its stick)`, colour: pal.total, line: { width: 1.8 } });
  if (ownScale) legend.push({ label: 'sticks on the right-hand scale: the strongest drawn at the curve’s peak', colour: pal.muted, line: { width: 2, vertical: true } });
  const legendSvg = legendRows(legend, 64, 48, WIDTH - 80, pal);

  const box: PlotBox = { left: 64, right: WIDTH - (ownScale ? 60 : 20), top: 48 + legendSvg.height + 16, bottom: HEIGHT - 56 };
  // The segments as drawn (widened, or merged where widening made them meet): the notes and break marks follow these, not the frame.
  const layout = segmentLayout(frame.segments, box.right - box.left, BREAK_PX, MIN_SEGMENT_PX, window);
  const { segments, gaps } = layout;
  // The finer samples are drawn when the report's step over the peaks or show as corners on this scale.
  const pxPerHz = layout.widths[0]! / (segments[0]![1] - segments[0]![0] || 1);
  const step = curve.reportStepHz;
  const useFine = curve.fine !== undefined && step !== undefined && (curve.widthHz === undefined || step > curve.widthHz / 4 || step * pxPerHz > FINE_PX);
  const drawnSamples = useFine ? samples : allSamples(curve, perStick, false);
  const top = Math.max(ownScale ? 0 : strongest, curveTop, 0);
  const y = scaleLinear().domain([0, top * 1.12 || 1]).range([box.bottom, box.top]).nice();
  // Own scale: the same pixels, the strongest stick where the curve's peak is.
  const yStick: Scale = ownScale ? y.copy().domain([0, y.domain()[1]! * (strongest / curveTop)]) : y;
  const ctxBase = { idBase, pal, interactive, y: yStick, strongest };

  const body: string[] = [legendSvg.svg];
  const title = ownScale ? 'curve: strength × viewing factor' : 'strength × viewing factor';
  body.push(leftAxis(y, undefined, title, box, box.left, pal));
  if (ownScale) body.push(rightAxis(yStick, 'sticks: strength × viewing factor', box, pal));

  const offsets = segments.map(([a, b]) => axisOffset(a, b, Math.max(2, Math.round(((b - a) / (segments[0]![1] - segments[0]![0] || 1)) * 4)), 'Δf', 'Hz'));
  const anyOffset = offsets.some((o) => o.offset !== 0);
  const shared: DisplayUnit = frequencyUnit(Math.max(...segments.map(([a, b]) => Math.max(Math.abs(a), Math.abs(b)))));
  let left = box.left;
  let k = 0;
  const drawnX: number[] = [];
  let drawn = 0;
  segments.forEach((seg, i) => {
    const w = layout.widths[i]!;
    const sbox: PlotBox = { ...box, left, right: left + w };
    const off = anyOffset ? offsets[i]! : { offset: 0, unit: shared, name: 'Δf' };
    const x = scaleLinear().domain(seg).range([sbox.left, sbox.right]);
    const shown = scaleLinear().domain([seg[0] - off.offset, seg[1] - off.offset]).range([sbox.left, sbox.right]);
    const parts: string[] = [];
    // One title under a single unit; each segment names its own when it counts from its own round value.
    parts.push(bottomAxis(shown, off.unit, anyOffset || segments.length === 1 ? off.name : '', sbox, pal, 90, segments.length === 1 ? 0 : 14));
    if (seg[0] < 0 && seg[1] > 0) {
      parts.push(el('path', { class: 'sl-zero', d: `M${px(x(0))},${px(box.top)}V${px(box.bottom)}`, stroke: pal.muted, 'stroke-width': 1, 'stroke-dasharray': '2 4', fill: 'none' }));
    }
    const inside = comps.filter((c) => c.offsetHz >= seg[0] && c.offsetHz <= seg[1]);
    drawn += inside.length;
    const ctx: StickContext = { ...ctxBase, unit: off.unit };
    parts.push(el('g', { class: 'sl-components' }, inside.map((c) => {
      drawnX.push(x(c.offsetHz));
      return stick(c, k++, x(c.offsetHz), ctx);
    })));
    const part = sliceSamples(drawnSamples, seg);
    const path = curveTop > 0 && spectrumPath({ offsetHz: part.offsetHz, intensity: part.intensity, unitPeak: 1, caption: '' }, x, y, strongest);
    if (path) parts.push(el('path', { class: 'sl-spectrum', 'data-kind': 'spectrum', d: path, fill: 'none', stroke: pal.total, 'stroke-width': 1.8, 'stroke-linejoin': 'round' }));
    // Each segment describes its own scale for the panel's pointer readout: as its ticks read (from its round value, in its unit).
    body.push(
      el('g', {
        class: 'sl-segment',
        'data-x-name': off.name,
        'data-x-unit': off.unit.symbol,
        'data-x-factor': dataNum(off.unit.factor),
        'data-x-domain': `${dataNum(seg[0] - off.offset)},${dataNum(seg[1] - off.offset)}`,
        'data-x-range': `${px(sbox.left)},${px(sbox.right)}`,
        'data-x-offset': dataNum(off.offset),
      }, parts),
    );
    if (i > 0) body.push(breakMark(left - BREAK_PX / 2, box, gaps[i - 1]!, pal));
    left += w + BREAK_PX;
  });
  if (segments.length > 1 && !anyOffset) {
    body.push(el('text', { class: 'sl-axis-title', x: (box.left + box.right) / 2, y: box.bottom + 38, 'text-anchor': 'middle', fill: pal.text, 'font-size': 11 }, text(`Δf (${shared.symbol})`)));
  }

  // What the frame leaves out, what the sticks overlap, and where the samples come from: every count the report has.
  const outside = comps.length - drawn;
  const places = overlapPlaces(drawnX);
  const notes: { cls: string; text: string; data?: Record<string, string | number> }[] = [];
  const overlap = overlapNote(drawnX.length, places);
  if (overlap) notes.push({ cls: 'sl-overlap-note', text: overlap, data: { 'data-places': places } });
  const floorText = trimNumber(floorFraction, 2);
  const windowText = `(the report’s ${curve.points ?? samples.offsetHz.length} samples: ${figureMinus(frequencyText(window[0], 5))} to ${figureMinus(frequencyText(window[1], 5))})`;
  if (segments.length > 1) {
    notes.push({ cls: 'sl-frame-note', text: `axis broken where the curve is under ${floorText} × its peak: ${gaps.length} ${gaps.length === 1 ? 'gap' : 'gaps'} of ${gapWidths(gaps)} left out, one scale` });
    notes.push({ cls: 'sl-window-note', text: `frames: where the curve exceeds ${floorText} × its peak ${windowText}` });
  } else if (segments[0]![0] > window[0] || segments[0]![1] < window[1]) {
    notes.push({ cls: 'sl-window-note', text: `frame: where the curve exceeds ${floorText} × its peak ${windowText}` });
  }
  // Beyond the report's window (a `span` that cuts them) the curve is not known: those are counted apart.
  const beyond = comps.filter((c) => c.offsetHz < window[0] || c.offsetHz > window[1]).length;
  const faintOut = outside - beyond;
  if (beyond > 0) notes.push({ cls: 'sl-beyond-note', text: `outside the report’s window: ${beyond} ${beyond === 1 ? 'component' : 'components'} (its span cuts them), listed in the report`, data: { 'data-left-out': beyond } });
  if (faintOut > 0) notes.push({ cls: 'sl-outside-note', text: `outside the frame: ${faintOut} ${faintOut === 1 ? 'component' : 'components'} where the curve is under ${floorText} × its peak, listed in the report`, data: { 'data-left-out': faintOut } });
  if (useFine && curve.widthHz !== undefined) {
    notes.push({ cls: 'sl-fine-note', text: `curve drawn with ${curve.fine!.offsetHz.length} extra samples: the report’s are ${frequencyText(step!, 3)} apart, the line ${frequencyText(curve.widthHz ?? 0, 4)} wide` });
  }
  const rows = notes.length + (faintNote ? 1 : 0);
  notes.forEach((n, i) => body.push(el('text', { class: `sl-note ${n.cls}`, ...(n.data ?? {}), x: box.left, y: HEIGHT + NOTE_ROW * (i + 1) - 8, 'font-size': 10, fill: pal.muted }, text(n.text))));
  if (faintNote) body.push(faintNoteSvg(faintNote, box.left, HEIGHT + NOTE_ROW * rows - 8, pal));

  // One segment: the root describes its scale as its ticks read. Broken: only the segments do (one linear map would misread the gaps).
  const only = segments.length === 1 ? (anyOffset ? offsets[0]! : { offset: 0, unit: shared, name: 'Δf' }) : undefined;
  const unitAll = only ? only.unit : shared;
  const desc = `Spectrum over ${comps.length} line components (${counts.join(', ')}) from Δf = ${formatIn(segments[0]![0], shared)} to ${formatIn(segments[segments.length - 1]![1], shared)}${notes.map((n) => `; ${n.text}`).join('')}${faintNote ? `; ${faintNote.text}` : ''}.`;
  return svgDocument(
    {
      view: 'lines',
      idBase,
      width: WIDTH,
      height: HEIGHT + NOTE_ROW * rows,
      title: d.title,
      desc,
      pal,
      rootData: {
        'data-x-name': only ? only.name : 'Δf',
        'data-x-unit': unitAll.symbol,
        'data-x-factor': dataNum(unitAll.factor),
        'data-x-domain': `${dataNum(segments[0]![0] - (only?.offset ?? 0))},${dataNum(segments[segments.length - 1]![1] - (only?.offset ?? 0))}`,
        ...(only ? { 'data-x-range': `${px(box.left)},${px(box.right)}` } : {}),
        'data-y-domain': `${dataNum(y.domain()[0]!)},${dataNum(y.domain()[1]!)}`,
        'data-y-range': `${px(box.bottom)},${px(box.top)}`,
        'data-stick-scale': ownScale ? 'own' : 'shared',
        'data-stick-y-domain': `${dataNum(yStick.domain()[0]!)},${dataNum(yStick.domain()[1]!)}`,
        'data-curve-top': dataNum(curveTop),
        'data-segments': String(segments.length),
        'data-panels': '1',
      },
    },
    body,
  );
}

/** Two short slanted strokes across the axis line where a stretch of frequency is left out. */
function breakMark(cx: number, box: PlotBox, [from, to]: Stretch, pal: Palette): string {
  const d = [-3, 3].map((dx) => `M${px(cx + dx - 3)},${px(box.bottom + 6)}L${px(cx + dx + 3)},${px(box.bottom - 6)}`).join('');
  return el('path', { class: 'sl-axis-break', 'data-left-out-hz': `${dataNum(from)},${dataNum(to)}`, d, stroke: pal.axis, 'stroke-width': 1.2, fill: 'none' }, [
    titleEl(`axis broken: ${figureMinus(frequencyText(from, 5))} to ${figureMinus(frequencyText(to, 5))} left out`),
  ]);
}


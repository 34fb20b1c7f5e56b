/**
 * The field map: |B| (and one signed field component, fieldMapView.ts) against position along a
 * straight line through the sources, over a side view of the sources drawn at their places on
 * the same horizontal scale — loops as their two cross-section marks (⊙ current towards the
 * reader, ⊗ away), solenoids as their winding sheets, wires as dots or lines, blocks as
 * rectangles. The |B| axis turns logarithmic when the field spans orders of magnitude; samples
 * on a source (no value) leave a gap, and a spike next to a wire is cut at the top of a linear
 * axis rather than squashing the rest of the curve.
 */
import { scaleLinear, scaleLog } from 'd3-scale';
import { line } from 'd3-shape';
import { csvNumber } from '../eval/machineText';
import { csvTable } from './csv';
import { bottomAxis, leftAxis, type PlotBox, type Scale } from './axes';
import { emptyDiagram, estimateTextWidth, svgDocument } from './frame';
import { legendUnderTitle, type LegendEntry } from './legend';
import { paletteFor } from './palette';
import { finiteExtent } from './sampled';
import { dataNum, el, px, shortHash, text, titleEl } from './svgText';
import { engineeringUnit, fieldDisplayUnit, formatIn, type DisplayUnit } from './units';
import type { FieldUnit, RenderTheme } from './viewData';

/** One drawn piece of a source in the side view; s along the line, t across it, metres. */
export type FieldMapShape =
  /** A conductor crossing the drawing plane; `towardsReader`: the current's sense (undefined: along the plane). */
  | { kind: 'dot'; s: number; t: number; towardsReader?: boolean }
  | { kind: 'segment'; s0: number; t0: number; s1: number; t1: number }
  /** A block; `magnetisation`: its unit direction (s along, t across, n towards the reader), absent when magnetised 0. */
  | { kind: 'rect'; s0: number; t0: number; s1: number; t1: number; magnetisation?: { s: number; t: number; n: number } }
  /** A loop lying in the drawing plane. */
  | { kind: 'ring'; s: number; t: number; r: number };

export interface FieldMapSource {
  name: string;
  kind: 'coil' | 'solenoid' | 'wire' | 'slab';
  shapes: FieldMapShape[];
  /** Said with its name in the side view and its tooltip ("not magnetised"). */
  note?: string;
}

export interface FieldMapViewData {
  title: string;
  /** Name of the position along the line ("z", or "s" for a slanted line) and across it in the side view. */
  alongName: string;
  acrossName: string;
  /** Where the line runs, in words, for the description ("along z through (0, 0, 0)"). */
  lineText: string;
  /** Positions along the line, m, ascending. */
  positionsM: ArrayLike<number>;
  /** |B| at each position, T; NaN where there is no value (on a conductor). */
  magnitudeT: ArrayLike<number>;
  /** One field component, T (signed): along the line, or across it where the field runs across (fieldMapView.ts); its name ("B_z"). */
  componentT?: ArrayLike<number>;
  componentName?: string;
  /** The axis of that component for the CSV column (`B_<axis>_T`): "z", "s" along a slanted line, "across"; default the line's own. */
  componentAxis?: string;
  fieldUnit: FieldUnit;
  /** The |B| axis, `magnitudeAxis(magnitudeT, scale)`, computed once by the view (its unit is read from it); undefined: no values. */
  axis: MagnitudeAxis | undefined;
  sources: FieldMapSource[];
}

export interface MagnitudeAxis {
  log: boolean;
  domain: [number, number];
  /** A linear axis cut below a spike (next to a wire). */
  cut: boolean;
}

const WIDTH = 760;
const LEFT = 84;
const RIGHT = WIDTH - 24;
const STRIP_HEIGHT = 120;
/** |B| spread (95th over 5th percentile) above which the axis turns logarithmic. */
export const LOG_SPAN = 1e3;
/** A log axis shows at most this many decades below the top. */
const LOG_DECADES = 8;
/** A linear axis is cut when the largest value exceeds the 95th percentile by this factor (a spike next to a wire). */
const SPIKE_FACTOR = 4;

function percentile(sorted: number[], q: number): number {
  return sorted[Math.min(sorted.length - 1, Math.max(0, Math.round(q * (sorted.length - 1))))]!;
}

/** Whether |B| needs a log axis, and the axis domain. */
/** 'auto' picks a log axis when |B| spans more than LOG_SPAN (middle 90 % of the samples). */
export type MagnitudeScale = 'linear' | 'log' | 'auto';

export function magnitudeAxis(values: ArrayLike<number>, scale: MagnitudeScale = 'auto'): MagnitudeAxis | undefined {
  const finite = Array.from(values).filter((v) => Number.isFinite(v) && v >= 0).sort((a, b) => a - b);
  if (finite.length === 0) return undefined;
  const max = finite[finite.length - 1]!;
  if (!(max > 0)) return { log: false, domain: [0, 1e-4], cut: false };
  const positive = finite.filter((v) => v > 0);
  const p5 = percentile(positive, 0.05);
  const p95 = percentile(positive, 0.95);
  const log = scale === 'log' || (scale !== 'linear' && p95 / p5 > LOG_SPAN);
  if (log) {
    const floor = Math.max(positive[0]!, max * 10 ** -LOG_DECADES);
    return { log: true, domain: [floor, max], cut: false };
  }
  const cut = max > SPIKE_FACTOR * p95;
  return { log: false, domain: [0, cut ? p95 * 1.5 : max], cut };
}

export function renderFieldMap(d: FieldMapViewData, theme: RenderTheme): string {
  const pal = paletteFor(theme);
  const idBase = `sl-f${shortHash(`${d.title}|${d.positionsM.length}`)}`;
  const sx = finiteExtent(Array.from(d.positionsM));
  const axis = d.axis;
  if (!sx || sx[0] === sx[1] || !axis) return emptyDiagram('fieldmap', idBase, d.title, 'No field values to draw (every sample lies on a source).', pal);

  const fUnit = fieldDisplayUnit(d.fieldUnit);
  const lUnit = engineeringUnit(Math.max(Math.abs(sx[0]), Math.abs(sx[1])), 'm');
  const showComponent = !axis.log && d.componentT !== undefined;
  const legend: LegendEntry[] = [{ label: '|B|', colour: pal.series[0], line: { width: 2 } }];
  if (showComponent) legend.push({ label: `${d.componentName ?? 'B along the line'} (signed)`, colour: pal.series[1], line: { width: 1.5, dash: '6 3' } });
  const legendSvg = legendUnderTitle(legend, LEFT, RIGHT, 8, pal);
  const top = legendSvg.below;
  const plot: PlotBox = { left: LEFT, right: RIGHT, top, bottom: top + 230 };
  const strip: PlotBox = { left: LEFT, right: RIGHT, top: plot.bottom + 46, bottom: plot.bottom + 46 + STRIP_HEIGHT };
  const height = strip.bottom + 58;

  const x = scaleLinear().domain(sx).range([LEFT, RIGHT]);
  let yDomain = axis.domain;
  if (showComponent && !axis.log) {
    const c = finiteExtent(Array.from(d.componentT!).filter((v) => Math.abs(v) <= axis.domain[1]));
    const all = finiteExtent(Array.from(d.componentT!));
    // A component that spikes below as |B| spikes above is cut at the same size on both sides.
    if (c) yDomain = [Math.min(0, axis.cut && all![0] < -axis.domain[1] ? -axis.domain[1] : c[0]), Math.max(axis.domain[1], c[1])];
  }
  const y: Scale = axis.log
    ? scaleLog().domain(yDomain).range([plot.bottom, plot.top]).nice()
    : scaleLinear().domain(yDomain[0] === yDomain[1] ? [yDomain[0], yDomain[0] + 1e-4] : yDomain).range([plot.bottom, plot.top]).nice();
  const [lowY, highY] = y.domain() as [number, number];
  // Beyond the axis the curve runs out of the clipped plot (a spike leaves at the top, not as a
  // plateau); a log axis has no zero, so values under its floor leave at the bottom. The pixel
  // value is bounded to keep coordinates short.
  const span = plot.bottom - plot.top;
  const yOf = (v: number): number => {
    const p = axis.log && !(v > 0) ? plot.bottom + span : y(v);
    return Math.min(plot.bottom + span, Math.max(plot.top - span, p));
  };

  const body: string[] = [legendSvg.svg];
  const clipId = `${idBase}-clip`;
  body.push(el('defs', {}, el('clipPath', { id: clipId }, el('rect', { x: plot.left, y: plot.top - 1, width: plot.right - plot.left, height: plot.bottom - plot.top + 2 }))));
  body.push(bottomAxis(x, lUnit, '', plot, pal));
  body.push(leftAxis(y, axis.log ? { factor: fUnit.factor, symbol: fUnit.symbol } : fUnit, axis.log ? '|B|, log scale' : 'B', plot, LEFT, pal));
  if (!axis.log && lowY < 0) body.push(el('path', { class: 'sl-zero', d: `M${px(LEFT)},${px(y(0))}H${px(RIGHT)}`, stroke: pal.muted, 'stroke-dasharray': '2 4', fill: 'none' }));

  const n = d.positionsM.length;
  const idx = Array.from({ length: n }, (_, k) => k);
  const curve = (vals: ArrayLike<number>): string =>
    line<number>().defined((k) => Number.isFinite(d.positionsM[k]) && Number.isFinite(vals[k])).x((k) => x(d.positionsM[k])).y((k) => yOf(vals[k])).digits(2)(idx) ?? '';
  const mag = finiteExtent(Array.from(d.magnitudeT));
  body.push(
    el('g', { class: 'sl-curve sl-magnitude', 'data-kind': 'curve', 'data-label': '|B|', fill: 'none', stroke: pal.series[0], 'stroke-width': 2, 'clip-path': `url(#${clipId})` }, [
      titleEl(`|B| from ${formatIn(mag![0], fUnit)} to ${formatIn(mag![1], fUnit)}`),
      el('path', { d: curve(d.magnitudeT) }),
    ]),
  );
  if (showComponent) {
    body.push(
      el('g', { class: 'sl-curve sl-component', 'data-kind': 'curve', 'data-label': d.componentName ?? 'component', fill: 'none', stroke: pal.series[1], 'stroke-width': 1.5, 'stroke-dasharray': '6 3', 'clip-path': `url(#${clipId})` }, [
        el('path', { d: curve(d.componentT!) }),
      ]),
    );
  }
  // A field that is zero all along lies on the axis line itself: say so, rather than leave a bare plot.
  const note = !(mag![1] > 0) ? '|B| = 0 all along the line: the sources cancel here, or none carries a current or a magnetisation' : cutNote(d, axis.log, lowY, highY, fUnit, showComponent);
  if (note) body.push(el('text', { class: 'sl-note', x: RIGHT, y: plot.top - 6, 'text-anchor': 'end', 'font-size': 10, fill: pal.muted }, text(note)));

  body.push(sideView(d, x, strip, lUnit, pal));
  body.push(bottomAxis(x, lUnit, `${d.alongName}`, strip, pal));

  const desc = [
    `|B| ${d.lineText}, from ${formatIn(mag![0], fUnit)} to ${formatIn(mag![1], fUnit)}${axis.log ? ' (logarithmic axis)' : ''}`,
    `sources: ${d.sources.map((s) => `${s.kind} ${s.name}`).join(', ') || 'none'}`,
  ];
  return svgDocument(
    {
      view: 'fieldmap',
      idBase,
      width: WIDTH,
      height,
      title: d.title,
      desc: desc.join('; ') + '.',
      pal,
      rootData: {
        'data-x-name': d.alongName,
        'data-x-unit': lUnit.symbol,
        'data-x-factor': dataNum(lUnit.factor),
        'data-x-domain': `${dataNum(sx[0])},${dataNum(sx[1])}`,
        'data-x-range': `${px(LEFT)},${px(RIGHT)}`,
        'data-y-scale': axis.log ? 'log' : 'linear',
      },
    },
    body,
  );
}

/**
 * The heading: every source by kind and name while that fits the figure's width; else each kind
 * once with its count and its first and last names (a slower's 20 solenoids ran off the edge).
 */
export function fieldMapTitle(sources: readonly { kind: string; name: string }[]): string {
  const full = `field map: ${sources.map((s) => `${s.kind} ${s.name}`).join(', ')}`;
  if (estimateTextWidth(full, 15) <= WIDTH - 32) return full;
  const kinds = [...new Set(sources.map((s) => s.kind))];
  const groups = kinds.map((kind) => {
    const names = sources.filter((s) => s.kind === kind).map((s) => s.name);
    if (names.length === 1) return `${kind} ${names[0]}`;
    return `${names.length} ${kind}s ${names.length === 2 ? names.join(', ') : `${names[0]} … ${names[names.length - 1]}`}`;
  });
  return `field map: ${groups.join('; ')}`;
}

/**
 * Every side where a drawn curve leaves the axis, named with the value there: a spike next to a
 * wire leaves at the top (and, for a signed component, at the bottom); on a log axis |B| may dip
 * under the floor (to zero at the centre of a quadrupole).
 */
export function cutNote(d: FieldMapViewData, log: boolean, lowY: number, highY: number, unit: DisplayUnit, withComponent: boolean): string | undefined {
  const drawn = [Array.from(d.magnitudeT), ...(withComponent && d.componentT ? [Array.from(d.componentT)] : [])].flat().filter(Number.isFinite);
  if (drawn.length === 0) return undefined;
  const lowest = Math.min(...drawn);
  // Half a pixel's worth of slack: a value on the axis end is not cut.
  const slack = log ? 1e-9 : (highY - lowY) * 1e-3;
  const above = Math.max(...drawn) > highY + (log ? highY * slack : slack);
  const below = log ? lowest < lowY * (1 - slack) : lowest < lowY - slack;
  if (log) {
    const parts = [
      ...(above ? [`axis cut at ${formatIn(highY, unit)}`] : []),
      ...(below ? [`|B| dips below the axis floor ${formatIn(lowY, unit)} (to ${formatIn(lowest, unit)})`] : []),
    ];
    return parts.length ? parts.join('; ') : undefined;
  }
  if (!above && !below) return undefined;
  const where = above && below ? `${formatIn(lowY, unit)} and ${formatIn(highY, unit)}` : formatIn(above ? highY : lowY, unit);
  return `axis cut at ${where}: the field is far stronger next to (or inside) a source`;
}

/** The sources in a side view under the plot: same horizontal scale; true aspect when the strip is tall enough. */
function sideView(d: FieldMapViewData, x: Scale, box: PlotBox, lUnit: { factor: number; symbol: string }, pal: ReturnType<typeof paletteFor>): string {
  let reach = 0;
  for (const s of d.sources) for (const sh of s.shapes) for (const t of shapeAcross(sh)) reach = Math.max(reach, Math.abs(t));
  const pxPerM = Math.abs(x(1) - x(0));
  // Room above the top mark for its name.
  const half = (box.bottom - box.top) / 2 - 18;
  // Metres across per pixel: the same as along when everything fits, else squeezed to fit.
  const acrossPerPx = reach > 0 ? Math.max(1 / pxPerM, reach / half) : 1 / pxPerM;
  const mid = (box.top + box.bottom) / 2;
  const ty = (t: number): number => mid - t / acrossPerPx;
  const magnetised = d.sources.some((s) => s.shapes.some((sh) => sh.kind === 'rect' && sh.magnetisation));
  const parts: string[] = [
    el('rect', { class: 'sl-side-frame', x: box.left, y: box.top, width: box.right - box.left, height: box.bottom - box.top, fill: 'none', stroke: pal.grid }),
    el('path', { class: 'sl-beam-line', d: `M${px(box.left)},${px(mid)}H${px(box.right)}`, stroke: pal.muted, 'stroke-dasharray': '8 3 2 3', fill: 'none' }),
    el('text', { class: 'sl-side-caption', x: box.left, y: box.top - 6, 'font-size': 10, fill: pal.muted }, text(`side view: ${d.acrossName} across (${acrossPerPx * pxPerM > 1.0001 ? 'squeezed' : 'to scale'}), the sampled line dashed; ⊙ current towards you, ⊗ away${magnetised ? '; arrow: magnetisation' : ''}`)),
  ];
  const clipped = (sv: number): number => Math.min(box.right, Math.max(box.left, x(sv)));
  // The name above the source's topmost point, kept inside the strip; sources drawn in one place share one label.
  const at = d.sources.map((s) => {
    const top = s.shapes.map(labelPoint).sort((a, b) => b.t - a.t)[0];
    return top ? { x: clipped(top.s), y: Math.max(box.top + 10, ty(top.t) - 9) } : undefined;
  });
  const sameSpot = (i: number, j: number): boolean => at[i] !== undefined && at[j] !== undefined && Math.abs(at[i]!.x - at[j]!.x) < 2 && Math.abs(at[i]!.y - at[j]!.y) < 2;
  // A name that would run into one already placed at its height is left out (the source's tooltip
  // still names it): a row of slower sections keeps every other name instead of an unreadable run.
  const placed: { x0: number; x1: number; y: number }[] = [];
  d.sources.forEach((s, i) => {
    const colour = pal.series[(i + 2) % pal.series.length];
    const shapes = s.shapes.map((sh) => shapeSvg(sh, clipped, ty, colour, pal.halo));
    const first = d.sources.findIndex((_, j) => j === i || sameSpot(i, j));
    const names = d.sources.filter((_, j) => j >= i && sameSpot(i, j)).map((o) => (o.note ? `${o.name} (${o.note})` : o.name));
    const halfWidth = estimateTextWidth(names.join(', '), 10) / 2 + 2;
    const span = at[i] ? { x0: at[i]!.x - halfWidth, x1: at[i]!.x + halfWidth, y: at[i]!.y } : undefined;
    const free = span !== undefined && placed.every((o) => Math.abs(o.y - span.y) >= 11 || span.x1 < o.x0 || span.x0 > o.x1);
    if (first === i && free) placed.push(span!);
    const label = at[i] && first === i && free
      ? el('text', { class: 'sl-source-name', x: at[i]!.x, y: at[i]!.y, 'text-anchor': 'middle', 'font-size': 10, fill: pal.text, stroke: pal.halo, 'stroke-width': 3, 'paint-order': 'stroke' }, text(names.join(', ')))
      : '';
    parts.push(el('g', { class: 'sl-source', 'data-kind': 'source', 'data-label': s.name, 'data-source-kind': s.kind }, [titleEl(`${s.kind} ${s.name}${s.note ? `, ${s.note}` : ''}`), ...shapes, label]));
  });
  parts.push(leftAxis(scaleLinear().domain([-half * acrossPerPx, half * acrossPerPx]).range([mid + half, mid - half]), lUnit, d.acrossName, { ...box, top: mid - half, bottom: mid + half }, box.left, pal, 28));
  return el('g', { class: 'sl-side-view' }, parts);
}

/** Where a shape's label goes: its top, centred along the line. */
function labelPoint(sh: FieldMapShape): { s: number; t: number } {
  switch (sh.kind) {
    case 'dot':
      return { s: sh.s, t: sh.t };
    case 'ring':
      return { s: sh.s, t: sh.t + sh.r };
    default:
      return { s: (sh.s0 + sh.s1) / 2, t: Math.max(sh.t0, sh.t1) };
  }
}

function shapeAcross(sh: FieldMapShape): number[] {
  switch (sh.kind) {
    case 'dot':
      return [sh.t];
    case 'ring':
      return [sh.t - sh.r, sh.t + sh.r];
    default:
      return [sh.t0, sh.t1];
  }
}

function shapeSvg(sh: FieldMapShape, x: (s: number) => number, ty: (t: number) => number, colour: string, halo: string): string {
  switch (sh.kind) {
    case 'dot': {
      const cx = x(sh.s);
      const cy = ty(sh.t);
      const ring = el('circle', { cx, cy, r: 5, fill: halo, stroke: colour, 'stroke-width': 1.6 });
      if (sh.towardsReader === undefined) return el('circle', { cx, cy, r: 3.5, fill: colour });
      // ⊙ towards the reader, ⊗ away.
      const inner = sh.towardsReader
        ? el('circle', { cx, cy, r: 1.6, fill: colour })
        : el('path', { d: `M${px(cx - 3)},${px(cy - 3)}l6,6m0,-6l-6,6`, stroke: colour, 'stroke-width': 1.4 });
      return ring + inner;
    }
    case 'segment':
      return el('path', { d: `M${px(x(sh.s0))},${px(ty(sh.t0))}L${px(x(sh.s1))},${px(ty(sh.t1))}`, stroke: colour, 'stroke-width': 3, 'stroke-linecap': 'round', fill: 'none' });
    case 'rect': {
      const x0 = Math.min(x(sh.s0), x(sh.s1));
      const y0 = Math.min(ty(sh.t0), ty(sh.t1));
      const w = Math.max(2, Math.abs(x(sh.s1) - x(sh.s0)));
      const h = Math.max(2, Math.abs(ty(sh.t1) - ty(sh.t0)));
      // The arrow follows the drawing's own scales (the across axis may be squeezed).
      const m = sh.magnetisation;
      const cs = (sh.s0 + sh.s1) / 2;
      const ct = (sh.t0 + sh.t1) / 2;
      const step = 1e-3 * Math.max(Math.abs(sh.s1 - sh.s0), Math.abs(sh.t1 - sh.t0));
      const onPage = m && step > 0 ? { dx: x(cs + m.s * step) - x(cs), dy: ty(ct + m.t * step) - ty(ct) } : undefined;
      return el('rect', { x: x0, y: y0, width: w, height: h, fill: colour, 'fill-opacity': 0.25, stroke: colour }) + magnetisationMark(m, onPage, x0 + w / 2, y0 + h / 2, Math.min(w, h), colour);
    }
    case 'ring': {
      const r = Math.abs(ty(sh.t + sh.r) - ty(sh.t));
      return el('ellipse', { cx: x(sh.s), cy: ty(sh.t), rx: Math.max(2, Math.abs(x(sh.s + sh.r) - x(sh.s))), ry: Math.max(2, r), fill: 'none', stroke: colour, 'stroke-width': 1.6 });
    }
  }
}

/**
 * A block's magnetisation at its centre: an arrow in the drawing plane (its length up to 40 % of
 * the block's smaller side, at least 8 px), or ⊙/⊗ where it points mostly at or away from the
 * reader; nothing for a block magnetised 0, which has no direction.
 */
function magnetisationMark(m: { s: number; t: number; n: number } | undefined, onPage: { dx: number; dy: number } | undefined, cx: number, cy: number, size: number, colour: string): string {
  if (!m) return '';
  const inPlane = Math.hypot(m.s, m.t);
  const pageLength = onPage ? Math.hypot(onPage.dx, onPage.dy) : 0;
  if (inPlane < Math.abs(m.n)) {
    const dot = m.n > 0 ? el('circle', { cx, cy, r: 1.6, fill: colour }) : el('path', { d: `M${px(cx - 3)},${px(cy - 3)}l6,6m0,-6l-6,6`, stroke: colour, 'stroke-width': 1.4 });
    return el('g', { class: 'sl-magnetisation', 'data-direction': m.n > 0 ? 'towards' : 'away' }, [el('circle', { cx, cy, r: 5, fill: 'none', stroke: colour, 'stroke-width': 1.6 }), dot]);
  }
  // A block drawn at the strip's edge (outside the plotted stretch) has no room for an arrow.
  if (!onPage || !(pageLength > 0)) return '';
  // The arrow runs centred on the block's middle, along the magnetisation as drawn (up the page is +t).
  const half = Math.max(8, 0.4 * size) / 2;
  const ux = onPage.dx / pageLength;
  const uy = onPage.dy / pageLength;
  const tipX = cx + ux * half;
  const tipY = cy + uy * half;
  const head = (side: number): string => `L${px(tipX - 4 * ux + side * 3 * uy)},${px(tipY - 4 * uy - side * 3 * ux)}`;
  return el('path', { class: 'sl-magnetisation', 'data-direction': 'in-plane', d: `M${px(cx - ux * half)},${px(cy - uy * half)}L${px(tipX)},${px(tipY)}M${px(tipX)},${px(tipY)}${head(1)}M${px(tipX)},${px(tipY)}${head(-1)}`, stroke: colour, 'stroke-width': 1.6, fill: 'none', 'stroke-linecap': 'round' });
}

/** The numbers behind the field map (docs/csv.md): position along the line, |B| and the signed component drawn, SI. */
export function fieldMapCsv(d: FieldMapViewData, about: [string, string | undefined][]): string {
  const along = d.alongName === 's' ? 's' : d.alongName;
  const header = [`${along}_m`, 'B_abs_T', ...(d.componentT ? [`B_${d.componentAxis ?? along}_T`] : [])];
  const body: string[][] = [];
  for (let k = 0; k < d.positionsM.length; k++) {
    body.push([csvNumber(d.positionsM[k]), csvNumber(d.magnitudeT[k]), ...(d.componentT ? [csvNumber(d.componentT[k])] : [])]);
  }
  return csvTable({ kind: 'fieldmap', about: [...about, ['line', d.lineText]] }, header, body);
}

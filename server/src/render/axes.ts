/**
 * Axes drawn from a linear scale whose domain is in SI units; ticks are chosen and labelled
 * in the display unit so that tick values are round numbers in what the reader sees.
 */
import type { ScaleContinuousNumeric } from 'd3-scale';
import type { Palette } from './palette';
import { el, px, text } from './svgText';
import { format } from 'd3-format';
import { formatSI, type DisplayUnit } from './units';
import { estimateTextWidth } from './frame';

export interface PlotBox {
  left: number;
  right: number;
  top: number;
  bottom: number;
}

export type Scale = ScaleContinuousNumeric<number, number>;

/** A log scale is told apart by its base; its ticks are labelled plainly (d3's default would print 10m for 0.01). */
function isLog(scale: Scale): boolean {
  return typeof (scale as { base?: unknown }).base === 'function';
}

/** The ticks a log axis labels: d3's choice, plus one per decade the domain spans that d3 left bare (0.5 in 0.33…1), and 5 where d3 labelled 2. */
function logTickLabels(shown: Scale, count: number, label: (t: number) => string): { t: number; label: string }[] {
  const all = shown.ticks(count);
  const fmt = shown.tickFormat(count, '~g');
  const kept = all.filter((t) => fmt(t) !== '');
  const decade = (t: number): number => Math.floor(Math.log10(t) + 1e-9);
  const [a, b] = (shown.domain() as number[]).map(Math.abs).sort((p, q) => p - q);
  for (let k = decade(a!); k <= decade(b!); k++) {
    if (kept.some((t) => decade(t) === k)) continue;
    const inDecade = all.filter((t) => decade(t) === k);
    // A round mantissa (5, then 2) reads best; else the tick nearest the next labelled decade.
    const pick = inDecade.find((t) => Math.abs(t / 10 ** k - 5) < 1e-6) ?? inDecade.find((t) => Math.abs(t / 10 ** k - 2) < 1e-6) ?? inDecade[inDecade.length - 1];
    if (pick !== undefined) kept.push(pick);
  }
  // A decade d3 labels at 2 has room for 5 too: without it the top of a decade reads bare (points at 60 past a last label of 20).
  const mantissa = (t: number, m: number): boolean => Math.abs(t / 10 ** decade(t) - m) < 1e-6;
  for (const two of kept.filter((t) => mantissa(t, 2))) {
    const five = all.find((t) => decade(t) === decade(two) && mantissa(t, 5));
    if (five !== undefined && !kept.includes(five)) kept.push(five);
  }
  return kept.sort((p, q) => p - q).map((t) => ({ t, label: label(t) }));
}

function tickLabels(shown: Scale, count: number, unit?: DisplayUnit): { t: number; label: string }[] {
  if (isLog(shown)) {
    const plain = format('~g');
    return logTickLabels(shown, count, unit?.perTick !== undefined ? (t) => formatSI(t, unit.perTick!, 3) : plain);
  }
  const fmt = shown.tickFormat(count);
  return shown.ticks(count).map((t) => ({ t, label: fmt(t) })).filter((k) => k.label !== '');
}

/** The axis title: the unit in brackets, unless every tick names its own. */
function axisTitle(name: string, unit: DisplayUnit): string {
  return unit.perTick !== undefined ? name : `${name} (${unit.symbol})`;
}

function displayScale(scale: Scale, unit: DisplayUnit): Scale {
  return scale.copy().domain(scale.domain().map((d) => d / unit.factor));
}

/** Every other tick, until neighbouring labels stand a gap apart (a narrow segment of a broken axis). */
function apart(ticks: { t: number; label: string }[], shown: Scale): { t: number; label: string }[] {
  let kept = ticks;
  const clash = (k: typeof ticks): boolean => k.some((a, i) => i > 0 && shown(a.t) - shown(k[i - 1]!.t) < (estimateTextWidth(a.label) + estimateTextWidth(k[i - 1]!.label)) / 2 + 8);
  while (kept.length > 1 && clash(kept)) kept = kept.filter((_, i) => i % 2 === 0);
  return kept;
}

/** Horizontal axis along the bottom of `box`, with vertical grid lines. */
export function bottomAxis(scale: Scale, unit: DisplayUnit, name: string, box: PlotBox, pal: Palette, pxPerTick = 90, clearEdges = 0): string {
  const shown = displayScale(scale, unit);
  const count = Math.max(2, Math.round((box.right - box.left) / pxPerTick));
  // `clearEdges`: no tick this close to either end (segments of a broken axis would otherwise print two labels side by side).
  let labelled = tickLabels(shown, count, unit).filter((k) => shown(k.t) >= box.left + clearEdges && shown(k.t) <= box.right - clearEdges);
  if (clearEdges > 0) labelled = apart(labelled, shown);
  const ticks = labelled.map((k) => k.t);
  const fmt = (t: number): string => labelled.find((k) => k.t === t)!.label;
  const parts: string[] = [];
  const grid = ticks.map((t) => `M${px(shown(t))},${px(box.top)}V${px(box.bottom)}`).join('');
  if (grid) parts.push(el('path', { class: 'sl-grid', d: grid, stroke: pal.grid, 'stroke-width': 1, fill: 'none' }));
  parts.push(el('path', { class: 'sl-axis-line', d: `M${px(box.left)},${px(box.bottom)}H${px(box.right)}`, stroke: pal.axis, fill: 'none' }));
  const marks = ticks.map((t) => `M${px(shown(t))},${px(box.bottom)}v5`).join('');
  if (marks) parts.push(el('path', { d: marks, stroke: pal.axis, fill: 'none' }));
  for (const t of ticks) {
    parts.push(el('text', { x: shown(t), y: box.bottom + 18, 'text-anchor': 'middle', fill: pal.muted, 'data-tick': fmt(t) }, text(fmt(t))));
  }
  // An empty name leaves the title to another axis (stacked plots share one field axis title).
  if (name) {
    parts.push(
      el('text', { class: 'sl-axis-title', x: (box.left + box.right) / 2, y: box.bottom + 38, 'text-anchor': 'middle', fill: pal.text },
        text(axisTitle(name, unit))),
    );
  }
  return el('g', { class: 'sl-axis sl-axis-x', 'font-size': 11 }, parts);
}

/** A second horizontal scale along the top of `box` (e.g. the same offsets in units of μB·B/h); its unit sits at the right end. */
export function topAxis(scale: Scale, unit: DisplayUnit, box: PlotBox, pal: Palette, pxPerTick = 90): string {
  if (!(unit.factor > 0) || !Number.isFinite(unit.factor)) return '';
  const shown = displayScale(scale, unit);
  const count = Math.max(2, Math.round((box.right - box.left) / pxPerTick));
  const labelled = tickLabels(shown, count, unit);
  const parts: string[] = [
    el('path', { class: 'sl-axis-line', d: `M${px(box.left)},${px(box.top)}H${px(box.right)}`, stroke: pal.axis, fill: 'none' }),
  ];
  const marks = labelled.map((k) => `M${px(shown(k.t))},${px(box.top)}v-4`).join('');
  if (marks) parts.push(el('path', { d: marks, stroke: pal.axis, fill: 'none' }));
  for (const { t, label } of labelled) {
    parts.push(el('text', { x: shown(t), y: box.top - 7, 'text-anchor': 'middle', fill: pal.muted, 'data-tick': label }, text(label)));
  }
  parts.push(el('text', { class: 'sl-axis-title', x: box.right, y: box.top - 18, 'text-anchor': 'end', fill: pal.muted, 'font-size': 9 }, text(unit.symbol)));
  return el('g', { class: 'sl-axis sl-axis-top', 'font-size': 10 }, parts);
}

/**
 * Vertical axis at `axisX` (which may sit left of the plot when a label lane lies between),
 * with horizontal grid lines from the axis across the plot.
 */
export function leftAxis(scale: Scale, unit: DisplayUnit | undefined, name: string, box: PlotBox, axisX: number, pal: Palette, pxPerTick = 55): string {
  const shown = unit ? displayScale(scale, unit) : scale;
  const count = Math.max(2, Math.round((box.bottom - box.top) / pxPerTick));
  const labelled = tickLabels(shown, count, unit);
  const ticks = labelled.map((k) => k.t);
  const parts: string[] = [];
  const grid = ticks.map((t) => `M${px(axisX)},${px(shown(t))}H${px(box.right)}`).join('');
  if (grid) parts.push(el('path', { class: 'sl-grid', d: grid, stroke: pal.grid, 'stroke-width': 1, fill: 'none' }));
  parts.push(el('path', { class: 'sl-axis-line', d: `M${px(axisX)},${px(box.top)}V${px(box.bottom)}`, stroke: pal.axis, fill: 'none' }));
  const marks = ticks.map((t) => `M${px(axisX)},${px(shown(t))}h-5`).join('');
  if (marks) parts.push(el('path', { d: marks, stroke: pal.axis, fill: 'none' }));
  for (const { t, label } of labelled) {
    parts.push(el('text', { x: axisX - 8, y: shown(t) + 4, 'text-anchor': 'end', fill: pal.muted, 'data-tick': label }, text(label)));
  }
  // An empty name leaves the title to the caller (a broken axis names each band in a header).
  if (name) {
    const title = unit ? axisTitle(name, unit) : name;
    const cy = (box.top + box.bottom) / 2;
    parts.push(
      el('text', { class: 'sl-axis-title', x: 16, y: cy, transform: `rotate(-90 16 ${px(cy)})`, 'text-anchor': 'middle', fill: pal.text },
        text(title)),
    );
  }
  return el('g', { class: 'sl-axis sl-axis-y', 'font-size': 11 }, parts);
}

/** A second vertical scale along the right edge of `box` (no grid: the left axis draws it), its title reading downwards. */
export function rightAxis(scale: Scale, name: string, box: PlotBox, pal: Palette, pxPerTick = 55): string {
  const count = Math.max(2, Math.round((box.bottom - box.top) / pxPerTick));
  const labelled = tickLabels(scale, count);
  const parts: string[] = [el('path', { class: 'sl-axis-line', d: `M${px(box.right)},${px(box.top)}V${px(box.bottom)}`, stroke: pal.axis, fill: 'none' })];
  const marks = labelled.map((k) => `M${px(box.right)},${px(scale(k.t))}h5`).join('');
  if (marks) parts.push(el('path', { d: marks, stroke: pal.axis, fill: 'none' }));
  for (const { t, label } of labelled) {
    parts.push(el('text', { x: box.right + 8, y: scale(t) + 4, 'text-anchor': 'start', fill: pal.muted, 'data-tick': label }, text(label)));
  }
  const cy = (box.top + box.bottom) / 2;
  const cx = box.right + 46;
  parts.push(el('text', { class: 'sl-axis-title', x: cx, y: cy, transform: `rotate(90 ${px(cx)} ${px(cy)})`, 'text-anchor': 'middle', fill: pal.text }, text(name)));
  return el('g', { class: 'sl-axis sl-axis-y2', 'font-size': 11 }, parts);
}

/**
 * Axes drawn from a linear scale whose domain is in SI units; ticks are chosen and labelled
 * in the display unit so that tick values are round numbers in what the reader sees.
 */
import type { ScaleContinuousNumeric } from 'd3-scale';
import type { Palette } from './palette';
import { el, px, text } from './svgText';
import type { DisplayUnit } from './units';

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

function tickLabels(shown: Scale, count: number): { t: number; label: string }[] {
  const fmt = isLog(shown) ? shown.tickFormat(count, '~g') : shown.tickFormat(count);
  return shown.ticks(count).map((t) => ({ t, label: fmt(t) })).filter((k) => k.label !== '');
}

function displayScale(scale: Scale, unit: DisplayUnit): Scale {
  return scale.copy().domain(scale.domain().map((d) => d / unit.factor));
}

/** Horizontal axis along the bottom of `box`, with vertical grid lines. */
export function bottomAxis(scale: Scale, unit: DisplayUnit, name: string, box: PlotBox, pal: Palette, pxPerTick = 90): string {
  const shown = displayScale(scale, unit);
  const count = Math.max(2, Math.round((box.right - box.left) / pxPerTick));
  const labelled = tickLabels(shown, count);
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
        text(`${name} (${unit.symbol})`)),
    );
  }
  return el('g', { class: 'sl-axis sl-axis-x', 'font-size': 11 }, parts);
}

/** A second horizontal scale along the top of `box` (e.g. the same offsets in units of μB·B/h); its unit sits at the right end. */
export function topAxis(scale: Scale, unit: DisplayUnit, box: PlotBox, pal: Palette, pxPerTick = 90): string {
  if (!(unit.factor > 0) || !Number.isFinite(unit.factor)) return '';
  const shown = displayScale(scale, unit);
  const count = Math.max(2, Math.round((box.right - box.left) / pxPerTick));
  const labelled = tickLabels(shown, count);
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
export function leftAxis(scale: Scale, unit: DisplayUnit | undefined, name: string, box: PlotBox, axisX: number, pal: Palette): string {
  const shown = unit ? displayScale(scale, unit) : scale;
  const count = Math.max(2, Math.round((box.bottom - box.top) / 55));
  const labelled = tickLabels(shown, count);
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
  const title = unit ? `${name} (${unit.symbol})` : name;
  const cy = (box.top + box.bottom) / 2;
  parts.push(
    el('text', { class: 'sl-axis-title', x: 16, y: cy, transform: `rotate(-90 16 ${px(cy)})`, 'text-anchor': 'middle', fill: pal.text },
      text(title)),
  );
  return el('g', { class: 'sl-axis sl-axis-y', 'font-size': 11 }, parts);
}

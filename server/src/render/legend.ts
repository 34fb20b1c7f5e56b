/**
 * A legend laid out in rows that wrap at the available width. Each entry carries a sample
 * drawn with the same stroke, dash and marker as the data it explains.
 */
import { estimateTextWidth } from './frame';
import { markerPath, type MarkerShape } from './markers';
import type { Palette } from './palette';
import { el, px, text } from './svgText';

export interface LegendEntry {
  label: string;
  colour: string;
  /** A line sample with this width and dash; omitted for marker-only entries. */
  line?: { width: number; dash?: string; vertical?: boolean };
  marker?: MarkerShape;
  /** The marker as an open outline of this stroke width (a ring), as the figure draws it; else filled. */
  hollow?: number;
  /** Filled area sample (drawn under the line sample). */
  area?: string;
}

const SAMPLE = 22;
const GAP = 18;
const ROW = 18;

/** One entry: its sample (area, line, marker) at x…x+SAMPLE around the baseline y, then its label. */
function entrySvg(e: LegendEntry, x: number, y: number, pal: Palette): string {
  const parts: string[] = [];
  const mid = x + SAMPLE / 2;
  if (e.area) parts.push(el('rect', { x, y: y - 6, width: SAMPLE, height: 10, fill: e.area, 'fill-opacity': 0.18 }));
  if (e.line) {
    const d = e.line.vertical ? `M${px(mid)},${px(y - 7)}V${px(y + 5)}` : `M${px(x)},${px(y)}H${px(x + SAMPLE)}`;
    parts.push(el('path', { d, stroke: e.colour, 'stroke-width': e.line.width, 'stroke-dasharray': e.line.dash, fill: 'none' }));
  }
  if (e.marker) {
    const style = e.hollow !== undefined ? { fill: 'none', stroke: e.colour, 'stroke-width': e.hollow } : { fill: e.colour, stroke: e.colour };
    parts.push(el('path', { 'data-marker': e.hollow !== undefined ? `${e.marker} open` : e.marker, d: markerPath(e.marker, mid, y, e.hollow !== undefined ? 5 : 4), ...style }));
  }
  parts.push(el('text', { x: x + SAMPLE + 6, y: y + 4, fill: pal.text }, text(e.label)));
  return el('g', { class: 'sl-legend-entry' }, parts);
}

export function legendRows(entries: LegendEntry[], x0: number, y0: number, maxWidth: number, pal: Palette): { svg: string; height: number } {
  const items: string[] = [];
  let x = x0;
  let y = y0;
  for (const e of entries) {
    const w = SAMPLE + 6 + estimateTextWidth(e.label);
    if (x > x0 && x + w > x0 + maxWidth) {
      x = x0;
      y += ROW;
    }
    items.push(entrySvg(e, x, y, pal));
    x += w + GAP;
  }
  return { svg: el('g', { class: 'sl-legend', 'font-size': 11 }, items), height: y - y0 + ROW };
}

/** Where the legend of a figure with plots stacked under its title starts (the baseline of its first row). */
const UNDER_TITLE_Y = 46;

/**
 * The legend under a figure's title, in rows across the plot's width from `left` to `right`:
 * its SVG and `below`, the y where what follows starts (`gap` under the last row).
 */
export function legendUnderTitle(entries: LegendEntry[], left: number, right: number, gap: number, pal: Palette): { svg: string; below: number } {
  const rows = legendRows(entries, left, UNDER_TITLE_Y, right - left, pal);
  return { svg: rows.svg, below: UNDER_TITLE_Y + rows.height + gap };
}

/** A legend stacked in one column; entries beyond `maxRows` are summarised as "+n more". */
export function legendColumn(entries: LegendEntry[], x0: number, y0: number, maxRows: number, pal: Palette): string {
  const shown = entries.length > maxRows ? entries.slice(0, Math.max(1, maxRows - 1)) : entries;
  const items = shown.map((e, i) => entrySvg(e, x0, y0 + i * ROW, pal));
  if (shown.length < entries.length) {
    items.push(el('text', { x: x0, y: y0 + shown.length * ROW + 4, fill: pal.muted }, text(`+${entries.length - shown.length} more`)));
  }
  return el('g', { class: 'sl-legend', 'font-size': 11 }, items);
}

export const LEGEND_ROW_HEIGHT = ROW;
export const LEGEND_SAMPLE_WIDTH = SAMPLE;

/**
 * One component drawn as a stick with a cap, and the notes a stick figure owes its reader (sticks
 * on top of each other, components too faint to draw). Shared by the stick figure and the spectrum.
 */
import { markerPath, type MarkerShape } from './markers';
import type { Palette } from './palette';
import { POLARIZATION_DASH, POLARIZATION_NAME } from './palette';
import type { Scale } from './axes';
import { dataNum, el, px, text, titleEl } from './svgText';
import { formatIn, type DisplayUnit } from './units';
import type { LineComponent, Polarization } from './viewData';

/** A stick's stroke width: sticks closer than this stand on each other. */
export const STICK_WIDTH = 2.4;
export const POLARIZATION_MARKER: Record<Polarization, MarkerShape> = { pi: 'circle', 'sigma+': 'up', 'sigma-': 'down' };

export function signed(v: number, text: string): string {
  return v > 0 ? `+${text}` : text;
}

/** Cap radius from 2 (vanishing strength) to 6 (the strongest component), by the square root so area follows strength. */
export function capRadius(strength: number, strongest: number): number {
  return 2 + 4 * Math.sqrt(Math.max(0, strength) / (strongest || 1));
}

export interface StickContext {
  idBase: string;
  pal: Palette;
  interactive: boolean;
  y: Scale;
  strongest: number;
  unit: DisplayUnit;
}

/** The height a component is drawn at: what the spectrum counts when one is drawn, else its strength. */
export function shownStrength(c: LineComponent): number {
  return c.observed ?? c.strength;
}

export function stick(c: LineComponent, i: number, cx: number, ctx: StickContext): string {
  const { pal, y } = ctx;
  const base = y(0);
  const h = shownStrength(c);
  const top = y(h);
  const colour = pal.polarization[c.polarization];
  const name = POLARIZATION_NAME[c.polarization];
  const where = signed(c.offsetHz, formatIn(c.offsetHz, ctx.unit));
  const pathId = `${ctx.idBase}-k${i}`;
  const children = [
    titleEl(`${name} ${c.label}: Δf = ${where}, strength ${dataNum(c.strength)}${c.observed !== undefined ? `, seen ${dataNum(c.observed)} with the viewing factor` : ''}`),
    el('path', { id: pathId, d: `M${px(cx)},${px(base)}V${px(top)}`, fill: 'none', 'stroke-linecap': 'butt' }),
    el('path', { class: 'sl-cap', d: markerPath(POLARIZATION_MARKER[c.polarization], cx, top, capRadius(h, ctx.strongest)), fill: colour, stroke: pal.halo, 'stroke-width': 0.8, 'stroke-dasharray': 'none' }),
  ];
  if (ctx.interactive) children.push(el('use', { href: `#${pathId}`, class: 'sl-hit', 'stroke-width': 9, 'stroke-opacity': 0, 'stroke-dasharray': 'none' }));
  return el(
    'g',
    {
      class: `sl-component sl-pol-${c.polarization === 'pi' ? 'pi' : c.polarization === 'sigma+' ? 'plus' : 'minus'}`,
      'data-kind': 'component',
      'data-label': c.label,
      'data-polarization': name,
      'data-offset-hz': dataNum(c.offsetHz),
      'data-strength': dataNum(c.strength),
      'data-observed': c.observed !== undefined ? dataNum(c.observed) : undefined,
      stroke: colour,
      'stroke-width': STICK_WIDTH,
      'stroke-dasharray': POLARIZATION_DASH[c.polarization],
      tabindex: '0',
    },
    children,
  );
}

/** How many separate places the sticks at these x stand in: a place holds the sticks less than a stick's width right of its first. */
export function overlapPlaces(xs: number[]): number {
  const sorted = [...xs].sort((a, b) => a - b);
  let places = 0;
  let start = -Infinity;
  for (const v of sorted) {
    if (v - start >= STICK_WIDTH) {
      places++;
      start = v;
    }
  }
  return places;
}

/** The sentence for sticks drawn on top of each other, when some are. */
export function overlapNote(count: number, places: number): string | undefined {
  return places < count ? `${count} components drawn at ${places} ${places === 1 ? 'place' : 'places'}: sticks closer than their width overlap (each is listed in the report)` : undefined;
}

/** Components left out of the figure: how many, and the sentence that says so. */
export interface FaintNote {
  count: number;
  text: string;
}

export function faintNoteSvg(note: FaintNote, x: number, y: number, pal: Palette): string {
  return el('text', { class: 'sl-note sl-faint-note', 'data-left-out': note.count, x, y, 'font-size': 10, fill: pal.muted }, text(note.text));
}


/**
 * A slower along its length: the field B(z) it needs (and the coils' field, when it names coils)
 * above, and the speeds below — the speed resonant with the laser at each z and one atom's
 * simulated speed, which rides just below it. With coils there are two resonances, one in each
 * field, each drawn in its field's colour and dash and named after it. Where the coils drop the
 * atoms, a rule.
 */
import { scaleLinear } from 'd3-scale';
import { line } from 'd3-shape';
import { bottomAxis, leftAxis, type PlotBox } from './axes';
import { emptyDiagram, estimateTextWidth, svgDocument } from './frame';
import { legendUnderTitle, type LegendEntry } from './legend';
import { paletteFor } from './palette';
import { finiteExtent } from './sampled';
import { dataNum, el, px, shortHash, text, titleEl } from './svgText';
import { engineeringUnit, fieldDisplayUnit, formatIn } from './units';
import { fieldAxisUnit } from './fieldAxisUnit';
import type { RenderTheme } from './viewData';

export interface SlowerViewData {
  title: string;
  zM: number[];
  idealT: number[];
  /** The coils' field along the axis, when there are coils. */
  coilsT?: number[];
  /** The speed resonant with the laser: in the coils' field when there are coils, else in the ideal field. */
  resonantMPerS: number[];
  /** With coils: the speed the ideal field is resonant with. */
  idealResonantMPerS?: number[];
  /** The unit the file wrote the slower's field in (its bias), if any: the B axis keeps its family while it reads short. */
  fieldWrittenUnit?: string;
  /** The simulated atom's speed; NaN past where it stopped. */
  flightMPerS: number[];
  dropAtM?: number;
  zeroCrossingM?: number;
}

const WIDTH = 760;
const LEFT = 84;
const RIGHT = WIDTH - 20;

/** What the resonance and flight curves are called: in the ideal field without coils, in the coils' field with them. */
const SERIES_NAMES = {
  ideal: {
    resonantLegend: 'resonant speed, ideal field',
    resonantTitle: 'speed resonant with the laser in the ideal field',
    resonantDesc: 'resonant speed in the ideal field',
    flight: 'simulated atom',
    flightTitle: 'simulated atom in the ideal field',
  },
  coils: {
    resonantLegend: "resonant speed, coils' field",
    resonantTitle: "speed resonant with the laser in the coils' actual field",
    resonantDesc: "resonant speed in the coils' field",
    flight: "simulated atom, coils' field",
    flightTitle: "simulated atom in the coils' field",
  },
} as const;

export function renderSlower(d: SlowerViewData, theme: RenderTheme): string {
  const pal = paletteFor(theme);
  const idBase = `sl-s${shortHash(`${d.title}|${d.zM.length}`)}`;
  const zx = finiteExtent(d.zM);
  const bx = finiteExtent([...d.idealT, ...(d.coilsT ?? [])]);
  const vx = finiteExtent([...d.resonantMPerS, ...(d.idealResonantMPerS ?? []), ...d.flightMPerS, 0]);
  if (!zx || !bx || !vx || zx[0] === zx[1]) return emptyDiagram('slower', idBase, d.title, 'No profile to draw.', pal);

  // Each resonance is named after the field it is resonant in; with coils, the designed one is drawn thin in the ideal field's colour.
  const coils = d.coilsT !== undefined;
  const idealResonance = coils && d.idealResonantMPerS ? d.idealResonantMPerS : undefined;
  const names = SERIES_NAMES[coils ? 'coils' : 'ideal'];
  const legend: LegendEntry[] = [{ label: 'ideal field', colour: pal.series[0], line: { width: 2 } }];
  if (coils) legend.push({ label: "coils' field", colour: pal.series[1], line: { width: 2, dash: '6 3' } });
  if (idealResonance) legend.push({ label: 'resonant speed, ideal field', colour: pal.series[0], line: { width: 1.5 } });
  // The resonance drawn in full is the one in the field the atoms fly through: the coils' when there are coils.
  const resonantStyle = coils ? { colour: pal.series[1]!, dash: '6 3' } : { colour: pal.series[0]!, dash: undefined };
  legend.push({ label: names.resonantLegend, colour: resonantStyle.colour, line: { width: 2, ...(resonantStyle.dash ? { dash: resonantStyle.dash } : {}) } });
  legend.push({ label: names.flight, colour: pal.text, line: { width: 1.5, dash: '2 3' } });
  const legendSvg = legendUnderTitle(legend, LEFT, RIGHT, 10, pal);
  const top = legendSvg.below;
  const upper: PlotBox = { left: LEFT, right: RIGHT, top, bottom: top + 190 };
  const lower: PlotBox = { left: LEFT, right: RIGHT, top: upper.bottom + 24, bottom: upper.bottom + 24 + 170 };
  const height = lower.bottom + 56;
  const x = scaleLinear().domain(zx).range([LEFT, RIGHT]);
  const pad = (a: number, b: number): [number, number] => [a - (b - a) * 0.06, b + (b - a) * 0.06];
  const yb = scaleLinear().domain(pad(Math.min(bx[0], 0), Math.max(bx[1], 0))).range([upper.bottom, upper.top]).nice();
  const yv = scaleLinear().domain(pad(0, vx[1])).range([lower.bottom, lower.top]).nice();
  const zUnit = engineeringUnit(zx[1], 'm');
  // The one rule of every field axis (render/fieldAxisUnit.ts): the bias's written family, else by the size of the field.
  const bUnit = fieldDisplayUnit(fieldAxisUnit(Math.max(Math.abs(bx[0]), Math.abs(bx[1])), d.fieldWrittenUnit));
  const vUnit = { factor: 1, symbol: 'm/s' };

  const body: string[] = [legendSvg.svg];
  body.push(bottomAxis(x, zUnit, '', upper, pal));
  body.push(leftAxis(yb, bUnit, 'B', upper, LEFT, pal));
  body.push(bottomAxis(x, zUnit, 'z', lower, pal));
  body.push(leftAxis(yv, vUnit, 'v', lower, LEFT, pal));
  body.push(el('path', { class: 'sl-zero', d: `M${px(LEFT)},${px(yb(0))}H${px(RIGHT)}`, stroke: pal.muted, 'stroke-dasharray': '2 4', fill: 'none' }));
  const curve = (ys: number[], y: (v: number) => number): string =>
    line<number>().defined((k) => Number.isFinite(ys[k]!) && Number.isFinite(d.zM[k]!)).x((k) => x(d.zM[k]!)).y((k) => y(ys[k]!)).digits(2)(ys.map((_, k) => k)) ?? '';
  // Each curve stays inside its own plot: a resonant speed below 0 (no atom flying forwards is
  // resonant there, as behind a steep exit) leaves at the bottom of the lower plot, not off the figure.
  const clip = { upper: `${idBase}-upper`, lower: `${idBase}-lower` };
  const clipRect = (id: string, b: PlotBox): string => el('clipPath', { id }, el('rect', { x: b.left, y: b.top - 1, width: b.right - b.left, height: b.bottom - b.top + 2 }));
  body.push(el('defs', {}, [clipRect(clip.upper, upper), clipRect(clip.lower, lower)]));
  const series = (kind: string, label: string, ys: number[], y: (v: number) => number, clipId: string, colour: string, width: number, dash?: string): string =>
    el('g', { class: 'sl-curve', 'data-kind': kind, 'data-label': label, 'clip-path': `url(#${clipId})`, fill: 'none', stroke: colour, 'stroke-width': width, ...(dash ? { 'stroke-dasharray': dash } : {}) }, [
      titleEl(label),
      el('path', { d: curve(ys, y) }),
    ]);
  body.push(series('ideal', 'ideal field B(z)', d.idealT, yb, clip.upper, pal.series[0]!, 2));
  if (d.coilsT) body.push(series('coils', "the coils' field", d.coilsT, yb, clip.upper, pal.series[1]!, 2, '6 3'));
  if (idealResonance) body.push(series('ideal-resonant', 'speed resonant with the laser in the ideal (designed) field', idealResonance, yv, clip.lower, pal.series[0]!, 1.5));
  body.push(series('resonant', names.resonantTitle, d.resonantMPerS, yv, clip.lower, resonantStyle.colour, 2, resonantStyle.dash));
  body.push(series('flight', names.flightTitle, d.flightMPerS, yv, clip.lower, pal.text, 1.5, '2 3'));
  // Rule labels sit right of their rule, or left of it where they would run past the plot's right
  // edge; a label that would overlap the one before goes one row down.
  const placed: { from: number; to: number; row: number }[] = [];
  const rule = (kind: string, zM: number, label: string, colour: string): string => {
    const xr = x(zM);
    const w = estimateTextWidth(label);
    const onRight = xr + 4 + w <= RIGHT;
    const from = onRight ? xr + 4 : xr - 4 - w;
    let row = 0;
    while (placed.some((p) => p.row === row && from < p.to + 4 && from + w > p.from - 4)) row++;
    placed.push({ from, to: from + w, row });
    return el('g', { class: `sl-${kind}`, 'data-kind': kind, 'data-z-m': dataNum(zM) }, [
      titleEl(`${label} at z = ${formatIn(zM, zUnit)}`),
      el('path', { d: `M${px(xr)},${px(upper.top)}V${px(lower.bottom)}`, stroke: colour, 'stroke-dasharray': '4 3', fill: 'none' }),
      el('text', { x: px(onRight ? xr + 4 : xr - 4), y: upper.top + 12 + 14 * row, 'text-anchor': onRight ? undefined : 'end', 'font-size': 11, fill: colour, stroke: pal.halo, 'stroke-width': 3, 'paint-order': 'stroke' }, text(label)),
    ]);
  };
  if (d.zeroCrossingM !== undefined) body.push(rule('zero-crossing', d.zeroCrossingM, 'B = 0', pal.muted));
  if (d.dropAtM !== undefined) body.push(rule('drop', d.dropAtM, 'atoms dropped', pal.bad));
  const desc = `Field from ${formatIn(d.idealT[0]!, bUnit)} to ${formatIn(d.idealT.at(-1)!, bUnit)} over ${formatIn(zx[1], zUnit)}; ${names.resonantDesc} from ${formatIn(d.resonantMPerS[0]!, vUnit)} to ${formatIn(d.resonantMPerS.at(-1)!, vUnit)}${d.dropAtM !== undefined ? `; atoms dropped at ${formatIn(d.dropAtM, zUnit)}` : ''}.`;
  return svgDocument(
    {
      view: 'slower',
      idBase,
      width: WIDTH,
      height,
      title: d.title,
      desc,
      pal,
      rootData: { 'data-x-name': 'z', 'data-x-unit': zUnit.symbol, 'data-x-factor': dataNum(zUnit.factor), 'data-x-domain': `${dataNum(zx[0])},${dataNum(zx[1])}`, 'data-x-range': `${px(LEFT)},${px(RIGHT)}` },
    },
    body,
  );
}

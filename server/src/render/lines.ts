/**
 * Line components as a stick spectrum against frequency offset. Polarisation is carried three
 * ways at once — colour, line style (π solid, σ+ dashed, σ− dotted) and the cap marker
 * (π circle, σ+ upward triangle, σ− downward triangle) — so it survives greyscale printing;
 * the cap's size follows the strength, so weak components do not look like strong ones. When
 * the field is low enough that hyperfine groups lie far apart compared with their Zeeman
 * structure, each group gets a panel of its own, on one common scale, with offsets from the
 * group's centre in Hz and in units of μ_B·B/h.
 */
import { scaleLinear } from 'd3-scale';
import { spectrumPath, spectrumTop } from './spectrumCurve';
import { bottomAxis, leftAxis, topAxis, type PlotBox, type Scale } from './axes';
import { emptyDiagram, estimateTextWidth, svgDocument } from './frame';
import { lineGroups, zeemanUnitHz, type LineGroup } from './lineGroups';
import { legendRows, type LegendEntry } from './legend';
import { markerPath, type MarkerShape } from './markers';
import { paletteFor, POLARIZATION_DASH, POLARIZATION_NAME, type Palette } from './palette';
import { finiteExtent } from './sampled';
import { dataNum, el, px, shortHash, text, titleEl } from './svgText';
import { trimNumber } from '../eval/quantityText';
import { engineeringUnit, formatIn, formatSI, frequencyUnit, type DisplayUnit } from './units';
import type { LineComponent, LinesViewData, Polarization, RenderTheme } from './viewData';

const WIDTH = 760;
const HEIGHT = 420;
const POLARIZATIONS: Polarization[] = ['pi', 'sigma+', 'sigma-'];
/** Components weaker than this fraction of the strongest are not drawn (common practice for a visible stick: ~1e-4 of full scale is under a pixel at any figure size). */
export const VISIBLE_FLOOR = 1e-4;
/** Height of the row that holds the note of components left out. */
const NOTE_ROW = 14;
/** A stick's stroke width: sticks closer than this stand on each other. */
const STICK_WIDTH = 2.4;
export const POLARIZATION_MARKER: Record<Polarization, MarkerShape> = { pi: 'circle', 'sigma+': 'up', 'sigma-': 'down' };

function signed(v: number, text: string): string {
  return v > 0 ? `+${text}` : text;
}

/** Cap radius from 2 (vanishing strength) to 6 (the strongest component), by the square root so area follows strength. */
function capRadius(strength: number, strongest: number): number {
  return 2 + 4 * Math.sqrt(Math.max(0, strength) / (strongest || 1));
}

interface StickContext {
  idBase: string;
  pal: Palette;
  interactive: boolean;
  y: Scale;
  strongest: number;
  unit: DisplayUnit;
}

/** The height a component is drawn at: what the spectrum counts when one is drawn, else its strength. */
function shownStrength(c: LineComponent): number {
  return c.observed ?? c.strength;
}

function stick(c: LineComponent, i: number, cx: number, ctx: StickContext): string {
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

export function renderLines(d: LinesViewData, theme: RenderTheme): string {
  const pal = paletteFor(theme);
  const idBase = `sl-s${shortHash(`${d.title}|${d.components.length}`)}`;
  const finite = d.components.filter(
    (c) => Number.isFinite(c.offsetHz) && Number.isFinite(shownStrength(c)) && POLARIZATIONS.includes(c.polarization) && !(c.observed === 0),
  );
  // A component far below the strongest would draw as a line no spectrometer sees: it stays in
  // the report and the CSV, and the figure says how many it leaves out.
  const strongestAll = Math.max(0, ...finite.map(shownStrength));
  const comps = finite.filter((c) => shownStrength(c) >= VISIBLE_FLOOR * strongestAll);
  const faint = finite.length - comps.length;
  const faintNote: FaintNote | undefined = faint > 0
    ? { count: faint, text: `not drawn: ${faint} ${faint === 1 ? 'component' : 'components'} weaker than ${trimNumber(VISIBLE_FLOOR, 2)} × the strongest (down to ${trimNumber(Math.min(...finite.map(shownStrength)) / (strongestAll || 1), 2)} ×), listed in the report` }
    : undefined;
  const fExtent = finiteExtent(comps.map((c) => c.offsetHz));
  const sExtent = finiteExtent(comps.map(shownStrength));
  if (!fExtent || !sExtent) return emptyDiagram('lines', idBase, d.title, 'No line components to draw.', pal);

  const present = new Set(comps.map((c) => c.polarization));
  const legend: LegendEntry[] = POLARIZATIONS.filter((p) => present.has(p)).map((p) => ({
    label: `${POLARIZATION_NAME[p]} (Δm = ${p === 'pi' ? '0' : p === 'sigma+' ? '+1' : '−1'})`,
    colour: pal.polarization[p],
    line: { width: 2, dash: POLARIZATION_DASH[p] },
    marker: POLARIZATION_MARKER[p],
  }));
  legend.push({ label: 'marker size: strength', colour: pal.muted, marker: 'circle' });
  if (d.spectrum) legend.push({ label: d.spectrum.caption, colour: pal.total, line: { width: 1.8 } });
  const legendSvg = legendRows(legend, 64, 48, WIDTH - 80, pal);
  // A spectrum is one curve on one axis, so the hyperfine groups are not split into panels.
  const groups = d.unitHz === undefined && !d.spectrum ? lineGroups(comps, d.fieldT) : [];
  const counts = POLARIZATIONS.filter((p) => present.has(p)).map((p) => `${comps.filter((c) => c.polarization === p).length} ${POLARIZATION_NAME[p]}`);
  // A blend of components can stand above every stick: the axis holds the curve too.
  const top = Math.max(sExtent[1], d.spectrum ? spectrumTop(d.spectrum, sExtent[1]) : 0, 0);
  const yDomain = [Math.min(0, sExtent[0]), top * 1.12 || 1];
  const interactive = theme.kind === 'panel';
  const strongest = sExtent[1];

  if (groups.length > 1) return groupedPanels(d, comps, groups, legendSvg, counts, yDomain, { idBase, pal, interactive, strongest }, faintNote);

  const unit = frequencyUnit(Math.max(Math.abs(fExtent[0]), Math.abs(fExtent[1])), d.unitHz);
  const span = fExtent[1] - fExtent[0];
  const pad = span > 0 ? span * 0.08 : Math.max(Math.abs(fExtent[0]) * 0.1, unit.factor);
  // With a spectrum its window is the axis (sticks outside a chosen span are not drawn).
  const window = d.spectrum ? finiteExtent(Array.from(d.spectrum.offsetHz)) : undefined;
  const f0 = window ? window[0] : fExtent[0] - pad;
  const f1 = window ? window[1] : fExtent[1] + pad;

  const box: PlotBox = { left: 64, right: WIDTH - 20, top: 48 + legendSvg.height + 16, bottom: HEIGHT - 56 };
  const x = scaleLinear().domain([f0, f1]).range([box.left, box.right]);
  const y = scaleLinear().domain(yDomain).range([box.bottom, box.top]).nice();

  const body: string[] = [legendSvg.svg];
  body.push(bottomAxis(x, unit, 'Δf', box, pal));
  body.push(leftAxis(y, undefined, comps.some((c) => c.observed !== undefined) ? 'strength × viewing factor' : 'relative strength', box, box.left, pal));
  if (f0 < 0 && f1 > 0) {
    body.push(
      el('path', { class: 'sl-zero', d: `M${px(x(0))},${px(box.top)}V${px(box.bottom)}`, stroke: pal.muted, 'stroke-width': 1, 'stroke-dasharray': '2 4', fill: 'none' }),
    );
  }
  const ctx: StickContext = { idBase, pal, interactive, y, strongest, unit };
  const drawn = window ? comps.filter((c) => c.offsetHz >= f0 && c.offsetHz <= f1) : comps;
  body.push(el('g', { class: 'sl-components' }, drawn.map((c, i) => stick(c, i, x(c.offsetHz), ctx))));
  if (d.spectrum) {
    const path = spectrumPath(d.spectrum, x, y, strongest);
    if (path) body.push(el('path', { class: 'sl-spectrum', 'data-kind': 'spectrum', d: path, fill: 'none', stroke: pal.total, 'stroke-width': 1.8, 'stroke-linejoin': 'round' }));
  }

  // Sticks closer than their width draw as one: the figure says so, or the report's count would not match what is seen.
  const stickXs = drawn.map((c) => x(c.offsetHz));
  const places = overlapPlaces(stickXs);
  const overlap = overlapNote(stickXs.length, places);
  const notes = [overlap, faintNote?.text].filter((t): t is string => t !== undefined);
  if (overlap) body.push(el('text', { class: 'sl-note sl-overlap-note', 'data-places': places, x: box.left, y: HEIGHT + NOTE_ROW - 8, 'font-size': 10, fill: pal.muted }, text(overlap)));
  if (faintNote) body.push(faintNoteSvg(faintNote, box.left, HEIGHT + NOTE_ROW * (overlap ? 2 : 1) - 8, pal));
  const desc = `Stick spectrum of ${comps.length} line components (${counts.join(', ')}) from Δf = ${formatIn(fExtent[0], unit)} to ${formatIn(fExtent[1], unit)}${notes.map((t) => `; ${t}`).join('')}.`;
  return svgDocument(
    {
      view: 'lines',
      idBase,
      width: WIDTH,
      height: HEIGHT + NOTE_ROW * notes.length,
      title: d.title,
      desc,
      pal,
      rootData: {
        'data-x-name': 'Δf',
        'data-x-unit': unit.symbol,
        'data-x-factor': dataNum(unit.factor),
        'data-x-domain': `${dataNum(f0)},${dataNum(f1)}`,
        'data-x-range': `${px(box.left)},${px(box.right)}`,
        'data-y-domain': `${dataNum(y.domain()[0])},${dataNum(y.domain()[1])}`,
        'data-y-range': `${px(box.bottom)},${px(box.top)}`,
        'data-panels': '1',
      },
    },
    body,
  );
}

const PANEL_GAP = 24;

/** How many separate places the sticks at these x stand in: a place holds the sticks less than a stick's width right of its first. */
function overlapPlaces(xs: number[]): number {
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
function overlapNote(count: number, places: number): string | undefined {
  return places < count ? `${count} components drawn at ${places} ${places === 1 ? 'place' : 'places'}: sticks closer than their width overlap (each is listed in the report)` : undefined;
}

/** Components left out of the figure: how many, and the sentence that says so. */
interface FaintNote {
  count: number;
  text: string;
}

function faintNoteSvg(note: FaintNote, x: number, y: number, pal: Palette): string {
  return el('text', { class: 'sl-note sl-faint-note', 'data-left-out': note.count, x, y, 'font-size': 10, fill: pal.muted }, text(note.text));
}

/** One panel per group, all on the same scale, offsets from each group's centre. */
function groupedPanels(
  d: LinesViewData,
  comps: LineComponent[],
  groups: LineGroup[],
  legendSvg: { svg: string; height: number },
  counts: string[],
  yDomain: number[],
  base: Omit<StickContext, 'y' | 'unit'>,
  faintNote?: FaintNote,
): string {
  const { pal, idBase } = base;
  const z = zeemanUnitHz(d.fieldT);
  const half = Math.max(...groups.map((g) => Math.max(g.highHz - g.centreHz, g.centreHz - g.lowHz))) * 1.15 || 2 * z;
  const unit = engineeringUnit(half, 'Hz');
  const zUnit: DisplayUnit = { factor: z, symbol: 'μB·B/h' };
  const height = HEIGHT + 61;
  const top = 48 + legendSvg.height + 16 + 53;
  const left = 64;
  const right = WIDTH - 20;
  const n = groups.length;
  const w = (right - left - PANEL_GAP * (n - 1)) / n;
  const bottom = height - 70;
  const y = scaleLinear().domain(yDomain).range([bottom, top]).nice();
  const ctx: StickContext = { ...base, y, unit };
  const body: string[] = [legendSvg.svg];
  body.push(leftAxis(y, undefined, 'relative strength', { left, right: left + w, top, bottom }, left, pal));
  let k = 0;
  groups.forEach((g, gi) => {
    const box: PlotBox = { left: left + gi * (w + PANEL_GAP), right: left + gi * (w + PANEL_GAP) + w, top, bottom };
    const x = scaleLinear().domain([-half, half]).range([box.left, box.right]);
    const heading = signed(g.centreHz, formatSI(g.centreHz, 'Hz'));
    // Headings of narrow panels alternate between two rows so that they never overlap.
    const stagger = estimateTextWidth(heading, 11) + 6 > w + PANEL_GAP && gi % 2 === 1 ? 13 : 0;
    const parts: string[] = [
      titleEl(`Group ${gi + 1} of ${n}: ${g.components.length} components centred at Δf = ${signed(g.centreHz, formatSI(g.centreHz, 'Hz'))}`),
      el('text', { class: 'sl-panel-heading', x: (box.left + box.right) / 2, y: top - 30 - stagger, 'text-anchor': 'middle', 'font-size': 11, 'font-weight': 600, fill: pal.text }, text(heading)),
      bottomAxis(x, unit, 'offset', box, pal, Math.min(60, w / 3)),
      topAxis(x, zUnit, box, pal, Math.min(50, w / 2)),
      el('path', { class: 'sl-frame', d: `M${px(box.left)},${px(box.top)}V${px(box.bottom)}M${px(box.right)},${px(box.top)}V${px(box.bottom)}`, stroke: pal.grid, fill: 'none' }),
      el('g', { class: 'sl-components' }, g.components.map((c) => stick(c, k++, x(c.offsetHz - g.centreHz), ctx))),
    ];
    body.push(
      el('g', { class: 'sl-panel', 'data-kind': 'group', 'data-label': heading, 'data-centre-hz': dataNum(g.centreHz), 'data-x-domain': `${dataNum(-half)},${dataNum(half)}`, 'data-x-range': `${px(box.left)},${px(box.right)}` }, parts),
    );
  });
  const unitNote = `top scale: offset in μB·B/h = ${formatSI(z, 'Hz')} (B = ${d.fieldText ?? formatSI(d.fieldT ?? 0, 'T')})`;
  body.push(el('text', { class: 'sl-note', x: right, y: height - 8, 'text-anchor': 'end', 'font-size': 10, fill: pal.muted }, text(unitNote)));
  if (faintNote) body.push(faintNoteSvg(faintNote, left, height + NOTE_ROW - 8, pal));
  const desc = `Stick spectrum of ${comps.length} line components (${counts.join(', ')}) in ${n} groups, one panel each on a common scale of ±${formatIn(half, unit)} about the group centre: ${groups
    .map((g) => signed(g.centreHz, formatSI(g.centreHz, 'Hz')))
    .join(', ')}; ${unitNote}${faintNote ? `; ${faintNote.text}` : ''}.`;
  return svgDocument(
    {
      view: 'lines',
      idBase,
      width: WIDTH,
      height: height + (faintNote ? NOTE_ROW : 0),
      title: d.title,
      desc,
      pal,
      rootData: { 'data-panels': String(n), 'data-x-unit': unit.symbol, 'data-y-domain': `${dataNum(y.domain()[0])},${dataNum(y.domain()[1])}`, 'data-y-range': `${px(bottom)},${px(top)}` },
    },
    body,
  );
}

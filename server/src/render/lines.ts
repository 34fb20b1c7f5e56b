/**
 * Line components as a stick spectrum against frequency offset. Polarisation is carried three
 * ways at once — colour, line style (π solid, σ+ dashed, σ− dotted) and the cap marker
 * (π circle, σ+ upward triangle, σ− downward triangle) — so it survives greyscale printing;
 * the cap's size follows the strength, so weak components do not look like strong ones. When
 * the field is low enough that hyperfine groups lie far apart compared with their Zeeman
 * structure, each group gets a panel of its own, on one common scale, with offsets from the
 * group's centre in Hz and in units of μ_B·B/h. A line with a synthesized spectrum is drawn by
 * spectrumLines.ts (its frame follows the curve, not the groups).
 */
import { scaleLinear } from 'd3-scale';
import { renderSpectrumLines } from './spectrumLines';
import { bottomAxis, leftAxis, topAxis, type PlotBox } from './axes';
import { emptyDiagram, estimateTextWidth, svgDocument } from './frame';
import { lineGroups, zeemanUnitHz, type LineGroup } from './lineGroups';
import { legendRows, type LegendEntry } from './legend';
import { faintNoteSvg, overlapNote, overlapPlaces, shownStrength, signed, stick, POLARIZATION_MARKER, type FaintNote, type StickContext } from './stick';
import { paletteFor, POLARIZATION_DASH, POLARIZATION_NAME } from './palette';
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
  const counts = POLARIZATIONS.filter((p) => present.has(p)).map((p) => `${comps.filter((c) => c.polarization === p).length} ${POLARIZATION_NAME[p]}`);
  if (d.spectrum) return renderSpectrumLines(d, d.spectrum, { pal, idBase, interactive: theme.kind === 'panel', comps, faintNote, legend, counts });
  const legendSvg = legendRows(legend, 64, 48, WIDTH - 80, pal);
  const groups = d.unitHz === undefined ? lineGroups(comps, d.fieldT) : [];
  const yDomain = [Math.min(0, sExtent[0]), Math.max(sExtent[1], 0) * 1.12 || 1];
  const interactive = theme.kind === 'panel';
  const strongest = sExtent[1];

  if (groups.length > 1) return groupedPanels(d, comps, groups, legendSvg, counts, yDomain, { idBase, pal, interactive, strongest }, faintNote);

  const unit = frequencyUnit(Math.max(Math.abs(fExtent[0]), Math.abs(fExtent[1])), d.unitHz);
  const span = fExtent[1] - fExtent[0];
  const pad = span > 0 ? span * 0.08 : Math.max(Math.abs(fExtent[0]) * 0.1, unit.factor);
  const f0 = fExtent[0] - pad;
  const f1 = fExtent[1] + pad;

  const box: PlotBox = { left: 64, right: WIDTH - 20, top: 48 + legendSvg.height + 16, bottom: HEIGHT - 56 };
  const x = scaleLinear().domain([f0, f1]).range([box.left, box.right]);
  const y = scaleLinear().domain(yDomain).range([box.bottom, box.top]).nice();

  const body: string[] = [legendSvg.svg];
  body.push(bottomAxis(x, unit, 'Δf', box, pal));
  body.push(leftAxis(y, undefined, 'relative strength', box, box.left, pal));
  if (f0 < 0 && f1 > 0) {
    body.push(
      el('path', { class: 'sl-zero', d: `M${px(x(0))},${px(box.top)}V${px(box.bottom)}`, stroke: pal.muted, 'stroke-width': 1, 'stroke-dasharray': '2 4', fill: 'none' }),
    );
  }
  const ctx: StickContext = { idBase, pal, interactive, y, strongest, unit };
  const drawn = comps;
  body.push(el('g', { class: 'sl-components' }, drawn.map((c, i) => stick(c, i, x(c.offsetHz), ctx))));

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

/**
 * Line components as a stick spectrum against frequency offset. Polarisation is carried three
 * ways at once — colour, line style (π solid, σ+ dashed, σ− dotted) and the cap marker
 * (π circle, σ+ upward triangle, σ− downward triangle) — so it survives greyscale printing.
 */
import { scaleLinear } from 'd3-scale';
import { bottomAxis, leftAxis, type PlotBox } from './axes';
import { emptyDiagram, svgDocument } from './frame';
import { legendRows, type LegendEntry } from './legend';
import { markerPath, type MarkerShape } from './markers';
import { paletteFor, POLARIZATION_DASH, POLARIZATION_NAME } from './palette';
import { finiteExtent } from './sampled';
import { dataNum, el, px, shortHash, titleEl } from './svgText';
import { formatIn, frequencyUnit } from './units';
import type { LinesViewData, Polarization, RenderTheme } from './viewData';

const WIDTH = 760;
const HEIGHT = 420;
const POLARIZATIONS: Polarization[] = ['pi', 'sigma+', 'sigma-'];
export const POLARIZATION_MARKER: Record<Polarization, MarkerShape> = { pi: 'circle', 'sigma+': 'up', 'sigma-': 'down' };

function signed(v: number, text: string): string {
  return v > 0 ? `+${text}` : text;
}

export function renderLines(d: LinesViewData, theme: RenderTheme): string {
  const pal = paletteFor(theme);
  const idBase = `sl-s${shortHash(`${d.title}|${d.components.length}`)}`;
  const comps = d.components.filter(
    (c) => Number.isFinite(c.offsetHz) && Number.isFinite(c.strength) && POLARIZATIONS.includes(c.polarization),
  );
  const fExtent = finiteExtent(comps.map((c) => c.offsetHz));
  const sExtent = finiteExtent(comps.map((c) => c.strength));
  if (!fExtent || !sExtent) return emptyDiagram('lines', idBase, d.title, 'No line components to draw.', pal);

  const unit = frequencyUnit(Math.max(Math.abs(fExtent[0]), Math.abs(fExtent[1])), d.unitHz);
  const span = fExtent[1] - fExtent[0];
  const pad = span > 0 ? span * 0.08 : Math.max(Math.abs(fExtent[0]) * 0.1, unit.factor);
  const f0 = fExtent[0] - pad;
  const f1 = fExtent[1] + pad;

  const present = new Set(comps.map((c) => c.polarization));
  const legend: LegendEntry[] = POLARIZATIONS.filter((p) => present.has(p)).map((p) => ({
    label: `${POLARIZATION_NAME[p]} (Δm = ${p === 'pi' ? '0' : p === 'sigma+' ? '+1' : '−1'})`,
    colour: pal.polarization[p],
    line: { width: 2, dash: POLARIZATION_DASH[p] },
    marker: POLARIZATION_MARKER[p],
  }));
  const legendSvg = legendRows(legend, 64, 48, WIDTH - 80, pal);

  const box: PlotBox = { left: 64, right: WIDTH - 20, top: 48 + legendSvg.height + 16, bottom: HEIGHT - 56 };
  const x = scaleLinear().domain([f0, f1]).range([box.left, box.right]);
  const y = scaleLinear()
    .domain([Math.min(0, sExtent[0]), Math.max(sExtent[1], 0) * 1.12 || 1])
    .range([box.bottom, box.top])
    .nice();
  const interactive = theme.kind === 'panel';

  const body: string[] = [legendSvg.svg];
  body.push(bottomAxis(x, unit, 'Δf', box, pal));
  body.push(leftAxis(y, undefined, 'relative strength', box, box.left, pal));
  if (f0 < 0 && f1 > 0) {
    body.push(
      el('path', { class: 'sl-zero', d: `M${px(x(0))},${px(box.top)}V${px(box.bottom)}`, stroke: pal.muted, 'stroke-width': 1, 'stroke-dasharray': '2 4', fill: 'none' }),
    );
  }

  const base = y(0);
  const sticks = comps.map((c, i) => {
    const cx = x(c.offsetHz);
    const top = y(c.strength);
    const colour = pal.polarization[c.polarization];
    const name = POLARIZATION_NAME[c.polarization];
    const where = signed(c.offsetHz, formatIn(c.offsetHz, unit));
    const pathId = `${idBase}-k${i}`;
    const children = [
      titleEl(`${name} ${c.label}: Δf = ${where}, strength ${dataNum(c.strength)}`),
      el('path', { id: pathId, d: `M${px(cx)},${px(base)}V${px(top)}`, fill: 'none', 'stroke-linecap': 'butt' }),
      el('path', { class: 'sl-cap', d: markerPath(POLARIZATION_MARKER[c.polarization], cx, top, 5), fill: colour, stroke: pal.halo, 'stroke-width': 0.8, 'stroke-dasharray': 'none' }),
    ];
    if (interactive) children.push(el('use', { href: `#${pathId}`, class: 'sl-hit', 'stroke-width': 9, 'stroke-opacity': 0, 'stroke-dasharray': 'none' }));
    return el(
      'g',
      {
        class: `sl-component sl-pol-${c.polarization === 'pi' ? 'pi' : c.polarization === 'sigma+' ? 'plus' : 'minus'}`,
        'data-kind': 'component',
        'data-label': c.label,
        'data-polarization': name,
        'data-offset-hz': dataNum(c.offsetHz),
        'data-strength': dataNum(c.strength),
        stroke: colour,
        'stroke-width': 2.4,
        'stroke-dasharray': POLARIZATION_DASH[c.polarization],
        tabindex: '0',
      },
      children,
    );
  });
  body.push(el('g', { class: 'sl-components' }, sticks));

  const counts = POLARIZATIONS.filter((p) => present.has(p)).map((p) => `${comps.filter((c) => c.polarization === p).length} ${POLARIZATION_NAME[p]}`);
  const desc = `Stick spectrum of ${comps.length} line components (${counts.join(', ')}) from Δf = ${formatIn(fExtent[0], unit)} to ${formatIn(fExtent[1], unit)}.`;
  return svgDocument(
    {
      view: 'lines',
      idBase,
      width: WIDTH,
      height: HEIGHT,
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
      },
    },
    body,
  );
}

/**
 * The predicted detector pattern: the summed profile as a shaded line, each sublevel's share
 * as a thinner line (colour and dash both cycle), a marker over every peak and the
 * resolvability verdict as a badge that differs by shape as well as colour.
 */
import { scaleLinear } from 'd3-scale';
import { area, line } from 'd3-shape';
import { bottomAxis, leftAxis, type PlotBox } from './axes';
import { emptyDiagram, estimateTextWidth, svgDocument } from './frame';
import { truncateLabel } from './labelLayout';
import { LEGEND_ROW_HEIGHT, LEGEND_SAMPLE_WIDTH, legendColumn, type LegendEntry } from './legend';
import { markerPath } from './markers';
import { paletteFor, SERIES_DASHES, type Palette } from './palette';
import { arrayValues, finiteExtent } from './sampled';
import { dataNum, el, px, shortHash, text, titleEl } from './svgText';
import { engineeringUnit, formatIn, type DisplayUnit } from './units';
import type { PatternViewData, RenderTheme } from './viewData';

const WIDTH = 760;
const HEIGHT = 460;
const LEGEND_MAX_CHARS = 22;

/** Colour i mod 8 with a dash that shifts every 8 series, so the first 32 pairs are all distinct. */
export function seriesStyle(i: number, pal: Palette): { colour: string; dash?: string } {
  const n = pal.series.length;
  return { colour: pal.series[i % n], dash: SERIES_DASHES[(i + Math.floor(i / n)) % SERIES_DASHES.length] };
}

function peakOfSeries(xs: ArrayLike<number>, ys: ArrayLike<number>): { x: number; y: number } {
  let best = { x: NaN, y: -Infinity };
  const n = Math.min(xs.length, ys.length);
  for (let i = 0; i < n; i++) if (Number.isFinite(xs[i]) && ys[i] > best.y) best = { x: xs[i], y: ys[i] };
  return best;
}

function verdictBadge(resolved: boolean, message: string, x0: number, y0: number, maxWidth: number, pal: Palette): string {
  const colour = resolved ? pal.good : pal.bad;
  const word = resolved ? 'RESOLVED' : 'NOT RESOLVED';
  const badgeW = estimateTextWidth(word, 10) * 1.15 + 28; // bold capitals run wider than the estimate
  // A tick for resolved, a cross for not: the shape carries the verdict without colour.
  const icon = resolved
    ? `M${px(x0 + 6)},${px(y0)}l3,3.5l6,-7`
    : `M${px(x0 + 6)},${px(y0 - 4)}l7,7m0,-7l-7,7`;
  const room = Math.max(10, Math.floor((maxWidth - badgeW - 10) / estimateTextWidth('x')));
  return el(
    'g',
    { class: `sl-verdict ${resolved ? 'sl-resolved' : 'sl-unresolved'}`, 'data-kind': 'verdict', 'data-resolved': String(resolved), 'data-label': message },
    [
      titleEl(`${resolved ? 'Resolved' : 'Not resolved'}: ${message}`),
      el('rect', { x: x0, y: y0 - 10, width: badgeW, height: 19, rx: 3, fill: colour, 'fill-opacity': 0.14, stroke: colour }),
      el('path', { d: icon, fill: 'none', stroke: colour, 'stroke-width': 1.8, 'stroke-linecap': 'round' }),
      el('text', { x: x0 + 20, y: y0 + 4, 'font-size': 10, 'font-weight': 600, fill: colour }, text(word)),
      el('text', { x: x0 + badgeW + 10, y: y0 + 4, fill: pal.text }, text(truncateLabel(message, room))),
    ],
  );
}

function positionLabel(v: number, unit: DisplayUnit): string {
  return formatIn(v, unit);
}

export function renderPattern(d: PatternViewData, theme: RenderTheme): string {
  const pal = paletteFor(theme);
  const idBase = `sl-p${shortHash(`${d.title}|${d.parts.length}|${d.positionsM.length}`)}`;
  const xs = d.positionsM;
  const xExtent = finiteExtent(arrayValues(xs));
  const yExtent = finiteExtent([
    ...arrayValues(d.total, xs.length),
    ...d.parts.flatMap((p) => [...arrayValues(p.values, xs.length)]),
    ...d.peaks.map((p) => p.height),
  ]);
  if (!xExtent || !yExtent) return emptyDiagram('pattern', idBase, d.title, 'No detector profile to draw.', pal);

  const unit = engineeringUnit(Math.max(Math.abs(xExtent[0]), Math.abs(xExtent[1])), 'm');
  let [x0, x1] = xExtent;
  if (x0 === x1) {
    const pad = Math.abs(x0) * 0.1 || 1e-6;
    x0 -= pad;
    x1 += pad;
  }
  const yTop = Math.max(yExtent[1], 0) * 1.1 || 1;
  const yLow = Math.min(yExtent[0], 0);

  const legend: LegendEntry[] = [{ label: 'total', colour: pal.total, line: { width: 2.2 }, area: pal.totalFill }];
  d.parts.forEach((p, i) => {
    const s = seriesStyle(i, pal);
    legend.push({ label: truncateLabel(p.label, LEGEND_MAX_CHARS), colour: s.colour, line: { width: 1.4, dash: s.dash } });
  });
  if (d.peaks.length > 0) legend.push({ label: 'peak', colour: pal.text, marker: 'down' });
  const legendW = Math.min(200, Math.max(...legend.map((e) => estimateTextWidth(e.label))) + LEGEND_SAMPLE_WIDTH + 20);

  const box: PlotBox = { left: 64, right: WIDTH - 16 - legendW, top: 78, bottom: HEIGHT - 56 };
  const x = scaleLinear().domain([x0, x1]).range([box.left, box.right]);
  const y = scaleLinear().domain([yLow, yTop]).range([box.bottom, box.top]).nice();
  const interactive = theme.kind === 'panel';

  const body: string[] = [verdictBadge(d.verdict.resolved, d.verdict.text, 16, 48, WIDTH - 32, pal)];
  body.push(bottomAxis(x, unit, 'position on detector', box, pal));
  body.push(leftAxis(y, undefined, 'signal (relative)', box, box.left, pal));
  const maxRows = Math.floor((box.bottom - box.top) / LEGEND_ROW_HEIGHT);
  body.push(legendColumn(legend, box.right + 16, box.top + 6, maxRows, pal));

  const idx = Array.from({ length: xs.length }, (_, k) => k);
  const seriesPath = (ys: ArrayLike<number>): string =>
    line<number>()
      .defined((k) => k < ys.length && Number.isFinite(xs[k]) && Number.isFinite(ys[k]))
      .x((k) => x(xs[k]))
      .y((k) => y(ys[k]))
      .digits(2)(idx) ?? '';

  const dataGroup = (
    cls: string,
    kind: string,
    id: string,
    label: string,
    ys: ArrayLike<number>,
    stroke: string,
    strokeWidth: number,
    dash: string | undefined,
    extra: string[],
  ): string => {
    const d3path = seriesPath(ys);
    if (!d3path) return '';
    const peak = peakOfSeries(xs, ys);
    const pathId = `${idBase}-${id}`;
    const children = [
      titleEl(`${label}: maximum ${dataNum(peak.y)} at ${positionLabel(peak.x, unit)}`),
      ...extra,
      el('path', { id: pathId, d: d3path, fill: 'none' }),
    ];
    if (interactive) children.push(el('use', { href: `#${pathId}`, class: 'sl-hit', 'stroke-width': 9, 'stroke-opacity': 0, 'stroke-dasharray': 'none' }));
    return el(
      'g',
      {
        class: cls,
        'data-kind': kind,
        'data-id': id,
        'data-label': label,
        'data-position-m': dataNum(peak.x),
        'data-height': dataNum(peak.y),
        stroke,
        'stroke-width': strokeWidth,
        'stroke-dasharray': dash,
        'stroke-linejoin': 'round',
        fill: 'none',
      },
      children,
    );
  };

  const parts = d.parts.map((p, i) => {
    const s = seriesStyle(i, pal);
    return dataGroup('sl-part', 'part', `part-${i}`, p.label, p.values, s.colour, 1.3, s.dash, []);
  });
  const fill = area<number>()
    .defined((k) => k < d.total.length && Number.isFinite(xs[k]) && Number.isFinite(d.total[k]))
    .x((k) => x(xs[k]))
    .y0(y(0))
    .y1((k) => y(d.total[k]))
    .digits(2)(idx);
  const totalArea = fill ? [el('path', { class: 'sl-total-area', d: fill, fill: pal.totalFill, 'fill-opacity': 0.14, stroke: 'none' })] : [];
  body.push(dataGroup('sl-total', 'total', 'total', 'total', d.total, pal.total, 2.2, undefined, totalArea));
  body.push(el('g', { class: 'sl-parts' }, parts));

  // Peak markers; position labels only where they do not collide, taller peaks first.
  const peaks = d.peaks.filter((p) => Number.isFinite(p.positionM) && Number.isFinite(p.height) && p.positionM >= x0 && p.positionM <= x1);
  const order = peaks.map((_, i) => i).sort((a, b) => peaks[b].height - peaks[a].height || a - b);
  const taken: [number, number][] = [];
  const labelled = new Set<number>();
  for (const i of order) {
    const cx = x(peaks[i].positionM);
    const half = estimateTextWidth(positionLabel(peaks[i].positionM, unit), 10) / 2 + 3;
    if (taken.every(([a, b]) => cx + half < a || cx - half > b)) {
      taken.push([cx - half, cx + half]);
      labelled.add(i);
    }
  }
  body.push(
    el(
      'g',
      { class: 'sl-peaks' },
      peaks.map((p, i) => {
        const cx = x(p.positionM);
        const cy = y(p.height) - 3;
        const where = positionLabel(p.positionM, unit);
        const members = p.members.join(', ');
        const children = [
          titleEl(`Peak at ${where}, height ${dataNum(p.height)}${members ? `; states: ${members}` : ''}`),
          el('path', { class: 'sl-peak-mark', d: markerPath('down', cx, cy - 5, 5), fill: pal.text, stroke: pal.halo, 'stroke-width': 1 }),
        ];
        if (labelled.has(i)) {
          children.push(el('text', { x: cx, y: cy - 14, 'text-anchor': 'middle', 'font-size': 10, fill: pal.text, stroke: pal.halo, 'stroke-width': 3, 'paint-order': 'stroke' }, text(where)));
        }
        return el(
          'g',
          {
            class: 'sl-peak',
            'data-kind': 'peak',
            'data-label': `peak at ${where}`,
            'data-position-m': dataNum(p.positionM),
            'data-height': dataNum(p.height),
            'data-members': members,
            tabindex: '0',
          },
          children,
        );
      }),
    ),
  );

  const desc = [
    `Detector profile across ${positionLabel(xExtent[0], unit)} to ${positionLabel(xExtent[1], unit)}`,
    `${d.parts.length} sublevel contributions`,
    `${peaks.length} peaks`,
    `${d.verdict.resolved ? 'resolved' : 'not resolved'}: ${d.verdict.text}`,
  ];
  return svgDocument(
    {
      view: 'pattern',
      idBase,
      width: WIDTH,
      height: HEIGHT,
      title: d.title,
      desc: desc.join('; ') + '.',
      pal,
      rootData: {
        'data-x-name': 'z',
        'data-x-unit': unit.symbol,
        'data-x-factor': dataNum(unit.factor),
        'data-x-domain': `${dataNum(x0)},${dataNum(x1)}`,
        'data-x-range': `${px(box.left)},${px(box.right)}`,
        'data-y-domain': `${dataNum(y.domain()[0])},${dataNum(y.domain()[1])}`,
        'data-y-range': `${px(box.bottom)},${px(box.top)}`,
      },
    },
    body,
  );
}

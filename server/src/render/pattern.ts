/**
 * The predicted detector pattern: the summed profile as a shaded line, each sublevel's share
 * as a thinner line (colour and dash both cycle), a numbered marker over every peak the beam
 * report counts, a peak table under the axis, and the resolvability verdict as a badge that
 * differs by shape as well as colour. Nothing is trimmed away: the window always holds every
 * counted peak, and the height axis turns logarithmic when peak heights differ by orders of
 * magnitude.
 */
import { scaleLinear, scaleLog } from 'd3-scale';
import { area, line } from 'd3-shape';
import { bottomAxis, leftAxis, type PlotBox } from './axes';
import { emptyDiagram, estimateTextWidth, svgDocument } from './frame';
import { truncateLabel } from './labelLayout';
import { LEGEND_ROW_HEIGHT, LEGEND_SAMPLE_WIDTH, legendColumn, type LegendEntry } from './legend';
import { markerPath } from './markers';
import { paletteFor, SERIES_DASHES, type Palette } from './palette';
import { needsLogAxis, patternWindow } from './patternWindow';
import { dataNum, el, px, shortHash, text, titleEl } from './svgText';
import type { Scale } from './axes';
import { engineeringUnit, formatIn, type DisplayUnit } from './units';
import type { PatternViewData, RenderTheme } from './viewData';

const WIDTH = 760;
const BASE_HEIGHT = 460;
const TABLE_ROW = 14;
/** Room between the position axis's title and the peak table (they touched at 12 units between baselines). */
const TABLE_GAP = 8;
const LEGEND_MAX_CHARS = 22;

/** Colour i mod 8 with a dash that shifts every 8 series, so the first 32 pairs are all distinct. */
export function seriesStyle(i: number, pal: Palette): { colour: string; dash?: string } {
  const n = pal.series.length;
  return { colour: pal.series[i % n], dash: SERIES_DASHES[(i + Math.floor(i / n)) % SERIES_DASHES.length] };
}

function peakOfSeries(xs: ArrayLike<number>, ys: ArrayLike<number>, from: number, to: number): { x: number; y: number } {
  let best = { x: NaN, y: -Infinity };
  const n = Math.min(xs.length, ys.length, to);
  for (let i = from; i < n; i++) if (Number.isFinite(xs[i]) && ys[i] > best.y) best = { x: xs[i], y: ys[i] };
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

// Positions closer to the axis than this are rounding noise of a symmetric pattern, printed as 0.
const ZERO_POSITION_M = 1e-12;

function positionLabel(v: number, unit: DisplayUnit): string {
  return formatIn(Math.abs(v) < ZERO_POSITION_M ? 0 : v, unit);
}

/** The height axis shows the share of all atoms per millimetre of detector, in per cent (data are per metre). */
export const PATTERN_Y_UNIT: DisplayUnit = { factor: 10, symbol: '% of atoms per mm' };

/** One peak's entry in the table: "1 at −2.1 mm" and the states that land in it. */
interface PeakEntry {
  head: string;
  members: string[];
}

/** An entry in one line: "1 at −2.1 mm (m_F=−1, m_F=0)". */
function entryText(e: PeakEntry): string {
  return e.members.length ? `${e.head} (${e.members.join(', ')})` : e.head;
}

/**
 * "Peaks: 1 at −2.1 mm (m_F=−1) · 2 at …" wrapped into rows that fit `maxWidth`. A peak of many
 * states breaks between its state names, so no row runs past the figure's edge.
 */
export function peakTableRows(entries: PeakEntry[], maxWidth: number): string[] {
  const rows: string[] = [];
  let cur = 'Peaks:';
  let fresh = true;
  for (const e of entries) {
    const names = e.members;
    // The pieces a row may break between: the head with the first name, each further name.
    const pieces = names.length === 0 ? [e.head] : names.map((n, k) => `${k === 0 ? `${e.head} (` : ''}${n}${k === names.length - 1 ? ')' : ''}`);
    pieces.forEach((piece, k) => {
      const sep = k > 0 ? ', ' : cur === 'Peaks:' ? ' ' : ' · ';
      const next = cur + sep + piece;
      if (estimateTextWidth(next) > maxWidth && !fresh) {
        rows.push(k > 0 ? `${cur},` : cur);
        cur = `    ${piece}`;
      } else cur = next;
      fresh = false;
    });
  }
  rows.push(cur);
  return rows;
}

export function renderPattern(d: PatternViewData, theme: RenderTheme): string {
  const pal = paletteFor(theme);
  const idBase = `sl-p${shortHash(`${d.title}|${d.parts.length}|${d.positionsM.length}`)}`;
  const xs = d.positionsM;
  const peaks = d.peaks.filter((p) => Number.isFinite(p.positionM) && Number.isFinite(p.height));
  const win = patternWindow(xs, d.total, peaks);
  if (!win) return emptyDiagram('pattern', idBase, d.title, 'No detector profile to draw.', pal);
  const { from, to } = win;
  let { x0, x1 } = win;
  let yMax = 0;
  for (let k = from; k < to; k++) if (Number.isFinite(d.total[k])) yMax = Math.max(yMax, d.total[k]);
  for (const p of peaks) yMax = Math.max(yMax, p.height);

  const unit = engineeringUnit(Math.max(Math.abs(x0), Math.abs(x1)), 'm');
  if (x0 === x1) {
    const pad = Math.abs(x0) * 0.1 || 1e-6;
    x0 -= pad;
    x1 += pad;
  }

  const legend: LegendEntry[] = [{ label: 'total', colour: pal.total, line: { width: 2.2 }, area: pal.totalFill }];
  d.parts.forEach((p, i) => {
    const s = seriesStyle(i, pal);
    legend.push({ label: truncateLabel(p.label, LEGEND_MAX_CHARS), colour: s.colour, line: { width: 1.4, dash: s.dash } });
  });
  if (peaks.length > 0) legend.push({ label: 'counted peak', colour: pal.text, marker: 'down' });
  const legendW = Math.min(200, Math.max(...legend.map((e) => estimateTextWidth(e.label))) + LEGEND_SAMPLE_WIDTH + 20);

  const entries: PeakEntry[] = peaks.map((p, i) => ({ head: `${i + 1} at ${positionLabel(p.positionM, unit)}`, members: p.members }));
  const tableRows = entries.length > 0 ? peakTableRows(entries, WIDTH - 32) : [];
  const height = BASE_HEIGHT + (tableRows.length > 0 ? TABLE_GAP + tableRows.length * TABLE_ROW : 0);
  const box: PlotBox = { left: 64, right: WIDTH - 16 - legendW, top: 78, bottom: BASE_HEIGHT - 56 };
  const x = scaleLinear().domain([x0, x1]).range([box.left, box.right]);

  // A log axis when the counted peaks differ by orders of magnitude; its floor sits well below the lowest peak.
  const logAxis = needsLogAxis(peaks);
  const minPeak = Math.min(...peaks.map((p) => p.height).filter((h) => h > 0));
  const floor = logAxis ? minPeak / 20 : 0;
  const y: Scale = logAxis
    ? scaleLog().domain([floor, yMax * 1.8]).range([box.bottom, box.top]).clamp(true)
    : scaleLinear().domain([0, yMax * 1.15 || 1]).range([box.bottom, box.top]).nice();
  const yv = (v: number): number => y(logAxis ? Math.max(v, floor) : v);
  const interactive = theme.kind === 'panel';

  const body: string[] = [verdictBadge(d.verdict.resolved, d.verdict.text, 16, 48, WIDTH - 32, pal)];
  body.push(bottomAxis(x, unit, 'position on detector', box, pal));
  body.push(leftAxis(y, PATTERN_Y_UNIT, logAxis ? 'atoms, log scale' : 'atoms', box, box.left, pal));
  const maxRows = Math.floor((box.bottom - box.top) / LEGEND_ROW_HEIGHT);
  body.push(legendColumn(legend, box.right + 16, box.top + 6, maxRows, pal));

  const idx = Array.from({ length: to - from }, (_, k) => from + k);
  const seriesPath = (ys: ArrayLike<number>): string =>
    line<number>()
      .defined((k) => k < ys.length && Number.isFinite(xs[k]) && Number.isFinite(ys[k]))
      .x((k) => x(xs[k]))
      .y((k) => yv(ys[k]))
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
    const peak = peakOfSeries(xs, ys, from, to);
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
    .y0(box.bottom)
    .y1((k) => yv(d.total[k]))
    .digits(2)(idx);
  const totalArea = fill ? [el('path', { class: 'sl-total-area', d: fill, fill: pal.totalFill, 'fill-opacity': 0.14, stroke: 'none' })] : [];
  body.push(dataGroup('sl-total', 'total', 'total', 'total', d.total, pal.total, 2.2, undefined, totalArea));
  body.push(el('g', { class: 'sl-parts' }, parts));

  // Every counted peak gets a marker and its number; its position is printed too where there is room (taller first).
  const order = peaks.map((_, i) => i).sort((a, b) => peaks[b].height - peaks[a].height || a - b);
  // Every number keeps its own span; a position is added where the longer label overlaps no other label.
  // Labels sit over their peaks, so two at heights more than a line apart (a tall narrow peak beside
  // broad low ones) never meet, however close they are across.
  const spans: [number, number][] = peaks.map((p, i) => {
    const half = estimateTextWidth(String(i + 1), 10) / 2 + 3;
    return [x(p.positionM) - half, x(p.positionM) + half];
  });
  const labelY = peaks.map((p) => Math.max(box.top + 14, yv(p.height) - 3)); // the marker's foot; its label sits above
  // Centred over the peak first; else reaching away from its neighbours (ending or starting at its
  // number, which stays over the marker), so two equal peaks side by side both keep their positions.
  const withPosition = new Map<number, { x: number; anchor: 'middle' | 'end' | 'start' }>();
  for (const i of order) {
    const cx = x(peaks[i].positionM);
    const half = estimateTextWidth(`${i + 1}: ${positionLabel(peaks[i].positionM, unit)}`, 10) / 2 + 3;
    const own = spans[i]!;
    const places = [
      { a: cx - half, b: cx + half, x: cx, anchor: 'middle' as const },
      { a: own[1] - 2 * half, b: own[1], x: own[1] - 3, anchor: 'end' as const },
      { a: own[0], b: own[0] + 2 * half, x: own[0] + 3, anchor: 'start' as const },
    ];
    const free = places.find((q, k) => (k === 0 || (q.a >= box.left && q.b <= box.right)) && spans.every(([a, b], j) => j === i || q.b < a || q.a > b || Math.abs(labelY[j]! - labelY[i]!) >= 14));
    if (free) {
      spans[i] = [free.a, free.b];
      withPosition.set(i, { x: free.x, anchor: free.anchor });
    }
  }
  // Numbers of close peaks climb in steps so that they never overlap.
  const numberRise: number[] = [];
  peaks.forEach((p, i) => {
    const cx = x(p.positionM);
    let rise = 0;
    for (let j = 0; j < i; j++) {
      if (Math.abs(x(peaks[j].positionM) - cx) < 16 && Math.abs(yv(peaks[j].height) - numberRise[j] - (yv(p.height) - rise)) < 12) rise = numberRise[j] + 12;
    }
    numberRise.push(rise);
  });
  body.push(
    el(
      'g',
      { class: 'sl-peaks' },
      peaks.map((p, i) => {
        const cx = x(p.positionM);
        const cy = labelY[i]!;
        const where = positionLabel(p.positionM, unit);
        const members = p.members.join(', ');
        const label = withPosition.has(i) ? `${i + 1}: ${where}` : `${i + 1}`;
        const fwhm = p.fwhmM && Number.isFinite(p.fwhmM) ? `, FWHM ${positionLabel(p.fwhmM, unit)}` : '';
        const children = [
          titleEl(`Peak ${i + 1} at ${where}${fwhm}, ${formatIn(p.height, PATTERN_Y_UNIT)}${members ? `; states: ${members}` : ''}`),
          el('path', { class: 'sl-peak-mark', d: markerPath('down', cx, cy - 5, 5), fill: pal.text, stroke: pal.halo, 'stroke-width': 1 }),
          el('text', { class: 'sl-peak-label', x: withPosition.get(i)?.x ?? cx, y: cy - 14 - numberRise[i], 'text-anchor': withPosition.get(i)?.anchor ?? 'middle', 'font-size': 10, fill: pal.text, stroke: pal.halo, 'stroke-width': 3, 'paint-order': 'stroke' }, text(label)),
        ];
        return el(
          'g',
          {
            class: 'sl-peak',
            'data-kind': 'peak',
            'data-number': String(i + 1),
            'data-label': `peak ${i + 1} at ${where}`,
            'data-position-m': dataNum(p.positionM),
            'data-height': dataNum(p.height),
            'data-fwhm-m': p.fwhmM && Number.isFinite(p.fwhmM) ? dataNum(p.fwhmM) : undefined,
            'data-members': members,
            tabindex: '0',
          },
          children,
        );
      }),
    ),
  );
  if (tableRows.length > 0) {
    body.push(
      el(
        'g',
        { class: 'sl-peak-table', 'font-size': 11 },
        tableRows.map((r, i) => el('text', { x: 16, y: BASE_HEIGHT - 6 + TABLE_GAP + i * TABLE_ROW, fill: pal.text }, text(r))),
      ),
    );
  }

  const desc = [
    `Detector profile across ${positionLabel(x0, unit)} to ${positionLabel(x1, unit)}`,
    `${d.parts.length} sublevel contributions`,
    `${peaks.length} ${peaks.length === 1 ? 'peak' : 'peaks'}${entries.length ? ` (${entries.map(entryText).join('; ')})` : ''}`,
    `height axis ${logAxis ? 'logarithmic' : 'linear'} in ${PATTERN_Y_UNIT.symbol}`,
    `${d.verdict.resolved ? 'resolved' : 'not resolved'}: ${d.verdict.text}`,
  ];
  return svgDocument(
    {
      view: 'pattern',
      idBase,
      width: WIDTH,
      height,
      title: d.title,
      desc: desc.join('; ') + '.',
      pal,
      rootData: {
        'data-x-name': 'z',
        'data-x-unit': unit.symbol,
        'data-x-factor': dataNum(unit.factor),
        'data-x-domain': `${dataNum(x0)},${dataNum(x1)}`,
        'data-x-range': `${px(box.left)},${px(box.right)}`,
        'data-y-scale': logAxis ? 'log' : 'linear',
        'data-y-domain': `${dataNum(y.domain()[0])},${dataNum(y.domain()[1])}`,
        'data-y-range': `${px(box.bottom)},${px(box.top)}`,
        'data-peak-count': String(peaks.length),
      },
    },
    body,
  );
}

/**
 * Sublevel energies against field. Curves are coloured by their trend at the working field
 * (energy rising with B: the state seeks low field; falling: it seeks high field), because
 * that is what decides which states a magnet focuses or a trap holds. State names sit in
 * lanes left and right of the plot, joined to the curve ends by short leaders.
 */
import { scaleLinear } from 'd3-scale';
import { line } from 'd3-shape';
import { BOHR_MAGNETON, BOHR_MAGNETON_HZ_PER_T } from '../physics/constants';
import { bottomAxis, leftAxis, type PlotBox } from './axes';
import { emptyDiagram, estimateTextWidth, svgDocument } from './frame';
import { placeLabels, truncateLabel, type LabelAnchor, type PlacedLabel } from './labelLayout';
import { legendRows, type LegendEntry } from './legend';
import { markerPath } from './markers';
import { FALLING_DASH, paletteFor, type Palette } from './palette';
import { arrayValues, finiteExtent, slopeAt, valueAt } from './sampled';
import { dataNum, el, px, shortHash, text, titleEl } from './svgText';
import { fieldDisplayUnit, formatIn, formatSI, frequencyUnit } from './units';
import type { LevelCurve, LevelsViewData, RenderTheme } from './viewData';

type Trend = 'rising' | 'falling' | 'flat';

// A slope below a thousandth of a Bohr magneton (in Hz/T) counts as field-insensitive (common practice for display).
const FLAT_SLOPE_HZ_PER_T = 1e-3 * BOHR_MAGNETON_HZ_PER_T;
const LABEL_SPACING = 13;
const LABEL_MAX_CHARS = 24;
const AXIS_X = 60;
const MIN_PLOT_WIDTH = 320;

function trendOf(slopeHzPerT: number): Trend {
  if (!Number.isFinite(slopeHzPerT) || Math.abs(slopeHzPerT) < FLAT_SLOPE_HZ_PER_T) return 'flat';
  return slopeHzPerT > 0 ? 'rising' : 'falling';
}

function trendStyle(t: Trend, pal: Palette): { colour: string; dash?: string } {
  if (t === 'rising') return { colour: pal.rising };
  if (t === 'falling') return { colour: pal.falling, dash: FALLING_DASH };
  return { colour: pal.flat, dash: '2 3' };
}

function stateName(c: LevelCurve): string {
  return c.lowLabel === c.highLabel ? c.lowLabel : `${c.lowLabel} → ${c.highLabel}`;
}

function laneWidth(labels: PlacedLabel[]): number {
  const widest = Math.max(0, ...labels.map((l) => estimateTextWidth(truncateLabel(l.text, LABEL_MAX_CHARS))));
  return Math.min(175, Math.max(48, widest + 20));
}

export function renderLevels(d: LevelsViewData, theme: RenderTheme): string {
  const pal = paletteFor(theme);
  const idBase = `sl-l${shortHash(`${d.title}|${d.curves.length}|${d.fieldsT.length}`)}`;
  const fields = d.fieldsT;
  const fieldExtent = finiteExtent(arrayValues(fields));
  const energyExtent = finiteExtent(d.curves.flatMap((c) => [...arrayValues(c.energyHz, fields.length)]));
  if (!fieldExtent || !energyExtent || d.curves.length === 0) {
    return emptyDiagram('levels', idBase, d.title, 'No sublevel energies to draw.', pal);
  }

  const fUnit = fieldDisplayUnit(d.fieldUnit);
  const eUnit = frequencyUnit(Math.max(Math.abs(energyExtent[0]), Math.abs(energyExtent[1])), d.energyUnitHz);
  let [f0, f1] = fieldExtent;
  if (f0 === f1) {
    const pad = Math.abs(f0) * 0.1 || 1e-4;
    f0 -= pad;
    f1 += pad;
  }
  let [e0, e1] = energyExtent;
  const ePad = (e1 - e0) * 0.04 || Math.max(Math.abs(e0) * 0.01, eUnit.factor);
  e0 -= ePad;
  e1 += ePad;

  const width0 = 760;
  const height = 480;
  const legendTop = 46;

  // Where the working field sits, and each curve's trend there (mid-sweep when no field is given).
  const marker = d.markerT !== undefined && Number.isFinite(d.markerT) && d.markerT >= f0 && d.markerT <= f1 ? d.markerT : undefined;
  const refField = marker ?? (fieldExtent[0] + fieldExtent[1]) / 2;
  const trends = d.curves.map((c) => trendOf(slopeAt(fields, c.energyHz, refField)));

  const legend: LegendEntry[] = [];
  const present = new Set(trends);
  if (present.has('rising')) legend.push({ label: 'low-field seeker (E rises with B)', colour: pal.rising, line: { width: 2 } });
  if (present.has('falling')) legend.push({ label: 'high-field seeker (E falls with B)', colour: pal.falling, line: { width: 2, dash: FALLING_DASH } });
  if (present.has('flat')) legend.push({ label: 'field-insensitive', colour: pal.flat, line: { width: 2, dash: '2 3' } });
  if (marker !== undefined) legend.push({ label: 'working field', colour: pal.marker, line: { width: 1.5, vertical: true } });
  const crossings = (d.crossings ?? []).filter((c) => Number.isFinite(c.fieldT) && Number.isFinite(c.energyHz) && c.fieldT >= f0 && c.fieldT <= f1);
  if (crossings.length > 0) legend.push({ label: 'crossing', colour: pal.text, marker: 'diamond' });
  const legendSvg = legendRows(legend, AXIS_X, legendTop, width0 - AXIS_X - 16, pal);

  const box: PlotBox = { left: 0, right: 0, top: legendTop + legendSvg.height + 18, bottom: height - 56 };
  const y = scaleLinear().domain([e0, e1]).range([box.bottom, box.top]).nice();

  const endAnchors = (side: 'low' | 'high'): LabelAnchor[] =>
    d.curves.map((c, index) => {
      const n = Math.min(fields.length, c.energyHz.length);
      let k = side === 'low' ? 0 : n - 1;
      const step = side === 'low' ? 1 : -1;
      while (k >= 0 && k < n && !(Number.isFinite(c.energyHz[k]) && Number.isFinite(fields[k]))) k += step;
      const ok = k >= 0 && k < n;
      return { index, y: ok ? y(c.energyHz[k]) : NaN, label: side === 'low' ? c.lowLabel : c.highLabel };
    });
  const lowAnchors = endAnchors('low');
  const highAnchors = endAnchors('high');
  const lowLabels = placeLabels(lowAnchors, box.top + 4, box.bottom - 2, LABEL_SPACING);
  const highLabels = placeLabels(highAnchors, box.top + 4, box.bottom - 2, LABEL_SPACING);
  const leftLane = laneWidth(lowLabels);
  const rightLane = laneWidth(highLabels);
  const width = Math.max(width0, AXIS_X + leftLane + MIN_PLOT_WIDTH + rightLane + 12);
  box.left = AXIS_X + leftLane;
  box.right = width - 12 - rightLane;
  const x = scaleLinear().domain([f0, f1]).range([box.left, box.right]);

  const body: string[] = [legendSvg.svg];
  body.push(bottomAxis(x, fUnit, 'B', box, pal));
  body.push(leftAxis(y, eUnit, 'E/h', box, AXIS_X, pal));

  // Curves.
  const interactive = theme.kind === 'panel';
  const curveSvg: string[] = [];
  d.curves.forEach((c, i) => {
    const n = Math.min(fields.length, c.energyHz.length);
    const idx = Array.from({ length: n }, (_, k) => k);
    const path = line<number>()
      .defined((k) => Number.isFinite(fields[k]) && Number.isFinite(c.energyHz[k]))
      .x((k) => x(fields[k]))
      .y((k) => y(c.energyHz[k]))
      .digits(2)(idx);
    if (!path) return;
    const style = trendStyle(trends[i], pal);
    const eRef = valueAt(fields, c.energyHz, refField);
    const muRef = c.momentJT ? valueAt(fields, c.momentJT, refField) : NaN;
    const name = stateName(c);
    const pathId = `${idBase}-c${i}`;
    const summary = [`${name}`, `E/h = ${formatSI(eRef, 'Hz')} at B = ${formatIn(refField, fUnit)}`];
    if (Number.isFinite(muRef)) summary.push(`μ = ${(muRef / BOHR_MAGNETON).toFixed(4)} μB`);
    const children = [titleEl(summary.join('; ')), el('path', { id: pathId, d: path })];
    // A wide invisible copy of the curve makes a thin line easy to point at in the panel.
    if (interactive) children.push(el('use', { href: `#${pathId}`, class: 'sl-hit', 'stroke-width': 10, 'stroke-opacity': 0, 'stroke-dasharray': 'none' }));
    curveSvg.push(
      el(
        'g',
        {
          class: `sl-curve sl-${trends[i]}`,
          'data-kind': 'curve',
          'data-id': c.id,
          'data-label': name,
          'data-low': c.lowLabel,
          'data-high': c.highLabel,
          'data-trend': trends[i],
          'data-field-t': dataNum(refField),
          'data-energy-hz': dataNum(eRef),
          'data-moment-jt': Number.isFinite(muRef) ? dataNum(muRef) : undefined,
          'data-moment-mub': Number.isFinite(muRef) ? dataNum(muRef / BOHR_MAGNETON) : undefined,
          fill: 'none',
          stroke: style.colour,
          'stroke-width': 1.8,
          'stroke-dasharray': style.dash,
          'stroke-linejoin': 'round',
        },
        children,
      ),
    );
  });
  body.push(el('g', { class: 'sl-curves' }, curveSvg));

  // End labels with leaders from each curve end.
  const labelGroup = (labels: PlacedLabel[], side: 'low' | 'high'): string =>
    el(
      'g',
      { class: `sl-end-labels sl-end-${side}`, 'font-size': 11 },
      labels.map((l) => {
        const edge = side === 'low' ? box.left : box.right;
        const dir = side === 'low' ? -1 : 1;
        const leader = l.members
          .map((m) => `M${px(edge)},${px(m.y)}h${px(dir * 4)}L${px(edge + dir * 10)},${px(l.y)}`)
          .join('');
        const names = l.members.map((m) => (side === 'low' ? d.curves[m.index].lowLabel : d.curves[m.index].highLabel));
        return el(
          'g',
          {
            class: 'sl-end-label',
            'data-kind': 'end-label',
            'data-side': side,
            'data-label': l.text,
            'data-members': l.members.map((m) => d.curves[m.index].id).join(' '),
          },
          [
            titleEl(`${side === 'low' ? 'Low-field' : 'High-field'} name: ${names.join(', ')}`),
            el('path', { class: 'sl-leader', d: leader, fill: 'none', stroke: pal.muted, 'stroke-width': 0.8 }),
            el(
              'text',
              {
                x: edge + dir * 12,
                y: l.y + 4,
                'text-anchor': side === 'low' ? 'end' : 'start',
                fill: pal.text,
                stroke: pal.halo,
                'stroke-width': 3,
                'stroke-linejoin': 'round',
                'paint-order': 'stroke',
              },
              text(truncateLabel(l.text, LABEL_MAX_CHARS)),
            ),
          ],
        );
      }),
    );
  body.push(labelGroup(lowLabels, 'low'), labelGroup(highLabels, 'high'));

  // Crossings.
  if (crossings.length > 0) {
    body.push(
      el(
        'g',
        { class: 'sl-crossings' },
        crossings.map((c) =>
          el(
            'g',
            {
              class: 'sl-crossing',
              'data-kind': 'crossing',
              'data-label': `${c.a} × ${c.b}`,
              'data-a': c.a,
              'data-b': c.b,
              'data-field-t': dataNum(c.fieldT),
              'data-energy-hz': dataNum(c.energyHz),
            },
            [
              titleEl(`Crossing of ${c.a} and ${c.b} at B = ${formatIn(c.fieldT, fUnit)}, E/h = ${formatSI(c.energyHz, 'Hz')}`),
              el('path', { d: markerPath('diamond', x(c.fieldT), y(c.energyHz), 4.5), fill: pal.halo, stroke: pal.text, 'stroke-width': 1.3 }),
            ],
          ),
        ),
      ),
    );
  }

  // Working field: a rule across the plot, its label above, and a dot on every curve.
  if (marker !== undefined) {
    const mx = x(marker);
    const label = d.markerLabel ? `${d.markerLabel} · ${formatIn(marker, fUnit)}` : `B = ${formatIn(marker, fUnit)}`;
    const half = estimateTextWidth(label) / 2;
    const tx = Math.min(box.right - half, Math.max(box.left + half, mx));
    const dots = d.curves.map((c, i) => {
      const e = valueAt(fields, c.energyHz, marker);
      if (!Number.isFinite(e)) return '';
      const mu = c.momentJT ? valueAt(fields, c.momentJT, marker) : NaN;
      const name = stateName(c);
      const lines = [name, `E/h = ${formatSI(e, 'Hz')} at B = ${formatIn(marker, fUnit)}`];
      if (Number.isFinite(mu)) lines.push(`μ = ${(mu / BOHR_MAGNETON).toFixed(4)} μB`);
      return el(
        'g',
        {
          class: 'sl-state',
          'data-kind': 'state',
          'data-id': c.id,
          'data-label': name,
          'data-field-t': dataNum(marker),
          'data-energy-hz': dataNum(e),
          'data-moment-jt': Number.isFinite(mu) ? dataNum(mu) : undefined,
          'data-moment-mub': Number.isFinite(mu) ? dataNum(mu / BOHR_MAGNETON) : undefined,
          tabindex: '0',
        },
        [
          titleEl(lines.join('; ')),
          el('path', { d: markerPath('circle', mx, y(e), 3.2), fill: trendStyle(trends[i], pal).colour, stroke: pal.halo, 'stroke-width': 1 }),
        ],
      );
    });
    body.push(
      el(
        'g',
        { class: 'sl-marker', 'data-kind': 'marker', 'data-label': label, 'data-field-t': dataNum(marker) },
        [
          titleEl(`Working field ${formatIn(marker, fUnit)}${d.markerLabel ? ` (${d.markerLabel})` : ''}`),
          el('path', { class: 'sl-marker-rule', d: `M${px(mx)},${px(box.top - 4)}V${px(box.bottom)}`, stroke: pal.marker, 'stroke-width': 1.5, fill: 'none' }),
          el('text', { x: tx, y: box.top - 8, 'text-anchor': 'middle', 'font-size': 11, fill: pal.marker }, text(label)),
        ],
      ),
      el('g', { class: 'sl-states' }, dots),
    );
  }

  const descParts = [
    `Sublevel energies E/h from ${formatSI(energyExtent[0], 'Hz')} to ${formatSI(energyExtent[1], 'Hz')}`,
    `against field B from ${formatIn(fieldExtent[0], fUnit)} to ${formatIn(fieldExtent[1], fUnit)}`,
    `${d.curves.length} states`,
  ];
  if (marker !== undefined) descParts.push(`working field ${formatIn(marker, fUnit)}`);
  else if (d.markerT !== undefined) descParts.push(`working field ${formatIn(d.markerT, fUnit)} lies outside the sweep`);

  return svgDocument(
    {
      view: 'levels',
      idBase,
      width,
      height,
      title: d.title,
      desc: descParts.join('; ') + '.',
      pal,
      rootData: {
        'data-x-name': 'B',
        'data-x-unit': fUnit.symbol,
        'data-x-factor': dataNum(fUnit.factor),
        'data-x-domain': `${dataNum(f0)},${dataNum(f1)}`,
        'data-x-range': `${px(box.left)},${px(box.right)}`,
        'data-y-domain': `${dataNum(y.domain()[0])},${dataNum(y.domain()[1])}`,
        'data-y-range': `${px(box.bottom)},${px(box.top)}`,
      },
    },
    body,
  );
}

/**
 * Sublevel energies against field. Each stretch of a curve is styled by its own local slope
 * (energy rising with B: the state seeks low field there; falling: it seeks high field), because
 * that decides which states a magnet focuses or a trap holds at that field, and a state can turn
 * over along the axis. Every named field of the file is a labelled rule. Every state is named
 * at both ends, in lanes left and right of the plot joined to the curve ends by short leaders;
 * the figure grows taller for distinct ends, and a crowded lane names coinciding ends once
 * (placeLabels). Energies far from zero count from an offset (offsetAxis.ts). Manifolds far apart
 * compared with their fans (a magnetometer's µT) get stacked bands, each on its own offset axis
 * (worked out by the view with levelBands.ts; drawn with levelBandAxis.ts), so the fans are not
 * flat lines on a GHz axis. The right lane names the strong-field basis only when the range ends
 * past the change of regime (x ≥ 1) or in the strong field, and each lane's header says which
 * basis it names (levelLanes.ts).
 */
import { scaleLinear } from 'd3-scale';
import { line } from 'd3-shape';
import { BOHR_MAGNETON } from '../physics/constants';
import { bottomAxis, leftAxis, type PlotBox, type Scale } from './axes';
import { bandAxes, bandNote, placeBands, type PlacedBand } from './levelBandAxis';
import { emptyDiagram, estimateTextWidth, svgDocument, wrapNote } from './frame';
import { laneHeadText, laneHeadWhy, rightNamesHigh } from './levelLanes';
import { laneHeightFor, placeLabels, truncateLabel, type LabelAnchor, type PlacedLabel } from './labelLayout';
import { fieldMarksIn, layoutMarkRows, markLabelAt, markRulePath, MARK_ROW } from './fieldMarks';
import { axisOffset } from './offsetAxis';
import { legendRows, type LegendEntry } from './legend';
import { markerPath } from './markers';
import { FALLING_DASH, paletteFor, type Palette } from './palette';
import { arrayValues, finiteExtent, slopeAt, valueAt } from './sampled';
import { slopeRuns, trendOf, type Trend } from './slopeRuns';
import { endAnchoredDashOffsets } from './dashPhase';
import { dataNum, el, px, shortHash, text, titleEl } from './svgText';
import { fieldDisplayUnit, fieldOnAxisText, figureMinus, formatIn, formatSI, frequencyUnit } from './units';
import type { LevelCrossing, LevelCurve, LevelsViewData, RenderTheme } from './viewData';

const LABEL_SPACING = 13;
/** Long enough for a whole term's high-field label |m_L, m_S, m_I⟩ with fractions (26 characters). */
const LABEL_MAX_CHARS = 28;
const AXIS_X = 60;
const MIN_PLOT_WIDTH = 320;
const NOTE_LINE = 15;

function trendStyle(t: Trend, pal: Palette): { colour: string; dash?: string } {
  if (t === 'rising') return { colour: pal.rising };
  if (t === 'falling') return { colour: pal.falling, dash: FALLING_DASH };
  return { colour: pal.flat, dash: '2 3' };
}

function stateName(c: LevelCurve): string {
  return c.lowLabel === c.highLabel ? c.lowLabel : `${c.lowLabel} → ${c.highLabel}`;
}

/** Wide enough for the lane's labels and its header (which may reach 4 px past the lane's outer end). */
function laneWidth(labels: PlacedLabel[], head: string | undefined): number {
  const widest = Math.max(0, ...labels.map((l) => estimateTextWidth(truncateLabel(l.text, LABEL_MAX_CHARS))));
  const headWidth = head !== undefined ? estimateTextWidth(head) + 16 : 0;
  return Math.min(181, Math.max(48, widest + 26, headWidth));
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
  const legendTop = 46;

  // Where the working field sits, and each curve's trend there (mid-sweep when no field is given) for dots and read-outs.
  const inSweep = (b: number | undefined): b is number => b !== undefined && Number.isFinite(b) && b >= f0 && b <= f1;
  const marker = inSweep(d.markerT) ? d.markerT : undefined;
  const refField = marker ?? (fieldExtent[0] + fieldExtent[1]) / 2;
  const trends = d.curves.map((c) => trendOf(slopeAt(fields, c.energyHz, refField)));
  const runs = d.curves.map((c) => slopeRuns(fields, c.energyHz));

  // Every named field inside the sweep, the chosen one first; labels stack in rows above the plot.
  const marks = fieldMarksIn(d.fieldUnit, inSweep, d.markerT, d.markerLabel, d.fieldMarks, d.markerText);

  const legend: LegendEntry[] = [];
  const present = new Set(runs.flatMap((r) => r.map((x) => x.trend)));
  if (present.has('rising')) legend.push({ label: 'low-field seeker (E rises with B)', colour: pal.rising, line: { width: 2 } });
  if (present.has('falling')) legend.push({ label: 'high-field seeker (E falls with B)', colour: pal.falling, line: { width: 2, dash: FALLING_DASH } });
  if (present.has('flat')) legend.push({ label: 'field-insensitive', colour: pal.flat, line: { width: 2, dash: '2 3' } });
  if (marker !== undefined) legend.push({ label: 'chosen field', colour: pal.marker, line: { width: 1.5, vertical: true } });
  if (marks.some((m) => !m.chosen)) legend.push({ label: 'other named field', colour: pal.muted, line: { width: 1, dash: '4 3', vertical: true } });
  const crossings = (d.crossings ?? []).filter((c) => Number.isFinite(c.fieldT) && Number.isFinite(c.energyHz) && c.fieldT >= f0 && c.fieldT <= f1);
  if (crossings.length > 0) legend.push({ label: 'crossing', colour: pal.text, marker: 'diamond' });
  const legendSvg = legendRows(legend, AXIS_X, legendTop, width0 - AXIS_X - 16, pal);

  // Rows are first laid out on a narrower stand-in axis (the lanes are not sized yet), which never needs fewer rows.
  const narrow = scaleLinear().domain([f0, f1]).range([AXIS_X + 180, width0 - 180]);
  const markRows = layoutMarkRows(marks, AXIS_X + 180, width0 - 180, narrow);
  const rowCount = Math.max(1, ...markRows.map((r) => r + 1));
  const top = legendTop + legendSvg.height + 6 + rowCount * MARK_ROW;
  // Manifolds far apart compared with their fans get bands of their own (a broken axis, from the view), unless the caller fixed the unit.
  const bandList = d.energyUnitHz === undefined ? (d.bands ?? []) : [];
  const bands = bandList.length >= 2 ? placeBands(bandList, top, 480 - 56 - top, LABEL_SPACING).placed : undefined;
  // Tall enough that every state could have its own name in each lane.
  const plotHeight = bands ? bands[bands.length - 1]!.bottom - top : Math.max(480 - 56 - top, laneHeightFor(d.curves.length, LABEL_SPACING) + 8);
  const box: PlotBox = { left: 0, right: 0, top, bottom: top + plotHeight };
  const y = scaleLinear().domain([e0, e1]).range([box.bottom, box.top]).nice();
  // Each curve's energy scale: its band's, or the one axis.
  const bandOf: (PlacedBand | undefined)[] = d.curves.map((_, i) => bands?.find((b) => b.band.curves.includes(i)));
  const yOf = (i: number): Scale => bandOf[i]?.y ?? y;

  const rightHigh = rightNamesHigh(d.lanes);
  const rightName = (c: LevelCurve): string => (rightHigh ? c.highLabel : c.lowLabel);
  const endAnchors = (side: 'low' | 'high'): LabelAnchor[] =>
    d.curves.map((c, index) => {
      const n = Math.min(fields.length, c.energyHz.length);
      let k = side === 'low' ? 0 : n - 1;
      const step = side === 'low' ? 1 : -1;
      while (k >= 0 && k < n && !(Number.isFinite(c.energyHz[k]) && Number.isFinite(fields[k]))) k += step;
      const ok = k >= 0 && k < n;
      // Coincident ends fan out in the order their curves take a little way in, so leaders do not cross.
      const along = Math.min(n - 1, Math.max(0, k + step * Math.max(1, Math.round(n / 25))));
      const yc = yOf(index);
      return { index, y: ok ? yc(c.energyHz[k]) : NaN, tie: yc(c.energyHz[along]), label: side === 'low' ? c.lowLabel : rightName(c) };
    });
  // On a broken axis each band's names stay in its own stretch of the lane.
  const lane = (anchors: LabelAnchor[]): PlacedLabel[] =>
    bands
      ? bands.flatMap((b) => placeLabels(anchors.filter((a) => bandOf[a.index] === b), b.top + 4, b.bottom - 2, LABEL_SPACING, LABEL_MAX_CHARS))
      : placeLabels(anchors, box.top + 4, box.bottom - 2, LABEL_SPACING, LABEL_MAX_CHARS);
  const lowLabels = lane(endAnchors('low'));
  const highLabels = lane(endAnchors('high'));
  const heads = d.lanes ? { low: laneHeadText(d.lanes, 'low'), high: laneHeadText(d.lanes, 'high') } : undefined;
  const leftLane = laneWidth(lowLabels, heads?.low);
  const rightLane = laneWidth(highLabels, heads?.high);
  const width = Math.max(width0, AXIS_X + leftLane + MIN_PLOT_WIDTH + rightLane + 12);
  box.left = AXIS_X + leftLane;
  box.right = width - 12 - rightLane;
  const x = scaleLinear().domain([f0, f1]).range([box.left, box.right]);
  // A broken axis says so, and how far apart its bands are, in a note under the field axis.
  const note = bands ? bandNote(bands, d.curves.map((c) => c.energyHz), fieldOnAxisText(fields[0] ?? f0, fUnit)) : undefined;
  const noteLines = note !== undefined ? wrapNote(note, width - 32) : [];
  const height = top + plotHeight + 56 + noteLines.length * NOTE_LINE;
  const rows = layoutMarkRows(marks, box.left, box.right, x).map((r) => Math.min(r, rowCount - 1));

  const body: string[] = [legendSvg.svg];
  body.push(bottomAxis(x, fUnit, 'B', box, pal));
  if (bands) {
    body.push(bandAxes(bands, box, AXIS_X, pal));
    const noteSpans = noteLines.map((l, k) => el('tspan', { x: 16, dy: k === 0 ? undefined : NOTE_LINE }, text(l)));
    body.push(el('text', { class: 'sl-band-note', x: 16, y: box.bottom + 58, 'font-size': 11, fill: pal.muted }, noteSpans));
  } else {
    // Ticks count from a round offset when absolute energies would need long labels (a whole term in THz).
    const [yLo, yHi] = y.domain() as [number, number];
    const eAxis = d.energyUnitHz !== undefined ? { offset: 0, unit: eUnit, name: 'E/h' } : axisOffset(yLo, yHi, Math.max(2, Math.round(plotHeight / 55)), 'E/h', 'Hz');
    const yShown = eAxis.offset === 0 ? y : y.copy().domain([yLo - eAxis.offset, yHi - eAxis.offset]);
    body.push(leftAxis(yShown, eAxis.unit, eAxis.name, box, AXIS_X, pal));
  }

  // Curves.
  const interactive = theme.kind === 'panel';
  const curveSvg: string[] = [];
  d.curves.forEach((c, i) => {
    const drawn = runs[i].map((r) => {
      const idx = Array.from({ length: r.to - r.from + 1 }, (_, k) => r.from + k);
      const path = line<number>().x((k) => x(fields[k])).y((k) => yOf(i)(c.energyHz[k])).digits(2)(idx) ?? '';
      const style = trendStyle(r.trend, pal);
      const points = idx.map((k) => [x(fields[k]), yOf(i)(c.energyHz[k])] as const);
      return { r, path, style, points };
    }).filter((g) => g.path);
    if (drawn.length === 0) return;
    const offsets = endAnchoredDashOffsets(drawn.map((g) => ({ points: g.points, dash: g.style.dash })));
    const segments = drawn.map((g, k) => ({ ...g, dashOffset: offsets[k] }));
    const eRef = valueAt(fields, c.energyHz, refField);
    const muRef = c.momentJT ? valueAt(fields, c.momentJT, refField) : NaN;
    const name = stateName(c);
    const pathId = `${idBase}-c${i}`;
    const summary = [`${name}`, `E/h = ${formatSI(eRef, 'Hz')} at B = ${formatIn(refField, fUnit)}`];
    if (Number.isFinite(muRef)) summary.push(`μ = ${(muRef / BOHR_MAGNETON).toFixed(4)} μB`);
    const kinds = segments.map((g) => `${g.r.trend} ${formatIn(fields[g.r.from], fUnit)}–${formatIn(fields[g.r.to], fUnit)}`);
    if (segments.length > 1) summary.push(`changes kind: ${kinds.join(', ')}`);
    const children = [titleEl(summary.join('; '))];
    segments.forEach((g, k) => {
      children.push(
        el('path', {
          id: k === 0 ? pathId : undefined,
          class: `sl-seg sl-${g.r.trend}`,
          'data-trend': g.r.trend,
          'data-from-t': dataNum(fields[g.r.from]),
          'data-to-t': dataNum(fields[g.r.to]),
          d: g.path,
          stroke: g.style.colour,
          'stroke-dasharray': g.style.dash,
          'stroke-dashoffset': g.dashOffset ? dataNum(g.dashOffset) : undefined,
        }),
      );
    });
    // A wide invisible copy of the whole curve makes a thin line easy to point at in the panel.
    if (interactive) {
      const whole = segments.map((g) => g.path).join('');
      children.push(el('path', { class: 'sl-hit', d: whole, stroke: 'transparent', 'stroke-width': 10, 'stroke-opacity': 0, 'stroke-dasharray': 'none' }));
    }
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
          'data-trends': [...new Set(segments.map((g) => g.r.trend))].join(' '),
          'data-field-t': dataNum(refField),
          'data-energy-hz': dataNum(eRef),
          'data-moment-jt': Number.isFinite(muRef) ? dataNum(muRef) : undefined,
          'data-moment-mub': Number.isFinite(muRef) ? dataNum(muRef / BOHR_MAGNETON) : undefined,
          fill: 'none',
          'stroke-width': 1.8,
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
        const names = l.members.map((m) => (side === 'low' ? d.curves[m.index].lowLabel : rightName(d.curves[m.index])));
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
            titleEl(`${side === 'low' || !rightHigh ? 'Low-field' : 'High-field'} name: ${names.join(', ')}`),
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
  // Each lane's header says which basis its names belong to (the right one changes with the range).
  if (d.lanes && heads) {
    const lanes = d.lanes;
    const head = (side: 'low' | 'high'): string =>
      el('g', { class: 'sl-lane-head', 'data-side': side }, [
        titleEl(laneHeadWhy(lanes, side, fUnit)),
        el('text', { x: side === 'low' ? box.left - 12 : box.right + 12, y: box.top - 8, 'text-anchor': side === 'low' ? 'end' : 'start', 'font-size': 11, fill: pal.muted }, text(heads[side])),
      ]);
    body.push(el('g', { class: 'sl-lane-heads', 'data-ends': lanes.ends }, [head('low'), head('high')]));
  }

  // Crossings: on the scale of their states' band (manifolds that meet share a band).
  const crossingY = (c: LevelCrossing): number => yOf(c.curveA)(c.energyHz);
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
              el('path', { d: markerPath('diamond', x(c.fieldT), crossingY(c), 4.5), fill: pal.halo, stroke: pal.text, 'stroke-width': 1.3 }),
            ],
          ),
        ),
      ),
    );
  }

  // Working field: a rule across the plot, its label above, and a dot on every curve.
  body.push(
    el(
      'g',
      { class: 'sl-field-marks' },
      marks.map((m, i) => {
        const { tx, ty } = markLabelAt(m, rows[i]!, box.left, box.right, x, box.top);
        const colour = m.chosen ? pal.marker : pal.muted;
        return el(
          'g',
          { class: m.chosen ? 'sl-marker' : 'sl-field-mark', 'data-kind': 'marker', 'data-label': m.text, 'data-field-t': dataNum(m.fieldT), 'data-chosen': String(m.chosen) },
          [
            titleEl(`${m.chosen ? 'Chosen field' : 'Named field'} ${formatIn(m.fieldT, fUnit)}${m.label ? ` (${m.label})` : ''}`),
            el('path', {
              class: 'sl-marker-rule',
              d: markRulePath(i, marks, rows, box.left, box.right, x, box.top, box.bottom),
              stroke: colour,
              'stroke-width': m.chosen ? 1.5 : 1,
              'stroke-dasharray': m.chosen ? undefined : '4 3',
              fill: 'none',
            }),
            el('text', { x: tx, y: ty, 'text-anchor': 'middle', 'font-size': 11, fill: colour, stroke: pal.halo, 'stroke-width': 3, 'paint-order': 'stroke' }, text(m.text)),
          ],
        );
      }),
    ),
  );
  if (marker !== undefined) {
    const mx = x(marker);
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
          el('path', { d: markerPath('circle', mx, yOf(i)(e), 3.2), fill: trendStyle(trends[i], pal).colour, stroke: pal.halo, 'stroke-width': 1 }),
        ],
      );
    });
    body.push(el('g', { class: 'sl-states' }, dots));
  }

  const descParts = [
    `Sublevel energies E/h from ${formatSI(energyExtent[0], 'Hz')} to ${formatSI(energyExtent[1], 'Hz')}`,
    `against field B from ${formatIn(fieldExtent[0], fUnit)} to ${formatIn(fieldExtent[1], fUnit)}`,
    `${d.curves.length} states`,
  ];
  const chosenText = d.markerText !== undefined ? figureMinus(d.markerText) : d.markerT !== undefined ? formatIn(d.markerT, fUnit) : '';
  if (marker !== undefined) descParts.push(`chosen field ${chosenText}`);
  else if (d.markerT !== undefined) descParts.push(`chosen field ${chosenText} lies outside the sweep`);
  if (marks.length > 0) descParts.push(`named fields marked: ${marks.map((m) => m.text).join(', ')}`);
  const outside = (d.fieldMarks ?? []).filter((m) => !inSweep(m.fieldT));
  if (outside.length > 0) descParts.push(`outside the sweep: ${outside.map((m) => `${m.label} ${m.valueText !== undefined ? figureMinus(m.valueText) : formatIn(m.fieldT, fUnit)}`).join(', ')}`);
  if (note !== undefined) descParts.push(note.replace(/\.$/, ''));
  if (d.lanes) descParts.push(`states named on the left by ${laneHeadText(d.lanes, 'low')}, on the right by ${laneHeadText(d.lanes, 'high')}`);

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
        // A broken axis has no one energy scale: each band group carries its own.
        ...(bands ? { 'data-y-bands': String(bands.length) } : { 'data-y-domain': `${dataNum(y.domain()[0])},${dataNum(y.domain()[1])}` }),
        'data-y-range': `${px(box.bottom)},${px(box.top)}`,
      },
    },
    body,
  );
}


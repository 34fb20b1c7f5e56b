/**
 * One RF/microwave transition against field, as a clock or resonance experiment tunes it: the
 * frequency (as an offset from a reference, because the field changes it by parts per million)
 * over df/dB, on one field axis. Field-insensitive points, fields where the file's frequency is
 * resonant, and the file's named fields are marked and labelled.
 */
import { scaleLinear } from 'd3-scale';
import { line } from 'd3-shape';
import { bottomAxis, leftAxis, type PlotBox } from './axes';
import { fieldMarksIn, layoutMarkRows, markLabelAt, markRulePath, MARK_ROW } from './fieldMarks';
import { emptyDiagram, svgDocument } from './frame';
import { legendUnderTitle, type LegendEntry } from './legend';
import { markerPath } from './markers';
import { paletteFor } from './palette';
import { finiteExtent, valueAt } from './sampled';
import { dataNum, el, px, shortHash, text, titleEl } from './svgText';
import { engineeringUnit, fieldDisplayUnit, formatIn, formatSI } from './units';
import type { RenderTheme, ResonanceViewData } from './viewData';

/** 1 G = 1e-4 T: a slope in Hz/T times this is in Hz/G. */
const HZ_PER_T_TO_PER_G = 1e-4;

const WIDTH = 760;
const LEFT = 84;
const RIGHT = WIDTH - 20;

export function renderResonance(d: ResonanceViewData, theme: RenderTheme): string {
  const pal = paletteFor(theme);
  const idBase = `sl-r${shortHash(`${d.title}|${d.fieldsT.length}`)}`;
  const fx = finiteExtent(Array.from(d.fieldsT));
  const ff = finiteExtent(Array.from(d.frequencyHz));
  const fs = finiteExtent(Array.from(d.slopeHzPerT));
  if (!fx || !ff || !fs || fx[0] === fx[1]) return emptyDiagram('resonance', idBase, d.title, 'No transition frequencies to draw.', pal);

  const fUnit = fieldDisplayUnit(d.fieldUnit);
  const inRange = (b: number | undefined): b is number => b !== undefined && Number.isFinite(b) && b >= fx[0] && b <= fx[1];
  // The frequency axis is an offset from a round reference: the first field-insensitive point, else the start of the range.
  const raw = d.insensitive.find((p) => inRange(p.fieldT))?.frequencyHz ?? d.frequencyHz[0];
  const ref = roundReference(raw, ff[1] - ff[0]);
  const offsets = Array.from(d.frequencyHz, (f) => f - ref.hz);
  const oExt = finiteExtent(offsets)!;
  const oUnit = engineeringUnit(Math.max(Math.abs(oExt[0]), Math.abs(oExt[1])), 'Hz');
  // df/dB per gauss, as every report writes it (sensitivityText): the figure and the numbers agree.
  const perGauss = engineeringUnit(Math.max(Math.abs(fs[0]), Math.abs(fs[1])) * HZ_PER_T_TO_PER_G, 'Hz/G');
  const sUnit = { factor: perGauss.factor / HZ_PER_T_TO_PER_G, symbol: perGauss.symbol };

  const legend: LegendEntry[] = [{ label: d.pairLabel, colour: pal.series[0], line: { width: 2 } }];
  if (d.insensitive.some((p) => inRange(p.fieldT))) legend.push({ label: 'df/dB = 0', colour: pal.text, marker: 'diamond' });
  if (d.resonances.some((p) => inRange(p.fieldT))) legend.push({ label: 'resonant with the file’s frequency', colour: pal.series[1], marker: 'circle' });
  const legendSvg = legendUnderTitle(legend, LEFT, RIGHT, 6, pal);

  const marks = fieldMarksIn(d.fieldUnit, inRange, undefined, undefined, [
    ...d.insensitive.map((p) => ({ fieldT: p.fieldT, label: 'df/dB = 0' })),
    ...d.resonances.map((p) => ({ fieldT: p.fieldT, label: exactHz(p.frequencyHz) })),
    ...d.fieldMarks,
  ]);
  const x = scaleLinear().domain(fx).range([LEFT, RIGHT]);
  const rows = layoutMarkRows(marks, LEFT, RIGHT, x);
  const rowCount = Math.max(1, ...rows.map((r) => r + 1));
  // The file asks where its frequency is resonant and the range holds no such field: the figure says so, as the report does, in a row of its own.
  const unreached = d.soughtHz !== undefined && !d.resonances.some((p) => inRange(p.fieldT))
    ? `not resonant with ${exactHz(Math.abs(d.soughtHz))} anywhere from ${formatIn(fx[0], fUnit)} to ${formatIn(fx[1], fUnit)}`
    : undefined;
  const top = legendSvg.below + (rowCount + (unreached ? 1 : 0)) * MARK_ROW;
  const upper: PlotBox = { left: LEFT, right: RIGHT, top, bottom: top + 200 };
  const lower: PlotBox = { left: LEFT, right: RIGHT, top: upper.bottom + 22, bottom: upper.bottom + 22 + 120 };
  const height = lower.bottom + 56;
  const pad = (a: number, b: number): [number, number] => (a === b ? [a - (Math.abs(a) || 1) * 0.1, b + (Math.abs(b) || 1) * 0.1] : [a - (b - a) * 0.06, b + (b - a) * 0.06]);
  const yf = scaleLinear().domain(pad(oExt[0], oExt[1])).range([upper.bottom, upper.top]).nice();
  const ys = scaleLinear().domain(pad(Math.min(fs[0], 0), Math.max(fs[1], 0))).range([lower.bottom, lower.top]).nice();

  const body: string[] = [legendSvg.svg];
  body.push(bottomAxis(x, fUnit, '', upper, pal));
  // A transition that starts at zero frequency (Δm = ±1 within one F) needs no offset: "f", not "f − 0 Hz".
  body.push(leftAxis(yf, oUnit, ref.hz === 0 ? 'f' : `f − ${ref.text}`, upper, LEFT, pal));
  body.push(bottomAxis(x, fUnit, 'B', lower, pal));
  body.push(leftAxis(ys, sUnit, 'df/dB', lower, LEFT, pal));
  body.push(el('path', { class: 'sl-zero', d: `M${px(LEFT)},${px(ys(0))}H${px(RIGHT)}`, stroke: pal.muted, 'stroke-dasharray': '2 4', fill: 'none' }));

  const idx = Array.from({ length: d.fieldsT.length }, (_, k) => k);
  const curve = (ys0: ArrayLike<number>, y: (v: number) => number): string =>
    line<number>().defined((k) => Number.isFinite(d.fieldsT[k]) && Number.isFinite(ys0[k])).x((k) => x(d.fieldsT[k])).y((k) => y(ys0[k])).digits(2)(idx) ?? '';
  body.push(
    el('g', { class: 'sl-curve', 'data-kind': 'curve', 'data-label': d.pairLabel, fill: 'none', stroke: pal.series[0], 'stroke-width': 2 }, [
      titleEl(`${d.pairLabel}: f from ${formatSI(ff[0], 'Hz')} to ${formatSI(ff[1], 'Hz')}`),
      el('path', { d: curve(offsets, yf) }),
      el('path', { d: curve(d.slopeHzPerT, ys) }),
    ]),
  );

  // Rules for every mark through both plots, labels in rows above.
  body.push(
    el(
      'g',
      { class: 'sl-field-marks' },
      marks.map((m, i) => {
        const { tx, ty } = markLabelAt(m, rows[i]!, LEFT, RIGHT, x, upper.top);
        return el('g', { class: 'sl-field-mark', 'data-kind': 'marker', 'data-label': m.text, 'data-field-t': dataNum(m.fieldT) }, [
          titleEl(`${m.label} at B = ${formatIn(m.fieldT, fUnit)}`),
          el('path', { class: 'sl-marker-rule', d: markRulePath(i, marks, rows, LEFT, RIGHT, x, upper.top, lower.bottom), stroke: pal.muted, 'stroke-dasharray': '4 3', fill: 'none' }),
          el('text', { x: tx, y: ty, 'text-anchor': 'middle', 'font-size': 11, fill: pal.text, stroke: pal.halo, 'stroke-width': 3, 'paint-order': 'stroke' }, text(m.text)),
        ]);
      }),
    ),
  );
  const point = (kind: string, fieldT: number, f: number, shape: 'diamond' | 'circle', colour: string, what: string): string => {
    const slope = valueAt(d.fieldsT, d.slopeHzPerT, fieldT);
    return el('g', { class: `sl-${kind}`, 'data-kind': kind, 'data-field-t': dataNum(fieldT), 'data-frequency-hz': dataNum(f), tabindex: '0' }, [
      titleEl(`${what} at B = ${formatIn(fieldT, fUnit)}: f = ${formatSI(f, 'Hz')}${Number.isFinite(slope) ? `, df/dB = ${formatSI(slope * HZ_PER_T_TO_PER_G, 'Hz/G')}` : ''}`),
      el('path', { d: markerPath(shape, x(fieldT), yf(f - ref.hz), 5), fill: colour, stroke: pal.halo, 'stroke-width': 1 }),
    ]);
  };
  body.push(
    el('g', { class: 'sl-points' }, [
      ...d.insensitive.filter((p) => inRange(p.fieldT)).map((p) => point('insensitive', p.fieldT, p.frequencyHz, 'diamond', pal.text, 'Field-insensitive point')),
      ...d.resonances.filter((p) => inRange(p.fieldT)).map((p) => point('resonance', p.fieldT, p.frequencyHz, 'circle', pal.series[1], 'Resonant')),
    ]),
  );

  if (unreached) body.push(el('text', { class: 'sl-note sl-unreached', x: RIGHT, y: legendSvg.below + MARK_ROW - 8, 'text-anchor': 'end', 'font-size': 10, fill: pal.muted }, text(unreached)));
  const desc = [
    `Transition ${d.pairLabel}: frequency from ${formatSI(ff[0], 'Hz')} to ${formatSI(ff[1], 'Hz')} and df/dB against B from ${formatIn(fx[0], fUnit)} to ${formatIn(fx[1], fUnit)}`,
    `field-insensitive points: ${d.insensitive.map((p) => formatIn(p.fieldT, fUnit)).join(', ') || 'none in range'}`,
    `resonance fields: ${d.resonances.map((p) => formatIn(p.fieldT, fUnit)).join(', ') || 'none'}`,
    ...(unreached ? [unreached] : []),
  ];
  return svgDocument(
    {
      view: 'resonance',
      idBase,
      width: WIDTH,
      height,
      title: d.title,
      desc: desc.join('; ') + '.',
      pal,
      rootData: {
        'data-x-name': 'B',
        'data-x-unit': fUnit.symbol,
        'data-x-factor': dataNum(fUnit.factor),
        'data-x-domain': `${dataNum(fx[0])},${dataNum(fx[1])}`,
        'data-x-range': `${px(LEFT)},${px(RIGHT)}`,
      },
    },
    body,
  );
}

/**
 * The reference the frequency axis is an offset from, rounded to a tenth of the span shown so
 * that it is printed exactly: the printed reference plus the axis value is the frequency.
 */
export function roundReference(hz: number, spanHz: number): { hz: number; text: string } {
  const step = 10 ** Math.floor(Math.log10(Math.max(spanHz, 1e-3) / 10));
  const rounded = Math.round(hz / step) * step;
  const unit = engineeringUnit(Math.abs(rounded), 'Hz');
  const decimals = Math.max(0, Math.round(Math.log10(unit.factor / step)));
  return { hz: rounded, text: `${(rounded / unit.factor).toFixed(Math.min(decimals, 12))} ${unit.symbol}` };
}

/** A resonance frequency as the file would give it: nine significant figures, trailing zeros dropped. */
function exactHz(hz: number): string {
  const unit = engineeringUnit(Math.abs(hz), 'Hz');
  return `${Number((hz / unit.factor).toPrecision(9))} ${unit.symbol}`;
}

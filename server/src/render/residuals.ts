/**
 * A fit against its data: above, the measured points with their error bars and the model at
 * each point (a line for a profile, open rings otherwise); below, the normalised residuals
 * (measured − model)/σ with the ±1 and ±2 bands, on the same x axis (field, position, or the
 * point's number when the points share an unknown field).
 */
import { scaleLinear, scaleLog } from 'd3-scale';
import { line } from 'd3-shape';
import { bottomAxis, leftAxis, type PlotBox, type Scale } from './axes';
import { emptyDiagram, svgDocument } from './frame';
import { legendUnderTitle } from './legend';
import { markerPath } from './markers';
import { paletteFor } from './palette';
import { finiteExtent } from './sampled';
import { dataNum, el, px, shortHash, titleEl } from './svgText';
import { engineeringUnit, fieldDisplayUnit, formatIn, type DisplayUnit } from './units';
import { fieldAxisUnit } from './fieldAxisUnit';
import type { RenderTheme } from './viewData';

export interface ResidualsViewData {
  title: string;
  /** What x is: a field (T), a position (m) or the point number. */
  xKind: 'field' | 'position' | 'index';
  x: number[];
  measured: number[];
  /** Standard uncertainty of each point (0 when unknown). */
  sigma: number[];
  model: number[];
  /** Unit of measured and model ('Hz' or 'counts'). */
  unit: string;
  /** Draw the model as a line through the points (profiles), else as rings. */
  modelLine: boolean;
  /** The unit the file wrote the points' fields in (`mT`, `G`), if any: the field axis keeps its family. */
  xWrittenUnit?: string;
}

const WIDTH = 760;
/** Fields spanning more than this ratio (all above zero) get a logarithmic B axis. */
export const LOG_FIELD_SPAN = 100;
const LEFT = 84;
/** Stroke of the model's rings, in the plot and in the legend. */
const RING_WIDTH = 1.5;
const RIGHT = WIDTH - 20;

/**
 * The field axis's unit: the one rule of every field axis (render/fieldAxisUnit.ts), keeping the
 * family the points' fields were written in (`writtenUnit`). On a log axis the smallest field must
 * read as well as the largest: one unit while the smallest point still reads 0.1 or more in it (0.5 to 150 in mT),
 * else each tick names its own prefix (5 µT … 100 mT).
 */
export function residualsFieldUnit(minT: number, maxT: number, log: boolean, writtenUnit?: string): DisplayUnit {
  const unit = fieldDisplayUnit(fieldAxisUnit(Math.max(Math.abs(minT), Math.abs(maxT)), writtenUnit));
  if (!log || minT / unit.factor >= 0.1) return unit;
  return { factor: 1, symbol: 'T', perTick: 'T' };
}

export function renderResiduals(d: ResidualsViewData, theme: RenderTheme): string {
  const pal = paletteFor(theme);
  const idBase = `sl-f${shortHash(`${d.title}|${d.x.length}`)}`;
  const n = d.x.length;
  const z = d.x.map((_, i) => (d.sigma[i]! > 0 ? (d.measured[i]! - d.model[i]!) / d.sigma[i]! : d.measured[i]! - d.model[i]!));
  const normalised = d.sigma.every((s) => s > 0);
  const withSigma = d.sigma.some((s) => s > 0);
  const fx = finiteExtent(d.x);
  const fy = finiteExtent([...d.measured.map((m, i) => m - d.sigma[i]!), ...d.measured.map((m, i) => m + d.sigma[i]!), ...d.model]);
  const fz = finiteExtent([...z, -2.5, 2.5]);
  if (n === 0 || !fx || !fy || !fz) return emptyDiagram('residuals', idBase, d.title, 'No fitted points to draw.', pal);

  // Fields from µT to T would crowd every weak-field point into one spot at B = 0: spread over decades, B is logarithmic.
  const logX = d.xKind === 'field' && fx[0] > 0 && fx[1] / fx[0] > LOG_FIELD_SPAN;
  const xUnit = d.xKind === 'field' ? residualsFieldUnit(fx[0], fx[1], logX, d.xWrittenUnit) : d.xKind === 'position' ? engineeringUnit(Math.max(Math.abs(fx[0]), Math.abs(fx[1])), 'm') : { factor: 1, symbol: '' };
  const yUnit = d.unit === 'Hz' ? engineeringUnit(Math.max(Math.abs(fy[0]), Math.abs(fy[1])), 'Hz') : { factor: 1, symbol: d.unit };
  const legend = legendUnderTitle(
    [
      // The samples are the marks drawn: a dot with its error bar, the model as its line or its rings.
      { label: withSigma ? 'measured ± σ' : 'measured', colour: pal.series[0], marker: 'circle', ...(withSigma ? { line: { width: 1, vertical: true } } : {}) },
      d.modelLine ? { label: 'model', colour: pal.series[1], line: { width: 2 } } : { label: 'model', colour: pal.series[1], marker: 'circle', hollow: RING_WIDTH },
    ],
    LEFT,
    RIGHT,
    10,
    pal,
  );
  const top = legend.below;
  const upper: PlotBox = { left: LEFT, right: RIGHT, top, bottom: top + 220 };
  const lower: PlotBox = { left: LEFT, right: RIGHT, top: upper.bottom + 26, bottom: upper.bottom + 26 + 130 };
  const height = lower.bottom + 56;
  const pad = (a: number, b: number): [number, number] => (a === b ? [a - (Math.abs(a) || 1) * 0.1, b + (Math.abs(b) || 1) * 0.1] : [a - (b - a) * 0.05, b + (b - a) * 0.05]);
  const x: Scale = logX ? scaleLog().domain([fx[0] / 1.5, fx[1] * 1.5]).range([LEFT, RIGHT]) : scaleLinear().domain(pad(fx[0], fx[1])).range([LEFT, RIGHT]);
  const y = scaleLinear().domain(pad(fy[0], fy[1])).range([upper.bottom, upper.top]).nice();
  const yz = scaleLinear().domain(pad(fz[0], fz[1])).range([lower.bottom, lower.top]).nice();
  const xName = d.xKind === 'field' ? 'B' : d.xKind === 'position' ? 'position' : 'point';

  const body: string[] = [legend.svg];
  body.push(bottomAxis(x, xUnit, '', upper, pal));
  body.push(leftAxis(y, yUnit, 'measured, model', upper, LEFT, pal));
  body.push(bottomAxis(x, xUnit, logX ? `${xName}, log scale` : xName, lower, pal));
  // Five ticks in the short lower panel, so the ±2 σ bands drawn below carry numbers (two left only 0).
  body.push(leftAxis(yz, undefined, normalised ? '(measured − model)/σ' : 'measured − model', lower, LEFT, pal, (lower.bottom - lower.top) / 5));
  for (const level of normalised ? [-2, -1, 0, 1, 2] : [0]) {
    body.push(el('path', { class: 'sl-zero', d: `M${px(LEFT)},${px(yz(level))}H${px(RIGHT)}`, stroke: pal.muted, 'stroke-dasharray': level === 0 ? '' : '2 4', fill: 'none' }));
  }
  const order = d.x.map((_, i) => i).sort((a, b) => d.x[a]! - d.x[b]!);
  if (d.modelLine) {
    const path = line<number>().x((i) => x(d.x[i]!)).y((i) => y(d.model[i]!)).digits(2)(order) ?? '';
    body.push(el('path', { class: 'sl-curve', 'data-kind': 'model', d: path, fill: 'none', stroke: pal.series[1], 'stroke-width': 2 }));
  }
  // Many points (a profile scan) are drawn small.
  const r = n > 400 ? 1.5 : n > 60 ? 2.5 : 4;
  body.push(
    el(
      'g',
      { class: 'sl-points' },
      order.map((i) => {
        const xi = x(d.x[i]!);
        const what = `${xName} ${d.xKind === 'index' ? d.x[i] : formatIn(d.x[i]!, xUnit)}: measured ${formatIn(d.measured[i]!, yUnit)}, model ${formatIn(d.model[i]!, yUnit)}${d.sigma[i]! > 0 ? `, ${z[i]!.toFixed(2)} σ` : ''}`;
        return el('g', { class: 'sl-point', 'data-kind': 'point', 'data-x': dataNum(d.x[i]!), 'data-residual': dataNum(z[i]!) }, [
          titleEl(what),
          d.sigma[i]! > 0 ? el('path', { d: `M${px(xi)},${px(y(d.measured[i]! - d.sigma[i]!))}V${px(y(d.measured[i]! + d.sigma[i]!))}`, stroke: pal.series[0], 'stroke-width': 1 }) : '',
          el('path', { d: markerPath('circle', xi, y(d.measured[i]!), r), fill: pal.series[0] }),
          d.modelLine ? '' : el('path', { d: markerPath('circle', xi, y(d.model[i]!), r + 2), fill: 'none', stroke: pal.series[1], 'stroke-width': RING_WIDTH }),
          el('path', { d: markerPath('circle', xi, yz(Math.max(yz.domain()[0]!, Math.min(yz.domain()[1]!, z[i]!))), r), fill: pal.series[0] }),
        ]);
      }),
    ),
  );
  const worst = Math.max(...z.map(Math.abs));
  return svgDocument(
    {
      view: 'residuals',
      idBase,
      width: WIDTH,
      height,
      title: d.title,
      desc: `${n} points against the fitted model${logX ? ' on a logarithmic field axis' : ''}; largest ${normalised ? 'normalised ' : ''}residual ${worst.toFixed(2)}${normalised ? ' σ' : ''}.`,
      pal,
      rootData: { 'data-x-name': xName, 'data-x-unit': xUnit.symbol, 'data-x-factor': dataNum(xUnit.factor), 'data-x-domain': `${dataNum(x.domain()[0]!)},${dataNum(x.domain()[1]!)}`, 'data-x-range': `${px(LEFT)},${px(RIGHT)}`, 'data-x-scale': logX ? 'log' : 'linear' },
    },
    body,
  );
}

/**
 * A broken energy axis for the level diagram: the bands of levelBands.ts stacked from the highest
 * energy down, each under a header row that names its manifolds and its scale
 * ("F=2: E/h − 2.563 GHz (kHz)"), with its own ticks, slanted marks where the axis is broken,
 * and a note under the figure that says how far apart the bands are.
 */
import { scaleLinear } from 'd3-scale';
import { leftAxis, type PlotBox, type Scale } from './axes';
import { laneHeightFor } from './labelLayout';
import { bandName, type LevelBand } from './levelBands';
import { axisOffset, type AxisOffset } from './offsetAxis';
import type { Palette } from './palette';
import { dataNum, el, px, text } from './svgText';
import { formatSI } from './units';

/** The row above each band that holds its header. */
export const BAND_HEADER = 22;
/** Enough for three ticks. */
const BAND_MIN_HEIGHT = 96;
/**
 * A band's ticks read the shift inside the band: unless the band holds zero, they count from a round
 * value at its centre ("E/h − 2.25 GHz", ticks −2, 0, 2 MHz rather than 2.248, 2.250, 2.252 GHz;
 * "E/h + 80 MHz", ticks −5, 0, 5 rather than −85, −80, −75), so every band reads the same way.
 */
const BAND_TICK_DIGITS = 1;

export interface PlacedBand {
  band: LevelBand;
  name: string;
  top: number;
  bottom: number;
  /** Energy (Hz) → y inside the band. */
  y: Scale;
  axis: AxisOffset;
  /** The same scale as the axis labels it: offset subtracted (Hz). */
  shown: Scale;
  /** How many ticks the band's axis asks for: at least two fall inside it, so it can be read. */
  ticks: number;
}

/** About one tick per 55 px, more when fewer than two would fall inside the band (a 96 px band can get one). */
function tickCount(shown: Scale, factor: number, height: number): number {
  const inUnit = shown.copy().domain(shown.domain().map((v) => v / factor)); // ticks are chosen in the display unit
  let count = Math.max(2, Math.round(height / 55));
  while (count < 10 && inUnit.ticks(count).length < 2) count++;
  return count;
}

/**
 * The bands from the top down, the first header row starting at `top`. Together they are at least
 * `minHeight` tall, and each is tall enough to name every one of its states in a label lane.
 */
export function placeBands(bands: readonly LevelBand[], top: number, minHeight: number, labelSpacing: number): { placed: PlacedBand[]; bottom: number } {
  const share = (minHeight - bands.length * BAND_HEADER) / bands.length;
  const widest = Math.max(...bands.map((b) => b.hi - b.lo));
  const largest = Math.max(...bands.map((b) => Math.max(Math.abs(b.lo), Math.abs(b.hi))));
  // A manifold that hardly moves (an F = 0 state's quadratic shift) is drawn on a span of 10⁻³ of the
  // widest fan, and no band magnifies below 10⁻⁹ of its energy, where the arithmetic itself is unsure.
  const floor = Math.max(widest * 1e-3, largest * 1e-9);
  let next = top;
  const placed = [...bands].reverse().map((band) => {
    const height = Math.max(BAND_MIN_HEIGHT, share, laneHeightFor(band.curves.length, labelSpacing) + 8);
    const bandTop = next + BAND_HEADER;
    const bandBottom = bandTop + height;
    next = bandBottom;
    const span = Math.max(band.hi - band.lo, floor);
    const mid = (band.lo + band.hi) / 2;
    const pad = span * 0.04;
    const y = scaleLinear().domain([mid - span / 2 - pad, mid + span / 2 + pad]).range([bandBottom, bandTop]).nice();
    const [lo, hi] = y.domain() as [number, number];
    const axis = axisOffset(lo, hi, Math.max(2, Math.round(height / 55)), 'E/h', 'Hz', BAND_TICK_DIGITS);
    const shown = axis.offset === 0 ? y : y.copy().domain([lo - axis.offset, hi - axis.offset]);
    return { band, name: bandName(band), top: bandTop, bottom: bandBottom, y, axis, shown, ticks: tickCount(shown, axis.unit.factor, height) };
  });
  return { placed, bottom: next };
}

/** Each band's axis, header and break marks, in a group that carries its scale (`data-y-domain` in Hz, `data-y-range`). */
export function bandAxes(placed: readonly PlacedBand[], box: PlotBox, axisX: number, pal: Palette): string {
  return placed
    .map((p, k) => {
      const [lo, hi] = p.y.domain() as [number, number];
      const bandBox: PlotBox = { left: box.left, right: box.right, top: p.top, bottom: p.bottom };
      // Slanted marks on the axis ends that face another band, just outside the band: the axis is broken there.
      const breaks = [
        ...(k > 0 ? [`M${px(axisX - 5)},${px(p.top - 1)}l10,-6`] : []),
        ...(k < placed.length - 1 ? [`M${px(axisX - 5)},${px(p.bottom + 7)}l10,-6`] : []),
      ];
      return el(
        'g',
        {
          class: 'sl-band',
          'data-band': String(k),
          'data-label': p.name,
          'data-offset-hz': dataNum(p.axis.offset),
          'data-y-domain': `${dataNum(lo)},${dataNum(hi)}`,
          'data-y-range': `${px(p.bottom)},${px(p.top)}`,
        },
        [
          leftAxis(p.shown, p.axis.unit, '', bandBox, axisX, pal, (p.bottom - p.top) / p.ticks),
          el('text', { class: 'sl-band-title', x: axisX + 10, y: p.top - 7, 'font-size': 11, fill: pal.text, stroke: pal.halo, 'stroke-width': 3, 'paint-order': 'stroke' }, text(bandTitle(p))),
          breaks.length > 0 ? el('path', { class: 'sl-axis-break', d: breaks.join(''), stroke: pal.axis, 'stroke-width': 1.2, fill: 'none' }) : '',
        ],
      );
    })
    .join('');
}

export function bandTitle(p: PlacedBand): string {
  return `${p.name}: ${p.axis.name} (${p.axis.unit.symbol})`;
}

/**
 * How far apart neighbouring bands are, from the top: the distance between the centres of gravity of
 * their sublevels at the first field drawn ("F=2 lies 6.835 GHz above F=1 at 0 G"). At zero field that
 * is the interval the report prints; the middles of the bands' drawn spans are not (they move with the
 * field range: 6.847 GHz for the ⁸⁷Rb ground level drawn to 240 G).
 */
export function bandNote(placed: readonly PlacedBand[], energies: readonly ArrayLike<number>[], atText: string): string {
  const centre = (p: PlacedBand): number => {
    const first = p.band.curves.map((i) => energies[i]?.[0]);
    if (first.every((e): e is number => e !== undefined && Number.isFinite(e))) return first.reduce((a, e) => a + e, 0) / first.length;
    return (p.band.lo + p.band.hi) / 2;
  };
  const apart = placed.slice(0, -1).map((p, k) => {
    const below = placed[k + 1]!;
    return `${p.name}${k === 0 ? ' lies' : ''} ${formatSI(centre(p) - centre(below), 'Hz')} above ${below.name}`;
  });
  return `Energy axis broken into ${placed.length} bands, each on its own scale: ${apart.join(', ')} (centres of gravity at ${atText}).`;
}

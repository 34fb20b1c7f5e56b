/**
 * A synthesized spectrum as one SVG path over the line's sticks. Many more samples than pixels
 * are thinned by keeping each pixel column's lowest and highest sample, so no narrow peak is
 * lost between samples that are drawn.
 */
import type { Scale } from './axes';
import { px } from './svgText';
import type { LineSpectrumCurve } from './viewData';

function highestSample(c: LineSpectrumCurve): number {
  const n = Math.min(c.offsetHz.length, c.intensity.length);
  let peak = 0;
  for (let i = 0; i < n; i++) if (Number.isFinite(c.intensity[i]!) && c.intensity[i]! > peak) peak = c.intensity[i]!;
  return peak;
}

/** The factor from intensity to stick units: 1/unitPeak, else the one that puts the highest sample at `height`. */
function stickUnits(c: LineSpectrumCurve, height: number): number {
  if (c.unitPeak !== undefined && c.unitPeak > 0 && Number.isFinite(c.unitPeak)) return 1 / c.unitPeak;
  const peak = highestSample(c);
  return peak > 0 ? height / peak : 0;
}

/** Path data for the curve in stick units (see LineSpectrumCurve.unitPeak); `height` is the strongest stick's. */
export function spectrumPath(c: LineSpectrumCurve, x: Scale, y: Scale, height: number): string {
  const n = Math.min(c.offsetHz.length, c.intensity.length);
  const k = stickUnits(c, height);
  if (n < 2 || !(k > 0)) return '';
  const parts: string[] = [];
  let column = NaN;
  let lo = Infinity;
  let hi = -Infinity;
  let loFirst = true;
  const flush = (cx: number): void => {
    if (!Number.isFinite(lo)) return;
    const a = loFirst ? lo : hi;
    const b = loFirst ? hi : lo;
    parts.push(`${parts.length === 0 ? 'M' : 'L'}${px(cx)},${px(y(a * k))}`);
    if (b !== a) parts.push(`L${px(cx)},${px(y(b * k))}`);
  };
  for (let i = 0; i < n; i++) {
    const v = c.intensity[i]!;
    if (!Number.isFinite(v)) continue;
    const cx = Math.round(x(c.offsetHz[i]!) * 2) / 2;
    if (cx !== column) {
      flush(column);
      column = cx;
      lo = v;
      hi = v;
      loFirst = true;
    } else {
      if (v < lo) {
        lo = v;
        loFirst = false;
      }
      if (v > hi) hi = v;
    }
  }
  flush(column);
  return parts.join('');
}

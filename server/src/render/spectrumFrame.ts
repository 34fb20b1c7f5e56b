/**
 * Where a spectrum figure looks. The report's sample window spans every seen component plus six
 * line widths, down to components a trillion times weaker than the strongest, so drawn whole it
 * can be several times wider than anything visible. The figure frames instead the stretches
 * where the curve stands above CURVE_FLOOR of its peak, and when those stretches sit far apart
 * compared with their own widths it breaks the axis between them, keeping one frequency scale.
 */

/** The curve counts as present above this fraction of its peak (common practice: 1e-3 is a quarter pixel on a 250 px plot). */
export const CURVE_FLOOR = 1e-3;
/** A gap between stretches wider than this fraction of their whole extent is left out of the axis. */
const BREAK_GAP_FRACTION = 0.12;
/** The axis is broken only when that removes at least this fraction of the extent (else one frame reads well). */
const BREAK_SAVING = 0.4;
/** More stretches than this stay on one axis: segments would be too narrow to read. */
export const MAX_SEGMENTS = 6;
/** Margin added on each side of a frame, as a fraction of its width. */
const MARGIN = 0.06;

export type Stretch = [number, number];

/** Stretches of the samples where the value is at least `floor`, each widened to the samples either side (the crossing lies between). */
export function samplesAbove(offsetHz: ArrayLike<number>, value: ArrayLike<number>, floor: number): Stretch[] {
  const n = Math.min(offsetHz.length, value.length);
  const out: Stretch[] = [];
  let start = -1;
  for (let i = 0; i <= n; i++) {
    const above = i < n && Number.isFinite(value[i]!) && value[i]! >= floor;
    if (above && start < 0) start = i;
    if (!above && start >= 0) {
      out.push([offsetHz[Math.max(0, start - 1)]!, offsetHz[Math.min(n - 1, i)]!]);
      start = -1;
    }
  }
  return out;
}

/** The union of stretches, ascending and apart. */
export function mergeStretches(stretches: readonly Stretch[]): Stretch[] {
  const sorted = stretches.filter(([a, b]) => Number.isFinite(a) && Number.isFinite(b) && b >= a).sort((p, q) => p[0] - q[0]);
  const out: Stretch[] = [];
  for (const [a, b] of sorted) {
    const last = out[out.length - 1];
    if (last && a <= last[1]) last[1] = Math.max(last[1], b);
    else out.push([a, b]);
  }
  return out;
}

export interface SpectrumFrame {
  /** The frames drawn side by side, ascending; one unless the axis is broken. */
  segments: Stretch[];
  /** The stretches of frequency left out between segments. */
  gaps: Stretch[];
}

/**
 * The frames for a curve present on `stretches` (ascending, apart), inside the sample `window`.
 * Gaps wider than BREAK_GAP_FRACTION of the extent split it when that saves BREAK_SAVING of it
 * and leaves at most MAX_SEGMENTS segments; each segment gets a margin of MARGIN of its width.
 */
export function spectrumFrame(stretches: readonly Stretch[], window: Stretch): SpectrumFrame {
  const runs = mergeStretches(stretches);
  if (runs.length === 0) return { segments: [window], gaps: [] };
  const extent = runs[runs.length - 1]![1] - runs[0]![0];
  const groups: Stretch[] = [[runs[0]![0], runs[0]![1]]];
  for (const [a, b] of runs.slice(1)) {
    const last = groups[groups.length - 1]!;
    if (a - last[1] > BREAK_GAP_FRACTION * extent) groups.push([a, b]);
    else last[1] = b;
  }
  let saved = 0;
  for (let i = 1; i < groups.length; i++) saved += groups[i]![0] - groups[i - 1]![1];
  const broken = groups.length > 1 && groups.length <= MAX_SEGMENTS && saved >= BREAK_SAVING * extent;
  const frames = broken ? groups : [[runs[0]![0], runs[runs.length - 1]![1]] as Stretch];
  const segments = frames.map(([a, b]): Stretch => {
    // A frame of zero width (one sample above the floor) still gets a margin: a thousandth of the window.
    const m = Math.max(MARGIN * (b - a), b > a ? 0 : 1e-3 * (window[1] - window[0]));
    return [Math.max(window[0], a - m), Math.min(window[1], b + m)];
  });
  const gaps: Stretch[] = [];
  for (let i = 1; i < segments.length; i++) gaps.push([segments[i - 1]![1], segments[i]![0]]);
  return { segments, gaps };
}

/**
 * Pixel widths for segments drawn on one scale across `width` px, with `gap` px between them:
 * a segment narrower than `minWidth` px is widened about its centre (same scale, more margin).
 * Returns the widened segments and their widths.
 */
export function segmentLayout(segments: readonly Stretch[], width: number, gap: number, minWidth: number): { segments: Stretch[]; widths: number[] } {
  const usable = width - gap * (segments.length - 1);
  const spans = segments.map(([a, b]) => b - a);
  if (segments.length === 1) return { segments: [[...segments[0]!] as Stretch], widths: [usable] };
  // Fix the narrow ones at minWidth and share the rest by span, until none is narrow.
  const fixed = new Set<number>();
  let scale = 0;
  for (let round = 0; round <= segments.length; round++) {
    const free = spans.reduce((s, v, i) => (fixed.has(i) ? s : s + v), 0);
    scale = free > 0 ? (usable - fixed.size * minWidth) / free : 0;
    const narrow = spans.findIndex((v, i) => !fixed.has(i) && v * scale < minWidth);
    if (narrow < 0) break;
    fixed.add(narrow);
  }
  const widths = spans.map((v, i) => (fixed.has(i) || !(scale > 0) ? minWidth : v * scale));
  const out = segments.map(([a, b], i): Stretch => {
    if (!fixed.has(i) || !(scale > 0)) return [a, b];
    const half = minWidth / scale / 2;
    const mid = (a + b) / 2;
    return [mid - half, mid + half];
  });
  return { segments: out, widths };
}

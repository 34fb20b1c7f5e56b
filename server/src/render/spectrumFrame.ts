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
  /** The frames to draw side by side, ascending; one unless the axis is broken. segmentLayout may widen or merge them. */
  segments: Stretch[];
  /** The stretches of frequency between them (before segmentLayout: the figure's notes use its gaps). */
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

export interface SegmentLayout {
  /** The segments as drawn: ascending, apart, inside the window; fewer than asked when some met. */
  segments: Stretch[];
  /** Their widths in px, on one scale (Hz per px). */
  widths: number[];
  /** The stretches of frequency left out between them, from the segments as drawn. */
  gaps: Stretch[];
}

/**
 * Pixel widths for segments drawn on one scale across `width` px, with `gap` px between them.
 * A segment narrower than `minWidth` px is widened on that scale (about its centre, shifted to
 * stay inside its room: the sample `window` and halfway to each neighbour), or as far as its room
 * allows. Two segments whose gap would take fewer than twice the break's own `gap` px on that
 * scale are merged (with a margin of their own) and the layout is done again: such a break saves
 * too little to be worth reading across (from memory, a judgement of legibility), and widened
 * segments that meet would draw the same frequencies twice.
 */
export function segmentLayout(segments: readonly Stretch[], width: number, gap: number, minWidth: number, window: Stretch): SegmentLayout {
  const given = segments.map(([a, b]): Stretch => [Math.max(window[0], a), Math.min(window[1], b)]);
  // Runs of given segments drawn as one, first and last index.
  let runs = given.map((_, i): [number, number] => [i, i]);
  for (;;) {
    const frames = runs.map((run) => mergedFrame(given, run, window));
    if (frames.length <= 1) return { segments: frames, widths: frames.map(() => width), gaps: [] };
    const usable = width - gap * (frames.length - 1);
    const rooms = frames.map(([a, b], i): Stretch => [
      i > 0 ? Math.max(window[0], (frames[i - 1]![1] + a) / 2) : window[0],
      i < frames.length - 1 ? Math.min(window[1], (b + frames[i + 1]![0]) / 2) : window[1],
    ]);
    const scale = commonScale(frames, rooms, usable, minWidth);
    const placed = frames.map((f, i) => widened(f, rooms[i]!, minWidth / scale));
    // The narrowest gap too small to leave out on this scale: merge across it, then lay out again.
    let meet = -1;
    for (let i = 1; i < placed.length; i++) {
      const g = placed[i]![0] - placed[i - 1]![1];
      if (g * scale < 2 * gap && (meet < 0 || g < placed[meet]![0] - placed[meet - 1]![1])) meet = i;
    }
    if (meet < 0) {
      const gaps = placed.slice(1).map(([a], i): Stretch => [placed[i]![1], a]);
      return { segments: placed, widths: placed.map(([a, b]) => (b - a) * scale), gaps };
    }
    runs = [...runs.slice(0, meet - 1), [runs[meet - 1]![0], runs[meet]![1]], ...runs.slice(meet + 1)];
  }
}

/**
 * The given segments `first`..`last` drawn as one: a single one as given; several merged span
 * them all plus MARGIN of that span a side (their inner margins are gone), never past the window
 * or halfway to the next given segment.
 */
function mergedFrame(given: readonly Stretch[], [first, last]: [number, number], window: Stretch): Stretch {
  const a = given[first]![0];
  const b = given[last]![1];
  if (first === last) return [a, b];
  const m = MARGIN * (b - a);
  const lo = first > 0 ? Math.max(window[0], (given[first - 1]![1] + a) / 2) : window[0];
  const hi = last < given.length - 1 ? Math.min(window[1], (b + given[last + 1]![0]) / 2) : window[1];
  return [Math.max(lo, a - m), Math.min(hi, b + m)];
}

/**
 * The px per Hz at which the segments fill `usable` px: each is drawn over its own span, or over
 * `minWidth` px when that is wider, but never over more than its room. The total grows with the
 * scale, so bisection brackets it; the exact value then follows from which of the three holds for each.
 */
function commonScale(frames: readonly Stretch[], rooms: readonly Stretch[], usable: number, minWidth: number): number {
  const spans = frames.map(([a, b]) => b - a);
  const roomSpans = rooms.map(([a, b]) => b - a);
  const total = (s: number): number => spans.reduce((t, v, i) => t + Math.min(Math.max(s * v, minWidth), s * roomSpans[i]!), 0);
  const widest = Math.max(...spans);
  if (!(widest > 0) || !(usable > 0)) return widest > 0 ? usable / widest : 1;
  // At usable/widest the widest alone fills the width: the root lies below.
  let lo = 0;
  let hi = usable / widest;
  for (let k = 0; k < 200 && hi - lo > 1e-15 * hi; k++) {
    const mid = (lo + hi) / 2;
    if (total(mid) < usable) lo = mid;
    else hi = mid;
  }
  const s = (lo + hi) / 2;
  let fixedPx = 0;
  let perScale = 0;
  spans.forEach((v, i) => {
    if (s * v >= minWidth) perScale += v;
    else if (s * roomSpans[i]! <= minWidth) perScale += roomSpans[i]!;
    else fixedPx += minWidth;
  });
  const exact = (usable - fixedPx) / perScale;
  return perScale > 0 && exact > 0 ? exact : s;
}

/** `frame` widened to `span` (if narrower) about its centre, shifted into `room`, and never wider than the room. */
function widened([a, b]: Stretch, [lo, hi]: Stretch, span: number): Stretch {
  if (!(span > b - a)) return [a, b];
  const d = Math.min(span, hi - lo);
  const start = Math.max(lo, Math.min((a + b) / 2 - d / 2, hi - d));
  return [start, start + d];
}

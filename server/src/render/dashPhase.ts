/**
 * Dash offsets that keep a dashed curve's pattern in step with its neighbours. A curve drawn as
 * several slope runs would restart its pattern at every run, and curves that merge (a Paschen–Back
 * tail) reach the shared stretch after different path lengths: overlaid with the gaps out of
 * step, dashed curves read as a solid one. Counting the pattern back from each curve's right end
 * puts curves that end together (and coincide on the way there) in the same phase.
 */

type Point = readonly [number, number];

/** Length of one dash period ('7 3' → 10; an odd list repeats itself, as SVG does). */
export function dashPeriod(dash: string): number {
  const parts = dash.split(/[\s,]+/).filter(Boolean).map(Number);
  const sum = parts.reduce((a, b) => a + b, 0);
  return parts.length % 2 === 1 ? 2 * sum : sum;
}

function polylineLength(points: readonly Point[]): number {
  let len = 0;
  for (let k = 1; k < points.length; k++) len += Math.hypot(points[k][0] - points[k - 1][0], points[k][1] - points[k - 1][1]);
  return Number.isFinite(len) ? len : 0;
}

/**
 * stroke-dashoffset for each run of one curve (runs in drawing order along the curve, each a polyline
 * in user units), so that the pattern phase at any point depends only on its path length from the
 * curve's end. Runs without a dash get undefined.
 */
export function endAnchoredDashOffsets(runs: readonly { points: readonly Point[]; dash?: string }[]): (number | undefined)[] {
  const lengths = runs.map((r) => polylineLength(r.points));
  const total = lengths.reduce((a, b) => a + b, 0);
  let before = 0;
  return runs.map((r, k) => {
    const start = before;
    before += lengths[k];
    if (r.dash === undefined || r.dash === 'none') return undefined;
    const period = dashPeriod(r.dash);
    if (!(period > 0)) return undefined;
    // Phase at path length s into this run is s + offset; we want it to be −(length still to go) mod period.
    const offset = (((start - total) % period) + period) % period;
    return Math.round(offset * 100) / 100;
  });
}

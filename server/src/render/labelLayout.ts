/**
 * Places end-of-curve labels in a vertical lane without overlaps, one label per state: states
 * whose curve ends coincide (all m_F of one F at zero field) fan out, ordered by where their
 * curves go next, so every state stays identifiable on an exported figure. Positions solve a
 * least-squares problem: stay as close as possible to the curve ends while keeping at least
 * `spacing` between labels and staying inside the lane. The caller makes the lane tall enough
 * (`laneHeightFor`).
 */

export interface LabelAnchor {
  /** Index of the curve this anchor belongs to. */
  index: number;
  y: number;
  label: string;
  /** Orders anchors at the same y (where the curve is a little further along); smaller first. */
  tie?: number;
}

export interface PlacedLabel {
  y: number;
  text: string;
  /** The one state this label names (a list for the callers that draw leaders per member). */
  members: LabelAnchor[];
}

/** Curve ends closer than this (px) count as one place and are ordered by `tie`. */
const SAME_PLACE_PX = 0.5;

/** The lane height that holds `n` labels at `spacing`. */
export function laneHeightFor(n: number, spacing: number): number {
  return Math.max(0, n - 1) * spacing;
}

export function truncateLabel(label: string, maxChars: number): string {
  const chars = Array.from(label);
  return chars.length <= maxChars ? label : chars.slice(0, Math.max(1, maxChars - 1)).join('') + '…';
}

/** Pool-adjacent-violators: the non-decreasing sequence closest (least squares) to `v`. */
function isotonic(v: number[]): number[] {
  const blocks: { sum: number; n: number }[] = [];
  for (const x of v) {
    blocks.push({ sum: x, n: 1 });
    while (blocks.length > 1) {
      const b = blocks[blocks.length - 1];
      const a = blocks[blocks.length - 2];
      if (a.sum / a.n <= b.sum / b.n) break;
      a.sum += b.sum;
      a.n += b.n;
      blocks.pop();
    }
  }
  const out: number[] = [];
  for (const b of blocks) for (let i = 0; i < b.n; i++) out.push(b.sum / b.n);
  return out;
}

export function placeLabels(anchors: LabelAnchor[], top: number, bottom: number, spacing: number): PlacedLabel[] {
  const sorted = anchors
    .filter((a) => Number.isFinite(a.y))
    .sort((a, b) => (Math.abs(a.y - b.y) < SAME_PLACE_PX ? 0 : a.y - b.y) || (a.tie ?? 0) - (b.tie ?? 0) || a.index - b.index);
  if (sorted.length === 0) return [];
  // Substituting z_i = y_i − i·spacing turns "gaps ≥ spacing" into "z non-decreasing".
  const n = sorted.length;
  const wanted = sorted.map((a, i) => a.y - i * spacing);
  const hi = Math.max(top, bottom - (n - 1) * spacing);
  const z = isotonic(wanted).map((v) => Math.min(hi, Math.max(top, v)));
  return sorted.map((a, i) => ({ y: z[i] + i * spacing, text: a.label, members: [a] }));
}

/**
 * Places end-of-curve labels in a vertical lane without overlaps, one label per state: states
 * whose curve ends coincide (all m_F of one F at zero field) fan out, ordered by where their
 * curves go next, so every state stays identifiable on an exported figure; a lane too crowded
 * for that names coinciding ends once (placeLabels). Positions solve a
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
  /** The states this label names: one, or those whose ends coincide in a crowded lane. */
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

/** Above this many names a lane stops being read name by name (common practice: a legend of ~15 entries). */
export const MAX_NAMES_PER_LANE = 16;

/** Curve ends closer than this (px) cannot be told apart on the figure: a crowded lane names them once. */
const MERGE_PX = 1;

/**
 * One name for states whose ends coincide: the parts they share, and the one part that varies as
 * a range ("F=2, m_F=-2…+2"); when more varies, or the range would be longer than `maxChars`,
 * which values of the first varying part merge and how many states ("F=3,4: 16 states", "F=1…4:
 * 24 states"), else only how many ("J=3/2: 16 states").
 */
export function mergedName(labels: readonly string[], maxChars = Number.POSITIVE_INFINITY): string {
  if (labels.length === 1) return labels[0]!;
  const parts = labels.map((l) => l.split(', '));
  const shared: string[] = [];
  for (let i = 0; i < parts[0]!.length - 1 && parts.every((p) => p.length === parts[0]!.length && p[i] === parts[0]![i]); i++) shared.push(parts[0]![i]!);
  const rest = parts.map((p) => p.slice(shared.length));
  const key = rest[0]![0]?.split('=')[0];
  if (rest.every((r) => r.length === 1 && r[0]!.split('=')[0] === key)) {
    const values = rest.map((r) => r[0]!.slice(key!.length + 1)).sort((a, b) => fractionValue(a) - fractionValue(b));
    const ranged = [...shared, `${key}=${values[0]}…${values[values.length - 1]}`].join(', ');
    if (values.every((v) => Number.isFinite(fractionValue(v))) && Array.from(ranged).length <= maxChars) return ranged;
  }
  const count = `${labels.length} states`;
  // The first part that varies, when every state has it (F of an F, m_F name): which of its values merge.
  const named = key !== undefined && rest.every((r) => r[0]!.split('=')[0] === key) ? [...shared, `${key}=${valueList(rest.map((r) => r[0]!.slice(key.length + 1)))}: ${count}`].join(', ') : undefined;
  if (named !== undefined && Array.from(named).length <= maxChars) return named;
  return shared.length > 0 ? `${shared.join(', ')}: ${count}` : count;
}

/** The distinct values, ascending: a run of more than two in steps of 1 as "1…4", else listed "2,3" (the comma without a space keeps it apart from the parts' ", "). */
function valueList(values: readonly string[]): string {
  const distinct = [...new Set(values)].sort((a, b) => fractionValue(a) - fractionValue(b));
  const nums = distinct.map(fractionValue);
  const run = nums.every((v, i) => Number.isFinite(v) && (i === 0 || Math.abs(v - nums[i - 1]! - 1) < 1e-9));
  return run && distinct.length > 2 ? `${distinct[0]}…${distinct[distinct.length - 1]}` : distinct.join(',');
}

function fractionValue(v: string): number {
  const m = /^([+-]?\d+)(?:\/(\d+))?$/.exec(v);
  return m ? Number(m[1]) / Number(m[2] ?? 1) : Number.NaN;
}

/** Runs of sorted anchors within MERGE_PX of the run's first, each as one anchor with all of them as members. */
function mergeCoincident(sorted: LabelAnchor[], maxChars: number): { anchor: LabelAnchor; members: LabelAnchor[] }[] {
  const out: { anchor: LabelAnchor; members: LabelAnchor[] }[] = [];
  for (const a of sorted) {
    const last = out[out.length - 1];
    if (last && Math.abs(a.y - last.members[0]!.y) < MERGE_PX) last.members.push(a);
    else out.push({ anchor: a, members: [a] });
  }
  for (const g of out) {
    if (g.members.length === 1) continue;
    const y = g.members.reduce((s, m) => s + m.y, 0) / g.members.length;
    g.anchor = { index: g.members[0]!.index, y, label: mergedName(g.members.map((m) => m.label), maxChars) };
  }
  return out;
}

/**
 * Labels for the anchors, in order, at least `spacing` apart inside [top, bottom]. A lane with
 * more than MAX_NAMES_PER_LANE names gives ends that coincide on the figure one name (the
 * m_F of an F level at zero field), so a whole term's 24 or a 6P3/2 level's 32 ends stay readable.
 */
export function placeLabels(anchors: LabelAnchor[], top: number, bottom: number, spacing: number, maxChars = Number.POSITIVE_INFINITY): PlacedLabel[] {
  const sorted = anchors
    .filter((a) => Number.isFinite(a.y))
    .sort((a, b) => (Math.abs(a.y - b.y) < SAME_PLACE_PX ? 0 : a.y - b.y) || (a.tie ?? 0) - (b.tie ?? 0) || a.index - b.index);
  if (sorted.length === 0) return [];
  const groups = sorted.length > MAX_NAMES_PER_LANE ? mergeCoincident(sorted, maxChars) : sorted.map((a) => ({ anchor: a, members: [a] }));
  // Substituting z_i = y_i − i·spacing turns "gaps ≥ spacing" into "z non-decreasing".
  const n = groups.length;
  const wanted = groups.map((g, i) => g.anchor.y - i * spacing);
  const hi = Math.max(top, bottom - (n - 1) * spacing);
  const z = isotonic(wanted).map((v) => Math.min(hi, Math.max(top, v)));
  return groups.map((g, i) => ({ y: z[i] + i * spacing, text: g.anchor.label, members: g.members }));
}

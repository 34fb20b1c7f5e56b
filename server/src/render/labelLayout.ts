/**
 * Places end-of-curve labels in a vertical lane without overlaps. Coincident curve ends share
 * one label; if the lane is still too short, the closest neighbours are merged until the
 * labels fit. Positions then solve a least-squares problem: stay as close as possible to the
 * curve ends while keeping at least `spacing` between labels and staying inside the lane.
 */

export interface LabelAnchor {
  /** Index of the curve this anchor belongs to. */
  index: number;
  y: number;
  label: string;
}

export interface PlacedLabel {
  y: number;
  text: string;
  members: LabelAnchor[];
}

const SAME_PLACE_PX = 1;

/** One label for several states: their shared leading part ("F=2") and a count, else the first and "+n". */
export function groupLabel(labels: string[]): string {
  if (labels.length === 1) return labels[0];
  let prefix = labels[0];
  for (const l of labels) {
    let i = 0;
    while (i < prefix.length && i < l.length && prefix[i] === l[i]) i++;
    prefix = prefix.slice(0, i);
  }
  // A shared prefix only names a group if the labels all continue after a separator there.
  const allAtBoundary = labels.every((l) => l.length === prefix.length || /[,; ]/.test(l[prefix.length]));
  if (!allAtBoundary) {
    const cut = Math.max(prefix.lastIndexOf(','), prefix.lastIndexOf(';'), prefix.lastIndexOf(' '));
    prefix = cut > 0 ? prefix.slice(0, cut) : '';
  }
  prefix = prefix.replace(/[,;\s]+$/, '');
  return prefix ? `${prefix} · ${labels.length} states` : `${labels[0]} +${labels.length - 1}`;
}

export function truncateLabel(label: string, maxChars: number): string {
  const chars = Array.from(label);
  return chars.length <= maxChars ? label : chars.slice(0, Math.max(1, maxChars - 1)).join('') + '…';
}

function mean(xs: number[]): number {
  return xs.reduce((a, b) => a + b, 0) / xs.length;
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
    .sort((a, b) => a.y - b.y || a.index - b.index);
  if (sorted.length === 0) return [];

  let groups: LabelAnchor[][] = [];
  for (const a of sorted) {
    const last = groups[groups.length - 1];
    if (last && Math.abs(a.y - last[0].y) < SAME_PLACE_PX) last.push(a);
    else groups.push([a]);
  }

  const capacity = Math.max(1, Math.floor((bottom - top) / spacing) + 1);
  while (groups.length > capacity) {
    let best = 0;
    let bestGap = Infinity;
    for (let i = 0; i + 1 < groups.length; i++) {
      const gap = mean(groups[i + 1].map((a) => a.y)) - mean(groups[i].map((a) => a.y));
      if (gap < bestGap) {
        bestGap = gap;
        best = i;
      }
    }
    groups = [...groups.slice(0, best), [...groups[best], ...groups[best + 1]], ...groups.slice(best + 2)];
  }

  // Substituting z_i = y_i − i·spacing turns "gaps ≥ spacing" into "z non-decreasing".
  const n = groups.length;
  const wanted = groups.map((g, i) => mean(g.map((a) => a.y)) - i * spacing);
  const hi = Math.max(top, bottom - (n - 1) * spacing);
  const z = isotonic(wanted).map((v) => Math.min(hi, Math.max(top, v)));
  return groups.map((g, i) => ({
    y: z[i] + i * spacing,
    text: groupLabel(g.map((a) => a.label)),
    members: g,
  }));
}

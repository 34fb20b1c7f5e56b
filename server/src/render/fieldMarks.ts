/**
 * Named fields on a field axis: which to mark (the chosen one first), and rows for their labels
 * above the plot so that no two labels overlap.
 */
import { estimateTextWidth } from './frame';
import { px } from './svgText';
import { fieldDisplayUnit, fieldOnAxisText, figureMinus } from './units';
import type { FieldUnit, NamedFieldMark } from './viewData';

export const MARK_ROW = 14;

export interface FieldMark {
  fieldT: number;
  label: string;
  text: string;
  chosen: boolean;
}

/** The chosen field and every other named field inside the sweep, each once. */
export function fieldMarksIn(
  fieldUnit: FieldUnit,
  inSweep: (b: number | undefined) => b is number,
  chosenT: number | undefined,
  chosenLabel: string | undefined,
  others: readonly NamedFieldMark[] = [],
  chosenText?: string,
): FieldMark[] {
  const unit = fieldDisplayUnit(fieldUnit);
  const out: FieldMark[] = [];
  const add = (fieldT: number, label: string, chosen: boolean, written: string | undefined): void => {
    if (!inSweep(fieldT) || out.some((m) => m.fieldT === fieldT && m.label === label)) return;
    // A field the file wrote reads in its own unit (1 nT, not 1e-6 mT); a found one in the axis unit while it reads short there.
    const value = written !== undefined ? figureMinus(written) : fieldOnAxisText(fieldT, unit);
    out.push({ fieldT, label, chosen, text: label ? `${label} · ${value}` : `B = ${value}` });
  };
  if (chosenT !== undefined) add(chosenT, chosenLabel ?? '', true, chosenText);
  for (const m of others) add(m.fieldT, m.label, false, m.valueText);
  return out;
}

/** Row of each mark's label above the plot: the lowest row where it overlaps no label already placed. */
export function layoutMarkRows(marks: FieldMark[], left: number, right: number, x: (b: number) => number): number[] {
  const placed: { row: number; a: number; b: number }[] = [];
  return marks.map((m) => {
    const half = estimateTextWidth(m.text) / 2 + 4;
    const c = Math.min(right - half, Math.max(left + half, x(m.fieldT)));
    let row = 0;
    while (placed.some((p) => p.row === row && c + half > p.a && c - half < p.b)) row++;
    placed.push({ row, a: c - half, b: c + half });
    return row;
  });
}

/** A mark's label: its centre, clamped inside [left, right] as drawn, and its baseline. */
export function markLabelAt(m: FieldMark, row: number, left: number, right: number, x: (b: number) => number, top: number): { tx: number; ty: number; half: number } {
  const half = estimateTextWidth(m.text) / 2;
  return { tx: Math.min(right - half, Math.max(left + half, x(m.fieldT))), ty: top - 8 - row * MARK_ROW, half };
}

/**
 * The path of mark i's rule, from just under its label down to `bottom`, broken where it would run
 * through the label of a mark in a lower row (two fields a hair apart, 3.23 G and 3.229 G, put their
 * labels one above the other and the upper one's rule through the lower one's words).
 */
export function markRulePath(i: number, marks: readonly FieldMark[], rows: readonly number[], left: number, right: number, x: (b: number) => number, top: number, bottom: number): string {
  const mx = x(marks[i]!.fieldT);
  const start = markLabelAt(marks[i]!, rows[i]!, left, right, x, top).ty + 3;
  // Label boxes below this label that the rule's x falls in, as [from, to] in y (11 px text: 11 above the baseline, 3 below).
  const gaps = marks
    .map((m, j) => ({ j, at: markLabelAt(m, rows[j]!, left, right, x, top) }))
    .filter(({ j, at }) => j !== i && rows[j]! < rows[i]! && Math.abs(mx - at.tx) <= at.half + 2)
    .map(({ at }) => [at.ty - 11, at.ty + 3] as const)
    .sort((a, b) => a[0] - b[0]);
  const r = px;
  let d = '';
  let y = start;
  for (const [from, to] of gaps) {
    if (to <= y) continue;
    if (from > y) d += `M${r(mx)},${r(y)}V${r(from)}`;
    y = Math.max(y, to);
  }
  if (y < bottom) d += `M${r(mx)},${r(y)}V${r(bottom)}`;
  return d;
}

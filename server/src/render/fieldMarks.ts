/**
 * Named fields on a field axis: which to mark (the chosen one first), and rows for their labels
 * above the plot so that no two labels overlap.
 */
import { estimateTextWidth } from './frame';
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

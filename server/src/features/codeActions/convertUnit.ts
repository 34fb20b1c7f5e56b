/**
 * Refactoring: rewrite a quantity in another unit of the same kind (`0.45 T` → `4500 G`),
 * with as few digits as keep the value: converting back gives the number as written.
 */
import { type CodeAction, CodeActionKind, type Range } from 'vscode-languageserver-types';
import type { Analysis } from '../../eval/analyze';
import type { ValuePart } from '../../format/ast';
import { convertSI, type Dimension, readQuantity } from '../../format/units';
import { locate } from '../shared/locate';
import { containsRange } from '../shared/names';
import { convertTargets, dimensionOfUnit, displayUnit } from '../shared/units';

/** Significant digits written in a decimal mantissa (`0.0450` → 3, `180` → 3, `8` → 1). */
export function significantDigits(numberText: string): number {
  const mantissa = numberText.replace(/^[+-]/, '').replace(/[eE].*$/, '').replace(/\(.*\)/, '');
  const digits = mantissa.replace('.', '').replace(/^0+/, '');
  return Math.max(1, Math.min(15, digits.length));
}

/** A number in the format's notation with `p` significant digits: `4500`, `0.08`, `4.5e-7`. */
function numberText(value: number, p: number): string {
  return String(Number(value.toPrecision(p)));
}

/**
 * The shortest text for `value` that converts back to `original` exactly (`0.45 T` → `4500 G`,
 * `720 K` → `446.85 degC`); failing that, the shortest that converts back to the original at
 * the precision it was written with.
 */
function roundTripText(value: number, original: number, digits: number, back: (v: number) => number | undefined): string {
  for (let p = 1; p <= 12; p++) {
    const text = numberText(value, p);
    const again = back(Number(text));
    if (again !== undefined && Math.abs(again - original) <= 1e-12 * Math.abs(original)) return text;
  }
  for (let p = Math.max(digits, 3); p <= 15; p++) {
    const text = numberText(value, p);
    const again = back(Number(text));
    if (again !== undefined && Number(again.toPrecision(digits)) === Number(original.toPrecision(digits))) return text;
  }
  return numberText(value, 15);
}

export function unitConversions(part: ValuePart, uri: string): CodeAction[] {
  if (part.kind !== 'quantity' || part.number.uncertainty !== undefined) return [];
  const d = dimensionOfUnit(part.unit.text);
  if (!d) return [];
  const reading = readQuantity(part, d);
  if (reading.si === undefined) return [];
  const si = reading.si;
  const written = part.text.slice(0, part.text.length - part.unit.text.length).trimEnd();
  const glued = part.text.length === written.length + part.unit.text.length;
  const digits = significantDigits(written);
  const out: CodeAction[] = [];
  for (const unit of convertTargets(d)) {
    if (unit === part.unit.text || displayUnit(unit) === part.unit.text) continue;
    const value = convertSI(si, d, unit);
    if (value === undefined || !Number.isFinite(value)) continue;
    const text = `${roundTripText(value, part.number.value, digits, (v) => backToWritten(v, unit, part.unit.text, d))}${glued ? '' : ' '}${unit}`;
    out.push({
      title: `Convert to ${displayUnit(unit)}: ${text}`,
      kind: CodeActionKind.RefactorRewrite,
      edit: { changes: { [uri]: [{ range: part.range, newText: text }] } },
    });
  }
  return out;
}

/** A value `v` written in `unit`, converted to the unit the user wrote (`written`). */
function backToWritten(v: number, unit: string, written: string, d: Dimension): number | undefined {
  // Temperatures have an offset (0 °C = 273.15 K, SI definition), so they cannot be scaled.
  if (d === 'temperature') return convertSI(unit === 'degC' ? v + 273.15 : v, d, written);
  const perUnit = convertSI(1, d, unit);
  if (perUnit === undefined || perUnit === 0) return undefined;
  return convertSI(v / perUnit, d, written);
}

export function convertUnitActions(analysis: Analysis, uri: string, range: Range): CodeAction[] {
  const t = locate(analysis.doc, range.start);
  if (!t || t.kind !== 'value' || !t.part) return [];
  // A unit the setting cannot take is fixed, not converted: a conversion would keep the wrong kind.
  const part = t.part;
  if (analysis.problems.some((p) => p.code.startsWith('unit-') && containsRange(part.range, p.range))) return [];
  return unitConversions(part, uri);
}

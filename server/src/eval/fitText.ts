/**
 * Fitted values as text: `value(uncertainty) unit` in concise notation (withUncertainty), in
 * the unit the file wrote or an SI prefix that keeps the number readable.
 * Numbers go through the one formatter (quantityText.ts); nothing prints NaN or Infinity.
 */
import { convertSI, type Dimension } from '../format/units';
import type { FitParameterResult } from './fitResultTypes';
import { cleanValue, fieldText, frequencyText, gradientText, lengthText, MISSING, trimNumber, withUncertainty } from './quantityText';
import { displayUnit } from './writtenUnit';

const DIMENSION: Readonly<Record<string, Dimension>> = { T: 'flux-density', Hz: 'frequency-like', m: 'length', 'T/m': 'gradient', K: 'temperature' };

/** The display unit and its size in SI for a value: the written unit, else the prefix `sample` (a formatted text) chose. */
function displayScale(si: number, unit: string, written: string | undefined): { unit: string; perUnit: number } {
  const dim = DIMENSION[unit];
  if (!dim) return { unit, perUnit: 1 };
  if (written) {
    const inWritten = convertSI(1, dim, written);
    // Only while the number stays out of exponent form (trimNumber's limits): 6834696976 Hz reads 6.834696976 GHz, not 6.834696976e9 Hz.
    const shown = Math.abs(si) * (inWritten ?? 0);
    if (inWritten !== undefined && inWritten > 0 && (si === 0 || (shown >= 1e-5 && shown < 1e9))) return { unit: displayUnit(written), perUnit: 1 / inWritten };
  }
  const sample = unit === 'T' ? fieldText(si) : unit === 'Hz' ? frequencyText(si) : unit === 'm' ? lengthText(si) : unit === 'T/m' ? gradientText(si) : `${trimNumber(si)} ${unit}`;
  const shown = sample.split(' ').slice(1).join(' ');
  const back = convertSI(1, dim, shown.replace('µ', 'u'));
  return back !== undefined && back > 0 ? { unit: shown, perUnit: 1 / back } : { unit, perUnit: 1 };
}

/**
 * `2.152279(54) G`: a fitted value in the unit the file wrote (or a readable prefix), written by
 * the one `value(uncertainty)` formatter.
 */
export function fittedText(si: number | null | undefined, uncertainty: number | null | undefined, unit: string, written?: string, digits = 7): string {
  const v = cleanValue(si);
  if (v === undefined) return MISSING;
  const { unit: shownUnit, perUnit } = displayScale(v, unit, written);
  const suffix = shownUnit ? ` ${shownUnit}` : '';
  return withUncertainty(v, cleanValue(uncertainty), (x) => `${trimNumber(x / perUnit, digits)}${suffix}`);
}

export function parameterText(p: FitParameterResult): string {
  return fittedText(p.value, p.uncertainty, p.unit, p.written_unit);
}

/**
 * A measured value in the unit the data were written in (`written`, e.g. kHz), else Hz with a prefix; counts as numbers.
 * At a double's 15 significant digits with trailing zeros trimmed, a number written with up to 15 digits reads back as
 * written (a decimal of ≤ 15 digits survives the round trip through a double), so every measured digit is kept.
 */
export function measuredText(value: number | null | undefined, unit: string, written?: string, digits = 15): string {
  return unit === 'Hz' ? fittedText(value, undefined, 'Hz', written, digits) : trimNumber(value, digits);
}

/** A residual, with the noise floor of the measured values it is the difference of. */
export function residualText(value: number | null | undefined, unit: string, scale: number): string {
  const noise = { scale, relative: 1e-12 };
  return unit === 'Hz' ? frequencyText(value, 4, noise) : trimNumber(value, 4, noise);
}

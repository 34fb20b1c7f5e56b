/** How each kind of number in a diff is written: through the one formatter, in the file's units where it wrote one. */
import { fieldInUnit, inWrittenUnit } from '../eval/writtenUnit';
import { frequencyText, gradientText, lengthText, trimNumber } from '../eval/quantityText';
import type { Writer } from './changeList';

export const frequency: Writer = (x) => frequencyText(x);
export const gFactor: Writer = (x) => trimNumber(x, 7);
export const moment: Writer = (x) => `${trimNumber(x, 5)} μ_B`;
export const strength: Writer = (x) => trimNumber(x, 4);
export const length: Writer = (x) => lengthText(x);

/** A field the file wrote (in its unit) or one derived from a range written in `family`'s unit. */
export function field(opts: { unit?: string; family?: string }): Writer {
  return (x) => fieldInUnit(x, { ...opts, digits: 7 });
}

export function gradient(unit: string | undefined): Writer {
  return (x) => inWrittenUnit(x, 'gradient', unit) ?? gradientText(x);
}

export function writtenLength(unit: string | undefined): Writer {
  return (x) => inWrittenUnit(x, 'length', unit) ?? lengthText(x);
}

/** A number with a unit: the same value in the other units of its kind (and its uncertainty). */
import type { ValuePart } from '../../format/ast';
import { readQuantity } from '../../format/units';
import { md, mdTitle } from '../shared/markdown';
import { dimensionOfUnit, displayUnit, valueInUnits } from '../shared/units';

export function quantitySection(part: ValuePart): string | undefined {
  if (part.kind !== 'quantity') return undefined;
  const d = dimensionOfUnit(part.unit.text);
  if (!d) return undefined;
  const reading = readQuantity(part, d);
  if (reading.si === undefined) return undefined;
  const written = displayUnit(part.unit.text);
  const values = valueInUnits(reading.si, d).filter((v) => !v.endsWith(` ${written}`));
  if (values.length === 0) return undefined;
  const lines = [`${mdTitle(md(part.text))} = ${values.join(' = ')}`];
  if (reading.siUncertainty !== undefined) lines.push(`uncertainty ± ${valueInUnits(reading.siUncertainty, d).join(' = ')}`);
  return lines.join('  \n');
}

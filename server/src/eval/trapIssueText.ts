/**
 * The one wording of the trap problems that carry quantities (physics/traps TrapFigures): fields
 * and gradients in the trap's unit family (trapText.trapFieldUnit, as its report reads) and to the
 * report's digits, the region's lengths in the report's region unit and digits (trapText.regionText),
 * frequencies with a prefix. The physics
 * core gives only the figures, so no message holds a number in a unit the file did not choose.
 */
import type { FigureTrapIssue } from '../physics/traps';
import { fieldText, frequencyText, gradientText } from './quantityText';
import type { LengthUnit } from './lengthUnit';
import { regionLengthText, TURNING_FIELD_DIGITS, type TrapFieldUnit } from './trapText';

/** The units a trap's problems read in. */
export interface TrapIssueUnits {
  /** The trap's field family: gauss with G/cm, or tesla with T/m. */
  field: TrapFieldUnit;
  /** The region's one length unit (trapText.regionLengthUnit), as the report's region line reads. */
  region: LengthUnit;
}

export function trapIssueText(i: FigureTrapIssue, units: TrapIssueUnits): string {
  const name = i.sublevel ?? 'the sublevel';
  switch (i.code) {
    case 'trap-gravity-too-strong':
      return `This trap cannot hold ${name} against gravity: it needs ≥ ${gradientText(i.needTPerM, 3, undefined, units.field)} along gravity (has ${gradientText(i.hasTPerM, 3, undefined, units.field)}).`;
    case 'trap-turning-point':
      return `The depth for ${name} is set by the turning point of its energy at ${fieldText(i.turningFieldT, TURNING_FIELD_DIGITS, undefined, units.field)}, where it becomes high-field seeking.`;
    case 'trap-bias-too-small':
      return `The bias at the minimum is too small for ${name}: its Larmor frequency ${frequencyText(i.larmorHz, 3)} is less than ${i.margin} × the highest trap frequency ${frequencyText(i.topHz, 3)}: Majorana losses.`;
    case 'trap-region-reaches-source': {
      const length = (m: number): string => regionLengthText(m, units.region);
      return `The trap region (radius ${length(i.radiusM)}) reaches a conductor ${length(i.nearestM)} from its centre: atoms would meet the hardware before the edge, and the field near a thin conductor grows without bound. Make the region smaller.`;
    }
  }
}

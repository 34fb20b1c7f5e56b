/**
 * One `trap-zero-field` finding per trap: the physics core reports each sublevel that sits at a
 * zero of the field on its own; a reader wants one line naming them all. When the file wrote a
 * cloud temperature the model could not use, the finding points at that value instead of asking
 * for a temperature.
 */
import type { Problem, Range } from '../format/ast';
import type { SublevelTrap, TrapIssue } from '../physics/traps';
import type { TrapModel } from '../model/trapTypes';
import { trimNumber } from './quantityText';

export const ZERO_FIELD_CODE = 'trap-zero-field';

/** "a", "a and b", "a, b and c". */
function listText(items: readonly string[]): string {
  return items.length <= 1 ? (items[0] ?? '') : `${items.slice(0, -1).join(', ')} and ${items.at(-1)}`;
}

/**
 * The merged finding for the trap's zero-field issues (all of one code), placed on the trap's name
 * like each of them was; `temperatureRange` is the written temperature the model could not use.
 */
export function zeroFieldProblem(trap: TrapModel, issues: readonly TrapIssue[], sublevels: readonly SublevelTrap[], severity: Problem['severity'], temperatureRange: Range | undefined): Problem {
  const names = issues.map((i) => i.sublevel ?? '?');
  const rates = issues.map((i) => sublevels.find((s) => `|${s.low.text}⟩` === i.sublevel)?.majorana?.rateHz);
  const verb = names.length === 1 ? 'sits' : 'sit';
  const head = `trap '${trap.name}': ${listText(names)} ${verb} at a zero of the field: the bias at the minimum is too small, Majorana spin flips lose atoms there`;
  let tail: string;
  if (rates.every((r) => r !== undefined)) {
    const each = rates.map((r, k) => `${trimNumber(r!, 2)} /s${names.length > 1 ? ` for ${names[k]}` : ''}`);
    tail = ` (about ${listText(each)} at the cloud temperature).`;
  } else if (temperatureRange) {
    tail = `; the cloud temperature written on line ${temperatureRange.start.line + 1} is not usable (see its own problem there), so there is no loss estimate: fix that value.`;
  } else {
    tail = '; give the cloud temperature for a loss estimate.';
  }
  return {
    code: ZERO_FIELD_CODE,
    severity,
    message: head + tail,
    range: trap.nameRange,
    ...(temperatureRange && !rates.every((r) => r !== undefined) ? { related: [{ message: 'the cloud temperature that could not be used', range: temperatureRange }] } : {}),
  };
}

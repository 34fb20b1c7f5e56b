/**
 * One finding per trap for what the physics core finds sublevel by sublevel (`trap-zero-field`,
 * `trap-majorana-slow`, `trap-cut-outside`): a reader wants one line naming the sublevels, each
 * with its own figure, not three lines saying the same thing. The core gives only the code, the
 * sublevel and its figure; this is the one place that words them. When the file wrote a cloud
 * temperature the model could not use, the zero-field finding points at that value instead of
 * asking for a temperature.
 */
import type { Problem, Range } from '../format/ast';
import type { SublevelFinding } from '../physics/traps';
import type { TrapModel } from '../model/trapTypes';
import { listWords } from '../physics/listWords';
import { trimNumber } from './quantityText';
import { cutEnergyText } from './trapText';

export const ZERO_FIELD_CODE = 'trap-zero-field';
export const MAJORANA_SLOW_CODE = 'trap-majorana-slow';
export const CUT_OUTSIDE_CODE = 'trap-cut-outside';

/** What a merged finding needs besides its findings (all of one code): where it goes and how severe it is. */
export interface MergePlace {
  trap: TrapModel;
  severity: Problem['severity'];
  range: Range;
  /** The written cloud temperature the model could not use (zero-field only). */
  temperatureRange?: Range;
  /** The unit the cut was written in, for the depths beside it (cut-outside only). */
  cutUnit?: string;
}

export function mergedTrapProblem(code: SublevelFinding['code'], issues: readonly SublevelFinding[], place: MergePlace): Problem {
  const names = issues.map((i) => i.sublevel);
  const base = { code, severity: place.severity, range: place.range };
  if (code === MAJORANA_SLOW_CODE) return { ...base, message: majoranaSlowText(place.trap, names, issues) };
  if (code === CUT_OUTSIDE_CODE) return { ...base, message: cutOutsideText(place.trap, names, issues, place.cutUnit) };
  return zeroFieldProblem(place.trap, names, issues, base, place.temperatureRange);
}

function zeroFieldProblem(trap: TrapModel, names: string[], issues: readonly SublevelFinding[], base: Pick<Problem, 'code' | 'severity' | 'range'>, temperatureRange: Range | undefined): Problem {
  const rates = issues.map((i) => i.majoranaRateHz);
  const verb = names.length === 1 ? 'sits' : 'sit';
  const head = `trap '${trap.name}': ${listWords(names, 'and')} ${verb} at a zero of the field: the bias at the minimum is too small, Majorana spin flips lose atoms there`;
  const rated = rates.every((r) => r !== undefined);
  let tail: string;
  if (rated) {
    const each = rates.map((r, k) => `${trimNumber(r!, 2)} /s${names.length > 1 ? ` for ${names[k]}` : ''}`);
    tail = ` (about ${listWords(each, 'and')} at the cloud temperature).`;
  } else if (temperatureRange) {
    tail = `; the cloud temperature written on line ${temperatureRange.start.line + 1} is not usable (see its own problem there), so there is no loss estimate: fix that value.`;
  } else {
    tail = '; give the cloud temperature for a loss estimate.';
  }
  return {
    ...base,
    message: head + tail,
    ...(temperatureRange && !rated ? { related: [{ message: 'the cloud temperature that could not be used', range: temperatureRange }] } : {}),
  };
}

/** Each sublevel's rate and lifetime; a slow rate always comes with its finding (physics/traps/trapSummary.ts). */
function majoranaSlowText(trap: TrapModel, names: string[], issues: readonly SublevelFinding[]): string {
  const verb = names.length === 1 ? 'sits' : 'sit';
  const each = issues.map((i, k) => {
    const r = i.majoranaRateHz!;
    const lifetime = `a lifetime of ${trimNumber(1 / r, 2)} s`;
    return names.length === 1 ? `${trimNumber(r, 2)} /s at the cloud temperature (${lifetime})` : `${trimNumber(r, 2)} /s for ${names[k]} (${lifetime})`;
  });
  return `trap '${trap.name}': ${listWords(names, 'and')} ${verb} at a zero of the field; Majorana spin flips lose about ${listWords(each, 'and')}${names.length === 1 ? '' : ' at the cloud temperature'}.`;
}

/** Each sublevel with its depth, in the unit the cut was written in so the two compare at a glance. */
function cutOutsideText(trap: TrapModel, names: string[], issues: readonly SublevelFinding[], cutUnit: string | undefined): string {
  const each = issues.map((i, k) => (i.depthJ !== undefined ? `${names[k]} (depth ${cutEnergyText(i.depthJ, cutUnit)})` : names[k]!));
  const them = names.length === 1 ? 'it' : 'them';
  return `trap '${trap.name}': the RF cut is above the trap's depth for ${listWords(each, 'and')}: for ${them} the knife cuts nothing the edge does not.`;
}

/** Finding named sublevels in a solved level, and the checks on user pair references. */
import { solveLevel } from '../engine';
import type { LevelSpec, SublevelState } from '../engine';
import { issue } from './issueValues';
import { lowKey, refKey } from './sublevelTag';
import type { SublevelPair, TransitionIssue } from './types';

export interface PairKeys {
  lower: string;
  upper: string;
}

export function pairKeys(pair: SublevelPair | undefined, issues: TransitionIssue[]): PairKeys | null {
  const lower = pair && typeof pair === 'object' ? refKey(pair.lower) : null;
  const upper = pair && typeof pair === 'object' ? refKey(pair.upper) : null;
  if (lower === null || upper === null) {
    issues.push(
      issue('error', 'pair-bad-ref', 'A sublevel pair needs {twoF, twoMF} (hyperfine level) or {twoJ, twoMJ, twoMI?} (fine term) for both ends.'),
    );
    return null;
  }
  if (lower === upper) {
    issues.push(issue('error', 'pair-same-state', 'Both ends of the pair name the same sublevel.'));
    return null;
  }
  return { lower, upper };
}

/** States of a solved level by their low-field key. */
export function statesByKey(states: readonly SublevelState[]): Map<string, SublevelState> {
  const map = new Map<string, SublevelState>();
  for (const s of states) map.set(lowKey(s.low), s);
  return map;
}

/** Both states of the pair at one field, or null (solver failure or unknown names). */
export function solvePair(spec: LevelSpec, fieldT: number, keys: PairKeys): { lower: SublevelState; upper: SublevelState } | null {
  const byKey = statesByKey(solveLevel(spec, fieldT).states);
  const lower = byKey.get(keys.lower);
  const upper = byKey.get(keys.upper);
  return lower && upper ? { lower, upper } : null;
}

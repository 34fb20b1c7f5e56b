/**
 * Fields at which a transition of one level is resonant with a given frequency. One
 * sweep gives every sublevel energy on a grid; for each candidate pair (Δm = 0, ±1, and
 * Δm = ±2 between different F when two-photon lines are asked for) the difference
 * E_b − E_a ∓ f is scanned for sign changes and refined on the exact engine, to a few ulps
 * of the field (far below 1e-12 relative). A root is kept only if the pair has a matrix
 * element there (same threshold as `magneticTransitions`).
 */
import { solveLevel, sweepLevel } from '../engine';
import type { LevelSpec, SweptState } from '../engine';
import { issue } from './issueValues';
import { transitionsAmong } from './magneticTransitions';
import { pairKeys, solvePair, type PairKeys } from './pairStates';
import { checkRange, MAX_SCAN_WORK, rootsOnGrid } from './rootScan';
import { coupledMomentum, lowKey } from './sublevelTag';
import type { FieldRange, Resonance, ResonanceOptions, ResonanceResult, TransitionIssue } from './types';

function candidatePairs(states: readonly SweptState[], twoPhoton: boolean): [SweptState, SweptState][] {
  const out: [SweptState, SweptState][] = [];
  for (let i = 0; i < states.length; i++) {
    for (let j = i + 1; j < states.length; j++) {
      const a = states[i];
      const b = states[j];
      const d = Math.abs(a.twoM - b.twoM);
      if (d <= 2 || (twoPhoton && d === 4 && coupledMomentum(a.low) !== coupledMomentum(b.low))) out.push([a, b]);
    }
  }
  return out;
}

export function resonanceFields(
  spec: LevelSpec,
  frequencyHz: number,
  range: FieldRange,
  opts: ResonanceOptions = {},
): ResonanceResult {
  const issues: TransitionIssue[] = [];
  if (!Number.isFinite(frequencyHz) || frequencyHz <= 0) {
    issues.push(issue('error', 'resonance-bad-frequency', 'The frequency must be a positive number of hertz.'));
    return { resonances: [], issues };
  }
  const grid = checkRange(range, issues);
  let only: PairKeys | null = null;
  if (opts.pair !== undefined) {
    only = pairKeys(opts.pair, issues);
    if (!only) return { resonances: [], issues };
  }
  if (!grid) return { resonances: [], issues };

  const sweep = sweepLevel(spec, grid.fromT, grid.toT, grid.points, { crossings: false });
  issues.push(...sweep.issues);
  if (sweep.states.length === 0) return { resonances: [], issues };
  const twoPhoton = opts.twoPhoton === true;
  let pairs = candidatePairs(sweep.states, twoPhoton || only !== null);
  if (only) {
    const wanted = new Set([only.lower, only.upper]);
    pairs = pairs.filter(([a, b]) => wanted.has(lowKey(a.low)) && wanted.has(lowKey(b.low)));
    if (pairs.length === 0) {
      issues.push(issue('error', 'pair-not-found', 'The level has no such pair of sublevels, or their m differ by more than 2.'));
      return { resonances: [], issues };
    }
  }
  if (pairs.length * grid.points > MAX_SCAN_WORK) {
    issues.push(issue('error', 'scan-too-costly', `${pairs.length} pairs × ${grid.points} points is too much work; narrow the range or use fewer points.`));
    return { resonances: [], issues };
  }

  const resonances: Resonance[] = [];
  const seen = new Set<string>();
  const ys = new Float64Array(grid.points);
  for (const [a, b] of pairs) {
    const keys = { lower: lowKey(a.low), upper: lowKey(b.low) };
    for (const sign of [1, -1]) {
      const target = sign * frequencyHz;
      for (let i = 0; i < grid.points; i++) ys[i] = b.energyHz[i] - a.energyHz[i] - target;
      const diffAt = (field: number): number => {
        const p = solvePair(spec, field, keys);
        return p ? p.upper.energyHz - p.lower.energyHz - target : Number.NaN;
      };
      for (const fieldT of rootsOnGrid(sweep.fieldsT, ys, diffAt, 1e-13 * frequencyHz, 1e-15 * frequencyHz)) {
        const solved = solveLevel(spec, fieldT).states;
        const t = transitionsAmong(solved, spec, { twoPhoton: twoPhoton || only !== null, dropBelow: opts.dropBelow }).find(
          (x) => [lowKey(x.lower.low), lowKey(x.upper.low)].sort().join('|') === [keys.lower, keys.upper].sort().join('|'),
        );
        const id = `${[keys.lower, keys.upper].sort().join('|')}@${fieldT}`;
        if (t && !seen.has(id)) {
          seen.add(id);
          resonances.push({ fieldT, transition: t });
        }
      }
    }
  }
  resonances.sort((x, y) => x.fieldT - y.fieldT || x.transition.frequencyHz - y.transition.frequencyHz);
  if (resonances.length === 0) {
    issues.push(issue('info', 'no-resonance', 'No transition of this level reaches that frequency in the field range (two crossings within one scan step would be missed; use more points).'));
  }
  return { resonances, issues };
}

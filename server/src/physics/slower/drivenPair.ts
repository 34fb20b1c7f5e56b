/**
 * The pair of sublevels a circularly polarised slowing beam drives, and its Zeeman shift rate
 * from the exact engine. On a J → J+1 line the σ+ pair |m = I+J⟩ → |m = I+J+1⟩ is the only state
 * of its m block at both ends, so its energies are exactly linear in B and the rate is the same
 * at every field (the engine confirms it at the fields asked for). On other lines the stretched
 * lower sublevel has no upper sublevel one step up: σ light pumps atoms into it and they go dark.
 */
import { PLANCK_H } from '../constants';
import { solveLevel } from '../engine/solveLevel';
import type { LevelSpec, SublevelState } from '../engine/types';
import { issue } from './issue';
import type { SlowerIssue } from './types';

/** Which end of the m ladder: `top` is driven by σ+, `bottom` by σ− (polarisation relative to +z). */
export type PairSide = 'top' | 'bottom';

export interface DrivenPair {
  side: PairSide;
  lowerLabel: string;
  upperLabel: string;
  /** Both ends are stretched states (the line cycles). */
  cycling: boolean;
  /** d(ν_upper − ν_lower)/dB = (μ_lower − μ_upper)/h at each field asked for, Hz/T. */
  ratesHzPerT: number[];
  fieldsT: number[];
}

function labelOf(s: SublevelState): string {
  return s.low.text;
}

/** The state of a list with the given twice-m and the largest low-field F (or J) label. */
function topOfBlock(states: SublevelState[], twoM: number): SublevelState | undefined {
  const key = (s: SublevelState): number => (s.low.scheme === 'F' ? s.low.twoF : s.low.twoJ);
  return states.filter((s) => s.twoM === twoM).sort((a, b) => key(b) - key(a))[0];
}

/**
 * The driven pair at each field in `fieldsT` (at least one). Lines that do not cycle give the pair
 * one step in from the stretched lower sublevel and a `slower-not-cycling` issue naming the dark one.
 */
export function drivenPair(lower: LevelSpec, upper: LevelSpec, side: PairSide, fieldsT: readonly number[]): { pair?: DrivenPair; issues: SlowerIssue[] } {
  const issues: SlowerIssue[] = [];
  const step = side === 'top' ? 2 : -2;
  const pick = (xs: number[]): number => (side === 'top' ? Math.max(...xs) : Math.min(...xs));
  const rates: number[] = [];
  let pair: DrivenPair | undefined;
  for (const B of fieldsT) {
    const lo = solveLevel(lower, B);
    const up = solveLevel(upper, B);
    if (lo.states.length === 0 || up.states.length === 0) {
      issues.push(issue('error', 'slower-no-sublevels', 'the engine gave no sublevels for an end of the line'));
      return { issues };
    }
    const stretchedLower = pick(lo.states.map((s) => s.twoM));
    const upperEnd = pick(up.states.map((s) => s.twoM));
    const cycling = upperEnd === stretchedLower + step;
    const twoMLower = cycling ? stretchedLower : upperEnd - step;
    const l = topOfBlock(lo.states, twoMLower);
    const u = topOfBlock(up.states, twoMLower + step);
    if (!l || !u) {
      issues.push(issue('error', 'slower-no-pair', `no ${side === 'top' ? 'σ+' : 'σ−'} pair of sublevels joins the two levels`));
      return { issues };
    }
    if (!pair) {
      pair = { side, lowerLabel: labelOf(l), upperLabel: labelOf(u), cycling, ratesHzPerT: rates, fieldsT: [...fieldsT] };
      if (!cycling) {
        const dark = topOfBlock(lo.states, stretchedLower)!;
        issues.push(
          issue(
            'warning',
            'slower-not-cycling',
            `${side === 'top' ? 'σ+' : 'σ−'} light pumps the atoms into ${labelOf(dark)} of the lower level, and no upper sublevel is one step of m away from it (the upper level ends at m = ${halfText(upperEnd)}): the atoms go dark, so the line does not cycle (it needs J_upper = J_lower + 1)`,
          ),
        );
      }
    }
    rates.push((l.momentJT - u.momentJT) / PLANCK_H);
  }
  return { pair, issues };
}

/** Largest relative difference of the rates from the first one (0 for a stretched pair, to round-off). */
export function rateSpread(pair: DrivenPair): number {
  const r0 = pair.ratesHzPerT[0]!;
  return Math.max(...pair.ratesHzPerT.map((r) => Math.abs(r - r0) / Math.abs(r0)));
}

function halfText(twoM: number): string {
  const sign = twoM > 0 ? '+' : twoM < 0 ? '−' : '';
  const a = Math.abs(twoM);
  return `${sign}${a % 2 === 0 ? a / 2 : `${a}/2`}`;
}

/**
 * Exact sublevels of one level at one working field, from the any-field engine, with the regime
 * verdict that tells whether the weak-field (linear) picture still holds.
 */
import { buildLevelModel, regime, solveLevel, type LevelSpec, type SolveResult, type SublevelState } from '../physics/engine';
import { BOHR_MAGNETON } from '../physics/constants';
import { signedHalfText } from './halves';
import { defineRegimeLimits } from './regimeLimits';
import type { ExactSublevelResult, RegimeResultJson } from './resultTypes';

export interface ExactAtField {
  exact: ExactSublevelResult[];
  regime?: RegimeResultJson;
  /** Engine errors (size caps, a solver failure), with their engine codes. */
  errors: { code: string; message: string }[];
  /** The engine's warnings and notes (e.g. degenerate states), with their engine codes. */
  notices: { code: string; severity: 'warning' | 'info'; message: string }[];
}

/**
 * Results by (level spec, field): a file repeats levels (the same term and constants in many
 * species) and an evaluation visits each at every working field, so equal ones are solved once.
 * The entry is shared: callers copy the states before changing them (a level's tables,
 * eval/levelTables.ts, copy them when first read). Bounded: the least recently used go first.
 * A J level's entry keeps the engine's own solution beside it, so a line between two levels
 * reuses their solves at that field instead of solving both again (`solvedAtField`); lines join
 * J levels only, so a whole term's large eigenvectors are not kept.
 */
const MEMO_ENTRIES = 4096;
const memo = new Map<string, { result: ExactAtField; solved?: SolveResult }>();

function memoKey(spec: LevelSpec, fieldT: number): string {
  return spec.kind === 'hyperfine'
    ? `h|${spec.twoJ}|${spec.twoI}|${spec.gJ}|${spec.gI}|${spec.A}|${spec.B}|${spec.C}|${fieldT}`
    : spec.kind === 'fine'
      ? `f|${spec.twoS}|${spec.L}|${spec.zeta}|${spec.gL}|${spec.gS}|${spec.twoI}|${spec.gI}|${fieldT}`
      : // A whole term carries lists (E_J, A_J, B_J) and ⟨r²⟩: all of it tells two terms apart.
        `t|${JSON.stringify(spec)}|${fieldT}`;
}

/** The states and regime of `spec` at `fieldT`; shared with every equal call, so read only. */
export function exactAtField(spec: LevelSpec, fieldT: number): ExactAtField {
  const key = memoKey(spec, fieldT);
  let known = memo.get(key);
  if (known) memo.delete(key);
  else known = solveExactAtField(spec, fieldT);
  memo.set(key, known);
  if (memo.size > MEMO_ENTRIES) memo.delete(memo.keys().next().value!);
  return known.result;
}

/**
 * The engine's solution of `spec` at `fieldT`: the one `exactAtField` made when it is still
 * remembered, else solved here (not remembered). Shared, so read only.
 */
export function solvedAtField(spec: LevelSpec, fieldT: number): SolveResult {
  return memo.get(memoKey(spec, fieldT))?.solved ?? solveLevel(spec, fieldT);
}

function solveExactAtField(spec: LevelSpec, fieldT: number): { result: ExactAtField; solved?: SolveResult } {
  // One model for both: building a large level's model costs as much as solving it once.
  const built = buildLevelModel(spec);
  const solved = solveLevel(spec, fieldT, built);
  const result = exactFromSolved(spec, fieldT, built, solved);
  return spec.kind === 'hyperfine' ? { result, solved } : { result };
}

function exactFromSolved(spec: LevelSpec, fieldT: number, built: ReturnType<typeof buildLevelModel>, solved: SolveResult): ExactAtField {
  const noNucleus = spec.kind === 'hyperfine' && spec.twoI === 0;
  const errors = solved.issues.filter((i) => i.severity === 'error').map((i) => ({ code: i.code, message: i.message }));
  const notices = solved.issues.flatMap((i) => (i.severity === 'error' ? [] : [{ code: i.code, severity: i.severity, message: i.message }]));
  if (errors.length > 0) return { exact: [], errors, notices };
  // A level without zero-field structure has exactly linear energies in this single-level model: no regime to judge.
  if (!hasZeroFieldStructure(spec)) return { exact: solved.states.map((s) => toJson(s, noNucleus)), errors: [], notices };
  const r = regime(spec, fieldT, undefined, built);
  // The limits stay unsearched until read (JSON output, a regime note, a hover): `check` of a file
  // at lab fields needs only the verdict (physics/engine/regime.ts, docs/speed.md).
  let regimeJson: RegimeResultJson | undefined;
  if (!r.issues.some((i) => i.severity === 'error')) {
    // The limits stand in their places (key order) and are searched when first read (eval/regimeLimits.ts).
    regimeJson = { x: Number.isFinite(r.x) ? r.x : null, verdict: r.verdict, linear_limit_T: null, strong_limit_T: null, fraction: r.fraction };
    defineRegimeLimits(regimeJson, r, spec, fieldT);
  }
  return { exact: solved.states.map((s) => toJson(s, noNucleus)), ...(regimeJson ? { regime: regimeJson } : {}), errors: [], notices };
}

function hasZeroFieldStructure(spec: LevelSpec): boolean {
  if (spec.kind === 'fine') return spec.zeta !== 0 && spec.L > 0 && spec.twoS > 0;
  if (spec.kind === 'term') return true;
  return spec.twoI > 0 && spec.twoJ > 0 && (spec.A !== 0 || (spec.B ?? 0) !== 0 || (spec.C ?? 0) !== 0);
}

function toJson(s: SublevelState, noNucleus: boolean): ExactSublevelResult {
  return {
    low_label: s.low.text,
    high_label: s.high.text,
    ...(s.low.scheme === 'F' && !noNucleus ? { F: s.low.twoF / 2 } : { J: (s.low.scheme === 'F' ? s.low.twoF : s.low.twoJ) / 2 }),
    m: s.twoM / 2,
    ...(s.low.scheme === 'J' && s.low.twoMI !== null ? { m_I: s.low.twoMI / 2 } : {}),
    m_text: signedHalfText(s.twoM),
    energy_Hz: s.energyHz,
    moment_J_per_T: s.momentJT,
    moment_bohr: s.momentJT / BOHR_MAGNETON,
    d2E_dB2_Hz_per_T2: s.d2EdB2,
  };
}

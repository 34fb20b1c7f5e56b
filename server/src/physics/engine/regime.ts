/**
 * Which regime a field puts a level in, and where the simple formulas stop
 * being good enough.
 *
 * x = |g_a − g_b| μ_B |B| / (h ΔE), with ΔE the zero-field spread of the
 * level's structure (hyperfine: E(F_max) − E(F_min) spread, g_a − g_b = g_J − g_I;
 * fine: spread of the J levels, g_S − g_L). For J = 1/2 this is the
 * Breit–Rabi x.
 *
 * linearLimitT: the lowest field where the linear formula E(F) + g_F m_F μ_B B
 * misses some sublevel by more than `fraction` × the largest linear Zeeman
 * shift in the level (max |g_F m_F| μ_B B).
 * strongLimitT: the field above which the strong-field formula (diagonal of
 * the couplings + Zeeman) is within `fraction` × ΔE for every sublevel.
 * Verdict: weak at or below linearLimitT, strong at or above strongLimitT,
 * intermediate between. Limits: log-spaced scan, then bisection in log B to 1e-7.
 */
import { BOHR_MAGNETON_HZ_PER_T } from '../constants';
import { makeWorkspace, solveBlockAt } from './blockSolver';
import { buildLevelModel, type ModelResult } from './buildModel';
import { issue } from './issues';
import type { LevelModel } from './levelModel';
import { MAX_SWEEP_WORK } from './limits';
import type { EngineIssue, LevelSpec, RegimeResult, RegimeVerdict } from './types';
import { checkField } from './validateSpec';
import { linearProvenBetween } from './weakFieldBound';

/** Scan from 1e-9 to 1e6 times the characteristic field, four steps per decade. */
const STEPS_PER_DECADE = 4;
const SCAN_LO = -9 * STEPS_PER_DECADE;
const SCAN_HI = 6 * STEPS_PER_DECADE;

/**
 * Module-internal switch, not a user option: tests turn the weak-field bound off to check that the
 * limits and verdicts are the same numbers without it (tests/physics/weakFieldBound.test.ts).
 */
export const REGIME_INTERNALS = { useWeakFieldBound: true };

interface FormulaErrors {
  linear: number;
  strong: number;
}

/** Largest misses of the two simple formulas at a positive field (NaN if the solver fails). */
function formulaErrors(model: LevelModel, fieldT: number, ws: ReturnType<typeof makeWorkspace>): FormulaErrors {
  let linear = 0;
  let strong = 0;
  for (const block of model.blocks) {
    if (!solveBlockAt(block, fieldT, ws)) return { linear: Number.NaN, strong: Number.NaN };
    for (let k = 0; k < block.size; k++) {
      const low = block.low[0][k];
      const high = block.high[0][k];
      linear = Math.max(linear, Math.abs(ws.values[k] - (low.zeroFieldHz + low.slopeHzPerT * fieldT)));
      strong = Math.max(strong, Math.abs(ws.values[k] - (high.diagonalHz + high.slopeHzPerT * fieldT)));
    }
  }
  return { linear, strong };
}

/** Bisect on log B between a field where `fails` is `atLo` and one where it is not. */
function bisectLog(lo: number, hi: number, fails: (b: number) => boolean, atLo: boolean): number {
  for (let it = 0; it < 60 && hi / lo > 1 + 1e-7; it++) {
    const mid = Math.sqrt(lo * hi);
    if (fails(mid) === atLo) lo = mid;
    else hi = mid;
  }
  return Math.sqrt(lo * hi);
}

function characteristicField(model: LevelModel, gDiff: number): number {
  const spread = model.zeroFieldSpreadHz;
  if (spread > 0 && gDiff > 0) return spread / (gDiff * BOHR_MAGNETON_HZ_PER_T);
  return 1;
}

function verdictFor(b: number, linearLimitT: number, strongLimitT: number): RegimeVerdict {
  if (b <= linearLimitT) return 'weak field (linear)';
  if (b >= strongLimitT) return 'strong field (Paschen–Back / decoupled)';
  return 'intermediate';
}

/** `built` is the spec's model when the caller already has it (it is not changed). */
export function regime(spec: LevelSpec, fieldT: number, fraction = 0.01, built: ModelResult = buildLevelModel(spec)): RegimeResult {
  const model = built.model;
  const issues = [...built.issues];
  const empty = (msgs: EngineIssue[]): RegimeResult => ({
    x: Number.NaN,
    verdict: 'intermediate',
    linearLimitT: Number.NaN,
    strongLimitT: Number.NaN,
    zeroFieldSpreadHz: Number.NaN,
    fraction,
    issues: msgs,
  });
  if (!model) return empty(issues);
  if (!checkField(fieldT, 'field', issues)) return empty(issues);
  if (!(fraction > 0 && fraction < 1)) {
    issues.push(issue('error', 'bad-fraction', 'The accuracy fraction must be between 0 and 1 (for example 0.01 for 1 %).'));
    return empty(issues);
  }
  const s = model.spec;
  const gDiff = s.kind === 'hyperfine' ? Math.abs(s.gJ - s.gI) : Math.abs(s.gS - s.gL);
  const spread = model.zeroFieldSpreadHz;
  const b = Math.abs(fieldT);
  const x = spread > 0 ? (gDiff * BOHR_MAGNETON_HZ_PER_T * b) / spread : b === 0 ? 0 : Number.POSITIVE_INFINITY;
  if (spread === 0) {
    issues.push(
      issue('info', 'no-zero-field-structure', 'This level has no zero-field splitting, so x is not finite; the limits below say whether the simple formulas hold.'),
    );
  }

  let cubes = 0;
  for (const blk of model.blocks) cubes += blk.size ** 3;
  if (cubes * (SCAN_HI - SCAN_LO + 60) > MAX_SWEEP_WORK) {
    issues.push(issue('info', 'regime-limits-skipped', 'The level is too large to search for the regime limits; only x is given.'));
    const v: RegimeVerdict = x < 0.01 ? 'weak field (linear)' : x > 100 ? 'strong field (Paschen–Back / decoupled)' : 'intermediate';
    return { x, verdict: v, linearLimitT: Number.NaN, strongLimitT: Number.NaN, zeroFieldSpreadHz: spread, fraction, issues };
  }

  const search = limitSearch(model, fraction, characteristicField(model, gDiff));
  // A field at or below the linear limit is weak whatever the strong limit is (verdictFor).
  const verdict = search.linearHoldsAt(b) ? 'weak field (linear)' : verdictFor(b, search.linearLimit(), search.strongLimit());
  return {
    x,
    verdict,
    get linearLimitT() {
      return search.linearLimit();
    },
    get strongLimitT() {
      return search.strongLimit();
    },
    zeroFieldSpreadHz: spread,
    fraction,
    issues,
  };
}

interface LimitSearch {
  /** True when the field is known to be at or below the linear limit; found with the fewest solves. */
  linearHoldsAt(b: number): boolean;
  linearLimit(): number;
  strongLimit(): number;
}

/**
 * The two limits, each searched only when first asked for. The verdict at a weak field needs the
 * linear scan only up to that field (a fifth of the solves for a small file at a lab field: the
 * CLI's start-up, docs/speed.md); the rest of the scan, its bisection and the strong search run
 * when a limit is read. Every solve is a pure function of the field, so the limits are the same
 * numbers, in any order of asking, as a search run from start to end.
 */
function limitSearch(model: LevelModel, fraction: number, bc: number): LimitSearch {
  let maxSlope = 0;
  for (const blk of model.blocks) for (const low of blk.low[0]) maxSlope = Math.max(maxSlope, Math.abs(low.slopeHzPerT));
  const spread = model.zeroFieldSpreadHz;
  const ws = makeWorkspace(model.largestBlock);
  const linearFails = (f: number): boolean => !(formulaErrors(model, f, ws).linear <= fraction * maxSlope * f);
  const strongFails = (f: number): boolean => !(formulaErrors(model, f, ws).strong <= fraction * spread);
  const at = (k: number): number => bc * 10 ** (k / STEPS_PER_DECADE);

  // The linear scan goes up from SCAN_LO; `passed` is the last step known to pass.
  let passed = SCAN_LO - 1;
  let linearLimitT: number | undefined;
  /** Scans on until the limit is known or, given `b`, a passing step at or above b. */
  const scanLinear = (b?: number): void => {
    while (linearLimitT === undefined) {
      const k = passed + 1;
      if (k > SCAN_HI) {
        linearLimitT = Number.POSITIVE_INFINITY;
        return;
      }
      if (linearFails(at(k))) {
        linearLimitT = k === SCAN_LO ? 0 : bisectLog(at(k - 1), at(k), linearFails, false);
        return;
      }
      passed = k;
      if (b !== undefined && at(k) >= b) return;
    }
  };
  let strongLimitT: number | undefined;
  const scanStrong = (): number => {
    let limit = 0;
    for (let k = SCAN_HI; k >= SCAN_LO; k--) {
      if (strongFails(at(k))) {
        limit = k === SCAN_HI ? Number.POSITIVE_INFINITY : bisectLog(at(k), at(k + 1), strongFails, true);
        break;
      }
    }
    return limit;
  };
  /** The first step at or above b, if the scan reaches that far. */
  const stepAtOrAbove = (b: number): number | undefined => {
    let k = Math.max(SCAN_LO, Math.ceil(Math.log10(b / bc) * STEPS_PER_DECADE) - 1);
    while (k <= SCAN_HI && at(k) < b) k++;
    while (k > SCAN_LO && at(k - 1) >= b) k--;
    return k <= SCAN_HI ? k : undefined;
  };
  return {
    linearHoldsAt(b) {
      // Steps that a bound proves to pass need no solve; they pass all the same, so the limits do not move (weakFieldBound.ts).
      if (REGIME_INTERNALS.useWeakFieldBound && linearLimitT === undefined && passed < SCAN_LO) {
        const k = stepAtOrAbove(b);
        if (k !== undefined && linearProvenBetween(model, fraction, maxSlope, at(SCAN_LO), at(k))) passed = k;
      }
      if (linearLimitT === undefined && passed >= SCAN_LO && at(passed) >= b) return true;
      scanLinear(b);
      // A passing step at or above b puts the limit, which lies above every passing step, above b too.
      return linearLimitT === undefined ? true : b <= linearLimitT;
    },
    linearLimit() {
      scanLinear();
      return linearLimitT!;
    },
    strongLimit() {
      strongLimitT ??= scanStrong();
      return strongLimitT;
    },
  };
}

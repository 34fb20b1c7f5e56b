/**
 * Inverse problem: the smallest field gradient, magnet length or drift at which every
 * pair of neighbouring peaks passes the dip criterion. The peaks (which sublevels
 * belong together) are fixed from the pattern at the upper bound, so shrinking the
 * parameter cannot "solve" the problem by merging peaks. A log-spaced scan finds the
 * first resolving value, then bisection (in log space) narrows the step below it.
 * The verdict is assumed to change once across that step; the scan guards against
 * an occasional non-monotonic dip ratio (e.g. a third peak's tail filling a dip).
 */
import { computePattern, type DetectorPattern, type PatternInput } from './detectorPattern';
import { beamIssue, hasBeamError, type BeamGeometry, type BeamIssue } from './types';

export type ResolvingParameter = 'gradient' | 'magnetLength' | 'drift';

export interface ResolveSearchOptions {
  /** Largest value allowed (T/m for the gradient, m for lengths); must be > 0. */
  upperBound: number;
  /** Smallest value tried (default upperBound × 1e-4; 0 is allowed for the drift). */
  lowerBound?: number;
  /** Points of the log-spaced scan (default 24). */
  scanPoints?: number;
  /** Relative width of the final bracket (default 1e-4). */
  relativeTolerance?: number;
  /** Sublevel groups that make the peaks (default: as the pattern at the upper bound groups them). */
  groups?: number[][];
}

export interface ResolveSearchResult {
  parameter: ResolvingParameter;
  /** The smallest resolving value found (gradient carries the sign of the input gradient). */
  value?: number;
  /** Dip ratios of the neighbouring pairs at `value` (or at the upper bound when none resolves). */
  dipRatios: number[];
  /** Member labels of each peak, as fixed at the upper bound. */
  peaks: string[][];
  /** Patterns computed. */
  evaluations: number;
  issues: BeamIssue[];
}

const KEY: Record<ResolvingParameter, keyof BeamGeometry> = {
  gradient: 'gradientTPerM',
  magnetLength: 'magnetLengthM',
  drift: 'driftM',
};

function withParameter(input: PatternInput, parameter: ResolvingParameter, value: number): PatternInput {
  const sign = parameter === 'gradient' && input.geometry.gradientTPerM < 0 ? -1 : 1;
  return { ...input, geometry: { ...input.geometry, [KEY[parameter]]: sign * value } };
}

export function smallestResolvingValue(
  input: PatternInput,
  parameter: ResolvingParameter,
  opts: ResolveSearchOptions,
): ResolveSearchResult {
  const result: ResolveSearchResult = { parameter, dipRatios: [], peaks: [], evaluations: 0, issues: [] };
  const upper = opts.upperBound;
  const lower = opts.lowerBound ?? upper * 1e-4;
  const scanPoints = opts.scanPoints ?? 24;
  const tol = opts.relativeTolerance ?? 1e-4;
  if (!(Number.isFinite(upper) && upper > 0) || !(Number.isFinite(lower) && lower >= 0 && lower < upper)) {
    result.issues.push(
      beamIssue('error', 'beam-search-bounds-invalid', `The search needs 0 ≤ lower < upper with finite bounds (got ${lower} … ${upper}).`),
    );
    return result;
  }
  if (!(Number.isInteger(scanPoints) && scanPoints >= 2) || !(tol > 0 && tol < 1)) {
    result.issues.push(beamIssue('error', 'beam-option-invalid', 'The scan needs at least 2 points and a tolerance in (0, 1).'));
    return result;
  }
  const top = computePattern(withParameter(input, parameter, upper), opts.groups, false);
  result.evaluations++;
  if (hasBeamError(top.issues)) {
    result.issues.push(...top.issues);
    return result;
  }
  const groups = opts.groups ?? top.peaks.map((p) => p.memberIndices);
  result.peaks = top.peaks.map((p) => p.members);
  if (groups.length < 2 && top.mergedLonePeak) {
    // One merged peak: the sublevels deflect differently, but not far enough apart even at the bound.
    result.issues.push(
      beamIssue('warning', 'beam-unresolvable-within-bound', `Even at the upper bound (${upper}) all populated sublevels land in one peak, although they deflect differently.`),
    );
    return result;
  }
  if (groups.length < 2) {
    result.dipRatios = [];
    result.issues.push(
      beamIssue(
        'warning',
        'beam-nothing-to-resolve',
        `Even at the upper bound (${upper}) all populated sublevels form a single peak and deflect alike, so there is nothing to resolve.`,
      ),
    );
    return result;
  }
  const resolvedAt = (value: number): DetectorPattern => {
    result.evaluations++;
    return computePattern(withParameter(input, parameter, value), groups, false);
  };
  if (!top.allResolved) {
    result.dipRatios = top.pairs.map((p) => p.dipRatio);
    const worst = Math.max(...result.dipRatios);
    result.issues.push(
      beamIssue(
        'warning',
        'beam-unresolvable-within-bound',
        `The peaks are not all resolved even at the upper bound ${upper} (worst dip ratio ${worst.toFixed(3)}).`,
      ),
    );
    return result;
  }
  const accept = (value: number, p: DetectorPattern): ResolveSearchResult => {
    const sign = parameter === 'gradient' && input.geometry.gradientTPerM < 0 ? -1 : 1;
    result.value = sign * value;
    result.dipRatios = p.pairs.map((q) => q.dipRatio);
    return result;
  };
  if (lower === 0) {
    const p0 = resolvedAt(0);
    if (!hasBeamError(p0.issues) && p0.allResolved) return accept(0, p0);
  }
  const start = lower > 0 ? lower : upper * 1e-4;
  const ratio = upper / start;
  let prev = start;
  let found: { value: number; pattern: DetectorPattern } | undefined;
  for (let i = 0; i < scanPoints; i++) {
    const value = i === scanPoints - 1 ? upper : start * Math.pow(ratio, i / (scanPoints - 1));
    const p = i === scanPoints - 1 ? top : resolvedAt(value);
    if (!hasBeamError(p.issues) && p.allResolved) {
      found = { value, pattern: p };
      break;
    }
    prev = value;
  }
  if (!found) return result; // unreachable: the upper bound resolves
  if (found.value === start) {
    result.issues.push(
      beamIssue('info', 'beam-resolved-at-lower-bound', `Already resolved at the lower bound ${start}; the true minimum may be smaller.`),
    );
    return accept(found.value, found.pattern);
  }
  let lo = prev;
  let hi = found.value;
  let best = found.pattern;
  while (hi / lo - 1 > tol) {
    const mid = Math.sqrt(lo * hi);
    const p = resolvedAt(mid);
    if (!hasBeamError(p.issues) && p.allResolved) {
      hi = mid;
      best = p;
    } else lo = mid;
  }
  return accept(hi, best);
}

export function smallestResolvingGradient(input: PatternInput, opts: ResolveSearchOptions): ResolveSearchResult {
  return smallestResolvingValue(input, 'gradient', opts);
}

export function smallestResolvingMagnetLength(input: PatternInput, opts: ResolveSearchOptions): ResolveSearchResult {
  return smallestResolvingValue(input, 'magnetLength', opts);
}

export function smallestResolvingDrift(input: PatternInput, opts: ResolveSearchOptions): ResolveSearchResult {
  return smallestResolvingValue(input, 'drift', opts);
}

/**
 * Every Zeeman component of an electric-dipole line between two levels of one species
 * (same nucleus) at one field: frequency offset, polarisation, strength from the engine
 * eigenvectors, intensities along and across the field, and the effective Landé factor.
 *
 * Normalisation: strength = (2J_u + 1)|<l|d_q|u>|²/|<J_u||d||J_l>|². Because
 * Σ_{m_J, q} (J_u 1 J_l; −m_u q m_J)² = 1/(2J_u + 1), the components out of every upper
 * sublevel sum to exactly 1 at any field (its decay branching fractions). The largest
 * deviation is reported as `sumRuleDeviation` and checked.
 */
import { solveLevel } from '../engine';
import type { HyperfineLevelSpec, SublevelState } from '../engine';
import { acrossFieldWeight, alongFieldWeight, polarizationOf } from './emissionPattern';
import { addToCentroid, effectiveLandeFactor, emptyCentroidSums, landeFromSums } from './effectiveLande';
import { dipoleAmplitude } from './electricDipoleElement';
import { fromLevel, hasError, issue } from './issueValues';
import { selectionRules } from './selectionRules';
import { tagOf } from './sublevelTag';
import type { DipoleComponent, DipoleLineOptions, DipoleLineResult, TransitionIssue } from './types';

/** Field used for the centroid g_eff when the requested field is (nearly) zero, T. */
export const CENTROID_PROBE_T = 1e-3;
const SUM_RULE_TOLERANCE = 1e-9;

function empty(fieldT: number, issues: TransitionIssue[]): DipoleLineResult {
  return { fieldT, components: [], gEff: null, lineCentreHz: null, sumRuleDeviation: 0, issues };
}

function checkPair(lower: HyperfineLevelSpec, upper: HyperfineLevelSpec, issues: TransitionIssue[]): boolean {
  let kindOk = true;
  for (const [which, s] of [['lower', lower], ['upper', upper]] as const) {
    if (s === null || typeof s !== 'object' || s.kind !== 'hyperfine') {
      issues.push(issue('error', 'line-level-kind', `The ${which} level must be a hyperfine level (J, I, A, B, g_J).`));
      kindOk = false;
    }
  }
  if (!kindOk) return false;
  if (lower.twoI !== upper.twoI) {
    issues.push(issue('error', 'line-nucleus-mismatch', 'Both levels of a line belong to one atom: their nuclear spins I must be equal.'));
    return false;
  }
  const dTwoJ = Math.abs(upper.twoJ - lower.twoJ);
  if (Number.isInteger(dTwoJ) && dTwoJ % 2 !== 0) {
    issues.push(issue('error', 'line-j-mixed', 'One level has a whole-number J and the other a half-integer J; they cannot belong to one atom.'));
    return false;
  }
  if (dTwoJ > 2) {
    issues.push(issue('error', 'line-delta-j', 'An electric-dipole line needs ΔJ = 0 or ±1; these levels have no components.'));
    return false;
  }
  if (lower.twoJ === 0 && upper.twoJ === 0) {
    issues.push(issue('error', 'line-j-zero-zero', 'J = 0 ↔ 0 has no electric-dipole components.'));
    return false;
  }
  return true;
}

interface Computed {
  components: DipoleComponent[];
  centroid: ReturnType<typeof emptyCentroidSums>;
  sumRuleDeviation: number;
}

function components(
  lowerStates: SublevelState[],
  upperStates: SublevelState[],
  twoJl: number,
  twoJu: number,
  centreHz: number | null,
  dropBelow: number,
  build = true,
): Computed {
  const all: DipoleComponent[] = [];
  const centroid = emptyCentroidSums();
  let sumRuleDeviation = 0;
  const norm = twoJu + 1;
  for (const u of upperStates) {
    let total = 0;
    for (const l of lowerStates) {
      const dTwoM = u.twoM - l.twoM;
      if (Math.abs(dTwoM) > 2) continue;
      const amp = dipoleAmplitude(l, u, twoJl, twoJu);
      const strength = norm * amp * amp;
      if (strength === 0) continue;
      total += strength;
      if (!build) continue;
      const q = (dTwoM / 2) as -1 | 0 | 1;
      const polarization = polarizationOf(q);
      const offsetHz = u.energyHz - l.energyHz;
      addToCentroid(centroid, q, strength, offsetHz);
      all.push({
        lower: tagOf(l),
        upper: tagOf(u),
        polarization,
        q,
        offsetHz,
        absoluteHz: centreHz === null ? null : centreHz + offsetHz,
        strength,
        alongField: strength * alongFieldWeight(polarization),
        acrossField: strength * acrossFieldWeight(polarization),
      });
    }
    sumRuleDeviation = Math.max(sumRuleDeviation, Math.abs(total - 1));
  }
  const largest = all.reduce((m, c) => Math.max(m, c.strength), 0);
  const kept = all.filter((c) => c.strength >= dropBelow * largest);
  kept.sort((a, b) => a.offsetHz - b.offsetHz || a.q - b.q);
  return { components: kept, centroid, sumRuleDeviation };
}

export function electricDipoleLine(
  lower: HyperfineLevelSpec,
  upper: HyperfineLevelSpec,
  fieldT: number,
  opts: DipoleLineOptions = {},
): DipoleLineResult {
  return dipoleLine(lower, upper, fieldT, opts, true);
}

/**
 * What `electricDipoleLine` reports (its issues, the sum rule checked all the same, its line
 * centre and formula g_eff) without building the components or the centroid g_eff: for a caller
 * that builds the components later, if at all. `components` is empty and `gEff.fromCentroid` null.
 */
export function electricDipoleLineChecks(
  lower: HyperfineLevelSpec,
  upper: HyperfineLevelSpec,
  fieldT: number,
  opts: DipoleLineOptions = {},
): DipoleLineResult {
  return dipoleLine(lower, upper, fieldT, opts, false);
}

function dipoleLine(lower: HyperfineLevelSpec, upper: HyperfineLevelSpec, fieldT: number, opts: DipoleLineOptions, build: boolean): DipoleLineResult {
  const issues: TransitionIssue[] = [];
  // A line the term data forbid outright (error) gets no components, like any other error.
  if (opts.terms) issues.push(...selectionRules(opts.terms.lower, opts.terms.upper));
  if (hasError(issues) || !checkPair(lower, upper, issues)) return empty(fieldT, issues);

  const solve = opts.solve ?? solveLevel;
  const lo = solve(lower, fieldT);
  const up = solve(upper, fieldT);
  issues.push(...fromLevel('Lower level', lo.issues), ...fromLevel('Upper level', up.issues));
  if (lo.states.length === 0 || up.states.length === 0) return empty(fieldT, issues);

  const { lowerEnergyHz: el, upperEnergyHz: eu } = opts;
  const centreHz = Number.isFinite(el) && Number.isFinite(eu) ? (eu as number) - (el as number) : null;
  if (centreHz !== null && centreHz < 0) {
    issues.push(issue('warning', 'line-upper-below-lower', 'The upper level lies below the lower one; the strengths are normalised on the level called upper.'));
  }
  const dropBelow = Number.isFinite(opts.dropBelow) && (opts.dropBelow as number) >= 0 ? (opts.dropBelow as number) : 1e-12;
  const got = components(lo.states, up.states, lower.twoJ, upper.twoJ, centreHz, dropBelow, build);
  if (got.sumRuleDeviation > SUM_RULE_TOLERANCE) {
    issues.push(
      issue('warning', 'line-sum-rule', `The strengths out of one upper sublevel add up to 1 only within ${got.sumRuleDeviation.toExponential(1)}; the eigenvectors may be inaccurate.`),
    );
  }

  // Centroid g_eff: exact at any field in this model, so take it at the field unless that is ~0.
  let centroidFieldT = fieldT;
  let sums = got.centroid;
  if (build && Math.abs(fieldT) < 1e-6) {
    centroidFieldT = CENTROID_PROBE_T;
    const lp = solve(lower, centroidFieldT).states;
    const upp = solve(upper, centroidFieldT).states;
    sums = components(lp, upp, lower.twoJ, upper.twoJ, null, dropBelow).centroid;
  }
  const gEff = {
    formula: effectiveLandeFactor({ twoJ: lower.twoJ, gJ: lower.gJ }, { twoJ: upper.twoJ, gJ: upper.gJ }),
    fromCentroid: build ? landeFromSums(sums, centroidFieldT) : null,
    centroidFieldT,
  };
  return { fieldT, components: got.components, gEff, lineCentreHz: centreHz, sumRuleDeviation: got.sumRuleDeviation, issues };
}

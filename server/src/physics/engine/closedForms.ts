/**
 * Closed-form energies used as cross-checks of the matrix engine:
 * linear weak-field Zeeman, Breit–Rabi (J = 1/2, any I), and the
 * strong-field (Paschen–Back) limit. Written from the formulas, not from the
 * engine's matrices, so that agreement means something.
 */
import { BOHR_MAGNETON_HZ_PER_T } from '../constants';
import { couplings, jj1, projections } from './halfIntegers';
import { issue } from './issues';
import { fLabel, jiLabel, jLabel, lsLabel } from './labelText';
import { landeGF, landeGJ } from './landeFactors';
import type { CoupledFLabel, EngineIssue, HighFieldLabel, HyperfineLevelSpec, LevelSpec, LowFieldLabel } from './types';
import { nucleusUncoupled } from './uncoupledNucleus';
import { validateSpec } from './validateSpec';
import { fineZeroFieldHz, hyperfineZeroFieldHz } from './zeroFieldLevels';

/** The whole-term mode has no closed forms here (its limits are tested against the other modes). */
function noClosedForm(): EngineIssue {
  return issue('error', 'no-closed-form', 'The closed forms cover one J level or a term without hyperfine coupling, not a whole term with its hyperfine structure.');
}

export interface LinearEnergy {
  low: LowFieldLabel;
  energyHz: number;
  /** dE/dB of the linear formula, Hz/T. */
  slopeHzPerT: number;
}

export interface StrongFieldEnergy {
  high: HighFieldLabel;
  energyHz: number;
}

/**
 * Weak-field formula: E = E(F) + g_F m_F μ_B B (hyperfine) or
 * E = E(J) + (g_J m_J + g_I m_I) μ_B B (fine structure), in Hz.
 */
export function linearZeeman(spec: LevelSpec, fieldT: number): { states: LinearEnergy[]; issues: EngineIssue[] } {
  const { spec: s, issues } = validateSpec(spec);
  if (!s) return { states: [], issues };
  if (s.kind === 'term') return { states: [], issues: [...issues, noClosedForm()] };
  const mu = BOHR_MAGNETON_HZ_PER_T;
  const states: LinearEnergy[] = [];
  if (s.kind === 'hyperfine' && nucleusUncoupled(s)) {
    // No hyperfine coupling: the uncoupled states are the weak-field states too.
    for (const twoMI of projections(s.twoI)) {
      for (const twoMJ of projections(s.twoJ)) {
        const slope = ((s.gJ * twoMJ + s.gI * twoMI) * mu) / 2;
        const low = s.twoJ === 0 ? fLabel(s.twoI, twoMI) : jLabel(s.twoJ, twoMJ, twoMI);
        states.push({ low, energyHz: slope * fieldT, slopeHzPerT: slope });
      }
    }
  } else if (s.kind === 'hyperfine') {
    for (const twoF of couplings(s.twoJ, s.twoI)) {
      const e0 = hyperfineZeroFieldHz(s.twoJ, s.twoI, twoF, s.A, s.B, s.C);
      const g = landeGF(twoF, s.twoJ, s.twoI, s.gJ, s.gI);
      for (const twoM of projections(twoF)) {
        const slope = (g * twoM * mu) / 2;
        states.push({ low: fLabel(twoF, twoM), energyHz: e0 + slope * fieldT, slopeHzPerT: slope });
      }
    }
  } else {
    const twoIs = s.hasNucleus ? projections(s.twoI) : [0];
    for (const twoJ of couplings(2 * s.L, s.twoS)) {
      const e0 = fineZeroFieldHz(s.L, s.twoS, twoJ, s.zeta);
      const g = landeGJ(s.L, s.twoS, twoJ, s.gL, s.gS);
      for (const twoMJ of projections(twoJ)) {
        for (const twoMI of twoIs) {
          const slope = ((g * twoMJ + s.gI * twoMI) * mu) / 2;
          const label = jLabel(twoJ, twoMJ, s.hasNucleus ? twoMI : null);
          states.push({ low: label, energyHz: e0 + slope * fieldT, slopeHzPerT: slope });
        }
      }
    }
  }
  return { states, issues };
}

/**
 * Breit–Rabi energy (Hz) of |F = I ± 1/2, m> for a J = 1/2 level:
 *   E = −ΔE/(2(2I+1)) + g_I m μ_B B ± (ΔE/2) sqrt(1 + 4 m x/(2I+1) + x²),
 *   ΔE = A (I + 1/2),  x = (g_J − g_I) μ_B B / ΔE.
 * The stretched states m = ±(I + 1/2) take the root as (1 ± x) so that the
 * branch stays analytic through x = ∓1.
 */
export function breitRabiEnergy(twoI: number, A: number, gJ: number, gI: number, twoF: number, twoM: number, fieldT: number): number {
  const mu = BOHR_MAGNETON_HZ_PER_T;
  const m = twoM / 2;
  const dE = (A * (twoI + 1)) / 2;
  const base = -dE / (2 * (twoI + 1)) + gI * m * mu * fieldT;
  const upper = twoF === twoI + 1;
  if (Math.abs(twoM) === twoI + 1) {
    // Only F = I + 1/2 has these m; E = A I/2 + (±g_J/2 + g_I m) μ_B B exactly.
    return base + dE / 2 + (Math.sign(twoM) * (gJ - gI) * mu * fieldT) / 2;
  }
  if (dE === 0) return base + (upper ? 0.5 : -0.5) * Math.abs((gJ - gI) * mu * fieldT);
  const x = ((gJ - gI) * mu * fieldT) / dE;
  const root = Math.sqrt(1 + (4 * m * x) / (twoI + 1) + x * x);
  return base + (upper ? 1 : -1) * (dE / 2) * root;
}

/** Breit–Rabi energies of every |F, m_F> of a J = 1/2 level. */
export function breitRabi(spec: HyperfineLevelSpec, fieldT: number): { states: { low: CoupledFLabel; energyHz: number }[]; issues: EngineIssue[] } {
  const { spec: s, issues } = validateSpec(spec);
  if (!s || s.kind !== 'hyperfine') return { states: [], issues };
  if (s.twoJ !== 1 || s.twoI === 0) {
    issues.push(issue('error', 'not-breit-rabi', 'The Breit–Rabi formula holds only for J = 1/2 with a nuclear spin I ≥ 1/2.'));
    return { states: [], issues };
  }
  const states: { low: CoupledFLabel; energyHz: number }[] = [];
  for (const twoF of [s.twoI - 1, s.twoI + 1]) {
    for (const twoM of projections(twoF)) {
      states.push({ low: fLabel(twoF, twoM), energyHz: breitRabiEnergy(s.twoI, s.A, s.gJ, s.gI, twoF, twoM, fieldT) });
    }
  }
  return { states, issues };
}

/**
 * Strong-field limit (first order in the couplings):
 *   hyperfine: E = A m_I m_J + B [3m_I² − I(I+1)][3m_J² − J(J+1)] / [4I(2I−1)J(2J−1)] + μ_B B (g_J m_J + g_I m_I)
 *   fine:      E = ζ m_L m_S + μ_B B (g_L m_L + g_S m_S + g_I m_I).
 * The octupole C is not included (an issue says so when C ≠ 0).
 */
export function paschenBackLimit(spec: LevelSpec, fieldT: number): { states: StrongFieldEnergy[]; issues: EngineIssue[] } {
  const { spec: s, issues } = validateSpec(spec);
  if (!s) return { states: [], issues };
  if (s.kind === 'term') return { states: [], issues: [...issues, noClosedForm()] };
  const mu = BOHR_MAGNETON_HZ_PER_T;
  const states: StrongFieldEnergy[] = [];
  if (s.kind === 'hyperfine') {
    if (s.C !== 0) issues.push(issue('info', 'octupole-not-in-limit', 'The strong-field formula leaves out the octupole constant C.'));
    const I = s.twoI / 2;
    const J = s.twoJ / 2;
    const quad = s.B === 0 ? 0 : s.B / (4 * I * (2 * I - 1) * J * (2 * J - 1));
    for (const twoMJ of projections(s.twoJ)) {
      for (const twoMI of projections(s.twoI)) {
        const mJ = twoMJ / 2;
        const mI = twoMI / 2;
        let e = s.A * mI * mJ + mu * fieldT * (s.gJ * mJ + s.gI * mI);
        if (quad !== 0) e += quad * (3 * mI * mI - jj1(s.twoI)) * (3 * mJ * mJ - jj1(s.twoJ));
        states.push({ high: jiLabel(twoMJ, twoMI), energyHz: e });
      }
    }
  } else {
    const twoIs = s.hasNucleus ? projections(s.twoI) : [0];
    for (const twoML of projections(2 * s.L)) {
      for (const twoMS of projections(s.twoS)) {
        for (const twoMI of twoIs) {
          const e = (s.zeta * twoML * twoMS) / 4 + (mu * fieldT * (s.gL * twoML + s.gS * twoMS + s.gI * twoMI)) / 2;
          states.push({ high: lsLabel(twoML, twoMS, s.hasNucleus ? twoMI : null), energyHz: e });
        }
      }
    }
  }
  return { states, issues };
}

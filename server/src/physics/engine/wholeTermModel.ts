/**
 * Blocks of a whole LS term with its nucleus in the uncoupled basis |m_L, m_S, m_I>, one per
 * total m:
 *   H/h = fine structure + dipole hyperfine (inside and between the J levels) + orbital
 *         quadrupole (termOperators.ts) + (μ_B B/h)(g_L L_z + g_S S_z + g_I I_z)
 *         [+ B² e²⟨r²⟩⟨sin²θ⟩_{m_L}/(8mₑh) when ⟨r²⟩ is given (diamagnetic.ts)].
 * Low-field labels |J, F, m_F> rank by the exact zero-field eigenvalues of the block (F is exact
 * at B = 0; J is the level the state comes from, matched by the first-order energy
 * E_J + Casimir(A_J, B_J)); high-field labels |m_L, m_S, m_I> as in the other modes.
 */
import { BOHR_MAGNETON_HZ_PER_T } from '../constants';
import { orderHighLabels, orderLowLabels } from './adiabaticOrder';
import { sinSquaredMean } from './diamagnetic';
import { couplings } from './halfIntegers';
import { jfLabel, jLabel, lsLabel } from './labelText';
import { landeGF, landeGJ } from './landeFactors';
import type { LevelBlock, LevelModel, RankedHigh, RankedLow } from './levelModel';
import { symmetricEigen } from './symmetricEigen';
import { termBlockParts, type TermBlockParts } from './termAngularParts';
import { levelCoefficients } from './termHyperfineParameters';
import type { CleanTerm } from './validateTerm';
import { hyperfineZeroFieldHz } from './zeroFieldLevels';

/** The J-level constants A_J, B_J that the term's parameters imply (projection theorem). */
export function impliedLevelConstants(s: CleanTerm): Map<number, { A: number; B: number }> {
  const out = new Map<number, { A: number; B: number }>();
  for (const c of levelCoefficients(2 * s.L, s.twoS, s.twoI)) {
    const A = c.orbital * s.radial.orbital + c.spinDipolar * s.radial.spinDipolar + c.contact * s.radial.contact;
    out.set(c.twoJ, { A, B: Number.isFinite(c.quadrupole) ? c.quadrupole * s.quadrupoleL : 0 });
  }
  return out;
}

function zeroFieldMatrix(s: CleanTerm, jValues: number[], { ops, projectors }: TermBlockParts): Float64Array {
  const n = ops.n;
  const h = new Float64Array(n * n);
  for (const twoJ of jValues) {
    const e = s.levelEnergies.get(twoJ) as number;
    if (e === 0) continue;
    const p = projectors.get(twoJ) as Float64Array;
    for (let k = 0; k < n * n; k++) h[k] += e * p[k];
  }
  const r = s.radial;
  for (let k = 0; k < n * n; k++) {
    h[k] += r.orbital * ops.LI[k] + r.contact * ops.SI[k] + r.spinDipolar * ops.D[k] + s.quadrupoleL * ops.Q[k];
  }
  return h;
}

/** Exact eigenvalues of a zero-field block, ascending. */
function blockEigenvalues(h0: Float64Array, n: number): Float64Array {
  const values = new Float64Array(n);
  symmetricEigen(Float64Array.from(h0), n, values, new Float64Array(n * n));
  return values;
}

export function buildWholeTermModel(s: CleanTerm): LevelModel {
  const mu = BOHR_MAGNETON_HZ_PER_T;
  const two = [2 * s.L, s.twoS, s.twoI] as const;
  const jValues = couplings(two[0], two[1]);
  const implied = impliedLevelConstants(s);
  const gJ = new Map(jValues.map((twoJ) => [twoJ, landeGJ(s.L, s.twoS, twoJ, s.gL, s.gS)]));
  const firstOrder = (twoJ: number, twoF: number): number => {
    const c = implied.get(twoJ) ?? { A: 0, B: 0 };
    return (s.levelEnergies.get(twoJ) as number) + hyperfineZeroFieldHz(twoJ, s.twoI, twoF, c.A, c.B, 0);
  };
  const blocks: LevelBlock[] = [];
  const zeroField: number[] = [];
  const built: { twoM: number; h0: Float64Array; zeeman: Float64Array; quadratic?: Float64Array; basis: RankedHigh[]; low: RankedLow[] }[] = [];
  const twoMax = two[0] + two[1] + two[2];
  for (let twoM = -twoMax; twoM <= twoMax; twoM += 2) {
    const parts = termBlockParts(two, twoM);
    const basis = parts.basis;
    const n = parts.ops.n;
    const h0 = zeroFieldMatrix(s, jValues, parts);
    const zeeman = new Float64Array(n);
    const quadratic = s.diamagneticHzPerT2 > 0 ? basis.states.map(([mL]) => s.diamagneticHzPerT2 * sinSquaredMean(s.L, mL / 2)) : undefined;
    const high: RankedHigh[] = basis.states.map(([mL, mS, mI], k) => {
      zeeman[k] = (mu * (s.gL * mL + s.gS * mS + s.gI * mI)) / 2;
      return { label: lsLabel(mL, mS, s.twoI === 0 ? null : mI), diagonalHz: h0[k * n + k], slopeHzPerT: zeeman[k] };
    });
    const cands: (RankedLow & { first: number })[] = [];
    for (const twoJ of jValues) {
      for (const twoF of couplings(twoJ, s.twoI)) {
        if (twoF < Math.abs(twoM)) continue;
        const slope = (mu * landeGF(twoF, twoJ, s.twoI, gJ.get(twoJ) as number, s.gI) * twoM) / 2;
        // Without a nucleus F is J: the label is |J, m_J>.
        const label = s.twoI === 0 ? jLabel(twoJ, twoM, null) : jfLabel(twoJ, twoF, twoM);
        cands.push({ label, zeroFieldHz: 0, slopeHzPerT: slope, first: firstOrder(twoJ, twoF) });
      }
    }
    // Match the first-order order to the exact zero-field eigenvalues rank by rank.
    cands.sort((a, b) => a.first - b.first || a.slopeHzPerT - b.slopeHzPerT);
    const exact = blockEigenvalues(h0, n);
    const low: RankedLow[] = cands.map((c, k) => ({ label: c.label, zeroFieldHz: exact[k], slopeHzPerT: c.slopeHzPerT }));
    for (const e of exact) zeroField.push(e);
    built.push({ twoM, h0, zeeman, quadratic: quadratic && Float64Array.from(quadratic), basis: high, low });
  }
  const spread = Math.max(...zeroField) - Math.min(...zeroField);
  const energyScale = Math.max(spread, 1e-300);
  const slopeScale = mu * (Math.abs(s.gL) * two[0] + Math.abs(s.gS) * two[1] + Math.abs(s.gI) * two[2] + 1e-300);
  let largest = 0;
  for (const b of built) {
    largest = Math.max(largest, b.basis.length);
    blocks.push({
      twoM: b.twoM,
      size: b.basis.length,
      basis: b.basis.map((h) => h.label),
      h0: b.h0,
      zeeman: b.zeeman,
      ...(b.quadratic ? { quadratic: b.quadratic } : {}),
      low: [orderLowLabels(b.low, 1, energyScale, slopeScale), orderLowLabels(b.low, -1, energyScale, slopeScale)],
      high: [orderHighLabels(b.basis, 1, energyScale, slopeScale), orderHighLabels(b.basis, -1, energyScale, slopeScale)],
    });
  }
  return { spec: s, blocks, dimension: (two[0] + 1) * (two[1] + 1) * (two[2] + 1), largestBlock: largest, zeroFieldSpreadHz: spread };
}

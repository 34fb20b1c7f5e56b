/**
 * Blocks of an LS term in the uncoupled basis |m_L, m_S(, m_I)>:
 *   H/h = ζ L·S + (μ_B B/h)(g_L L_z + g_S S_z + g_I I_z).
 * Without hyperfine coupling m_J = m_L + m_S and m_I are conserved separately,
 * so the blocks are labelled by both; that keeps the no-crossing rule inside
 * every block (levels of different m_I may cross and are reported as crossings).
 */
import { BOHR_MAGNETON_HZ_PER_T } from '../constants';
import { orderHighLabels, orderLowLabels } from './adiabaticOrder';
import { blockProjections, dotProductBlock } from './couplingMatrix';
import { couplings } from './halfIntegers';
import { jLabel, lsLabel } from './labelText';
import { landeGJ } from './landeFactors';
import type { LevelBlock, LevelModel, RankedHigh, RankedLow } from './levelModel';
import type { CleanFine } from './validateSpec';
import { fineZeroFieldHz } from './zeroFieldLevels';

export function buildFineModel(s: CleanFine): LevelModel {
  const mu = BOHR_MAGNETON_HZ_PER_T;
  const twoL = 2 * s.L;
  const jValues = couplings(twoL, s.twoS);
  const zf = new Map<number, number>();
  for (const twoJ of jValues) zf.set(twoJ, fineZeroFieldHz(s.L, s.twoS, twoJ, s.zeta));
  const zfList = [...zf.values()];
  const spread = Math.max(...zfList) - Math.min(...zfList);
  const energyScale = Math.max(spread, Math.abs(s.zeta), 1e-300);
  const slopeScale = mu * (Math.abs(s.gL) * twoL + Math.abs(s.gS) * s.twoS + Math.abs(s.gI) * s.twoI + 1e-300);

  const blocks: LevelBlock[] = [];
  const twoMJMax = twoL + s.twoS;
  for (let twoMI = -s.twoI; twoMI <= s.twoI; twoMI += 2) {
    const mILabel = s.hasNucleus ? twoMI : null;
    for (let twoMJ = -twoMJMax; twoMJ <= twoMJMax; twoMJ += 2) {
      const mLs = blockProjections(twoL, s.twoS, twoMJ);
      const n = mLs.length;
      const x = dotProductBlock(twoL, s.twoS, mLs, twoMJ);
      const h0 = new Float64Array(n * n);
      for (let k = 0; k < n * n; k++) h0[k] = s.zeta * x[k];
      const zeeman = new Float64Array(n);
      const basis = mLs.map((mL) => lsLabel(mL, twoMJ - mL, mILabel));
      const highCands: RankedHigh[] = [];
      for (let k = 0; k < n; k++) {
        zeeman[k] = (mu * (s.gL * mLs[k] + s.gS * (twoMJ - mLs[k]) + s.gI * twoMI)) / 2;
        highCands.push({ label: basis[k], diagonalHz: h0[k * n + k], slopeHzPerT: zeeman[k] });
      }
      const lowCands: RankedLow[] = jValues
        .filter((twoJ) => twoJ >= Math.abs(twoMJ))
        .map((twoJ) => ({
          label: jLabel(twoJ, twoMJ, mILabel),
          zeroFieldHz: zf.get(twoJ) as number,
          slopeHzPerT: (mu * (landeGJ(s.L, s.twoS, twoJ, s.gL, s.gS) * twoMJ + s.gI * twoMI)) / 2,
        }));
      blocks.push({
        twoM: twoMJ + twoMI,
        size: n,
        basis,
        h0,
        zeeman,
        low: [orderLowLabels(lowCands, 1, energyScale, slopeScale), orderLowLabels(lowCands, -1, energyScale, slopeScale)],
        high: [orderHighLabels(highCands, 1, energyScale, slopeScale), orderHighLabels(highCands, -1, energyScale, slopeScale)],
      });
    }
  }
  blocks.sort((a, b) => a.twoM - b.twoM);
  return {
    spec: s,
    blocks,
    dimension: (twoL + 1) * (s.twoS + 1) * (s.twoI + 1),
    largestBlock: Math.min(twoL, s.twoS) + 1,
    zeroFieldSpreadHz: spread,
  };
}

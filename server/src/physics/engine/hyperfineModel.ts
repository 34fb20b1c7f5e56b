/**
 * Blocks of a hyperfine level in the uncoupled basis |m_J, m_I>:
 *   H/h = A I·J
 *       + B [3(I·J)² + 3/2 (I·J) − I(I+1)J(J+1)] / [2I(2I−1) J(2J−1)]
 *       + C [10(I·J)³ + 20(I·J)² + 2(I·J)(I(I+1)+J(J+1)+3−3I(I+1)J(J+1)) − 5I(I+1)J(J+1)]
 *           / [I(I−1)(2I−1) J(J−1)(2J−1)]
 *       + (μ_B B/h)(g_J J_z + g_I I_z).
 * Powers of I·J are exact inside a block because I·J conserves m_F.
 */
import { BOHR_MAGNETON_HZ_PER_T } from '../constants';
import { orderHighLabels, orderLowLabels } from './adiabaticOrder';
import { blockProjections, dotProductBlock, multiplySquare } from './couplingMatrix';
import { couplings, jj1 } from './halfIntegers';
import { fLabel, jiLabel, jLabel } from './labelText';
import { landeGF } from './landeFactors';
import type { LevelBlock, LevelModel, RankedHigh, RankedLow } from './levelModel';
import type { CoupledFLabel, UncoupledJILabel } from './types';
import type { CleanHyperfine } from './validateSpec';
import { hyperfineZeroFieldHz, octupoleActs, quadrupoleActs } from './zeroFieldLevels';
import { nucleusUncoupled } from './uncoupledNucleus';

/** The zero-field matrix of one block (exported so derivatives can take it with unit constants). */
export function zeroFieldMatrix(s: CleanHyperfine, x: Float64Array, n: number): Float64Array {
  const h = new Float64Array(n * n);
  for (let k = 0; k < n * n; k++) h[k] = s.A * x[k];
  const needSquare = (s.B !== 0 && quadrupoleActs(s.twoJ, s.twoI)) || (s.C !== 0 && octupoleActs(s.twoJ, s.twoI));
  if (!needSquare) return h;
  const ii = jj1(s.twoI);
  const j2 = jj1(s.twoJ);
  const I = s.twoI / 2;
  const J = s.twoJ / 2;
  const x2 = multiplySquare(x, x, n);
  if (s.B !== 0 && quadrupoleActs(s.twoJ, s.twoI)) {
    const c = s.B / (2 * I * (2 * I - 1) * J * (2 * J - 1));
    for (let k = 0; k < n * n; k++) h[k] += c * (3 * x2[k] + 1.5 * x[k]);
    for (let k = 0; k < n; k++) h[k * n + k] -= c * ii * j2;
  }
  if (s.C !== 0 && octupoleActs(s.twoJ, s.twoI)) {
    const x3 = multiplySquare(x2, x, n);
    const c = s.C / (I * (I - 1) * (2 * I - 1) * J * (J - 1) * (2 * J - 1));
    const lin = 2 * (ii + j2 + 3 - 3 * ii * j2);
    for (let k = 0; k < n * n; k++) h[k] += c * (10 * x3[k] + 20 * x2[k] + lin * x[k]);
    for (let k = 0; k < n; k++) h[k * n + k] -= c * 5 * ii * j2;
  }
  return h;
}

/**
 * Without hyperfine coupling m_J and m_I are conserved separately: one 1 × 1 block per
 * (m_J, m_I), so states of equal total m may cross freely (reported as crossings).
 */
function uncoupledModel(s: CleanHyperfine): LevelModel {
  const mu = BOHR_MAGNETON_HZ_PER_T;
  const blocks: LevelBlock[] = [];
  for (let twoMI = -s.twoI; twoMI <= s.twoI; twoMI += 2) {
    for (let twoMJ = -s.twoJ; twoMJ <= s.twoJ; twoMJ += 2) {
      const slope = (mu * (s.gJ * twoMJ + s.gI * twoMI)) / 2;
      // J = 0: the state is exactly |F = I, m_F = m_I>, so the usual F label is kept.
      const label = s.twoJ === 0 ? fLabel(s.twoI, twoMI) : jLabel(s.twoJ, twoMJ, twoMI);
      const low: RankedLow[] = [{ label, zeroFieldHz: 0, slopeHzPerT: slope }];
      const high: RankedHigh[] = [{ label: jiLabel(twoMJ, twoMI), diagonalHz: 0, slopeHzPerT: slope }];
      blocks.push({
        twoM: twoMJ + twoMI,
        size: 1,
        basis: [high[0]!.label],
        h0: new Float64Array(1),
        zeeman: Float64Array.of(slope),
        low: [low, low],
        high: [high, high],
      });
    }
  }
  blocks.sort((a, b) => a.twoM - b.twoM);
  return { spec: s, blocks, dimension: (s.twoJ + 1) * (s.twoI + 1), largestBlock: 1, zeroFieldSpreadHz: 0 };
}

/** What a block of the uncoupled basis is for a given (J, I), whatever the constants and g-factors. */
interface BlockShape {
  twoM: number;
  /** 2m_J of the basis states, descending. */
  mJs: number[];
  /** I·J in that basis (read only: zeroFieldMatrix scales it into a new matrix). */
  x: Float64Array;
  /** Labels of the basis states and of the F states present in the block (shared, never mutated). */
  basis: UncoupledJILabel[];
  fLabels: CoupledFLabel[];
}

/**
 * Block shapes per (2J, 2I). A large file has thousands of levels of a few (J, I) that
 * differ only in their constants; building the I·J matrices and the label strings cost
 * more than the rest of the model. The same numbers as before, only made once.
 */
const shapeCache = new Map<number, BlockShape[]>();

function blockShapes(twoJ: number, twoI: number): BlockShape[] {
  const key = twoJ * 65536 + twoI;
  const cached = shapeCache.get(key);
  if (cached) return cached;
  const fValues = couplings(twoJ, twoI);
  const shapes: BlockShape[] = [];
  const twoMax = twoJ + twoI;
  for (let twoM = -twoMax; twoM <= twoMax; twoM += 2) {
    const mJs = blockProjections(twoJ, twoI, twoM);
    shapes.push({
      twoM,
      mJs,
      x: dotProductBlock(twoJ, twoI, mJs, twoM),
      basis: mJs.map((mJ) => jiLabel(mJ, twoM - mJ, twoI === 0)),
      fLabels: fValues.filter((twoF) => twoF >= Math.abs(twoM)).map((twoF) => fLabel(twoF, twoM, twoI === 0)),
    });
  }
  shapeCache.set(key, shapes);
  return shapes;
}

export function buildHyperfineModel(s: CleanHyperfine): LevelModel {
  if (nucleusUncoupled(s)) return uncoupledModel(s);
  const mu = BOHR_MAGNETON_HZ_PER_T;
  const fValues = couplings(s.twoJ, s.twoI);
  const zf = new Map<number, number>();
  for (const twoF of fValues) zf.set(twoF, hyperfineZeroFieldHz(s.twoJ, s.twoI, twoF, s.A, s.B, s.C));
  const zfList = [...zf.values()];
  const spread = Math.max(...zfList) - Math.min(...zfList);
  const energyScale = Math.max(spread, Math.abs(s.A), Math.abs(s.B), Math.abs(s.C), 1e-300);
  const slopeScale = mu * (Math.abs(s.gJ) * s.twoJ + Math.abs(s.gI) * s.twoI + 1e-300);

  const blocks: LevelBlock[] = [];
  for (const shape of blockShapes(s.twoJ, s.twoI)) {
    const { twoM, mJs, x, basis } = shape;
    const n = mJs.length;
    const h0 = zeroFieldMatrix(s, x, n);
    const zeeman = new Float64Array(n);
    const highCands: RankedHigh[] = [];
    for (let k = 0; k < n; k++) {
      zeeman[k] = (mu * (s.gJ * mJs[k] + s.gI * (twoM - mJs[k]))) / 2;
      highCands.push({ label: basis[k], diagonalHz: h0[k * n + k], slopeHzPerT: zeeman[k] });
    }
    const lowCands: RankedLow[] = [];
    for (const label of shape.fLabels) {
      const twoF = label.twoF;
      lowCands.push({
        label,
        zeroFieldHz: zf.get(twoF) as number,
        slopeHzPerT: (mu * landeGF(twoF, s.twoJ, s.twoI, s.gJ, s.gI) * twoM) / 2,
      });
    }
    blocks.push({
      twoM,
      size: n,
      basis,
      h0,
      zeeman,
      low: [orderLowLabels(lowCands, 1, energyScale, slopeScale), orderLowLabels(lowCands, -1, energyScale, slopeScale)],
      high: [orderHighLabels(highCands, 1, energyScale, slopeScale), orderHighLabels(highCands, -1, energyScale, slopeScale)],
    });
  }
  return {
    spec: s,
    blocks,
    dimension: (s.twoJ + 1) * (s.twoI + 1),
    largestBlock: Math.min(s.twoJ, s.twoI) + 1,
    zeroFieldSpreadHz: spread,
  };
}

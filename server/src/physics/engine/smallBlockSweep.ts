/**
 * Blocks of order 1 and 2 through every field in closed form: the sweep's default
 * route for them (the per-field route solves them like any other block, and the tests
 * hold the two together). A solve of such a block costs little arithmetic but a
 * sizeable overhead of loops and calls, which on Cs 6P3/2 (blocks 1, 2, 3, 4, …) was
 * about a tenth of the sweep.
 *
 * Order 1: E = H₀ + B·Z, dE/dB = Z, d²E/dB² = 0.
 * Order 2, H = [[a, b], [b, d]] (textbook two-level closed form): with h = (d − a)/2 and
 * r = √(h² + b²), E = (a + d)/2 ∓ r; the lower state's weight on the first basis state is
 * (1 + h/r)/2 and the upper's (1 − h/r)/2, so dE/dB = (Z₀ + Z₁)/2 ∓ (h/r)(Z₁ − Z₀)/2
 * (Hellmann–Feynman), and d²E/dB² = ∓ b²(Z₀ − Z₁)²/(4r³) (second-order perturbation,
 * 2|Z_lu|²/(E_l − E_u) with |Z_lu| = |b (Z₀ − Z₁)|/(2r)).
 * The first field is solved exactly (states are ordered by their energies there, and ties at
 * zero field must break as on every other route), and so is any field where h² + b² is outside
 * (1e-290, 1e290): an underflowing square would cost r its precision, an overflowing one r itself.
 */
import { PLANCK_H } from '../constants';
import { type BlockWorkspace, solveBlockAt } from './blockSolver';
import { type BlockOutput, writeSolved } from './blockSweep';
import type { LevelBlock } from './levelModel';

/** Pairs closer than this fraction of the energies leave the curvature out, as in blockSolver.curvaturesOf. */
const CURVATURE_GAP_FLOOR = 1e-12;

/** Whether `block` takes this route: order 1 or 2 and linear in B. */
export function isSmallBlock(block: LevelBlock): boolean {
  return block.size <= 2 && block.quadratic === undefined;
}

/**
 * Every field of a block of order 1 or 2 (isSmallBlock) into the sweep's store. Returns the
 * degenerate pairs left out of curvatures, or −1 if an exact solve (the fallback) failed.
 */
export function sweepSmallBlock(block: LevelBlock, fieldsT: Float64Array, ws: BlockWorkspace, out: BlockOutput): number {
  const { store, points, curvature } = out;
  const energy = out.base;
  const moment = energy + points;
  const curv = energy + 2 * points;
  const h0 = block.h0;
  const z = block.zeeman;
  if (!solveBlockAt(block, fieldsT[0], ws)) return -1;
  let skipped = writeSolved(block, ws, fieldsT[0], 0, out);
  if (block.size === 1) {
    const momentJT = -z[0] * PLANCK_H;
    for (let p = 1; p < fieldsT.length; p++) {
      store[energy + p] = h0[0] + fieldsT[p] * z[0];
      store[moment + p] = momentJT;
      if (curvature) store[curv + p] = 0;
    }
    return skipped;
  }
  const up = out.stride; // the upper state's rows
  const b = h0[1];
  const zMean = 0.5 * z[0] + 0.5 * z[1];
  const zHalf = 0.5 * z[1] - 0.5 * z[0];
  const zSplit = z[0] - z[1];
  for (let p = 1; p < fieldsT.length; p++) {
    const fieldT = fieldsT[p];
    const a = h0[0] + fieldT * z[0];
    const d = h0[3] + fieldT * z[1];
    const h = 0.5 * d - 0.5 * a;
    const square = h * h + b * b;
    if (!(square > 1e-290 && square < 1e290)) {
      if (!solveBlockAt(block, fieldT, ws)) return -1;
      skipped += writeSolved(block, ws, fieldT, p, out);
      continue;
    }
    const r = Math.sqrt(square);
    const mean = 0.5 * a + 0.5 * d;
    const lower = mean - r;
    const upper = mean + r;
    const tilt = (h / r) * zHalf;
    store[energy + p] = lower;
    store[energy + up + p] = upper;
    store[moment + p] = -(zMean - tilt) * PLANCK_H;
    store[moment + up + p] = -(zMean + tilt) * PLANCK_H;
    if (!curvature) continue;
    let c = 0;
    if (b !== 0 && zSplit !== 0) {
      if (2 * r <= CURVATURE_GAP_FLOOR * Math.max(Math.abs(lower), Math.abs(upper)) + 1e-300) skipped++;
      else {
        const g = (b / r) * zSplit; // 2|Z_lu|
        c = (g * g) / (4 * r);
      }
    }
    store[curv + p] = -c;
    store[curv + up + p] = c;
  }
  return skipped;
}

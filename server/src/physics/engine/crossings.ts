/**
 * Crossings between sublevels of different blocks over a sweep. Inside a
 * block levels never cross, so only pairs from different blocks are scanned:
 * a sign change of E_a − E_b between neighbouring points brackets a crossing,
 * which is then refined by bisection on the exact engine (only the two blocks
 * are re-solved). Differences within 1e-10 of the sweep's energy scale count
 * as zero, so round-off at exact degeneracies (B = 0) makes no false crossing.
 * A touching without a sign change is not reported.
 */
import { makeWorkspace, solveBlockAt } from './blockSolver';
import { issue } from './issues';
import type { LevelModel } from './levelModel';
import { MAX_CROSSINGS, MAX_CROSSING_SCAN } from './limits';
import type { EngineIssue, LevelCrossing } from './types';

/** Where one swept state lives: its block and its rank inside the block. */
export interface StateSlot {
  block: number;
  rank: number;
  energyHz: Float64Array;
}

function sideOf(d: number, tol: number): number {
  return d > tol ? 1 : d < -tol ? -1 : 0;
}

/** Energy of rank `rank` of block `b` at `fieldT`; NaN if the solver fails. */
function energyAt(model: LevelModel, b: number, rank: number, fieldT: number, ws: ReturnType<typeof makeWorkspace>): number {
  return solveBlockAt(model.blocks[b], fieldT, ws) ? ws.values[rank] : Number.NaN;
}

function bisect(model: LevelModel, a: StateSlot, b: StateSlot, lo: number, hi: number, sLo: number): LevelCrossing | null {
  const ws = makeWorkspace(model.largestBlock);
  let ea = 0;
  for (let it = 0; it < 200; it++) {
    const mid = 0.5 * (lo + hi);
    if (mid === lo || mid === hi) break;
    ea = energyAt(model, a.block, a.rank, mid, ws);
    const d = ea - energyAt(model, b.block, b.rank, mid, ws);
    if (!Number.isFinite(d)) return null;
    if (d === 0) {
      lo = mid;
      hi = mid;
      break;
    }
    if (Math.sign(d) === sLo) lo = mid;
    else hi = mid;
  }
  const field = 0.5 * (lo + hi);
  return { stateA: -1, stateB: -1, fieldT: field, energyHz: energyAt(model, a.block, a.rank, field, ws) };
}

/**
 * Crossings between the swept states (indices into `slots`), sorted by field.
 * Large sweeps are not scanned; an info issue says so.
 */
export function findCrossings(
  model: LevelModel,
  fieldsT: Float64Array,
  slots: readonly StateSlot[],
  issues: EngineIssue[],
): LevelCrossing[] {
  const points = fieldsT.length;
  let pairs = 0;
  for (let i = 0; i < slots.length; i++) for (let j = i + 1; j < slots.length; j++) if (slots[i].block !== slots[j].block) pairs++;
  if (pairs * points > MAX_CROSSING_SCAN) {
    issues.push(issue('info', 'crossings-skipped', 'The sweep is too large to scan for level crossings; use fewer points or a smaller level.'));
    return [];
  }
  let scale = 0;
  for (const s of slots) for (let p = 0; p < points; p++) scale = Math.max(scale, Math.abs(s.energyHz[p]));
  const tol = 1e-10 * scale + 1e-300;
  const out: LevelCrossing[] = [];
  for (let i = 0; i < slots.length; i++) {
    for (let j = i + 1; j < slots.length; j++) {
      const a = slots[i];
      const b = slots[j];
      if (a.block === b.block) continue;
      let lastSide = 0;
      let lastIndex = -1;
      for (let p = 0; p < points; p++) {
        const side = sideOf(a.energyHz[p] - b.energyHz[p], tol);
        if (side === 0) continue;
        if (lastSide !== 0 && side !== lastSide) {
          if (out.length >= MAX_CROSSINGS) {
            issues.push(issue('warning', 'too-many-crossings', `Only the first ${MAX_CROSSINGS} level crossings are reported.`));
            return out.sort((x, y) => x.fieldT - y.fieldT);
          }
          const c = bisect(model, a, b, fieldsT[lastIndex], fieldsT[p], lastSide);
          if (c) out.push({ ...c, stateA: i, stateB: j });
        }
        lastSide = side;
        lastIndex = p;
      }
    }
  }
  return out.sort((x, y) => x.fieldT - y.fieldT);
}

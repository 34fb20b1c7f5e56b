/**
 * Crossings between sublevels of different blocks over a sweep. Inside a
 * block levels never cross, so only pairs from different blocks are scanned:
 * a sign change of E_a − E_b between neighbouring points brackets a crossing,
 * which is then refined on the exact engine (only the two blocks are
 * re-solved; Illinois regula falsi, see bracketedRoot.ts). Differences within
 * 1e-10 of the sweep's energy scale count as zero, so round-off at exact
 * degeneracies (B = 0) makes no false crossing. A touching without a sign
 * change is not reported.
 */
import { makeWorkspace, solveBlockAt } from './blockSolver';
import { bracketedRoot } from './bracketedRoot';
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

/** Energy of rank `rank` of block `b` at `fieldT`; NaN if the solver fails. */
function energyAt(model: LevelModel, b: number, rank: number, fieldT: number, ws: ReturnType<typeof makeWorkspace>): number {
  return solveBlockAt(model.blocks[b], fieldT, ws) ? ws.values[rank] : Number.NaN;
}

/** Refine a bracketed crossing of a and b between fields lo and hi (differences dLo, dHi there). */
function refine(
  model: LevelModel,
  a: StateSlot,
  b: StateSlot,
  lo: number,
  hi: number,
  dLo: number,
  dHi: number,
  tol: number,
): LevelCrossing | null {
  const ws = makeWorkspace(model.largestBlock);
  const diff = (f: number): number => energyAt(model, a.block, a.rank, f, ws) - energyAt(model, b.block, b.rank, f, ws);
  // Stop once the difference is at the round-off level of the energies (1e-15 of the scale).
  const field = bracketedRoot(diff, lo, hi, dLo, dHi, tol * 1e-5);
  if (!Number.isFinite(field)) return null;
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
  // Energy range of each state: pairs whose ranges do not overlap cannot cross.
  const lo = slots.map((s) => s.energyHz.reduce((m, x) => Math.min(m, x), Infinity) - tol);
  const hi = slots.map((s) => s.energyHz.reduce((m, x) => Math.max(m, x), -Infinity) + tol);
  const out: LevelCrossing[] = [];
  for (let i = 0; i < slots.length; i++) {
    for (let j = i + 1; j < slots.length; j++) {
      const a = slots[i];
      const b = slots[j];
      if (a.block === b.block || hi[i] < lo[j] || hi[j] < lo[i]) continue;
      let lastSide = 0;
      let lastIndex = -1;
      for (let p = 0; p < points; p++) {
        const d = a.energyHz[p] - b.energyHz[p];
        const side = d > tol ? 1 : d < -tol ? -1 : 0;
        if (side === 0) continue;
        if (lastSide !== 0 && side !== lastSide) {
          if (out.length >= MAX_CROSSINGS) {
            issues.push(issue('warning', 'too-many-crossings', `Only the first ${MAX_CROSSINGS} level crossings are reported.`));
            return out.sort((x, y) => x.fieldT - y.fieldT);
          }
          const dLo = a.energyHz[lastIndex] - b.energyHz[lastIndex];
          const c = refine(model, a, b, fieldsT[lastIndex], fieldsT[p], dLo, d, tol);
          if (c) out.push({ ...c, stateA: i, stateB: j });
        }
        lastSide = side;
        lastIndex = p;
      }
    }
  }
  return out.sort((x, y) => x.fieldT - y.fieldT);
}

/**
 * Crossings between sublevels of different blocks over a sweep. Inside a
 * block levels never cross, so only pairs from different blocks are scanned,
 * and only those whose energy order changes along the sweep, around the points
 * where it changes (found in one pass over the sweep's energies, see
 * reorderings):
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
  ws: ReturnType<typeof makeWorkspace>,
): LevelCrossing | null {
  const diff = (f: number): number => energyAt(model, a.block, a.rank, f, ws) - energyAt(model, b.block, b.rank, f, ws);
  // Stop once the difference is at the round-off level of the energies (1e-15 of the scale).
  const field = bracketedRoot(diff, lo, hi, dLo, dHi, tol * 1e-5);
  if (!Number.isFinite(field)) return null;
  return { stateA: -1, stateB: -1, fieldT: field, energyHz: energyAt(model, a.block, a.rank, field, ws) };
}

/** A pair of states (i < j) whose energy order changed, and the first and last point where it did. */
interface Reordering {
  i: number;
  j: number;
  first: number;
  last: number;
}

/**
 * Pairs of states from different blocks whose energy order changes somewhere
 * along the sweep, in (i, j) order. The states are kept sorted by energy from
 * point to point by insertion sort, which swaps exactly the pairs whose order
 * changed since the previous point. A pair whose difference changes sign
 * between two points must be swapped in between, so no crossing is missed,
 * and the cost is about one comparison per state and point.
 */
function reorderings(slots: readonly StateSlot[], points: number): Reordering[] {
  const count = slots.length;
  const energies = slots.map((s) => s.energyHz);
  const order = Int32Array.from(slots.keys()).sort((x, y) => energies[x][0] - energies[y][0]);
  const found = new Map<number, Reordering>();
  for (let p = 1; p < points; p++) {
    for (let i = 1; i < count; i++) {
      const x = order[i];
      const e = energies[x][p];
      let j = i - 1;
      while (j >= 0 && energies[order[j]][p] > e) {
        const y = order[j];
        if (slots[x].block !== slots[y].block) {
          const [lo, hi] = x < y ? [x, y] : [y, x];
          const seen = found.get(lo * count + hi);
          if (seen) seen.last = p;
          else found.set(lo * count + hi, { i: lo, j: hi, first: p, last: p });
        }
        order[j + 1] = y;
        j--;
      }
      order[j + 1] = x;
    }
  }
  return [...found.values()].sort((a, b) => a.i - b.i || a.j - b.j);
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
  const sideOf = (d: number): number => (d > tol ? 1 : d < -tol ? -1 : 0);
  const ws = makeWorkspace(model.largestBlock);
  for (const { i, j, first, last } of reorderings(slots, points)) {
    const a = slots[i];
    const b = slots[j];
    // Outside the points where the pair swapped, its order is fixed: the sign of the
    // difference can change only between the last clear side before the first swap and
    // the first clear side after the last one.
    let start = first - 1;
    while (start > 0 && sideOf(a.energyHz[start] - b.energyHz[start]) === 0) start--;
    let end = last;
    while (end < points - 1 && sideOf(a.energyHz[end] - b.energyHz[end]) === 0) end++;
    let lastSide = 0;
    let lastIndex = -1;
    for (let p = start; p <= end; p++) {
      const d = a.energyHz[p] - b.energyHz[p];
      const side = sideOf(d);
      if (side === 0) continue;
      if (lastSide !== 0 && side !== lastSide) {
        if (out.length >= MAX_CROSSINGS) {
          issues.push(issue('warning', 'too-many-crossings', `Only the first ${MAX_CROSSINGS} level crossings are reported.`));
          return out.sort((x, y) => x.fieldT - y.fieldT);
        }
        const dLo = a.energyHz[lastIndex] - b.energyHz[lastIndex];
        const c = refine(model, a, b, fieldsT[lastIndex], fieldsT[p], dLo, d, tol, ws);
        if (c) out.push({ ...c, stateA: i, stateB: j });
      }
      lastSide = side;
      lastIndex = p;
    }
  }
  return out.sort((x, y) => x.fieldT - y.fieldT);
}

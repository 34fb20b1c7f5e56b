/**
 * Field sweeps. The block model is built once; each block then goes through
 * every field (blockSweep.ts: exact solves at anchor fields and the anchors'
 * perturbation series between them, or an exact solve at every field;
 * smallBlockSweep.ts: closed forms for blocks of order 1 and 2), writing
 * straight into the output arrays (no allocation per point). States are
 * followed by (block, rank), which is exact because levels of one block never
 * cross.
 */
import { makeWorkspace } from './blockSolver';
import { type BlockOutput, makeAnchors, sweepBlockBySeries, sweepBlockPerField } from './blockSweep';
import { buildLevelModel } from './buildModel';
import { findCrossings, type StateSlot } from './crossings';
import { issue } from './issues';
import { fieldSide, type LevelModel } from './levelModel';
import { MAX_SWEEP_POINTS, MAX_SWEEP_VALUES, MAX_SWEEP_WORK } from './limits';
import { isSmallBlock, sweepSmallBlock } from './smallBlockSweep';
import type { EngineIssue, LevelSpec, SweepOptions, SweepResult, SweptState } from './types';
import { checkField } from './validateSpec';

function emptySweep(issues: EngineIssue[]): SweepResult {
  return { fieldsT: new Float64Array(0), states: [], crossings: [], issues };
}

function checkSweepSize(model: LevelModel, points: number, issues: EngineIssue[]): boolean {
  if (points > MAX_SWEEP_POINTS) {
    issues.push(issue('error', 'sweep-too-long', `A sweep may have at most ${MAX_SWEEP_POINTS} points.`));
    return false;
  }
  if (points * model.dimension > MAX_SWEEP_VALUES) {
    issues.push(
      issue(
        'error',
        'sweep-too-large',
        `${points} points × ${model.dimension} sublevels is more than ${MAX_SWEEP_VALUES} values; use fewer points.`,
      ),
    );
    return false;
  }
  let cubes = 0;
  for (const b of model.blocks) cubes += b.size ** 3;
  if (points * cubes > MAX_SWEEP_WORK) {
    issues.push(issue('error', 'sweep-too-costly', 'This sweep would take too long for this level; use fewer points.'));
    return false;
  }
  return true;
}

interface SweepSlot extends StateSlot {
  moment: Float64Array;
  curvature?: Float64Array;
}

/** Row r (`points` values) of the sweep's output store. */
/**
 * Smallest block order swept by series; smaller blocks are solved at every field.
 * From bench/eigen.bench.ts (docs/engine.md).
 */
export const SERIES_MIN_ORDER = 3;

function storeRow(store: Float64Array, points: number, r: number): Float64Array {
  return store.subarray(r * points, (r + 1) * points);
}

/** Solve every block at every field of `fieldsT`, filling the swept states in block order. */
function runSweep(model: LevelModel, fieldsT: Float64Array, options: SweepOptions, issues: EngineIssue[]): SweepSlot[] | null {
  const points = fieldsT.length;
  const curvature = options.curvature === true;
  const perField = options.method === 'per-field';
  const ws = makeWorkspace(model.largestBlock);
  const anchors = makeAnchors(model.largestBlock);
  const slots: SweepSlot[] = [];
  let skipped = 0;
  // One allocation for every output array (views into it), so a sweep makes no garbage per state.
  // State s owns rows perState·s (energy), +1 (moment) and +2 (curvature) of `store`.
  const perState = curvature ? 3 : 2;
  const store = new Float64Array(model.dimension * points * perState);
  const out: BlockOutput = { store, base: 0, stride: perState * points, points, curvature, curv: new Float64Array(model.largestBlock) };
  for (let b = 0; b < model.blocks.length; b++) {
    const block = model.blocks[b];
    const first = slots.length;
    for (let k = 0; k < block.size; k++) {
      const r = perState * (first + k);
      const slot: SweepSlot = { block: b, rank: k, energyHz: storeRow(store, points, r), moment: storeRow(store, points, r + 1) };
      if (curvature) slot.curvature = storeRow(store, points, r + 2);
      slots.push(slot);
    }
    out.base = perState * first * points;
    // The series expands H0 + B·Z; a block with a B² (diamagnetic) term is solved at every field.
    // Blocks of order 1 and 2 have closed forms.
    let left: number;
    if (perField || block.quadratic !== undefined) left = sweepBlockPerField(block, fieldsT, ws, out);
    else if (isSmallBlock(block)) left = sweepSmallBlock(block, fieldsT, ws, out);
    else if (block.size < SERIES_MIN_ORDER) left = sweepBlockPerField(block, fieldsT, ws, out);
    else left = sweepBlockBySeries(block, fieldsT, anchors, out);
    if (left < 0) {
      issues.push(issue('error', 'solver-failed', 'The eigen-solver did not converge during the sweep.'));
      return null;
    }
    skipped += left;
    options.onProgress?.(slots.length, model.dimension);
  }
  if (skipped > 0) {
    issues.push(issue('warning', 'degenerate-block', 'Some states of one m block were degenerate; their curvature leaves those pairs out.'));
  }
  return slots;
}

/**
 * Sublevel energies and moments at `points` evenly spaced fields from `fromT`
 * to `toT` (both included). Labels belong to the side of zero field that the
 * larger |B| end lies on; crossings between blocks are found by bisection.
 */
export function sweepLevel(spec: LevelSpec, fromT: number, toT: number, points: number, options: SweepOptions = {}): SweepResult {
  const { model, issues } = buildLevelModel(spec);
  if (!model) return emptySweep(issues);
  if (!checkField(fromT, 'start field', issues) || !checkField(toT, 'end field', issues)) return emptySweep(issues);
  if (!Number.isInteger(points) || points < 2) {
    issues.push(issue('error', 'bad-points', 'A sweep needs a whole number of points, at least 2.'));
    return emptySweep(issues);
  }
  if (fromT === toT) {
    issues.push(issue('error', 'empty-sweep', 'The sweep starts and ends at the same field; give two different fields.'));
    return emptySweep(issues);
  }
  if (!checkSweepSize(model, points, issues)) return emptySweep(issues);

  const fieldsT = new Float64Array(points);
  for (let p = 0; p < points; p++) fieldsT[p] = fromT + ((toT - fromT) * p) / (points - 1);
  fieldsT[points - 1] = toT;
  const slots = runSweep(model, fieldsT, options, issues);
  if (!slots) return emptySweep(issues);

  // Present states ordered by energy at the start of the sweep.
  const order = slots.map((_, i) => i);
  order.sort((i, j) => slots[i].energyHz[0] - slots[j].energyHz[0] || model.blocks[slots[i].block].twoM - model.blocks[slots[j].block].twoM);
  const sorted = order.map((i) => slots[i]);
  const side = fieldSide(Math.abs(toT) >= Math.abs(fromT) ? toT : fromT);
  const states: SweptState[] = sorted.map((s) => {
    const block = model.blocks[s.block];
    const out: SweptState = {
      twoM: block.twoM,
      low: block.low[side][s.rank].label,
      high: block.high[side][s.rank].label,
      energyHz: s.energyHz,
      momentJT: s.moment,
    };
    if (s.curvature) out.d2EdB2 = s.curvature;
    return out;
  });
  const crossings = options.crossings === false ? [] : findCrossings(model, fieldsT, sorted, issues);
  return { fieldsT, states, crossings, issues };
}

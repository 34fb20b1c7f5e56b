/**
 * All sublevels of one level at one field: energies, eigenvectors, moments,
 * curvatures and both adiabatic labels.
 */
import { BOHR_MAGNETON_HZ_PER_T, PLANCK_H } from '../constants';
import { curvaturesOf, makeWorkspace, slopesOf, solveBlockAt } from './blockSolver';
import { buildLevelModel, type ModelResult } from './buildModel';
import { issue } from './issues';
import { fieldSide, type LevelModel } from './levelModel';
import type { EngineIssue, LevelSpec, SolveResult, SublevelState } from './types';
import { checkField } from './validateSpec';

/** Column k of a row-major n × n matrix, with its largest component made positive. */
function canonicalColumn(vectors: Float64Array, n: number, k: number): Float64Array {
  const out = new Float64Array(n);
  let big = 0;
  let at = 0;
  for (let i = 0; i < n; i++) {
    out[i] = vectors[i * n + k];
    if (Math.abs(out[i]) > big * (1 + 1e-12)) {
      big = Math.abs(out[i]);
      at = i;
    }
  }
  if (out[at] < 0) for (let i = 0; i < n; i++) out[i] = -out[i];
  return out;
}

/** Solve an already-built model; shared by solveLevel and the regime search. */
export function solveModel(model: LevelModel, fieldT: number): SolveResult {
  const issues: EngineIssue[] = [];
  const side = fieldSide(fieldT);
  const states: SublevelState[] = [];
  const ws = makeWorkspace(model.largestBlock);
  const slopes = new Float64Array(model.largestBlock);
  const curv = new Float64Array(model.largestBlock);
  let skipped = 0;
  for (const block of model.blocks) {
    const n = block.size;
    if (!solveBlockAt(block, fieldT, ws)) {
      issues.push(issue('error', 'solver-failed', `The eigen-solver did not converge for the block 2m = ${block.twoM}.`));
      return { states: [], issues };
    }
    slopesOf(block, ws, slopes, 0, fieldT);
    skipped += curvaturesOf(block, ws, curv, 0, fieldT);
    for (let k = 0; k < n; k++) {
      states.push({
        index: 0,
        twoM: block.twoM,
        energyHz: ws.values[k],
        momentJT: -slopes[k] * PLANCK_H,
        momentBohr: -slopes[k] / BOHR_MAGNETON_HZ_PER_T,
        d2EdB2: curv[k],
        low: block.low[side][k].label,
        high: block.high[side][k].label,
        vector: canonicalColumn(ws.vectors, n, k),
        basis: block.basis,
      });
    }
  }
  if (skipped > 0) {
    issues.push(
      issue(
        'warning',
        'degenerate-block',
        'Some states of one m block are degenerate at this field (constants with extra symmetry); their curvature leaves those pairs out.',
      ),
    );
  }
  states.sort((a, b) => a.energyHz - b.energyHz || a.twoM - b.twoM);
  states.forEach((s, i) => (s.index = i));
  return { states, issues };
}

/**
 * Every sublevel of `spec` at `fieldT` tesla (energies E/h in Hz, sorted ascending). `built` is
 * the spec's model when the caller already has it (it is not changed).
 */
export function solveLevel(spec: LevelSpec, fieldT: number, built: ModelResult = buildLevelModel(spec)): SolveResult {
  const model = built.model;
  const issues = [...built.issues];
  if (!model) return { states: [], issues };
  if (!checkField(fieldT, 'field', issues)) return { states: [], issues };
  const solved = solveModel(model, fieldT);
  return { states: solved.states, issues: [...issues, ...solved.issues] };
}

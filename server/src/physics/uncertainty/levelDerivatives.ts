/**
 * Exact derivatives of every sublevel energy and slope dE/dB with respect to the parameters the
 * Hamiltonian is linear in (field, A, B, C, g_J, g_I for a hyperfine level; field, ζ, g_I for a
 * term), from the eigenvectors:
 *   ∂E_k/∂p      = <k|P|k>                                            (Hellmann–Feynman)
 *   ∂²E_k/∂B∂p   = <k|∂Z/∂p|k> + 2 Σ_{l≠k} <k|Z|l><l|P|k> / (E_k − E_l) (first-order perturbation of |k>)
 * with P = ∂H/∂p and Z = ∂H/∂B. Every P conserves the engine's block quantum numbers, so only
 * states of one block mix. States degenerate inside a block (non-generic constants): P is
 * diagonalised in their subspace and its eigenvalues given in ascending order to the states in
 * ascending order — the one-sided derivative for an increasing p — and the pair is flagged.
 */
import { BOHR_MAGNETON_HZ_PER_T } from '../constants';
import { buildLevelModel } from '../engine/buildModel';
import { makeWorkspace, solveBlockAt } from '../engine/blockSolver';
import { dotProductBlock } from '../engine/couplingMatrix';
import { zeroFieldMatrix } from '../engine/hyperfineModel';
import { fieldSide, type LevelBlock } from '../engine/levelModel';
import { symmetricEigen } from '../engine/symmetricEigen';
import type { EngineIssue, HighFieldLabel, LevelSpec, LowFieldLabel } from '../engine/types';
import type { CleanSpec } from '../engine/validateSpec';

export type LevelParam = 'field' | 'A' | 'B' | 'C' | 'gJ' | 'gI' | 'zeta';

export type ParamPartials = Partial<Record<LevelParam, number>>;

export interface StateDerivatives {
  twoM: number;
  energyHz: number;
  /** The state's low-field label, as solveLevel gives it (so callers need not solve the level again). */
  low: LowFieldLabel;
  /** ∂E/∂p, Hz per unit of p (Hz/T for the field, Hz/Hz for A, B, C, ζ). */
  dE: ParamPartials;
  /** ∂(dE/dB)/∂p, Hz/T per unit of p (for p = field: d²E/dB²). */
  dSlope: ParamPartials;
  /** Degenerate with another state of its block: the derivatives are one-sided. */
  degenerate: boolean;
}

export interface LevelDerivatives {
  /** In the engine's order (energy ascending, then m), so index k matches solveLevel's state k. */
  states: StateDerivatives[];
  issues: EngineIssue[];
}

interface ParamMatrix {
  param: LevelParam;
  /** ∂H/∂p on the block, row-major n × n. */
  h: Float64Array;
  /** ∂Z/∂p, diagonal (only for the g-factors). */
  dz?: Float64Array;
}

function diag(values: readonly number[]): Float64Array {
  const n = values.length;
  const m = new Float64Array(n * n);
  values.forEach((v, i) => (m[i * n + i] = v));
  return m;
}

function twoMIOf(l: HighFieldLabel): number {
  return l.scheme === 'mJ,mI' ? l.twoMI : l.twoMI ?? 0;
}

function paramMatrices(spec: CleanSpec, block: LevelBlock, fieldT: number): ParamMatrix[] {
  const mu = BOHR_MAGNETON_HZ_PER_T;
  const n = block.size;
  // With a diamagnetic term ∂H/∂B = Z + 2B·D, and its own B-derivative 2D enters d²E/dB².
  const q = block.quadratic;
  const field: ParamMatrix = q
    ? { param: 'field', h: diag([...block.zeeman].map((z, i) => z + 2 * fieldT * q[i]!)), dz: q.map((x) => 2 * x) }
    : { param: 'field', h: diag([...block.zeeman]) };
  const out: ParamMatrix[] = [field];
  const zI = block.basis.map((l) => (mu * twoMIOf(l)) / 2);
  out.push({ param: 'gI', h: diag(zI.map((z) => z * fieldT)), dz: Float64Array.from(zI) });
  if (spec.kind === 'hyperfine') {
    const twoMJ = block.basis.map((l) => (l.scheme === 'mJ,mI' ? l.twoMJ : 0));
    const zJ = twoMJ.map((m) => (mu * m) / 2);
    out.push({ param: 'gJ', h: diag(zJ.map((z) => z * fieldT)), dz: Float64Array.from(zJ) });
    const x = dotProductBlock(spec.twoJ, spec.twoI, twoMJ, block.twoM);
    out.push({ param: 'A', h: x });
    out.push({ param: 'B', h: zeroFieldMatrix({ ...spec, A: 0, B: 1, C: 0 }, x, n) });
    out.push({ param: 'C', h: zeroFieldMatrix({ ...spec, A: 0, B: 0, C: 1 }, x, n) });
  } else {
    const twoML = block.basis.map((l) => (l.scheme === 'mL,mS' ? l.twoML : 0));
    const twoMJ = block.basis.map((l) => (l.scheme === 'mL,mS' ? l.twoML + l.twoMS : 0));
    out.push({ param: 'zeta', h: dotProductBlock(2 * spec.L, spec.twoS, twoML, twoMJ[0] ?? 0) });
  }
  return out;
}

/** Vᵀ M V for the eigenvector columns of V (both row-major n × n). */
function inEigenbasis(m: Float64Array, v: Float64Array, n: number): Float64Array {
  const mv = new Float64Array(n * n);
  for (let i = 0; i < n; i++) for (let k = 0; k < n; k++) {
    let s = 0;
    for (let j = 0; j < n; j++) s += m[i * n + j] * v[j * n + k];
    mv[i * n + k] = s;
  }
  const out = new Float64Array(n * n);
  for (let k = 0; k < n; k++) for (let l = 0; l < n; l++) {
    let s = 0;
    for (let i = 0; i < n; i++) s += v[i * n + k] * mv[i * n + l];
    out[k * n + l] = s;
  }
  return out;
}

/** Groups of consecutive eigenvalues closer than `floor` (each a list of indices). */
function degenerateGroups(values: Float64Array, n: number, floor: number): number[][] {
  const groups: number[][] = [];
  let current = [0];
  for (let k = 1; k < n; k++) {
    if (values[k] - values[k - 1] <= floor) current.push(k);
    else {
      groups.push(current);
      current = [k];
    }
  }
  if (n > 0) groups.push(current);
  return groups;
}

/** Ascending eigenvalues of the sub-matrix of w (order n) on the indices of `group`. */
function subspaceValues(w: Float64Array, n: number, group: number[]): Float64Array {
  const g = group.length;
  const a = new Float64Array(g * g);
  for (let i = 0; i < g; i++) for (let j = 0; j < g; j++) a[i * g + j] = w[group[i]! * n + group[j]!];
  const values = new Float64Array(g);
  symmetricEigen(a, g, values, new Float64Array(g * g));
  return values;
}

function blockDerivatives(spec: CleanSpec, block: LevelBlock, fieldT: number, values: Float64Array, vectors: Float64Array): StateDerivatives[] {
  const n = block.size;
  let scale = 0;
  for (let k = 0; k < n; k++) scale = Math.max(scale, Math.abs(values[k]));
  const floor = 1e-12 * scale + 1e-300;
  const groups = degenerateGroups(values, n, floor);
  const groupOf = new Int32Array(n);
  groups.forEach((g, gi) => g.forEach((k) => (groupOf[k] = gi)));
  const states: StateDerivatives[] = [];
  const low = block.low[fieldSide(fieldT)];
  for (let k = 0; k < n; k++) states.push({ twoM: block.twoM, energyHz: values[k], low: low[k]!.label, dE: {}, dSlope: {}, degenerate: groups[groupOf[k]]!.length > 1 });
  const mats = paramMatrices(spec, block, fieldT);
  const zW = inEigenbasis(mats[0]!.h, vectors, n);
  for (const pm of mats) {
    const w = pm.param === 'field' ? zW : inEigenbasis(pm.h, vectors, n);
    const dzW = pm.dz ? inEigenbasis(diag([...pm.dz]), vectors, n) : undefined;
    for (const g of groups) {
      const first = g.length === 1 ? [w[g[0]! * n + g[0]!]] : [...subspaceValues(w, n, g)];
      g.forEach((k, i) => (states[k]!.dE[pm.param] = first[i]!));
    }
    for (let k = 0; k < n; k++) {
      let s = dzW ? dzW[k * n + k] : 0;
      for (let l = 0; l < n; l++) {
        if (groupOf[l] === groupOf[k]) continue;
        s += (2 * zW[k * n + l] * w[l * n + k]) / (values[k] - values[l]);
      }
      states[k]!.dSlope[pm.param] = s;
    }
  }
  return states;
}

/** Derivatives of every sublevel of `spec` at `fieldT`, in the engine's state order. */
export function levelDerivatives(spec: LevelSpec, fieldT: number): LevelDerivatives {
  const { model, issues } = buildLevelModel(spec);
  if (!model || !Number.isFinite(fieldT)) return { states: [], issues };
  const ws = makeWorkspace(model.largestBlock);
  const states: StateDerivatives[] = [];
  for (const block of model.blocks) {
    if (!solveBlockAt(block, fieldT, ws)) return { states: [], issues };
    states.push(...blockDerivatives(model.spec, block, fieldT, ws.values.slice(0, block.size), ws.vectors.slice(0, block.size * block.size)));
  }
  // The same order as solveModel: energy, then m, stable in block order.
  states.sort((a, b) => a.energyHz - b.energyHz || a.twoM - b.twoM);
  return { states, issues };
}

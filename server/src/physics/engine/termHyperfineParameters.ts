/**
 * From the J-level hyperfine constants of a term to the parameters of its whole-term
 * Hamiltonian (see termOperators.ts): the dipole radial parameters a_L (orbital), a_SD
 * (spin-dipolar), a_C (contact) and the orbital quadrupole b_L.
 *
 * Inside one level J the dipole operators act as A_J J·I (projection theorem), so
 * A_J = c_L(J) a_L + c_SD(J) a_SD + c_C(J) a_C with c_X(J) = <X>/(J I) in the stretched state
 * |J, m_J = J>|I, m_I = I> (where J·I = J I). Likewise B_J = c_Q(J) b_L. The coefficients are
 * computed from the same matrices the engine diagonalises, so they cannot disagree with them.
 *
 * Unknowns: L = 0 has only a_C, S = 0 only a_L; otherwise all three. With fewer usable A_J
 * (J > 0) than unknowns, the stated assumption a_L = a_SD (one radial mean ⟨r⁻³⟩ for the orbital
 * and spin-dipolar parts, as for one electron without relativistic corrections) closes the
 * system; with only one usable A_J for three unknowns the data are not enough.
 */
import { couplings, jj1 } from './halfIntegers';
import { issue } from './issues';
import { symmetricEigen } from './symmetricEigen';
import { termBlockParts } from './termAngularParts';
import { orbitalQuadrupoleActs } from './termOperators';
import type { EngineIssue } from './types';

export interface RadialParameters {
  orbital: number;
  spinDipolar: number;
  contact: number;
}

export interface LevelCoefficients {
  twoJ: number;
  orbital: number;
  spinDipolar: number;
  contact: number;
  /** c_Q(J); NaN where the quadrupole cannot act on the level (J < 1 or I < 1). */
  quadrupole: number;
}

export type HyperfineSource = 'none' | 'radial' | 'level-constants' | 'level-constants, a_L = a_SD';

export interface TermHyperfine {
  radial: RadialParameters;
  quadrupoleL: number;
  source: HyperfineSource;
}

function expectation(m: Float64Array, v: Float64Array, n: number): number {
  let s = 0;
  for (let i = 0; i < n; i++) {
    let r = 0;
    for (let j = 0; j < n; j++) r += m[i * n + j] * v[j];
    s += v[i] * r;
  }
  return s;
}

/** Stretched-state quadrupole factor of the Casimir formula: [¾K(K+1) − I(I+1)J(J+1)]/[2I(2I−1)J(2J−1)], K = 2IJ. */
function stretchedQuadrupole(twoJ: number, twoI: number): number {
  const I = twoI / 2;
  const J = twoJ / 2;
  const K = 2 * I * J;
  return (0.75 * K * (K + 1) - jj1(twoI) * jj1(twoJ)) / (2 * I * (2 * I - 1) * J * (2 * J - 1));
}

/** c_L, c_SD, c_C (and c_Q) of every level J > 0 of the term; needs I > 0. */
export function levelCoefficients(twoL: number, twoS: number, twoI: number): LevelCoefficients[] {
  const two = [twoL, twoS, twoI] as const;
  const jValues = couplings(twoL, twoS);
  const out: LevelCoefficients[] = [];
  for (const twoJ of jValues) {
    if (twoJ === 0 || twoI === 0) continue;
    const { basis, ops, projectors } = termBlockParts(two, twoJ + twoI);
    const n = ops.n;
    const p = projectors.get(twoJ) as Float64Array;
    // P_J restricted to m_I = I, m_J = J has rank one: its leading eigenvector is |J, J>|I, I>.
    const values = new Float64Array(n);
    const vectors = new Float64Array(n * n);
    symmetricEigen(Float64Array.from(p), n, values, vectors);
    const v = new Float64Array(n);
    for (let i = 0; i < n; i++) v[i] = basis.states[i][2] === twoI ? vectors[i * n + n - 1] : 0;
    const norm = Math.hypot(...v);
    for (let i = 0; i < n; i++) v[i] /= norm;
    const ji = (twoJ * twoI) / 4;
    out.push({
      twoJ,
      orbital: expectation(ops.LI, v, n) / ji,
      spinDipolar: expectation(ops.D, v, n) / ji,
      contact: expectation(ops.SI, v, n) / ji,
      quadrupole: orbitalQuadrupoleActs(twoL, twoI) && twoJ >= 2 ? expectation(ops.Q, v, n) / stretchedQuadrupole(twoJ, twoI) : Number.NaN,
    });
  }
  return out;
}

/** Least squares for a few unknowns by the normal equations; null when singular. */
function leastSquares(rows: number[][], rhs: number[]): number[] | null {
  const k = rows[0]?.length ?? 0;
  const m: number[][] = [];
  for (let i = 0; i < k; i++) {
    m.push([]);
    for (let j = 0; j <= k; j++) {
      let s = 0;
      for (let r = 0; r < rows.length; r++) s += rows[r][i] * (j < k ? rows[r][j] : rhs[r]);
      m[i].push(s);
    }
  }
  let scale = 0;
  for (const row of m) for (let j = 0; j < k; j++) scale = Math.max(scale, Math.abs(row[j]));
  for (let c = 0; c < k; c++) {
    let piv = c;
    for (let r = c + 1; r < k; r++) if (Math.abs(m[r][c]) > Math.abs(m[piv][c])) piv = r;
    if (!(Math.abs(m[piv][c]) > 1e-12 * scale)) return null;
    [m[c], m[piv]] = [m[piv], m[c]];
    for (let r = 0; r < k; r++) {
      if (r === c) continue;
      const f = m[r][c] / m[c][c];
      for (let j = c; j <= k; j++) m[r][j] -= f * m[c][j];
    }
  }
  return m.map((row, i) => row[k] / row[i]);
}

/**
 * Radial parameters from J-level constants `levelA` (twoJ → A_J, Hz) and `levelB`
 * (twoJ → B_J). Returns null, with an error issue, when the data cannot fix them.
 */
export function hyperfineFromLevels(
  twoL: number,
  twoS: number,
  twoI: number,
  levelA: ReadonlyMap<number, number>,
  levelB: ReadonlyMap<number, number>,
  issues: EngineIssue[],
): TermHyperfine | null {
  const coeffs = levelCoefficients(twoL, twoS, twoI).filter((c) => levelA.has(c.twoJ));
  const rhs = coeffs.map((c) => levelA.get(c.twoJ) as number);
  const noData = coeffs.length === 0 || rhs.every((a) => a === 0);
  if (noData && levelB.size === 0) {
    issues.push(issue('error', 'term-no-hyperfine', 'The term has no usable hyperfine data: give the A constant of at least one level with J > 0 (two levels when the term has both L > 0 and S > 0), or the radial parameters.'));
    return null;
  }
  let radial: RadialParameters = { orbital: 0, spinDipolar: 0, contact: 0 };
  let source: HyperfineSource = 'level-constants';
  if (!noData) {
    let solved: number[] | null = null;
    if (twoL === 0) {
      solved = leastSquares(coeffs.map((c) => [c.contact]), rhs);
      if (solved) radial = { orbital: 0, spinDipolar: 0, contact: solved[0] };
    } else if (twoS === 0) {
      solved = leastSquares(coeffs.map((c) => [c.orbital]), rhs);
      if (solved) radial = { orbital: solved[0], spinDipolar: 0, contact: 0 };
    } else {
      if (coeffs.length >= 3) solved = leastSquares(coeffs.map((c) => [c.orbital, c.spinDipolar, c.contact]), rhs);
      if (solved) radial = { orbital: solved[0], spinDipolar: solved[1], contact: solved[2] };
      else if (coeffs.length >= 2) {
        solved = leastSquares(coeffs.map((c) => [c.orbital + c.spinDipolar, c.contact]), rhs);
        source = 'level-constants, a_L = a_SD';
        if (solved) radial = { orbital: solved[0], spinDipolar: solved[0], contact: solved[1] };
      }
    }
    if (!solved) {
      issues.push(issue('error', 'term-hyperfine-underdetermined', 'One A constant cannot fix the orbital, spin-dipolar and contact parts of this term: give the A constants of two of its levels, or the radial parameters.'));
      return null;
    }
    const misfit = Math.max(...coeffs.map((c, i) => Math.abs(c.orbital * radial.orbital + c.spinDipolar * radial.spinDipolar + c.contact * radial.contact - rhs[i])));
    const size = Math.max(...rhs.map(Math.abs));
    if (misfit > 1e-6 * size) {
      issues.push(issue('warning', 'term-hyperfine-misfit', `The level A constants do not fit one set of radial parameters; the best fit misses by up to ${misfit.toPrecision(3)} Hz.`));
    }
  }
  return { radial, quadrupoleL: quadrupoleFromLevels(twoL, twoS, twoI, levelB, issues), source };
}

function quadrupoleFromLevels(twoL: number, twoS: number, twoI: number, levelB: ReadonlyMap<number, number>, issues: EngineIssue[]): number {
  if (levelB.size === 0) return 0;
  const usable = levelCoefficients(twoL, twoS, twoI).filter((c) => levelB.has(c.twoJ) && Number.isFinite(c.quadrupole) && c.quadrupole !== 0);
  if (usable.length === 0) {
    issues.push(issue('warning', 'term-quadrupole-ignored', 'The quadrupole constants cannot act on this term (they need L ≥ 1, I ≥ 1 and J ≥ 1); they were ignored.'));
    return 0;
  }
  let num = 0;
  let den = 0;
  for (const c of usable) {
    num += c.quadrupole * (levelB.get(c.twoJ) as number);
    den += c.quadrupole * c.quadrupole;
  }
  return num / den;
}

/**
 * The uncoupled basis |m_L, m_S, m_I> of a whole LS term with its nucleus, one block per
 * total m = m_L + m_S + m_I, and scalar products of any two of L, S, I inside a block.
 * Every scalar product conserves the total m, so products of them stay inside the block exactly.
 */
import { raiseCoef } from './halfIntegers';

/** Which momentum: 0 = L, 1 = S, 2 = I. */
export type Momentum = 0 | 1 | 2;

export interface TermBlockBasis {
  twoM: number;
  /** Twice-projections [m_L, m_S, m_I] per basis state, m_L then m_S descending. */
  states: [number, number, number][];
  index: Map<string, number>;
}

const key = (p: readonly number[]): string => `${p[0]},${p[1]},${p[2]}`;

/** The basis of total twoM for twice-momenta [2L, 2S, 2I]. */
export function termBlockBasis(two: readonly [number, number, number], twoM: number): TermBlockBasis {
  const states: [number, number, number][] = [];
  for (let mL = two[0]; mL >= -two[0]; mL -= 2) {
    for (let mS = two[1]; mS >= -two[1]; mS -= 2) {
      const mI = twoM - mL - mS;
      if (Math.abs(mI) <= two[2] && (two[2] - mI) % 2 === 0) states.push([mL, mS, mI]);
    }
  }
  const index = new Map<string, number>();
  states.forEach((p, i) => index.set(key(p), i));
  return { twoM, states, index };
}

/** Size of the block of total twoM, counted without building it (for the size caps). */
export function termBlockSize(two: readonly [number, number, number], twoM: number): number {
  let n = 0;
  for (let mL = two[0]; mL >= -two[0]; mL -= 2) {
    for (let mS = two[1]; mS >= -two[1]; mS -= 2) {
      const mI = twoM - mL - mS;
      if (Math.abs(mI) <= two[2] && (two[2] - mI) % 2 === 0) n++;
    }
  }
  return n;
}

/** Row-major matrix of a·b = a_z b_z + ½(a₊b₋ + a₋b₊) in the block. */
export function termDotBlock(two: readonly [number, number, number], basis: TermBlockBasis, a: Momentum, b: Momentum): Float64Array {
  const n = basis.states.length;
  const x = new Float64Array(n * n);
  for (let k = 0; k < n; k++) {
    const p = basis.states[k];
    x[k * n + k] += (p[a] * p[b]) / 4;
    // a₊b₋ then a₋b₊ acting on |p>; raiseCoef(2j, 2m) = <m+1|j₊|m>, and <m−1|j₋|m> = raiseCoef(2j, 2m − 2).
    for (const up of [a, b] as const) {
      const down = up === a ? b : a;
      const c = raiseCoef(two[up], p[up]) * raiseCoef(two[down], p[down] - 2);
      if (c === 0) continue;
      const q: number[] = [p[0], p[1], p[2]];
      q[up] += 2;
      q[down] -= 2;
      const t = basis.index.get(key(q));
      if (t !== undefined) x[t * n + k] += 0.5 * c;
    }
  }
  return x;
}

/** a + s·b for row-major matrices of equal size (a new array). */
export function addScaled(a: Float64Array, b: Float64Array, s: number): Float64Array {
  const out = new Float64Array(a.length);
  for (let i = 0; i < a.length; i++) out[i] = a[i] + s * b[i];
  return out;
}

import { EigenvalueDecomposition, Matrix } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { symmetricEigen } from '../../server/src/physics/engine';
import { householderInverseIterationInPlace } from '../../server/src/physics/engine/householderInverseIteration';
import { householderQlInPlace } from '../../server/src/physics/engine/householderQl';
import { jacobiInPlace } from '../../server/src/physics/engine/jacobiEigen';
import { simdEigenpairs } from '../../server/src/physics/engine/simdEigen';
import { sortEigenPairs } from '../../server/src/physics/engine/sortEigenPairs';

type Solve = (a: Float64Array, n: number) => { values: Float64Array; vectors: Float64Array; ok: boolean };

const jacobi: Solve = (a, n) => {
  const vectors = new Float64Array(n * n);
  const work = a.slice();
  const ok = jacobiInPlace(work, n, vectors);
  const values = new Float64Array(n).map((_, i) => work[i * n + i]);
  sortEigenPairs(values, vectors, n);
  return { values, vectors, ok };
};

const householder: Solve = (a, n) => {
  const vectors = new Float64Array(n * n);
  const values = new Float64Array(n);
  const s = () => new Float64Array(n);
  const ok = householderQlInPlace(a.slice(), n, values, vectors, s(), s(), s());
  sortEigenPairs(values, vectors, n);
  return { values, vectors, ok };
};

const inverseIteration: Solve = (a, n) => {
  const vectors = new Float64Array(n * n);
  const values = new Float64Array(n);
  const ok = householderInverseIterationInPlace(a.slice(), n, values, vectors);
  return { values, vectors, ok };
};

const simdKernels: Solve = (a, n) => {
  const vectors = new Float64Array(n * n);
  const values = new Float64Array(n);
  const ok = simdEigenpairs(a.slice(), n, values, vectors);
  return { values, vectors, ok };
};

const dispatcher: Solve = (a, n) => {
  const vectors = new Float64Array(n * n);
  const values = new Float64Array(n);
  const ok = symmetricEigen(a.slice(), n, values, vectors);
  return { values, vectors, ok };
};

const SOLVERS: [string, Solve][] = [
  ['Jacobi', jacobi],
  ['Householder + QR', householder],
  ['Householder + inverse iteration', inverseIteration],
  ['WebAssembly kernels, divide and conquer', simdKernels],
  ['engine dispatcher', dispatcher],
];

function lcg(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
    return s / 4294967296 - 0.5;
  };
}

function randomSymmetric(n: number, seed: number): Float64Array {
  const r = lcg(seed);
  const a = new Float64Array(n * n);
  for (let i = 0; i < n; i++) for (let j = i; j < n; j++) a[i * n + j] = a[j * n + i] = r();
  return a;
}

function checkDecomposition(a: Float64Array, n: number, values: Float64Array, vectors: Float64Array, tol: number): void {
  let norm = 0;
  for (const x of a) norm = Math.max(norm, Math.abs(x));
  for (let k = 0; k < n; k++) {
    for (let i = 0; i < n; i++) {
      let av = 0;
      for (let j = 0; j < n; j++) av += a[i * n + j] * vectors[j * n + k];
      expect(Math.abs(av - values[k] * vectors[i * n + k])).toBeLessThan(tol * n * Math.max(norm, 1e-300));
    }
    for (let l = 0; l < n; l++) {
      let dot = 0;
      for (let i = 0; i < n; i++) dot += vectors[i * n + k] * vectors[i * n + l];
      expect(Math.abs(dot - (k === l ? 1 : 0))).toBeLessThan(tol * n);
    }
  }
  for (let k = 1; k < n; k++) expect(values[k]).toBeGreaterThanOrEqual(values[k - 1]);
}

describe.each(SOLVERS)('%s eigen-solver', (_name, solve) => {
  it('tridiagonal Toeplitz matrices: λ_k = a + 2b cos(kπ/(n+1)) (textbook closed form)', () => {
    for (const n of [2, 3, 5, 8, 17, 40]) {
      const a = new Float64Array(n * n);
      for (let i = 0; i < n; i++) {
        a[i * n + i] = 3;
        if (i + 1 < n) a[i * n + i + 1] = a[(i + 1) * n + i] = -1.25;
      }
      const { values, vectors, ok } = solve(a, n);
      expect(ok).toBe(true);
      const exact = Array.from({ length: n }, (_, k) => 3 + 2 * -1.25 * Math.cos(((k + 1) * Math.PI) / (n + 1))).sort((x, y) => x - y);
      exact.forEach((e, k) => expect(Math.abs(values[k] - e)).toBeLessThan(1e-13));
      checkDecomposition(a, n, values, vectors, 1e-14);
    }
  });

  it('random symmetric matrices agree with ml-matrix (general-purpose library) and decompose A', () => {
    for (const n of [1, 2, 3, 4, 6, 7, 9, 16, 33]) {
      const a = randomSymmetric(n, 17 * n);
      const { values, vectors, ok } = solve(a, n);
      expect(ok).toBe(true);
      const lib = new EigenvalueDecomposition(new Matrix(Array.from({ length: n }, (_, i) => Array.from(a.subarray(i * n, i * n + n)))), {
        assumeSymmetric: true,
      });
      const ref = [...lib.realEigenvalues].sort((x, y) => x - y);
      ref.forEach((e, k) => expect(Math.abs(values[k] - e)).toBeLessThan(1e-13 * n));
      checkDecomposition(a, n, values, vectors, 1e-14);
    }
  });

  it('degenerate and trivial matrices: identity, zero, a rank-one matrix', () => {
    const n = 6;
    const eye = new Float64Array(n * n);
    for (let i = 0; i < n; i++) eye[i * n + i] = 2;
    expect(Array.from(solve(eye, n).values)).toEqual(new Array(n).fill(2));
    expect(Array.from(solve(new Float64Array(n * n), n).values)).toEqual(new Array(n).fill(0));
    const u = [1, 2, -1, 0.5, 3, -2];
    const r1 = new Float64Array(n * n);
    for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) r1[i * n + j] = u[i] * u[j];
    const { values, vectors } = solve(r1, n);
    const uu = u.reduce((s, x) => s + x * x, 0);
    expect(Math.abs(values[n - 1] - uu)).toBeLessThan(1e-13 * uu);
    for (let k = 0; k < n - 1; k++) expect(Math.abs(values[k])).toBeLessThan(1e-13 * uu);
    checkDecomposition(r1, n, values, vectors, 1e-14);
  });

  it('widely graded entries (Zeeman ≫ hyperfine) keep the small splittings', () => {
    // 2 × 2: [[1e11, 1e3], [1e3, −1e11]] has eigenvalues ±sqrt(1e22 + 1e6)
    const a = new Float64Array([1e11, 1e3, 1e3, -1e11]);
    const { values } = solve(a, 2);
    const exact = Math.sqrt(1e22 + 1e6);
    expect(Math.abs(values[1] - exact)).toBeLessThan(1e-4);
    expect(Math.abs(values[0] + exact)).toBeLessThan(1e-4);
  });

  it('entries near the ends of the double range (1e-170, 1e150) are handled by scaling', () => {
    for (const scale of [1e-170, 1e150]) {
      const n = 5;
      const a = new Float64Array(n * n);
      for (let i = 0; i < n; i++) {
        a[i * n + i] = 3 * scale;
        if (i + 1 < n) a[i * n + i + 1] = a[(i + 1) * n + i] = -1.25 * scale;
      }
      const { values, ok } = solve(a, n);
      expect(ok).toBe(true);
      const exact = Array.from({ length: n }, (_, k) => 3 + 2 * -1.25 * Math.cos(((k + 1) * Math.PI) / (n + 1))).sort((x, y) => x - y);
      exact.forEach((e, k) => expect(Math.abs(values[k] / scale - e)).toBeLessThan(1e-13));
    }
  });

  it('reports non-finite input instead of looping', () => {
    const a = new Float64Array([1, Number.NaN, Number.NaN, 2]);
    expect(solve(a, 2).ok).toBe(false);
  });
});

describe('large orders (the inverse-iteration route of the dispatcher)', () => {
  it('random symmetric matrices of order 40–120 agree with ml-matrix and decompose A', () => {
    for (const n of [40, 64, 120]) {
      const a = randomSymmetric(n, 31 * n);
      for (const solve of [inverseIteration, simdKernels, dispatcher]) {
        const { values, vectors, ok } = solve(a, n);
        expect(ok).toBe(true);
        const lib = new EigenvalueDecomposition(new Matrix(Array.from({ length: n }, (_, i) => Array.from(a.subarray(i * n, i * n + n)))), { assumeSymmetric: true });
        const ref = [...lib.realEigenvalues].sort((x, y) => x - y);
        ref.forEach((e, k) => expect(Math.abs(values[k] - e)).toBeLessThan(1e-13 * n));
        checkDecomposition(a, n, values, vectors, 1e-14);
      }
    }
  });

  it('degenerate spectra: identity plus a small rank-one part, repeated diagonal, identical blocks', () => {
    const n = 48;
    const rank1 = new Float64Array(n * n);
    for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) rank1[i * n + j] = (i === j ? 2 : 0) + 1e-3 * Math.sin(i + 1) * Math.sin(j + 1);
    const diagonal = new Float64Array(n * n);
    for (let i = 0; i < n; i++) diagonal[i * n + i] = i % 3;
    // Twelve copies of one 4 × 4 block: every eigenvalue twelvefold, the tridiagonal splits.
    const blocks = new Float64Array(n * n);
    const b = [2, 1, 0, 0.5, 1, -1, 0.25, 0, 0, 0.25, 3, 1, 0.5, 0, 1, 0];
    for (let c = 0; c < n / 4; c++) for (let i = 0; i < 4; i++) for (let j = 0; j < 4; j++) blocks[(4 * c + i) * n + 4 * c + j] = b[i * 4 + j];
    for (const solve of [inverseIteration, simdKernels]) {
      for (const a of [rank1, diagonal, blocks]) {
        const { values, vectors, ok } = solve(a, n);
        expect(ok).toBe(true);
        checkDecomposition(a, n, values, vectors, 1e-14);
      }
      // 2I + 1e-3 u uᵀ: eigenvalue 2 (47 times) and 2 + 1e-3 |u|².
      const { values } = solve(rank1, n);
      let uu = 0;
      for (let i = 0; i < n; i++) uu += Math.sin(i + 1) ** 2;
      expect(Math.abs(values[n - 1] - (2 + 1e-3 * uu))).toBeLessThan(1e-14);
      for (let k = 0; k < n - 1; k++) expect(Math.abs(values[k] - 2)).toBeLessThan(1e-14);
    }
  });
});

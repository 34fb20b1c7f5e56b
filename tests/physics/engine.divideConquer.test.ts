/**
 * The divide-and-conquer tridiagonal eigen-solver (divideConquerTridiagonal.ts) and its secular
 * equation (secularRoots.ts): against the textbook closed form of the tridiagonal Toeplitz
 * matrix, against the value-only QR (tridiagonalValues.ts), on tridiagonals built to deflate (repeated blocks, glued copies, zero
 * couplings), with both kernel sets (JavaScript loops and WebAssembly); and the whole large-block
 * route on dense matrices with clustered and repeated eigenvalues against the JavaScript route.
 * Scales: backward error n·ε·‖T‖ (Golub & Van Loan, Matrix Computations, 4th ed., §8.4.4).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { type DeflationCount, divideConquerTridiagonal, javascriptMergeKernels, type MergeKernels } from '../../server/src/physics/engine/divideConquerTridiagonal';
import { householderInverseIterationInPlace } from '../../server/src/physics/engine/householderInverseIteration';
import { javascriptSecularSums, secularRoots } from '../../server/src/physics/engine/secularRoots';
import { simdEigenpairs, simdKernelsAvailable, simdMergeKernels } from '../../server/src/physics/engine/simdEigen';
import { tridiagonalValues } from '../../server/src/physics/engine/tridiagonalValues';
import { lcg, quality } from './eigenQuality';

const EPS = 2.220446049250313e-16;
const FUZZ = Number(process.env.FUZZ_RUNS ?? 0);

interface Tridiagonal {
  d: Float64Array;
  e: Float64Array;
}

/** ‖T‖_∞, the largest ‖T z_k − λ_k z_k‖ / ‖T‖ and the largest |Z Zᵀ − I| entry (rows of z are vectors). */
function tridiagonalQuality(t: Tridiagonal, n: number, values: Float64Array, z: Float64Array): { norm: number; residual: number; orthogonality: number } {
  const { d, e } = t;
  let norm = 0;
  for (let i = 0; i < n; i++) norm = Math.max(norm, Math.abs(d[i]) + (i > 0 ? Math.abs(e[i - 1]) : 0) + (i < n - 1 ? Math.abs(e[i]) : 0));
  const scale = norm > 0 ? norm : 1;
  let residual = 0;
  let orthogonality = 0;
  for (let k = 0; k < n; k++) {
    let r2 = 0;
    for (let i = 0; i < n; i++) {
      let s = (d[i] - values[k]) * z[k * n + i];
      if (i > 0) s += e[i - 1] * z[k * n + i - 1];
      if (i < n - 1) s += e[i] * z[k * n + i + 1];
      r2 += s * s;
    }
    residual = Math.max(residual, Math.sqrt(r2) / scale);
    for (let l = k; l < n; l++) {
      let dot = k === l ? -1 : 0;
      for (let i = 0; i < n; i++) dot += z[k * n + i] * z[l * n + i];
      orthogonality = Math.max(orthogonality, Math.abs(dot));
    }
  }
  return { norm, residual, orthogonality };
}

function solve(t: Tridiagonal, n: number, kernels: MergeKernels, count?: DeflationCount): { ok: boolean; values: Float64Array; z: Float64Array } {
  const values = new Float64Array(n);
  const z = new Float64Array(n * n);
  const ok = divideConquerTridiagonal(t.d, t.e, n, values, z, n, kernels, count);
  return { ok, values, z };
}

/** Both kernel sets: JavaScript loops always, WebAssembly where it runs. */
function kernelSets(n: number): [string, () => MergeKernels][] {
  const sets: [string, () => MergeKernels][] = [['JavaScript', () => javascriptMergeKernels(n)]];
  if (simdKernelsAvailable()) sets.push(['WebAssembly', () => simdMergeKernels(n) as MergeKernels]);
  return sets;
}

/**
 * The eigenvalues of T by the value-only QR (tridiagonalValues.ts), ascending. Not by the QR +
 * inverse-iteration route: on 'glued copies' of order 226 its inverse iteration gives up (the
 * engine then falls back to the full QR), where divide and conquer does not.
 */
function referenceValues(t: Tridiagonal, n: number): Float64Array {
  const d = t.d.slice();
  expect(tridiagonalValues(d, t.e.slice(), n)).toBe(true);
  return d.sort();
}

/** Tridiagonals of a few kinds; every one but 'random' is built so that the merges deflate. */
type Kind = 'random' | 'repeated blocks' | 'glued copies' | 'split' | 'graded';

function tridiagonal(kind: Kind, n: number, seed: number): Tridiagonal {
  const r = lcg(seed);
  const d = new Float64Array(n);
  const e = new Float64Array(n);
  if (kind === 'random') {
    for (let i = 0; i < n; i++) [d[i], e[i]] = [r(), r()];
  } else if (kind === 'repeated blocks') {
    // One 5 × 5 block repeated, decoupled: every eigenvalue n/5-fold (up to the remainder).
    const bd = [r(), r(), r(), r(), r()];
    const be = [r(), r(), r(), r()];
    for (let i = 0; i < n; i++) [d[i], e[i]] = [bd[i % 5], i % 5 < 4 ? be[i % 5] : 0];
  } else if (kind === 'glued copies') {
    // Copies of one 7 × 7 block glued by 1e-9: clusters of n/7 eigenvalues within ~1e-9.
    const bd = Array.from({ length: 7 }, r);
    const be = Array.from({ length: 6 }, r);
    for (let i = 0; i < n; i++) [d[i], e[i]] = [bd[i % 7], i % 7 < 6 ? be[i % 7] : 1e-9];
  } else if (kind === 'split') {
    // Random, with a zero coupling at every fourth place and integer diagonal (exact repeats).
    for (let i = 0; i < n; i++) [d[i], e[i]] = [Math.round(4 * r()), i % 4 === 3 ? 0 : r()];
  } else {
    // Couplings falling off fast: the merges' z vectors have tiny components.
    for (let i = 0; i < n; i++) [d[i], e[i]] = [i + r(), 10 ** (-i / 8) * r()];
  }
  e[n - 1] = 0;
  return { d, e };
}

describe('secular equation (secularRoots.ts)', () => {
  it('roots interlace the poles, sum to trace(D) + ρ‖z‖² and zero the secular function', () => {
    // Trace identity of D + ρ z zᵀ (Golub & Van Loan §8.4.3); poles 0..k−1, one weight tiny.
    for (const k of [1, 2, 7, 40]) {
      const r = lcg(k);
      const d = Float64Array.from({ length: k }, (_, j) => j + 0.3 * r());
      const z = Float64Array.from({ length: k }, (_, j) => (j === 1 ? 1e-7 : 0.5 + r()));
      const rho = 0.7;
      const space = javascriptSecularSums(k, d);
      for (let j = 0; j < k; j++) space.z2[j] = z[j] * z[j];
      const origin = new Int32Array(k);
      const tau = new Float64Array(k);
      expect(secularRoots(d, k, rho, origin, tau, space)).toBe(true);
      let sum = 0;
      let expected = 0;
      for (let i = 0; i < k; i++) {
        const lambda = d[origin[i]] + tau[i];
        sum += lambda;
        expected += d[i] + rho * z[i] * z[i];
        expect(lambda).toBeGreaterThan(d[i]);
        if (i < k - 1) expect(lambda).toBeLessThan(d[i + 1]);
        // f(λ) within its rounding error, from the gaps row (d_j − λ_i).
        let f = 1 / rho;
        let size = 1 / rho;
        for (let j = 0; j < k; j++) {
          f += (z[j] * z[j]) / space.gaps[i * k + j];
          size += Math.abs((z[j] * z[j]) / space.gaps[i * k + j]);
        }
        expect(Math.abs(f)).toBeLessThan(64 * EPS * size);
      }
      expect(Math.abs(sum - expected)).toBeLessThan(16 * k * EPS * (k + rho));
    }
  });

  it('a root within a few ulps of its pole keeps its offset to relative accuracy', () => {
    // z_0 = 1e-9 against poles 0 and 1: λ_0 = ρ z_0²/(1 + …) ≈ 1e-18 above 0, far below ε.
    const d = Float64Array.from([0, 1]);
    const space = javascriptSecularSums(2, d);
    space.z2.set([1e-18, 1]);
    const origin = new Int32Array(2);
    const tau = new Float64Array(2);
    secularRoots(d, 2, 1, origin, tau, space);
    expect(origin[0]).toBe(0);
    // 1 + z0²/(0 − λ) + 1/(1 − λ) = 0 → λ ≈ z0²/2 for tiny z0 (first order, by hand).
    expect(tau[0] / 5e-19).toBeCloseTo(1, 8);
  });
});

describe('divide and conquer on tridiagonals', () => {
  it('tridiagonal Toeplitz matrices: λ_k = a + 2b cos(kπ/(n+1)) (textbook closed form)', () => {
    for (const n of [25, 48, 97, 160, 256]) {
      const t = { d: new Float64Array(n).fill(0.3), e: new Float64Array(n).fill(-0.7) };
      t.e[n - 1] = 0;
      const exact = Array.from({ length: n }, (_, k) => 0.3 + 2 * -0.7 * Math.cos(((k + 1) * Math.PI) / (n + 1))).sort((a, b) => a - b);
      for (const [name, kernels] of kernelSets(n)) {
        const { ok, values, z } = solve(t, n, kernels());
        expect(ok, name).toBe(true);
        for (let k = 0; k < n; k++) expect(Math.abs(values[k] - exact[k]), `${name} ${n} ${k}`).toBeLessThan(8 * n * EPS);
        const q = tridiagonalQuality(t, n, values, z);
        expect(q.residual, name).toBeLessThan(n * EPS);
        expect(q.orthogonality, name).toBeLessThan(n * EPS);
      }
    }
  });

  it('tridiagonals built to deflate do deflate, and give the reference eigenvalues and orthonormal vectors', () => {
    for (const kind of ['repeated blocks', 'glued copies', 'split', 'graded'] as const) {
      for (const n of [49, 100, 211]) {
        const t = tridiagonal(kind, n, n);
        const reference = referenceValues(t, n);
        for (const [name, kernels] of kernelSets(n)) {
          const count = { kept: 0, dropped: 0 };
          const { ok, values, z } = solve(t, n, kernels(), count);
          expect(ok).toBe(true);
          expect(count.dropped, `${kind} ${n} ${name}`).toBeGreaterThan(n / 4);
          const q = tridiagonalQuality(t, n, values, z);
          for (let k = 0; k < n; k++) expect(Math.abs(values[k] - reference[k]), `${kind} ${n} ${k}`).toBeLessThan(n * EPS * q.norm);
          expect(q.residual, `${kind} ${n} ${name}`).toBeLessThan(n * EPS);
          expect(q.orthogonality, `${kind} ${n} ${name}`).toBeLessThan(n * EPS);
        }
      }
    }
  });

  it('property: random and deflating tridiagonals of order 16–300, both kernel sets', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 16, max: 300 }),
        fc.integer({ min: 1, max: 2 ** 30 }),
        fc.constantFrom<Kind>('random', 'repeated blocks', 'glued copies', 'split', 'graded'),
        (n, seed, kind) => {
          const t = tridiagonal(kind, n, seed);
          const reference = referenceValues(t, n);
          for (const [, kernels] of kernelSets(n)) {
            const { ok, values, z } = solve(t, n, kernels());
            if (!ok) return false;
            const q = tridiagonalQuality(t, n, values, z);
            for (let k = 0; k < n; k++) if (!(Math.abs(values[k] - reference[k]) < n * EPS * q.norm)) return false;
            if (!(q.residual < n * EPS && q.orthogonality < n * EPS)) return false;
          }
          return true;
        },
      ),
      { numRuns: FUZZ || 12, seed: FUZZ ? undefined : 20261202 },
    );
  });

  it('the zero matrix, a single piece, and non-finite input', () => {
    const n = 60;
    const zero = { d: new Float64Array(n), e: new Float64Array(n) };
    const { ok, values, z } = solve(zero, n, javascriptMergeKernels(n));
    expect(ok).toBe(true);
    expect(Array.from(values)).toEqual(new Array(n).fill(0));
    expect(tridiagonalQuality(zero, n, values, z).orthogonality).toBe(0);
    const small = tridiagonal('random', 10, 3);
    const r = solve(small, 10, javascriptMergeKernels(10));
    expect(r.ok).toBe(true);
    expect(tridiagonalQuality(small, 10, r.values, r.z).residual).toBeLessThan(10 * EPS);
    const bad = tridiagonal('random', n, 4);
    bad.e[30] = Number.NaN;
    expect(solve(bad, n, javascriptMergeKernels(n)).ok).toBe(false);
  });
});

/** Q diag(λ) Qᵀ with Q a product of random reflectors: a dense matrix of chosen spectrum. */
function withSpectrum(lambda: number[], seed: number): Float64Array {
  const n = lambda.length;
  const r = lcg(seed);
  const a = new Float64Array(n * n);
  for (let i = 0; i < n; i++) a[i * n + i] = lambda[i];
  for (let pass = 0; pass < 3; pass++) {
    const v = Float64Array.from({ length: n }, r);
    let vv = 0;
    for (const x of v) vv += x * x;
    // A ← H A H with H = I − 2 v vᵀ / vᵀv: with p = A v, A ← A − c(v pᵀ + p vᵀ) + c² (vᵀp) v vᵀ, c = 2/vᵀv.
    const c = 2 / vv;
    const p = new Float64Array(n);
    for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) p[i] += a[i * n + j] * v[j];
    let vp = 0;
    for (let i = 0; i < n; i++) vp += v[i] * p[i];
    for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) a[i * n + j] += -c * (v[i] * p[j] + p[i] * v[j]) + c * c * vp * v[i] * v[j];
  }
  for (let i = 0; i < n; i++) for (let j = 0; j < i; j++) a[i * n + j] = a[j * n + i] = 0.5 * (a[i * n + j] + a[j * n + i]);
  return a;
}

describe.runIf(simdKernelsAvailable())('large-block route with divide and conquer', () => {
  it('property: dense matrices with clustered and repeated eigenvalues, against the JavaScript route', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 48, max: 260 }),
        fc.integer({ min: 1, max: 2 ** 30 }),
        fc.constantFrom('repeated', 'clustered', 'two values'),
        (n, seed, kind) => {
          const r = lcg(seed);
          const lambda = Array.from({ length: n }, (_, i) =>
            kind === 'repeated' ? Math.round(6 * r()) : kind === 'clustered' ? Math.round(3 * r()) + 1e-10 * r() : i % 2 === 0 ? 1 : -2,
          );
          const a = withSpectrum(lambda, seed);
          const values = new Float64Array(n);
          const vectors = new Float64Array(n * n);
          if (!simdEigenpairs(a, n, values, vectors)) return false;
          const jsValues = new Float64Array(n);
          const jsVectors = new Float64Array(n * n);
          if (!householderInverseIterationInPlace(a.slice(), n, jsValues, jsVectors)) return false;
          const q = quality(a, n, values, vectors);
          for (let k = 0; k < n; k++) if (!(Math.abs(values[k] - jsValues[k]) < n * EPS * q.norm)) return false;
          return q.residual < n * EPS && q.orthogonality < n * EPS;
        },
      ),
      { numRuns: FUZZ || 8, seed: FUZZ ? undefined : 1202 },
    );
  });
});

describe.runIf(simdKernelsAvailable())('the WebAssembly set’s leaf and secular kernels against the JavaScript set', () => {
  /** A leaf of order m: random, graded couplings, an exactly repeated diagonal with zero couplings, or scaled by `scale`. */
  function leafInput(kind: 'random' | 'graded' | 'repeated', m: number, seed: number, scale: number): { d: Float64Array; e: Float64Array } {
    const r = lcg(seed);
    const d = new Float64Array(m);
    const e = new Float64Array(m);
    for (let i = 0; i < m; i++) {
      d[i] = scale * (kind === 'repeated' ? Math.round(3 * r()) : kind === 'graded' ? i + r() : r());
      e[i] = scale * (kind === 'repeated' ? (i % 3 === 2 ? 0 : r()) : kind === 'graded' ? 10 ** (-i / 2) * r() : r());
    }
    e[m - 1] = 0;
    return { d, e };
  }

  function runLeaf(kernels: MergeKernels, input: { d: Float64Array; e: Float64Array }, m: number): { ok: boolean; values: number[]; order: number[]; q: number[] } {
    kernels.leafD.set(input.d);
    kernels.leafE.set(input.e);
    const ok = kernels.leaf(m);
    return { ok, values: Array.from(kernels.leafD.subarray(0, m)), order: Array.from(kernels.fromRows.subarray(0, m)), q: Array.from(kernels.leafQ.subarray(0, m * m)) };
  }

  it('leaf QR: the same bits as tridiagonalValuesVectors (the same chase, deflation and sort)', () => {
    for (const kind of ['random', 'graded', 'repeated'] as const) {
      for (const m of [1, 2, 3, 7, 13, 20, 24]) {
        const input = leafInput(kind, m, 31 * m + kind.length, 1);
        const js = runLeaf(javascriptMergeKernels(40), input, m);
        const wasm = runLeaf(simdMergeKernels(40) as MergeKernels, input, m);
        expect(js.ok && wasm.ok, `${kind} ${m}`).toBe(true);
        expect(wasm.values, `${kind} ${m}`).toEqual(js.values);
        expect(wasm.order, `${kind} ${m}`).toEqual(js.order);
        expect(wasm.q, `${kind} ${m}`).toEqual(js.q);
        for (let r = 1; r < m; r++) expect(wasm.values[r]).toBeGreaterThanOrEqual(wasm.values[r - 1]);
      }
    }
  });

  it('leaf QR at 1e-150 (rotation lengths by the scaled √(x² + z²)): values within m·ε·‖T‖, vectors orthonormal', () => {
    // x² + z² < 1e-280 here, so both sets take their scaled branch (Math.hypot in JavaScript).
    const m = 20;
    const input = leafInput('random', m, 5, 1e-150);
    const js = runLeaf(javascriptMergeKernels(40), input, m);
    const wasm = runLeaf(simdMergeKernels(40) as MergeKernels, input, m);
    expect(js.ok && wasm.ok).toBe(true);
    for (let r = 0; r < m; r++) expect(Math.abs(wasm.values[r] - js.values[r])).toBeLessThan(m * EPS * 1e-150);
    const rows = Float64Array.from({ length: m * m }, (_, i) => wasm.q[wasm.order[Math.floor(i / m)] * m + (i % m)]);
    const scaled = { d: input.d.map((x) => x * 1e150), e: input.e.map((x) => x * 1e150) };
    const q = tridiagonalQuality(scaled, m, Float64Array.from(wasm.values, (x) => x * 1e150), rows);
    expect(q.residual).toBeLessThan(m * EPS);
    expect(q.orthogonality).toBeLessThan(m * EPS);
  });

  it('leaf QR: non-finite input fails in both sets', () => {
    const input = leafInput('random', 9, 2, 1);
    input.d[4] = Number.POSITIVE_INFINITY;
    expect(runLeaf(javascriptMergeKernels(40), input, 9).ok).toBe(false);
    expect(runLeaf(simdMergeKernels(40) as MergeKernels, input, 9).ok).toBe(false);
  });

  it('secular roots in one kernel call: the origins of secularRoots, roots within 16 k ε, rows d_j − λ_i', () => {
    for (const k of [1, 2, 7, 40, 161]) {
      const r = lcg(k + 100);
      const d = Float64Array.from({ length: k }, (_, j) => j + 0.3 * r());
      const z2 = Float64Array.from({ length: k }, (_, j) => (j % 9 === 1 ? 1e-14 : (0.5 + r()) ** 2));
      const rho = 0.7;
      const sets = [javascriptMergeKernels(k), simdMergeKernels(k) as MergeKernels].map((kernels) => {
        kernels.dk.set(d);
        kernels.z2.set(z2);
        expect(kernels.roots(k, rho)).toBe(true);
        return { origin: Array.from(kernels.origin.subarray(0, k)), tau: Array.from(kernels.tau.subarray(0, k)), gaps: Array.from(kernels.gaps.subarray(0, k * k)) };
      });
      const [js, wasm] = sets;
      expect(wasm.origin, `${k}`).toEqual(js.origin);
      for (let i = 0; i < k; i++) {
        expect(Math.abs(wasm.tau[i] - js.tau[i]), `${k} ${i}`).toBeLessThan(16 * k * EPS);
        // Each row holds (d_j − d_o) − τ for the kernel's own root, to the last bit.
        for (let j = 0; j < k; j++) expect(wasm.gaps[i * k + j]).toBe(d[j] - d[wasm.origin[i]] - wasm.tau[i]);
      }
    }
  });

  it('a root settled by the very first evaluation after moving its origin to the upper pole keeps the right row', () => {
    // Poles 0 and 1, weights ½ + 2⁻⁵⁰ and ½, 1/ρ = 1e-300: at λ = ½, f = −2⁻⁴⁹ < 0 (origin moves to
    // pole 1) and |f| is below its rounding bound 18ε, so λ = ½ is taken at once (by hand).
    const kernels = simdMergeKernels(2) as MergeKernels;
    kernels.dk.set([0, 1]);
    kernels.z2.set([0.5 + 2 ** -50, 0.5]);
    expect(kernels.roots(2, 1e300)).toBe(true);
    expect(kernels.origin[0]).toBe(1);
    expect(kernels.tau[0]).toBe(-0.5);
    expect(Array.from(kernels.gaps.subarray(0, 2))).toEqual([-0.5, 0.5]);
  });
});

// Times the eigen-solver's O(n³) kernels and its copy out of two versions of the kernel text in one
// process, alternating, CPU medians: the generator at a git revision against the working tree's.
//   node scripts/wasm/compare-eigen-kernels.mjs [revision=HEAD~1] [orders=64,128,160,192,256]
// Each kernel runs on the same data in both modules (a random symmetric matrix with a weighted
// diagonal, random rows to transform), and the outputs are compared: "same bits" or the largest
// difference. A revision whose reduction does not write the reflector rows itself has its
// packReflectors pass timed with it.
import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { pathToFileURL } from 'node:url';

const revision = process.argv[2] ?? 'HEAD~1';
const orders = (process.argv[3] ?? '64,128,160,192,256').split(',').map(Number);
const wabt = await (await import('wabt')).default();

async function instance(file) {
  const { eigenKernelsWat } = await import(pathToFileURL(file).href);
  const parsed = wabt.parseWat('k.wat', eigenKernelsWat(), { simd: true });
  parsed.validate();
  return new WebAssembly.Instance(new WebAssembly.Module(parsed.toBinary({}).buffer), {}).exports;
}
const oldFile = path.join(mkdtempSync(path.join(tmpdir(), 'eigen-kernels-')), 'eigenKernelsWat.mjs');
writeFileSync(oldFile, execFileSync('git', ['show', `${revision}:scripts/wasm/eigenKernelsWat.mjs`]));
const versions = [await instance(oldFile), await instance('scripts/wasm/eigenKernelsWat.mjs')];

function lcg(seed) {
  let s = seed >>> 0;
  return () => {
    s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
    return s / 4294967296 - 0.5;
  };
}
function cpuUs(f) {
  const c = process.cpuUsage();
  f();
  const d = process.cpuUsage(c);
  return d.user + d.system;
}

for (const n of orders) {
  const ns = n + (n & 1);
  const rows = Math.ceil(n / 4) * 4;
  const square = 8 * ns * Math.max(n, rows) + 4096;
  const vector = 8 * (ns + 2);
  // a, a0 (the input), z, z0, refl, out; then the vectors
  const at = { a: 0, a0: square, z: 2 * square, z0: 3 * square, refl: 4 * square, out: 5 * square, v: 6 * square };
  const vec = (i) => at.v + i * vector;
  const setups = versions.map((k) => {
    const grow = Math.ceil((vec(8) - k.memory.buffer.byteLength) / 65536);
    if (grow > 0) k.memory.grow(grow);
    const h = new Float64Array(k.memory.buffer);
    h.fill(0, 0, at.v / 8);
    const rnd = lcg(7 + n);
    for (let i = 0; i < n; i++)
      for (let j = 0; j <= i; j++) {
        const x = i === j ? 10 * rnd() : rnd();
        h[at.a0 / 8 + i * ns + j] = x;
        h[at.a0 / 8 + j * ns + i] = x;
      }
    for (let r = 0; r < n; r++) for (let i = 0; i < n; i++) h[at.z0 / 8 + r * ns + i] = rnd();
    const reduce = () => {
      h.copyWithin(at.a / 8, at.a0 / 8, at.a0 / 8 + n * ns);
      k.tridiagonalise(at.a, ns, n, vec(0), vec(1), vec(2), vec(3), vec(4), vec(5), vec(6), at.refl);
      if (k.packReflectors) k.packReflectors(at.a, ns, n, at.refl);
    };
    reduce();
    return {
      h,
      kernels: {
        'reduction (tridiagonalise, reflector rows)': [reduce, at.a, n * ns],
        'back-transformation (applyReflectors)': [() => {
          h.copyWithin(at.z / 8, at.z0 / 8, at.z0 / 8 + rows * ns);
          k.applyReflectors(at.z, ns, rows, n, at.refl, vec(2), vec(7));
        }, at.z, n * ns],
        [`product ${n} × ${n / 2 | 0} × ${n} (multiply)`]: [() => k.multiply(at.z0, ns, at.a0, ns, at.out, ns, rows, n >> 1, n), at.out, n * ns],
        'copy out (unpackTransposed)': [() => k.unpackTransposed(at.z0, ns, n, at.out), at.out, n * n],
      },
    };
  });
  for (const name of Object.keys(setups[0].kernels)) {
    const runs = setups.map((s) => s.kernels[name][0]);
    let diff = 0;
    let same = true;
    runs.forEach((f) => f());
    const [, offset, count] = setups[0].kernels[name];
    for (let i = 0; i < count; i++) {
      const x = setups[0].h[offset / 8 + i];
      const y = setups[1].h[offset / 8 + i];
      if (!Object.is(x, y)) same = false;
      diff = Math.max(diff, Math.abs(x - y));
    }
    const reps = Math.max(1, Math.round(2e7 / n ** 3));
    const times = [[], []];
    for (let round = 0; round < 9; round++)
      for (const q of round % 2 ? [1, 0] : [0, 1]) times[q].push(cpuUs(() => { for (let r = 0; r < reps; r++) runs[q](); }) / reps);
    const [before, after] = times.map((t) => t.sort((p, q) => p - q)[4]);
    console.log(`${String(n).padStart(4)} ${name}: ${before.toFixed(1)} → ${after.toFixed(1)} µs (${(before / after).toFixed(2)}×), ${same ? 'same bits' : `largest difference ${diff.toExponential(1)}`}`);
  }
}

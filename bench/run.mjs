// Benchmark runner (`npm run bench`). Each benchmark is a TypeScript entry
// bundled with esbuild into .bench-tmp/ and run in its own Node process, so
// one benchmark's JIT state cannot colour another's timings.
// Add a benchmark by appending to BENCHMARKS. An entry either runs itself when
// loaded (no `call`), or exports a function named by `call` that returns (or
// resolves to) { name?, lines: string[] }, which the runner prints.
// `node bench/run.mjs eigen` runs only the named ones. Benchmarks print their
// own figures; none is a pass/fail test. Time and summarise through bench/timing.ts (CPU time,
// wall and CPU of one call, best of n, median, quartiles) rather than a copy of your own.
import { spawnSync } from 'node:child_process';
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import * as esbuild from 'esbuild';

const BENCHMARKS = [
  { name: 'eigen', entry: 'bench/eigen.bench.ts', about: 'eigen-solver choice: Jacobi vs own Householder+QR vs ml-matrix' },
  { name: 'engine', entry: 'bench/engine.bench.ts', about: 'Cs 6P3/2 2001-point sweeps, 0–0.1 T and 0–1 T, against NumPy eigh (two loops, blocked)' },
  { name: 'beam', entry: 'bench/beam.bench.ts', call: 'runBeamBench', about: 'detector pattern of 16 sublevels' },
  { name: 'startup', entry: 'bench/startup.bench.ts', call: 'runStartupBench', about: 'CLI start-up: check of one small file against bare node' },
  { name: 'batch', entry: 'bench/batch.bench.ts', call: 'runBatchBench', about: 'eval of 2,000 files in one process against check of the same folder' },
  { name: 'profile-csv', entry: 'bench/profileCsv.bench.ts', call: 'runProfileCsvBench', about: 'profile CSV writing against computing the pattern' },
  { name: 'whole-term', entry: 'bench/wholeTerm.bench.ts', call: 'runWholeTermBench', about: '87Rb 5P whole term vs single-J sweeps, per state' },
  { name: 'editor', entry: 'bench/editor.bench.ts', call: 'runEditorBench', about: '2,000-line setup: edit → diagnostics, hover, cold start' },
  { name: 'fit', entry: 'bench/fit.bench.ts', call: 'runFitBench', about: 'field calibration from one resonance; 5-parameter fit of a 4,096-point profile' },
  { name: 'field-sources', entry: 'bench/fieldSources.bench.ts', call: 'runFieldSourcesBench', about: 'B and gradient of a 10-loop assembly at one point, against point dipoles' },
  { name: 'spectrum', entry: 'bench/spectrum.bench.ts', call: 'runSpectrumBench', about: '10,000-point Voigt spectrum with 100 components' },
  { name: 'field-map', entry: 'bench/fieldMap.bench.ts', call: 'runFieldMapBench', about: 'field-map figure and a 201 × 201 `sublevel field` grid against the summed field alone' },
  { name: 'slower', entry: 'bench/slower.bench.ts', call: 'runSlowerBench', about: 'a whole slower (profile, check, flight) and a 40-section coil design, against one exact solve' },
  { name: 'trap', entry: 'bench/trap.bench.ts', call: 'runTrapBench', about: 'trap summary of the 87Rb ground level (8 sublevels): quadrupole, Ioffe–Pritchard' },
  { name: 'trajectory', entry: 'bench/trajectory.bench.ts', call: 'runTrajectoryBench', about: 'one sublevel through a 200-step field map against the analytic deflection' },
  { name: 'incr', entry: 'bench/keptVersion.bench.ts', call: 'runKeptVersionBench', about: 'evaluation worker job after a one-line edit of the 20,000-line file: fresh vs kept version' },
];

const TMP = '.bench-tmp';

async function bundle(entry, name) {
  const outfile = path.join(TMP, `${name}.cjs`);
  await esbuild.build({
    entryPoints: [entry],
    outfile,
    bundle: true,
    platform: 'node',
    target: 'node20',
    format: 'cjs',
    logLevel: 'warning',
  });
  return outfile;
}

/** A one-line Node script that calls an exported benchmark function and prints its lines. */
function callerScript(file, fn) {
  return `Promise.resolve(require(${JSON.stringify(file)})[${JSON.stringify(fn)}]()).then((r) => {
    if (r && r.name) console.log(r.name);
    for (const line of (r && r.lines) || []) console.log(line);
  }).catch((e) => { console.error(e); process.exit(1); });`;
}

async function main() {
  const wanted = process.argv.slice(2);
  const unknown = wanted.filter((w) => !BENCHMARKS.some((b) => b.name === w));
  if (unknown.length > 0) {
    console.error(`Unknown benchmark(s): ${unknown.join(', ')}. Known: ${BENCHMARKS.map((b) => b.name).join(', ')}`);
    process.exit(2);
  }
  const chosen = wanted.length > 0 ? BENCHMARKS.filter((b) => wanted.includes(b.name)) : BENCHMARKS;
  mkdirSync(TMP, { recursive: true });
  let failed = 0;
  for (const b of chosen) {
    console.log(`\n=== ${b.name}: ${b.about}`);
    const file = await bundle(b.entry, b.name);
    const args = b.call ? ['-e', callerScript(path.resolve(file), b.call)] : [file];
    const run = spawnSync(process.execPath, args, { stdio: 'inherit' });
    if (run.status !== 0) {
      failed++;
      console.error(`benchmark ${b.name} exited with status ${run.status}`);
    }
  }
  process.exit(failed > 0 ? 1 : 0);
}

await main();

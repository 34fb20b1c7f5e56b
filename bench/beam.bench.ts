/**
 * Detector-pattern benchmark: 16 sublevels (J = 1/2, I = 7/2 at an intermediate
 * field; invented scenario), oven and jet sources, 4096 bins with speed averaging.
 * Goal: under 5 ms per pattern. Also prints the convergence error: the largest
 * relative change of peak positions, FWHMs and pattern moments when the bins double.
 *
 * Call: import { runBeamBench } from './beam.bench' and print its lines, e.g.
 *   npx esbuild bench/beam.bench.ts --bundle --platform=node --format=cjs --outfile=/tmp/beam-bench.cjs
 *   node -e "const r = require('/tmp/beam-bench.cjs').runBeamBench(); console.log(r.name); r.lines.forEach((l) => console.log(l))"
 */
import { detectorPattern, type BeamGeometry, type BeamSublevel, type DetectorPattern, type SpeedDistribution } from '../server/src/physics/beam';
import { ATOMIC_MASS_UNIT, BOHR_MAGNETON, ELECTRON_GS } from '../server/src/physics/constants';
import { median, wallAndCpuMs } from './timing';

/** Breit–Rabi slopes −∂E/∂B for J = 1/2, I = 7/2 at x = 0.5, nuclear term dropped. */
function sixteenSublevels(): BeamSublevel[] {
  const out: BeamSublevel[] = [];
  const x = 0.5;
  for (let twoM = -8; twoM <= 8; twoM += 2) {
    const m = twoM / 2;
    for (const sign of [1, -1]) {
      if (Math.abs(twoM) === 8 && sign === -1) continue;
      const slope = Math.abs(twoM) === 8 ? Math.sign(m) : ((2 * m) / 8 + x) / Math.sqrt(1 + (4 * m * x) / 8 + x * x);
      out.push({ label: `${sign > 0 ? 'upper' : 'lower'} m=${m}`, momentJT: (-sign * ELECTRON_GS * BOHR_MAGNETON * slope) / 2, population: 1 });
    }
  }
  return out;
}

const geometry: BeamGeometry = {
  slit1M: 40e-6,
  slit2M: 30e-6,
  slitSeparationM: 0.8,
  magnetLengthM: 0.15,
  driftM: 0.6,
  detectorWidthM: 20e-6,
  gradientTPerM: 250,
};
const massKg = 133 * ATOMIC_MASS_UNIT;

function moments(p: DetectorPattern): [number, number] {
  let m0 = 0;
  let m1 = 0;
  for (let j = 0; j < p.total.length; j++) {
    const w = p.total[j] * (p.edgesM[j + 1] - p.edgesM[j]);
    m0 += w;
    m1 += w * p.positionsM[j];
  }
  const mean = m1 / m0;
  let c2 = 0;
  for (let j = 0; j < p.total.length; j++) c2 += p.total[j] * (p.edgesM[j + 1] - p.edgesM[j]) * (p.positionsM[j] - mean) ** 2;
  return [mean, c2 / m0];
}

function convergenceError(a: DetectorPattern, b: DetectorPattern): number {
  if (a.peaks.length !== b.peaks.length) return Infinity;
  const scale = a.image ? a.image.kernelFwhmM : 0;
  let worst = 0;
  a.peaks.forEach((pa, i) => {
    const pb = b.peaks[i];
    worst = Math.max(worst, Math.abs(pa.positionM - pb.positionM) / Math.max(Math.abs(pa.positionM), scale));
    if (pa.fwhmM !== null && pb.fwhmM !== null) worst = Math.max(worst, Math.abs(pa.fwhmM / pb.fwhmM - 1));
  });
  const [ma, va] = moments(a);
  const [mb, vb] = moments(b);
  return Math.max(worst, Math.abs(ma - mb) / Math.sqrt(va), Math.abs(va / vb - 1));
}

export function runBeamBench(): { name: string; lines: string[] } {
  const sublevels = sixteenSublevels();
  const sources: [string, SpeedDistribution][] = [
    ['oven 420 K', { kind: 'effusive', temperatureK: 420 }],
    ['jet 300 m/s, 6 % rms', { kind: 'jet', meanSpeed: 300, relativeSpread: 0.06 }],
  ];
  // CPU time is shown too: on a shared machine the wall clock also counts other processes.
  const lines = ['source               | bins | median ms | cpu ms | goal 5 ms | peaks | convergence (×2 bins)'];
  for (const [name, source] of sources) {
    const input = { massKg, geometry, source, sublevels, bins: 4096 };
    for (let i = 0; i < 30; i++) detectorPattern(input); // warm-up (JIT, jet table memo)
    const times: number[] = [];
    const cpu: number[] = [];
    let last: DetectorPattern | undefined;
    for (let i = 0; i < 60; i++) {
      const t = wallAndCpuMs(() => (last = detectorPattern(input)));
      times.push(t.wall);
      cpu.push(t.cpu);
    }
    const fine = detectorPattern({ ...input, bins: 8192 });
    const ms = median(times);
    const err = convergenceError(last!, fine);
    lines.push(
      `${name.padEnd(20)} | 4096 | ${ms.toFixed(2).padStart(9)} | ${median(cpu).toFixed(2).padStart(6)} | ${(ms < 5 ? 'met' : 'missed').padEnd(9)}` +
        ` | ${String(last!.peaks.length).padStart(5)} | ${err.toExponential(2)}`,
    );
  }
  return { name: 'beam: detector pattern, 16 sublevels', lines };
}

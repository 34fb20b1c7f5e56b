/**
 * Fit benchmarks (invented scenarios): a field calibration from one resonance of a 87Rb-like
 * ground level (goal < 1 ms), and a 5-parameter fit of a 4,096-point detector profile of a
 * J = 1/2, I = 3/2 beam (gradient, offset, background, the F = 2 population, amplitude;
 * goal < 200 ms). Medians of repeated runs after a warm-up. The same fit for a beam through a
 * magnet built from sources (Na23 through two conductors, examples/two-wire-magnet.sublevel): the
 * model flies the atoms, `source_scale` replaces the gradient (goal: well under a second).
 */
import { analyze } from '../server/src/eval/analyze';
import { beamInputs } from '../server/src/eval/beamInput';
import { gJLookup } from '../server/src/eval/gJLookup';
import { hyperfineSpec } from '../server/src/eval/levelSpec';
import { sourceFlights } from '../server/src/eval/sourceFlights';
import { computePattern } from '../server/src/physics/beam/detectorPattern';
import { ATOMIC_MASS_UNIT } from '../server/src/physics/constants';
import { solveLevel, type HyperfineLevelSpec } from '../server/src/physics/engine';
import { calibrateField, fitCurve, profileModel } from '../server/src/physics/fit';
import { quartiles } from './timing';
import { twoWireBeam } from '../tests/fixtures/fieldMapBeams';

const spec: HyperfineLevelSpec = { kind: 'hyperfine', twoJ: 1, twoI: 3, gJ: 2.00233113, gI: -0.0009951414, A: 3417.341305452145e6 };

interface Timing {
  median: number;
  /** Quartiles of the runs: the spread under the machine's load. */
  low: number;
  high: number;
}

function time(run: () => void, repeats: number): Timing {
  run();
  const ts: number[] = [];
  for (let k = 0; k < repeats; k++) {
    const t0 = performance.now();
    run();
    ts.push(performance.now() - t0);
  }
  return quartiles(ts);
}

const ms = (t: Timing, digits: number): string => `${t.median.toFixed(digits)} ms (quartiles ${t.low.toFixed(digits)}–${t.high.toFixed(digits)})`;

export function runFitBench(): { name: string; lines: string[] } {
  const pair = { lower: { twoF: 2, twoMF: -2 }, upper: { twoF: 4, twoMF: 2 } };
  let roots = 0;
  const calMs = time(() => {
    roots = calibrateField(spec, pair, 6834678613.6, 5, { fromT: 0, toT: 1e-3, points: 201 }).roots.length;
  }, 200);
  // Baseline in the same run: one exact diagonalisation of the level at one field.
  const solveMs = time(() => solveLevel(spec, 1e-4), 200);

  const fieldT = 0.05;
  const states = solveLevel(spec, fieldT).states;
  const input = {
    massKg: 87 * ATOMIC_MASS_UNIT,
    geometry: { slit1M: 30e-6, slit2M: 30e-6, slitSeparationM: 0.5, magnetLengthM: 0.1, driftM: 0.4, detectorWidthM: 10e-6, gradientTPerM: 150 },
    source: { kind: 'effusive' as const, temperatureK: 450 },
    sublevels: states.map((s) => ({ label: s.low.text, momentJT: s.momentJT, population: s.low.scheme === 'F' && s.low.twoF === 4 ? 1.3 : 1 })),
  };
  const twoF = states.map((s) => (s.low.scheme === 'F' ? s.low.twoF : 0));
  const n = 4096;
  const positions = Float64Array.from({ length: n }, (_, i) => -3e-3 + (6e-3 * i) / (n - 1));
  const truthModel = profileModel({ input, spec, magnetFieldT: fieldT, twoF }, positions, new Float64Array(n).fill(1), ['offset', 'background'], 20e-6);
  const clean = new Float64Array(n);
  truthModel.model(Float64Array.from([20e-6, 5, 0.05]), clean);
  let seed = 11;
  const rand = (): number => (seed = (seed * 16807) % 2147483647) / 2147483647;
  const counts = Float64Array.from(clean, (c) => Math.max(0, Math.round(c + Math.sqrt(Math.max(c, 1)) * Math.sqrt(-2 * Math.log(rand())) * Math.cos(2 * Math.PI * rand()))));
  const startInput = { ...input, geometry: { ...input.geometry, gradientTPerM: 135 }, sublevels: input.sublevels.map((s) => ({ ...s, population: 1 })) };
  let summary = '';
  const fitMs = time(() => {
    const m = profileModel({ input: startInput, spec, magnetFieldT: fieldT, twoF }, positions, counts, ['gradient', 'offset', 'background', 'populations'], 0);
    const sigma = Float64Array.from(counts, (c) => Math.sqrt(Math.max(c, 1)));
    const r = fitCurve({ names: m.names, start: m.start, scale: m.scale, y: counts, sigma, model: m.model, modelJacobian: m.jacobian });
    summary = `${r.status}, ${r.iterations} iterations, ${r.evaluations} model/Jacobian calls, ${m.patterns()} patterns; ${m.names.map((nm, j) => `${nm} ${r.params[j]!.toPrecision(5)}`).join(', ')}`;
  }, 15);
  // Baseline in the same run: one pattern as the fit computes it (1,024 bins, no peak refinement).
  const patternMs = time(() => computePattern({ ...input, bins: 1024, spanM: { startM: -3.6e-3, endM: 3.6e-3 } }, undefined, false), 30);
  const mapped = fieldMapFit(n);
  return {
    name: 'fit',
    lines: [
      `one exact diagonalisation (baseline): ${ms(solveMs, 4)}`,
      `field calibration from one resonance (${roots} roots in 0–10 G): ${ms(calMs, 3)} = ${(calMs.median / solveMs.median).toFixed(0)}× the baseline (goal < 1 ms)`,
      `one detector pattern as the fit computes it (baseline): ${ms(patternMs, 2)}`,
      `5-parameter fit of a ${n}-point profile: ${ms(fitMs, 1)} = ${(fitMs.median / patternMs.median).toFixed(1)}× the baseline (goal < 200 ms) — ${summary}`,
      `one set of reference flights, 8 sublevels through two 12 cm wires (baseline): ${ms(mapped.flightsMs, 2)}`,
      `5-parameter fit of a ${n}-point profile through the flights (source_scale, offset, background, F = 2 population, amplitude): ${ms(mapped.fitMs, 1)} = ${(mapped.fitMs.median / mapped.flightsMs.median).toFixed(1)}× the flights, ${(mapped.fitMs.median / patternMs.median).toFixed(1)}× the pattern baseline (goal well under 1 s) — ${mapped.summary}`,
    ],
  };
}

function fieldMapFit(n: number): { fitMs: Timing; flightsMs: Timing; summary: string } {
  const a = analyze(twoWireBeam());
  const beam = a.model!.beams[0]!;
  const gJOf = gJLookup(a.result!.levels);
  const inputs = beamInputs(beam, gJOf)!;
  const spec = hyperfineSpec(beam.level!, gJOf(beam.level!)!)!;
  const twoF = inputs.input.sublevels.map((s) => (s.label.startsWith('F=2') ? 4 : 2));
  const setupOf = () => {
    const flown = sourceFlights(inputs, spec, beam.magnet!)!;
    const input = { ...flown.patternInput, sublevels: flown.patternInput.sublevels.map((s) => ({ ...s, population: 1 })) };
    return { flown, setup: { input, spec, magnetFieldT: beam.magnet!.fieldT!.value, twoF, flights: flown.flights } };
  };
  const positions = Float64Array.from({ length: n }, (_, i) => -2.4e-3 + (4.8e-3 * i) / (n - 1));
  // Truth: every source 3 % stronger, the F = 2 sublevels 1.3 times as populated, offset 15 µm.
  const truth = setupOf();
  const truthModel = profileModel(truth.setup, positions, new Float64Array(n).fill(1), ['source_scale', 'offset', 'background', 'populations'], 15e-6);
  const clean = new Float64Array(n);
  truthModel.model(Float64Array.from([1.03, 15e-6, 5, 1.3, 0.2]), clean);
  let seed = 13;
  const rand = (): number => (seed = (seed * 16807) % 2147483647) / 2147483647;
  const counts = Float64Array.from(clean, (c) => Math.max(0, Math.round(c + Math.sqrt(Math.max(c, 1)) * Math.sqrt(-2 * Math.log(rand())) * Math.cos(2 * Math.PI * rand()))));
  const sigma = Float64Array.from(counts, (c) => Math.sqrt(Math.max(c, 1)));
  let summary = '';
  const fitMs = time(() => {
    // A new flyer each time: its moment table is built inside the timing, as in an evaluation.
    const { flown, setup } = setupOf();
    const m = profileModel(setup, positions, counts, ['source_scale', 'offset', 'background', 'populations'], 0);
    const r = fitCurve({ names: m.names, start: m.start, scale: m.scale, y: counts, sigma, model: m.model, modelJacobian: m.jacobian });
    summary = `${r.status}, ${r.iterations} iterations, ${m.patterns()} patterns, ${flown.flown()} flights; ${m.names.map((nm, j) => `${nm} ${r.params[j]!.toPrecision(5)}(${r.errors[j]?.toPrecision(2)})`).join(', ')}`;
  }, 9);
  // Baseline: the 8 reference flights one pattern of the fit needs (the moment table already built).
  const one = truth.flown.flights;
  const flightsMs = time(() => one.coefficients(1 + 1e-6 * rand(), 800), 30);
  return { fitMs, flightsMs, summary };
}

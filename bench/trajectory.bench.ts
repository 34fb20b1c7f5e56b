/**
 * Field-map flight benchmark: one 7Li ground-state sublevel (constants as in the engine tests)
 * through the field of two long wires with opposite currents (an invented two-wire magnet):
 * fixed-step RK4 with 200 steps (the "200-step field map"), and the adaptive Dormand–Prince
 * integrator the beam evaluation uses. Goal: one flight < 1 ms. Baseline measured in the same
 * run: the analytic uniform-gradient deflection evaluated 200 times. Also the one-off cost of
 * tabulating the sublevel moments (once per beam evaluation, shared by every flight).
 */
import { deflectionAtSpeed, type BeamGeometry } from '../server/src/physics/beam';
import { ATOMIC_MASS_UNIT } from '../server/src/physics/constants';
import type { HyperfineLevelSpec } from '../server/src/physics/engine';
import { sumField } from '../server/src/physics/fields';
import type { FieldFunction, Vec3 } from '../server/src/physics/fields/types';
import { flySublevel, sublevelCurves } from '../server/src/physics/beam/trajectory';

const LI7: HyperfineLevelSpec = { kind: 'hyperfine', twoJ: 1, twoI: 3, gJ: 2.002301, gI: -0.001182213, A: 401.7520433e6 };
const MU0 = 1.25663706127e-6;

function twoWires(a: number, current: number): FieldFunction {
  const k = (MU0 * current) / (2 * Math.PI);
  return (p: Vec3) => {
    let by = 0, bz = 0, gyy = 0, gyz = 0, gzz = 0;
    for (const [y0, s] of [[a, 1], [-a, -1]] as const) {
      const ry = p[1] - y0;
      const rz = p[2];
      const r2 = ry * ry + rz * rz;
      const r4 = r2 * r2;
      by += (-s * k * rz) / r2;
      bz += (s * k * ry) / r2;
      gyy += (2 * s * k * ry * rz) / r4;
      gyz += (-s * k * (ry * ry - rz * rz)) / r4;
      gzz += (-2 * s * k * ry * rz) / r4;
    }
    return { B: [0, by, bz], gradient: [[0, 0, 0], [0, gyy, gyz], [0, gyz, gzz]] };
  };
}

function timePerCall(fn: () => void, minMs = 300): number {
  for (let i = 0; i < 20; i++) fn();
  let n = 0;
  const t0 = performance.now();
  let t = t0;
  while (t - t0 < minMs) {
    for (let i = 0; i < 10; i++) fn();
    n += 10;
    t = performance.now();
  }
  return (t - t0) / n;
}

export function runTrajectoryBench(): { name: string; lines: string[] } {
  const massKg = 7.0160034366 * ATOMIC_MASS_UNIT;
  const { curves } = sublevelCurves(LI7, 0.3);
  const tableMs = timePerCall(() => void sublevelCurves(LI7, 0.3), 500);
  const setup = { field: twoWires(2e-3, 900), centre: [0, 0, 1.5e-3] as const, magnetLengthM: 0.08, driftM: 0.3, massKg, curves: curves! };
  const state = curves!.labels.findIndex((l) => l.low === 'F=2, m_F=+1');
  let sink = 0;
  const rk4 = timePerCall(() => {
    sink += flySublevel(setup, state, 800, { method: 'rk4', steps: 200 }).detector.zM;
  });
  const adaptiveRun = flySublevel(setup, state, 800);
  const adaptive = timePerCall(() => {
    sink += flySublevel(setup, state, 800).detector.zM;
  });
  // The same magnet from the field-source code: two 12 cm conductors (finite segments, closed form).
  const sources = sumField([
    { kind: 'wire', point: [0, 2e-3, 0], direction: [1, 0, 0], currentA: 900, lengthM: 0.12 },
    { kind: 'wire', point: [0, -2e-3, 0], direction: [1, 0, 0], currentA: -900, lengthM: 0.12 },
  ]);
  const fromSources = { ...setup, field: sources };
  const sourcesRk4 = timePerCall(() => {
    sink += flySublevel(fromSources, state, 800, { method: 'rk4', steps: 200 }).detector.zM;
  });
  const geometry: BeamGeometry = { slit1M: 1e-4, slit2M: 1e-4, slitSeparationM: 0.4, magnetLengthM: 0.08, driftM: 0.3, detectorWidthM: 0, gradientTPerM: 180 };
  const baseline = timePerCall(() => {
    for (let i = 0; i < 200; i++) sink += deflectionAtSpeed(-9.27e-24, massKg, geometry, 800 + i);
  });
  const us = (ms: number): string => `${(ms * 1000).toFixed(1).padStart(8)} µs`;
  return {
    name: `trajectory: one sublevel through a two-wire field map (goal < 1 ms per flight)${sink === 0 ? '' : ''}`,
    lines: [
      `RK4, 200 steps (801 field samples)          ${us(rk4)}  ${(rk4 / baseline).toFixed(1)}× baseline`,
      `Dormand–Prince, ${String(adaptiveRun.steps).padStart(3)} steps (${adaptiveRun.evaluations} samples)    ${us(adaptive)}  ${(adaptive / baseline).toFixed(1)}× baseline`,
      `RK4, 200 steps, field from sumField (wires) ${us(sourcesRk4)}  ${(sourcesRk4 / baseline).toFixed(1)}× baseline`,
      `baseline: analytic deflection × 200         ${us(baseline)}`,
      `moment table (${curves!.labels.length} sublevels, 0–0.3 T, once per beam) ${us(tableMs)}`,
    ],
  };
}

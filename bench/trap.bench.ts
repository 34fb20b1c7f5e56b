/**
 * Trap-summary benchmark: every sublevel of the ⁸⁷Rb ground level (8 states) in a trap —
 * trapped or not, minimum, depth, frequencies or gradients, RF cut, Majorana estimate.
 * Goal: under 10 ms per summary. Baseline measured in the same run: the one engine sweep the
 * summary starts from (201 fields, 8 states), so the ratio shows what the trap search adds.
 * Fields: an ideal quadrupole and an Ioffe–Pritchard field (analytic), and three real loops
 * (elliptic integrals) as in examples/quadrupole-trap.sublevel; all numbers invented.
 *
 * Call: node bench/run.mjs trap
 */
import { ATOMIC_MASS_UNIT } from '../server/src/physics/constants';
import type { HyperfineLevelSpec } from '../server/src/physics/engine';
import { sumField } from '../server/src/physics/fields';
import type { FieldFunction, LoopSpec } from '../server/src/physics/fields/types';
import { STANDARD_GRAVITY, energyCurves, summariseTrap, type TrapInput } from '../server/src/physics/traps';
import { median, wallAndCpuMs } from './timing';

const RB87: HyperfineLevelSpec = { kind: 'hyperfine', twoJ: 1, twoI: 3, gJ: 2.00233113, gI: -0.0009951414, A: 3417.341305452145e6 };
const MASS = 86.909180531 * ATOMIC_MASS_UNIT;

function quadrupole(b1: number): FieldFunction {
  return ([x, y, z]) => ({ B: [(b1 * x) / 2, (b1 * y) / 2, -b1 * z], gradient: [[b1 / 2, 0, 0], [0, b1 / 2, 0], [0, 0, -b1]] });
}

function ioffe(b0: number, b1: number, b2: number): FieldFunction {
  return ([x, y, z]) => ({
    B: [b1 * x - (b2 * x * z) / 2, -b1 * y - (b2 * y * z) / 2, b0 + (b2 * (z * z - (x * x + y * y) / 2)) / 2],
    gradient: [
      [b1 - (b2 * z) / 2, 0, (-b2 * x) / 2],
      [0, -b1 - (b2 * z) / 2, (-b2 * y) / 2],
      [(-b2 * x) / 2, (-b2 * y) / 2, b2 * z],
    ],
  });
}

/** The example's coils: an anti-Helmholtz pair (R = 4 cm at ±4 cm, 2000 A-turns) and a small loop 6 cm below. */
function coils(): LoopSpec[] {
  const loop = (z: number, r: number, at: number): LoopSpec => ({ kind: 'loop', centre: [0, 0, z], axis: [0, 0, 1], radiusM: r, ampereTurns: at });
  return [loop(0.04, 0.04, 2000), loop(-0.04, 0.04, -2000), loop(-0.06, 0.02, 20)];
}

function timeIt(f: () => void, runs: number): { wall: number; cpu: number } {
  for (let i = 0; i < 5; i++) f(); // warm-up (JIT)
  const wall: number[] = [];
  const cpu: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t = wallAndCpuMs(f);
    wall.push(t.wall);
    cpu.push(t.cpu);
  }
  return { wall: median(wall), cpu: median(cpu) };
}

/** Extra cases (traps from real coils) can be added by callers; see runTrapBench. */
export function trapCases(): [string, TrapInput][] {
  const base = { level: RB87, massKg: MASS, gravity: [0, 0, -STANDARD_GRAVITY] as [number, number, number], temperatureK: 1e-4, cutJ: 1e-28 };
  return [
    ['quadrupole 100 G/cm', { ...base, field: quadrupole(1), region: { centre: [0, 0, 0], radiusM: 0.02 } }],
    ['Ioffe–Pritchard 1 G', { ...base, field: ioffe(1e-4, 1, 100), region: { centre: [0, 0, 0], radiusM: 0.005 } }],
    ['coils: pair + lift (3 loops)', { ...base, field: sumField(coils()), region: { centre: [0, 0, 0], radiusM: 0.05 } }],
  ];
}

export function runTrapBench(extra: [string, TrapInput][] = []): { name: string; lines: string[] } {
  const sweep = timeIt(() => energyCurves(RB87, 0.03), 40);
  const lines = [
    `baseline: one 201-point sweep of the level: ${sweep.wall.toFixed(2)} ms (cpu ${sweep.cpu.toFixed(2)} ms)`,
    'trap                           | median ms | cpu ms | × baseline | goal 10 ms | trapped',
  ];
  for (const [name, input] of [...trapCases(), ...extra]) {
    const t = timeIt(() => summariseTrap(input), 30);
    const trapped = summariseTrap(input).sublevels.filter((s) => s.trapped).length;
    lines.push(
      `${name.padEnd(30)} | ${t.wall.toFixed(2).padStart(9)} | ${t.cpu.toFixed(2).padStart(6)} | ${(t.wall / sweep.wall).toFixed(1).padStart(10)} | ${(t.wall < 10 ? 'met' : 'missed').padEnd(10)} | ${trapped}`,
    );
  }
  return { name: 'trap: summary of one level (8 sublevels)', lines };
}

/**
 * Slower benchmark: a whole slower evaluation (invented sodium-like D2 slower, 950 → 30 m/s,
 * spin-flip) — the engine's driven-pair rates, the ideal profile, its 101-sample check and one
 * atom's flight — and the check + flight through a coil design of 40 solenoid sections (exact
 * fields). Ratios against one exact solve of the two levels at one field, measured in the same run.
 */
import { VACUUM_PERMEABILITY } from '../server/src/physics/constants';
import type { HyperfineLevelSpec } from '../server/src/physics/engine';
import { solveLevel } from '../server/src/physics/engine';
import { sumField, type FieldSourceSpec } from '../server/src/physics/fields';
import { axisField, checkDesign, drivenPair, idealField, idealProfile, simulateAtom } from '../server/src/physics/slower';
import { bestMs } from './timing';

// Steck, "Sodium D Line Data": g_J, A, B, g_I (as in the species table).
const GROUND: HyperfineLevelSpec = { kind: 'hyperfine', twoJ: 1, twoI: 3, gJ: 2.002296, gI: -0.0008046108, A: 885.8130644e6 };
const P32: HyperfineLevelSpec = { kind: 'hyperfine', twoJ: 3, twoI: 3, gJ: 1.3342, gI: -0.0008046108, A: 18.534e6, B: 2.724e6 };
const T = { wavelengthM: 589.1583264e-9, lifetimeS: 16.2492e-9, massKg: 3.81754100782e-26 };

export function runSlowerBench(): { name: string; lines: string[] } {
  const baseline = bestMs(() => {
    for (let i = 0; i < 100; i++) {
      solveLevel(GROUND, 0.01);
      solveLevel(P32, 0.01);
    }
  }) / 100;
  let final = 0;
  const whole = bestMs(() => {
    const pair = drivenPair(GROUND, P32, 'top', [1e-7]).pair!;
    const p = idealProfile({ ...T, rateHzPerT: pair.ratesHzPerT[0]! }, { captureMPerS: 950, finalMPerS: 30, safety: 0.55, design: 'spin_flip', saturation: 2.5 }).profile!;
    drivenPair(GROUND, P32, 'top', [1e-7, p.entryFieldT, idealField(p, p.lengthM / 2).BT, p.exitFieldT]);
    const common = { shiftHzPerT: pair.ratesHzPerT[0]!, wavelengthM: T.wavelengthM, saturation: 2.5 };
    checkDesign({ ...common, profile: p, field: (z) => idealField(p, z), points: 101 });
    final = simulateAtom({ ...common, field: (z) => idealField(p, z), detuningHz: p.detuningHz, lifetimeS: T.lifetimeS, maxDecelerationMPerS2: p.maxDecelerationMPerS2, startSpeedMPerS: 950, endM: p.lengthM }).result!.finalMPerS;
  });
  const pair = drivenPair(GROUND, P32, 'top', [1e-7]).pair!;
  const p = idealProfile({ ...T, rateHzPerT: pair.ratesHzPerT[0]! }, { captureMPerS: 950, finalMPerS: 30, safety: 0.55, design: 'spin_flip', saturation: 2.5 }).profile!;
  const parts: FieldSourceSpec[] = Array.from({ length: 40 }, (_, k) => {
    const l = (p.lengthM + 0.05) / 40;
    const zc = -0.05 + (k + 0.5) * l;
    return { kind: 'solenoid', centre: [0, 0, zc], axis: [0, 0, 1], radiusM: 0.015, lengthM: l, ampereTurns: (1.03 * idealField(p, zc).BT * l) / VACUUM_PERMEABILITY };
  });
  const field = axisField(sumField(parts), { start: [0, 0, 0], direction: [0, 0, 1] });
  const common = { shiftHzPerT: pair.ratesHzPerT[0]!, wavelengthM: T.wavelengthM, saturation: 2.5 };
  let steps = 0;
  const coils = bestMs(() => {
    checkDesign({ ...common, profile: p, field, points: 101 });
    steps = simulateAtom({ ...common, field, detuningHz: p.detuningHz, lifetimeS: T.lifetimeS, maxDecelerationMPerS2: p.maxDecelerationMPerS2, startSpeedMPerS: 950, endM: p.lengthM }).result!.steps;
  }, 3);
  return {
    name: 'slower',
    lines: [
      `baseline: exact solve of Na 3S1/2 + 3P3/2 at one field   ${(baseline * 1000).toFixed(1)} µs`,
      `whole slower (rates, profile, 101-sample check, flight)   ${whole.toFixed(2)} ms  (${(whole / baseline).toFixed(0)}× baseline; atom leaves at ${final.toFixed(1)} m/s)`,
      `coil check + flight through 40 solenoid sections          ${coils.toFixed(2)} ms  (${(coils / baseline).toFixed(0)}× baseline, ${steps} steps)`,
    ],
  };
}

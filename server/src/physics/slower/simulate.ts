/**
 * One atom's 1-D motion through a slower: the mean scattering force of the counter-propagating
 * beam, a(v, z) = a_max s0 / (1 + s0 + (2δ/Γ)²) with δ = δ_laser + v/λ − shift(B(z)) (Foot,
 * "Atomic Physics" §9.3, from memory). Heating by the random recoils is left out (it spreads the
 * speeds; it does not move the mean). Integrated in time with the Dormand–Prince 5(4) pair and
 * step control (E. Hairer, S. P. Nørsett, G. Wanner, "Solving Ordinary Differential Equations I",
 * 2nd ed., Springer 1993, §II.5, the same pair as SciPy's RK45).
 */
import { scatteringDeceleration } from './deceleration';
import { issue } from './issue';
import type { AxisField, SimulationResult, SlowerIssue } from './types';

export interface SimulationInput {
  field: AxisField;
  /** Zeeman shift of the driven pair per tesla, signed as the profile uses it, Hz/T. */
  shiftHzPerT: number;
  detuningHz: number;
  wavelengthM: number;
  lifetimeS: number;
  maxDecelerationMPerS2: number;
  saturation: number;
  startSpeedMPerS: number;
  /** The atom is followed from z = 0 to here, m. */
  endM: number;
  /** Relative tolerance of each step (default 1e-9). */
  tolerance?: number;
}

const MAX_STEPS = 200_000;
const PATH_POINTS = 400;

// Dormand–Prince 5(4) coefficients (Hairer–Nørsett–Wanner, Table II.5.2); the right side does not depend on t, so the nodes c_i are not needed.
const A: number[][] = [
  [],
  [1 / 5],
  [3 / 40, 9 / 40],
  [44 / 45, -56 / 15, 32 / 9],
  [19372 / 6561, -25360 / 2187, 64448 / 6561, -212 / 729],
  [9017 / 3168, -355 / 33, 46732 / 5247, 49 / 176, -5103 / 18656],
  [35 / 384, 0, 500 / 1113, 125 / 192, -2187 / 6784, 11 / 84],
];
const B5 = [35 / 384, 0, 500 / 1113, 125 / 192, -2187 / 6784, 11 / 84, 0];
const B4 = [5179 / 57600, 0, 7571 / 16695, 393 / 640, -92097 / 339200, 187 / 2100, 1 / 40];

export function simulateAtom(input: SimulationInput): { result?: SimulationResult; issues: SlowerIssue[] } {
  const { field, shiftHzPerT, detuningHz, wavelengthM, lifetimeS, maxDecelerationMPerS2: aMax, saturation, endM } = input;
  const rtol = input.tolerance ?? 1e-9;
  const accel = (z: number, v: number): number => {
    const seen = detuningHz + v / wavelengthM - shiftHzPerT * field(z).BT;
    return -scatteringDeceleration(aMax, saturation, seen, lifetimeS);
  };
  const rhs = (y: [number, number]): [number, number] => [y[1], accel(y[0], y[1])];
  let t = 0;
  let y: [number, number] = [0, input.startSpeedMPerS];
  let f = rhs(y);
  // A first step that the force cannot change by much: a tenth of the time to cross one natural width in speed.
  let h = Math.min(endM / Math.max(y[1], 1e-9), (0.1 * wavelengthM) / (2 * Math.PI * lifetimeS * Math.max(aMax, 1e-30)));
  const path: { zM: number; vMPerS: number }[] = [{ zM: 0, vMPerS: y[1] }];
  let steps = 0;
  while (steps < MAX_STEPS) {
    const k: [number, number][] = [f];
    for (let s = 1; s < 7; s++) {
      const yi: [number, number] = [y[0], y[1]];
      for (let j = 0; j < s; j++) {
        yi[0] += h * A[s]![j]! * k[j]![0];
        yi[1] += h * A[s]![j]! * k[j]![1];
      }
      k.push(rhs(yi));
    }
    const y5: [number, number] = [y[0], y[1]];
    const e: [number, number] = [0, 0];
    for (let s = 0; s < 7; s++) {
      y5[0] += h * B5[s]! * k[s]![0];
      y5[1] += h * B5[s]! * k[s]![1];
      e[0] += h * (B5[s]! - B4[s]!) * k[s]![0];
      e[1] += h * (B5[s]! - B4[s]!) * k[s]![1];
    }
    const sc0 = 1e-12 + rtol * Math.max(Math.abs(y[0]), Math.abs(y5[0]), endM);
    const sc1 = 1e-9 + rtol * Math.max(Math.abs(y[1]), Math.abs(y5[1]));
    const err = Math.sqrt(((e[0] / sc0) ** 2 + (e[1] / sc1) ** 2) / 2);
    steps++;
    if (!(err <= 1)) {
      h *= Math.max(0.2, 0.9 * Math.pow(Number.isFinite(err) ? err : 1e10, -0.2));
      continue;
    }
    const f5 = k[6]!; // first-same-as-last: the derivative at the new point
    // The atom reached the end, or stopped (v = 0) and would turn back: locate the crossing on the cubic Hermite of the step.
    const crossing = y5[0] >= endM ? locate(y, f, y5, f5, h, 0, endM) : y5[1] <= 0 ? locate(y, f, y5, f5, h, 1, 0) : undefined;
    if (crossing) {
      const at = hermite(y, f, y5, f5, h, crossing);
      path.push({ zM: at[0], vMPerS: Math.max(at[1], 0) });
      const done: SimulationResult = {
        finalMPerS: y5[0] >= endM && y5[1] > 0 ? at[1] : 0,
        timeS: t + crossing * h,
        path: thin(path),
        steps,
      };
      if (!(y5[0] >= endM && y5[1] > 0)) done.stoppedAtM = at[0];
      return { result: done, issues: [] };
    }
    t += h;
    y = y5;
    f = f5;
    path.push({ zM: y[0], vMPerS: y[1] });
    h *= Math.min(5, 0.9 * Math.pow(Math.max(err, 1e-10), -0.2));
  }
  return { issues: [issue('warning', 'slower-simulation-too-long', `the atom's flight needed more than ${MAX_STEPS} steps; no final speed is given`)] };
}

/** Cubic Hermite interpolation of the state over one step at the fraction θ ∈ [0, 1]. */
function hermite(y0: [number, number], f0: [number, number], y1: [number, number], f1: [number, number], h: number, th: number): [number, number] {
  const h00 = (1 + 2 * th) * (1 - th) ** 2;
  const h10 = th * (1 - th) ** 2;
  const h01 = th * th * (3 - 2 * th);
  const h11 = th * th * (th - 1);
  return [0, 1].map((i) => h00 * y0[i]! + h10 * h * f0[i]! + h01 * y1[i]! + h11 * h * f1[i]!) as [number, number];
}

/** The fraction of the step where component `i` of the interpolant reaches `target` (bisection; the step is short). */
function locate(y0: [number, number], f0: [number, number], y1: [number, number], f1: [number, number], h: number, i: 0 | 1, target: number): number {
  let lo = 0;
  let hi = 1;
  const below = y0[i] < target;
  for (let n = 0; n < 60; n++) {
    const mid = (lo + hi) / 2;
    const v = hermite(y0, f0, y1, f1, h, mid)[i];
    if (v < target === below) lo = mid;
    else hi = mid;
  }
  return (lo + hi) / 2;
}

/** At most PATH_POINTS samples, evenly spread over the steps, first and last kept. */
function thin(path: { zM: number; vMPerS: number }[]): { zM: number; vMPerS: number }[] {
  if (path.length <= PATH_POINTS) return path;
  const out: { zM: number; vMPerS: number }[] = [];
  for (let i = 0; i < PATH_POINTS - 1; i++) out.push(path[Math.floor((i * (path.length - 1)) / (PATH_POINTS - 1))]!);
  out.push(path[path.length - 1]!);
  return out;
}

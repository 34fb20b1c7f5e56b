/**
 * One sublevel's flight through a magnet's field and the field-free drift after it.
 *
 * Frame (docs/beam.md, "Magnets built from sources"): the beam flies along +x through the
 * point `centre`; the magnet is the stretch centre.x ± L/2 of that line; z is the deflection
 * axis and y the other transverse axis. The uniform-gradient model is the special case
 * ∂|B|/∂z = const with μ constant.
 *
 * Approximations, stated: the forward speed v is constant (the longitudinal force only changes
 * it by the potential-energy span over ½Mv², which the result reports), so with s = x the
 * transverse motion obeys d²r⊥/ds² = μ(|B|) ∇⊥|B| / (M v²); the sublevel follows the field's
 * direction adiabatically (the result reports the largest ratio of the field's turning rate to
 * the sublevel's Larmor frequency); outside the stretch the field is taken as zero.
 */
import { PLANCK_H } from '../../constants';
import type { FieldFunction, FieldSample, Vec3 } from '../../fields/types';
import { beamIssue, type BeamIssue } from '../types';
import { directionTurnRate, magnitudeAndGradient } from './fieldMagnitude';
import { cm } from './messageText';
import { dormandPrince, rungeKutta4, type StepperResult } from './steppers';
import type { SublevelCurves } from './sublevelCurves';

export interface FlightSetup {
  field: FieldFunction;
  /** The beam line's point at the middle of the magnet stretch (lab frame, m). */
  centre: Vec3;
  magnetLengthM: number;
  driftM: number;
  massKg: number;
  curves: SublevelCurves;
}

export interface FlightOptions {
  /** 'adaptive' (Dormand–Prince 5(4), default) or 'rk4' with `steps` fixed steps. */
  method?: 'adaptive' | 'rk4';
  /** RK4: the number of steps; adaptive: the fewest steps (the largest step is L/steps). Default 32 adaptive, 200 rk4. */
  steps?: number;
  /** Adaptive: relative tolerance (default 1e-10). */
  relativeTolerance?: number;
  /** Where the atom enters, relative to the beam line (m, rad). Default: on the line, parallel to it. */
  start?: { y?: number; z?: number; dy?: number; dz?: number };
}

export interface TransverseState {
  yM: number;
  zM: number;
  /** dy/dx and dz/dx (rad). */
  angleY: number;
  angleZ: number;
}

export interface Flight {
  ok: boolean;
  exit: TransverseState;
  detector: TransverseState;
  steps: number;
  evaluations: number;
  /** Smallest and largest |B| met along the path, T. */
  minFieldT: number;
  maxFieldT: number;
  /** Where |B| was smallest: x from the magnet entrance, m. */
  minFieldAtM: number;
  /** Largest (turning rate of the field direction seen by the atom)/(Larmor angular frequency of the sublevel). */
  adiabaticity: number;
  adiabaticityAtM: number;
  /** Span of the sublevel's energy along the path, J: v changes by about this/(M v) — reported as a fraction below. */
  potentialSpanJ: number;
  /** potentialSpan / (½ M v²): how far the constant-forward-speed approximation is stretched. */
  forwardEnergyFraction: number;
  /** Transverse kinetic + potential energy at the entrance and the exit, J (equal when the field does not change along x). */
  energyInJ: number;
  energyOutJ: number;
  issues: BeamIssue[];
}

/** Largest adiabaticity ratio that passes: the Larmor frequency must exceed the turning rate tenfold (common practice). */
export const ADIABATIC_LIMIT = 0.1;

export function flySublevel(setup: FlightSetup, state: number, speed: number, options: FlightOptions = {}): Flight {
  const { field, centre, magnetLengthM: L, driftM, massKg, curves } = setup;
  const issues: BeamIssue[] = [];
  const scale = 1 / (massKg * speed * speed);
  const x0 = centre[0] - L / 2;
  const mag = new Float64Array(4);
  const pot = new Float64Array(2);
  let last: FieldSample | undefined;
  let beyond = false;
  const f = (s: number, u: Float64Array, du: Float64Array): boolean => {
    const sample = field([x0 + s, centre[1] + u[0], centre[2] + u[1]]);
    // On a conductor the sum leaves that part out (sumField's leftOut): the flight stops there.
    if (sample.leftOut) return false;
    magnitudeAndGradient(sample, mag);
    const b = mag[0];
    if (!Number.isFinite(b) || !Number.isFinite(mag[2]) || !Number.isFinite(mag[3])) return false;
    if (b > curves.maxFieldT) {
      beyond = true;
      return false;
    }
    curves.at(state, b, pot);
    const a = pot[1] * scale;
    du[0] = u[2];
    du[1] = u[3];
    du[2] = a * mag[2];
    du[3] = a * mag[3];
    last = sample;
    return true;
  };
  let minB = Infinity;
  let maxB = -Infinity;
  let minAt = 0;
  let worst = 0;
  let worstAt = 0;
  let eLo = Infinity;
  let eHi = -Infinity;
  let energyIn = NaN;
  let energyOut = NaN;
  const observe = (s: number, u: Float64Array): void => {
    const sample = last!;
    const b = Math.hypot(sample.B[0], sample.B[1], sample.B[2]);
    curves.at(state, b, pot);
    const e = pot[0] * PLANCK_H;
    eLo = Math.min(eLo, e);
    eHi = Math.max(eHi, e);
    const energy = 0.5 * massKg * speed * speed * (u[2] * u[2] + u[3] * u[3]) + e;
    if (s === 0) energyIn = energy;
    energyOut = energy;
    if (b < minB) {
      minB = b;
      minAt = s;
    }
    maxB = Math.max(maxB, b);
    const larmor = 2 * Math.PI * curves.neighbourGapHz(state, b);
    const turn = speed * directionTurnRate(sample, u[2], u[3]);
    const ratio = larmor > 0 ? turn / larmor : Infinity;
    if (ratio > worst) {
      worst = ratio;
      worstAt = s;
    }
  };
  const u = new Float64Array([options.start?.y ?? 0, options.start?.z ?? 0, options.start?.dy ?? 0, options.start?.dz ?? 0]);
  let run: StepperResult;
  if (!(L > 0)) {
    run = { ok: true, steps: 0, rejected: 0, evaluations: 0 };
  } else if (options.method === 'rk4') {
    run = rungeKutta4(f, 0, L, u, Math.max(1, Math.round(options.steps ?? 200)), observe);
  } else {
    const rtol = options.relativeTolerance ?? 1e-10;
    // Absolute floors: 1 pm in position and 1 prad in angle over a metre-scale apparatus.
    run = dormandPrince(f, 0, L, u, { rtol, atol: [1e-12, 1e-12, 1e-12, 1e-12], maxStep: L / (options.steps ?? 32), maxSteps: 100_000 }, observe);
  }
  const exit: TransverseState = { yM: u[0], zM: u[1], angleY: u[2], angleZ: u[3] };
  const detector: TransverseState = { yM: u[0] + u[2] * driftM, zM: u[1] + u[3] * driftM, angleY: u[2], angleZ: u[3] };
  if (!run.ok) {
    const where = `${cm(run.stoppedAtS ?? 0)} into the magnet`;
    if (beyond) issues.push(beamIssue('error', 'trajectory-field-beyond-table', `The field along the path exceeds the ${curves.maxFieldT} T the moments were tabulated for (${where}).`));
    else if (run.reason === 'derivative') issues.push(beamIssue('error', 'trajectory-meets-source', `The atom's path runs into a field source ${where}: the field is not defined there.`));
    else issues.push(beamIssue('error', 'trajectory-not-converged', `The trajectory integration did not converge (${run.reason} ${where}).`));
  }
  const kinetic = 0.5 * massKg * speed * speed;
  const span = Number.isFinite(eHi - eLo) ? eHi - eLo : 0;
  return {
    ok: run.ok,
    exit,
    detector,
    steps: run.steps,
    evaluations: run.evaluations,
    minFieldT: Number.isFinite(minB) ? minB : 0,
    maxFieldT: Number.isFinite(maxB) ? maxB : 0,
    minFieldAtM: minAt,
    adiabaticity: worst,
    adiabaticityAtM: worstAt,
    potentialSpanJ: span,
    forwardEnergyFraction: span / kinetic,
    energyInJ: energyIn,
    energyOutJ: energyOut,
    issues,
  };
}

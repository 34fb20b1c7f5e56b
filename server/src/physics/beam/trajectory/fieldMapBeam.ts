/**
 * A beam through a magnet built from field sources: every sublevel flies through the real field
 * (flight.ts) at a few speeds of the source's speed law, starting on the beam line parallel to
 * it. The result is, per sublevel, the deflection coefficient k in z = k/v² at the reference
 * speed v* = ⟨1/v²⟩^(−1/2) (so the flux-averaged deflection k⟨1/v²⟩ is right when k barely
 * depends on v) and how much k changes across the speeds — the pattern code then spreads each
 * sublevel over the speed law with that k. Problems come back as values.
 */
import type { LevelSpec } from '../../engine';
import type { FieldFunction, FieldSourceSpec, Vec3 } from '../../fields/types';
import { beamIssue, type BeamIssue } from '../types';
import { surveyBeamLine, type BeamLineSurvey } from './beamLineSurvey';
import { ADIABATIC_LIMIT, flySublevel, type Flight, type FlightOptions } from './flight';
import { cm, tesla } from './messageText';
import { sublevelCurves, type SublevelCurves } from './sublevelCurves';
import { BEYOND_TABLE, flyWideningTable } from './widenedTable';

export interface FieldMapInput {
  field: FieldFunction;
  centre: Vec3;
  magnetLengthM: number;
  driftM: number;
  massKg: number;
  spec: LevelSpec;
  /** The sublevels to fly, by their low-field label text (as the engine writes it). */
  labels: readonly string[];
  /** Reference speed v* first, then any others (the slow and fast ends of the speed law). */
  speeds: readonly number[];
  /** Half the beam's height inside the magnet, m. */
  halfHeightM: number;
  /** The parts of the field, named: the beam line must keep clear of them (beamLineSurvey.ts). */
  obstacles?: readonly { name: string; spec: FieldSourceSpec }[];
  options?: FlightOptions;
}

export interface FieldMapSublevel {
  label: string;
  /** k = z_detector · v*² at the reference speed, m³/s². */
  coefficientM3PerS2: number;
  /** Largest |k(v)/k(v*) − 1| over the other speeds (0 when there are none or k(v*) = 0). */
  coefficientSpread: number;
  flights: { speed: number; flight: Flight }[];
}

export interface FieldMapBeam {
  ok: boolean;
  survey: BeamLineSurvey;
  sublevels: FieldMapSublevel[];
  /** Worst adiabaticity ratio over every flight, and whose. */
  adiabaticity: number;
  adiabaticityLabel?: string;
  /** Largest potential-energy span over ½Mv² of any flight (the constant-forward-speed approximation). */
  forwardEnergyFraction: number;
  /** Field range the moments were tabulated over, T, and the table's own moment check, J/T. */
  tableMaxFieldT: number;
  tableErrorJT: number;
  steps: number;
  issues: BeamIssue[];
}

/** Above this relative change of k over the speeds, the note says the peak shapes are approximate (our choice, docs/beam.md). */
export const INVERSE_SQUARE_LIMIT = 0.02;
/** Above this the forward speed changes by more than ~1 % through the magnet (our choice). */
export const FORWARD_ENERGY_LIMIT = 0.02;
/** Margin on the largest |B| seen along the beam line, for atoms that wander from it. */
const TABLE_MARGIN = 1.5;

export function fieldMapBeam(input: FieldMapInput): FieldMapBeam {
  const survey = surveyBeamLine({
    field: input.field,
    centre: input.centre,
    magnetLengthM: input.magnetLengthM,
    halfHeightM: input.halfHeightM,
    ...(input.obstacles ? { obstacles: input.obstacles } : {}),
  });
  const out: FieldMapBeam = {
    ok: false,
    survey,
    sublevels: [],
    adiabaticity: 0,
    forwardEnergyFraction: 0,
    tableMaxFieldT: 0,
    tableErrorJT: 0,
    steps: 0,
    issues: [...survey.issues],
  };
  if (survey.issues.some((i) => i.severity === 'error')) return out;
  // An atom deflected far from the line can meet stronger fields: the table is widened and the atoms flown again.
  const flown = flyWideningTable(Math.max(survey.maxFieldT * TABLE_MARGIN, 1e-6), (maxT) => sublevelCurves(input.spec, maxT), (curves) => flyAll(input, curves));
  if (flown.kind === 'no-table') {
    out.issues.push(...flown.issues);
    return out;
  }
  if (flown.kind === 'flown') {
    out.issues.push(...flown.issues);
    out.tableMaxFieldT = flown.maxT;
    out.tableErrorJT = flown.curves.interpolationErrorJT;
    return finish(out, flown.value, input);
  }
  out.issues.push(beamIssue('error', 'trajectory-field-beyond-table', `The field along the atoms' paths exceeds ${flown.maxT.toPrecision(3)} T; they run far from the beam line into strong fields near a source.`));
  return out;
}

function flyAll(input: FieldMapInput, curves: SublevelCurves): FieldMapSublevel[] | typeof BEYOND_TABLE {
  const setup = { field: input.field, centre: input.centre, magnetLengthM: input.magnetLengthM, driftM: input.driftM, massKg: input.massKg, curves };
  const result: FieldMapSublevel[] = [];
  for (const label of input.labels) {
    const state = curves.labels.findIndex((l) => l.low === label);
    const flights = input.speeds.map((speed) => ({ speed, flight: state >= 0 ? flySublevel(setup, state, speed, input.options) : missing(label) }));
    if (flights.some((f) => f.flight.issues.some((i) => i.code === 'trajectory-field-beyond-table'))) return BEYOND_TABLE;
    const k = flights.map((f) => f.flight.detector.zM * f.speed * f.speed);
    const k0 = k[0] ?? 0;
    const spread = k0 !== 0 ? Math.max(0, ...k.slice(1).map((x) => Math.abs(x / k0 - 1))) : 0;
    result.push({ label, coefficientM3PerS2: k0, coefficientSpread: spread, flights });
  }
  return result;
}

function missing(label: string): Flight {
  const zero = { yM: 0, zM: 0, angleY: 0, angleZ: 0 };
  return {
    ok: false,
    exit: zero,
    detector: zero,
    steps: 0,
    evaluations: 0,
    minFieldT: 0,
    maxFieldT: 0,
    minFieldAtM: 0,
    adiabaticity: 0,
    adiabaticityAtM: 0,
    potentialSpanJ: 0,
    forwardEnergyFraction: 0,
    energyInJ: 0,
    energyOutJ: 0,
    issues: [beamIssue('error', 'trajectory-level-unusable', `The engine has no sublevel labelled ${label} to fly.`)],
  };
}

function finish(out: FieldMapBeam, sublevels: FieldMapSublevel[], input: FieldMapInput): FieldMapBeam {
  out.sublevels = sublevels;
  const seen = new Set<string>();
  let worstSpread = 0;
  let worstAdiabatic: { ratio: number; label: string; flight: Flight } | undefined;
  for (const s of sublevels) {
    worstSpread = Math.max(worstSpread, s.coefficientSpread);
    for (const { flight } of s.flights) {
      out.steps += flight.steps;
      out.forwardEnergyFraction = Math.max(out.forwardEnergyFraction, flight.forwardEnergyFraction);
      for (const i of flight.issues) {
        if (seen.has(i.code)) continue;
        seen.add(i.code);
        out.issues.push(i);
      }
      if (!worstAdiabatic || flight.adiabaticity > worstAdiabatic.ratio) worstAdiabatic = { ratio: flight.adiabaticity, label: s.label, flight };
    }
  }
  out.ok = sublevels.every((s) => s.flights.every((f) => f.flight.ok));
  if (worstAdiabatic) {
    out.adiabaticity = worstAdiabatic.ratio;
    out.adiabaticityLabel = worstAdiabatic.label;
  }
  if (worstAdiabatic && worstAdiabatic.ratio > ADIABATIC_LIMIT) {
    const f = worstAdiabatic.flight;
    out.issues.push(
      beamIssue(
        'warning',
        'magnet-spin-flip-risk',
        `|B| falls to ${tesla(f.minFieldT)} ${cm(f.minFieldAtM)} into the magnet, and the field's direction turns ${Number.isFinite(worstAdiabatic.ratio) ? `at ${worstAdiabatic.ratio.toPrecision(2)} times the Larmor precession rate` : 'while the field passes through zero, faster than the Larmor precession'} of ${worstAdiabatic.label} (it should stay below ${ADIABATIC_LIMIT} times): atoms may flip to other sublevels there, which the peaks do not include.`,
      ),
    );
  }
  if (worstSpread > INVERSE_SQUARE_LIMIT && input.speeds.length > 1) {
    out.issues.push(
      beamIssue(
        'info',
        'magnet-deflection-not-inverse-square',
        `In this field the deflection departs from z ∝ 1/v² by up to ${(100 * worstSpread).toFixed(0)} % between the slow and fast atoms; peak positions come from flights at the reference speed, and the peak shapes are approximate.`,
      ),
    );
  }
  if (out.forwardEnergyFraction > FORWARD_ENERGY_LIMIT) {
    out.issues.push(
      beamIssue(
        'warning',
        'magnet-forward-speed-changes',
        `The sublevel energy changes by ${(100 * out.forwardEnergyFraction).toFixed(0)} % of the forward kinetic energy through the magnet; the flights keep the forward speed constant, so slow atoms are less accurate.`,
      ),
    );
  }
  return out;
}

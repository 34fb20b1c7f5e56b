/**
 * `*_unc` of a beam whose magnet is built from sources (docs/beam.md §7): its peaks come from
 * each sublevel's coefficient k = z_detector · v*² flown at the reference speed v*, so every
 * input that changes a flight — a source's current, turns, radius, place…, the beam line `at`,
 * the magnet's length, the level's constants, the oven temperature (through v* ∝ √T) — reaches
 * the peaks through ∂k_i/∂p, found by flying again with the input nudged (central differences,
 * physics/beam/trajectory/coefficientSlopes.ts). The drift is exact: the atom leaves the magnet
 * in a straight line, ∂k/∂L2 = (dz/dx at the exit) · v*². From the k_i on, the peaks are those
 * of the uniform pass (beamPass.ts: peak slopes, slit image, detector, the 1/T of the speeds).
 */
import { leverArmM2 } from '../../physics/beam';
import { CoefficientFlyer, coefficientSlopes, effectiveMomentJT, type CoefficientNudge, type CoefficientSlope, type FlightChange } from '../../physics/beam/trajectory';
import { BOHR_MAGNETON, PLANCK_H } from '../../physics/constants';
import type { HyperfineLevelSpec } from '../../physics/engine';
import { sumField } from '../../physics/fields';
import { combine, hasSensitivity, levelDerivatives, NO_SENSITIVITY, scaled, standardUncertainty, throughParams, type LevelParam, type Sensitivities } from '../../physics/uncertainty';
import type { Problem, Range } from '../../format/ast';
import type { BeamModel } from '../../model/types';
import { beamInputs } from '../beamInput';
import type { GJLookup } from '../gJLookup';
import { magnetFieldMap } from '../magnetFieldMap';
import type { BeamResult } from '../resultTypes';
import { peakUncertainty } from './beamPass';
import { fieldKey, reachesWritten, type SetupInputs } from './inputs';
import { firstStep } from './sourceInputs';
import { setUnc } from './uncField';

/** The level constants a flight's moments depend on, as the spec names them. */
const SPEC_PARAMS: readonly (LevelParam & keyof HyperfineLevelSpec)[] = ['A', 'B', 'C', 'gJ', 'gI'];

/** Most inputs re-flown for one beam (each costs 2 flights per sublevel, more when its step is cut): our bound on the cost. */
export const MAX_FLOWN_INPUTS = 48;

interface Flown {
  sens: Sensitivities;
  label: string;
  /** The written value's range, when the input is a number of this file's sources. */
  range?: Range;
  nudge: CoefficientNudge;
}

/** Why re-flown coefficients gave no slope, in the user's words (coefficientSlopes.ts). */
const NO_SLOPE: Record<NonNullable<CoefficientSlope['reason']>, string> = {
  'flight-failed': "an atom's path, with the input moved by its uncertainty, meets a source or cannot be flown, so the deflections have no first-order uncertainty in it",
  'not-linear': "the deflections do not change linearly with the input over its uncertainty, even with the step cut twice (the field's shape changes abruptly there), so they have no first-order uncertainty in it",
};

export function fieldMapBeamUncertainty(r: BeamResult, beam: BeamModel, gJOf: GJLookup, inp: SetupInputs, problems: Problem[]): void {
  const { level, magnet, driftM } = beam;
  const mass = beam.species?.massKg?.value;
  const mis = r.speeds?.mean_inverse_square_s2_per_m2;
  const fm = r.field_map;
  const inputs = beamInputs(beam, gJOf);
  const map = magnetFieldMap(magnet);
  if (!r.computed || !level || !magnet?.fieldT || !magnet.lengthM || !driftM || !mass || mis === undefined || !fm || !inputs || !map || inputs.spec.kind !== 'hyperfine') return;
  const spec = inputs.spec;
  const params = { ...inp.levelParams(level), field: inp.fieldSens.get(fieldKey({ kind: 'magnet', name: magnet.name })) ?? NO_SENSITIVITY };
  const length = inp.magnetSens.get(magnet.name)?.length ?? NO_SENSITIVITY;
  const drift = inp.beamDrift.get(beam.name) ?? NO_SENSITIVITY;
  const apparatus = inp.beamGeometry.get(beam.name);
  const temperature = beam.source?.value.kind === 'oven' ? apparatus?.temperature ?? NO_SENSITIVITY : NO_SENSITIVITY;
  const T = beam.source?.value.kind === 'oven' ? beam.source.value.temperatureK : 1;
  const L1 = magnet.lengthM.value;
  const v = fm.reference_speed_m_per_s;

  const flown: Flown[] = [];
  // An input the magnet's own pass could not propagate (its nudge meets a conductor) is reported
  // once at its number, for the magnet and its beams (sourceGaps.ts).
  const gapped = new Set((inp.sourceGaps.get(magnet.name) ?? []).map((g) => g.input));
  for (const s of inp.sourceInputs.get(magnet.name) ?? []) {
    const step = firstStep(s.u, s.scale);
    if (gapped.has(s)) continue;
    const at = (t: number): FlightChange => {
      const moved = s.at(t);
      return { field: sumField(moved.parts), centre: moved.centre };
    };
    flown.push({ sens: s.sens, label: s.label, ...(s.range ? { range: s.range } : {}), nudge: { step, at } });
  }
  for (const p of SPEC_PARAMS) {
    const sens = params[p];
    if (!sens || !hasSensitivity(sens)) continue;
    const value = spec[p] ?? 0;
    const u = standardUncertainty(sens, inp.table);
    if (!(u > 0)) continue;
    flown.push({ sens, label: `${p} of ${level.name}`, nudge: { step: firstStep(u, Math.abs(value)), at: (t) => ({ spec: { ...spec, [p]: value + t } }) } });
  }
  if (hasSensitivity(length)) {
    flown.push({ sens: length, label: `length of magnet ${magnet.name}`, nudge: { step: firstStep(standardUncertainty(length, inp.table), L1), at: (t) => ({ magnetLengthM: L1 + t }) } });
  }
  if (hasSensitivity(temperature)) {
    // An oven's speeds scale as √T: the reference speed moves with it (the 1/T of ⟨1/v²⟩ is the peak pass's).
    flown.push({ sens: temperature, label: 'oven temperature', nudge: { step: firstStep(standardUncertainty(temperature, inp.table), T), at: (t) => ({ speed: v * Math.sqrt((T + t) / T) }) } });
  }
  const anything = flown.length > 0 || [drift, params.field, ...Object.values(apparatus ?? {})].some((s) => hasSensitivity(s));
  if (!anything) return;

  // A warning when an uncertainty the file wrote is lost, a note when only built-in data's are (as beamPass.ts).
  // An input written in a source gets its own problem at its number; the rest one at the beam's name.
  const undefinedFor = (what: readonly Flown[], why: string): void => {
    const severity = (w: readonly Flown[]) => (w.some((x) => reachesWritten(x.sens, inp.table)) ? 'warning' : 'info');
    for (const w of what.filter((x) => x.range)) {
      problems.push({
        code: 'uncertainty-undefined',
        severity: severity([w]),
        message: `beam '${beam.name}': ${w.label}: ${why}; the uncertainties shown leave it out`,
        range: w.range!,
        related: [{ message: `beam '${beam.name}'`, range: beam.nameRange }],
      });
    }
    const rest = what.filter((x) => !x.range);
    if (rest.length === 0) return;
    problems.push({
      code: 'uncertainty-undefined',
      severity: severity(rest),
      message: `beam '${beam.name}': ${rest.map((w) => w.label).join(', ')}: ${why}; the uncertainties shown leave ${rest.length > 1 ? 'them' : 'it'} out`,
      range: beam.nameRange,
    });
  };
  if (flown.length > MAX_FLOWN_INPUTS) {
    undefinedFor(
      flown.slice(MAX_FLOWN_INPUTS),
      `more than ${MAX_FLOWN_INPUTS} uncertain inputs change the flights, and each needs its own; only the first ${MAX_FLOWN_INPUTS} are propagated`,
    );
    flown.length = MAX_FLOWN_INPUTS;
  }

  const labels = inputs.input.sublevels.map((s) => s.label);
  const base = { field: map.field, centre: map.centre, magnetLengthM: L1, driftM: driftM.value, massKg: mass, spec, labels, maxFieldT: fm.moment_table_max_T };
  // The beam's own flights at the reference speed are the starting point: k and the exit angles as evaluated.
  const own = r.sublevels.map((s) => s.field_map);
  if (own.length !== inputs.input.sublevels.length || own.some((f) => !f)) {
    undefinedFor(flown, 'the beam has no flights to start the uncertainties from');
    return;
  }
  const k0 = Float64Array.from(own, (f) => f!.coefficient_m3_per_s2);
  const exitAngles = own.map((f) => f!.exit_angle_rad);
  const slopes = coefficientSlopes(new CoefficientFlyer(), base, v, k0, flown.map((f) => f.nudge));
  for (const reason of Object.keys(NO_SLOPE) as (keyof typeof NO_SLOPE)[]) {
    const lost = flown.filter((_, j) => !slopes[j]!.dk && slopes[j]!.reason === reason);
    if (lost.length > 0) undefinedFor(lost, NO_SLOPE[reason]);
  }

  const d = levelDerivatives(spec, magnet.fieldT.value).states;
  const deflections: Sensitivities[] = r.sublevels.map((s, i) => {
    if (d.length === r.sublevels.length) {
      const sMu = scaled(-PLANCK_H, throughParams(d[i]!.dSlope, params));
      setUnc(s, 'moment_J_per_T', sMu, inp.table);
      setUnc(s, 'moment_bohr', scaled(1 / BOHR_MAGNETON, sMu), inp.table);
    }
    const sK = combine([
      ...flown.map((f, j) => [(slopes[j]!.dk?.[i] ?? 0) * mis, f.sens] as const),
      [exitAngles[i]! * v * v * mis, drift],
    ]);
    setUnc(s, 'mean_deflection_m', combine([[1, sK], [-s.mean_deflection_m / T, temperature]]), inp.table);
    return sK;
  });
  // The pattern's own input: each coefficient as an effective moment in a 1 T/m gradient (fieldMapPattern.ts).
  const geometry = { ...inputs.input.geometry, gradientTPerM: 1 };
  const lever = leverArmM2(geometry);
  const effective = { ...inputs.input, geometry, sublevels: inputs.input.sublevels.map((s, i) => ({ ...s, momentJT: effectiveMomentJT(k0[i]!, mass, lever) })) };
  const flight = combine([[1, length], [1, drift]]);
  peakUncertainty(r, beam, effective, inp, deflections, flight, { temperature, T, apparatus }, problems);
}

/**
 * A slower block → its ideal profile, the laser detuning, a 1-D flight and (with `sources`) the
 * check of a coil design. The Zeeman rate of the driven pair comes from the exact engine at the
 * fields the profile reaches (docs/slower.md).
 */
import type { Problem, Range } from '../format/ast';
import { vacuumWavelengthM } from '../physics/species/conversions';
import { sumField, type FieldFunction } from '../physics/fields';
import {
  axisField,
  checkDesign,
  designSign,
  drivenPair,
  idealField,
  idealProfile,
  idealSpeed,
  rateSpread,
  simulateAtom,
  slowerCautions,
  type AxisField,
  type DrivenPair,
  type IdealProfile,
  type SimulationResult,
  type SlowerAxis,
  type SlowerIssue,
  type SlowerTransition,
  transverseFraction,
} from '../physics/slower';
import type { LevelModel, SettingsModel, SlowerModel } from '../model/types';
import type { GJLookup } from './gJLookup';
import { engineSpec } from './levelSpec';
import { lengthText, speedText, trimNumber } from './quantityText';
import type { SlowerFlight, SlowerResult, SlowerSample } from './slowerResultTypes';

/** Samples of the profile in the result (and the CSV). */
export const SLOWER_SAMPLES = 101;
/** A field small enough to be weak for any level, large enough to lift every degeneracy: the first rate. */
const SMALL_FIELD_T = 1e-7;

/** The coils' field along the slower. */
interface CoilAxis {
  sources: string[];
  field: AxisField;
  /** The field of the sources in space and the slower's axis in it (for the transverse check). */
  whole: FieldFunction;
  axis: SlowerAxis;
}

/** The slower's sources as one field along its axis; undefined without sources or when none has a usable part. */
function coilAxis(s: SlowerModel): CoilAxis | undefined {
  const parts = (s.sources ?? []).flatMap((x) => x.parts);
  if (parts.length === 0) return undefined;
  const whole = sumField(parts);
  const axis: SlowerAxis = { start: s.start?.value ?? [0, 0, 0], direction: s.axis?.value ?? [0, 0, 1] };
  return { sources: s.sources!.map((x) => x.name), field: axisField(whole, axis), whole, axis };
}

export function evaluateSlower(s: SlowerModel, gJOf: GJLookup, settings: SettingsModel, problems: Problem[]): SlowerResult {
  const result: SlowerResult = {
    name: s.name,
    design: s.design,
    computed: false,
    safety: s.safety.value,
    saturation: s.saturation.value,
    ...(s.line ? { line: s.line.name } : {}),
    ...(s.captureMPerS ? { capture_m_per_s: s.captureMPerS.value } : {}),
    ...(s.finalMPerS ? { final_m_per_s: s.finalMPerS.value } : {}),
    cautions: [],
  };
  const say = (code: string, severity: Problem['severity'], message: string, range: Range = s.nameRange): void =>
    void problems.push({ code, severity, message: `slower '${s.name}': ${message}`, range });
  const lineRange = s.lineRange ?? s.nameRange;
  const { lower, upper } = s.line ?? {};
  if (lower) result.species = lower.species.name;
  result.cautions = slowerCautions({});
  if (!s.line || !lower || !upper || !s.captureMPerS || !s.finalMPerS) return result;
  const data = lineData(lower, upper);
  if (data.missing.length > 0) {
    say('slower-line-no-data', 'error', `line '${s.line.name}' lacks ${data.missing.join('; ')}`, lineRange);
    return result;
  }
  Object.assign(result, {
    wavelength_m: data.wavelengthM,
    lifetime_s: data.lifetimeS,
    lifetime_source: upper.lifetimeS!.source,
    natural_linewidth_Hz: 1 / (2 * Math.PI * data.lifetimeS!),
    mass_kg: data.massKg,
  });
  result.cautions = slowerCautions({ wavelengthM: data.wavelengthM! });
  const ls = engineSpec(lower, gJOf(lower), settings);
  const us = engineSpec(upper, gJOf(upper), settings);
  if (lower.kind === 'term' || upper.kind === 'term' || !ls || !us) {
    say('slower-line-kind', 'error', `both ends of line '${s.line.name}' must be usable J levels (a whole term written without J is not driven as one line here)`, lineRange);
    return result;
  }
  const sign = designSign(s.design);
  // The σ+ pair's rate decides which end of the m ladder the design drives.
  const first = drivenPair(ls, us, 'top', [SMALL_FIELD_T]);
  const side = first.pair && sign * first.pair.ratesHzPerT[0]! < 0 ? 'bottom' : 'top';
  const probe = side === 'top' ? first : drivenPair(ls, us, 'bottom', [SMALL_FIELD_T]);
  if (!probe.pair) {
    reportIssues(probe.issues, s, say, lineRange);
    return result;
  }
  const transition: SlowerTransition = { wavelengthM: data.wavelengthM!, lifetimeS: data.lifetimeS!, massKg: data.massKg!, rateHzPerT: probe.pair.ratesHzPerT[0]! };
  const request = {
    captureMPerS: s.captureMPerS.value,
    finalMPerS: s.finalMPerS.value,
    safety: s.safety.value,
    design: s.design,
    saturation: s.saturation.value,
    ...(s.biasT ? { biasT: s.biasT.value } : {}),
  };
  const built = idealProfile(transition, request);
  if (!built.profile) {
    reportIssues(built.issues, s, say, lineRange);
    return result;
  }
  const p = built.profile;
  // The rate again at the fields the profile reaches: the same for a stretched pair, not for others.
  const reached = drivenPair(ls, us, side, [SMALL_FIELD_T, p.entryFieldT, idealField(p, p.lengthM / 2).BT, p.exitFieldT]);
  const pair: DrivenPair = reached.pair ?? probe.pair;
  reportIssues([...reached.issues, ...built.issues], s, say, lineRange);
  const spread = rateSpread(pair);
  if (spread > 1e-6) {
    say('slower-rate-varies', 'info', `the driven pair ${pair.lowerLabel} → ${pair.upperLabel} is not stretched: its Zeeman shift rate changes by ${(spread * 100).toPrecision(2)} % over the profile's fields, so the profile (computed with the weak-field rate) is approximate`);
  }
  const shiftHzPerT = sign * Math.abs(transition.rateHzPerT);
  Object.assign(result, profileNumbers(p, s.saturation.value), {
    computed: true,
    polarisation: side === 'top' ? 'sigma+' : 'sigma-',
    driven_pair: { lower: pair.lowerLabel, upper: pair.upperLabel, cycling: pair.cycling, rate_Hz_per_T: transition.rateHzPerT, rate_spread: spread },
    ...(s.biasT?.unit ? { bias_unit: s.biasT.unit } : {}),
  });
  if (s.safety.value >= s.saturation.value / (1 + s.saturation.value)) {
    say(
      'slower-saturation-too-low',
      'warning',
      `at saturation s0 = ${s.saturation.value} the light gives at most ${trimNumber(s.saturation.value / (1 + s.saturation.value), 3)} a_max, not the η = ${s.safety.value} a_max the profile asks for: atoms fall behind the resonance even in the ideal field; lower safety or raise saturation`,
      s.safety.range ?? s.saturation.range ?? s.nameRange,
    );
  }
  const common = { shiftHzPerT, wavelengthM: transition.wavelengthM, saturation: s.saturation.value };
  const flyThrough = (field: AxisField): SimulationResult | undefined => {
    const run = simulateAtom({ ...common, field, detuningHz: p.detuningHz, lifetimeS: transition.lifetimeS, maxDecelerationMPerS2: p.maxDecelerationMPerS2, startSpeedMPerS: p.captureMPerS, endM: p.lengthM });
    reportIssues(run.issues, s, say, lineRange);
    return run.result;
  };
  const ideal = flyThrough((z) => idealField(p, z));
  if (ideal) result.flight = flightOf(ideal);
  const idealCheck = checkDesign({ ...common, profile: p, points: SLOWER_SAMPLES });
  let samples: SlowerSample[] = idealCheck.samples.map((c) => ({ z_m: c.zM, B_ideal_T: c.idealT, resonant_speed_m_per_s: c.resonantMPerS, needed_deceleration_m_per_s2: c.neededMPerS2 }));
  let shown = ideal;
  const coils = coilAxis(s);
  if (coils) {
    const check = checkDesign({ ...common, profile: p, field: coils.field, points: SLOWER_SAMPLES });
    const run = flyThrough(coils.field);
    result.coils = { sources: coils.sources, worst_over_design: check.worstOverDesign, capture_m_per_s: check.captureMPerS, ...(check.dropAtM !== undefined ? { drop_at_m: check.dropAtM } : {}), ...(run ? { flight: flightOf(run) } : {}) };
    samples = check.samples.map((c) => ({ z_m: c.zM, B_ideal_T: c.idealT, B_coils_T: c.fieldT, resonant_speed_m_per_s: c.resonantMPerS, ideal_resonant_speed_m_per_s: idealSpeed(p, c.zM), needed_deceleration_m_per_s2: c.neededMPerS2 }));
    shown = run;
    // Released early (a weak exit field) the atom leaves well above the final speed although nothing asked for too much deceleration.
    const margin = Math.max(0.1 * (p.captureMPerS - p.finalMPerS), p.finalMPerS);
    if (run && run.stoppedAtM === undefined && check.dropAtM === undefined && run.finalMPerS > p.finalMPerS + margin) {
      const exit = check.samples[check.samples.length - 1]!;
      say(
        'slower-coils-exit-fast',
        'warning',
        `the simulated atom leaves the coils' field at ${speedText(run.finalMPerS)}, well above the final speed ${speedText(p.finalMPerS)}: at the exit the coils give ${trimNumber(exit.fieldT * 1e4, 4)} G where the profile needs ${trimNumber(exit.idealT * 1e4, 4)} G`,
      );
    }
    const sideways = transverseFraction(coils.whole, coils.axis, check.samples.map((x) => x.zM), p.deltaBT);
    if (sideways > 0.1) {
      say('slower-coils-off-axis', 'info', `the coils' field has a transverse part up to ${trimNumber(sideways * 100, 2)} % of its axial part along the slower: the check uses the axial part; is \`axis\` (or \`start\`) the coils' axis?`);
    }
    if (check.captureMPerS < 0.99 * p.captureMPerS) {
      say(
        'slower-coils-capture-below',
        'warning',
        `the coils' field is resonant with atoms up to ${speedText(check.captureMPerS)} only, below the capture speed ${speedText(p.captureMPerS)}: faster atoms never meet the light (raise the entrance field)`,
      );
    }
    if (check.dropAtM !== undefined) {
      const end = run ? (run.stoppedAtM !== undefined ? 'the simulated atom stops' : `the simulated atom leaves at ${speedText(run.finalMPerS)} instead of about ${speedText(p.finalMPerS)}`) : '';
      say(
        'slower-coils-drop-atoms',
        'warning',
        `the coils' field drops the atoms at z = ${lengthText(check.dropAtM)}: it asks for up to ${trimNumber((check.worstOverDesign * p.designDecelerationMPerS2) / p.maxDecelerationMPerS2, 3)} a_max, more than the ${trimNumber(idealCheck.reachableMPerS2 / p.maxDecelerationMPerS2, 3)} a_max the light gives${end ? `; ${end}` : ''}`,
      );
    }
  }
  if (shown?.stoppedAtM !== undefined) {
    say('slower-atoms-stop', 'warning', `the simulated atom at the capture speed stops at z = ${lengthText(shown.stoppedAtM)}, before the exit (${lengthText(p.lengthM)}), and would be pushed back`);
  }
  if (shown) attachFlight(samples, shown);
  result.samples = samples;
  result.cautions = slowerCautions({ wavelengthM: transition.wavelengthM, peakFieldT: Math.max(Math.abs(p.entryFieldT), Math.abs(p.exitFieldT)) });
  return result;
}

/** The wavelength from the two energies, the upper lifetime and the mass; what is missing, in words a user can act on. */
function lineData(lower: LevelModel, upper: LevelModel): { wavelengthM?: number; lifetimeS?: number; massKg?: number; missing: string[] } {
  const missing: string[] = [];
  const out: { wavelengthM?: number; lifetimeS?: number; massKg?: number; missing: string[] } = { missing };
  for (const l of [lower, upper]) if (!l.energyHz) missing.push(`an energy: add \`energy = …\` (e.g. in THz or cm^-1) to level '${l.name}'`);
  if (lower.energyHz && upper.energyHz) {
    const nu = upper.energyHz.value - lower.energyHz.value;
    if (nu > 0) out.wavelengthM = vacuumWavelengthM(nu);
    else missing.push(`a positive line frequency ('${upper.name}' must lie above '${lower.name}')`);
  }
  if (upper.lifetimeS && upper.lifetimeS.value > 0) out.lifetimeS = upper.lifetimeS.value;
  else missing.push(`the upper level's lifetime: add \`lifetime = … ns\` (or \`linewidth = … MHz\`) to level '${upper.name}'`);
  const m = lower.species.massKg?.value;
  if (m !== undefined && m > 0) out.massKg = m;
  else missing.push(`the mass of species '${lower.species.name}'`);
  return out;
}

function profileNumbers(p: IdealProfile, saturation: number): Partial<SlowerResult> {
  return {
    a_max_m_per_s2: p.maxDecelerationMPerS2,
    design_deceleration_m_per_s2: p.designDecelerationMPerS2,
    reachable_deceleration_m_per_s2: (p.maxDecelerationMPerS2 * saturation) / (1 + saturation),
    length_m: p.lengthM,
    stop_length_m: p.stopLengthM,
    delta_B_T: p.deltaBT,
    bias_T: p.biasT,
    entry_field_T: p.entryFieldT,
    exit_field_T: p.exitFieldT,
    ...(p.zeroCrossingM !== undefined ? { zero_crossing_m: p.zeroCrossingM } : {}),
    detuning_Hz: p.detuningHz,
  };
}

function flightOf(r: SimulationResult): SlowerFlight {
  return { final_m_per_s: r.finalMPerS, time_s: r.timeS, ...(r.stoppedAtM !== undefined ? { stopped_at_m: r.stoppedAtM } : {}) };
}

/** The flight's speed at each sample (linear between its steps); none past where it stopped. */
function attachFlight(samples: SlowerSample[], run: SimulationResult): void {
  const path = run.path;
  let j = 0;
  for (const s of samples) {
    while (j < path.length - 1 && path[j + 1]!.zM < s.z_m) j++;
    const a = path[j]!;
    const b = path[Math.min(j + 1, path.length - 1)]!;
    if (s.z_m > path[path.length - 1]!.zM + 1e-12) continue;
    const f = b.zM > a.zM ? (s.z_m - a.zM) / (b.zM - a.zM) : 0;
    s.flight_speed_m_per_s = a.vMPerS + Math.min(Math.max(f, 0), 1) * (b.vMPerS - a.vMPerS);
  }
}

/** Physics issues to diagnostics; a line that does not cycle is a note when the file says it repumps. */
function reportIssues(issues: readonly SlowerIssue[], s: SlowerModel, say: (code: string, severity: Problem['severity'], message: string, range?: Range) => void, lineRange: Range): void {
  const seen = new Set<string>();
  for (const i of issues) {
    if (seen.has(i.code + i.message)) continue;
    seen.add(i.code + i.message);
    if (i.code === 'slower-not-cycling' && s.repump) say(i.code, 'info', `${i.message} — accepted: the file says \`repump = on\``, lineRange);
    else say(i.code, i.severity, i.message, i.code === 'slower-not-cycling' ? lineRange : s.nameRange);
  }
}

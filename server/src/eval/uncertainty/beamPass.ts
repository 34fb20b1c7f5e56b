/**
 * `*_unc` of a beam's sublevels: the exact moment at the magnet's field and the flux-averaged
 * deflection ⟨z⟩ = μ G (L1²/2 + L1 L2) ⟨1/v²⟩ / M, which is linear in each of μ, G and the
 * lever arm. Peak positions (of the pattern and of each sublevel's own profile) move with the
 * deflection coefficients k_i = ⟨z_i⟩/⟨1/v²⟩ of their members and with the slit image, whose box
 * widths grow with L1 + L2: dx/dp = Σ_i (∂x/∂k_i) ∂k_i/∂p + (∂x/∂a ∂a/∂L + ∂x/∂b ∂b/∂L) ∂L/∂p.
 * The slit widths w1, w2 and separation d enter through a = w2 (1 + L/d), b = w1 L/d, the detector
 * width W directly. An oven's speeds scale as √T, so 1/v² and every deflection as 1/T: the pattern
 * depends on each k_i/T, ∂⟨z⟩/∂T = −⟨z⟩/T and ∂x/∂T = −Σ_i (∂x/∂k_i) k_i/T.
 */
import { peakSlopes, type PatternInput, type PeakAt } from '../../physics/beam';
import { BOHR_MAGNETON, PLANCK_H } from '../../physics/constants';
import { combine, hasSensitivity, type Sensitivities, levelDerivatives, NO_SENSITIVITY, scaled, throughParams } from '../../physics/uncertainty';
import type { Problem } from '../../format/ast';
import type { BeamModel } from '../../model/types';
import { beamInputs } from '../beamInput';
import type { GJLookup } from '../gJLookup';
import { hyperfineSpec } from '../levelSpec';
import type { BeamResult } from '../resultTypes';
import { fieldMapBeamUncertainty } from './fieldMapPass';
import { fieldKey, reachesWritten, type BeamGeometrySens, type SetupInputs } from './inputs';
import { setUnc } from './uncField';

export function beamUncertainty(r: BeamResult, beam: BeamModel, gJOf: GJLookup, inp: SetupInputs, problems: Problem[]): void {
  const { level, magnet, driftM } = beam;
  const mass = beam.species?.massKg?.value;
  const mis = r.speeds?.mean_inverse_square_s2_per_m2;
  if (!r.computed || !level || !magnet?.fieldT || !magnet.gradientTPerM || !magnet.lengthM || !driftM || !mass || mis === undefined) return;
  // A magnet built from sources: its deflections come from flights, not from μ G (L1²/2 + L1 L2)/M (docs/beam.md §7).
  if (r.deflection_model === 'field-map') return fieldMapBeamUncertainty(r, beam, gJOf, inp, problems);
  const gJ = gJOf(level);
  const spec = gJ !== undefined ? hyperfineSpec(level, gJ) : undefined;
  if (!spec) return;
  const field = inp.fieldSens.get(fieldKey({ kind: 'magnet', name: magnet.name })) ?? NO_SENSITIVITY;
  const params = { ...inp.levelParams(level), field };
  const geo = inp.magnetSens.get(magnet.name);
  const drift = inp.beamDrift.get(beam.name) ?? NO_SENSITIVITY;
  const apparatus = inp.beamGeometry.get(beam.name);
  // Only an oven's temperature is propagated (a jet's speed and spread are not yet).
  const temperature = beam.source?.value.kind === 'oven' ? apparatus?.temperature ?? NO_SENSITIVITY : NO_SENSITIVITY;
  const T = beam.source?.value.kind === 'oven' ? beam.source.value.temperatureK : 1;
  const anything = [field, drift, geo?.gradient, geo?.length, temperature, ...Object.values(apparatus ?? {}), ...Object.values(params)].some((s) => s && hasSensitivity(s));
  if (!anything) return;
  const d = levelDerivatives(spec, magnet.fieldT.value).states;
  if (d.length !== r.sublevels.length) return;
  const G = magnet.gradientTPerM.value;
  const L1 = magnet.lengthM.value;
  const L2 = driftM.value;
  const lever = 0.5 * L1 * L1 + L1 * L2;
  const per = mis / mass;
  const deflections: Sensitivities[] = [];
  r.sublevels.forEach((s, k) => {
    const mu = s.moment_J_per_T;
    const sMu = scaled(-PLANCK_H, throughParams(d[k]!.dSlope, params));
    setUnc(s, 'moment_J_per_T', sMu, inp.table);
    setUnc(s, 'moment_bohr', scaled(1 / BOHR_MAGNETON, sMu), inp.table);
    const sK = combine([
      [G * lever * per, sMu],
      [mu * lever * per, geo?.gradient ?? NO_SENSITIVITY],
      [mu * G * (L1 + L2) * per, geo?.length ?? NO_SENSITIVITY],
      [mu * G * L1 * per, drift],
    ]);
    setUnc(s, 'mean_deflection_m', combine([[1, sK], [-s.mean_deflection_m / T, temperature]]), inp.table);
    // The peaks need k_i itself (⟨z_i⟩/⟨1/v²⟩), whose sensitivities are ⟨z_i⟩'s without the temperature.
    deflections.push(sK);
  });
  const flight = combine([[1, geo?.length ?? NO_SENSITIVITY], [1, drift]]);
  const input = beamInputs(beam, gJOf)?.input;
  if (input) peakUncertainty(r, beam, input, inp, deflections, flight, { temperature, T, apparatus }, problems);
}

export interface SourceAndSlits {
  /** The oven temperature's sensitivities (none for another source) and its value. */
  temperature: Sensitivities;
  T: number;
  apparatus: BeamGeometrySens | undefined;
}

/**
 * `peaks[].position_m_unc` and `sublevels[].peak_m_unc`; `deflections` holds the sensitivities of
 * each k_i⟨1/v²⟩, `flight` those of L1 + L2, `input` the pattern input whose coefficients the
 * peaks were found with (a field-map beam's stands for its flights).
 */
export function peakUncertainty(
  r: BeamResult,
  beam: BeamModel,
  input: PatternInput,
  inp: SetupInputs,
  deflections: Sensitivities[],
  flight: Sensitivities,
  { temperature, T, apparatus }: SourceAndSlits,
  problems: Problem[],
): void {
  const mis = r.speeds?.mean_inverse_square_s2_per_m2;
  if (!mis || input.sublevels.length !== deflections.length) return;
  const index = new Map(input.sublevels.map((s, i) => [s.label, i]));
  const own: PeakAt[] = r.sublevels.flatMap((s, i) => (s.peak_m === null ? [] : [{ positionM: s.peak_m, memberIndices: [i] }]));
  const shared: PeakAt[] = r.peaks.map((p) => ({ positionM: p.position_m, memberIndices: p.members.map((m) => index.get(m) ?? -1) }));
  if (shared.some((p) => p.memberIndices.includes(-1))) return;
  const slopes = peakSlopes(input, [...own, ...shared]);
  const { slit1M, slit2M, slitSeparationM: d, magnetLengthM, driftM } = input.geometry;
  const L = magnetLengthM + driftM;
  const none = NO_SENSITIVITY;
  const sensOf = (p: PeakAt, j: number): Sensitivities | undefined => {
    const s = slopes[j];
    // An undeflected peak sits at 0 by symmetry whatever the inputs: no uncertainty, not rounding noise.
    if (!s || p.positionM === 0) return undefined;
    // k_i = ⟨z_i⟩/⟨1/v²⟩ (the flux average at the file's temperature).
    const perT = -p.memberIndices.reduce((sum, i, q) => sum + s.perK[q]! * (r.sublevels[i]!.mean_deflection_m / mis), 0) / T;
    // a = w2 (1 + L/d), b = w1 L/d with L = L1 + L2 (slitImage.ts).
    return combine([
      ...p.memberIndices.map((i, q) => [s.perK[q]! / mis, deflections[i]!] as const),
      [(s.perBoxA * slit2M + s.perBoxB * slit1M) / d, flight],
      [perT, temperature],
      [s.perBoxB * (L / d), apparatus?.slit1 ?? none],
      [s.perBoxA * (1 + L / d), apparatus?.slit2 ?? none],
      [(-(s.perBoxA * slit2M + s.perBoxB * slit1M) * L) / (d * d), apparatus?.separation ?? none],
      [s.perDetector, apparatus?.detector ?? none],
    ]);
  };
  own.forEach((p, j) => setUnc(r.sublevels[p.memberIndices[0]!]!, 'peak_m', sensOf(p, j), inp.table));
  shared.forEach((p, j) => setUnc(r.peaks[j]!, 'position_m', sensOf(p, own.length + j), inp.table));
  // A deflected peak whose deflections are uncertain but which got no slope: say so (nothing silent).
  const apparatusUncertain = [temperature, ...Object.values(apparatus ?? {})].some((s) => hasSensitivity(s));
  const missed = r.peaks.some(
    (p, j) => p.position_m !== 0 && p.position_m_unc === undefined && !slopes[own.length + j] && (apparatusUncertain || shared[j]!.memberIndices.some((i) => hasSensitivity(deflections[i]!))),
  );
  if (missed) {
    // A warning when an uncertainty the file wrote is lost here; when only published built-in
    // uncertainties reach the peaks, a note (the setup itself asked for nothing).
    const reaching = [temperature, ...Object.values(apparatus ?? {}), ...deflections];
    const written = reaching.some((s) => reachesWritten(s, inp.table));
    problems.push({
      code: 'uncertainty-undefined',
      severity: written ? 'warning' : 'info',
      message: `beam '${beam.name}': its peak positions have uncertain inputs but no first-order uncertainty is shown; the exact slope of a peak needs a spread of speeds and a detector of nonzero width`,
      range: beam.nameRange,
    });
  }
}

/**
 * `*_unc` of a beam's sublevels: the exact moment at the magnet's field and the flux-averaged
 * deflection ⟨z⟩ = μ G (L1²/2 + L1 L2) ⟨1/v²⟩ / M, which is linear in each of μ, G and the
 * lever arm. Peak positions come from a convolved profile and are not propagated (docs/uncertainty.md).
 */
import { BOHR_MAGNETON, PLANCK_H } from '../../physics/constants';
import { combine, hasSensitivity, levelDerivatives, NO_SENSITIVITY, scaled, throughParams } from '../../physics/uncertainty';
import type { BeamModel } from '../../model/types';
import type { GJLookup } from '../gJLookup';
import { hyperfineSpec } from '../levelSpec';
import type { BeamResult } from '../resultTypes';
import { fieldKey, type SetupInputs } from './inputs';
import { setUnc } from './uncField';

export function beamUncertainty(r: BeamResult, beam: BeamModel, gJOf: GJLookup, inp: SetupInputs): void {
  const { level, magnet, driftM } = beam;
  const mass = beam.species?.massKg?.value;
  const mis = r.speeds?.mean_inverse_square_s2_per_m2;
  if (!r.computed || !level || !magnet?.fieldT || !magnet.gradientTPerM || !magnet.lengthM || !driftM || !mass || mis === undefined) return;
  const gJ = gJOf(level);
  const spec = gJ !== undefined ? hyperfineSpec(level, gJ) : undefined;
  if (!spec) return;
  const field = inp.fieldSens.get(fieldKey({ kind: 'magnet', name: magnet.name })) ?? NO_SENSITIVITY;
  const params = { ...inp.levelParams(level), field };
  const geo = inp.magnetSens.get(magnet.name);
  const drift = inp.beamDrift.get(beam.name) ?? NO_SENSITIVITY;
  const anything = [field, drift, geo?.gradient, geo?.length, ...Object.values(params)].some((s) => s && hasSensitivity(s));
  if (!anything) return;
  const d = levelDerivatives(spec, magnet.fieldT.value).states;
  if (d.length !== r.sublevels.length) return;
  const G = magnet.gradientTPerM.value;
  const L1 = magnet.lengthM.value;
  const L2 = driftM.value;
  const lever = 0.5 * L1 * L1 + L1 * L2;
  const per = mis / mass;
  r.sublevels.forEach((s, k) => {
    const mu = s.moment_J_per_T;
    const sMu = scaled(-PLANCK_H, throughParams(d[k]!.dSlope, params));
    setUnc(s, 'moment_J_per_T', sMu, inp.table);
    setUnc(s, 'moment_bohr', scaled(1 / BOHR_MAGNETON, sMu), inp.table);
    const sZ = combine([
      [G * lever * per, sMu],
      [mu * lever * per, geo?.gradient ?? NO_SENSITIVITY],
      [mu * G * (L1 + L2) * per, geo?.length ?? NO_SENSITIVITY],
      [mu * G * L1 * per, drift],
    ]);
    setUnc(s, 'mean_deflection_m', sZ, inp.table);
  });
}

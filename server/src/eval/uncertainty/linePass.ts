/**
 * `offset_Hz_unc` of optical line components: offset = E_upper(B) − E_lower(B) of two sublevels
 * of two levels, so its sensitivities are the difference of the two energies' (shared inputs,
 * such as the field, partly cancel). The absolute frequency adds the level energies, which carry
 * no uncertainty input, so it is left without one.
 */
import { difference, hasSensitivity } from '../../physics/uncertainty';
import type { LineModel } from '../../model/types';
import type { GJLookup } from '../gJLookup';
import { hyperfineSpec } from '../levelSpec';
import type { LineResult } from '../resultTypes';
import { fieldKey, type SetupInputs } from './inputs';
import { statesAt } from './stateSens';
import { setUnc } from './uncField';

export function lineUncertainty(r: LineResult, line: LineModel, gJOf: GJLookup, inp: SetupInputs): void {
  const { lower, upper } = line;
  if (!lower || !upper) return;
  const [lo, up] = [lower, upper];
  const gl = gJOf(lo);
  const gu = gJOf(up);
  const ls = gl !== undefined ? hyperfineSpec(lo, gl) : undefined;
  const us = gu !== undefined ? hyperfineSpec(up, gu) : undefined;
  if (!ls || !us) return;
  for (const fp of r.at_fields) {
    const field = inp.fieldSens.get(fieldKey(fp.source));
    const pl = { ...inp.levelParams(lo), ...(field ? { field } : {}) };
    const pu = { ...inp.levelParams(up), ...(field ? { field } : {}) };
    if (![...Object.values(pl), ...Object.values(pu)].some((s) => s && hasSensitivity(s))) continue;
    const l = statesAt(ls, fp.field_T, pl).byText;
    const u = statesAt(us, fp.field_T, pu).byText;
    for (const c of fp.components) {
      const a = u.get(c.upper_label);
      const b = l.get(c.lower_label);
      if (a && b) setUnc(c, 'offset_Hz', difference(a.energy, b.energy), inp.table);
    }
  }
}

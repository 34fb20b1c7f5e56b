/**
 * `offset_Hz_unc` of optical line components: offset = E_upper(B) − E_lower(B) of two sublevels
 * of two levels, so its sensitivities are the difference of the two energies' (shared inputs,
 * such as the field, partly cancel). The line centre is the difference of the two level energies
 * (`energy = …(u)` in the file), so `line_centre_Hz_unc` follows from them, and the absolute
 * frequency centre + offset from both: `absolute_Hz_unc`.
 */
import { combine, difference, hasSensitivity, NO_SENSITIVITY } from '../../physics/uncertainty';
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
  const centre = r.line_centre_Hz !== undefined ? difference(inp.levelEnergy(up), inp.levelEnergy(lo)) : NO_SENSITIVITY;
  setUnc(r, 'line_centre_Hz', centre, inp.table);
  const gl = gJOf(lo);
  const gu = gJOf(up);
  const ls = gl !== undefined ? hyperfineSpec(lo, gl) : undefined;
  const us = gu !== undefined ? hyperfineSpec(up, gu) : undefined;
  if (!ls || !us) return;
  for (const fp of r.at_fields) {
    const field = inp.fieldSens.get(fieldKey(fp.source));
    // The working field's own uncertainty, as the levels carry it: the report then writes the field alike in every section.
    setUnc(fp, 'field_T', field, inp.table);
    const pl = { ...inp.levelParams(lo), ...(field ? { field } : {}) };
    const pu = { ...inp.levelParams(up), ...(field ? { field } : {}) };
    const offsetsUncertain = [...Object.values(pl), ...Object.values(pu)].some((s) => s && hasSensitivity(s));
    if (!offsetsUncertain && !hasSensitivity(centre)) continue;
    const l = offsetsUncertain ? statesAt(ls, fp.field_T, pl).byText : undefined;
    const u = offsetsUncertain ? statesAt(us, fp.field_T, pu).byText : undefined;
    for (const c of fp.components) {
      const a = u?.get(c.upper_label);
      const b = l?.get(c.lower_label);
      const offset = a && b ? difference(a.energy, b.energy) : offsetsUncertain ? undefined : NO_SENSITIVITY;
      if (offset) setUnc(c, 'offset_Hz', offset, inp.table);
      if (offset && c.absolute_Hz !== undefined) setUnc(c, 'absolute_Hz', combine([[1, offset], [1, centre]]), inp.table);
    }
  }
}

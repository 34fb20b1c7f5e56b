/**
 * `wavelength_m_unc` of a slower: λ = c/ν with ν the difference of the line's two level energies,
 * so dλ = −(λ/ν) dν and the energies' uncertainties carry over as for the line centre (linePass.ts).
 */
import { combine, difference } from '../../physics/uncertainty';
import type { SlowerModel } from '../../model/types';
import type { SlowerResult } from '../slowerResultTypes';
import type { SetupInputs } from './inputs';
import { setUnc } from './uncField';

export function slowerUncertainty(r: SlowerResult, s: SlowerModel, inp: SetupInputs): void {
  const { lower, upper } = s.line ?? {};
  if (r.wavelength_m === undefined || !lower?.energyHz || !upper?.energyHz) return;
  const nu = upper.energyHz.value - lower.energyHz.value;
  if (!(nu > 0)) return;
  setUnc(r, 'wavelength_m', combine([[-r.wavelength_m / nu, difference(inp.levelEnergy(upper), inp.levelEnergy(lower))]]), inp.table);
}

/**
 * u(E) of every swept state at every field of a sweep, from the level's uncertain constants
 * (the field is the sweep's own variable, so it is exact here). Undefined when nothing about the
 * level is uncertain, so exports without uncertain inputs keep their columns.
 */
import type { LevelSpec, SweepResult } from '../../physics/engine';
import { hasSensitivity, levelDerivatives, standardUncertainty, throughParams } from '../../physics/uncertainty';
import type { LevelModel, SetupModel } from '../../model/types';
import { setupInputs } from './inputs';

export function sweepEnergyUnc(model: SetupModel, level: LevelModel, spec: LevelSpec, sweep: SweepResult): Float64Array[] | undefined {
  const inp = setupInputs(model);
  const params = inp.levelParams(level);
  if (!Object.values(params).some((s) => s && hasSensitivity(s))) return undefined;
  const out = sweep.states.map(() => new Float64Array(sweep.fieldsT.length).fill(Number.NaN));
  for (let k = 0; k < sweep.fieldsT.length; k++) {
    const d = levelDerivatives(spec, sweep.fieldsT[k]!).states;
    const used = new Uint8Array(d.length);
    sweep.states.forEach((s, i) => {
      // The derivative state of the same m at (numerically) the same energy is this swept state.
      let best = -1;
      for (let j = 0; j < d.length; j++) {
        if (used[j] || d[j]!.twoM !== s.twoM) continue;
        if (best < 0 || Math.abs(d[j]!.energyHz - s.energyHz[k]!) < Math.abs(d[best]!.energyHz - s.energyHz[k]!)) best = j;
      }
      if (best < 0) return;
      used[best] = 1;
      out[i]![k] = standardUncertainty(throughParams(d[best]!.dE, params), inp.table);
    });
  }
  return out;
}

/** Sensitivities of every sublevel's energy and slope at one field, looked up by label (for transitions and lines). */
import type { LevelSpec } from '../../physics/engine';
import { lowKey } from '../../physics/transitions/sublevelTag';
import { levelDerivatives, throughParams, type ParamSensitivities, type Sensitivities } from '../../physics/uncertainty';

/** Per sublevel at one field: sensitivities of its energy and of its slope dE/dB, by label text and by low-field key. */
export interface StateSens {
  energy: Sensitivities;
  slope: Sensitivities;
  energyHz: number;
}

/** One solve per block: levelDerivatives gives the energies and labels with the derivatives. */
export function statesAt(spec: LevelSpec, fieldT: number, params: ParamSensitivities): { byText: Map<string, StateSens>; byKey: Map<string, StateSens> } {
  const d = levelDerivatives(spec, fieldT).states;
  const byText = new Map<string, StateSens>();
  const byKey = new Map<string, StateSens>();
  for (const s of d) {
    const v: StateSens = { energy: throughParams(s.dE, params), slope: throughParams(s.dSlope, params), energyHz: s.energyHz };
    byText.set(s.low.text, v);
    byKey.set(lowKey(s.low), v);
  }
  return byText.size === d.length ? { byText, byKey } : { byText: new Map(), byKey: new Map() };
}

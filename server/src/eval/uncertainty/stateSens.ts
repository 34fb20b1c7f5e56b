/** Sensitivities of every sublevel's energy and slope at one field, looked up by label (for transitions and lines). */
import { solveLevel, type LevelSpec } from '../../physics/engine';
import { lowKey } from '../../physics/transitions/sublevelTag';
import { levelDerivatives, throughParams, type ParamSensitivities, type Sensitivities } from '../../physics/uncertainty';

/** Per sublevel at one field: sensitivities of its energy and of its slope dE/dB, by label text and by low-field key. */
export interface StateSens {
  energy: Sensitivities;
  slope: Sensitivities;
  energyHz: number;
}

export function statesAt(spec: LevelSpec, fieldT: number, params: ParamSensitivities): { byText: Map<string, StateSens>; byKey: Map<string, StateSens> } {
  const solved = solveLevel(spec, fieldT).states;
  const d = levelDerivatives(spec, fieldT).states;
  const byText = new Map<string, StateSens>();
  const byKey = new Map<string, StateSens>();
  if (d.length !== solved.length) return { byText, byKey };
  solved.forEach((s, k) => {
    const dk = d[k]!;
    const v: StateSens = { energy: throughParams(dk.dE, params), slope: throughParams(dk.dSlope, params), energyHz: s.energyHz };
    byText.set(s.low.text, v);
    byKey.set(lowKey(s.low), v);
  });
  return byText.size === solved.length ? { byText, byKey } : { byText: new Map(), byKey: new Map() };
}


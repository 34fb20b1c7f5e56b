/**
 * Adds the `*_unc` fields to an evaluation: one pass after the values are computed, so a setup
 * without uncertain inputs costs nothing and reads exactly as before.
 */
import type { Problem } from '../../format/ast';
import type { SetupModel } from '../../model/types';
import type { GJLookup } from '../gJLookup';
import type { EvaluationResult } from '../resultTypes';
import { beamUncertainty } from './beamPass';
import { fieldKey, setupInputs } from './inputs';
import { levelUncertainty, termUncertainty } from './levelPass';
import { lineUncertainty } from './linePass';
import { resonanceUncertainty } from './resonancePass';
import { slowerUncertainty } from './slowerPass';
import { sourceGapProblems } from './sourceGaps';
import { setUnc } from './uncField';

type Parts = Pick<EvaluationResult, 'levels' | 'terms' | 'beams' | 'lines' | 'resonances' | 'fields' | 'magnets' | 'slowers'>;

/** Mutates `parts`; returns the problems found (degenerate states, double roots, peaks without a slope) and the input list for the JSON. */
export function attachUncertainty(model: SetupModel, parts: Parts, gJOf: GJLookup): { problems: Problem[]; inputs: EvaluationResult['uncertainty_inputs'] } {
  const inp = setupInputs(model);
  const problems: Problem[] = [];
  if (inp.table.size === 0) return { problems, inputs: undefined };
  const levelOf = (species: string, name: string) => model.species.find((s) => s.name === species)?.levels.find((l) => l.name === name);
  for (const r of parts.levels) {
    const l = levelOf(r.species, r.level);
    if (l) levelUncertainty(r, l, inp, problems);
  }
  for (const r of parts.terms) {
    const l = levelOf(r.species, r.level);
    if (l) termUncertainty(r, l, model.settings, inp, problems);
  }
  parts.beams.forEach((r, i) => {
    const b = model.beams[i];
    if (b && b.name === r.name) beamUncertainty(r, b, gJOf, inp, problems);
  });
  parts.lines.forEach((r, i) => {
    const l = model.lines[i];
    if (l && l.name === r.name) lineUncertainty(r, l, gJOf, inp);
  });
  parts.resonances.forEach((r, i) => {
    const m = model.resonances[i];
    if (m && m.name === r.name) resonanceUncertainty(r, m, model.settings, gJOf, inp, problems);
  });
  parts.slowers?.forEach((r, i) => {
    const s = model.slowers[i];
    if (s && s.name === r.name) slowerUncertainty(r, s, inp);
  });
  for (const f of parts.fields) setUnc(f, 'field_T', inp.fieldSens.get(fieldKey({ kind: 'field', name: f.name })), inp.table);
  for (const m of parts.magnets) {
    setUnc(m, 'field_T', inp.fieldSens.get(fieldKey({ kind: 'magnet', name: m.name })), inp.table);
    setUnc(m, 'gradient_T_per_m', inp.magnetSens.get(m.name)?.gradient, inp.table);
    setUnc(m, 'length_m', inp.magnetSens.get(m.name)?.length, inp.table);
  }
  problems.push(...sourceGapProblems(model.magnets, inp));
  return { problems, inputs: [...inp.table.values()].map((i) => ({ id: i.id, label: i.label, value: i.value, u: i.u })) };
}

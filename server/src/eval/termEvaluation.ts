/**
 * A whole LS term with fine structure: its J levels at zero field (Landé interval rule) and the
 * exact sublevels at every working field, from weak field to Paschen–Back.
 */
import { configurationText } from './designationText';
import { allowedJ, formatTermSymbol } from '../physics/termSymbol';
import { fineZeroFieldHz } from '../physics/engine';
import { landeGJ } from '../physics/gFactors';
import type { LevelModel, SettingsModel } from '../model/types';
import { exactAtField } from './exactAtField';
import { halfText } from './halves';
import type { EvaluationNote, WorkingField } from './levelEvaluation';
import { engineNotes, regimeNote, type FieldPoint } from './regimeNotes';
import { fineSpec } from './levelSpec';
import type { TermResult } from './resultTypes';

export function evaluateTerm(level: LevelModel, settings: SettingsModel, fields: WorkingField[], notes: EvaluationNote[]): TermResult | undefined {
  const spec = fineSpec(level, settings);
  const term = level.term;
  if (!spec || !term || !level.zeta) return undefined;
  const points: FieldPoint[] = [];
  const atFields = fields.map((f) => {
    const r = exactAtField(spec, f.tesla);
    notes.push(...engineNotes(level, { f, r }));
    points.push({ f, r });
    return { source: f.source, field_T: f.tesla, exact: r.exact, ...(r.regime ? { regime: r.regime } : {}) };
  });
  const note = regimeNote(level, points);
  if (note) notes.push(note);
  return {
    species: level.species.name,
    level: level.name,
    designation: { text: level.designationText, unicode: formatTermSymbol(term, 'unicode'), configuration: configurationText(level.configuration) },
    S: term.twoS / 2,
    L: term.L,
    zeta_Hz: { value: level.zeta.value, source: level.zeta.source },
    g_s: spec.gS,
    g_L: spec.gL,
    fine_levels: allowedJ(term.twoS, term.L).map((twoJ) => ({
      J: twoJ / 2,
      J_text: halfText(twoJ),
      shift_Hz: fineZeroFieldHz(term.L, term.twoS, twoJ, spec.zeta),
      g_J: twoJ === 0 ? 0 : landeGJ(term.twoS, term.L, twoJ, { gS: spec.gS, gL: spec.gL }),
    })),
    at_fields: atFields,
  };
}
